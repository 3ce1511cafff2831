package org.annalist.analysis.forecast;

import java.util.Optional;
import org.apache.commons.math3.exception.MaxCountExceededException;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;

/**
 * The polynomial bookkeeping of a seasonal ARIMA model as R's {@code arima} does it [1]: the
 * multiplicative expansion φ(B)Φ(B^m) and θ(B)Θ(B^m), the differencing polynomial
 * (1 − B)^d (1 − B^m)^D, the Jones (1980) reparametrisation of an autoregression by partial
 * autocorrelations tanh(u) [2] that keeps the maximum-likelihood search inside the stationary region,
 * and the roots that decide stationarity and invertibility. The roots' moduli are the reciprocals of
 * the companion matrix's eigenvalues.
 *
 * <h2>References</h2>
 * <ol>
 * <li>R Core Team, {@code src/library/stats/R/arima.R} and {@code src/library/stats/src/arima.c}
 * ({@code ARIMA_transPars}, {@code partrans}, {@code invpartrans}, {@code maInvert},
 * {@code arCheck}) (R 4.2).</li>
 * <li>Jones, R. H. (1980). Maximum likelihood fitting of ARMA models to time series with missing
 * observations. <i>Technometrics</i> 22(3), 389–395. DOI 10.1080/00401706.1980.10486171.</li>
 * </ol>
 */
final class ArimaPolynomials {

    private ArimaPolynomials() {
    }

    /**
     * The expanded φ (index 0 is the lag-1 coefficient) and θ from the coefficient vector
     * (ar 1…p, ma 1…q, sar 1…P, sma 1…Q), with the AR parts first mapped through {@link #partrans}
     * when {@code transformed} ([1] {@code ARIMA_transPars}).
     */
    static double[][] expand(double[] coef, ArimaOrder o, boolean transformed) {
        double[] par = coef.clone();
        if (transformed) {
            partrans(o.p(), coef, 0, par, 0);
            partrans(o.seasonalP(), coef, o.p() + o.q(), par, o.p() + o.q());
        }
        int m = o.period();
        int mp = o.p();
        int mq = o.q();
        int msp = o.seasonalP();
        int msq = o.seasonalQ();
        double[] phi = new double[mp + m * msp];
        double[] theta = new double[mq + m * msq];
        System.arraycopy(par, 0, phi, 0, mp);
        System.arraycopy(par, mp, theta, 0, mq);
        for (int j = 0; j < msp; j++) {
            double s = par[mp + mq + j];
            phi[(j + 1) * m - 1] += s;
            for (int i = 0; i < mp; i++) {
                phi[(j + 1) * m + i] -= par[i] * s;
            }
        }
        for (int j = 0; j < msq; j++) {
            double s = par[mp + mq + msp + j];
            theta[(j + 1) * m - 1] += s;
            for (int i = 0; i < mq; i++) {
                theta[(j + 1) * m + i] += par[mp + i] * s;
            }
        }
        return new double[][] {phi, theta};
    }

    /** [1] {@code partrans}: u ↦ tanh(u) as partial autocorrelations, then Durbin–Levinson to AR coefficients. */
    static void partrans(int p, double[] raw, int from, double[] out, int to) {
        if (p == 0) {
            return;
        }
        double[] work = new double[p];
        double[] next = new double[p];
        for (int j = 0; j < p; j++) {
            work[j] = next[j] = Math.tanh(raw[from + j]);
        }
        for (int j = 1; j < p; j++) {
            double a = next[j];
            for (int k = 0; k < j; k++) {
                work[k] -= a * next[j - k - 1];
            }
            System.arraycopy(work, 0, next, 0, j);
        }
        System.arraycopy(next, 0, out, to, p);
    }

    /** [1] {@code invpartrans}: AR coefficients back to atanh of the partial autocorrelations. */
    static void invpartrans(int p, double[] phi, int from, double[] out, int to) {
        if (p == 0) {
            return;
        }
        double[] work = new double[p];
        double[] next = new double[p];
        for (int j = 0; j < p; j++) {
            work[j] = next[j] = phi[from + j];
        }
        for (int j = p - 1; j > 0; j--) {
            double a = next[j];
            for (int k = 0; k < j; k++) {
                work[k] = (next[k] + a * next[j - k - 1]) / (1 - a * a);
            }
            System.arraycopy(work, 0, next, 0, j);
        }
        for (int j = 0; j < p; j++) {
            out[to + j] = 0.5 * Math.log((1 + next[j]) / (1 - next[j])); // atanh
        }
    }

    /** The coefficients of −Δ, R's {@code Delta}: (1 − B)^d (1 − B^m)^D = 1 − Σ Δ_k B^k. */
    static double[] differencing(int d, int seasonalD, int period) {
        double[] poly = {1};
        for (int i = 0; i < d; i++) {
            poly = multiply(poly, new double[] {1, -1});
        }
        for (int i = 0; i < seasonalD; i++) {
            double[] s = new double[period + 1];
            s[0] = 1;
            s[period] = -1;
            poly = multiply(poly, s);
        }
        double[] delta = new double[poly.length - 1];
        for (int i = 0; i < delta.length; i++) {
            delta[i] = -poly[i + 1];
        }
        return delta;
    }

