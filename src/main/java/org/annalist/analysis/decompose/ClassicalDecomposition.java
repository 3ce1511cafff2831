package org.annalist.analysis.decompose;

/**
 * The classical decomposition by moving averages: trend-cycle by the centred 2×m (or m) moving
 * average, seasonal figure as the mean detrended value at each cycle position, normalised to sum
 * to zero (additive) or to average one (multiplicative), remainder as what is left.
 *
 * <p>Follows Kendall &amp; Stuart's method as R's {@code stats::decompose} implements it (R 4.2,
 * {@code src/library/stats/R/decompose.R}): position {@code i} of the figure is the mean over
 * observations {@code i, i + m, i + 2m, …} of the series (not of calendar months), missing
 * detrended values left out. Hyndman &amp; Athanasopoulos (2021), <i>Forecasting: Principles and
 * Practice</i>, 3rd ed., §3.4, describe the same steps.
 */
public final class ClassicalDecomposition {

    public enum Type { ADDITIVE, MULTIPLICATIVE }

    /**
     * @param figure   the seasonal effect of each position of the first cycle (units, or factors around 1)
     * @param seasonal the figure repeated over the series
     */
    public record Result(Type type, int period, double[] trend, double[] figure, double[] seasonal,
                         double[] remainder) {
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
            figure[i] = sum / count;
        }
        double mean = 0;
        for (double f : figure) {
            mean += f / period;
        }
        for (int i = 0; i < period; i++) {
            figure[i] = multiplicative ? figure[i] / mean : figure[i] - mean;
        }
        double[] seasonal = new double[x.length];
        double[] remainder = new double[x.length];
        for (int t = 0; t < x.length; t++) {
            seasonal[t] = figure[t % period];
            remainder[t] = multiplicative ? x[t] / (trend[t] * seasonal[t]) : x[t] - trend[t] - seasonal[t];
        }
        return new Result(type, period, trend, figure, seasonal, remainder);
    }
}
