package org.annalist.analysis.season;

/**
 * The sample autocorrelation function as R's {@code acf} computes it [2] ([1] eq. 2.1.11):
 * {@code r_k = Σ_{t=1}^{n−k} (x_t − x̄)(x_{t+k} − x̄) / Σ_{t=1}^{n} (x_t − x̄)²}.
 * Missing values are left out of every sum that would contain them (our rule; the mean and the
 * denominator use the observed values).
 *
 * <p>References:
 * <ol>
 * <li>G. E. P. Box and G. M. Jenkins (1976), <i>Time Series Analysis: Forecasting and Control</i>,
 *     revised ed., Holden-Day, San Francisco.</li>
 * <li>R Core Team, {@code acf} in the {@code stats} package, {@code src/library/stats/R/acf.R}.</li>
 * </ol>
 */
public final class Autocorrelation {

    private Autocorrelation() {
    }

    /** r_0 … r_maxLag; r_0 = 1. */
    public static double[] of(double[] x, int maxLag) {
        int n = x.length;
        if (maxLag >= n) {
            throw new IllegalArgumentException("lag " + maxLag + " needs more than " + maxLag + " values, got " + n);
        }
        double mean = 0;
        int count = 0;
        for (double v : x) {
            if (!Double.isNaN(v)) {
                mean += v;
                count++;
            }
        }
        mean /= count;
        double variance = 0;
        for (double v : x) {
            if (!Double.isNaN(v)) {
                variance += (v - mean) * (v - mean);
            }
        }
        double[] r = new double[maxLag + 1];
        for (int k = 0; k <= maxLag; k++) {
            double sum = 0;
            for (int t = 0; t + k < n; t++) {
                double product = (x[t] - mean) * (x[t + k] - mean);
                if (!Double.isNaN(product)) {
                    sum += product;
                }
            }
            // [1] eq. 2.1.11: r_k = c_k / c_0, both sums over the same (implicit 1/n) scale
            r[k] = sum / variance;
        }
        return r;
    }
}
