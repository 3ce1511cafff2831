package org.annalist.brief;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Objects;

/**
 * Where a brief is written: a path as the user gave it on the command line, or a spec's pattern in
 * which {@code {series}} and {@code {period}} are filled in for each brief.
 */
public sealed interface OutputName permits OutputName.AsGiven, OutputName.Pattern {

    /** The file for the brief of {@code seriesName} whose latest period is {@code period}. */
    Path resolve(String seriesName, String period);

    /** The same name in {@code folder}: its last path element kept, as {@code batch --out} writes. */
    OutputName into(Path folder);

    /** A path written as given: no placeholders are filled in. */
    record AsGiven(Path path) implements OutputName {
        public AsGiven {
            Objects.requireNonNull(path, "path");
        }

        @Override
        public Path resolve(String seriesName, String period) {
            return path;
        }

        @Override
        public OutputName into(Path folder) {
            return new AsGiven(folder.toAbsolutePath().normalize().resolve(path.getFileName()));
        }
    }

    /**
     * A spec's {@code output}: {@code {series}} becomes the series name made file-safe
     * ({@link #fileSafe}), {@code {period}} the latest period as periods are written.
     */
    record Pattern(String pattern) implements OutputName {
        public Pattern {
            Objects.requireNonNull(pattern, "pattern");
        }

        @Override
        public Path resolve(String seriesName, String period) {
            // a long series name may not make a name the file system refuses
            return OutputFiles.fitted(Path.of(pattern.replace("{series}", fileSafe(seriesName)).replace("{period}", period)));
        }

        @Override
        public OutputName into(Path folder) {
            return new Pattern(folder.toAbsolutePath().normalize().resolve(Path.of(pattern).getFileName()).toString());
        }
    }

    /** A name as it can stand in a file name: {@code Long-haul} → {@code long-haul}. */
    static String fileSafe(String s) {
        return s.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-|-$", "");
    }
}
