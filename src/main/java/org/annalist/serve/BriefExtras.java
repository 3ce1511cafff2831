package org.annalist.serve;

import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;

/**
 * The files a user gave for the briefs of one open file, as {@code brief --logo FILE --holidays FILE}
 * takes them: each kept in a folder of its own inside the data file's folder, under the user's file
 * name, and used only after it passed the command line's own checks.
 *
 * @param logo     the masthead's logo, checked by {@link org.annalist.brief.Logo#problem}
 * @param holidays the user's moving holidays and events, read as the command line reads them
 */
record BriefExtras(Optional<Path> logo, Optional<Path> holidays) {

    static final BriefExtras NONE = new BriefExtras(Optional.empty(), Optional.empty());

    BriefExtras {
        Objects.requireNonNull(logo, "logo");
        Objects.requireNonNull(holidays, "holidays");
    }

    /** The file's name as the user called it (the page shows it), or empty. */
    static String name(Optional<Path> file) {
        return file.map(p -> p.getFileName().toString()).orElse("");
    }
}
