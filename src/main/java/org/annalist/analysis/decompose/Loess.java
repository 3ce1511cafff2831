package org.annalist.analysis.decompose;

/**
 * The loess smoother of STL at equally spaced points: a local polynomial of degree 0 or 1 fitted
 * with tricube neighbourhood weights (times robustness weights when given), evaluated every
 * {@code jump}-th point and linearly interpolated in between.
 *
 * <p>Ports of the reference routines {@code stless} and {@code stlest} of Cleveland et al. [1],
 * in the form R runs them [2], keeping their 1-based positions in the arithmetic so that the
 * results agree to the last bits; arrays here are 0-based. Loess itself, with tricube weights, is
 * Cleveland's locally weighted regression [3].
 *
 * <p>References:
 * <ol>
 * <li>R. B. Cleveland, W. S. Cleveland, J. E. McRae and I. Terpenning (1990), "STL: A
 *     Seasonal-Trend Decomposition Procedure Based on Loess", <i>Journal of Official
 *     Statistics</i> 6(1), 3–73 (no DOI).</li>
 * <li>R Core Team, {@code src/library/stats/src/stl.f} (R 4.2), subroutines {@code stless} and
 *     {@code stlest}.</li>
 * <li>W. S. Cleveland (1979), "Robust Locally Weighted Regression and Smoothing Scatterplots",
 *     <i>Journal of the American Statistical Association</i> 74(368), 829–836.
 *     doi:10.1080/01621459.1979.10481038</li>
 * </ol>
 */
final class Loess {

    private Loess() {
    }

    /**
     * [1] {@code stless}: smooths {@code y[0..n)} into {@code ys[offset..offset+n)}.
     *
     * @param work neighbourhood weights, at least {@code n} long
     */
    static void smooth(double[] y, int n, int len, int degree, int jump, boolean userw, double[] rw, double[] ys,
                       int offset, double[] work) {
        if (n < 2) {
            ys[offset] = y[0];
            return;
        }
        int newnj = Math.min(jump, n - 1);
        int nleft = 0;
        int nright = 0;
        if (len >= n) {
            nleft = 1;
            nright = n;
            for (int i = 1; i <= n; i += newnj) {
                fitAt(y, n, len, degree, i, ys, offset, nleft, nright, work, userw, rw);
            }
        } else if (newnj == 1) {
            int nsh = (len + 1) / 2;
            nleft = 1;
            nright = len;
            for (int i = 1; i <= n; i++) {
                if (i > nsh && nright != n) {
                    nleft++;
                    nright++;
                }
                fitAt(y, n, len, degree, i, ys, offset, nleft, nright, work, userw, rw);
            }
        } else {
            int nsh = (len + 1) / 2;
            for (int i = 1; i <= n; i += newnj) {
                if (i < nsh) {
                    nleft = 1;
                    nright = len;
                } else if (i >= n - nsh + 1) {
                    nleft = n - len + 1;
                    nright = n;
                } else {
                    nleft = i - nsh + 1;
                    nright = len + i - nsh;
                }
                fitAt(y, n, len, degree, i, ys, offset, nleft, nright, work, userw, rw);
            }
        }
        // [1] stless: between the evaluated points the smooth is interpolated linearly
        if (newnj != 1) {
            for (int i = 1; i <= n - newnj; i += newnj) {
                double delta = (ys[offset + i + newnj - 1] - ys[offset + i - 1]) / newnj;
                for (int j = i + 1; j <= i + newnj - 1; j++) {
                    ys[offset + j - 1] = ys[offset + i - 1] + delta * (j - i);
                }
            }
            int k = ((n - 1) / newnj) * newnj + 1;
            if (k != n) {
                // [1] evaluates the last point with the neighbourhood left over from the loop above.
                fitAt(y, n, len, degree, n, ys, offset, nleft, nright, work, userw, rw);
                if (k != n - 1) {
                    double delta = (ys[offset + n - 1] - ys[offset + k - 1]) / (n - k);
                    for (int j = k + 1; j <= n - 1; j++) {
                        ys[offset + j - 1] = ys[offset + k - 1] + delta * (j - k);
                    }
                }
            }
        }
    }

    private static void fitAt(double[] y, int n, int len, int degree, int i, double[] ys, int offset, int nleft,
                              int nright, double[] work, boolean userw, double[] rw) {
        if (!estimate(y, n, len, degree, i, ys, offset + i - 1, nleft, nright, work, userw, rw)) {
            ys[offset + i - 1] = y[i - 1];
        }
    }

    /**
     * [1] {@code stlest}: the local fit at position {@code xs} (1-based, may lie outside 1..n) from
     * neighbours {@code nleft..nright} (1-based), written to {@code ys[at]}.
     *
     * @return false when every neighbour has weight zero (nothing written)
     */
    static boolean estimate(double[] y, int n, int len, int degree, double xs, double[] ys, int at, int nleft,
                            int nright, double[] w, boolean userw, double[] rw) {
        double range = n - 1.0;
        double h = Math.max(xs - nleft, nright - xs);
        if (len > n) {
            h += (len - n) / 2;                                  // integer division, as in [1]
        }
        double h9 = Stl.SINGLE_0_999 * h;
        double h1 = Stl.SINGLE_0_001 * h;
        double a = 0;
        for (int j = nleft; j <= nright; j++) {
            w[j - 1] = 0;
            double r = Math.abs(j - xs);
            if (r <= h9) {
                if (r <= h1) {
                    w[j - 1] = 1;
                } else {
                    // [3] tricube weight (1 − (r/h)³)³; 1 within 0.001 h and 0 beyond 0.999 h as in [1]
                    double q = r / h;
                    double t = 1 - q * q * q;
                    w[j - 1] = t * t * t;                        // tricube
                }
                if (userw) {
                    w[j - 1] = rw[j - 1] * w[j - 1];
                }
                a += w[j - 1];
            }
        }
        if (a <= 0) {
            return false;
        }
        // The loops of [1] that run one after the other over the same neighbours are joined where
        // one's results do not feed the next's (each sum still adds in the same order, so every bit
        // agrees with [1]): a bulk analysis spends much of its time here.
        double fit = 0;
        if (h > 0 && degree > 0) {
            // [1] stlest, degree 1: the weights of the local weighted least-squares line at xs
            double mean = 0;
            for (int j = nleft; j <= nright; j++) {
                w[j - 1] /= a;
                mean += w[j - 1] * j;
            }
            double b = xs - mean;
            double c = 0;
            for (int j = nleft; j <= nright; j++) {
                c += w[j - 1] * (j - mean) * (j - mean);
            }
            if (Math.sqrt(c) > Stl.SINGLE_0_001 * range) {
                b /= c;
                for (int j = nleft; j <= nright; j++) {
                    w[j - 1] = w[j - 1] * (b * (j - mean) + 1.0);
                    fit += w[j - 1] * y[j - 1];
                }
                ys[at] = fit;
                return true;
            }
        } else {
            for (int j = nleft; j <= nright; j++) {
                w[j - 1] /= a;
            }
        }
        for (int j = nleft; j <= nright; j++) {
            fit += w[j - 1] * y[j - 1];
        }
        ys[at] = fit;
        return true;
    }
}
