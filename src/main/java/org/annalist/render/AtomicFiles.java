package org.annalist.render;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes a file so that readers see either the old file or the complete new one: the bytes go to
 * a temporary file in the same folder, which is then moved over the target.
 */
public final class AtomicFiles {

    private AtomicFiles() {
    }

    public static void write(Path target, byte[] bytes) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        Files.createDirectories(folder);
        Path temporary = Files.createTempFile(folder, "." + absolute.getFileName() + ".", ".tmp");
        try {
            try (OutputStream out = Files.newOutputStream(temporary)) {
                out.write(bytes);
            }
            try {
                Files.move(temporary, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temporary);
        }
    }
}
