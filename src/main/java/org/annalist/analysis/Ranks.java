package org.annalist.analysis;

import java.util.Arrays;

/** Ranks with ties at their mean rank, and the tie sum Σ(t³ − t) that rank tests correct for. */
public final class Ranks {

    private Ranks() {
    }

    /** Ranks 1..n of {@code x} (no NaN), ties given their mean rank. */
    public static double[] of(double[] x) {
        int n = x.length;
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        Arrays.sort(order, (a, b) -> Double.compare(x[a], x[b]));
        double[] ranks = new double[n];
        for (int i = 0; i < n; ) {
            int j = i;
            while (j + 1 < n && x[order[j + 1]] == x[order[i]]) {
                j++;
            }
            double rank = (i + j) / 2.0 + 1;
            for (int k = i; k <= j; k++) {
                ranks[order[k]] = rank;
            }
            i = j + 1;
        }
        return ranks;
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
            sum += t * t * t - t;
            i = j + 1;
        }
        return sum;
    }
}
