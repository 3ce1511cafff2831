package org.annalist.findings;

import java.util.ArrayList;
import java.util.List;
import org.annalist.analysis.cycle.CycleDetector;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * The cycle finding, on one value per year: the annual values themselves, or for sub-annual data
 * the yearly means of the seasonally adjusted values (working scale) over the calendar years the
 * data cover completely. Interior missing years are filled by straight lines between their
 * neighbours for the periodogram.
 */
final class CycleAnalysis {

    private CycleAnalysis() {
    }

    static CycleFinding of(Series series, double[] workingAdjusted) {
        List<Integer> years = new ArrayList<>();
        double[] yearly = yearly(series, workingAdjusted, years);
        if (yearly == null) {
            return new CycleFinding(false, null, "years", List.of(), List.of(), false, "too few complete years", null, null);
        }
        CycleDetector.Result r = CycleDetector.detect(yearly);
        List<String> peaks = r.present() ? r.peaks().stream().map(i -> String.valueOf(years.get(i))).toList() : List.of();
        return new CycleFinding(r.present(), r.present() ? Numbers.orNull(r.length()) : null, "years", peaks,
                r.present() ? r.gaps() : List.of(), r.present() && r.regular(), r.reason(),
                Numbers.orNull(r.spectralPeriod()), Numbers.orNull(r.pValue()));
    }

    private static double[] yearly(Series series, double[] values, List<Integer> years) {
        List<Double> means = new ArrayList<>();
        int firstYear = series.start().year();
        int lastYear = series.end().year();
        for (int year = firstYear; year <= lastYear; year++) {
            double sum = 0;
            int n = 0;
            int expected = 0;
            for (int i = 0; i < series.size(); i++) {
                Period p = series.period(i);
                if (p.year() == year) {
                    expected++;
                    if (!Double.isNaN(values[i])) {
                        sum += values[i];
                        n++;
                    }
                }
            }
            boolean complete = expected >= fullYear(series.frequency());
            if (!complete && (year == firstYear || year == lastYear)) {
                continue;   // a partial first or last year would bias its mean by season
            }
            years.add(year);
            means.add(n == 0 || n < expected ? Double.NaN : sum / n);
        }
        double[] yearly = means.stream().mapToDouble(Double::doubleValue).toArray();
        if (!fillInterior(yearly)) {
            return null;
        }
        return yearly;
    }

    /** Periods of a complete calendar year (weeks and days vary; the lower count is enough). */
    private static int fullYear(Frequency frequency) {
        return switch (frequency) {
            case ANNUAL -> 1;
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
