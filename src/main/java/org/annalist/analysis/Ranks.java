package org.annalist.analysis;

import java.util.Arrays;

/**
 * Ranks with ties at their mean rank, and the tie sum Σ(t³ − t) that rank tests correct for.
 *
 * <p>Mean ranks for ties and the tie sum are those of the Kruskal–Wallis test [1] (its ties
 * correction divides H by 1 − Σ(t³ − t)/(N³ − N)); the Mann–Kendall variance has a tie term of
 * its own, computed in the trend package.
 *
 * <p>References:
 * <ol>
 * <li>W. H. Kruskal and W. A. Wallis (1952), "Use of Ranks in One-Criterion Variance Analysis",
 *     <i>Journal of the American Statistical Association</i> 47(260), 583–621.
 *     doi:10.1080/01621459.1952.10483441</li>
 * </ol>
 */
public final class Ranks {

    private Ranks() {
    }

    /** Ranks 1..n of {@code x} (no NaN), ties given their mean rank. */
    public static double[] of(double[] x) {
        int n = x.length;
        int[] order = sortedOrder(x);
        double[] ranks = new double[n];
        for (int i = 0; i < n; ) {
            int j = i;
            while (j + 1 < n && x[order[j + 1]] == x[order[i]]) {
                j++;
            }
            // [1] ties share the mean of the 1-based ranks i + 1 … j + 1
            double rank = (i + j) / 2.0 + 1;
            for (int k = i; k <= j; k++) {
                ranks[order[k]] = rank;
            }
            i = j + 1;
        }
        return ranks;
    }

    /**
     * The positions of {@code x} in the order of {@link Double#compare}, equal values in the order
     * of their positions: what a stable sort of the positions by that comparison gives, by merging
     * runs of doubling length on long keys of the same order (no boxed positions, no comparator).
     */
    static int[] sortedOrder(double[] x) {
        int n = x.length;
        long[] keys = new long[n];
        int[] from = new int[n];
        for (int i = 0; i < n; i++) {
            keys[i] = orderKey(x[i]);
            from[i] = i;
        }
        int[] to = new int[n];
        for (int width = 1; width < n; width *= 2) {
            for (int lo = 0; lo < n; lo += 2 * width) {
                int mid = Math.min(lo + width, n);
                int hi = Math.min(lo + 2 * width, n);
                int i = lo;
                int j = mid;
                for (int k = lo; k < hi; k++) {
                    // the left run first among equal keys: stable
                    if (j >= hi || (i < mid && keys[from[i]] <= keys[from[j]])) {
                        to[k] = from[i++];
                    } else {
                        to[k] = from[j++];
                    }
                }
            }
            int[] swap = from;
            from = to;
            to = swap;
        }
        return from;
    }

    /**
     * A long whose order is {@link Double#compare}'s order of the values (NaN, taken as one value,
     * last): the bits of a negative value have their magnitude bits flipped, so that a larger
     * magnitude sorts lower.
     */
    public static long orderKey(double value) {
        long bits = Double.doubleToLongBits(value);
        return bits ^ ((bits >> 63) & Long.MAX_VALUE);
    }

    /** The value whose {@link #orderKey} is {@code key} (the flip undoes itself; NaN comes back as Java's NaN). */
    public static double valueOfOrderKey(long key) {
        return Double.longBitsToDouble(key ^ ((key >> 63) & Long.MAX_VALUE));
    }

    /** Σ over groups of tied values of (t³ − t). */
    public static double tieSum(double[] x) {
        double[] sorted = x.clone();
        Arrays.sort(sorted);
        double sum = 0;
        for (int i = 0; i < sorted.length; ) {
            int j = i;
            while (j + 1 < sorted.length && sorted[j + 1] == sorted[i]) {
                j++;
            }
            double t = j - i + 1;
            // [1] the group's term t³ − t of the ties correction
            sum += t * t * t - t;
            i = j + 1;
        }
        return sum;
    }
}
