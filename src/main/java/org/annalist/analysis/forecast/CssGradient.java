package org.annalist.analysis.forecast;

/**
 * The exact gradient of the conditional-sum-of-squares objective F = ½ log(S / ν), S = Σ e_l² over
 * l ≥ ncond (R's {@code ARIMA_CSS} [1], as {@link ArimaEstimation} computes it), with respect to the
 * unexpanded coefficients ar, ma, sar, sma and the regression coefficient. One forward pass of the
 * residual recursion e_l = w_l − Σ φ_k w_{l−k−1} − Σ_{k &lt; l−ncond} θ_k e_{l−k−1}, one backward
 * pass of its adjoint ē_l = e_l / S − Σ θ_k ē_{l+k+1} (reverse-mode differentiation of the
 * recursion, the adjoint of the derivative recursion of Box, Jenkins &amp; Reinsel [2, §7.2], written
 * from memory), then ∂F/∂φ_k = −Σ ē_l w_{l−k−1}, ∂F/∂θ_k = −Σ ē_l e_{l−k−1} and the chain rule
 * through the multiplicative seasonal expansion ({@link ArimaPolynomials#expand}). It costs about
 * three evaluations of the objective whatever the number of coefficients, where the central
 * differences R's {@code optim} uses cost two per coefficient. Without a regression term the
 * objective's own residuals are those of the forward pass (the same recursion on the same
 * differenced values), so the objective keeps them here ({@link #residualsKeptFor}) and the gradient
 * at the same coefficients — where R's search always asks for it — runs the backward pass alone.
 *
 * <h2>References</h2>
 * <ol>
 * <li>R Core Team, {@code src/library/stats/src/arima.c}, {@code ARIMA_CSS} (R 4.2).</li>
 * <li>Box, G. E. P., Jenkins, G. M. &amp; Reinsel, G. C. (2008). <i>Time Series Analysis:
 * Forecasting and Control</i>, 4th ed. Wiley. DOI 10.1002/9781118619193.</li>
 * </ol>
 */
final class CssGradient {

    private final ArimaOrder order;
    private final int ncond;
    /** The differenced series when there is no regression term, else the differenced series itself before β. */
    private final double[] wy;
    /** The differenced regressor (null without one): w = wy − β·wx, since differencing is linear. */
    private final double[] wx;
    private final int narma;
    /** Indices of φ and θ that some coefficient can make non-zero, whatever their values. */
    private final int[] arSupport;
    private final int[] maSupport;
    private final double[] w;
    private final double[] e;
    private final double[] adjoint;
    private final double[] dPhi;
    private final double[] dTheta;
    /** The coefficients whose residuals {@link #e} holds, from the objective (null when none are kept). */
    private double[] keptFor;

    /**
     * @param differencedY    y differenced d times at lag 1 and D times at the seasonal lag, in place
     *                        (the first values kept as {@link ArimaEstimation} keeps them)
     * @param differencedXreg the regressor differenced the same way, or null without a regression term
     */
    CssGradient(ArimaOrder order, int ncond, double[] differencedY, double[] differencedXreg) {
        this.order = order;
        this.ncond = ncond;
        this.wy = differencedY.clone();
        this.wx = differencedXreg == null ? null : differencedXreg.clone();
        narma = order.armaCount();
        int m = order.period();
        arSupport = support(order.p(), order.seasonalP(), m);
        maSupport = support(order.q(), order.seasonalQ(), m);
        int n = wy.length;
        w = new double[n];
        e = new double[n];
        adjoint = new double[n];
        dPhi = new double[order.p() + m * order.seasonalP()];
        dTheta = new double[order.q() + m * order.seasonalQ()];
    }

    /** The lags 0 … p−1, and (j+1)m − 1 and (j+1)m + i for each seasonal j, in increasing order. */
    private static int[] support(int p, int seasonalP, int m) {
        boolean[] used = new boolean[p + m * seasonalP];
        for (int i = 0; i < p; i++) {
            used[i] = true;
        }
        for (int j = 0; j < seasonalP; j++) {
            used[(j + 1) * m - 1] = true;
            for (int i = 0; i < p; i++) {
                used[(j + 1) * m + i] = true;
            }
        }
        int count = 0;
        int[] lags = new int[used.length];
        for (int k = 0; k < used.length; k++) {
            if (used[k]) {
                lags[count++] = k;
            }
        }
        return java.util.Arrays.copyOf(lags, count);
    }

