package org.annalist.findings;

import java.util.ArrayList;
import java.util.List;
import org.annalist.analysis.OrderStatistics;
import org.annalist.analysis.anomaly.RemainderOutliers;
import org.annalist.series.Series;

/**
 * The outliers finding: robust scores of the decomposition's remainder (robust STL, whose weights
 * keep outliers out of the seasonal profile), isolated periods only, and none that a structural
 * break explains (the two periods before a break's first period and the first one after it,
 * where a smoother lags behind a jump). The remainder is searched after the significant calendar
 * effects are taken out of it, so a month the calendar explains is not flagged, and a flagged month
 * names the calendar effect its expected value allows for.
 */
final class OutlierAnalysis {

    private OutlierAnalysis() {
    }

    /** Candidates before the break search. */
    static List<RemainderOutliers.Outlier> candidates(double[] remainder, int period, double spreadRatio) {
        return RemainderOutliers.find(remainder, DecisionRules.OUTLIER_SCORE * spreadRatio, period).stream()
                .map(o -> new RemainderOutliers.Outlier(o.index(), o.score() / spreadRatio)).toList();
    }

    /** Values kept out of the break search: the candidates and the values of unusual stretches. */
    static List<RemainderOutliers.Outlier> screened(double[] remainder, double spreadRatio) {
        return RemainderOutliers.flagged(remainder, DecisionRules.OUTLIER_SCORE * spreadRatio);
    }

    /**
     * How much wider the remainder's spread (MAD) is with the calendar left in than without it, at
     * least 1. Robust scores of the calendar-free remainder are divided by it, so that they are on
     * the scale at which {@link DecisionRules#OUTLIER_SCORE} was set (the injection study scored
     * remainders with the calendar in them): taking the calendar out can then explain a flag away,
     * but cannot make new ones by narrowing the scale (our rule).
     */
    static double spreadRatio(double[] calendarFree, double[] withCalendar) {
        double free = mad(calendarFree);
        double with = mad(withCalendar);
        return free > 0 && with > free ? with / free : 1;
    }

    private static double mad(double[] x) {
        double[] present = java.util.Arrays.stream(x).filter(v -> !Double.isNaN(v)).toArray();
        if (present.length < 3) {
            return Double.NaN;
        }
        double median = OrderStatistics.median(present);
        double[] d = new double[present.length];
        for (int i = 0; i < d.length; i++) {
            d[i] = Math.abs(present[i] - median);
        }
        return OrderStatistics.median(d);
    }

    /** Stretches with many unusual values, which are not reported as outliers. */
    static List<Caveat> stretchNotes(Series series, double[] remainder, int period, double spreadRatio) {
        return RemainderOutliers.unusualStretches(remainder, DecisionRules.OUTLIER_SCORE * spreadRatio, period).stream()
                .<Caveat>map(s -> new Caveat.UnusualStretch(series.period(s.from()), series.period(s.to())))
                .toList();
    }

    /**
     * @param expectedWorking trend-cycle plus seasonal effect plus the significant calendar effects,
     *                        on the working scale
     * @param calendar        the calendar effects, estimated before the outliers were searched for
     */
    static List<OutlierFinding> of(Series series, List<RemainderOutliers.Outlier> candidates, double[] expectedWorking,
                                   boolean log, List<BreakFinding> breaks, CalendarAnalysis.Fit calendar) {
        List<OutlierFinding> outliers = new ArrayList<>();
        for (RemainderOutliers.Outlier o : candidates) {
            boolean nearBreak = breaks.stream().anyMatch(b -> o.index() >= b.index() - DecisionRules.OUTLIER_QUIET_BEFORE_BREAK
                    && o.index() < b.index() + DecisionRules.OUTLIER_QUIET_FROM_BREAK);
            if (nearBreak || Double.isNaN(expectedWorking[o.index()])) {
                continue;
            }
            double observed = series.value(o.index());
            double expected = log ? Math.exp(expectedWorking[o.index()]) : expectedWorking[o.index()];
            double deviation = expected == 0 ? Double.NaN : 100 * (observed - expected) / Math.abs(expected);
            if (Math.abs(deviation) < DecisionRules.MIN_OUTLIER_DEVIATION_PCT) {
                continue;   // a tiny remainder scale makes a tiny deviation look large; it is no outlier
            }
            outliers.add(new OutlierFinding(series.period(o.index()), observed, expected, o.score(),
                    observed >= expected ? Side.ABOVE : Side.BELOW, CalendarAnalysis.allowance(series, calendar, o.index(),
                    log, expectedWorking[o.index()] - calendar.part(o.index())).orElse(null), deviation, o.index()));
        }
        return List.copyOf(outliers);
    }
}
