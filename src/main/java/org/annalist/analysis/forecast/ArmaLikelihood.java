package org.annalist.analysis.forecast;

/**
 * The exact Gaussian likelihood of a stationary ARMA process, for the search of an ARIMA model's
 * maximum likelihood on its differenced series. R's {@code arima} filters the undifferenced series
 * with r + d + mD states, the last d + mD from a diffuse prior of variance κ = 10⁶, and leaves the
 * first d + mD innovations out ({@link ArimaKalman}); as κ grows, that likelihood tends to the
 * exact likelihood of the differenced series under the stationary ARMA model [1; 2, ch. 5], which
 * this class computes with the r = max(p, q + 1) ARMA states alone, in O(r) operations per value:
 * <ul>
 * <li>the filter starts from the stationary covariance Q₀, of which it needs only the first column,
 * the covariances of y_t with the states: Σ_{k ≥ j} (φ_k γ(k − j + 1) + θ_k ψ_{k−j}) with θ₀ = 1,
 * from the autocovariances γ and the ψ weights, the autocovariances solved from the first p + 1
 * moment equations and the later ones by recursion [3, §3.3];</li>
 * <li>the predicted covariance P_t is never formed: started from Q₀, its change P_{t+1} − P_t is of
 * rank one, and the Chandrasekhar recursions [4] carry that change as a vector and a scalar, which
 * give the innovation variance F_t and the gain T P_t Z' directly, as Mélard's algorithm does [5].</li>
 * </ul>
 * The two likelihoods differ by terms of order 1/κ (a relative 10⁻⁸ to 10⁻⁶ of the objective on
 * monthly series); the estimate is therefore evaluated once more by the full filter, so that what is
 * reported is R's likelihood at the coefficients found.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Ansley, C. F. &amp; Kohn, R. (1985). Estimation, filtering, and smoothing in state space models
 * with incompletely specified initial conditions. <i>The Annals of Statistics</i> 13(4), 1286–1316.</li>
 * <li>Durbin, J. &amp; Koopman, S. J. (2012). <i>Time Series Analysis by State Space Methods</i>,
 * 2nd ed. Oxford University Press, ch. 5 (initialisation). DOI 10.1093/acprof:oso/9780199641178.001.0001.</li>
 * <li>Brockwell, P. J. &amp; Davis, R. A. (1991). <i>Time Series: Theory and Methods</i>, 2nd ed.
 * Springer, §3.3 (the autocovariance function of an ARMA process).</li>
 * <li>Morf, M., Sidhu, G. S. &amp; Kailath, T. (1974). Some new algorithms for recursive estimation in
 * constant, linear, discrete-time systems. <i>IEEE Transactions on Automatic Control</i> 19(4), 315–323.</li>
 * <li>Mélard, G. (1984). Algorithm AS 197: A fast algorithm for the exact likelihood of
 * autoregressive-moving average models. <i>Applied Statistics</i> 33(1), 104–114.</li>
 * </ol>
 */
final class ArmaLikelihood {

    /** R's bound above which a one-step variance counts as diffuse and leaves the likelihood out ({@link ArimaKalman}). */
    private static final double DIFFUSE_GAIN = 1e4;

    private ArmaLikelihood() {
    }

    /**
     * Sum of squared standardised innovations, sum of their log variances (units of σ²) and their
     * count, for the values {@code w[from]} … of a stationary ARMA process with expanded polynomials
     * {@code phi} (index 0 the lag-1 coefficient) and {@code theta}; a value whose one-step variance
     * reaches 10⁴ is left out, as in R. Not finite when the autoregression is not stationary.
     */
    static ArimaKalman.Likelihood of(double[] phi, double[] theta, double[] w, int from) {
        int p = phi.length;
        int r = Math.max(p, theta.length + 1);
        double[] gamma = autocovariances(phi, theta, r);
        double[] psi = psiWeights(phi, theta, r);
        int[] arLags = nonZeroLags(phi);
        // Q₀'s first column: cov(y_t, α_j(t)) with α_j(t) = Σ_{k ≥ j} (φ_k y_{t−1−k+j} + θ_k ε_{t−k+j})
        double[] column = new double[r + 1];
        for (int j = 0; j < r; j++) {
            double c = 0;
            for (int k = j; k < r; k++) {
                c += (k < p ? phi[k] * gamma[k - j + 1] : 0) + loading(theta, k) * psi[k - j];
            }
            column[j] = c;
        }
        double f = column[0];
        double[] gain = new double[r]; // T P_t Z'
        for (int i = 0; i < r; i++) {
            gain[i] = (i < p ? phi[i] * f : 0) + column[i + 1];
        }
        // P₂ − P₁ = −gain gainᵀ / F₁, since Q₀ = T Q₀ Tᵀ + R Rᵀ; the change stays of rank one
        double[] change = gain.clone();
        double scale = -1 / f;
        double[] state = new double[r];
        double[] moved = new double[r];
        double ssq = 0;
        double sumLog = 0;
        int used = 0;
        boolean steady = false;
        for (int t = from; t < w.length; t++) {
            double v = w[t] - state[0];
            if (f < DIFFUSE_GAIN) {
                ssq += v * v / f;
                sumLog += Math.log(f);
                used++;
            }
            double step = v / f;
            transition(arLags, phi, state, moved);
            for (int i = 0; i < r; i++) {
                state[i] = moved[i] + gain[i] * step;
            }
            if (steady) {
                continue;
            }
            double c0 = change[0];
            double fNext = f + scale * c0 * c0;
            transition(arLags, phi, change, moved);
            double push = scale * c0;
            double size = 0;
            for (int i = 0; i < r; i++) {
                gain[i] += push * moved[i];
            }
            double back = c0 / fNext;
            for (int i = 0; i < r; i++) {
                change[i] = moved[i] - gain[i] * back;
                size += change[i] * change[i];
            }
            scale *= fNext / f;
            f = fNext;
            // the remaining change of P is below rounding: F and the gain stay as they are
            steady = Math.abs(scale) * size <= ArimaKalman.STEADY_TOLERANCE * f;
        }
        return new ArimaKalman.Likelihood(ssq, sumLog, used);
    }

