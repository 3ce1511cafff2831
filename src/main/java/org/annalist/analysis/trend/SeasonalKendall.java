package org.annalist.analysis.trend;

import java.util.Optional;
import org.annalist.analysis.TestResult;
import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * The seasonal Kendall test (Hirsch, Slack &amp; Smith 1982, <i>Water Resources Research</i> 18,
 * 107–121): Kendall's S within each season (all Januaries, …) over the years, summed;
 * {@code S′ = Σ_g S_g}, {@code Var(S′) = Σ_g Var(S_g)} with ties corrected within each season,
 * continuity-corrected Z, two-sided p. It removes the seasonal pattern without a model, and
 * treats the seasons as independent (no covariance term).
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
     * @return empty when no season has two observed years
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
                s += score.s();
                variance += score.variance();
                n += score.n();
            }
        }
        if (variance <= 0) {
            return Optional.empty();
        }
        double z = KendallScore.z(s, variance);
        double p = Math.min(1, 2 * STANDARD_NORMAL.cumulativeProbability(-Math.abs(z)));
        return Optional.of(new Result(new TestResult(TestResult.Method.SEASONAL_KENDALL, z, p, n), s, variance,
                SenSlope.seasonal(x, period, variance)));
    }
}
