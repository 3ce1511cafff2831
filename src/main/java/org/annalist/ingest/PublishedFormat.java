package org.annalist.ingest;

import java.util.Locale;
import java.util.Optional;

/**
 * The layouts in which statistics portals publish series, recognised by content (never by the
 * file's extension): SDMX-CSV 1.0 and 2.0, the tab-separated bulk layout, and JSON-stat 2.0.
 */
enum PublishedFormat {
    /** SDMX-CSV 1.0: a {@code DATAFLOW} first column, then dimensions, {@code TIME_PERIOD}, {@code OBS_VALUE}, attributes. */
    SDMX_CSV_1("SDMX-CSV 1.0"),
    /** SDMX-CSV 2.0: {@code STRUCTURE}, {@code STRUCTURE_ID}, an optional {@code ACTION}, then as 1.0. */
    SDMX_CSV_2("SDMX-CSV 2.0"),
    /** Dimension codes joined in the first column ({@code freq,unit,geo\TIME_PERIOD}), periods across the header. */
    BULK_TSV("tab-separated bulk"),
    /** A JSON-stat 2.0 object of class {@code dataset}. */
    JSON_STAT("JSON-stat 2.0");

    private final String layout;

    PublishedFormat(String layout) {
        this.layout = layout;
    }

    /** The layout as {@code check} and the brief's appendix name it. */
    String layout() {
        return layout;
    }

    /**
     * The published layout the first lines of a text show, if any: a JSON object (any object: the
     * JSON-stat reader says what is wrong with one that is not a JSON-stat 2.0 dataset, which no
     * reader of tables could), a header with {@code TIME_PERIOD} and {@code OBS_VALUE} columns, or a
     * tab-separated header whose first cell joins the dimension names before a backslash.
     */
    static Optional<PublishedFormat> recognise(String sample) {
        String text = sample.startsWith("\uFEFF") ? sample.substring(1) : sample;
        String trimmed = text.stripLeading();
        if (trimmed.startsWith("{")) {
            return Optional.of(JSON_STAT);
        }
        int end = trimmed.indexOf('\n');
        String header = end < 0 ? trimmed : trimmed.substring(0, end);
        int tab = header.indexOf('\t');
        String first = tab < 0 ? header : header.substring(0, tab);
        if (tab > 0 && first.matches("[^\\\\\"]+\\\\\\s*[A-Za-z_]+\\s*")) {
            return Optional.of(BULK_TSV);
        }
        boolean time = false;
        boolean value = false;
        String firstId = null;
        for (String cell : header.split("[,;\t]", -1)) {
            String id = columnId(cell);
            firstId = firstId == null ? id : firstId;
            time |= id.equals("TIME_PERIOD");
            value |= id.equals("OBS_VALUE");
        }
        if (!time || !value) {
            return Optional.empty();
        }
        boolean structure = firstId.startsWith("STRUCTURE") && !firstId.startsWith("STRUCTURE_");   // also STRUCTURE[;]
        return Optional.of(structure ? SDMX_CSV_2 : SDMX_CSV_1);
    }

    /**
     * The identifier of a header cell: the part before {@code ": "} of a cell that also gives the
     * label (SDMX-CSV 1.0 section 3, "labels=both"; SDMX-CSV 2.0 section 2.3), unquoted, in upper case.
     */
    static String columnId(String cell) {
        String c = cell.strip();
        if (c.length() >= 2 && c.startsWith("\"") && c.endsWith("\"")) {
            c = c.substring(1, c.length() - 1).replace("\"\"", "\"").strip();
        }
        int colon = c.indexOf(": ");
        String id = colon > 0 ? c.substring(0, colon) : c;
        return id.strip().toUpperCase(Locale.ROOT);
    }

    /** The label part of a header or data cell written {@code CODE: Label}, or empty. */
    static Optional<String> labelOf(String cell) {
        int colon = cell.indexOf(": ");
        return colon > 0 ? Optional.of(cell.substring(colon + 2).strip()).filter(s -> !s.isEmpty()) : Optional.empty();
    }

    /** The code part of a cell written {@code CODE: Label} (the whole cell otherwise). */
    static String codeOf(String cell) {
        int colon = cell.indexOf(": ");
        return (colon > 0 ? cell.substring(0, colon) : cell).strip();
    }
}
