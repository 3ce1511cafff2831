package org.annalist.analysis.forecast;

/**
 * Q₀, the stationary covariance of the ARMA part of an ARIMA state vector (Harvey's form, r = max(p, q + 1)
 * states), by Gardner, Harvey &amp; Phillips' algorithm [1, §3] exactly as R's {@code getQ0} [2] codes it
 * (R's default {@code SSinit = "Gardner1980"}), so that the likelihood is R's also where the algorithm is
 * inaccurate (AR roots near the unit circle).
 *
 * <h2>References</h2>
 * <ol>
 * <li>Gardner, G., Harvey, A. C. &amp; Phillips, G. D. A. (1980). Algorithm AS 154: An algorithm for
 * exact maximum likelihood estimation of autoregressive-moving average models by means of Kalman
 * filtering. <i>Applied Statistics</i> 29(3), 311–322. DOI 10.2307/2346910.</li>
 * <li>R Core Team, {@code src/library/stats/src/arima.c} ({@code getQ0}, {@code inclu2}) (R 4.2).</li>
 * </ol>
 */
final class GardnerCovariance {

    private GardnerCovariance() {
    }

    /**
     * Q₀, the stationary covariance of the ARMA block (r × r, row-major), by [1]'s algorithm as
     * [2] {@code getQ0} codes it: the equations vec(Q₀) = vec(T Q₀ Tᵀ) + vec(V) are solved by
     * Givens rotations for p &gt; 0, by back-substitution for a pure moving average.
     */
    static double[] of(double[] phi, double[] theta) {
        int p = phi.length;
        int q = theta.length;
        int r = Math.max(p, q + 1);
        int np = r * (r + 1) / 2;
        int nrbar = np * (np - 1) / 2;
        double[] v = new double[np];
        for (int ind = 0, j = 0; j < r; j++) {
            double vj = j == 0 ? 1 : j - 1 < q ? theta[j - 1] : 0;
            for (int i = j; i < r; i++) {
                double vi = i == 0 ? 1 : i - 1 < q ? theta[i - 1] : 0;
                v[ind++] = vi * vj;
            }
        }
        double[] res = new double[r * r];
        if (r == 1) {
            res[0] = p == 0 ? 1 : 1 / (1 - phi[0] * phi[0]);
            return res;
        }
        double[] pp = new double[Math.max(np, r * r)];
        if (p > 0) {
            double[] rbar = new double[nrbar];
            double[] thetab = new double[np];
            double[] xnext = new double[np];
            double[] xrow = new double[np];
            int ind = 0;
            int ind1 = -1;
            int npr = np - r;
            int npr1 = npr + 1;
            int indj = npr;
            int ind2 = npr - 1;
            for (int j = 0; j < r; j++) {
                double phij = j < p ? phi[j] : 0;
                xnext[indj++] = 0;
                int indi = npr1 + j;
                for (int i = j; i < r; i++) {
                    double ynext = v[ind++];
                    double phii = i < p ? phi[i] : 0;
                    if (j != r - 1) {
                        xnext[indj] = -phii;
                        if (i != r - 1) {
                            xnext[indi] -= phij;
                            xnext[++ind1] = -1;
                        }
                    }
                    xnext[npr] = -phii * phij;
                    if (++ind2 >= np) {
                        ind2 = 0;
                    }
                    xnext[ind2] += 1;
                    include(np, xnext, xrow, ynext, pp, rbar, thetab);
                    xnext[ind2] = 0;
                    if (i != r - 1) {
                        xnext[indi++] = 0;
                        xnext[ind1] = 0;
                    }
                }
            }
            int ithisr = nrbar - 1;
            int im = np - 1;
            for (int i = 0; i < np; i++) {
                double bi = thetab[im];
                for (int jm = np - 1, j = 0; j < i; j++) {
                    bi -= rbar[ithisr--] * pp[jm--];
                }
                pp[im--] = bi;
            }
            // re-order
            ind = npr;
            for (int i = 0; i < r; i++) {
                xnext[i] = pp[ind++];
            }
            ind = np - 1;
            ind1 = npr - 1;
            for (int i = 0; i < npr; i++) {
                pp[ind--] = pp[ind1--];
            }
            for (int i = 0; i < r; i++) {
                pp[i] = xnext[i];
            }
        } else {
            int indn = np;
            int ind = np;
            for (int i = 0; i < r; i++) {
                for (int j = 0; j <= i; j++) {
                    --ind;
                    pp[ind] = v[ind];
                    if (j != 0) {
                        pp[ind] += pp[--indn];
                    }
                }
            }
        }
        // unpack the packed upper triangle to a full matrix (R's column-major P[i + r j])
        System.arraycopy(pp, 0, res, 0, np);
        for (int i = r - 1, ind = np; i > 0; i--) {
            for (int j = r - 1; j >= i; j--) {
                res[r * i + j] = res[--ind];
            }
        }
        for (int i = 0; i < r - 1; i++) {
            for (int j = i + 1; j < r; j++) {
                res[i + r * j] = res[j + r * i];
            }
        }
        return res; // symmetric, so row- and column-major agree
    }

    /** [2] {@code inclu2}: adds one row to the Givens-rotated system. */
    private static void include(int np, double[] xnext, double[] xrow, double ynext, double[] d, double[] rbar,
                                double[] thetab) {
        System.arraycopy(xnext, 0, xrow, 0, np);
        for (int ithisr = 0, i = 0; i < np; i++) {
            if (xrow[i] != 0.0) {
                double xi = xrow[i];
                double di = d[i];
                double dpi = di + xi * xi;
                d[i] = dpi;
                double cbar = di / dpi;
                double sbar = xi / dpi;
                for (int k = i + 1; k < np; k++) {
                    double xk = xrow[k];
                    double rbthis = rbar[ithisr];
                    xrow[k] = xk - xi * rbthis;
                    rbar[ithisr++] = cbar * rbthis + sbar * xk;
                }
                double xk = ynext;
                ynext = xk - xi * thetab[i];
                thetab[i] = cbar * thetab[i] + sbar * xk;
                if (di == 0.0) {
                    return;
                }
            } else {
                ithisr = ithisr + np - i - 1;
            }
        }
    }
}
