package org.annalist.analysis.trend;

import org.annalist.analysis.Ranks;


/**
 * Kendall's S of a sequence against time, and its variance under no trend with the ties
 * correction: {@code S = Σ_{i<j} sgn(x_j − x_i)} [1],
 * {@code Var(S) = [n(n−1)(2n+5) − Σ_p t_p(t_p−1)(2t_p+5)] / 18} over the tie groups p of sizes
 * t_p ([2]; [3] eq. 16.4), and the continuity-corrected z of [3].
 *
 * <p>References:
 * <ol>
 * <li>H. B. Mann (1945), "Nonparametric Tests Against Trend", <i>Econometrica</i> 13(3), 245–259.
 *     doi:10.2307/1907187</li>
 * <li>M. G. Kendall (1975), <i>Rank Correlation Methods</i>, 4th ed., Charles Griffin, London.</li>
 * <li>R. O. Gilbert (1987), <i>Statistical Methods for Environmental Pollution Monitoring</i>,
 *     Van Nostrand Reinhold, New York, ch. 16.</li>
 * </ol>
 */
record KendallScore(int n, long s, double variance, int tieGroups) {

    /** The score of the non-missing values of {@code x}, in order. */
    static KendallScore of(double[] x) {
        double[] v = observed(x);
        int n = v.length;
        long[] keys = new long[n];
        for (int i = 0; i < n; i++) {
            keys[i] = Ranks.orderKey(v[i]);
        }
        long s = sortCountingScore(keys);
        double[] sorted = new double[n];
        for (int i = 0; i < n; i++) {
            sorted[i] = Ranks.valueOfOrderKey(keys[i]);
        }
        double tieTerm = 0;
        int groups = 0;
        for (int i = 0; i < n; ) {
            int j = i;
            while (j + 1 < n && sorted[j + 1] == sorted[i]) {
                j++;
            }
            int t = j - i + 1;
            if (t > 1) {
                // [2] the tie group's term t_p(t_p − 1)(2t_p + 5)
                tieTerm += t * (t - 1.0) * (2.0 * t + 5);
                groups++;
            }
            i = j + 1;
        }
        // [3] eq. 16.4: Var(S) with the ties correction
        double variance = (n * (n - 1.0) * (2.0 * n + 5) - tieTerm) / 18.0;
        return new KendallScore(n, s, variance, groups);
    }

    /** The values of {@code x} that are not NaN, in order ({@code x} itself when none is). */
    static double[] observed(double[] x) {
        int n = 0;
        for (double d : x) {
            n += Double.isNaN(d) ? 0 : 1;
        }
        if (n == x.length) {
            return x;
        }
        double[] v = new double[n];
        int k = 0;
        for (double d : x) {
            if (!Double.isNaN(d)) {
                v[k++] = d;
            }
        }
        return v;
    }

    /**
     * Sorts {@code keys} by merging runs of doubling length, and returns
     * {@code S = Σ_{i<j} sgn(key_j − key_i)} of their order on entry [1]. Each pair of positions is
     * counted once, in the merge that first brings them together: there every key of the left run
     * precedes every key of the right one, and a right key adds the number of left keys below it
     * less the number above it. Integer counts, so the same S as the sum over all pairs, in
     * O(n log n) instead of O(n²) comparisons (the merge-sort count of inversions, with ties
     * counted apart; Knight's O(n log n) tau, from memory: W. R. Knight (1966), "A Computer
     * Method for Calculating Kendall's Tau with Ungrouped Data", JASA 61(314), 436–439).
     */
    private static long sortCountingScore(long[] keys) {
        int n = keys.length;
        long[] from = keys;
        long[] to = new long[n];
        long s = 0;
        for (int width = 1; width < n; width *= 2) {
            for (int lo = 0; lo < n; lo += 2 * width) {
                int mid = Math.min(lo + width, n);
                int hi = Math.min(lo + 2 * width, n);
                int leftSize = mid - lo;
                // left keys below the current right key, and left keys at or below it
                int below = lo;
                int notAbove = lo;
                for (int r = mid; r < hi; r++) {
                    long key = from[r];
                    while (below < mid && from[below] < key) {
                        below++;
                    }
                    if (notAbove < below) {
                        notAbove = below;
                    }
                    while (notAbove < mid && from[notAbove] <= key) {
                        notAbove++;
                    }
                    // [1] sgn(x_j − x_i) over the left i: +1 for each below, −1 for each above
                    s += (below - lo) - (leftSize - (notAbove - lo));
                }
                int i = lo;
                int j = mid;
                for (int k = lo; k < hi; k++) {
                    if (j >= hi || (i < mid && from[i] <= from[j])) {
                        to[k] = from[i++];
                    } else {
                        to[k] = from[j++];
                    }
                }
            }
            long[] swap = from;
            from = to;
            to = swap;
        }
        if (from != keys) {
            System.arraycopy(from, 0, keys, 0, n);
        }
        return s;
    }

    /**
     * Continuity-corrected z: (S − 1)/√Var if S &gt; 0, (S + 1)/√Var if S &lt; 0, else 0 ([3] ch. 16);
     * also 0 when the variance is not positive (our rule: no spread, no evidence).
     */
    static double z(long s, double variance) {
        if (s == 0 || variance <= 0) {
            return 0;
        }
        // [3] the continuity correction moves S one step towards zero
        return (s > 0 ? s - 1 : s + 1) / Math.sqrt(variance);
    }
}
