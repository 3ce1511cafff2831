package org.annalist.analysis.forecast;

import java.util.Arrays;

/**
 * A method's back-test errors by horizon: at each step ahead k = 1 … cycle, the 80 % quantile of
 * the absolute errors |y − f| and of the relative errors |y − f| / f — what an honest 80 % interval
 * half-width at that horizon would have had to be to cover eight in ten of the forecasts made on
 * the series' own past (the empirical prediction intervals of Williams &amp; Goodman [1]; the
 * quantiles are of type 7 of Hyndman &amp; Fan, as in {@link Intervals}).
 *
 * <h2>References</h2>
 * <ol>
 * <li>Williams, W. H. &amp; Goodman, M. L. (1971). A simple method for the construction of empirical
 * confidence limits for economic forecasts. <i>Journal of the American Statistical Association</i>
 * 66(336), 752–754 (from memory). See also Hyndman, R. J. &amp; Athanasopoulos, G. (2021),
 * <i>Forecasting: Principles and Practice</i>, 3rd ed., §5.5 (from memory).</li>
 * </ol>
 *
 * @param absolute80 per horizon (index 0 = one step ahead), the 80 % quantile of |y − f|
 * @param relative80 per horizon, the 80 % quantile of |y − f| / f; NaN at a horizon where a
 *                   forecast was not positive (a relative error has no meaning there)
 * @param counts     back-test forecasts per horizon
 */
public record HorizonErrors(double[] absolute80, double[] relative80, int[] counts) {

    /** Coverage of the quantile: the central 80 % interval's half-width. */
    static final double COVERAGE = 0.80;

    public HorizonErrors {
        absolute80 = absolute80.clone();
        relative80 = relative80.clone();
        counts = counts.clone();
    }

    @Override
    public double[] absolute80() {
        return absolute80.clone();
    }

    @Override
    public double[] relative80() {
        return relative80.clone();
    }

    @Override
    public int[] counts() {
        return counts.clone();
    }

    /** Horizons scored. */
    public int horizons() {
        return counts.length;
    }

    /**
     * @param horizon 0-based steps ahead of each pair
     * @param cycle   the longest horizon scored
     */
    static HorizonErrors of(double[] actual, double[] forecast, int[] horizon, int cycle) {
        double[] absolute = new double[cycle];
        double[] relative = new double[cycle];
        int[] counts = new int[cycle];
        for (int k = 0; k < cycle; k++) {
            double[] abs = new double[actual.length];
            double[] rel = new double[actual.length];
            int n = 0;
            boolean positive = true;
            for (int i = 0; i < actual.length; i++) {
                if (horizon[i] != k) {
                    continue;
                }
                abs[n] = Math.abs(actual[i] - forecast[i]);
                positive &= forecast[i] > 0;
                rel[n] = positive ? abs[n] / forecast[i] : Double.NaN;
                n++;
            }
            counts[k] = n;
            absolute[k] = n == 0 ? Double.NaN : Intervals.quantiles(Arrays.copyOf(abs, n), COVERAGE)[0];
            relative[k] = n == 0 || !positive ? Double.NaN : Intervals.quantiles(Arrays.copyOf(rel, n), COVERAGE)[0];
        }
        return new HorizonErrors(absolute, relative, counts);
    }
}
