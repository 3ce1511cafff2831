package org.annalist.ingest;

import java.util.Locale;

/**
 * One thing wrong with (or worth knowing about) an input file, located by file, line and column.
 *
 * @param file   the file as the user named it
 * @param line   1-based line, or 0 when the problem concerns the whole file
 * @param column 1-based column, or 0 when the problem concerns the whole line or file
 * @param message what is wrong and what was expected, e.g. {@code "'12,3x' is not a number; expected ..."}
 */
public record DataProblem(String file, int line, int column, String message) {

    /** {@code FILE:LINE[:COLUMN]: message}, the form every data message takes. */
    @Override
    public String toString() {
        StringBuilder where = new StringBuilder(file);
        if (line > 0) {
            where.append(':').append(line);
            if (column > 0) {
                where.append(':').append(column);
            }
        }
        return String.format(Locale.ROOT, "%s: %s", where, message);
    }
}
