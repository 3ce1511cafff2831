package org.annalist.analysis.forecast;

/**
 * Whether a seasonal ETS model's smoothing parameters lie in the forecastable region [1]: the same
 * answer as {@link EtsEstimation#isAdmissible} (no eigenvalue of the discount matrix D = F − g w′
 * beyond 1 + {@value #TOLERANCE} in modulus), without an eigen-decomposition, for a search that asks
 * it thousands of times per fit.
 *
 * <p>With the state (l, b, s_1 … s_m) of {@link EtsLinearForm}, an eigenvector of D gives
 * l(z − 1) = φb − αe, b(z − φ) = −βe and s_m(z^m − 1) = −γe with e = l + φb + s_m, so that
 * det(zI − D) = (z − 1)·Q(z) with S(z) = 1 + z + … + z^{m−1} and
 * Q(z) = S(z)[(z − 1)(z − φ) + α(z − φ) + φβz] + γ(z − φ) for a model with a trend (φ = 1 undamped)
 * and Q(z) = S(z)(z − 1 + α) + γ without one; the factor z − 1 is the unit root that the seasons'
 * redundancy leaves. The roots of Q lie within 1 + ε exactly when Q((1 + ε)z) has every root
 * strictly inside the unit circle, which the Schur–Cohn recursion [2, §6.8] decides in O(m²) steps.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J., Akram, M. &amp; Archibald, B. C. (2008). The admissible parameter space for
 * exponential smoothing models. <i>Annals of the Institute of Statistical Mathematics</i> 60(2),
 * 407–426. DOI 10.1007/s10463-006-0109-x.</li>
 * <li>Henrici, P. (1974). <i>Applied and Computational Complex Analysis</i>, vol. 1. Wiley.</li>
 * </ol>
 */
final class SeasonalForecastability {

    /** How far outside the unit circle a root may lie (rounding), as {@link EtsEstimation#isAdmissible}. */
    static final double TOLERANCE = 1e-6;

    private SeasonalForecastability() {
    }

    /** @param beta β as R writes it (the trend's response to a one-step error); ignored without a trend */
    static boolean holds(EtsModel model, double alpha, double beta, double gamma, double phi) {
        int m = model.period();
        boolean trended = model.trend() != EtsModel.Trend.NONE;
        double damping = model.damped() ? phi : 1;
        // the factor multiplying S(z), lowest power first
        double[] factor = trended
                ? new double[] {damping - alpha * damping, alpha + damping * beta - 1 - damping, 1}
                : new double[] {alpha - 1, 1};
        double[] q = new double[m + factor.length - 1];
        for (int k = 0; k < m; k++) {
            for (int j = 0; j < factor.length; j++) {
                q[k + j] += factor[j];
            }
        }
        if (trended) {
            q[0] -= gamma * damping;
            q[1] += gamma;
        } else {
            q[0] += gamma;
        }
        double scale = 1;
        for (int k = 0; k < q.length; k++) { // Q((1 + ε)z)
            q[k] *= scale;
            scale *= 1 + TOLERANCE;
        }
        return schurStable(q);
    }

    /**
     * Whether every root of Σ a_k z^k (real coefficients, lowest power first) lies strictly inside the
     * unit circle: |a_0| &lt; |a_n| and the same for (a_n p(z) − a_0 z^n p(1/z)) / z, of degree n − 1.
     */
    static boolean schurStable(double[] coefficients) {
        double[] a = coefficients.clone();
        for (int n = a.length - 1; n > 0; n--) {
            if (!(Math.abs(a[0]) < Math.abs(a[n]))) {
                return false;
            }
            double lead = a[n];
            double constant = a[0];
            double[] next = new double[n];
            for (int k = 0; k < n; k++) {
                next[k] = lead * a[k + 1] - constant * a[n - 1 - k];
            }
            // keep the numbers in range: only the roots matter
            double size = 0;
            for (double v : next) {
                size = Math.max(size, Math.abs(v));
            }
            for (int k = 0; k < n; k++) {
                a[k] = size > 0 ? next[k] / size : 0;
            }
            a = java.util.Arrays.copyOf(a, n);
        }
        return true;
    }
}
