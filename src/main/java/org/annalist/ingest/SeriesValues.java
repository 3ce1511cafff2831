package org.annalist.ingest;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.LongConsumer;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.series.ValueFlag;

/**
 * The values of one series as the file gives them, in primitive arrays that grow as rows arrive:
 * memory follows the values kept (about 20 bytes a value), not the text they were read from. Once
 * the file is read and its periods settled, {@link #assemble} checks for repeated periods and rows
 * out of time order and makes the {@link Series}.
 */
final class SeriesValues {

    /**
     * The period keys (then, once settled, the period indexes) and lines of the cells of a series in
     * the order of the file. The series of a wide file share one: a row gives each of them a cell.
     */
    static final class Axis {
        private long[] keys;
        private int[] lines;
        private int size;

        Axis(int capacity) {
            keys = new long[Math.max(16, capacity)];
            lines = new int[keys.length];
        }

        int add(long key, int line) {
            if (size == keys.length) {
                int grown = grown(size);
                keys = Arrays.copyOf(keys, grown);
                lines = Arrays.copyOf(lines, grown);
            }
            keys[size] = key;
            lines[size] = line;
            return size++;
        }

        void forEachKey(LongConsumer each) {
            for (int i = 0; i < size; i++) {
                each.accept(keys[i]);
            }
        }

        /** Turns every key made by {@link PeriodColumn#keyOf} into the index of its period. */
        void identity() {
            for (int i = 0; i < size; i++) {
                keys[i] = PeriodColumn.indexOf(keys[i]);
            }
        }

        /** Turns every key into the index of its period ({@link PeriodColumn#NONE} for a cell set aside). */
        void settle(PeriodColumn.Settled periods) {
            for (int i = 0; i < size; i++) {
                keys[i] = periods.periodIndex(keys[i]);
            }
        }
    }

    private final String name;
    private final String unit;
    private final Axis axis;
    private final int column;
    private double[] values;
    private int size;
    private int[] columns;   // the cell's column in the file, where it is not {@code column}
    private int[] flagIds;   // made when the first flag arrives
    private final List<Set<ValueFlag>> flagSets = new ArrayList<>(List.of(Set.of()));
    private final Map<Set<ValueFlag>, Integer> flagSetIds = new HashMap<>(Map.of(Set.of(), 0));
    private int[] otherAt = new int[0];
    private double[] otherValue = new double[0];
    private int others;
    private boolean percent;

    private final boolean ownAxis;

    /**
     * @param column  the 1-based column of the series' cells in the file, for messages
     * @param ownAxis whether the axis is this series' alone (let go once the series is made)
     */
    SeriesValues(String name, String unit, Axis axis, boolean ownAxis, int column, int capacity) {
        this.ownAxis = ownAxis;
        this.name = name;
        this.unit = unit;
        this.axis = axis;
        this.column = column;
        values = new double[Math.max(16, capacity)];
    }

    Axis axis() {
        return axis;
    }

    /** Adds the next cell (the one at the axis' next place): {@code NaN} for a missing or unreadable value. */
    void add(double value, Set<ValueFlag> flags, boolean isPercent, int sourceColumn) {
        if (size == values.length) {
            int grown = grown(size);
            values = Arrays.copyOf(values, grown);
            columns = columns == null ? null : Arrays.copyOf(columns, grown);
            flagIds = flagIds == null ? null : Arrays.copyOf(flagIds, grown);
        }
        values[size] = value;
        percent |= isPercent;
        if (sourceColumn != column) {
            if (columns == null) {
                columns = new int[values.length];
                Arrays.fill(columns, 0, size, column);
            }
        }
        if (columns != null) {
            columns[size] = sourceColumn;
        }
        if (!flags.isEmpty() || flagIds != null) {
            if (flagIds == null) {
                flagIds = new int[values.length];
            }
            flagIds[size] = flagSetIds.computeIfAbsent(flags, f -> {
                flagSets.add(f);
                return flagSets.size() - 1;
            });
        }
        size++;
    }

    /** The reading of the cell just added with the other decimal mark, taken if the file turns out to use that mark. */
    void other(double value) {
        if (others == otherAt.length) {
            otherAt = Arrays.copyOf(otherAt, grown(others));
            otherValue = Arrays.copyOf(otherValue, otherAt.length);
        }
        otherAt[others] = size - 1;
        otherValue[others++] = value;
    }

