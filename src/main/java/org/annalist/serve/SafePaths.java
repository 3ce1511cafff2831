package org.annalist.serve;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * The one way a name from the browser becomes a file: resolved against a folder the server chose,
 * never taken as a path. Refused: an empty name, an absolute one, a drive or a backslash, a
 * {@code .} or {@code ..} segment, control characters, and a name that leads out of the folder
 * once symbolic links are followed (by real path). Whatever is refused is simply not there.
 */
final class SafePaths {

    /** Letters, digits, space and {@code . _ - ( ) +} in each segment; at most 4 segments. */
    private static final Pattern SEGMENT = Pattern.compile("[\\p{L}\\p{N} ._()+-]{1,120}");
    private static final int MAX_SEGMENTS = 4;

    private SafePaths() {
    }

    /**
     * The regular file {@code name} names inside {@code folder}, when it is one.
     *
     * @param name a relative name with forward slashes ({@code specs/monthly.yaml})
     */
    static Optional<Path> file(Path folder, String name) {
        if (name == null || name.isEmpty() || name.startsWith("/") || name.contains("\\") || name.contains(":")) {
            return Optional.empty();
        }
        String[] segments = name.split("/", -1);
        if (segments.length > MAX_SEGMENTS) {
            return Optional.empty();
        }
        for (String segment : segments) {
            if (segment.equals(".") || segment.equals("..") || segment.startsWith(".")
                    || !SEGMENT.matcher(segment).matches()) {
                return Optional.empty();
            }
        }
        try {
            Path root = folder.toRealPath();
            Path candidate = root.resolve(name).normalize();
            if (!candidate.startsWith(root) || !Files.isRegularFile(candidate, LinkOption.NOFOLLOW_LINKS)
                    && !Files.isRegularFile(candidate)) {
                return Optional.empty();
            }
            Path real = candidate.toRealPath();
            return real.startsWith(root) && Files.isRegularFile(real) ? Optional.of(real) : Optional.empty();
        } catch (IOException | SecurityException e) {
            return Optional.empty();
        }
    }

    /** A file name a browser sent with an upload, as a plain name to store under: its last segment, tamed. */
    static String uploadName(String sent) {
        String name = sent == null ? "" : sent;
        name = name.substring(Math.max(name.lastIndexOf('/'), name.lastIndexOf('\\')) + 1);
        name = name.replaceAll("[^\\p{L}\\p{N} ._()+-]", "_").replaceAll("^[. ]+", "").strip();
        if (name.length() > 120) {
            name = name.substring(name.length() - 120);
        }
        return name.isEmpty() ? "upload.csv" : name;
    }
}
