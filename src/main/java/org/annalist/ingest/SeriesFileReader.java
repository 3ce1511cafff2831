package org.annalist.ingest;

import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.AbstractList;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.annalist.ingest.CsvRows.Row;
import org.annalist.ingest.TableShape.Column;
import org.annalist.ingest.TableShape.Role;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.series.ValueFlag;

/**
 * Reads the series in a delimited text file as real exports come: any of the delimiters, encodings,
 * number and period formats of {@link CsvRows}, {@link NumberCells} and {@link PeriodCells}, in a
 * wide layout (a column per series) or a long one ({@code period, series, value}).
 *
 * <p>Reading goes: bytes → text → rows → table shape → periods → numbers → series (→ aggregation).
 * Every problem found on the way is collected with its file, line and column; if there is any,
 * {@link DataProblemException} carries them all.
 */
public final class SeriesFileReader {

    private final ReadOptions options;

    public SeriesFileReader(ReadOptions options) {
        this.options = options;
    }

    /**
     * @throws DataProblemException when the file cannot be read or holds no usable series
     */
    public ReadResult read(Path file) {
        ProblemLog log = new ProblemLog(file.toString());
        // The file's bytes are referred to only while they are split into rows, and then let go.
        return read(log, rows(log, InputFiles.read(file, options.maxInputBytes(), "a CSV file")));
    }

    /** Reads {@code bytes} as the contents of a file called {@code fileName} (used in messages). */
    public ReadResult read(String fileName, byte[] bytes) {
        ProblemLog log = new ProblemLog(fileName);
        return read(log, rows(log, bytes));
    }

    /** The rows of a file and the facts of its text. */
    private record Text(String sha256, String charsetName, char delimiter, List<Row> rows) {
    }

    private static Text rows(ProblemLog log, byte[] bytes) {
        String sha256 = sha256(bytes);
        TextDecoding.Decoded text = TextDecoding.decode(bytes, log);
        char delimiter = CsvRows.detectDelimiter(text.reader());
        List<Row> rows = Transposed.unfold(CsvRows.parse(text.reader(), delimiter, log,
                CsvRows.Expected.of(bytes, text.offset(), delimiter)), log);
        return new Text(sha256, text.charsetName(), delimiter, rows);
    }

    private ReadResult read(ProblemLog log, Text text) {
        String fileName = log.file();
        char delimiter = text.delimiter();
        List<Row> rows = text.rows();
        TableShape.Shape shape = TableShape.locate(rows, log);
        Column periodColumn = shape.periodColumn();
        List<Column> valueColumns = shape.with(Role.VALUE);
        if (valueColumns.isEmpty()) {
            throw log.fatal(shape.body().get(0).line(), 0, "no column holds numbers; expected one or more columns "
                    + "of values beside the " + (periodColumn.name().isEmpty() ? "period" : "'" + periodColumn.name() + "'")
                    + " column");
        }
        List<Row> body = shape.body();
        List<PeriodColumn.Cell> periodCells = new AbstractList<>() {
            @Override
            public PeriodColumn.Cell get(int index) {
                Row r = body.get(index);
                return new PeriodColumn.Cell(r.line(), r.column(periodColumn.index()), r.cell(periodColumn.index()));
            }

            @Override
            public int size() {
                return body.size();
            }
        };
        PeriodColumn.Resolved periods = PeriodColumn.resolve(periodCells, options.dateOrder(), log);
        Optional<DecimalMark> mark = decimalMark(shape, valueColumns, log);

        Map<String, Collector> collectors = new LinkedHashMap<>();
        List<Column> keys = shape.with(Role.KEY);
        Optional<Column> unitColumn = shape.with(Role.UNIT).stream().findFirst();
        Optional<Column> flagColumn = shape.with(Role.FLAG).stream().findFirst();
        String fallbackName = baseName(fileName);
        Optional<SeasonGrid.Grid> grid = SeasonGrid.of(periods.frequency(), valueColumns, log,
                shape.header().map(Row::line).orElse(0));
        for (int r = 0; r < shape.body().size(); r++) {
            Row row = shape.body().get(r);
            Period period = periods.periods().get(r);
            if (period == null) {
                continue;   // already reported
            }
            String key = String.join(" / ", keys.stream().map(k -> row.cell(k.index())).toList());
            for (Column column : valueColumns) {
                if (grid.isPresent() && grid.get().positions().get(column.index()) == 0) {
                    continue;   // a totals column beside the months
                }
                Period cellPeriod = grid.isPresent() ? grid.get().period(period.year(), column.index()) : period;
                String seriesName = grid.isPresent() ? (key.isEmpty() ? fallbackName : key)
                        : seriesName(key, column, valueColumns.size(), fallbackName);
                Collector collector = collectors.computeIfAbsent(seriesName, n -> {
                    Collector c = new Collector(n, unitOf(column, unitColumn.map(u -> row.cell(u.index())), !keys.isEmpty()));
                    if (keys.isEmpty() && grid.isEmpty() && periods.periods() instanceof CompactLists.PeriodList all) {
                        all.range().ifPresent(range -> c.reserve(range[0], range[1]));   // a column per series: one span
                    }
                    return c;
                });
                if (!collector.claim(cellPeriod, row.line(), row.column(column.index()), log)) {
                    continue;
                }
                String cell = row.cell(column.index());
                StringBuilder why = new StringBuilder();
                Optional<NumberCells.Cell> value = NumberCells.parse(cell, mark.orElse(DecimalMark.POINT), why);
                if (value.isEmpty()) {
                    log.error(row.line(), row.column(column.index()), why + "; expected a number (or a missing-value marker "
                            + "such as NA, -, .. or :) in column '" + column.name() + "'");
                    continue;
                }
                Set<ValueFlag> flags = withFlagColumn(value.get().flags(), flagColumn.map(f -> row.cell(f.index())), row, log,
                        flagColumn.map(Column::index).orElse(-1));
                collector.add(cellPeriod, value.get(), flags, row.line());
            }
        }
        log.throwIfErrors();

        List<Series> series = new ArrayList<>();
        for (Collector collector : collectors.values()) {
            collector.snapshot(log).ifPresent(series::add);
        }
        log.throwIfErrors();
        if (series.isEmpty()) {
            throw log.fatal(0, 0, "every value is missing; expected at least one number");
        }
        if (options.aggregation().isPresent()) {
            Aggregation to = options.aggregation().get();
            series = series.stream().map(s -> Aggregator.aggregate(s, to, log)).toList();
        }
        log.throwIfErrors();
        return new ReadResult(fileName, text.sha256(), text.charsetName(), delimiter, shape.body().size(),
                keys.isEmpty() ? "wide" : "long", periods.format(), Optional.ofNullable(periods.dateOrder()), mark,
                options.aggregation(), series, log.warnings());
    }

