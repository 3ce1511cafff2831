package org.annalist.findings;

import java.util.ArrayList;
import java.util.List;
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
    static List<RemainderOutliers.Outlier> candidates(double[] remainder, int period) {
        return RemainderOutliers.find(remainder, DecisionRules.OUTLIER_SCORE, period);
    }

    /**
     * Values kept out of the break search: the candidates and the values of unusual stretches, but
     * not those just before a shift (a run of {@link DecisionRules#OUTLIER_SHIFT_RUN} or more
     * same-signed flags): there the smoother lags behind the jump, the flags are the jump's own, and
     * putting another value in their place would blur the very step the search looks for (the
     * window of {@link DecisionRules#OUTLIER_QUIET_BEFORE_BREAK}; our rule).
     */
    static List<RemainderOutliers.Outlier> screened(double[] remainder) {
        double[] z = RemainderOutliers.scores(remainder);
        List<Integer> shiftStarts = new ArrayList<>();
        int t = 0;
        while (t < z.length) {
            int end = t;
            while (flag(z, t) && end + 1 < z.length && flag(z, end + 1) && Math.signum(z[end + 1]) == Math.signum(z[t])) {
                end++;
            }
            if (end - t + 1 >= DecisionRules.OUTLIER_SHIFT_RUN) {
                shiftStarts.add(t);
            }
            t = end + 1;
        }
        return RemainderOutliers.flagged(remainder, DecisionRules.OUTLIER_SCORE).stream()
                .filter(o -> shiftStarts.stream().noneMatch(s -> o.index() < s
                        && o.index() >= s - DecisionRules.OUTLIER_QUIET_BEFORE_BREAK))
                .toList();
    }

    private static boolean flag(double[] z, int t) {
        return !Double.isNaN(z[t]) && Math.abs(z[t]) >= DecisionRules.OUTLIER_SCORE;
    }

    /** Stretches with many unusual values, which are not reported as outliers. */
    static List<Caveat> stretchNotes(Series series, double[] remainder, int period) {
        return RemainderOutliers.unusualStretches(remainder, DecisionRules.OUTLIER_SCORE, period).stream()
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
