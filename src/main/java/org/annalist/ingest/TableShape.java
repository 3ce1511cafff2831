package org.annalist.ingest;

import java.util.AbstractList;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.annalist.ingest.CsvRows.Row;

/**
 * Finds the table inside a file's rows: the period column, the header row (if any), the data rows,
 * and what each other column holds (values, the names of series in a long layout, units, flags).
 * Title lines above the header and notes below the data are set aside with a warning.
 */
final class TableShape {

    enum Role { PERIOD, VALUE, KEY, UNIT, FLAG, EMPTY }

    /** A column with its role and its name (header text, without a unit in brackets). */
    record Column(int index, Role role, String name, String unit) {
    }

    record Shape(Optional<Row> header, List<Row> body, List<Column> columns) {

        Column periodColumn() {
            return columns.stream().filter(c -> c.role() == Role.PERIOD).findFirst().orElseThrow();
        }

        List<Column> with(Role role) {
            return columns.stream().filter(c -> c.role() == role).toList();
        }
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

    /** The rows that are not blank, as a view (a big file's rows are not copied). */
    private static List<Row> nonBlank(List<Row> all) {
        int[] kept = new int[Math.max(16, all.size())];
        int count = 0;
        for (int r = 0; r < all.size(); r++) {
            if (!all.get(r).isBlank()) {
                kept[count++] = r;
            }
        }
        int size = count;
        return new AbstractList<>() {
            @Override
            public Row get(int index) {
                Objects.checkIndex(index, size);
                return all.get(kept[index]);
            }

            @Override
            public int size() {
                return size;
            }
        };
    }

    static Shape locate(List<Row> allRows, ProblemLog log) {
        List<Row> rows = nonBlank(allRows);
        if (rows.isEmpty()) {
            throw log.fatal(0, 0, "the file is empty; expected a header row and rows of dates or periods with values");
        }
        int width = 0;
        for (Row row : rows) {
            width = Math.max(width, effectiveWidth(row));
        }
        int periodColumn = findPeriodColumn(rows.subList(0, Math.min(rows.size(), LAYOUT_SAMPLE)), width, log);
        int firstData = -1;
        int lastData = -1;
        for (int r = 0; r < rows.size() && firstData < 0; r++) {
            if (PeriodCells.parse(rows.get(r).cell(periodColumn)).isPresent()) {
                firstData = r;
            }
        }
        for (int r = rows.size() - 1; r >= 0 && lastData < 0; r--) {
            if (PeriodCells.parse(rows.get(r).cell(periodColumn)).isPresent()) {
                lastData = r;
            }
        }
        while (lastData + 1 < rows.size() && !isNote(rows.get(lastData + 1), periodColumn)) {
            lastData++;   // a data row with a bad period: kept, so that it is reported rather than skipped
        }
        Optional<Row> header = Optional.empty();
        if (firstData > 0) {
            header = Optional.of(rows.get(firstData - 1));
            for (Row title : rows.subList(0, firstData - 1)) {
                log.warn(title.line(), 0, "line set aside as a title above the header: '" + preview(title) + "'");
            }
        }
        for (Row note : rows.subList(lastData + 1, rows.size())) {
            log.warn(note.line(), 0, "line set aside as a note below the data: '" + preview(note) + "'");
        }
        List<Row> body = rows.subList(firstData, lastData + 1);
        checkWidths(header, body, log);
        if (header.isPresent() && effectiveWidth(header.get()) > width) {
            width = effectiveWidth(header.get());
        }
        return new Shape(header, Collections.unmodifiableList(body), classify(header, body, width, periodColumn));
    }

    /**
     * A data row with more fields than the header is refused (a value with an unquoted comma, such as
     * {@code 1,234}, splits in two and would shift every cell after it); a row with fewer fields reads
     * the fields missing at its end as missing values, said in one warning naming the lines. Without a
     * header, the first data row sets the width.
     */
    private static void checkWidths(Optional<Row> header, List<Row> body, ProblemLog log) {
        // A trailing delimiter of the header declares a column (filled further down, or padding), one of a row does not.
        Row reference = header.orElse(body.get(0));
        int widest = reference.cells().size();
        int expected = effectiveWidth(reference);
        String against = header.isPresent() ? "the header has " : "the first data row has ";
        List<Integer> shortLines = new ArrayList<>();
        int shortCount = 0;
        int firstShortFields = 0;
        for (Row row : body) {
            int fields = row.cells().size();
            if (fields > widest && effectiveWidth(row) > widest) {
                log.error(row.line(), row.column(widest), "this row has " + effectiveWidth(row) + " fields but " + against
                        + widest + "; expected at most " + widest + " (quote a cell that holds the delimiter, "
                        + "such as \"1,234\")");
            } else if (fields < expected) {
                if (shortCount == 0) {
                    firstShortFields = fields;
                }
                if (shortLines.size() < 5) {
                    shortLines.add(row.line());
                }
                shortCount++;
            }
        }
        if (shortCount > 0) {
            String lines = shortLines.stream().map(String::valueOf).collect(java.util.stream.Collectors.joining(", "));
            String more = shortCount > shortLines.size() ? " and " + (shortCount - shortLines.size()) + " more lines" : "";
            log.warn(shortLines.get(0), 0, (shortCount == 1 ? "this row has " + firstShortFields + " fields but "
                    : "rows with fewer fields than expected (lines " + lines + more + "): ") + against + expected
                    + "; the missing fields were read as missing values");
        }
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
    private static boolean isNote(Row row, int periodColumn) {
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

    private static String preview(Row row) {
        String text = String.join(" ", row.cells().stream().filter(s -> !s.isEmpty()).toList());
        return text.length() > 60 ? text.substring(0, 57) + "..." : text;
    }
}