    /** Reads every cell that depended on the decimal mark with the other mark. */
    void takeOtherReadings() {
        for (int k = 0; k < others; k++) {
            values[otherAt[k]] = otherValue[k];
        }
    }

    /**
     * The series, once the axis holds period indexes: each period once (a repeat is an error naming
     * both lines), sorted into time order (with a warning when the rows were not), without the
     * missing periods before the first value and after the last. Empty (with a warning) when every
     * value is missing. The arrays are let go.
     */
    Optional<Series> assemble(Frequency frequency, ProblemLog log) {
        long[] periods = axis.keys;
        long low = Long.MAX_VALUE;
        long high = Long.MIN_VALUE;
        for (int i = 0; i < size; i++) {
            if (periods[i] != PeriodColumn.NONE) {
                low = Math.min(low, periods[i]);
                high = Math.max(high, periods[i]);
            }
        }
        if (low > high) {
            return Optional.empty();   // no cell with a period: each was reported
        }
        if (high - low + 1 > Integer.MAX_VALUE - 16) {
            throw log.fatal(0, 0, "series '" + name + "' spans more than " + (Integer.MAX_VALUE - 16)
                    + " periods; expected a shorter span");
        }
        int span = (int) (high - low + 1);
        int[] claimedBy = new int[span];
        int[] claimedColumn = new int[span];
        double[] slots = new double[span];
        Arrays.fill(slots, Double.NaN);
        int[] slotFlags = flagIds == null ? null : new int[span];
        long previous = PeriodColumn.NONE;
        int firstOutOfOrderLine = 0;
        boolean anyValue = false;
        for (int i = 0; i < size; i++) {
            long p = periods[i];
            if (p == PeriodColumn.NONE) {
                continue;   // already reported
            }
            int slot = (int) (p - low);
            int line = axis.lines[i];
            int cellColumn = columns == null ? column : columns[i];
            if (claimedBy[slot] != 0) {
                log.error(line, cellColumn, "period " + new Period(frequency, p)
                        + " appears again for series '" + name + "' (first " + firstAt(log, claimedBy[slot], claimedColumn[slot])
                        + "); expected one row per period");
                continue;
            }
            claimedBy[slot] = Math.max(line, 1);
            claimedColumn[slot] = cellColumn;
            if (previous != PeriodColumn.NONE && p < previous && firstOutOfOrderLine == 0) {
                firstOutOfOrderLine = line;
            }
            previous = p;
            anyValue |= !Double.isNaN(values[i]);
            slots[slot] = values[i];
            if (slotFlags != null) {
                slotFlags[slot] = flagIds[i];
            }
        }
        values = null;
        flagIds = null;
        columns = null;
        if (ownAxis) {
            axis.keys = null;   // let go before the next series is made: the reading and the series do not add up
            axis.lines = null;
        }
        if (!anyValue) {
            log.warn(0, 0, "series '" + name + "' has no values and was left out");
            return Optional.empty();
        }
        if (firstOutOfOrderLine > 0) {
            log.warn(firstOutOfOrderLine, 0, "rows of series '" + name + "' are not in time order; sorted them");
        }
        boolean[] stored = new boolean[span];
        for (int slot = 0; slot < span; slot++) {
            stored[slot] = !Double.isNaN(slots[slot]);
        }
        StrayPeriods.refuse(name, frequency, low, 0, span - 1, stored, claimedBy, log.inSheet() ? claimedColumn : null, log);
        // Empty cells before the first or after the last value (months not yet published) are not part of the span.
        return Optional.of(Series.of(name, unit.isEmpty() && percent ? "%" : unit, new Period(frequency, low), slots,
                i -> slotFlags == null ? Set.of() : flagSets.get(slotFlags[i])).trimmed());
    }

    /** {@code on line 4} in a text file, {@code in cell B4} in a sheet. */
    static String firstAt(ProblemLog log, int line, int column) {
        return log.inSheet() ? "in " + log.where(line, column) : "on " + log.where(line);
    }

    private static int grown(int length) {
        long grown = length + (long) length / 2 + 16;
        if (grown > Integer.MAX_VALUE - 16) {
            throw new IllegalStateException("more than " + (Integer.MAX_VALUE - 16) + " cells in one series");
        }
        return (int) grown;
    }
}
