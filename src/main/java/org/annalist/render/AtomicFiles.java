package org.annalist.render;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.util.concurrent.ThreadLocalRandom;

/**
 * Writes a file so that readers see either the old file or the complete new one: the bytes go to
 * a temporary file in the same folder, which is then moved over the target.
 *
 * <p>The result has the permissions any new file of the user gets (their umask decides), or those
 * of the file it replaces: a brief is meant to be shared, and a temporary file's owner-only
 * permissions would otherwise follow it into place.
 */
public final class AtomicFiles {

    private AtomicFiles() {
    }

    /** The longest file name (in bytes) of the common file systems (ext4, APFS, NTFS in UTF-16 units). */
    static final int MAX_NAME_BYTES = 255;

    /**
     * How the bytes reach the temporary file: {@link #DIRECT} but in tests, which stand in for a disk
     * that fills up half way through.
     */
    @FunctionalInterface
    public interface Sink {
        Sink DIRECT = OutputStream::write;

        void write(OutputStream out, byte[] bytes) throws IOException;
    }

    public static void write(Path target, byte[] bytes) throws IOException {
        write(target, bytes, Sink.DIRECT);
    }

    /** As {@link #write(Path, byte[])}, the bytes written through {@code sink}. */
    public static void write(Path target, byte[] bytes, Sink sink) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        Files.createDirectories(folder);
        Path temporary = null;
        try {
            temporary = createAndWrite(folder, absolute.getFileName().toString(), bytes, sink);
            keepPermissionsOf(absolute, temporary);
            try {
                Files.move(temporary, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            if (temporary != null) {
                Files.deleteIfExists(temporary);
            }
        }
    }

    /** A new hidden file beside the target, created as an ordinary file is (not owner-only as createTempFile makes it). */
    private static Path createAndWrite(Path folder, String name, byte[] bytes, Sink sink) throws IOException {
        for (int attempt = 0; ; attempt++) {
            Path candidate = folder.resolve(temporaryName(name, Long.toUnsignedString(ThreadLocalRandom.current().nextLong(), 36)));
            OutputStream out;
            try {
                out = Files.newOutputStream(candidate, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
            } catch (FileAlreadyExistsException taken) {
                if (attempt >= 100) {
                    throw taken;
                }
                continue;
            }
            try (out) {
                sink.write(out, bytes);
            } catch (IOException e) {
                Files.deleteIfExists(candidate);
                throw e;
            }
            return candidate;
        }
    }

    /**
     * {@code .NAME.RANDOM.tmp}, within {@link #MAX_NAME_BYTES}: a target name that itself fits may be
     * too long once the dot and suffix are added, so the end of its stem is left out then (its
     * extension is kept, by which a later run knows the file as one of this tool's).
     */
    public static String temporaryName(String name, String random) {
        String suffix = "." + random + ".tmp";
        int budget = MAX_NAME_BYTES - 1 - suffix.length();
        if (name.getBytes(StandardCharsets.UTF_8).length <= budget) {
            return "." + name + suffix;
        }
        int dot = name.lastIndexOf('.');
        String extension = dot > 0 && name.length() - dot <= 16 ? name.substring(dot) : "";
        int left = budget - extension.getBytes(StandardCharsets.UTF_8).length;
        StringBuilder stem = new StringBuilder();
        for (int i = 0; i < name.length() - extension.length(); ) {
            int cp = name.codePointAt(i);
            left -= new String(Character.toChars(cp)).getBytes(StandardCharsets.UTF_8).length;
            if (left < 0) {
                break;
            }
            stem.appendCodePoint(cp);
            i += Character.charCount(cp);
        }
        return "." + stem + extension + suffix;
    }

    private static void keepPermissionsOf(Path existing, Path replacement) throws IOException {
        PosixFileAttributeView view = Files.getFileAttributeView(existing, PosixFileAttributeView.class);
        if (view != null && Files.isRegularFile(existing)) {
            Files.setPosixFilePermissions(replacement, view.readAttributes().permissions());
        }
    }
}
