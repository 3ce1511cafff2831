package org.annalist.analysis.decompose;

/**
 * The classical decomposition by moving averages: trend-cycle by the centred 2×m (or m) moving
 * average, seasonal figure as the mean detrended value at each cycle position, normalised to sum
 * to zero (additive) or to average one (multiplicative), remainder as what is left.
 *
 * <p>Follows Kendall &amp; Stuart's method [1] as R's {@code stats::decompose} implements it [2]:
 * position {@code i} of the figure is the mean over observations {@code i, i + m, i + 2m, …} of
 * the series (not of calendar months), missing detrended values left out. [3] §3.4 describes the
 * same steps. Two full periods at least are asked for, as R's {@code decompose} asks [2].
 *
 * <p>References:
 * <ol>
 * <li>M. G. Kendall and A. Stuart (1983), <i>The Advanced Theory of Statistics</i>, Vol. 3,
 *     Charles Griffin, London, pp. 410–414 (as R's {@code decompose} documentation cites it).</li>
 * <li>R Core Team, {@code decompose} in the {@code stats} package,
 *     {@code src/library/stats/R/decompose.R} (R 4.2).</li>
 * <li>R. J. Hyndman and G. Athanasopoulos (2021), <i>Forecasting: Principles and Practice</i>,
 *     3rd ed., OTexts, Melbourne; https://otexts.com/fpp3/ (no DOI).</li>
 * </ol>
 */
public final class ClassicalDecomposition {

    public enum Type { ADDITIVE, MULTIPLICATIVE }

    /**
     * @param figure   the seasonal effect of each position of the first cycle (units, or factors around 1)
     * @param seasonal the figure repeated over the series
     */
    public record Result(Type type, int period, double[] trend, double[] figure, double[] seasonal,
                         double[] remainder) {

        public Result {
            trend = trend.clone();
            figure = figure.clone();
            seasonal = seasonal.clone();
            remainder = remainder.clone();
        }

        @Override
        public double[] trend() {
            return trend.clone();
        }

        @Override
        public double[] figure() {
            return figure.clone();
        }

        @Override
        public double[] seasonal() {
            return seasonal.clone();
        }

        @Override
        public double[] remainder() {
            return remainder.clone();
        }
    }

    private ClassicalDecomposition() {
    }

    /**
     * @throws IllegalArgumentException with fewer than two full periods, or with values ≤ 0 for the
     *                                  multiplicative type
     */
    public static Result of(double[] x, int period, Type type) {
        if (period < 2 || x.length < 2 * period) {
            throw new IllegalArgumentException("classical decomposition needs two full periods of " + period
                    + ", got " + x.length + " values");
        }
        boolean multiplicative = type == Type.MULTIPLICATIVE;
        if (multiplicative) {
            for (double v : x) {
                if (v <= 0) {
                    throw new IllegalArgumentException("a multiplicative decomposition needs values above zero, got " + v);
                }
            }
        }
        // [3] §3.4 step 1: the trend-cycle by the centred (2×)m moving average
        double[] trend = CentredMovingAverage.of(x, period).trendCycle();
        double[] figure = new double[period];
        for (int i = 0; i < period; i++) {
            double sum = 0;
            int count = 0;
            for (int t = i; t < x.length; t += period) {
                double detrended = multiplicative ? x[t] / trend[t] : x[t] - trend[t];
                if (!Double.isNaN(detrended)) {
                    sum += detrended;
                    count++;
                }
            }
            // [2] the figure: the mean detrended value of each position over all cycles
            figure[i] = sum / count;
        }
        double mean = 0;
        for (double f : figure) {
            mean += f / period;
        }
        // [2] centred: the figure sums to zero (additive) or averages one (multiplicative)
        for (int i = 0; i < period; i++) {
            figure[i] = multiplicative ? figure[i] / mean : figure[i] - mean;
        }
        double[] seasonal = new double[x.length];
        double[] remainder = new double[x.length];
        for (int t = 0; t < x.length; t++) {
            seasonal[t] = figure[t % period];
            // [3] §3.4: the remainder is what trend-cycle and seasonal leave
            remainder[t] = multiplicative ? x[t] / (trend[t] * seasonal[t]) : x[t] - trend[t] - seasonal[t];
        }
        return new Result(type, period, trend, figure, seasonal, remainder);
    }
}