    private static double[] multiply(double[] a, double[] b) {
        double[] c = new double[a.length + b.length - 1];
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < b.length; j++) {
                c[i + j] += a[i] * b[j];
            }
        }
        return c;
    }

    /**
     * The smallest modulus of the roots of 1 + s·(c₁z + … + c_k z^k), trailing coefficients of at
     * most {@code negligible} in size dropped; infinity when none is left. s = −1 for an AR
     * polynomial, +1 for an MA one.
     */
    static double smallestRoot(double[] c, double sign, double negligible) {
        int k = c.length;
        while (k > 0 && !(Math.abs(c[k - 1]) > negligible)) {
            k--;
        }
        if (k == 0) {
            return Double.POSITIVE_INFINITY;
        }
        for (int i = 0; i < k; i++) {
            if (!Double.isFinite(c[i])) {
                return 0; // no roots to speak of: refused as if on the unit circle
            }
        }
        Optional<double[][]> roots = inverseRoots(c, sign, k);
        if (roots.isEmpty()) {
            return 0;
        }
        double[][] eig = roots.get();
        double largest = 0;
        for (int i = 0; i < k; i++) {
            largest = Math.max(largest, Math.hypot(eig[0][i], eig[1][i]));
        }
        return 1 / largest;
    }

    /**
     * Eigenvalues (real, imaginary parts) of the companion matrix of 1 + s Σ c_i z^i: the inverse
     * roots; empty when the eigenvalue iteration does not converge (seen on M3 series with
     * near-cancelling coefficients), and the model is then refused as one with a root on the circle.
     */
    private static Optional<double[][]> inverseRoots(double[] c, double sign, int k) {
        if (k == 1) {
            return Optional.of(new double[][] {{-sign * c[0]}, {0}});
        }
        double[][] companion = new double[k][k];
        for (int i = 0; i < k; i++) {
            companion[0][i] = -sign * c[i];
        }
        for (int i = 1; i < k; i++) {
            companion[i][i - 1] = 1;
        }
        try {
            EigenDecomposition e = new EigenDecomposition(new Array2DRowRealMatrix(companion, false));
            return Optional.of(new double[][] {e.getRealEigenvalues(), e.getImagEigenvalues()});
        } catch (MaxCountExceededException notConverged) {
            return Optional.empty(); // commons-math's Schur iteration gives up rather than answer
        }
    }

    /** [1] {@code arCheck}: all roots of 1 − φ₁z − … outside the unit circle. */
    static boolean isStationary(double[] ar, int from, int length) {
        double[] c = new double[length];
        System.arraycopy(ar, from, c, 0, length);
        return smallestRoot(c, -1, 0) > 1;
    }

    /**
     * [1] {@code maInvert}: the roots of 1 + θ₁z + … inside the unit circle replaced by their
     * reciprocals, which leaves the autocovariances unchanged up to the scale of σ².
     */
    static void invertMovingAverage(double[] coef, int from, int length) {
        int q0 = length;
        while (q0 > 0 && coef[from + q0 - 1] == 0) {
            q0--;
        }
        if (q0 == 0) {
            return;
        }
        double[] c = new double[q0];
        System.arraycopy(coef, from, c, 0, q0);
        Optional<double[][]> roots = inverseRoots(c, 1, q0);
        if (roots.isEmpty()) {
            return; // no roots to reflect: the coefficients stay, and the root check refuses the model
        }
        double[][] eig = roots.get();
        boolean any = false;
        for (int i = 0; i < q0; i++) {
            any |= Math.hypot(eig[0][i], eig[1][i]) > 1; // root inside the unit circle
        }
        if (!any) {
            return;
        }
        if (q0 == 1) {
            coef[from] = 1 / coef[from];
            return;
        }
        // ∏ (1 − λ_i z) with λ_i ↦ 1/λ_i where |λ_i| > 1
        double[] re = new double[q0 + 1];
        double[] im = new double[q0 + 1];
        re[0] = 1;
        for (int i = 0; i < q0; i++) {
            double lr = eig[0][i];
            double li = eig[1][i];
            double mod2 = lr * lr + li * li;
            if (mod2 > 1) {
                lr = lr / mod2;
                li = -li / mod2;
            }
            for (int j = i + 1; j >= 1; j--) {
                double pr = re[j - 1] * lr - im[j - 1] * li;
                double pi = re[j - 1] * li + im[j - 1] * lr;
                re[j] -= pr;
                im[j] -= pi;
            }
        }
        for (int i = 0; i < q0; i++) {
            coef[from + i] = re[i + 1];
        }
    }
}
