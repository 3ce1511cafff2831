package org.annalist.ingest;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Set;
import org.annalist.ingest.CsvRows.Row;
import org.annalist.ingest.TableShape.Column;
import org.annalist.ingest.TableShape.Role;
import org.annalist.series.Frequency;
import org.annalist.series.Series;
import org.annalist.series.ValueFlag;

/**
 * Turns the rows of a file, given one at a time as they are read, into series: the first rows settle
 * the layout ({@link TableShape}), and from then on each data row's cells go into the primitive arrays
 * of their series ({@link SeriesValues}); no row is kept. When the file is done, the period column and
 * the decimal mark are decided as a whole and the series are made.
 *
 * <p>One layout needs the whole table: periods across the header ({@link Transposed}). Its rows are
 * held (compactly) up to {@link #TRANSPOSED_LIMIT} characters, and unfolded at the end.
 */
final class RowReader {

    /** The most text held of a table whose periods run across the header: far above any such export. */
    static final long TRANSPOSED_LIMIT = 64L << 20;

    /** What the rows gave. */
    record Read(List<Series> series, int rowsRead, String layout, String periodFormat, Optional<DateOrder> dateOrder,
                Optional<DecimalMark> decimalMark) {
    }

    private final ReadOptions options;
    private final ProblemLog log;
    private final String fallbackName;
    private final long expectedRows;
    private final List<Row> front = new ArrayList<>();
    private Boolean transposed;
    private CsvRows.Table whole;
    private TableShape.Head head = new TableShape.Head();
    private TableShape.Shape shape;
    private BodyRows body;
    private PeriodColumn periods;
    private DecimalMarks marks;
    private Column periodColumn;
    private List<Column> valueColumns;
    private List<Column> keys;
    private Optional<Column> unitColumn;
    private Optional<Column> flagColumn;
    private Optional<SeasonGrid.Grid> grid;
    private SeriesValues.Axis shared;
    private final Map<String, SeriesValues> series = new LinkedHashMap<>();
    private final StringBuilder why = new StringBuilder();
    private long cellsSoFar;

    /** @param expectedRows about how many rows the file has (to size the arrays of a wide file once) */
    RowReader(ReadOptions options, ProblemLog log, String fallbackName, long expectedRows) {
        this.options = options;
        this.log = log;
        this.fallbackName = fallbackName;
        this.expectedRows = expectedRows;
    }

    /** The next row of the file. */
    void row(Row row) {
        if (row.isBlank()) {
            return;
        }
        if (transposed == null) {
            front.add(row);
            Boolean decided = Transposed.decides(row);
            if (decided != null || front.size() >= TableShape.LAYOUT_SAMPLE) {
                transposed = Boolean.TRUE.equals(decided);
                if (transposed) {
                    whole = new CsvRows.Table();
                    front.forEach(whole::append);
                } else {
                    front.forEach(this::tableRow);
                }
                front.clear();
            }
            return;
        }
        if (transposed) {
            whole.append(row);
            if (whole.characters() > TRANSPOSED_LIMIT) {
                throw log.fatal(row.line(), 0, "a table with the periods across its header is read whole, and this one "
                        + "holds more than " + (TRANSPOSED_LIMIT >> 20) + " MB of text; expected a smaller table, "
                        + "or the periods down a column");
            }
            return;
        }
        tableRow(row);
    }

    /** The file has ended: the series it holds. */
    Read end() {
        if (transposed == null) {
            front.forEach(this::tableRow);
        } else if (transposed) {
            Transposed.unfold(whole, log).forEach(r -> {
                if (!r.isBlank()) {
                    tableRow(r);
                }
            });
            whole = null;
        }
        if (shape == null) {
            settleLayout(true);
        }
        body.end();
        return finish();
    }

    private void tableRow(Row row) {
        if (shape != null) {
            body.row(row);
            return;
        }
        head.add(row);
        if (head.complete()) {
            settleLayout(false);
        }
    }

