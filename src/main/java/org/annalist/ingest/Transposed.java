package org.annalist.ingest;

import java.util.ArrayList;
import java.util.List;
import org.annalist.ingest.CsvRows.Row;

/**
 * The layout of many statistical exports: a row per series, the periods across the header
 * ({@code market, 2024-01, 2024-02, …}). Unfolded into the long layout the rest of the reader
 * knows ({@code period, <the row's labels>, value}), each cell keeping its line and column in the
 * file for messages.
 */
final class Transposed {

    /** At least this many periods in a header row make it a header of periods (our rule). */
    private static final int MIN_PERIOD_HEADERS = 3;

    private Transposed() {
    }

    /**
     * A row per month (or quarter) and a column per year: one series, {@code YYYY-MM,value} rows in
     * time order; null when the table is not such a grid.
     */
    private static List<Row> monthByYear(List<Row> rows, int headerIndex, int firstPeriod, ProblemLog log) {
        Row header = rows.get(headerIndex);
        if (firstPeriod != 1) {
            return null;
        }
        for (int c = 1; c < header.cells().size(); c++) {
            if (!header.cell(c).isEmpty() && !header.cell(c).matches("\\d{4}")) {
                return null;
            }
        }
        List<Row> body = rows.subList(headerIndex + 1, rows.size()).stream().filter(r -> !r.isBlank()).toList();
        List<Integer> positions = new ArrayList<>();
        boolean quarters = false;
        for (Row row : body) {
            String label = row.cell(0).trim();
            // "Mar" or "Q1" with a year appended reads as a month or quarter period
            java.util.Optional<PeriodCells.Parsed> position = PeriodCells.parse(label + " 2000");
            if (position.isEmpty() || !(position.get() instanceof PeriodCells.Fixed f)
                    || f.period().frequency() == org.annalist.series.Frequency.ANNUAL) {
                return null;
            }
            quarters |= f.period().frequency() == org.annalist.series.Frequency.QUARTERLY;
            positions.add(f.period().seasonalPosition());
        }
        if (positions.size() < 4 || positions.stream().distinct().count() != positions.size()) {
            return null;
        }
        List<Row> out = new ArrayList<>();
        out.add(new Row(header.line(), List.of("period", "value")));
        for (int c = 1; c < header.cells().size(); c++) {
            if (header.cell(c).isEmpty()) {
                continue;
            }
            for (int r = 0; r < body.size(); r++) {
                String period = header.cell(c) + (quarters ? "-Q" + positions.get(r)
                        : String.format(java.util.Locale.ROOT, "-%02d", positions.get(r)));
                out.add(new Row(body.get(r).line(), List.of(period, body.get(r).cell(c)), new int[] {1, c + 1}));
            }
        }
        log.warn(header.line(), 0, "a row per " + (quarters ? "quarter" : "month") + " and a column per year: read as one "
                + (quarters ? "quarterly" : "monthly") + " series");
        return out;
    }

    /**
     * Whether the first table rows of a file (blank ones left out) are of this layout, as far as
     * {@code row}, the next of them, tells: true when it is a header of periods, false when it is an
     * ordinary header or data row, null when it tells nothing (a title line of one cell).
     */
    static Boolean decides(Row row) {
        if (firstPeriodOfHeader(row) > 0) {
            return true;
        }
        return row.nonEmptyCount() >= 2 ? false : null;
    }

    /** The column of the first period when {@code row} is a header of periods after labels; -1 when it is not. */
    private static int firstPeriodOfHeader(Row row) {
        int periods = 0;
        int first = -1;
        for (int c = 0; c < row.cells().size(); c++) {
            if (PeriodCells.parse(row.cell(c)).isPresent()) {
                periods++;
                first = first < 0 ? c : first;
            }
        }
        boolean labelledRows = first > 0 && PeriodCells.parse(row.cell(0)).isEmpty();
        return periods >= MIN_PERIOD_HEADERS && labelledRows && periods >= (row.cells().size() - first) * 0.9 ? first : -1;
    }

    /** The rows unfolded when the header holds the periods; the rows unchanged otherwise. */
    static List<Row> unfold(List<Row> rows, ProblemLog log) {
        int headerIndex = -1;
        int firstPeriod = -1;
        for (int r = 0; r < rows.size() && headerIndex < 0; r++) {
            Row row = rows.get(r);
            if (row.isBlank()) {
                continue;
            }
            int first = firstPeriodOfHeader(row);
            if (first > 0) {
                headerIndex = r;
                firstPeriod = first;
            } else if (row.nonEmptyCount() >= 2) {
                return rows;   // the first table row is an ordinary header or data row
            }
        }
        if (headerIndex < 0) {
            return rows;
        }
        Row header = rows.get(headerIndex);
        List<Row> grid = monthByYear(rows, headerIndex, firstPeriod, log);
        if (grid != null) {
            return grid;
        }
        List<Row> unfolded = new ArrayList<>();
        List<String> head = new ArrayList<>();
        head.add("period");
        for (int c = 0; c < firstPeriod; c++) {
            head.add(header.cell(c).isEmpty() ? "series" : header.cell(c));
        }
        head.add("value");
        unfolded.add(new Row(header.line(), head));
        for (Row row : rows.subList(headerIndex + 1, rows.size())) {
            if (row.isBlank() || row.cells().subList(0, Math.min(firstPeriod, row.cells().size())).stream()
                    .allMatch(String::isEmpty)) {
                continue;
            }
            for (int c = firstPeriod; c < header.cells().size(); c++) {
                if (header.cell(c).isEmpty()) {
                    continue;
                }
                List<String> cells = new ArrayList<>();
                int[] columns = new int[firstPeriod + 2];
                cells.add(header.cell(c));
                columns[0] = c + 1;
                for (int k = 0; k < firstPeriod; k++) {
                    cells.add(row.cell(k));
                    columns[k + 1] = k + 1;
                }
                cells.add(row.cell(c));
                columns[firstPeriod + 1] = c + 1;
                unfolded.add(new Row(row.line(), List.copyOf(cells), columns));
            }
        }
        log.warn(header.line(), 0, "the periods run across the header: read a series from each row");
        return unfolded;
    }
}
