package org.annalist.findings;

import java.util.ArrayList;
import java.util.List;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * Whether the parts of a multi-series brief add up to the total declared for them, period by
 * period. Published tables are rounded and revised at different times, so a gap up to
 * {@value #TOLERANCE_PCT} % of the total is accepted (common practice, no source). A period where
 * a part or the total is missing cannot be judged; it is not passed over in silence but kept, with
 * the names of what was missing, in {@link #unchecked()}, so that the brief states exactly what it
 * checked.
 *
 * @param periods       the periods where the parts miss the total by more than the tolerance, oldest first
 * @param largestGapPct the largest such gap, in % of the total (0 when none; a gap against a total
 *                      of zero has no percentage and is left out of it)
 * @param checked       how many periods had the total and every part, and so were checked
 * @param gaps          for each period in {@code periods}, the sum of the parts against the total
 * @param unchecked     the periods that could not be checked, as runs of consecutive periods with
 *                      the same series missing, oldest first
 */
public record PartsCheck(String total, List<String> parts, List<Period> periods, double largestGapPct,
                         int checked, List<Gap> gaps, List<Unchecked> unchecked) {

    public static final double TOLERANCE_PCT = 0.5;

    public PartsCheck {
        parts = List.copyOf(parts);
        periods = List.copyOf(periods);
        gaps = List.copyOf(gaps);
        unchecked = List.copyOf(unchecked);
    }

    /**
     * One period where the parts miss the total.
     *
     * @param gapPct {@code (sum − total) / |total|} in %, signed (parts above the total: positive);
     *               {@code NaN} when the total is zero
     */
    public record Gap(Period period, double sum, double total, double gapPct) {

        public double gap() {
            return sum - total;
        }
    }

    /**
     * Consecutive periods, {@code from} to {@code to} (equal for one period), that could not be
     * checked because the series named in {@code missing} (the total first if it is among them)
     * had no value there.
     */
    public record Unchecked(Period from, Period to, List<String> missing) {

        public Unchecked {
            missing = List.copyOf(missing);
        }

        public long length() {
            return from.until(to) + 1;
        }
    }

    /** No checked period misses the total; says nothing about the periods that could not be checked. */
    public boolean consistent() {
        return periods.isEmpty();
    }

    /** Every period from the earliest to the latest of the series had all values and was checked. */
    public boolean complete() {
        return unchecked.isEmpty();
    }

    /** How many periods could not be checked. */
    public long uncheckedCount() {
        return unchecked.stream().mapToLong(Unchecked::length).sum();
    }

    public static PartsCheck of(Series total, List<Series> parts) {
        Period first = total.start();
        Period last = total.end();
        for (Series part : parts) {
            first = part.start().compareTo(first) < 0 ? part.start() : first;
            last = part.end().compareTo(last) > 0 ? part.end() : last;
        }
        List<Gap> gaps = new ArrayList<>();
        List<Unchecked> unchecked = new ArrayList<>();
        double largest = 0;
        int checked = 0;
        for (Period p = first; p.compareTo(last) <= 0; p = p.plus(1)) {
            List<String> missing = new ArrayList<>();
            double totalValue = valueAt(total, p);
            if (Double.isNaN(totalValue)) {
                missing.add(total.name());
            }
            double sum = 0;
            for (Series part : parts) {
                double v = valueAt(part, p);
                if (Double.isNaN(v)) {
                    missing.add(part.name());
                }
                sum += v;
            }
            if (!missing.isEmpty()) {
                addUnchecked(unchecked, p, missing);
                continue;
            }
            checked++;
            if (totalValue == 0) {
                if (sum != 0) {
                    gaps.add(new Gap(p, sum, totalValue, Double.NaN));
                }
                continue;
            }
            double gapPct = 100 * (sum - totalValue) / Math.abs(totalValue);
            if (Math.abs(gapPct) > TOLERANCE_PCT) {
                gaps.add(new Gap(p, sum, totalValue, gapPct));
                largest = Math.max(largest, Math.abs(gapPct));
            }
        }
        return new PartsCheck(total.name(), parts.stream().map(Series::name).toList(),
                gaps.stream().map(Gap::period).toList(), largest, checked, gaps, unchecked);
    }

    private static double valueAt(Series series, Period p) {
        int i = series.indexOf(p);
        return i < 0 ? Double.NaN : series.value(i);
    }

    /** Extends the last run when it ends just before {@code p} with the same series missing. */
    private static void addUnchecked(List<Unchecked> runs, Period p, List<String> missing) {
        if (!runs.isEmpty()) {
            Unchecked previous = runs.get(runs.size() - 1);
            if (previous.to().plus(1).equals(p) && previous.missing().equals(missing)) {
                runs.set(runs.size() - 1, new Unchecked(previous.from(), p, missing));
                return;
            }
        }
        runs.add(new Unchecked(p, p, missing));
    }
}