    private void settleLayout(boolean wholeFile) {
        List<Row> rows = head.rows();
        shape = TableShape.locate(head, wholeFile, log);
        periodColumn = shape.periodColumn();
        valueColumns = shape.with(Role.VALUE);
        if (valueColumns.isEmpty()) {
            throw log.fatal(rows.get(shape.firstData()).line(), 0, "no column holds numbers; expected one or more columns "
                    + "of values beside the " + (periodColumn.name().isEmpty() ? "period" : "'" + periodColumn.name() + "'")
                    + " column");
        }
        keys = shape.with(Role.KEY);
        unitColumn = shape.with(Role.UNIT).stream().findFirst();
        flagColumn = shape.with(Role.FLAG).stream().findFirst();
        periods = new PeriodColumn(log);
        marks = new DecimalMarks(options.decimalMark());
        List<PeriodColumn.Cell> headPeriods = new ArrayList<>();
        for (Row row : rows.subList(shape.firstData(), rows.size())) {
            headPeriods.add(new PeriodColumn.Cell(row.line(), 0, row.cell(periodColumn.index())));
        }
        grid = PeriodColumn.frequencyOf(headPeriods, options.dateOrder())
                .flatMap(f -> SeasonGrid.of(f, valueColumns, new ProblemLog(""), 0));
        if (keys.isEmpty() && grid.isEmpty()) {
            Set<String> names = new HashSet<>();
            boolean distinct = valueColumns.stream().allMatch(c -> names.add(seriesName("", c)));
            shared = distinct ? new SeriesValues.Axis((int) Math.min(expectedRows, Integer.MAX_VALUE / 2)) : null;
        }
        body = new BodyRows(shape.header(), periodColumn.index(), log, this::dataRow);
        TableShape.Head held = head;
        head = null;
        held.rows().subList(shape.firstData(), held.rows().size()).forEach(body::row);
    }

    private void dataRow(Row row, Optional<PeriodCells.Parsed> parsed) {
        int at = periodColumn.index();
        long key = periods.key(row.line(), row.column(at), row.cell(at), parsed);
        if (shared != null) {
            shared.add(key, row.line());
        }
        String keyText = keys.isEmpty() ? "" : keys.size() == 1 ? row.cell(keys.get(0).index())
                : String.join(" / ", keys.stream().map(k -> row.cell(k.index())).toList());
        OptionalInt year = grid.isPresent() ? PeriodColumn.yearOf(key) : OptionalInt.empty();
        for (Column column : valueColumns) {
            String cell = row.cell(column.index());
            DecimalMarks.Reading reading = marks.see(cell, row.line());
            if (grid.isPresent() && grid.get().positions().get(column.index()) == 0) {
                continue;   // a totals column beside the months
            }
            SeriesValues values = seriesOf(keyText, column, row);
            cellsSoFar++;
            long cellKey = key;
            if (grid.isPresent()) {
                cellKey = year.isPresent() ? PeriodColumn.keyOf(grid.get().period(year.getAsInt(), column.index()))
                        : PeriodColumn.NONE;
            }
            if (values.axis() != shared) {
                values.axis().add(cellKey, row.line());
            }
            int sourceColumn = row.column(column.index());
            if (key == PeriodColumn.NONE || reading.conflicting()) {
                values.add(Double.NaN, Set.of(), false, sourceColumn);   // reported already, or to be
                continue;
            }
            double plain = NumberCells.plainInteger(cell);
            if (!Double.isNaN(plain) && flagColumn.isEmpty()) {
                values.add(plain, Set.of(), false, sourceColumn);   // the commonest cell, read without objects
                continue;
            }
            why.setLength(0);
            Optional<NumberCells.Cell> value = NumberCells.parse(cell, reading.mark(), why);
            if (value.isEmpty()) {
                log.error(row.line(), sourceColumn, why + "; expected a number (or a missing-value marker "
                        + "such as NA, -, .. or :) in column '" + column.name() + "'");
                values.add(Double.NaN, Set.of(), false, sourceColumn);
                continue;
            }
            Set<ValueFlag> flags = withFlagColumn(value.get().flags(), flagColumn.map(f -> row.cell(f.index())), row,
                    flagColumn.map(Column::index).orElse(-1));
            values.add(value.get().value(), flags, value.get().percent(), sourceColumn);
            if (reading.pending()) {
                values.other(NumberCells.parse(cell, DecimalMark.COMMA, why).map(NumberCells.Cell::value).orElse(Double.NaN));
            }
        }
    }

