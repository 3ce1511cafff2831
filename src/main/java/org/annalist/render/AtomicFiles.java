package org.annalist.render;

import java.io.IOException;
import java.io.OutputStream;
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

    public static void write(Path target, byte[] bytes) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        Files.createDirectories(folder);
        Path temporary = null;
        try {
            temporary = createAndWrite(folder, absolute.getFileName().toString(), bytes);
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
    private static Path createAndWrite(Path folder, String name, byte[] bytes) throws IOException {
        for (int attempt = 0; ; attempt++) {
            Path candidate = folder.resolve("." + name + "." + Long.toUnsignedString(ThreadLocalRandom.current().nextLong(), 36)
                    + ".tmp");
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
                out.write(bytes);
            } catch (IOException e) {
                Files.deleteIfExists(candidate);
                throw e;
            }
            return candidate;
        }
    }

    private static void keepPermissionsOf(Path existing, Path replacement) throws IOException {
        PosixFileAttributeView view = Files.getFileAttributeView(existing, PosixFileAttributeView.class);
        if (view != null && Files.isRegularFile(existing)) {
            Files.setPosixFilePermissions(replacement, view.readAttributes().permissions());
        }
    }
}
