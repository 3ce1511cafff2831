package org.annalist.analysis.forecast;

import java.util.Arrays;

/**
 * The outlook's 80 and 95 % intervals: the normal approximation around a closed-form mean and
 * variance ({@link Prediction#interval}), or the sample quantiles of simulated paths (type 7 of
 * [1], R's default); the mean, the limits and the paths clipped to the measure's bounds.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J. &amp; Fan, Y. (1996). Sample quantiles in statistical packages. <i>The American
 * Statistician</i> 50(4), 361–365. DOI 10.1080/00031305.1996.10473566.</li>
 * </ol>
 */
final class Intervals {

    private Intervals() {
    }

    /** A forecast whose intervals are the normal approximation to {@code prediction}. */
    static Outlook.Forecast fromPrediction(Outlook.Model model, Prediction prediction, double[][] paths,
                                           Outlook.Bounds bounds) {
        double[][] eighty = prediction.interval(0.80);
        double[][] ninetyFive = prediction.interval(0.95);
        return clipped(model, prediction.mean(), eighty[0], eighty[1], ninetyFive[0], ninetyFive[1], paths, bounds);
    }

    /** A forecast whose intervals are the 2.5, 10, 90 and 97.5 % quantiles of {@code paths} at each step. */
    static Outlook.Forecast fromPaths(Outlook.Model model, double[] mean, double[][] paths, Outlook.Bounds bounds) {
        int h = mean.length;
        double[] lo80 = new double[h];
        double[] hi80 = new double[h];
        double[] lo95 = new double[h];
        double[] hi95 = new double[h];
        double[] column = new double[paths.length];
        for (int k = 0; k < h; k++) {
            for (int p = 0; p < paths.length; p++) {
                column[p] = paths[p][k];
            }
            double[] q = quantiles(column, 0.025, 0.10, 0.90, 0.975);
            lo95[k] = q[0];
            lo80[k] = q[1];
            hi80[k] = q[2];
            hi95[k] = q[3];
        }
        return clipped(model, mean, lo80, hi80, lo95, hi95, paths, bounds);
    }

    static Outlook.Forecast clipped(Outlook.Model model, double[] mean, double[] lo80, double[] hi80,
                                            double[] lo95, double[] hi95, double[][] paths, Outlook.Bounds bounds) {
        double[][] clippedPaths = new double[paths.length][];
        for (int p = 0; p < paths.length; p++) {
            clippedPaths[p] = clip(paths[p], bounds);
        }
        return new Outlook.Forecast(model, clip(mean, bounds), clip(lo80, bounds), clip(hi80, bounds),
                clip(lo95, bounds), clip(hi95, bounds), clippedPaths);
    }

    private static double[] clip(double[] v, Outlook.Bounds bounds) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = bounds.clip(v[i]);
        }
        return out;
    }

    /** Sample quantiles by linear interpolation between order statistics ([1] type 7). */
    static double[] quantiles(double[] x, double... probabilities) {
        double[] sorted = x.clone();
        Arrays.sort(sorted);
        double[] q = new double[probabilities.length];
        for (int i = 0; i < probabilities.length; i++) {
            double position = probabilities[i] * (sorted.length - 1); // [1] type 7: h = (n − 1)p + 1, 1-based
            int below = (int) Math.floor(position);
            int above = Math.min(below + 1, sorted.length - 1);
            q[i] = sorted[below] + (position - below) * (sorted[above] - sorted[below]);
        }
        return q;
    }

    /**
     * The quantile a future error stays below with probability at least {@code level}, from
     * {@code x}, errors of the same kind: the ⌈(n + 1)·level⌉-th smallest of the n values, the split
     * conformal prediction quantile (Lei, G'Sell, Rinaldo, Tibshirani &amp; Wasserman 2018,
     * Distribution-free predictive inference for regression, <i>J. Amer. Statist. Assoc.</i>
     * 113(523), 1094–1111, §2.2, from memory), the largest when that rank exceeds n. The plain sample
     * quantile of a few errors is, on average, exceeded by a new one more often than 1 − level.
     */
    static double predictive(double[] x, double level) {
        double[] sorted = x.clone();
        Arrays.sort(sorted);
        int rank = (int) Math.ceil((sorted.length + 1) * level);
        return sorted[Math.min(sorted.length, rank) - 1];
    }
}
