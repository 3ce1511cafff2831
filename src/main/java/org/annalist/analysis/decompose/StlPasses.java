package org.annalist.analysis.decompose;

import java.util.Arrays;

/**
 * The passes of {@link Stl}: its inner loop (cycle-subseries smoothing, low-pass filter, trend
 * smoothing) and the robustness weights of its outer loop, a port of the reference Fortran ([1]
 * and [2] of {@link Stl}'s references: routines {@code stlstp}, {@code stlss}, {@code stlfts},
 * {@code stlma}, {@code stlrwt}).
 */
final class StlPasses {

    private StlPasses() {
    }

    /** Arrays the inner loop reuses ([1] Fortran {@code work(n + 2 n_p, 5)}). */
    static final class Workspace {
        final double[] w1;
        final double[] w2;
        final double[] w3;
        final double[] w4;
        final double[] w5;

        Workspace(int n, int period) {
            int size = n + 2 * period;
            w1 = new double[size];
            w2 = new double[size];
            w3 = new double[size];
            w4 = new double[size];
            w5 = new double[size];
        }
    }

    /** [1] {@code stlstp}: the inner loop, run {@code ni} times. */
    static void innerLoop(double[] y, Stl.Parameters p, boolean userw, double[] rw, double[] season,
                          double[] trend, Workspace w) {
        int n = y.length;
        int np = p.period();
        for (int pass = 0; pass < p.inner(); pass++) {
            for (int i = 0; i < n; i++) {
                w.w1[i] = y[i] - trend[i];                                   // step 1: detrend
            }
            cycleSubseries(w.w1, n, np, p.seasonalWindow(), p.seasonalDegree(), p.seasonalJump(), userw, rw,
                    w.w2, w.w3, w.w4, w.w5);                                 // step 2: C, length n + 2 n_p
            lowPassMovingAverages(w.w2, n + 2 * np, np, w.w3, w.w1);        // step 3: L = loess(MA(MA(MA(C))))
            Loess.smooth(w.w3, n, p.lowPassWindow(), p.lowPassDegree(), p.lowPassJump(), false, null, w.w1, 0, w.w5);
            for (int i = 0; i < n; i++) {
                season[i] = w.w2[np + i] - w.w1[i];                          // step 4: S = C − L
            }
            for (int i = 0; i < n; i++) {
                w.w1[i] = y[i] - season[i];                                  // step 5: deseasonalise
            }
            Loess.smooth(w.w1, n, p.trendWindow(), p.trendDegree(), p.trendJump(), userw, rw, trend, 0, w.w3);
        }
    }

    /**
     * [1] {@code stlss}: loess-smooths each cycle-subseries (all Januaries, …) and extends it by one
     * value at each end, giving {@code n + 2 n_p} values in {@code season}.
     */
    private static void cycleSubseries(double[] y, int n, int np, int ns, int degree, int jump, boolean userw,
                                       double[] rw, double[] season, double[] sub, double[] subSmooth,
                                       double[] subWeights) {
        double[] residual = new double[n / np + 3];   // loess neighbourhood weights of one subseries
        for (int j = 0; j < np; j++) {
            int k = (n - j - 1) / np + 1;                                    // length of this subseries
            for (int i = 0; i < k; i++) {
                sub[i] = y[i * np + j];
                if (userw) {
                    subWeights[i] = rw[i * np + j];
                }
            }
            Loess.smooth(sub, k, ns, degree, jump, userw, subWeights, subSmooth, 1, residual);
            int nright = Math.min(ns, k);
            if (!Loess.estimate(sub, k, ns, degree, 0, subSmooth, 0, 1, nright, residual, userw, subWeights)) {
                subSmooth[0] = subSmooth[1];
            }
            int nleft = Math.max(1, k - ns + 1);
            if (!Loess.estimate(sub, k, ns, degree, k + 1, subSmooth, k + 1, nleft, k, residual, userw, subWeights)) {
                subSmooth[k + 1] = subSmooth[k];
            }
            for (int m = 0; m < k + 2; m++) {
                season[m * np + j] = subSmooth[m];
            }
        }
    }

    /** [1] {@code stlfts}: moving averages of length n_p, n_p and 3; {@code n} values in, n − 2 n_p out. */
    private static void lowPassMovingAverages(double[] x, int n, int np, double[] out, double[] work) {
        movingAverage(x, n, np, out);
        movingAverage(out, n - np + 1, np, work);
        movingAverage(work, n - 2 * np + 2, 3, out);
    }

    /** [1] {@code stlma}: running mean of length {@code len} over {@code n} values (n − len + 1 out). */
    private static void movingAverage(double[] x, int n, int len, double[] ave) {
        int newn = n - len + 1;
        double v = 0;
        for (int i = 0; i < len; i++) {
            v += x[i];
        }
        ave[0] = v / len;
        for (int j = 1, k = len - 1, m = -1; j < newn; j++) {
            k++;
            m++;
            v = v - x[m] + x[k];
            ave[j] = v / len;
        }
    }

    /**
     * [1] {@code stlrwt}: bisquare weights B(|R| / h), h = 6 × median |R| over the observed values
     * (the median of an even count as the mean of the two middle values, located by {@link PartialSort});
     * 1 below 0.001 h, 0 above 0.999 h.
     */
    static void robustnessWeights(double[] y, double[] observed, double[] fit, double[] rw) {
        int n = y.length;
        double[] residuals = new double[n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            if (observed[i] > 0) {
                residuals[m++] = Math.abs(y[i] - fit[i]);
            }
        }
        double[] sorted = Arrays.copyOf(residuals, m);
        int mid1 = m / 2 + 1;                                               // 1-based, as in [1]
        int mid2 = m - mid1 + 1;
        PartialSort.psort(sorted, m, new int[] {mid1, mid2});
        // [1] h = 6 × median |R|: 3 × the sum of the two middle values
        double h = 3.0 * (sorted[mid1 - 1] + sorted[mid2 - 1]);
        double c9 = Stl.SINGLE_0_999 * h;
        double c1 = Stl.SINGLE_0_001 * h;
        for (int i = 0; i < n; i++) {
            if (observed[i] == 0) {
                rw[i] = 0;
                continue;
            }
            double r = Math.abs(y[i] - fit[i]);
            if (r <= c1) {
                rw[i] = 1;
            } else if (r <= c9) {
                // [1] the bisquare weight B(u) = (1 − u²)²
                double u = r / h;
                rw[i] = (1 - u * u) * (1 - u * u);
            } else {
                rw[i] = 0;
            }
        }
    }
}