    /**
     * Writes ∂F/∂par into {@code g} (ar, ma, sar, sma, then the regression coefficient).
     *
     * @return false where F or its gradient is not finite (where R's {@code optim} would stop)
     */
    boolean at(double[] par, double[] g) {
        double[][] pt = ArimaPolynomials.expand(par, order, false);
        double[] phi = pt[0];
        double[] theta = pt[1];
        int n = w.length;
        double beta = wx == null ? 0 : par[narma];
        for (int l = 0; l < n; l++) {
            w[l] = wx == null ? wy[l] : wy[l] - beta * wx[l];
        }
        boolean kept = keptFor != null && java.util.Arrays.equals(par, keptFor);
        keptFor = null;
        double ssq = 0;
        for (int l = ncond; kept && l < n; l++) { // the objective's residuals at these coefficients
            ssq += e[l] * e[l];
        }
        for (int l = kept ? n : ncond; l < n; l++) {
            double tmp = w[l];
            for (int k : arSupport) {
                tmp -= phi[k] * w[l - k - 1];
            }
            int jmax = l - ncond;
            for (int k : maSupport) {
                if (k >= jmax) {
                    break;
                }
                tmp -= theta[k] * e[l - k - 1];
            }
            e[l] = tmp;
            ssq += tmp * tmp;
        }
        if (!Double.isFinite(ssq) || !(ssq > 0)) {
            return false;
        }
        // the adjoint: e_{l+k+1} depends on e_l through −θ_k whenever l ≥ ncond
        for (int l = n - 1; l >= ncond; l--) {
            double a = e[l] / ssq;
            for (int k : maSupport) {
                int later = l + k + 1;
                if (later >= n) {
                    break;
                }
                a -= theta[k] * adjoint[later];
            }
            adjoint[l] = a;
        }
        for (int k : arSupport) {
            double s = 0;
            for (int l = ncond; l < n; l++) {
                s -= adjoint[l] * w[l - k - 1];
            }
            dPhi[k] = s;
        }
        for (int k : maSupport) {
            double s = 0;
            for (int l = ncond + k + 1; l < n; l++) {
                s -= adjoint[l] * e[l - k - 1];
            }
            dTheta[k] = s;
        }
        chain(par, g);
        if (wx != null) { // ∂w_l/∂β = −wx_l, through the AR part as well
            double s = 0;
            for (int l = ncond; l < n; l++) {
                double dw = -wx[l];
                for (int k : arSupport) {
                    dw += phi[k] * wx[l - k - 1];
                }
                s += adjoint[l] * dw;
            }
            g[narma] = s;
        }
        for (double v : g) {
            if (!Double.isFinite(v)) {
                return false;
            }
        }
        return true;
    }

    /**
     * Where the objective at {@code par} may write its residuals (e_l from l = ncond on) for the
     * gradient at the same coefficients to use; null with a regression term, whose objective
     * differences the adjusted values rather than subtracting the differenced regressor, so that its
     * residuals may differ from the forward pass's in the last digits.
     */
    double[] residualsKeptFor(double[] par) {
        if (wx != null) {
            keptFor = null;
            return null;
        }
        keptFor = par.clone();
        return e;
    }

    /**
     * The chain rule through {@link ArimaPolynomials#expand}: φ_i = a_i, φ_{(j+1)m−1} += Φ_j,
     * φ_{(j+1)m+i} −= a_i Φ_j; θ_i = c_i, θ_{(j+1)m−1} += Θ_j, θ_{(j+1)m+i} += c_i Θ_j.
     */
    private void chain(double[] par, double[] g) {
        int m = order.period();
        int p = order.p();
        int q = order.q();
        int sp = order.seasonalP();
        int sq = order.seasonalQ();
        for (int i = 0; i < p; i++) {
            double s = dPhi[i];
            for (int j = 0; j < sp; j++) {
                s -= par[p + q + j] * dPhi[(j + 1) * m + i];
            }
            g[i] = s;
        }
        for (int i = 0; i < q; i++) {
            double s = dTheta[i];
            for (int j = 0; j < sq; j++) {
                s += par[p + q + sp + j] * dTheta[(j + 1) * m + i];
            }
            g[p + i] = s;
        }
        for (int j = 0; j < sp; j++) {
            double s = dPhi[(j + 1) * m - 1];
            for (int i = 0; i < p; i++) {
                s -= par[i] * dPhi[(j + 1) * m + i];
            }
            g[p + q + j] = s;
        }
        for (int j = 0; j < sq; j++) {
            double s = dTheta[(j + 1) * m - 1];
            for (int i = 0; i < q; i++) {
                s += par[p + i] * dTheta[(j + 1) * m + i];
            }
            g[p + q + sp + j] = s;
        }
    }
}
