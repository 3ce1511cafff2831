package org.annalist.analysis.forecast;

import java.util.Arrays;
import org.annalist.analysis.OrderStatistics;

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

    /**
     * Sample quantiles by linear interpolation between order statistics ([1] type 7). Only the order
     * statistics the quantiles need are selected ({@link OrderStatistics#select}), not the whole
     * sample sorted: the same values, at a fraction of the cost for the paths' 2,000 values.
     */
    static double[] quantiles(double[] x, double... probabilities) {
        int n = x.length;
        int[] below = new int[probabilities.length];
        double[] fraction = new double[probabilities.length];
        int[] ranks = new int[2 * probabilities.length];
        for (int i = 0; i < probabilities.length; i++) {
            double position = probabilities[i] * (n - 1); // [1] type 7: h = (n − 1)p + 1, 1-based
            below[i] = (int) Math.floor(position);
            fraction[i] = position - below[i];
            ranks[2 * i] = below[i];
            ranks[2 * i + 1] = Math.min(below[i] + 1, n - 1);
        }
        double[] ordered = orderStatistics(x, ranks);
        double[] q = new double[probabilities.length];
        for (int i = 0; i < probabilities.length; i++) {
            double lower = ordered[2 * i];
            q[i] = lower + fraction[i] * (ordered[2 * i + 1] - lower);
        }
        return q;
    }

    /** The values of {@code x} at the 0-based {@code ranks} (any order, repeats allowed) as if sorted; NaN sorts last. */
    private static double[] orderStatistics(double[] x, int[] ranks) {
        double[] values = x.clone();
        for (double v : values) {
            if (Double.isNaN(v)) { // no rank for selection: sort, as the values would be sorted
                Arrays.sort(values);
                return Arrays.stream(ranks).mapToDouble(r -> values[r]).toArray();
            }
        }
        int[] distinct = Arrays.stream(ranks).sorted().distinct().toArray();
        double[] selected = OrderStatistics.select(values, distinct);
        double[] out = new double[ranks.length];
        for (int i = 0; i < ranks.length; i++) {
            out[i] = selected[Arrays.binarySearch(distinct, ranks[i])];
        }
        return out;
    }

    /**
     * The {@code level} quantile of {@code x}, errors of the same kind, that a new error exceeds with
     * probability 1 − level on average: the (n + 1)·level-th smallest of the n values, interpolated
     * ([1] type 6). A new exchangeable value falls below the k-th smallest of n with probability
     * k / (n + 1) (the rank argument of split conformal prediction: Lei, G'Sell, Rinaldo, Tibshirani
     * &amp; Wasserman 2018, <i>J. Amer. Statist. Assoc.</i> 113(523), 1094–1111, §2.2, from memory).
     * The plain type 7 quantile of a few errors is exceeded more often than that; the rank rounded up
     * to ⌈(n + 1)·level⌉, the conformal guarantee, less often, and each of the outlook's widening
     * steps, taken only when it widens, added that margin again: on M3 (every second series) the
     * rounded-up rank gave 80 % coverage of 0.89 (monthly) and 0.87 (yearly), this one 0.87 and 0.83.
     * Below the first position the smallest value, beyond the last the largest.
     */
    static double predictive(double[] x, double level) {
        double[] sorted = x.clone();
        Arrays.sort(sorted);
        double position = (sorted.length + 1) * level; // 1-based
        if (position <= 1) {
            return sorted[0];
        }
        if (position >= sorted.length) {
            return sorted[sorted.length - 1];
        }
        int below = (int) Math.floor(position);
        return sorted[below - 1] + (position - below) * (sorted[below] - sorted[below - 1]);
    }
}