    /** The decimal mark: as set, or as the numbers prove; ambiguous {@code 1,234} reads as thousands, with a warning. */
    private Optional<DecimalMark> decimalMark(TableShape.Shape shape, List<Column> valueColumns, ProblemLog log) {
        if (options.decimalMark().isPresent()) {
            return options.decimalMark();
        }
        int[] firstLine = new int[DecimalMark.values().length];
        int ambiguousLine = 0;
        String ambiguousCell = null;
        for (Row row : shape.body()) {
            for (Column column : valueColumns) {
                String cell = row.cell(column.index());
                switch (NumberCells.evidence(cell)) {
                    case POINT -> firstLine[0] = firstLine[0] == 0 ? row.line() : firstLine[0];
                    case COMMA -> firstLine[1] = firstLine[1] == 0 ? row.line() : firstLine[1];
                    case NONE -> {
                        if (ambiguousCell == null && (cell.contains(",") || cell.contains(".")) && NumberCells.looksNumeric(cell)) {
                            ambiguousCell = cell;
                            ambiguousLine = row.line();
                        }
                    }
                }
            }
        }
        if (firstLine[0] > 0 && firstLine[1] > 0) {
            throw log.fatal(Math.max(firstLine[0], firstLine[1]), 0, "numbers use a decimal point (line " + firstLine[0]
                    + ") and a decimal comma (line " + firstLine[1] + "); expected one convention per file, "
                    + "or --decimal-mark point|comma");
        }
        if (firstLine[0] > 0) {
            return Optional.of(DecimalMark.POINT);
        }
        if (firstLine[1] > 0) {
            return Optional.of(DecimalMark.COMMA);
        }
        if (ambiguousCell != null) {
            DecimalMark assumed = ambiguousCell.contains(",") ? DecimalMark.POINT : DecimalMark.COMMA;
            log.warn(ambiguousLine, 0, "'" + ambiguousCell + "' read as " + (assumed == DecimalMark.POINT
                    ? "a number with a thousands comma" : "a number with a thousands point")
                    + ", since no number in the file shows a decimal mark; set --decimal-mark if it is a fraction");
            return Optional.of(assumed);
        }
        return Optional.empty();
    }

    private static Set<ValueFlag> withFlagColumn(Set<ValueFlag> flags, Optional<String> flagCell, Row row, ProblemLog log,
                                                 int flagIndex) {
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

    private static String seriesName(String key, Column column, int valueColumns, String fallback) {
        boolean unnamed = column.name().isEmpty() || column.name().equalsIgnoreCase("value")
                || column.name().equalsIgnoreCase("values");
        String columnName = unnamed ? (valueColumns == 1 ? fallback : "column " + (column.index() + 1)) : column.name();
        if (key.isEmpty()) {
            return columnName;
        }
        boolean genericValueColumn = valueColumns == 1 || unnamed;
        return genericValueColumn ? key : key + " \u2014 " + columnName;
    }

    private static String baseName(String fileName) {
        String base = Path.of(fileName).getFileName().toString();
        int dot = base.lastIndexOf('.');
        return dot > 0 ? base.substring(0, dot) : base;
    }

    private static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }

