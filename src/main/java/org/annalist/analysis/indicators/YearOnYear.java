package org.annalist.analysis.indicators;

import java.util.Optional;
import org.annalist.series.Frequency;
import org.annalist.series.Series;

/**
 * The change of a value against the same period one year earlier, the headline comparison of
 * monthly visitor statistics (common practice in official tourism releases; no source).
 */
public final class YearOnYear {

    /**
     * @param percent change in % of the year-earlier value; {@code NaN} when that value is zero
     */
    public record Change(double current, double yearEarlier, double absolute, double percent) {
    }

    private YearOnYear() {
    }

    /**
     * Periods back to "the same period last year": 1 year, 2 half-years (the same half),  4 quarters, 12 months, 52 weeks, 364 days
     * (52 weeks, so that a Saturday is compared with a Saturday) or 260 business days (52 weeks of
     * five); the choices for weeks and days are our rules.
     */
    public static int lag(Frequency frequency) {
        return switch (frequency) {
            case ANNUAL -> 1;
            case HALF_YEARLY -> 2;
            case QUARTERLY -> 4;
            case MONTHLY -> 12;
            case WEEKLY -> 52;
            case DAILY -> 364;
            case BUSINESS_DAILY -> 260;
        };
    }

    /** The change at position {@code i}; empty when either value is missing or lies before the series. */
    public static Optional<Change> at(Series series, int i) {
        int earlier = i - lag(series.frequency());
        if (earlier < 0 || series.isMissing(i) || series.isMissing(earlier)) {
            return Optional.empty();
        }
        double now = series.value(i);
        double then = series.value(earlier);
        double percent = then == 0 ? Double.NaN : 100.0 * (now - then) / Math.abs(then);
        return Optional.of(new Change(now, then, now - then, percent));
    }
}
