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

    /** Where the problem is: a line and column of text, or a sheet's row and cell. */
    public Place place() {
        return sheet.isEmpty() ? new Place.Text(line, column) : new Place.Cell(sheet, line, column);
    }

    /** Where the problem is, as a sentence names it: {@code line 12, column 3}, {@code cell C12}, {@code row 12}. */
    public String where() {
        return place().inWords();
    }

    /**
     * {@code FILE:LINE[:COLUMN]: message}, the form every data message takes; in a workbook
     * {@code FILE, sheet 'NAME', cell C14: message} (or {@code row 14}).
     */
    @Override
    public String toString() {
        String lead = place().lead();
        if (!sheet.isEmpty()) {
            return file + ", " + lead + ": " + message;
        }
        return String.format(Locale.ROOT, "%s: %s", lead.isEmpty() ? file : file + ":" + lead, message);
    }

    /**
     * The same problem naming its file without the folder: for a page that leaves the user's
     * machine, where a folder says nothing to the reader and may say too much about the machine.
     */
    public DataProblem withFileNameOnly() {
        try {
            java.nio.file.Path name = java.nio.file.Path.of(file).getFileName();
            return new DataProblem(name == null ? file : name.toString(), line, column, message, sheet);
        } catch (java.nio.file.InvalidPathException notAPath) {
            return this;   // a name no file system takes was never a folder and a file
        }
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
