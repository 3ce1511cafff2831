package org.annalist.ingest;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/** Test helpers: read text as a file would be read, and load the reference datasets. */
final class Files {

    private Files() {
    }

    static ReadResult read(String name, String content) {
        return read(name, content, ReadOptions.defaults());
    }

    static ReadResult read(String name, String content, ReadOptions options) {
        return new SeriesFileReader(options).read(name, content.getBytes(StandardCharsets.UTF_8));
    }

    static String resource(String path) {
        try (InputStream in = Files.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new IllegalArgumentException("no test resource " + path);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The {@code period,value} rows of a reference dataset, header left out. */
    static List<String[]> referenceRows(String dataset) {
        List<String[]> rows = new ArrayList<>();
        String[] lines = resource("/reference/" + dataset).split("\n");
        for (int i = 1; i < lines.length; i++) {
            if (!lines[i].isBlank()) {
                rows.add(lines[i].trim().split(","));
            }
        }
        return rows;
    }
}
