package org.annalist.analysis.decompose;

/**
 * The partial sort {@code psort} of the reference STL code, ported state for state (its
 * {@code goto} labels are the cases below), because STL's robustness scale is read from the
 * positions it leaves: STL asks it for positions {@code n/2 + 1} and {@code n − n/2} in that
 * (descending) order, for which the routine does not always leave the exact order statistics
 * there. Reproducing R's robust fits to 1e-6 needs the same values, so the routine is kept as it is.
 *
 * <p>Source: [1], subroutine {@code psort}, after Singleton's quickersort [2].
 *
 * <p>References:
 * <ol>
 * <li>R Core Team, {@code src/library/stats/src/stl.f} (R 4.2).</li>
 * <li>R. C. Singleton (1969), "Algorithm 347: An Efficient Algorithm for Sorting with Minimal
 *     Storage", <i>Communications of the ACM</i> 12(3), 185–187. doi:10.1145/362875.362901</li>
 * </ol>
 */
final class PartialSort {

    private PartialSort() {
    }

    /**
     * Rearranges {@code a} (0-based storage, 1-based positions in the logic) so that, as far as
     * the routine guarantees, {@code a[ind[k] − 1]} holds the {@code ind[k]}-th smallest value.
     */
    static void psort(double[] a0, int n, int[] ind0) {
        int ni = ind0.length;
        if (n < 2 || ni == 0) {
            return;
        }
        double[] a = new double[n + 1];
        System.arraycopy(a0, 0, a, 1, n);
        int[] ind = new int[ni + 1];
        System.arraycopy(ind0, 0, ind, 1, ni);
        int[] indu = new int[17];
        int[] indl = new int[17];
        int[] iu = new int[17];
        int[] il = new int[17];
        int jl = 1;
        int ju = ni;
        indl[1] = 1;
        indu[1] = ni;
        int i = 1;
        int j = n;
        int m = 1;
        int k = 0;
        int l = 0;
        int p;
        double t;
        double tt;
        int label = 161;
        while (true) {
            switch (label) {
                case 161 -> label = i < j ? 10 : 166;
                case 166 -> {
                    m--;
                    if (m == 0) {
                        System.arraycopy(a, 1, a0, 0, n);
                        return;
                    }
                    i = il[m];
                    j = iu[m];
                    jl = indl[m];
                    ju = indu[m];
                    label = jl <= ju ? 173 : 166;
                }
                case 173 -> label = j - i > 10 ? 10 : 174;
                case 10 -> {
                    // [2] median of a[i], a[ij], a[j] as the pivot, then the two-sided partition
                    k = i;
                    int ij = (i + j) / 2;
                    t = a[ij];
                    if (a[i] > t) {
                        a[ij] = a[i];
                        a[i] = t;
                        t = a[ij];
                    }
                    l = j;
                    if (a[j] < t) {
                        a[ij] = a[j];
                        a[j] = t;
                        t = a[ij];
                        if (a[i] > t) {
                            a[ij] = a[i];
                            a[i] = t;
                            t = a[ij];
                        }
                    }
                    while (true) {                               // label 181
                        l--;
                        if (a[l] <= t) {
                            tt = a[l];
                            do {                                 // label 186
                                k++;
                            } while (!(a[k] >= t));
                            if (k > l) {
                                break;                           // to 183
                            }
                            a[l] = a[k];
                            a[k] = tt;
                        }
                    }
                    indl[m] = jl;                                // label 183
                    indu[m] = ju;
                    p = m;
                    m++;
                    label = 173;
                    if (l - i <= j - k) {
                        il[p] = k;
                        iu[p] = j;
                        j = l;
                        while (true) {                           // label 193
                            if (jl > ju) {
                                label = 166;
                                break;
                            }
                            if (ind[ju] > j) {
                                ju--;
                            } else {
                                indl[p] = ju + 1;
                                break;
                            }
                        }
                    } else {
                        il[p] = i;
                        iu[p] = l;
                        i = k;
                        while (true) {                           // label 200
                            if (jl > ju) {
                                label = 166;
                                break;
                            }
                            if (ind[jl] < i) {
                                jl++;
                            } else {
                                indu[p] = jl - 1;
                                break;
                            }
                        }
                    }
                }
                // [1] at most 11 values left: insertion sort, unless the segment starts at position 1
                case 174 -> {
                    if (i != 1) {
                        i--;
                        while (true) {                           // label 209
                            i++;
                            if (i == j) {
                                break;
                            }
                            t = a[i + 1];
                            if (a[i] > t) {
                                k = i;
                                do {                             // label 216
                                    a[k + 1] = a[k];
                                    k--;
                                } while (!(t >= a[k]));
                                a[k + 1] = t;
                            }
                        }
                        label = 166;
                    } else {
                        label = 161;
                    }
                }
                default -> throw new IllegalStateException("no label " + label);
            }
        }
    }
}
