package org.annalist.analysis;

/**
 * The k-th smallest values of an array without sorting it whole (Hoare's FIND [1]): expected
 * linear time, which matters for the tens of thousands of pairwise slopes of Sen's estimator.
 *
 * <p>Several ranks are found in one descent: each partition sends every wanted rank to the side
 * that holds it, so the median and the two interval limits of Sen's slope cost little more than
 * the median alone (the partial sorting of Chambers [2]). The partition avoids a branch on the
 * data; [3] shows why that pays (its block partition is not the one used here).
 *
 * <p>References:
 * <ol>
 * <li>C. A. R. Hoare (1961), "Algorithm 65: Find", <i>Communications of the ACM</i> 4(7),
 *     321–322. doi:10.1145/366622.366647</li>
 * <li>J. M. Chambers (1971), "Algorithm 410: Partial Sorting", <i>Communications of the ACM</i>
 *     14 (the whole entry from memory, not verified; no DOI checked).</li>
 * <li>S. Edelkamp and A. Weiß (2019), "BlockQuicksort: Avoiding Branch Mispredictions in
 *     Quicksort", <i>ACM Journal of Experimental Algorithmics</i> 24. doi:10.1145/3274660 (first
 *     presented at ESA 2016, doi:10.4230/LIPIcs.ESA.2016.38)</li>
 * </ol>
 */
public final class OrderStatistics {

    /**
     * Below this many values a range is sorted by insertion: cheaper than partitioning it again
     * (our rule; small cut-offs of this size are common practice, the value has no source).
     */
    private static final int INSERTION_SORT_BELOW = 16;

    /**
     * From this many values on, the ranks are first looked for in a band found from a sample
     * ({@link BandSelection}); below, a sample would save less than it costs (our rule, from timing
     * the pairwise slopes of monthly series: 2,280 seasonal and 28,680 plain pairs for 20 years).
     */
    static final int SAMPLED_FROM = 2048;

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
     * sorted. May reorder {@code a} (its values stay), which must hold no NaN.
     */
    public static double[] select(double[] a, int... ranks) {
        for (int i = 0; i < ranks.length; i++) {
            if (ranks[i] < 0 || ranks[i] >= a.length) {
                throw new IllegalArgumentException("rank " + ranks[i] + " outside 0.." + (a.length - 1));
            }
            if (i > 0 && ranks[i] < ranks[i - 1]) {
                throw new IllegalArgumentException("ranks must be ascending");
            }
        }
        double[] values = new double[ranks.length];
        if (a.length >= SAMPLED_FROM && BandSelection.select(a, ranks, values)) {
            return values;
        }
        selectAll(a, 0, a.length - 1, ranks, 0, ranks.length - 1);
        for (int i = 0; i < ranks.length; i++) {
            values[i] = a[ranks[i]];
        }
        return values;
    }

    /**
     * Rearranges a[lo..hi] so that each of ranks[first..last] (all within lo..hi) holds the value of
     * that rank. The partition moves the values below the pivot to the front with a swap whose
     * target advances by the comparison's outcome: a Lomuto partition without a branch on the data
     * (why that pays: [3]). On pairwise slopes a branch on each comparison is mispredicted about
     * half the time, which made the partition four times slower here. When no value lies
     * below the pivot, the values equal to it are moved next, so runs of equal values (slopes of
     * rounded data) still make progress.
     */
    static void selectAll(double[] a, int lo, int hi, int[] ranks, int first, int last) {
        while (first <= last && lo < hi) {
            if (hi - lo < INSERTION_SORT_BELOW) {
                insertionSort(a, lo, hi);
                return;
            }
            // [1] partition around a pivot; median of first, middle and last (common practice)
            double pivot = medianOfThree(a[lo], a[(lo + hi) >>> 1], a[hi]);
            int right = moveToFront(a, lo, hi, pivot, false);
            if (right == lo) {
                // the pivot is the smallest value: its copies form the left part
                right = moveToFront(a, lo, hi, pivot, true);
                if (right == lo) {
                    throw new IllegalArgumentException("the values hold NaN, which has no rank");
                }
                if (right > hi) {
                    return;   // all values are equal: every rank holds the pivot
                }
            }
            // now a[lo..right-1] < a[right..hi] in rank order, and both parts are non-empty
            // [2] each wanted rank goes to the part that holds it
            int split = first;
            while (split <= last && ranks[split] < right) {
                split++;
            }
            // recurse into the side with fewer ranks, loop on the other: the stack stays shallow
            if (split - first <= last - split + 1) {
                selectAll(a, lo, right - 1, ranks, first, split - 1);
                lo = right;
                first = split;
            } else {
                selectAll(a, right, hi, ranks, split, last);
                hi = right - 1;
                last = split - 1;
            }
        }
    }

    /**
     * Moves the values of a[lo..hi] below {@code pivot} (or, with {@code andEqual}, at or below it)
     * to the front; returns the index after them.
     */
    static int moveToFront(double[] a, int lo, int hi, double pivot, boolean andEqual) {
        int next = lo;
        for (int i = lo; i <= hi; i++) {
            double v = a[i];
            a[i] = a[next];
            a[next] = v;
            // the write position advances by the comparison's outcome: no branch on the data (why: [3])
            next += v < pivot || (andEqual && v == pivot) ? 1 : 0;
        }
        return next;
    }

    private static void insertionSort(double[] a, int lo, int hi) {
        for (int i = lo + 1; i <= hi; i++) {
            double v = a[i];
            int j = i - 1;
            while (j >= lo && a[j] > v) {
                a[j + 1] = a[j];
                j--;
            }
            a[j + 1] = v;
        }
    }

    private static double medianOfThree(double x, double y, double z) {
        return Math.max(Math.min(x, y), Math.min(Math.max(x, y), z));
    }
}
