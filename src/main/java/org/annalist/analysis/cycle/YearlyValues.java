package org.annalist.analysis.cycle;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.series.Frequency;
import org.annalist.series.Period;

/**
 * One value per calendar year, what a cycle is looked for in: the annual values themselves, or the
 * means over the calendar years the data cover completely. A partial first or last year is left
 * out (its mean would carry the season of the months it has); an interior year with a missing
 * value is filled by a straight line between its neighbours (both our rules).
 *
 * @param years  the calendar year of each value
 * @param values the yearly values, no missing ones
 */
public record YearlyValues(List<Integer> years, double[] values) {

    public YearlyValues {
        years = List.copyOf(years);
        values = values.clone();
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    /**
     * @param values one per period from {@code start}, NaN where missing
     * @return empty when the first or last complete year has a missing value, or no year is complete
     */
    public static Optional<YearlyValues> of(double[] values, Period start) {
        Frequency frequency = start.frequency();
        Period end = start.plus(values.length - 1);
        int[] yearOf = new int[values.length];   // each period's year, found once
        for (int i = 0; i < values.length; i++) {
            yearOf[i] = start.plus(i).year();
        }
        List<Integer> years = new ArrayList<>();
        List<Double> means = new ArrayList<>();
        for (int year = start.year(); year <= end.year(); year++) {
            double sum = 0;
            int n = 0;
            int expected = 0;
            for (int i = 0; i < values.length; i++) {
                if (yearOf[i] == year) {
                    expected++;
                    if (!Double.isNaN(values[i])) {
                        sum += values[i];
                        n++;
                    }
                }
            }
            boolean complete = expected >= fullYear(frequency);
            if (!complete && (year == start.year() || year == end.year())) {
                continue;   // a partial first or last year would bias its mean by season
            }
            years.add(year);
            means.add(n == 0 || n < expected ? Double.NaN : sum / n);
        }
        double[] yearly = means.stream().mapToDouble(Double::doubleValue).toArray();
        return fillInterior(yearly) ? Optional.of(new YearlyValues(years, yearly)) : Optional.empty();
    }

    /** Periods of a complete calendar year (weeks and days vary; the lower count is enough: our rule). */
    private static int fullYear(Frequency frequency) {
        return switch (frequency) {
            case ANNUAL -> 1;
            case HALF_YEARLY -> 2;
            case QUARTERLY -> 4;
            case MONTHLY -> 12;
            case WEEKLY -> 52;
            case DAILY -> 365;
            case BUSINESS_DAILY -> 260;
        };
    }

    /** Fills interior NaN linearly; false when the ends are missing or nothing is left. */
    private static boolean fillInterior(double[] x) {
        if (x.length == 0 || Double.isNaN(x[0]) || Double.isNaN(x[x.length - 1])) {
            return false;
        }
        int last = 0;
        for (int t = 1; t < x.length; t++) {
            if (!Double.isNaN(x[t])) {
                for (int g = last + 1; g < t; g++) {
                    x[g] = x[last] + (x[t] - x[last]) * (g - last) / (t - last);
                }
                last = t;
            }
        }
        return true;
    }
}
