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
     * <p>Each sum adds the same terms in the same order as [1], so every bit agrees with it. A bulk
     * analysis spends much of its time here, and the launcher's C1 compiler does little to such
     * loops itself, so the work is cut in the source: the tricube weights come from a table
     * ({@link #TRICUBE}), the loops of [1] that run one after the other over the same neighbours
     * are joined where one's results do not feed the next's, and each weight is held in a local
     * between its reads and stored only where a later loop reads it.
     *
     * @param w scratch for the neighbourhood weights, at least {@code nright} long; what it holds
     *          afterwards is of no use to the caller
     * @return false when every neighbour has weight zero (nothing written)
     */
    static boolean estimate(double[] y, int n, int len, int degree, int xs, double[] ys, int at, int nleft,
                            int nright, double[] w, boolean userw, double[] rw) {
        double range = n - 1.0;
        // [1] works in double precision here; with whole positions every step is exact in int
        int farthest = Math.max(xs - nleft, nright - xs);
        int halfWidth = len > n ? farthest + (len - n) / 2 : farthest;   // integer division, as in [1]
        double h = halfWidth;
        double h9 = Stl.SINGLE_0_999 * h;
        double[] tricube = tricubeWeights(halfWidth, farthest);
        // arrays are 0-based: neighbour j (1-based, as in [1]) is at index i = j − 1
        int first = nleft - 1;
        int last = nright - 1;
        double a = 0;
        for (int i = first; i <= last; i++) {
            int distance = Math.abs((i + 1) - xs);
            double weight = 0;
            if (distance <= h9) {
                weight = tricube[distance];
                if (userw) {
                    weight = rw[i] * weight;
                }
                a += weight;
            }
            w[i] = weight;
        }
        if (a <= 0) {
            return false;
        }
        double fit = 0;
        if (h > 0 && degree > 0) {
            // [1] stlest, degree 1: the weights of the local weighted least-squares line at xs
            double mean = 0;
            for (int i = first; i <= last; i++) {
                double weight = w[i] / a;
                w[i] = weight;
                mean += weight * (i + 1);
            }
            double b = xs - mean;
            double c = 0;
            for (int i = first; i <= last; i++) {
                double fromMean = (i + 1) - mean;
                c += w[i] * fromMean * fromMean;
            }
            if (Math.sqrt(c) > Stl.SINGLE_0_001 * range) {
                b /= c;
                for (int i = first; i <= last; i++) {
                    fit += w[i] * (b * ((i + 1) - mean) + 1.0) * y[i];
                }
            } else {
                for (int i = first; i <= last; i++) {
                    fit += w[i] * y[i];
                }
            }
        } else {
            for (int i = first; i <= last; i++) {
                fit += w[i] / a * y[i];
            }
        }
        ys[at] = fit;
        return true;
    }

    /** Half-widths up to this one have their tricube weights in {@link #TRICUBE}. */
    private static final int TABULATED_HALF_WIDTH = 128;

    /**
     * {@code TRICUBE[h][r]}: the neighbourhood weight of [1] {@code stlest} at whole distance
     * {@code r ≤ 0.999 h} from the fitted position, for half-width {@code h}. Every distance and
     * half-width STL meets is whole, and these cover its windows for every frequency but the
     * longest seasonal windows, so the divisions and cubes of the weights are done once here
     * rather than at every neighbour of every local fit.
     */
    private static final double[][] TRICUBE = new double[TABULATED_HALF_WIDTH + 1][];

    static {
        for (int h = 0; h <= TABULATED_HALF_WIDTH; h++) {
            TRICUBE[h] = computeTricubeWeights(h, h);
        }
    }

    /** {@code weights[r]} for whole distances {@code r ≤ min(farthest, 0.999 h)} (beyond: unused). */
    private static double[] tricubeWeights(int halfWidth, int farthest) {
        return halfWidth <= TABULATED_HALF_WIDTH ? TRICUBE[halfWidth] : computeTricubeWeights(halfWidth, farthest);
    }

    private static double[] computeTricubeWeights(int halfWidth, int farthest) {
        double h = halfWidth;
        double h9 = Stl.SINGLE_0_999 * h;
        double h1 = Stl.SINGLE_0_001 * h;
        double[] weights = new double[farthest + 1];
        for (int distance = 0; distance <= farthest; distance++) {
            double r = distance;
            if (r <= h9) {
                if (r <= h1) {
                    weights[distance] = 1;
                } else {
                    // [3] tricube weight (1 − (r/h)³)³; 1 within 0.001 h and 0 beyond 0.999 h as in [1]
                    double q = r / h;
                    double t = 1 - q * q * q;
                    weights[distance] = t * t * t;
                }
            }
        }
        return weights;
    }
}
