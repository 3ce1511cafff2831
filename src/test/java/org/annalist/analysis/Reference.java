package org.annalist.analysis;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Reads the R reference files in src/test/resources/reference (see the README there). */
public final class Reference {

    /** A comma outside parentheses: forecast_accuracy_holdout.csv writes model names such as ETS(M,Ad,M) unquoted. */
    private static final String CELL_SEPARATOR = ",(?![^(]*\\))";

    private final List<String> header;
    private final List<String[]> rows;

    private Reference(List<String> header, List<String[]> rows) {
        this.header = header;
        this.rows = rows;
    }

    public static Reference csv(String file) {
        try (InputStream in = Reference.class.getResourceAsStream("/reference/" + file)) {
            if (in == null) {
                throw new IllegalArgumentException("no reference file " + file);
            }
            String[] lines = new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\r?\n");
            List<String[]> rows = new ArrayList<>();
            for (int i = 1; i < lines.length; i++) {
                if (!lines[i].isBlank()) {
                    rows.add(lines[i].split(CELL_SEPARATOR, -1));
                }
            }
            return new Reference(Arrays.asList(lines[0].split(CELL_SEPARATOR)), rows);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A numeric column; empty cells are NaN. */
    public double[] column(String name) {
        int c = index(name);
        return rows.stream().mapToDouble(r -> r[c].isEmpty() ? Double.NaN : Double.parseDouble(r[c])).toArray();
    }

    /** The row whose first column equals {@code key}, as name → value. */
    public Map<String, String> row(String key) {
        for (String[] r : rows) {
            if (r[0].equals(key)) {
                Map<String, String> m = new HashMap<>();
                for (int i = 0; i < header.size(); i++) {
                    m.put(header.get(i), i < r.length ? r[i] : "");
                }
                return m;
            }
        }
        throw new IllegalArgumentException("no row " + key);
    }

    public List<Map<String, String>> rowsWhere(String column, String value) {
        int c = index(column);
        List<Map<String, String>> found = new ArrayList<>();
        for (String[] r : rows) {
            if (r[c].equals(value)) {
                Map<String, String> m = new HashMap<>();
                for (int i = 0; i < header.size(); i++) {
                    m.put(header.get(i), r[i]);
                }
                found.add(m);
            }
        }
        return found;
    }

    /** Values of a reference dataset ({@code period,value}). */
    public static double[] dataset(String file) {
        return csv(file).column("value");
    }

    private int index(String name) {
        int c = header.indexOf(name);
        if (c < 0) {
            throw new IllegalArgumentException("no column " + name + " in " + header);
        }
        return c;
    }
}
