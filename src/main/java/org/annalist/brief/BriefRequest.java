package org.annalist.brief;

import java.nio.file.Path;
import java.time.Instant;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import org.annalist.ingest.ReadOptions;
import org.annalist.narrative.Masthead;

/**
 * One brief to make.
 *
 * @param series      the series to brief; may be empty when the file holds only one
 * @param title       empty to title the brief with the series name
 * @param templates   a folder of templates that override the bundled ones
 * @param latestPeriod the period the brief reports as latest (its label, e.g. {@code 2025-04}); empty for the last in the data
 * @param generatedAt the time the brief states as made (pinned for reproducible output; see {@link GenerationTime})
 * @param logo        an image printed in the masthead
 * @param language    the narrative's language: the template {@code brief_LANG.ftlx} when it exists
 *                    (FreeMarker's localized lookup), else {@code brief.ftlx}, in English
 */
public record BriefRequest(Path input, ReadOptions readOptions, Optional<String> series, Path output, String title,
                           String organisation, Optional<Path> templates, Instant generatedAt, Masthead.Paper paper,
                           Optional<String> latestPeriod, Optional<Path> logo, Locale language) {

    /** A brief without a logo. */
    public BriefRequest(Path input, ReadOptions readOptions, Optional<String> series, Path output, String title,
                        String organisation, Optional<Path> templates, Instant generatedAt, Masthead.Paper paper,
                        Optional<String> latestPeriod) {
        this(input, readOptions, series, output, title, organisation, templates, generatedAt, paper, latestPeriod,
                Optional.empty(), Locale.ENGLISH);
    }

    public BriefRequest {
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(readOptions, "readOptions");
        Objects.requireNonNull(series, "series");
        Objects.requireNonNull(output, "output");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(organisation, "organisation");
        Objects.requireNonNull(templates, "templates");
        Objects.requireNonNull(generatedAt, "generatedAt");
        Objects.requireNonNull(paper, "paper");
        Objects.requireNonNull(latestPeriod, "latestPeriod");
        Objects.requireNonNull(logo, "logo");
        Objects.requireNonNull(language, "language");
    }
}
