package org.annalist.analysis.trend;

import java.util.Optional;
import org.annalist.analysis.TestResult;
import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * The seasonal Kendall test [1]: Kendall's S [2] within each season (all Januaries, …) over the
 * years, summed; {@code S′ = Σ_g S_g}, {@code Var(S′) = Σ_g Var(S_g)} with ties corrected within
 * each season, continuity-corrected Z, two-sided p. It removes the seasonal pattern without a
 * model, and treats the seasons as independent: the covariance terms between seasons of [3],
 * for serially dependent data, are not added. A season with fewer than two observed years adds
 * nothing.
 *
 * <p>References:
 * <ol>
 * <li>R. M. Hirsch, J. R. Slack and R. A. Smith (1982), "Techniques of Trend Analysis for Monthly
 *     Water Quality Data", <i>Water Resources Research</i> 18(1), 107–121.
 *     doi:10.1029/WR018i001p00107</li>
 * <li>M. G. Kendall (1975), <i>Rank Correlation Methods</i>, 4th ed., Charles Griffin, London.</li>
 * <li>R. M. Hirsch and J. R. Slack (1984), "A Nonparametric Trend Test for Seasonal Data With
 *     Serial Dependence", <i>Water Resources Research</i> 20(6), 727–732.
 *     doi:10.1029/WR020i006p00727</li>
 * </ol>
 */
public final class SeasonalKendall {

    /** @param seasonalSlope the seasonal Sen slope per year with its Gilbert interval from Var(S′) */
    public record Result(TestResult test, long s, double variance, SenSlope.Result seasonalSlope) {
    }

    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1);

    private SeasonalKendall() {
    }

    /**
     * @param x      the series, first value at season position 0
     * @param period seasons per year
     * @return empty when no season has two observed years, or when the seasonal slope would take
     *         more than {@link SenSlope#MAX_PAIRS} pairs (decades of daily data: aggregate first)
     */
    public static Optional<Result> test(double[] x, int period) {
        long s = 0;
        double variance = 0;
        int n = 0;
        for (int g = 0; g < period; g++) {
            int years = (x.length - g + period - 1) / period;
            double[] season = new double[Math.max(years, 0)];
            for (int y = 0; y < years; y++) {
                season[y] = x[g + y * period];
            }
            KendallScore score = KendallScore.of(season);
            if (score.n() >= 2) {
                // [1] S′ = Σ_g S_g and Var(S′) = Σ_g Var(S_g), seasons independent
                s += score.s();
                variance += score.variance();
                n += score.n();
            }
        }
        if (variance <= 0 || SenSlope.pairs(x, period) > SenSlope.MAX_PAIRS) {
            return Optional.empty();
        }
        // [1] continuity-corrected Z and its two-sided normal p
        double z = KendallScore.z(s, variance);
        double p = Math.min(1, 2 * STANDARD_NORMAL.cumulativeProbability(-Math.abs(z)));
        return Optional.of(new Result(new TestResult(TestResult.Method.SEASONAL_KENDALL, z, p, n), s, variance,
                SenSlope.seasonal(x, period, variance)));
    }
}
