package org.annalist.analysis.forecast;

import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * Means and variances of the h-step forecast distributions, step 1 first.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J., Koehler, A. B., Ord, J. K. &amp; Snyder, R. D. (2008). <i>Forecasting with
 * Exponential Smoothing: The State Space Approach</i>. Springer. DOI 10.1007/978-3-540-71918-2.</li>
 * </ol>
 */
public record Prediction(double[] mean, double[] variance) {

    public Prediction {
        if (mean.length != variance.length) {
            throw new IllegalArgumentException("means and variances must pair up, got " + mean.length + " and "
                    + variance.length);
        }
        mean = mean.clone();
        variance = variance.clone();
    }

    @Override
    public double[] mean() {
        return mean.clone();
    }

    @Override
    public double[] variance() {
        return variance.clone();
    }

    /**
     * The normal-approximation interval mean ± z·sd at {@code level} (e.g. 0.8), as
     * {lower[], upper[]}; for class-3 ETS models the distribution is not normal, so this is the
     * approximation Hyndman et al. [1, §6.4] recommend for short horizons.
     */
    public double[][] interval(double level) {
        double z = new NormalDistribution(null, 0, 1).inverseCumulativeProbability(0.5 + level / 2);
        double[] lower = new double[mean.length];
        double[] upper = new double[mean.length];
        for (int i = 0; i < mean.length; i++) {
            double half = z * Math.sqrt(variance[i]);
            lower[i] = mean[i] - half;
            upper[i] = mean[i] + half;
        }
        return new double[][] {lower, upper};
    }
}
