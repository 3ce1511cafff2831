package org.annalist.ingest;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/** Collects the errors and warnings of one file while it is read. */
final class ProblemLog {

    /** Beyond this many errors the rest of a hopeless file adds nothing but noise. */
    private static final int MAX_ERRORS = 50;
    /** Beyond this many warnings (a file with thousands of note lines) the rest are counted, not kept. */
    private static final int MAX_WARNINGS = 100;

    private final String file;
    private final String sheet;
    private final List<DataProblem> errors = new ArrayList<>();
    private final List<DataProblem> warnings = new ArrayList<>();
    private int suppressedErrors;
    private int suppressedWarnings;

    ProblemLog(String file) {
        this(file, "");
    }

    /** A log whose problems are located in {@code sheet} of a workbook (rows and cells rather than lines). */
    ProblemLog(String file, String sheet) {
        this.file = file;
        this.sheet = sheet;
    }

    String file() {
        return file;
    }

    /** A line (a sheet's row) and column of this file, as a message's cross-reference names it: {@code line 4}, {@code row 4}, {@code cell B4}. */
    String where(int line, int column) {
        return (sheet.isEmpty() ? new Place.Text(line, column) : new Place.Cell(sheet, line, column)).inWords();
    }

    /** A whole line of this file (a sheet's row), as a cross-reference names it. */
    String where(int line) {
        return where(line, 0);
    }

    /** What this file's lines are called: {@code line}, or {@code row} in a sheet. */
    String lineWord() {
        return sheet.isEmpty() ? "line" : "row";
    }

    /** Whether the file is a workbook's sheet (rows and cells rather than lines). */
    boolean inSheet() {
        return !sheet.isEmpty();
    }

    void error(int line, int column, String message) {
        if (errors.size() < MAX_ERRORS) {
            errors.add(new DataProblem(file, line, column, message, sheet));
        } else {
            suppressedErrors++;
        }
    }

    /**
     * Counts {@code count} more errors of a kind already shown {@link #MAX_ERRORS} times: their text
     * was not kept, and the log would not show it.
     */
    void moreErrors(long count) {
        if (count > 0 && errors.size() < MAX_ERRORS) {
            throw new IllegalStateException("an error to show was not kept");
        }
        suppressedErrors += (int) Math.min(count, Integer.MAX_VALUE - suppressedErrors);
    }

    void warn(int line, int column, String message) {
        if (warnings.size() < MAX_WARNINGS) {
            warnings.add(new DataProblem(file, line, column, message, sheet));
        } else {
            suppressedWarnings++;
        }
    }

    boolean hasErrors() {
        return !errors.isEmpty();
    }

    /** Throws the collected errors, if any. */
    void throwIfErrors() {
        if (errors.isEmpty()) {
            return;
        }
        List<DataProblem> all = new ArrayList<>(errors);
        all.sort(Comparator.comparingInt(DataProblem::line).thenComparingInt(DataProblem::column));
        if (suppressedErrors > 0) {
            all.add(new DataProblem(file, 0, 0, suppressedErrors + " more problems of the same kinds not shown", sheet));
        }
        throw new DataProblemException(all);
    }

    /** Stops reading at once with one problem (the file cannot be read further). */
    DataProblemException fatal(int line, int column, String message) {
        error(line, column, message);
        List<DataProblem> all = new ArrayList<>(errors);
        return new DataProblemException(all);
    }

    List<DataProblem> warnings() {
        if (suppressedWarnings == 0) {
            return List.copyOf(warnings);
        }
        List<DataProblem> all = new ArrayList<>(warnings);
        all.add(new DataProblem(file, 0, 0, suppressedWarnings + " more warnings of the same kinds not shown", sheet));
        return List.copyOf(all);
    }
}
