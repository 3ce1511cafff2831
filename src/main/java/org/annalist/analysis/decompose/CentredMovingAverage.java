package org.annalist.analysis.decompose;

import java.util.Arrays;
import org.annalist.series.Frequency;

/**
 * The centred moving average that estimates a trend-cycle by averaging out one seasonal cycle.
 *
 * <p>For an odd window {@code m} every value is the plain mean of the {@code m} values centred on
 * it. For an even window it is the "2×m" average: the mean of two adjacent {@code m}-term means,
 * i.e. weights {@code 1/(2m)} on the two outermost of {@code m + 1} values and {@code 1/m} inside
 * ([1] §3.3, "Moving averages of moving averages"; the same filter as R's {@code decompose} [2]).
 *
 * <p>The first and last {@code ⌊m/2⌋} values have no centred window and are {@code NaN}; so is
 * every value whose window contains a missing value, since an average over part of a season would
 * carry that season's pattern into the trend (our rule).
 *
 * <p>References:
 * <ol>
 * <li>R. J. Hyndman and G. Athanasopoulos (2021), <i>Forecasting: Principles and Practice</i>,
 *     3rd ed., OTexts, Melbourne; https://otexts.com/fpp3/ (no DOI).</li>
 * <li>R Core Team, {@code decompose} in the {@code stats} package,
 *     {@code src/library/stats/R/decompose.R}.</li>
 * </ol>
 */
public final class CentredMovingAverage {

    /**
     * @param trendCycle the smoothed values, {@code NaN} where no full window exists
     * @param window     the number of periods averaged ({@code m}); an even one is averaged twice (2×m)
     */
    public record Result(double[] trendCycle, int window) {

        public Result {
            trendCycle = trendCycle.clone();
        }

        @Override
        public double[] trendCycle() {
            return trendCycle.clone();
        }
    }

    private CentredMovingAverage() {
    }

    /**
     * The window that spans one seasonal cycle: 12 months, 4 quarters, 52 weeks, 7 days, 5 business
     * days; for annual data, which have no season, 5 years (common practice for smoothing annual
     * data, no source).
     */
    public static int windowFor(Frequency frequency) {
        return frequency == Frequency.ANNUAL ? 5 : frequency.seasonalPeriod();
    }

    /**
     * @throws IllegalArgumentException if {@code window < 2} or the series is shorter than the filter
     */
    public static Result of(double[] values, int window) {
        if (window < 2) {
            throw new IllegalArgumentException("moving-average window must be at least 2, was " + window);
        }
        boolean even = window % 2 == 0;
        int span = even ? window + 1 : window;
        if (values.length < span) {
            throw new IllegalArgumentException("a " + (even ? "2×" : "") + window + " moving average needs at least "
                    + span + " values, got " + values.length);
        }
        double[] weights = new double[span];
        Arrays.fill(weights, 1.0 / window);
        // [1] §3.3: 2×m weights, 1/(2m) at both ends and 1/m inside; plain 1/m for odd m
        if (even) {
            weights[0] = weights[span - 1] = 0.5 / window;
        }
        int half = span / 2;
        double[] smooth = new double[values.length];
        Arrays.fill(smooth, Double.NaN);
        for (int t = half; t < values.length - half; t++) {
            double sum = 0;
            for (int k = 0; k < span; k++) {
                sum += weights[k] * values[t - half + k];
            }
            smooth[t] = sum;                       // NaN in the window makes the sum NaN, as intended
        }
        return new Result(smooth, window);
    }
}
