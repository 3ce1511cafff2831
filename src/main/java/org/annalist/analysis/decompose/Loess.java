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
        LocalFits fits = new LocalFits(y, n, len, degree, userw, rw, ys, offset, work);
        if (len >= n) {
            nleft = 1;
            nright = n;
            for (int i = 1; i <= n; i += newnj) {
                fits.at(i, nleft, nright);
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
                fits.at(i, nleft, nright);
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
                fits.at(i, nleft, nright);
            }
        }
        fits.finish();
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
     * The local fits of one {@link #smooth}, run two at a time ({@link #estimatePair}) where two
     * neighbourhoods in a row have the same size, else one at a time, each as [1] {@code stless}
     * would run it. A fit is held back until the next one shows whether the two can go together;
     * none reads what another writes, so the order in which they are written does not matter.
     */
    private static final class LocalFits {
        private final double[] y;
        private final int n;
        private final int len;
        private final int degree;
        private final boolean userw;
        private final double[] rw;
        private final double[] ys;
        private final int offset;
        private final double[] work;
        private final double[] secondWork;
        private int heldAt;                 // 1-based position of the fit held back, 0 for none
        private int heldLeft;
        private int heldRight;

        LocalFits(double[] y, int n, int len, int degree, boolean userw, double[] rw, double[] ys, int offset,
                  double[] work) {
            this.y = y;
            this.n = n;
            this.len = len;
            this.degree = degree;
            this.userw = userw;
            this.rw = rw;
            this.ys = ys;
            this.offset = offset;
            this.work = work;
            this.secondWork = new double[Math.min(len, n)];
        }

        /** The fit at position {@code i} (1-based) from neighbours {@code nleft..nright}. */
        void at(int i, int nleft, int nright) {
            if (heldAt == 0) {
                hold(i, nleft, nright);
                return;
            }
            if (nright - nleft == heldRight - heldLeft) {
                if (!estimatePair(y, n, len, degree, userw, rw, heldAt, heldLeft, i, nleft, nright - nleft + 1,
                        work, secondWork, ys, offset)) {
                    fitAt(y, n, len, degree, heldAt, ys, offset, heldLeft, heldRight, work, userw, rw);
                    fitAt(y, n, len, degree, i, ys, offset, nleft, nright, work, userw, rw);
                }
                heldAt = 0;
                return;
            }
            fitAt(y, n, len, degree, heldAt, ys, offset, heldLeft, heldRight, work, userw, rw);
            hold(i, nleft, nright);
        }

        /** Runs the fit held back, if any. */
        void finish() {
            if (heldAt != 0) {
                fitAt(y, n, len, degree, heldAt, ys, offset, heldLeft, heldRight, work, userw, rw);
                heldAt = 0;
            }
        }

        private void hold(int i, int nleft, int nright) {
            heldAt = i;
            heldLeft = nleft;
            heldRight = nright;
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
        int reach = reach(halfWidth);
        double[] tricube = tricubeWeights(halfWidth, farthest);
        // arrays are 0-based: neighbour j (1-based, as in [1]) is at index i = j − 1
        int first = nleft - 1;
        int last = nright - 1;
        double a = 0;
        for (int i = first; i <= last; i++) {
            int distance = Math.abs((i + 1) - xs);
            double weight = 0;
            if (distance <= reach) {
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

    /**
     * Two fits of {@link #estimate} at once, at positions {@code xs} and {@code xs2} (1-based) of
     * the same series, from neighbourhoods of the same {@code size} starting at {@code nleft} and
     * {@code nleft2}, written to {@code ys[offset + xs − 1]} and {@code ys[offset + xs2 − 1]}.
     * Each fit's sums add the same terms in the same order as {@link #estimate}, so the bits are
     * the same; the two run in one loop so that the processor can add to one sum while the other's
     * last addition is still under way (each sum alone waits on its previous addition).
     *
     * @param w  scratch for the first fit's weights, at least {@code size} long
     * @param w2 scratch for the second fit's weights, at least {@code size} long
     * @return false, with nothing written, where {@link #estimate} would leave its usual path for
     *         either fit (every weight zero, a half-width of zero, a degenerate local line): the
     *         caller then runs both fits one at a time
     */
    private static boolean estimatePair(double[] y, int n, int len, int degree, boolean userw, double[] rw, int xs,
                                        int nleft, int xs2, int nleft2, int size, double[] w, double[] w2, double[] ys,
                                        int offset) {
        double range = n - 1.0;
        int farthest = Math.max(xs - nleft, nleft + size - 1 - xs);
        int farthest2 = Math.max(xs2 - nleft2, nleft2 + size - 1 - xs2);
        int halfWidth = len > n ? farthest + (len - n) / 2 : farthest;
        int halfWidth2 = len > n ? farthest2 + (len - n) / 2 : farthest2;
        if (degree > 0 && (halfWidth == 0 || halfWidth2 == 0)) {
            return false;
        }
        int reach = reach(halfWidth);
        int reach2 = reach(halfWidth2);
        double[] tricube = tricubeWeights(halfWidth, farthest);
        double[] tricube2 = tricubeWeights(halfWidth2, farthest2);
        // m counts the neighbours; the first fit's neighbour m is at index first + m, the second's at first2 + m
        int first = nleft - 1;
        int first2 = nleft2 - 1;
        double a = 0;
        double a2 = 0;
        for (int m = 0; m < size; m++) {
            int i = first + m;
            int i2 = first2 + m;
            int distance = Math.abs((i + 1) - xs);
            int distance2 = Math.abs((i2 + 1) - xs2);
            double weight = 0;
            double weight2 = 0;
            if (distance <= reach) {
                weight = tricube[distance];
                if (userw) {
                    weight = rw[i] * weight;
                }
                a += weight;
            }
            if (distance2 <= reach2) {
                weight2 = tricube2[distance2];
                if (userw) {
                    weight2 = rw[i2] * weight2;
                }
                a2 += weight2;
            }
            w[m] = weight;
            w2[m] = weight2;
        }
        if (a <= 0 || a2 <= 0) {
            return false;
        }
        double fit = 0;
        double fit2 = 0;
        if (degree > 0) {
            double mean = 0;
            double mean2 = 0;
            for (int m = 0; m < size; m++) {
                double weight = w[m] / a;
                double weight2 = w2[m] / a2;
                w[m] = weight;
                w2[m] = weight2;
                mean += weight * (first + m + 1);
                mean2 += weight2 * (first2 + m + 1);
            }
            double c = 0;
            double c2 = 0;
            for (int m = 0; m < size; m++) {
                double fromMean = (first + m + 1) - mean;
                double fromMean2 = (first2 + m + 1) - mean2;
                c += w[m] * fromMean * fromMean;
                c2 += w2[m] * fromMean2 * fromMean2;
            }
            double least = Stl.SINGLE_0_001 * range;
            if (!(Math.sqrt(c) > least && Math.sqrt(c2) > least)) {
                return false;
            }
            double b = (xs - mean) / c;
            double b2 = (xs2 - mean2) / c2;
            for (int m = 0; m < size; m++) {
                int i = first + m;
                int i2 = first2 + m;
                fit += w[m] * (b * ((i + 1) - mean) + 1.0) * y[i];
                fit2 += w2[m] * (b2 * ((i2 + 1) - mean2) + 1.0) * y[i2];
            }
        } else {
            for (int m = 0; m < size; m++) {
                fit += w[m] / a * y[first + m];
                fit2 += w2[m] / a2 * y[first2 + m];
            }
        }
        ys[offset + xs - 1] = fit;
        ys[offset + xs2 - 1] = fit2;
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

    /**
     * The farthest whole distance with a weight: [1] gives weight to neighbours within 0.999 h,
     * and a whole distance is within it exactly when it is within its whole part.
     */
    private static int reach(int halfWidth) {
        return (int) (Stl.SINGLE_0_999 * halfWidth);
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
