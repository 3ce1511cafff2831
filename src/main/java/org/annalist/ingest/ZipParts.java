package org.annalist.ingest;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import java.util.zip.ZipInputStream;

/**
 * The parts (entries) of a zip package, as both workbook formats are: OOXML (ECMA-376 Part 2, Open
 * Packaging Conventions) and ODF (OASIS ODF 1.2 Part 3, Packages). A file on disk is read through
 * {@link ZipFile}, which opens one part at a time without inflating the others; bytes already in memory
 * are unpacked part by part.
 *
 * <p>Each part is read through a counter that stops at {@link #inflationLimit}: a small zip can inflate
 * to terabytes (a "zip bomb"), and the reader would otherwise read it to the end.
 */
abstract class ZipParts implements AutoCloseable {

    /** Thrown when a part inflates past the limit. */
    static final class TooLarge extends IOException {
        private static final long serialVersionUID = 1L;

        TooLarge(String part, long limit) {
            super(part + " inflates to more than " + (limit >> 20) + " MB");
        }
    }

    /**
     * How far one part may inflate: 100 times the package plus 64 MB. A sheet of numbers compresses
     * about 10:1 (common practice, no source; the 10,000-row benchmark workbook: 6:1), so an honest
     * workbook stays far below.
     */
    static long inflationLimit(long packageBytes) {
        return Math.min(Long.MAX_VALUE / 2, packageBytes * 100 + (64L << 20));
    }

    private final long limit;

    ZipParts(long limit) {
        this.limit = limit;
    }

    /** The parts of a zip file. */
    static ZipParts of(Path file, long packageBytes) throws IOException {
        return new OnDisk(new ZipFile(file.toFile()), inflationLimit(packageBytes));
    }

    /** The parts of a zip held in memory (bytes already in memory: small files, tests), each inflated once. */
    static ZipParts of(byte[] bytes) throws IOException {
        return of(bytes, inflationLimit(bytes.length));
    }

    /** As {@link #of(byte[])}, with the limit on what a part inflates to given. */
    static ZipParts of(byte[] bytes, long limit) throws IOException {
        Map<String, byte[]> parts = new HashMap<>();
        long total = 0;
        try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(bytes))) {
            for (ZipEntry entry = in.getNextEntry(); entry != null; entry = in.getNextEntry()) {
                byte[] part = bounded(in, entry.getName(), limit - total).readAllBytes();
                total += part.length;
                parts.putIfAbsent(entry.getName(), part);
            }
        }
        return new InMemory(parts, limit);
    }

    /** Whether the package has the part. */
    abstract boolean has(String name);

    /** Whether the package has no parts at all (a zip cut short, or an empty one). */
    abstract boolean isEmpty();

    /** The part, read through the inflation limit, or empty when the package has none of that name. */
    final Optional<InputStream> open(String name) throws IOException {
        Optional<InputStream> raw = openRaw(name);
        return raw.isEmpty() ? raw : Optional.of(bounded(raw.get(), name, limit));
    }

    abstract Optional<InputStream> openRaw(String name) throws IOException;

    @Override
    public abstract void close() throws IOException;

    private static InputStream bounded(InputStream in, String name, long limit) {
        return new LimitedStream(in, limit, max -> {
            throw new TooLarge(name, max);
        }) {
            @Override
            public void close() {
                // ZipInputStream's entries are closed with the stream; ZipFile's by the package
            }
        };
    }

    private static final class OnDisk extends ZipParts {
        private final ZipFile zip;

        OnDisk(ZipFile zip, long limit) {
            super(limit);
            this.zip = zip;
        }

        @Override
        boolean has(String name) {
            return zip.getEntry(name) != null;
        }

        @Override
        boolean isEmpty() {
            return zip.size() == 0;
        }

        @Override
        Optional<InputStream> openRaw(String name) throws IOException {
            ZipEntry entry = zip.getEntry(name);
            return entry == null || entry.isDirectory() ? Optional.empty() : Optional.of(zip.getInputStream(entry));
        }

        @Override
        public void close() throws IOException {
            zip.close();
        }
    }

    private static final class InMemory extends ZipParts {
        private final Map<String, byte[]> parts;

        InMemory(Map<String, byte[]> parts, long limit) {
            super(limit);
            this.parts = parts;
        }

        @Override
        boolean has(String name) {
            return parts.containsKey(name);
        }

        @Override
        boolean isEmpty() {
            return parts.isEmpty();
        }

        @Override
        Optional<InputStream> openRaw(String name) {
            byte[] part = parts.get(name);
            return part == null ? Optional.empty() : Optional.of(new ByteArrayInputStream(part));
        }

        @Override
        public void close() {
            // nothing held outside the heap
        }
    }
}
