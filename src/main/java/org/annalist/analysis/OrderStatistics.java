package org.annalist.analysis;

/**
 * The k-th smallest values of an array without sorting it whole (Hoare's FIND, CACM Algorithm 65,
 * 1961): expected linear time, which matters for the tens of thousands of pairwise slopes of
 * Sen's estimator.
 */
public final class OrderStatistics {

    private OrderStatistics() {
    }

    /**
     * The values at 0-based ranks {@code ranks} (ascending, within the array), as if {@code a} were
     * sorted. Reorders {@code a}.
     */
    public static double[] select(double[] a, int... ranks) {
        double[] values = new double[ranks.length];
        int from = 0;
        for (int i = 0; i < ranks.length; i++) {
            int k = ranks[i];
            if (i > 0 && k < ranks[i - 1]) {
                throw new IllegalArgumentException("ranks must be ascending");
            }
            selectInPlace(a, from, a.length - 1, k);
            values[i] = a[k];
            from = k;   // everything left of k is now ≤ a[k]: later ranks lie to its right
        }
        return values;
    }

    /** Rearranges a[lo..hi] so that a[k] holds the value of rank k, smaller values left, larger right. */
    private static void selectInPlace(double[] a, int lo, int hi, int k) {
        while (hi > lo) {
            int mid = (lo + hi) >>> 1;
            // median of three as the pivot, moved to a[hi]
            if (a[mid] < a[lo]) {
                swap(a, mid, lo);
            }
            if (a[hi] < a[lo]) {
                swap(a, hi, lo);
            }
            if (a[mid] < a[hi]) {
                swap(a, mid, hi);
            }
            double pivot = a[hi];
            int store = lo;
            for (int i = lo; i < hi; i++) {
                if (a[i] < pivot) {
                    swap(a, i, store++);
                }
            }
            swap(a, store, hi);
            if (k == store) {
                return;
            } else if (k < store) {
                hi = store - 1;
            } else {
                lo = store + 1;
            }
        }
    }

    private static void swap(double[] a, int i, int j) {
        double t = a[i];
        a[i] = a[j];
        a[j] = t;
    }
}
