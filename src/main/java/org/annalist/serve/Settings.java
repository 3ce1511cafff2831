package org.annalist.serve;

import java.net.InetAddress;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.Objects;
import java.util.Optional;

/**
 * How the workbench serves.
 *
 * @param bind           the interface it listens on: the loopback address unless the user asks otherwise
 * @param port           0 for any free port (tests)
 * @param folder         the served folder: the only folder whose brief specs the browser may pick
 * @param maxUploadBytes the largest data file a browser may send
 * @param generatedAt    the time every brief states as made; empty for {@code SOURCE_DATE_EPOCH} or now
 * @param idle           a session unused this long is ended and its files deleted
 */
public record Settings(InetAddress bind, int port, Path folder, long maxUploadBytes, Optional<Instant> generatedAt,
                       Duration idle) {

    /** Uploads up to this many megabytes unless the user asks for more (a monthly CSV has kilobytes). */
    public static final long DEFAULT_UPLOAD_MEGABYTES = 50;

    /** A browser tab left open over lunch keeps its files; a day-old session is gone. */
    public static final Duration DEFAULT_IDLE = Duration.ofHours(4);

    public Settings {
        Objects.requireNonNull(bind, "bind");
        Objects.requireNonNull(folder, "folder");
        Objects.requireNonNull(generatedAt, "generatedAt");
        Objects.requireNonNull(idle, "idle");
        if (port < 0 || port > 65535) {
            throw new IllegalArgumentException("a port is from 0 to 65535, got " + port);
        }
        if (maxUploadBytes < 1) {
            throw new IllegalArgumentException("the upload limit must be positive, got " + maxUploadBytes);
        }
    }

    /** Whether only this machine can reach the server. */
    public boolean loopback() {
        return bind.isLoopbackAddress();
    }

    /** The upload limit in whole megabytes, as the pages say it. */
    public long maxUploadMegabytes() {
        return Math.max(1, maxUploadBytes / (1024 * 1024));
    }
}
