package org.annalist.ingest;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.Locale;

/**
 * Opens the files a user names (data, holidays, specs) only when they are what a reader can finish:
 * an ordinary file, not a folder, a device such as {@code /dev/zero} or a pipe (which never end),
 * and no bigger than a limit. A file that grows while it is read is stopped at the limit too.
 */
public final class InputFiles {

    /** The default limit on an input file: far above any monthly or daily series, well below the memory of a laptop. */
    public static final long DEFAULT_MAX_BYTES = 512L * 1024 * 1024;

    private InputFiles() {
    }

    /**
     * The bytes of {@code file}.
     *
     * @param expected what the file should be, for messages ({@code "a CSV file"})
     * @throws DataProblemException when the file is missing, not an ordinary file, over the limit or unreadable
     */
    public static byte[] read(Path file, long maxBytes, String expected) {
        String name = file.toString();
        long limit = Math.min(Integer.MAX_VALUE - 16, maxBytes);
        try (InputStream in = open(file, limit, expected)) {
            // One array of the file's size, read into directly (a growing buffer would hold the file twice).
            long size = Files.size(file);
            byte[] bytes = new byte[(int) Math.min(limit, size)];
            int read = in.readNBytes(bytes, 0, bytes.length);
            if (read < bytes.length) {
                return java.util.Arrays.copyOf(bytes, read);     // the file shrank while it was read
            }
            byte[] more = in.readNBytes((int) (limit - bytes.length + 1));   // or grew
            if (bytes.length + (long) more.length > limit) {
                throw new DataProblemException(new DataProblem(name, 0, 0, tooBig(maxBytes)));
            }
            if (more.length == 0) {
                return bytes;
            }
            byte[] all = java.util.Arrays.copyOf(bytes, bytes.length + more.length);
            System.arraycopy(more, 0, all, bytes.length, more.length);
            return all;
        } catch (IOException e) {
            throw new DataProblemException(new DataProblem(name, 0, 0, "cannot be read (" + reason(e) + ")"));
        }
    }

    /**
     * A stream of {@code file} after the checks of {@link #read}; the caller stops at {@code maxBytes}.
     *
     * @throws DataProblemException as {@link #read}
     */
    public static InputStream open(Path file, long maxBytes, String expected) {
        String name = file.toString();
        BasicFileAttributes attributes;
        try {
            attributes = Files.readAttributes(file, BasicFileAttributes.class);
        } catch (NoSuchFileException e) {
            throw new DataProblemException(new DataProblem(name, 0, 0, "no such file; expected " + expected));
        } catch (IOException e) {
            throw new DataProblemException(new DataProblem(name, 0, 0, "cannot be read (" + reason(e) + ")"));
        }
        if (attributes.isDirectory()) {
            throw new DataProblemException(new DataProblem(name, 0, 0, "is a folder; expected " + expected));
        }
        if (!attributes.isRegularFile()) {
            throw new DataProblemException(new DataProblem(name, 0, 0, "is not an ordinary file (a device, pipe or "
                    + "socket, which may never end); expected " + expected));
        }
        if (attributes.size() > maxBytes) {
            throw new DataProblemException(new DataProblem(name, 0, 0, tooBig(maxBytes) + " (it has "
                    + megabytes(attributes.size()) + ")"));
        }
        try {
            return Files.newInputStream(file);
        } catch (IOException e) {
            throw new DataProblemException(new DataProblem(name, 0, 0, "cannot be read (" + reason(e) + ")"));
        }
    }

    /**
     * A stream of {@code file} after the checks of {@link #read}, which stops with the same problem
     * when the file has grown past {@code maxBytes} while it is read.
     *
     * @throws DataProblemException as {@link #read}
     */
    public static InputStream openBounded(Path file, long maxBytes, String expected) {
        return new LimitedStream(open(file, maxBytes, expected), maxBytes, max -> {
            throw new DataProblemException(new DataProblem(file.toString(), 0, 0, tooBig(max)));
        });
    }

    /** A size limit given in megabytes (MiB) as bytes. */
    public static long megabytesToBytes(long megabytes) {
        if (megabytes <= 0 || megabytes > Long.MAX_VALUE / (1024 * 1024)) {
            throw new IllegalArgumentException("a size limit is a whole number of megabytes from 1, was " + megabytes);
        }
        return megabytes * 1024 * 1024;
    }

    private static String tooBig(long maxBytes) {
        return "is larger than the limit of " + megabytes(maxBytes) + "; expected a smaller file, or a higher limit "
                + "(--max-input-mb, or max_input_mb in a spec)";
    }

    private static String megabytes(long bytes) {
        return bytes % (1024 * 1024) == 0 ? (bytes / (1024 * 1024)) + " MB"
                : String.format(Locale.ROOT, "%.1f MB", bytes / (1024.0 * 1024.0));
    }

    /** The system's reason, without the path it repeats. */
    static String reason(IOException e) {
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        String message = e.getMessage();
        if (e instanceof java.nio.file.FileSystemException f && f.getReason() != null) {
            message = f.getReason();
        }
        return message == null ? e.getClass().getSimpleName() : message;
    }
}
