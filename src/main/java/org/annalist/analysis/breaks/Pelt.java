package org.annalist.analysis.breaks;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.annalist.analysis.OrderStatistics;

/**
 * PELT, exact penalised segmentation in linear expected time [1]: minimises
 * {@code Σ C(segment) + β · (number of breaks)} by
 * {@code F(t) = min_τ [F(τ) + C(y_{τ+1..t}) + β]}, discarding every τ with
 * {@code F(τ) + C(y_{τ+1..t}) > F(t)} (their eq. 4, with K = 0 for this cost), which can never
 * be optimal later.
 *
 * <p>Cost: changes in level, residual sum of squares divided by a robust noise variance
 * σ̂² = (1.4826 · MAD of first differences / √2)², so that the penalty means the same whatever the
 * units of the data; penalty β = 3 log n, the leading term of the modified BIC of [2], the default
 * of R's changepoint package. Every regime is at least {@code h} long. Breaks are returned as the
 * first index of each new regime. Missing values ({@code NaN}) are left out of every segment's fit
 * and of n.
 *
 * <p>References:
 * <ol>
 * <li>R. Killick, P. Fearnhead and I. A. Eckley (2012), "Optimal Detection of Changepoints With a
 *     Linear Computational Cost", <i>Journal of the American Statistical Association</i> 107(500),
 *     1590–1598. doi:10.1080/01621459.2012.737745</li>
 * <li>N. R. Zhang and D. O. Siegmund (2007), "A Modified Bayes Information Criterion with
 *     Applications to the Analysis of Comparative Genomic Hybridization Data", <i>Biometrics</i>
 *     63(1), 22–32. doi:10.1111/j.1541-0420.2006.00662.x</li>
 * </ol>
 */
public final class Pelt {

    /**
     * The partition PELT found. The array is copied in and out, so a result cannot be changed
     * after it is made.
     *
     * @param starts  first index of each new regime, ascending
     * @param penalty β, the cost of one more break
     * @param noiseSd the robust σ̂ used
     */
    public record Result(int[] starts, double penalty, double noiseSd) {

        public Result {
            starts = starts.clone();
        }

        /** A copy of the first index of each new regime. */
        @Override
        public int[] starts() {
            return starts.clone();
        }

        @Override
        public boolean equals(Object other) {
            return other instanceof Result r && Arrays.equals(starts, r.starts)
                    && Double.compare(penalty, r.penalty) == 0 && Double.compare(noiseSd, r.noiseSd) == 0;
        }

        @Override
        public int hashCode() {
            return 31 * (31 * Arrays.hashCode(starts) + Double.hashCode(penalty)) + Double.hashCode(noiseSd);
        }

        @Override
        public String toString() {
            return "Result[starts=" + Arrays.toString(starts) + ", penalty=" + penalty + ", noiseSd=" + noiseSd + "]";
        }
    }

    private Pelt() {
    }

    public static Result fit(double[] y, int h) {
        int n = y.length;
        double sd = robustNoiseSd(y);
        double scale = sd > 0 ? 1 / (sd * sd) : 1;
        SegmentCost cost = new SegmentCost(y, BaiPerron.Model.LEVEL);
        double beta = 3 * Math.log(cost.observed(0, n - 1));   // [2]: the leading term, 3 log n
        double[] f = new double[n + 1];
        int[] last = new int[n + 1];
        Arrays.fill(f, Double.POSITIVE_INFINITY);
        f[0] = -beta;
        List<Integer> candidates = new ArrayList<>();
        for (int t = h; t <= n; t++) {
            int newest = t - h;   // its segment τ+1..t is h long; a first regime shorter than h is not allowed
            if (newest == 0 || newest >= h) {
                candidates.add(newest);
            }
            double best = Double.POSITIVE_INFINITY;
            int bestTau = -1;
            for (int tau : candidates) {
                double value = f[tau] + scale * cost.rss(tau, t - 1) + beta;   // [1] F(τ) + C(y_{τ+1..t}) + β
                if (value < best) {
                    best = value;
                    bestTau = tau;
                }
            }
            f[t] = best;
            last[t] = bestTau;
            List<Integer> kept = new ArrayList<>(candidates.size());
            for (int tau : candidates) {
                if (f[tau] + scale * cost.rss(tau, t - 1) <= f[t]) {   // [1] eq. 4, K = 0: τ may still be optimal
                    kept.add(tau);
                }
            }
            candidates = kept;
        }
        List<Integer> starts = new ArrayList<>();
        for (int t = last[n]; t > 0; t = last[t]) {
            starts.add(0, t);
        }
        return new Result(starts.stream().mapToInt(Integer::intValue).toArray(), beta, sd);
    }

    /** 1.4826 · median |Δy − median Δy| / √2: the noise of a series whose level moves by steps. */
    static double robustNoiseSd(double[] y) {
        List<Double> diffs = new ArrayList<>();
        for (int i = 1; i < y.length; i++) {
            if (!Double.isNaN(y[i]) && !Double.isNaN(y[i - 1])) {
                diffs.add(y[i] - y[i - 1]);
            }
        }
        if (diffs.isEmpty()) {
            return 0;
        }
        double[] d = diffs.stream().mapToDouble(Double::doubleValue).toArray();
        double median = OrderStatistics.median(d);
        double[] dev = new double[d.length];
        for (int i = 0; i < d.length; i++) {
            dev[i] = Math.abs(d[i] - median);
        }
        return 1.4826 * OrderStatistics.median(dev) / Math.sqrt(2);
    }
}
