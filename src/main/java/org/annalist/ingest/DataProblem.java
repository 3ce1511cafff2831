package org.annalist.ingest;

import java.util.Locale;

/**
 * One thing wrong with (or worth knowing about) an input file, located by file, line and column, or,
 * in a workbook, by file, sheet, row and column.
 *
 * @param file   the file as the user named it
 * @param line   1-based line (a workbook's row), or 0 when the problem concerns the whole file
 * @param column 1-based column, or 0 when the problem concerns the whole line or file
 * @param message what is wrong and what was expected, e.g. {@code "'12,3x' is not a number; expected ..."}
 * @param sheet  the workbook's sheet, or empty for a text file
 */
public record DataProblem(String file, int line, int column, String message, String sheet) {

    public DataProblem {
        sheet = sheet == null ? "" : sheet;
    }

    public DataProblem(String file, int line, int column, String message) {
        this(file, line, column, message, "");
    }

    /**
     * {@code FILE:LINE[:COLUMN]: message}, the form every data message takes; in a workbook
     * {@code FILE, sheet 'NAME', cell C14: message} (or {@code row 14}).
     */
    @Override
    public String toString() {
        if (!sheet.isEmpty()) {
            return file + ", sheet '" + sheet + "'" + (line <= 0 ? "" : column > 0 ? ", cell " + columnLetters(column) + line
                    : ", row " + line) + ": " + message;
        }
        StringBuilder where = new StringBuilder(file);
        if (line > 0) {
            where.append(':').append(line);
            if (column > 0) {
                where.append(':').append(column);
            }
        }
        return String.format(Locale.ROOT, "%s: %s", where, message);
    }

    /** The letters of a 1-based column as a spreadsheet names it: 1 → A, 27 → AA (ECMA-376 Part 1 §18.3.1.4, cell reference). */
    public static String columnLetters(int column) {
        StringBuilder letters = new StringBuilder();
        for (int c = column; c > 0; c = (c - 1) / 26) {
            letters.insert(0, (char) ('A' + (c - 1) % 26));
        }
        return letters.toString();
    }
}