    /**
     * The values of one series as they are met in the file, checked for repeated periods: kept in
     * arrays indexed by period from the earliest seen, so that memory follows the values kept.
     */
    private static final class Collector {
        private final String name;
        private final String unit;
        private final List<Set<ValueFlag>> flagSets = new ArrayList<>(List.of(Set.of()));
        private final Map<Set<ValueFlag>, Integer> flagSetIds = new HashMap<>(Map.of(Set.of(), 0));
        private Frequency frequency;
        private long base;             // the period index of slot 0
        private int[] lines = new int[0];    // the line that claimed a period (0: none)
        private double[] values = new double[0];
        private int[] flagIds = new int[0];
        private boolean[] stored = new boolean[0];
        private long lowest = Long.MAX_VALUE;
        private long highest = Long.MIN_VALUE;
        private Period previous;
        private int firstOutOfOrderLine;
        private boolean percent;
        private boolean anyValue;

        Collector(String name, String unit) {
            this.name = name;
            this.unit = unit;
        }

        /** Makes room for the periods from {@code low} to {@code high} at once. */
        void reserve(Period low, Period high) {
            slot(low);
            slot(high);
        }

        /** Records that {@code line} holds {@code period}; false (and an error) when an earlier line did. */
        boolean claim(Period period, int line, int column, ProblemLog log) {
            int slot = slot(period);
            int earlier = lines[slot];
            if (earlier != 0) {
                log.error(line, column, "period " + period + " appears again for series '" + name + "' (first on line "
                        + earlier + "); expected one row per period");
                return false;
            }
            lines[slot] = Math.max(line, 1);
            return true;
        }

        void add(Period period, NumberCells.Cell cell, Set<ValueFlag> flags, int line) {
            if (previous != null && period.compareTo(previous) < 0 && firstOutOfOrderLine == 0) {
                firstOutOfOrderLine = line;
            }
            previous = period;
            percent |= cell.percent();
            anyValue |= !Double.isNaN(cell.value());
            int slot = slot(period);
            values[slot] = cell.value();
            flagIds[slot] = flagSetIds.computeIfAbsent(flags, f -> {
                flagSets.add(f);
                return flagSets.size() - 1;
            });
            stored[slot] = true;
            lowest = Math.min(lowest, period.index());
            highest = Math.max(highest, period.index());
        }

        /** The slot of {@code period}, growing the arrays (towards earlier or later periods) to hold it. */
        private int slot(Period period) {
            if (frequency == null) {
                frequency = period.frequency();
                base = period.index();
            }
            long offset = period.index() - base;
            if (offset < 0 || offset >= lines.length) {
                long from = Math.min(base, period.index());
                long to = Math.max(base + lines.length, period.index() + 1);
                long capacity = Math.max(to - from, Math.min(2L * lines.length, Integer.MAX_VALUE - 16));
                long newBase = offset < 0 ? to - capacity : from;
                if (capacity > Integer.MAX_VALUE - 16) {
                    throw new IllegalStateException("a series cannot span more than " + (Integer.MAX_VALUE - 16) + " periods");
                }
                int shift = (int) (base - newBase);
                lines = grow(lines, (int) capacity, shift);
                flagIds = grow(flagIds, (int) capacity, shift);
                values = grow(values, (int) capacity, shift);
                stored = grow(stored, (int) capacity, shift);
                base = newBase;
                offset = period.index() - base;
            }
            return (int) offset;
        }

        private static int[] grow(int[] old, int capacity, int shift) {
            int[] grown = new int[capacity];
            System.arraycopy(old, 0, grown, shift, old.length);
            return grown;
        }

        private static double[] grow(double[] old, int capacity, int shift) {
            double[] grown = new double[capacity];
            System.arraycopy(old, 0, grown, shift, old.length);
            return grown;
        }

        private static boolean[] grow(boolean[] old, int capacity, int shift) {
            boolean[] grown = new boolean[capacity];
            System.arraycopy(old, 0, grown, shift, old.length);
            return grown;
        }

        Optional<Series> snapshot(ProblemLog log) {
            if (!anyValue) {
                log.warn(0, 0, "series '" + name + "' has no values and was left out");
                return Optional.empty();
            }
            if (firstOutOfOrderLine > 0) {
                log.warn(firstOutOfOrderLine, 0, "rows of series '" + name + "' are not in time order; sorted them");
            }
            StrayPeriods.refuse(name, frequency, base, (int) (lowest - base), (int) (highest - base), stored, lines, log);
            int first = (int) (lowest - base);
            int size = (int) (highest - lowest + 1);
            double[] span = new double[size];
            for (int i = 0; i < size; i++) {
                span[i] = stored[first + i] ? values[first + i] : Double.NaN;
            }
            // Empty cells before the first or after the last value (months not yet published) are not part of the span.
            return Optional.of(Series.of(name, unit.isEmpty() && percent ? "%" : unit, new Period(frequency, lowest), span,
                    i -> flagSets.get(flagIds[first + i])).trimmed());
        }
    }
}
