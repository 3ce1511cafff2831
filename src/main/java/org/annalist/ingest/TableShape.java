package org.annalist.ingest;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.annalist.ingest.CsvRows.Row;

/**
 * Finds the table in the first rows of a file: the period column, the header row (if any), the first
 * data row, and what each other column holds (values, the names of series in a long layout, units,
 * flags). Title lines above the header are set aside with a warning; the rows below are followed by
 * {@link BodyRows}.
 */
final class TableShape {

    enum Role { PERIOD, VALUE, KEY, UNIT, FLAG, EMPTY }

    /** A column with its role and its name (header text, without a unit in brackets). */
    record Column(int index, Role role, String name, String unit) {
    }

    private static final Pattern PERIOD_HEADER = Pattern.compile(
            "(?i).*(date|period|month|year|quarter|week|day|time|jahr|datum|monat|mois|ann[ée]e|fecha|periodo|mes|tid).*");
    private static final Pattern UNIT_HEADER = Pattern.compile("(?i)units?|unit of measure|unit_measure|einheit|unité");
    private static final Pattern FLAG_HEADER = Pattern.compile("(?i)flags?|obs_flag|obs_status|status|note|footnote");
    private static final Pattern UNIT_IN_HEADER = Pattern.compile("(.*?)\\s*[(\\[]([^()\\[\\]]+)[)\\]]\\s*");

    /**
     * The layout (the period column, and what each other column holds) is settled on this many rows
     * from the top; a column with nothing but missing markers there is looked at further down.
     */
    static final int LAYOUT_SAMPLE = 5000;

    private TableShape() {
    }

    /**
     * Beyond the sample, the first rows are read on until every column has shown a value (a series
     * that starts late), up to this many rows; a column still empty by then stays as it was classed.
     */
    static final int HEAD_LIMIT = 100_000;

    /**
     * The table's layout as the first rows of a file show it.
     *
     * @param firstData the index (among the rows given) of the first row of data
     */
    record Shape(Optional<Row> header, int firstData, List<Column> columns) {

        Column periodColumn() {
            return columns.stream().filter(c -> c.role() == Role.PERIOD).findFirst().orElseThrow();
        }

        List<Column> with(Role role) {
            return columns.stream().filter(c -> c.role() == role).toList();
        }
    }

    /**
     * The first rows of a file (blank rows left out), collected until they settle the layout: the
     * sample of {@link #LAYOUT_SAMPLE} rows below the first data row, and on until every column has
     * shown a value or {@link #HEAD_LIMIT} rows.
     */
    static final class Head {
        private final CsvRows.Table rows = new CsvRows.Table();
        private boolean[] unfilled;
        private int unfilledCount;
        /** The period column found in the sample, and the width it was looked for in (-1: none found yet). */
        private int periodColumn = -1;
        private int periodWidth = -1;

        void add(Row row) {
            rows.append(row);
            if (rows.size() == 2 * LAYOUT_SAMPLE) {
                findUnfilled();
            } else if (unfilled != null && unfilledCount > 0) {
                fill(row);
            }
        }

        /** True when the rows held settle the layout (more rows would change nothing). */
        boolean complete() {
            return rows.size() >= 2 * LAYOUT_SAMPLE && (unfilledCount == 0 || rows.size() >= HEAD_LIMIT);
        }

        List<Row> rows() {
            return rows;
        }

        private void findUnfilled() {
            try {
                int sampleWidth = width(rows);
                int periodColumn = findPeriodColumn(rows.subList(0, LAYOUT_SAMPLE), sampleWidth, new ProblemLog(""));
                this.periodColumn = periodColumn;
                this.periodWidth = sampleWidth;
                int first = firstData(rows, periodColumn);
                int width = Math.max(width(rows), first > 0 ? rows.get(first - 1).cells().size() : 0);
                unfilled = new boolean[width];
                for (int c = 0; c < width; c++) {
                    unfilled[c] = c != periodColumn;
                }
                unfilledCount = width - 1;
                for (int r = first; r < rows.size(); r++) {
                    fill(rows.get(r));
                }
            } catch (DataProblemException noLayout) {
                unfilledCount = 0;   // reported when the layout is settled
            }
        }

        private void fill(Row row) {
            for (int c = 0; c < unfilled.length && unfilledCount > 0; c++) {
                if (unfilled[c] && !NumberCells.isMissingMarker(row.cell(c))) {
                    unfilled[c] = false;
                    unfilledCount--;
                }
            }
        }
    }

    /** The widest row's width, up to its last non-empty cell. */
    private static int width(List<Row> rows) {
        int width = 0;
        for (Row row : rows) {
            width = Math.max(width, effectiveWidth(row));
        }
        return width;
    }

    private static int firstData(List<Row> rows, int periodColumn) {
        for (int r = 0; r < rows.size(); r++) {
            if (PeriodCells.parse(rows.get(r).cell(periodColumn)).isPresent()) {
                return r;
            }
        }
        return -1;
    }

    /**
     * The layout of the table that starts in {@code rows} (the first rows of a file, none blank): the
     * period column, the header, the first data row, and what each column holds. Title lines above
     * the header are set aside with a warning. When {@code wholeFile}, notes below the data are not
     * taken for data in classing the columns.
     */
    static Shape locate(List<Row> rows, boolean wholeFile, ProblemLog log) {
        return locate(rows, -1, -1, wholeFile, log);
    }

