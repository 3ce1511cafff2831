package org.annalist.analysis;

/**
 * The k-th smallest values of an array without sorting it whole (Hoare's FIND, CACM Algorithm 65,
 * 1961): expected linear time, which matters for the tens of thousands of pairwise slopes of
 * Sen's estimator.
 */
public final class OrderStatistics {

    private OrderStatistics() {
    }

    /** The median of {@code x} (the mean of the two middle values for an even count); {@code x} is left as it is. */
    public static double median(double[] x) {
        double[] a = x.clone();
        int n = a.length;
        if (n % 2 == 1) {
            return select(a, n / 2)[0];
        }
        double[] middle = select(a, n / 2 - 1, n / 2);
        return (middle[0] + middle[1]) / 2;
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

    /**
     * Rearranges a[lo..hi] so that a[k] holds the value of rank k, smaller values left, larger
     * right. Three-way partitioning (Dijkstra's "Dutch national flag") keeps it linear when many
     * values are equal, as pairwise slopes of rounded data are.
     */
    private static void selectInPlace(double[] a, int lo, int hi, int k) {
        while (hi > lo) {
            int mid = (lo + hi) >>> 1;
            double pivot = medianOfThree(a[lo], a[mid], a[hi]);
            int lt = lo;
            int gt = hi;
            int i = lo;
            while (i <= gt) {
                if (a[i] < pivot) {
                    swap(a, lt++, i++);
                } else if (a[i] > pivot) {
                    swap(a, i, gt--);
                } else {
                    i++;
                }
            }
            // now a[lo..lt-1] < pivot, a[lt..gt] == pivot, a[gt+1..hi] > pivot
            if (k < lt) {
                hi = lt - 1;
            } else if (k > gt) {
                lo = gt + 1;
            } else {
                return;
            }
        }
    }

    private static double medianOfThree(double x, double y, double z) {
        return Math.max(Math.min(x, y), Math.min(Math.max(x, y), z));
    }

    private static void swap(double[] a, int i, int j) {
        double t = a[i];
        a[i] = a[j];
        a[j] = t;
    }
}