    private SeriesValues seriesOf(String keyText, Column column, Row row) {
        String name = grid.isPresent() ? (keyText.isEmpty() ? fallbackName : keyText) : seriesName(keyText, column);
        SeriesValues values = series.get(name);
        if (values == null) {
            // A long file sorted by series gives each series about as many rows as those before it had.
            int capacity = shared != null ? (int) Math.min(expectedRows, Integer.MAX_VALUE / 2)
                    : (int) Math.min(cellsSoFar / Math.max(1, series.size()) + 1, 1 << 20);
            SeriesValues.Axis axis = shared != null ? shared : new SeriesValues.Axis(capacity);
            values = new SeriesValues(name, unitOf(column, unitColumn.map(u -> row.cell(u.index())), !keys.isEmpty()),
                    axis, shared == null, column.index() + 1, capacity);
            series.put(name, values);
        }
        return values;
    }

    private Read finish() {
        List<SeriesValues.Axis> columnAxes = new ArrayList<>();
        if (shared != null) {
            columnAxes.add(shared);
        } else if (grid.isEmpty()) {
            series.values().forEach(v -> columnAxes.add(v.axis()));
        }
        PeriodColumn.Settled settled = periods.settle(options.dateOrder(), each -> columnAxes.forEach(a -> a.forEachKey(each)));
        Optional<DecimalMark> mark = marks.decide(log);
        Frequency frequency = settled.frequency();
        if (grid.isPresent()) {
            SeasonGrid.of(Frequency.ANNUAL, valueColumns, log, shape.header().map(Row::line).orElse(0));
            frequency = grid.get().frequency();
            series.values().forEach(v -> v.axis().identity());
        } else {
            columnAxes.stream().distinct().forEach(a -> a.settle(settled));
        }
        if (mark.isPresent() && mark.get() == DecimalMark.COMMA && options.decimalMark().isEmpty()) {
            series.values().forEach(SeriesValues::takeOtherReadings);
        }
        List<Series> made = new ArrayList<>();
        for (SeriesValues values : series.values()) {
            values.assemble(frequency, log).ifPresent(made::add);
        }
        series.clear();
        shared = null;
        log.throwIfErrors();
        if (made.isEmpty()) {
            throw log.fatal(0, 0, "every value is missing; expected at least one number");
        }
        return new Read(made, body.count(), keys.isEmpty() ? "wide" : "long", settled.format(),
                Optional.ofNullable(settled.dateOrder()), mark);
    }

    private Set<ValueFlag> withFlagColumn(Set<ValueFlag> flags, Optional<String> flagCell, Row row, int flagIndex) {
        if (flagCell.isEmpty() || flagCell.get().isEmpty()) {
            return flags;
        }
        EnumSet<ValueFlag> all = flags.isEmpty() ? EnumSet.noneOf(ValueFlag.class) : EnumSet.copyOf(flags);
        for (char c : flagCell.get().replaceAll("[\\s,;]", "").toCharArray()) {
            Optional<ValueFlag> flag = ValueFlag.fromCode(c);
            if (flag.isEmpty()) {
                log.error(row.line(), flagIndex + 1, "'" + flagCell.get() + "' is not a flag; expected letters among "
                        + ValueFlag.knownCodes());
                return flags;
            }
            all.add(flag.get());
        }
        return Set.copyOf(all);
    }

    /**
     * The unit: from the header's brackets ({@code Nights (thousands)}), else a unit column, else, in a
     * long layout, the value column's own name ({@code arrivals}), which there names the measure.
     */
    private static String unitOf(Column column, Optional<String> unitCell, boolean longLayout) {
        if (!column.unit().isEmpty()) {
            return column.unit();
        }
        if (unitCell.isPresent()) {
            return unitCell.get();
        }
        boolean named = !column.name().isEmpty() && !column.name().equalsIgnoreCase("value")
                && !column.name().equalsIgnoreCase("values");
        return longLayout && named ? column.name() : "";
    }

    private String seriesName(String key, Column column) {
        boolean unnamed = column.name().isEmpty() || column.name().equalsIgnoreCase("value")
                || column.name().equalsIgnoreCase("values");
        String columnName = unnamed ? (valueColumns.size() == 1 ? fallbackName : "column " + (column.index() + 1)) : column.name();
        if (key.isEmpty()) {
            return columnName;
        }
        boolean genericValueColumn = valueColumns.size() == 1 || unnamed;
        return genericValueColumn ? key : key + " \u2014 " + columnName;
    }
}
