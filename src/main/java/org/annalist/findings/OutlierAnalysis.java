package org.annalist.findings;

import java.util.ArrayList;
import java.util.List;
import org.annalist.analysis.anomaly.RemainderOutliers;
import org.annalist.series.Series;

/**
 * The outliers finding: robust scores of the decomposition's remainder (robust STL, whose weights
 * keep outliers out of the seasonal profile), isolated periods only, and none that a structural
 * break explains (the two periods before a break's first period and the first one after it,
 * where a smoother lags behind a jump).
 */
final class OutlierAnalysis {

    private OutlierAnalysis() {
    }

    /** Candidates before the break search. */
    static List<RemainderOutliers.Outlier> candidates(double[] remainder, int period) {
        return RemainderOutliers.find(remainder, DecisionRules.OUTLIER_SCORE, period);
    }

    /** Values kept out of the break search: the candidates and the values of unusual stretches. */
    static List<RemainderOutliers.Outlier> screened(double[] remainder) {
        return RemainderOutliers.flagged(remainder, DecisionRules.OUTLIER_SCORE);
    }

    /** Stretches with many unusual values, which are not reported as outliers. */
    static List<Caveat> stretchNotes(Series series, double[] remainder, int period) {
        return RemainderOutliers.unusualStretches(remainder, DecisionRules.OUTLIER_SCORE, period).stream()
                .<Caveat>map(s -> new Caveat.UnusualStretch(series.period(s.from()), series.period(s.to())))
                .toList();
    }

    /**
     * @param expectedWorking trend-cycle plus seasonal effect on the working scale
     */
    static List<OutlierFinding> of(Series series, List<RemainderOutliers.Outlier> candidates, double[] expectedWorking,
                                   boolean log, List<BreakFinding> breaks) {
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
                    observed >= expected ? Side.ABOVE : Side.BELOW, deviation, o.index()));
        }
        return List.copyOf(outliers);
    }
}
