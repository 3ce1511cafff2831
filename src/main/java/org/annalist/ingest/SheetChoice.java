package org.annalist.ingest;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import javax.xml.stream.XMLStreamException;
import org.annalist.ingest.CsvRows.Row;

/**
 * Which sheet of a workbook to read: the one named or numbered ({@code --sheet}, a spec's {@code sheet:}),
 * else the only one whose first rows hold a table of periods and numbers (found as a CSV file's layout is,
 * by {@link TableShape}). No such sheet, or several, is a problem that lists the sheets.
 */
final class SheetChoice {

    /** The rows of a sheet looked at to see whether it holds a time series. */
    static final int SAMPLE_ROWS = 64;

    private SheetChoice() {
    }

    static Workbook.SheetRef choose(String file, Workbook book, ReadOptions options) throws IOException,
            XMLStreamException {
        List<Workbook.SheetRef> sheets = book.sheets();
        if (sheets.isEmpty()) {
            throw Workbooks.problem(file, "the workbook has no sheets; expected a sheet with a column of periods and "
                    + "columns of values");
        }
        if (options.sheet().isPresent()) {
            return named(file, sheets, options.sheet().get());
        }
        List<Workbook.SheetRef> worksheets = sheets.stream().filter(s -> !s.chart()).toList();
        if (worksheets.size() == 1) {
            return worksheets.get(0);   // its own problems, named by sheet and cell, say what is wrong with it
        }
        Map<Workbook.SheetRef, List<String[]>> samples = book.samples(SAMPLE_ROWS);
        List<Workbook.SheetRef> holding = new ArrayList<>();
        List<String> reasons = new ArrayList<>();
        for (Map.Entry<Workbook.SheetRef, List<String[]>> sample : samples.entrySet()) {
            Optional<String> why = whyNot(file, sample.getKey(), sample.getValue());
            if (why.isEmpty() && !sample.getKey().hidden()) {
                holding.add(sample.getKey());
            } else {
                reasons.add(describe(sample.getKey()) + ": " + why.orElse("hidden in the workbook"));
            }
        }
        if (holding.size() == 1) {
            return holding.get(0);
        }
        if (holding.isEmpty()) {
            throw Workbooks.problem(file, "no sheet holds a time series (" + String.join("; ", reasons) + "); expected a "
                    + "sheet with a column of dates or periods and columns of values, or --sheet NAME|NUMBER "
                    + "(sheet: in a spec)");
        }
        throw Workbooks.problem(file, "several sheets hold a time series: " + String.join(", ",
                holding.stream().map(SheetChoice::describe).toList()) + "; expected --sheet NAME|NUMBER (sheet: in a "
                + "spec) to choose one");
    }

    /** The sheet of that name (exact, then ignoring case), else of that 1-based number. */
    private static Workbook.SheetRef named(String file, List<Workbook.SheetRef> sheets, String wanted) {
        Optional<Workbook.SheetRef> byName = sheets.stream().filter(s -> s.name().equals(wanted)).findFirst()
                .or(() -> sheets.stream().filter(s -> s.name().equalsIgnoreCase(wanted.trim())).findFirst());
        if (byName.isPresent()) {
            return checked(file, byName.get());
        }
        if (wanted.trim().matches("\\d{1,4}")) {
            int number = Integer.parseInt(wanted.trim());
            if (number >= 1 && number <= sheets.size()) {
                return checked(file, sheets.get(number - 1));
            }
        }
        throw Workbooks.problem(file, "no sheet named or numbered '" + wanted + "'; expected one of " + String.join(", ",
                sheets.stream().map(SheetChoice::describe).toList()));
    }

    private static Workbook.SheetRef checked(String file, Workbook.SheetRef sheet) {
        if (sheet.chart()) {
            throw new DataProblemException(new DataProblem(file, 0, 0, "is a chart sheet, which holds no cells; expected "
                    + "a sheet with a column of periods and columns of values", sheet.name()));
        }
        return sheet;
    }

    /** {@code 2 'Nights'}. */
    static String describe(Workbook.SheetRef sheet) {
        return sheet.number() + " '" + sheet.name() + "'" + (sheet.chart() ? " (a chart)" : "");
    }

    /** Why the sampled rows hold no table of periods and values, or empty when they do. */
    private static Optional<String> whyNot(String file, Workbook.SheetRef sheet, List<String[]> sample) {
        if (sample.isEmpty()) {
            return Optional.of("empty");
        }
        List<Row> rows = new ArrayList<>();
        int width = 0;
        for (String[] numbered : sample) {
            width = Math.max(width, numbered.length - 1);
        }
        for (String[] numbered : sample) {
            String[] cells = new String[width];
            for (int c = 0; c < width; c++) {
                cells[c] = c + 1 < numbered.length && numbered[c + 1] != null ? numbered[c + 1] : "";
            }
            Row row = new Row(Integer.parseInt(numbered[0]), new CsvRows.Fields(cells));
            if (Boolean.TRUE.equals(Transposed.decides(row))) {
                return Optional.empty();   // periods across a header row
            }
            rows.add(row);
        }
        try {
            TableShape.Shape shape = TableShape.locate(rows, false, new ProblemLog(file, sheet.name()));
            return shape.with(TableShape.Role.VALUE).isEmpty() ? Optional.of("no column of numbers") : Optional.empty();
        } catch (DataProblemException notATable) {
            return Optional.of(notATable.problems().get(notATable.problems().size() - 1).message()
                    .replaceFirst("; expected.*", ""));
        }
    }
}
