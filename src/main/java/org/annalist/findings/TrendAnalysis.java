package org.annalist.findings;

import java.util.List;
import java.util.Optional;
import org.annalist.analysis.trend.MannKendall;
import org.annalist.analysis.trend.SeasonalKendall;
import org.annalist.analysis.trend.SenSlope;
import org.annalist.series.Series;

/**
 * The trend finding: Mann–Kendall with its variance corrected for serial correlation, on the
 * seasonally adjusted values when the series has a seasonal pattern (the raw values otherwise),
 * Sen's slope with the Gilbert interval from the same corrected variance, and for seasonal
 * series the seasonal Kendall test on the observed values beside it.
 */
final class TrendAnalysis {

    /** Longer series are averaged over blocks first: the tests are O(n²) (our rule, it keeps 20 years of days under a second). */
    static final int MAX_VALUES = 600;

    private TrendAnalysis() {
    }

    /**
     * @param regimeStart first index of the latest regime after structural breaks (0 when none)
     * @param measure     the slope is also given as % of the mean level only where changes can be
     *                    read as % ({@link Measure#relativeChanges()}): a rate's slope is in points,
     *                    a temperature's in degrees
     * @param log         the series is worked in logs: the latest regime's rate in % is then a
     *                    compound rate, from Sen's slope of the logs
     */
    static TrendFinding of(Series series, double[] adjusted, boolean seasonal, double[] observed, int regimeStart,
                           Measure measure, boolean log, List<Caveat> notes) {
        int present = 0;
        for (double v : adjusted) {
            present += Double.isNaN(v) ? 0 : 1;
        }
        if (present < DecisionRules.MIN_VALUES_FOR_TREND) {
            notes.add(new Caveat.TooShortForTrend());
            return TrendFinding.notAssessed();
        }
        int block = (int) Math.ceil(adjusted.length / (double) MAX_VALUES);
        double[] values = block > 1 ? blockMeans(adjusted, block) : adjusted;
        SenSlope.Pairwise slopes = SenSlope.pairwise(values);
        MannKendall.Result mk = MannKendall.test(values, MannKendall.Correction.AR1_RANKS, gapFree(values)
                ? slopes.medianPerStep() : Double.NaN);
        double periodsPerYear = series.frequency().periodsPerYear() / block;
        SenSlope.Result sen = slopes.estimate(periodsPerYear, mk.varianceUsed());
        // % of the level means nothing for a series that reaches zero or below (a net balance, say)
        boolean positive = measure.relativeChanges() && java.util.Arrays.stream(observed).filter(v -> !Double.isNaN(v)).allMatch(v -> v > 0);
        double level = positive ? Analyst.meanOf(observed) : 0;
        Optional<TrendFinding.Evidence> seasonalKendall = !seasonal ? Optional.empty()
                : SeasonalKendall.test(observed, series.frequency().seasonalPeriod())
                .map(sk -> new TrendFinding.Evidence(TestName.of(sk.test().method()), sk.test().statistic(),
                        sk.test().pValue()));
        return new TrendFinding(direction(mk), new TrendFinding.Test(TestName.of(mk.test().method()), seasonal, block),
                mk.test().statistic(), mk.test().pValue(), sen.perYear(), List.of(sen.lower95(), sen.upper95()),
                level == 0 ? null : 100 * sen.perYear() / Math.abs(level), seasonalKendall, mk.test().n(),
                latestRegime(series, adjusted, regimeStart, positive, log));
    }

    /**
     * The same test and slope over the latest regime, when there is one with enough values, with
     * the regime's rate in %: for a series worked in logs the compound rate exp(b) − 1 of Sen's
     * slope b of the logs (growth at a steady rate is a straight line there, and the breaks' lines
     * are read the same way), else Sen's slope as % of the latest year's average observed level.
     *
     * @param inPercent whether changes are read as % and every value is positive
     */
    private static Optional<TrendFinding.LatestRegime> latestRegime(Series series, double[] adjusted,
                                                                    int regimeStart, boolean inPercent, boolean log) {
        if (regimeStart <= 0) {
            return Optional.empty();
        }
        double[] regime = java.util.Arrays.copyOfRange(adjusted, regimeStart, adjusted.length);
        long present = java.util.Arrays.stream(regime).filter(v -> !Double.isNaN(v)).count();
        if (present < Math.max(DecisionRules.MIN_VALUES_FOR_TREND,
                DecisionRules.MIN_REGIME_CYCLES_FOR_TREND * series.frequency().seasonalPeriod())
                || regime.length > MAX_VALUES) {
            return Optional.empty();
        }
        MannKendall.Result mk = MannKendall.test(regime, MannKendall.Correction.AR1_RANKS);
        double perYear = series.frequency().periodsPerYear();
        SenSlope.Result sen = SenSlope.of(regime, perYear, mk.varianceUsed());
        Double pct = null;
        if (inPercent && log) {
            // Kendall's S and its variance depend on the ranks only, the same on the logs
            double logSlope = SenSlope.of(java.util.Arrays.stream(regime).map(Math::log).toArray(), perYear,
                    mk.varianceUsed()).perYear();
            pct = 100 * Math.expm1(logSlope);
        } else if (inPercent) {
            double latestLevel = Analyst.latestYearMean(series);
            pct = latestLevel > 0 ? 100 * sen.perYear() / latestLevel : null;
        }
        return Optional.of(new TrendFinding.LatestRegime(series.period(regimeStart), direction(mk), sen.perYear(),
                sen.lower95(), sen.upper95(), mk.test().pValue(), (int) present, pct));
    }

    /** A direction only where the test rejects "no trend" at {@link DecisionRules#ALPHA}. */
    private static Direction direction(MannKendall.Result mk) {
        return !mk.test().reject(DecisionRules.ALPHA) ? Direction.NONE : mk.s() > 0 ? Direction.INCREASING
                : Direction.DECREASING;
    }

    /** The correction detrends the observed values in sequence; the series' own slope fits it only without gaps. */
    private static boolean gapFree(double[] x) {
        for (double v : x) {
            if (Double.isNaN(v)) {
                return false;
            }
        }
        return true;
    }

    private static double[] blockMeans(double[] x, int block) {
        int blocks = x.length / block;
        double[] means = new double[blocks];
        for (int b = 0; b < blocks; b++) {
            double sum = 0;
            int n = 0;
            for (int t = b * block; t < (b + 1) * block; t++) {
                if (!Double.isNaN(x[t])) {
                    sum += x[t];
                    n++;
                }
            }
            means[b] = n == 0 ? Double.NaN : sum / n;
        }
        return means;
    }
}