    /** The ARMA part of the transition T of R's {@code makeARIMA}: (T x)_i = φ_i x_0 + x_{i+1}. */
    private static void transition(int[] arLags, double[] phi, double[] x, double[] out) {
        int r = x.length;
        System.arraycopy(x, 1, out, 0, r - 1);
        out[r - 1] = 0;
        double x0 = x[0];
        for (int k : arLags) {
            out[k] += phi[k] * x0;
        }
    }

    private static double loading(double[] theta, int k) {
        return k == 0 ? 1 : k - 1 < theta.length ? theta[k - 1] : 0;
    }

    private static int[] nonZeroLags(double[] c) {
        return java.util.stream.IntStream.range(0, c.length).filter(k -> c[k] != 0).toArray();
    }

    /** ψ_0 … ψ_{count−1} of the MA(∞) form: ψ_j = θ_j + Σ_{i=1}^{min(j, p)} φ_i ψ_{j−i}. */
    static double[] psiWeights(double[] phi, double[] theta, int count) {
        double[] psi = new double[Math.max(count, 1)];
        psi[0] = 1;
        for (int j = 1; j < psi.length; j++) {
            double s = loading(theta, j);
            for (int i = 1; i <= Math.min(j, phi.length); i++) {
                s += phi[i - 1] * psi[j - i];
            }
            psi[j] = s;
        }
        return psi;
    }

    /**
     * γ(0) … γ(maxLag) in units of σ² [3, §3.3]: γ(k) − Σ φ_i γ(k − i) = Σ_{j=k}^{q} θ_j ψ_{j−k}, solved for
     * k = 0 … p by Gaussian elimination with partial pivoting, then by recursion.
     */
    static double[] autocovariances(double[] phi, double[] theta, int maxLag) {
        int p = phi.length;
        int q = theta.length;
        double[] psi = psiWeights(phi, theta, q + 1);
        int size = Math.max(maxLag, p) + 1;
        double[] rhs = new double[size];
        for (int k = 0; k <= Math.min(q, size - 1); k++) {
            double s = 0;
            for (int j = k; j <= q; j++) {
                s += loading(theta, j) * psi[j - k];
            }
            rhs[k] = s;
        }
        double[] gamma = new double[size];
        int m = p + 1;
        double[][] a = new double[m][m + 1];
        for (int k = 0; k < m; k++) {
            a[k][k] += 1;
            for (int i = 1; i <= p; i++) {
                a[k][Math.abs(k - i)] -= phi[i - 1];
            }
            a[k][m] = rhs[k];
        }
        for (int col = 0; col < m; col++) {
            int pivot = col;
            for (int row = col + 1; row < m; row++) {
                if (Math.abs(a[row][col]) > Math.abs(a[pivot][col])) {
                    pivot = row;
                }
            }
            double[] keep = a[col];
            a[col] = a[pivot];
            a[pivot] = keep;
            double diagonal = a[col][col];
            for (int row = col + 1; row < m; row++) {
                double factor = a[row][col] / diagonal;
                if (factor != 0) {
                    for (int c = col; c <= m; c++) {
                        a[row][c] -= factor * a[col][c];
                    }
                }
            }
        }
        for (int row = m - 1; row >= 0; row--) {
            double s = a[row][m];
            for (int c = row + 1; c < m; c++) {
                s -= a[row][c] * gamma[c];
            }
            gamma[row] = s / a[row][row];
        }
        for (int k = m; k < size; k++) {
            double s = rhs[k];
            for (int i = 1; i <= p; i++) {
                s += phi[i - 1] * gamma[k - i];
            }
            gamma[k] = s;
        }
        return gamma;
    }
}
