package org.annalist.series;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.function.IntFunction;

/**
 * An immutable, regularly spaced time series: consecutive periods from {@link #start()}, one value
 * each, {@code NaN} where the value is missing, and the flags the publisher attached to each value.
 *
 * <p>Built with {@link SeriesBuilder}; arrays handed out are copies.
 */
public final class Series {

    private final String name;
    private final String unit;
    private final Period start;
    private final double[] values;
    private final int[] flagBits;

    Series(String name, String unit, Period start, double[] values, int[] flagBits) {
        this.name = Objects.requireNonNull(name, "name");
        this.unit = unit == null ? "" : unit;
        this.start = Objects.requireNonNull(start, "start");
        if (values.length == 0) {
            throw new IllegalArgumentException("a series needs at least one period");
        }
        if (flagBits.length != values.length) {
            throw new IllegalArgumentException("one flag set per value is required");
        }
        for (double v : values) {
            if (Double.isInfinite(v)) {
                throw new IllegalArgumentException("values must be finite or NaN (missing), not " + v);
            }
        }
        this.values = values;
        this.flagBits = flagBits;
    }

    /**
     * Consecutive values from {@code start} (missing as {@code NaN}), with the flags of each: what a
     * reader that collects many values in arrays builds at once. The values are copied.
     */
    public static Series of(String name, String unit, Period start, double[] values, IntFunction<Set<ValueFlag>> flagsAt) {
        int[] bits = new int[values.length];
        for (int i = 0; i < bits.length; i++) {
            bits[i] = ValueFlag.toBits(flagsAt.apply(i));
        }
        return new Series(name, unit, start, values.clone(), bits);
    }

    public static SeriesBuilder builder(String name, Frequency frequency) {
        return new SeriesBuilder(name, frequency);
    }

    public String name() {
        return name;
    }

    /** Unit of measurement as given by the source (e.g. {@code nights}); empty when unknown. */
    public String unit() {
        return unit;
    }

    public Frequency frequency() {
        return start.frequency();
    }

    public Period start() {
        return start;
    }

    public Period end() {
        return start.plus(values.length - 1L);
    }

    /** Number of periods from start to end, missing ones included. */
    public int size() {
        return values.length;
    }

    public Period period(int i) {
        Objects.checkIndex(i, values.length);
        return start.plus(i);
    }

    /** Position of {@code period} in this series, or -1 when it lies outside the span. */
    public int indexOf(Period period) {
        long offset = start.until(period);
        return offset < 0 || offset >= values.length ? -1 : (int) offset;
    }

    /** The value at {@code i}; {@code NaN} when missing. */
    public double value(int i) {
        return values[i];
    }

    public boolean isMissing(int i) {
        return Double.isNaN(values[i]);
    }

    /** A copy of all values, {@code NaN} for missing. */
    public double[] values() {
        return values.clone();
    }

    public Set<ValueFlag> flags(int i) {
        return ValueFlag.fromBits(flagBits[i]);
    }

    public int missingCount() {
        int missing = 0;
        for (double v : values) {
            if (Double.isNaN(v)) {
                missing++;
            }
        }
        return missing;
    }

    public List<Period> missingPeriods() {
        List<Period> missing = new ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            if (Double.isNaN(values[i])) {
                missing.add(period(i));
            }
        }
        return List.copyOf(missing);
    }

    /** Periods that carry {@code flag}, in time order. */
    public List<Period> periodsFlagged(ValueFlag flag) {
        int bit = 1 << flag.ordinal();
        List<Period> flagged = new ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            if ((flagBits[i] & bit) != 0) {
                flagged.add(period(i));
            }
        }
        return List.copyOf(flagged);
    }

    /**
     * Without the missing periods before the first value and after the last.
     *
     * @throws IllegalStateException when every value is missing
     */
    public Series trimmed() {
        int first = 0;
        while (first < values.length && Double.isNaN(values[first])) {
            first++;
        }
        if (first == values.length) {
            throw new IllegalStateException("series " + name + " has no values");
        }
        int last = values.length - 1;
        while (Double.isNaN(values[last])) {
            last--;
        }
        if (first == 0 && last == values.length - 1) {
            return this;
        }
        return new Series(name, unit, start.plus(first), Arrays.copyOfRange(values, first, last + 1),
                Arrays.copyOfRange(flagBits, first, last + 1));
    }

    /** The series up to and including {@code last}: what a brief of that period sees. */
    public Series upTo(Period last) {
        int i = indexOf(last);
        if (i < 0) {
            throw new IllegalArgumentException(last + " is not within " + start + " to " + end());
        }
        return new Series(name, unit, start, Arrays.copyOf(values, i + 1), Arrays.copyOf(flagBits, i + 1));
    }

    /** The period labelled {@code label} (as {@link Period#label()} writes it), if the series spans it. */
    public java.util.Optional<Period> periodLabelled(String label) {
        for (int i = 0; i < values.length; i++) {
            if (period(i).label().equals(label)) {
                return java.util.Optional.of(period(i));
            }
        }
        return java.util.Optional.empty();
    }

    /** The same values under another name and unit. */
    public Series renamed(String newName, String newUnit) {
        return new Series(newName, newUnit, start, values, flagBits);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Series other
                && name.equals(other.name)
                && unit.equals(other.unit)
                && start.equals(other.start)
                && Arrays.equals(values, other.values)
                && Arrays.equals(flagBits, other.flagBits);
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, unit, start, Arrays.hashCode(values));
    }

    @Override
    public String toString() {
        return "Series[" + name + ", " + frequency() + ", " + start + " to " + end() + ", " + size() + " periods]";
    }
}
