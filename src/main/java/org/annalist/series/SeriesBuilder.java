package org.annalist.series;

import java.util.Arrays;
import java.util.Objects;
import java.util.Set;
import java.util.TreeMap;

/**
 * Collects values for periods in any order and takes an immutable {@link Series} snapshot: the
 * span from the earliest to the latest period, periods without a value as missing.
 */
public final class SeriesBuilder {

    private record Entry(double value, int flagBits) {
    }

    private final String name;
    private final Frequency frequency;
    private final TreeMap<Period, Entry> entries = new TreeMap<>();
    private String unit = "";

    SeriesBuilder(String name, Frequency frequency) {
        this.name = Objects.requireNonNull(name, "name");
        this.frequency = Objects.requireNonNull(frequency, "frequency");
    }

    public SeriesBuilder unit(String unit) {
        this.unit = unit == null ? "" : unit;
        return this;
    }

    /**
     * Records the value of one period ({@code NaN} for a period known to be missing).
     *
     * @throws IllegalArgumentException if the period is of another frequency or already has a value
     */
    public SeriesBuilder put(Period period, double value, Set<ValueFlag> flags) {
        if (period.frequency() != frequency) {
            throw new IllegalArgumentException(
                    "series " + name + " is " + frequency + " but period " + period + " is " + period.frequency());
        }
        if (entries.containsKey(period)) {
            throw new IllegalArgumentException("series " + name + " already has a value for " + period);
        }
        entries.put(period, new Entry(value, ValueFlag.toBits(flags)));
        return this;
    }

    public SeriesBuilder put(Period period, double value) {
        return put(period, value, Set.of());
    }

    /** Appends {@code values} to the periods after the latest one so far (from {@code start} when empty). */
    public SeriesBuilder append(Period start, double... values) {
        Period next = entries.isEmpty() ? start : entries.lastKey().plus(1);
        for (double v : values) {
            put(next, v);
            next = next.plus(1);
        }
        return this;
    }

    public boolean isEmpty() {
        return entries.isEmpty();
    }

    /** @throws IllegalStateException when no period has been put */
    public Series snapshot() {
        if (entries.isEmpty()) {
            throw new IllegalStateException("series " + name + " has no periods");
        }
        Period first = entries.firstKey();
        int size = Math.toIntExact(first.until(entries.lastKey()) + 1);
        double[] values = new double[size];
        int[] flags = new int[size];
        Arrays.fill(values, Double.NaN);
        entries.forEach((period, entry) -> {
            int i = (int) first.until(period);
            values[i] = entry.value();
            flags[i] = entry.flagBits();
        });
        return new Series(name, unit, first, values, flags);
    }
}
