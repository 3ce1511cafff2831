package org.annalist.brief;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Duration;
import java.time.Instant;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.annalist.ingest.DataProblem;
import org.annalist.ingest.DataProblemException;
import org.annalist.render.AtomicFiles;

/**
 * Writing the files a run makes, safely for the user's own files: where a path really leads (through
 * symbolic links), never over an input, with the system's reason when a write fails, names that fit
 * the file system, and no temporary files left behind by a run that was killed.
 */
public final class OutputFiles {

    /** The longest file name (in bytes) of the common file systems (ext4, APFS, NTFS in UTF-16 units). */
    static final int MAX_NAME_BYTES = 255;
    /**
     * The temporary files {@link AtomicFiles} writes beside a target: {@code .NAME.RANDOM.tmp}, RANDOM
     * an unsigned long in base 36. Only names of this shape, for the kinds of file this tool writes, are removed.
     */
    private static final Pattern TEMPORARY = Pattern.compile("\\..+\\.(pdf|json|csv|svg|png)\\.[0-9a-z]{1,13}\\.tmp");
    /** A temporary file older than this belongs to no write still running (a brief takes seconds). */
    private static final Duration STALE = Duration.ofMinutes(10);

    private OutputFiles() {
    }

    /**
     * Writes {@code bytes} to {@code target} atomically, after removing stale temporary files of an
     * earlier, killed run from its folder.
     *
     * @throws DataProblemException with the system's reason when the file cannot be written
     * @param inputs the files the run reads, which an output may not replace
     */
    static void write(Path target, byte[] bytes, List<Path> inputs) {
        write(target, bytes, inputs, AtomicFiles.Sink.DIRECT);
    }

    /** As {@link #write(Path, byte[], List)}, the bytes written through {@code sink} (a full disk, in tests). */
    static void write(Path target, byte[] bytes, List<Path> inputs, AtomicFiles.Sink sink) {
        refuseInput(target, inputs);
        if (Files.isDirectory(target)) {
            throw problem(target, "is a folder; expected the name of a file to write");
        }
        if (Files.exists(target) && !Files.isRegularFile(target)) {
            // a device or a named pipe: the file moved into place would replace it (/dev/null, say)
            throw problem(target, "is not a regular file (a device or a named pipe); expected the name of a file to write");
        }
        Path folder = target.toAbsolutePath().getParent();
        Path existing = folder;
        while (existing != null && !Files.exists(existing, LinkOption.NOFOLLOW_LINKS)) {
            existing = existing.getParent();
        }
        if (existing != null && !Files.isDirectory(existing)) {
            throw problem(target, "cannot be written (" + existing + " is a file, not a folder)");
        }
        removeStaleTemporaries(folder);
        try {
            AtomicFiles.write(target, bytes, sink);
        } catch (IOException e) {
            throw problem(target, "cannot be written (" + reason(e) + ")");
        }
    }

    /** Refuses {@code target} when it is, or leads to, one of {@code inputs}. */
    static void refuseInput(Path target, List<Path> inputs) {
        Optional<Path> real = realOrNearest(target);
        for (Path input : inputs) {
            Optional<Path> in = realOrNearest(input);
            if (real.isPresent() && in.isPresent() && real.get().equals(in.get())) {
                throw problem(target, "is an input of this run (" + input + "); expected another name for the output, "
                        + "so that the input is not replaced");
            }
        }
    }

    /** Removes this tool's temporary files older than a few minutes from {@code folder}; a failure to remove one is no problem. */
    static void removeStaleTemporaries(Path folder) {
        if (folder == null || !Files.isDirectory(folder)) {
            return;
        }
        Instant before = Instant.now().minus(STALE);
        try (Stream<Path> files = Files.list(folder)) {
            for (Path file : files.filter(f -> TEMPORARY.matcher(f.getFileName().toString()).matches()).toList()) {
                try {
                    FileTime modified = Files.getLastModifiedTime(file, LinkOption.NOFOLLOW_LINKS);
                    if (Files.isRegularFile(file, LinkOption.NOFOLLOW_LINKS) && modified.toInstant().isBefore(before)) {
                        Files.deleteIfExists(file);
                    }
                } catch (IOException ignored) {
                    // another run removed it, or it is not ours to remove: it is left as it is
                }
            }
        } catch (IOException | java.io.UncheckedIOException unreadable) {
            // a folder that cannot be listed is reported by the write itself
        }
    }

    /**
     * Where {@code path} really leads: the real path of its nearest existing ancestor (symbolic links
     * resolved) with the rest of the path after it; empty for a symbolic link that leads nowhere.
     */
    static Optional<Path> realOrNearest(Path path) {
        Path absolute = path.toAbsolutePath().normalize();
        Path existing = absolute;
        while (existing != null && !Files.exists(existing, LinkOption.NOFOLLOW_LINKS)) {
            existing = existing.getParent();
        }
        if (existing == null) {
            return Optional.of(absolute);
        }
        try {
            return Optional.of(existing.toRealPath().resolve(existing.relativize(absolute)).normalize());
        } catch (IOException dangling) {
            return Optional.empty();
        }
    }

    /**
     * {@code name} shortened to fit a file system's {@value #MAX_NAME_BYTES} bytes: the end of the stem
     * is replaced by a short hash of the whole name, so that two long names stay apart; the extension is kept.
     */
    public static String fitted(String name) {
        if (name.getBytes(StandardCharsets.UTF_8).length <= MAX_NAME_BYTES) {
            return name;
        }
        int dot = name.lastIndexOf('.');
        String extension = dot > 0 && name.length() - dot <= 16 ? name.substring(dot) : "";
        String hash = "-" + hash(name);
        int budget = MAX_NAME_BYTES - extension.getBytes(StandardCharsets.UTF_8).length - hash.length();
        StringBuilder stem = new StringBuilder();
        int used = 0;
        for (int i = 0; i < name.length() - extension.length(); ) {
            int cp = name.codePointAt(i);
            int bytes = new String(Character.toChars(cp)).getBytes(StandardCharsets.UTF_8).length;
            if (used + bytes > budget) {
                break;
            }
            stem.appendCodePoint(cp);
            used += bytes;
            i += Character.charCount(cp);
        }
        return stem + hash + extension;
    }

    /** {@code path} with its file name {@link #fitted}. */
    public static Path fitted(Path path) {
        Path name = path.getFileName();
        if (name == null) {
            return path;
        }
        String fitted = fitted(name.toString());
        return fitted.equals(name.toString()) ? path : path.resolveSibling(fitted);
    }

    private static String hash(String name) {
        try {
            byte[] digest = java.security.MessageDigest.getInstance("SHA-256").digest(name.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(digest, 0, 4);
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }

    /** The system's reason, without the path it repeats. */
    static String reason(IOException e) {
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof NoSuchFileException) {
            // the system names only the (temporary) file: in /proc, say, no file can be made at all
            return "no file can be created in that folder";
        }
        if (e instanceof FileSystemException f && f.getReason() != null) {
            return f.getReason();
        }
        return e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    }

    private static DataProblemException problem(Path target, String message) {
        return new DataProblemException(new DataProblem(target.toString(), 0, 0, message));
    }
}