    /**
     * As {@link #locate(List, boolean, ProblemLog)} for the rows of {@code head}, whose period column,
     * when it found one in the same sample and width, is not looked for again (every cell of the
     * sample parsed as a period in each column: a tenth of a second or more of a big file's reading).
     */
    static Shape locate(Head head, boolean wholeFile, ProblemLog log) {
        return locate(head.rows(), head.periodColumn, head.periodWidth, wholeFile, log);
    }

    private static Shape locate(List<Row> rows, int knownPeriodColumn, int knownWidth, boolean wholeFile, ProblemLog log) {
        if (rows.isEmpty()) {
            throw log.fatal(0, 0, "the file is empty; expected a header row and rows of dates or periods with values");
        }
        int width = width(rows);
        // the sample is the same first rows here as when the head found the column
        int periodColumn = knownPeriodColumn >= 0 && knownWidth == width && rows.size() >= LAYOUT_SAMPLE ? knownPeriodColumn
                : findPeriodColumn(rows.subList(0, Math.min(rows.size(), LAYOUT_SAMPLE)), width, log);
        int firstData = firstData(rows, periodColumn);
        Optional<Row> header = Optional.empty();
        if (firstData > 0) {
            header = Optional.of(rows.get(firstData - 1));
            for (Row title : rows.subList(0, firstData - 1)) {
                log.warn(title.line(), 0, log.lineWord() + " set aside as a title above the header: '" + preview(title) + "'");
            }
        }
        // A trailing delimiter of the header declares a column (filled further down, or padding), one of a row does not.
        width = Math.max(width, header.map(h -> h.cells().size()).orElse(0));
        int end = rows.size();
        if (wholeFile) {
            int lastData = rows.size() - 1;
            while (lastData > firstData && PeriodCells.parse(rows.get(lastData).cell(periodColumn)).isEmpty()) {
                lastData--;
            }
            while (lastData + 1 < rows.size() && !isNote(rows.get(lastData + 1), periodColumn)) {
                lastData++;
            }
            end = lastData + 1;
        }
        return new Shape(header, firstData, classify(header, rows.subList(firstData, end), width, periodColumn));
    }

    private static int findPeriodColumn(List<Row> rows, int width, ProblemLog log) {
        int best = -1;
        double bestScore = 0;
        for (int c = 0; c < width; c++) {
            int parsed = 0;
            for (Row row : rows) {
                if (PeriodCells.parse(row.cell(c)).isPresent()) {
                    parsed++;
                }
            }
            // A named date column wins a near tie; otherwise the leftmost column with the most periods.
            boolean named = PERIOD_HEADER.matcher(rows.get(0).cell(c)).matches();
            double score = parsed + (named && parsed > 0 ? 0.5 : 0);
            if (score > bestScore) {
                best = c;
                bestScore = score;
            }
        }
        if (best < 0) {
            Row first = rows.get(0);
            throw log.fatal(first.line(), 0, rows.size() == 1
                    ? "the file has a header but no data rows; expected rows of dates or periods with values below it"
                    : "no column holds dates or periods; expected one column with values such as 2024-03, "
                            + "Mar 2024, 2024-Q1, 2024-03-01 or 2024");
        }
        return best;
    }

    private static List<Column> classify(Optional<Row> header, List<Row> body, int width, int periodColumn) {
        List<Column> columns = new ArrayList<>();
        for (int c = 0; c < width; c++) {
            int index = c;
            String title = header.map(h -> h.cell(index)).orElse("");
            if (c == periodColumn) {
                columns.add(new Column(c, Role.PERIOD, title, ""));
                continue;
            }
            int numeric = 0;
            int text = 0;
            for (int r = 0; r < body.size() && (r < LAYOUT_SAMPLE || numeric + text == 0); r++) {
                String cell = body.get(r).cell(c);
                if (NumberCells.isMissingMarker(cell)) {
                    continue;
                }
                if (NumberCells.looksNumeric(cell)) {
                    numeric++;
                } else {
                    text++;
                }
            }
            Role role;
            if (numeric == 0 && text == 0) {
                role = title.isEmpty() ? Role.EMPTY : Role.VALUE;
            } else if (UNIT_HEADER.matcher(title).matches() && text > 0) {
                role = Role.UNIT;
            } else if (FLAG_HEADER.matcher(title).matches() && numeric == 0) {
                role = Role.FLAG;
            } else {
                role = text > numeric ? Role.KEY : Role.VALUE;
            }
            Matcher unit = UNIT_IN_HEADER.matcher(title);
            if (role == Role.VALUE && unit.matches() && !unit.group(1).isEmpty()) {
                columns.add(new Column(c, role, unit.group(1), unit.group(2).trim()));
            } else {
                columns.add(new Column(c, role, title, ""));
            }
        }
        return List.copyOf(columns);
    }

    /**
     * A row below the data that reads as a footnote or total rather than a data row with a mistyped
     * period: its period cell is empty or starts with a letter other than the Q of a quarter.
     */
    static boolean isNote(Row row, int periodColumn) {
        String cell = row.cell(periodColumn);
        return cell.isEmpty() || (Character.isLetter(cell.charAt(0)) && !cell.matches("(?i)q[1-4].*")
                && PeriodCells.parse(cell).isEmpty());
    }

    /** Number of cells up to the last non-empty one: trailing delimiters do not make a column. */
    static int effectiveWidth(Row row) {
        for (int c = row.cells().size() - 1; c >= 0; c--) {
            if (!row.cells().get(c).isEmpty()) {
                return c + 1;
            }
        }
        return 0;
    }

    static String preview(Row row) {
        String text = String.join(" ", row.cells().stream().filter(s -> !s.isEmpty()).toList());
        return text.length() > 60 ? text.substring(0, 57) + "..." : text;
    }
}
