package org.annalist.analysis.forecast;

/**
 * The seasonal naive forecast: every future period repeats the same period of the last observed
 * cycle [1, §5.2] — the benchmark every other forecast must beat. With a period of 1 it is the
 * plain naive forecast (every future period as the last value).
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J. &amp; Athanasopoulos, G. (2021). <i>Forecasting: Principles and Practice</i>,
 * 3rd ed. OTexts, Melbourne (an online textbook; no DOI).</li>
 * </ol>
 */
public final class SeasonalNaive {

    private SeasonalNaive() {
    }

    /** @throws IllegalArgumentException with fewer values than one period */
    public static double[] forecast(double[] x, int period, int h) {
        if (x.length < period) {
            throw new IllegalArgumentException("a seasonal naive forecast needs one full period of " + period
                    + " values, got " + x.length);
        }
        double[] f = new double[h];
        for (int k = 0; k < h; k++) {
            f[k] = x[x.length - period + (k % period)]; // [1] §5.2
        }
        return f;
    }

    /**
     * The forecast distribution of the seasonal random walk y_t = y_{t−m} + ε_t ([1] §5.5,
     * Table 5.2): variance σ²(k + 1), k = ⌊(h − 1)/m⌋, σ² the mean squared seasonal difference.
     *
     * @throws IllegalArgumentException with no more than one period of values
     */
    public static Prediction predict(double[] x, int period, int h) {
        double sigma2 = residualVariance(x, period);
        double[] variance = new double[h];
        for (int k = 0; k < h; k++) {
            variance[k] = sigma2 * (k / period + 1); // [1] §5.5, Table 5.2
        }
        return new Prediction(forecast(x, period, h), variance);
    }

    /**
     * Sample paths of the seasonal random walk, one per row of standard normal {@code shocks}.
     *
     * @throws IllegalArgumentException with no more than one period of values
     */
    public static double[][] paths(double[] x, int period, double[][] shocks) {
        double sigma = Math.sqrt(residualVariance(x, period));
        double[][] out = new double[shocks.length][];
        for (int p = 0; p < shocks.length; p++) {
            double[] path = new double[shocks[p].length];
            for (int k = 0; k < path.length; k++) {
                double before = k < period ? x[x.length - period + k] : path[k - period];
                path[k] = before + sigma * shocks[p][k];
            }
            out[p] = path;
        }
        return out;
    }

    private static double residualVariance(double[] x, int period) {
        double sum = 0;
        int count = 0;
        for (int t = period; t < x.length; t++) {
            double d = x[t] - x[t - period];
            sum += d * d;
            count++;
        }
        if (count == 0) {
            throw new IllegalArgumentException("a seasonal naive interval needs more than one period of values");
        }
        return sum / count;
    }
}
