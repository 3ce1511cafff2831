package org.annalist.analysis.forecast;

import java.util.Optional;

/**
 * A seasonal ARIMA(p,d,q)(P,D,Q)[m] model with fixed orders, fitted as the forecast package's
 * {@code Arima} fits it [1] (estimation: {@link ArimaEstimation}); the information criteria are R's:
 * AIC = −2 log L + 2k with k the estimated coefficients plus one for σ², AICc = AIC + 2k(k + 1)/(n* − k − 1)
 * with n* = n − d − mD [1, §3.2], and the reported σ² is the residuals' sum of squares over n* − k + 1,
 * as the forecast package adjusts it. Forecasts and their variances come from the Kalman filter's
 * final state, as R's {@code predict.Arima} computes them (the exact variances of the integrated
 * model, including the uncertainty of the final state).
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J. &amp; Khandakar, Y. (2008). Automatic time series forecasting: the forecast
 * package for R. <i>Journal of Statistical Software</i> 27(3), 1–22. DOI 10.18637/jss.v027.i03.</li>
 * <li>Durbin, J. &amp; Koopman, S. J. (2012). <i>Time Series Analysis by State Space Methods</i>,
 * 2nd ed. Oxford University Press, §4.11 (forecasting). DOI 10.1093/acprof:oso/9780199641178.001.0001.</li>
 * </ol>
 */
public final class Arima {

    /** How the coefficients are estimated, as R's {@code arima(method = …)}. */
    public enum Method {
        /** Conditional sum of squares. */
        CSS,
        /** Exact maximum likelihood, started from zero. */
        ML,
        /** Exact maximum likelihood started from the CSS estimate (R's default). */
        CSS_ML
    }

    /** A fitted model. */
    public static final class Fit {

        private final ArimaOrder order;
        private final Method method;
        private final ArimaEstimation.Estimate estimate;
        private final double sigma2;
        private final double aic;
        private final double aicc;
        private final double bic;
        private final int n;
        private Boolean valid;

        private Fit(ArimaOrder order, Method method, ArimaEstimation.Estimate estimate, int n) {
            this.order = order;
            this.method = method;
            this.estimate = estimate;
            this.n = n;
            int k = parameterCount();
            int nStar = effectiveLength();
            double ss = 0;
            for (double e : estimate.residuals()) {
                ss += e * e;
            }
            sigma2 = ss / (nStar - k + 1); // [1] forecast::Arima: the unbiased residual variance
            aic = method == Method.CSS ? Double.NaN : -2 * estimate.logLik() + 2 * k;
            aicc = aic + 2.0 * k * (k + 1) / (nStar - k - 1);
            bic = aic + k * (Math.log(nStar) - 2);
        }

        public ArimaOrder order() {
            return order;
        }

        public Method method() {
            return method;
        }

        /** ar 1…p, ma 1…q, sar 1…P, sma 1…Q, then the mean or drift when the model has one (R's order). */
        public double[] coefficients() {
            return estimate.coef().clone();
        }

        public double logLik() {
            return estimate.logLik();
        }

        /** NaN for a CSS fit, as in R. */
        public double aic() {
            return aic;
        }

        public double aicc() {
            return aicc;
        }

        public double bic() {
            return bic;
        }

        /** The innovation variance the forecasts use: Σ residuals² / (n* − k + 1). */
        public double sigma2() {
            return sigma2;
        }

        /** R's {@code arima} estimate before the forecast package's adjustment. */
        double rawSigma2() {
            return estimate.sigma2();
        }

        /** The residuals: standardised innovations for ML, CSS innovations (zero at first) for CSS. */
        public double[] residuals() {
            return estimate.residuals().clone();
        }

        /** k: the estimated coefficients plus one for σ². */
        public int parameterCount() {
            return order.armaCount() + (order.hasMean() || order.hasDrift() ? 1 : 0) + 1;
        }

        /** n* = n − d − mD, the length the criteria count. */
        int effectiveLength() {
            return n - order.d() - order.seasonalD() * order.period();
        }

        /** Whether the forecast package's checks pass (see {@link AutoArima}); computed once, on demand. */
        boolean variancesValid() {
            if (valid == null) {
                valid = estimate.varianceValid().getAsBoolean();
            }
            return valid;
        }

        /** The smallest modulus of the expanded AR and MA polynomials' roots (infinity without any). */
        double smallestRoot() {
            return Math.min(ArimaPolynomials.smallestRoot(estimate.phi(), -1, 1e-8),
                    ArimaPolynomials.smallestRoot(estimate.theta(), 1, 1e-8));
        }

        /** ARIMA(p,d,q)(P,D,Q)[m]. */
        public String label() {
            return order.label();
        }

        /** The means of {@link #predict}, without its variances. */
        public double[] forecast(int h) {
            double[] mean = estimate.kalman().forecastMeans(h);
            for (int k = 0; k < h; k++) {
                mean[k] += regression(n + k + 1);
            }
            return mean;
        }

        /** Means and variances 1 … h ahead: [2] §4.11, with R's σ² ({@link #sigma2}). */
        public Prediction predict(int h) {
            double[][] f = estimate.kalman().forecast(h);
            for (int k = 0; k < h; k++) {
                f[0][k] += regression(n + k + 1);
                f[1][k] *= sigma2;
            }
            return new Prediction(f[0], f[1]);
        }

        /**
         * Sample paths 1 … h ahead, one per row of standard normal {@code shocks}: the state-space
         * recursion αₜ₊₁ = T αₜ + R εₜ₊₁, yₜ = Z αₜ + regression, from the final filtered state with
         * εₜ = σ zₜ. The paths leave out the (usually negligible) uncertainty of the final state that
         * {@link #predict} includes.
         */
        public double[][] paths(double[][] shocks) {
            ArimaKalman kalman = estimate.kalman();
            int rd = kalman.stateSize();
            double sd = Math.sqrt(sigma2);
            // the loading R = (1, θ₁ … θ_q, 0 … 0): the zeros past θ_q would add nothing to the state
            double[] loadings = new double[estimate.theta().length + 1];
            for (int i = 0; i < loadings.length; i++) {
                loadings[i] = kalman.loading(i);
            }
            int longest = java.util.Arrays.stream(shocks).mapToInt(row -> row.length).max().orElse(0);
            double[] regression = new double[longest];
            for (int k = 0; k < longest; k++) {
                regression[k] = regression(n + k + 1);
            }
            double[][] out = new double[shocks.length][];
            double[] state = new double[rd];
            double[] next = new double[rd];
            for (int path = 0; path < shocks.length; path++) {
                int h = shocks[path].length;
                out[path] = new double[h];
                System.arraycopy(kalman.a, 0, state, 0, rd);
                for (int k = 0; k < h; k++) {
                    kalman.transition(state, next);
                    double e = sd * shocks[path][k];
                    for (int i = 0; i < loadings.length; i++) {
                        next[i] += loadings[i] * e;
                    }
                    double[] stepped = next; // the new state; the old one's room takes the next step
                    next = state;
                    state = stepped;
                    out[path][k] = kalman.observe(state) + regression[k];
                }
            }
            return out;
        }

        /**
         * Point forecasts from every origin o = {@code firstOrigin} … n − 1 of {@code y}, 1 … min({@code reach},
         * n − o) ahead, with this fit's coefficients kept: what {@link #withCoefficients} on the values
         * before each origin would forecast, from one filter run over {@code y}.
         *
         * @return empty when a value is not finite
         */
        Optional<double[][]> forecastsFromOrigins(double[] y, int firstOrigin, int reach) {
            double[] adjusted = new double[y.length];
            for (int t = 0; t < y.length; t++) {
                if (!Double.isFinite(y[t])) {
                    return Optional.empty();
                }
                adjusted[t] = y[t] - regression(t + 1);
            }
            double[] delta = ArimaPolynomials.differencing(order.d(), order.seasonalD(), order.period());
            double[][] means = new ArimaKalman(estimate.phi(), estimate.theta(), delta)
                    .meansFromOrigins(adjusted, firstOrigin, reach);
            for (int o = 0; o < means.length; o++) {
                for (int k = 0; k < means[o].length; k++) {
                    means[o][k] += regression(firstOrigin + o + k + 1);
                }
            }
            return Optional.of(means);
        }

        /** The mean, or the drift times t (1-based), or zero. */
        private double regression(int t) {
            double[] coef = estimate.coef();
            if (order.hasMean()) {
                return coef[order.armaCount()];
            }
            if (order.hasDrift()) {
                return coef[order.armaCount()] * t;
            }
            return 0;
        }

        @Override
        public String toString() {
            return label();
        }
    }

    private Arima() {
    }

    /**
     * The model with given coefficients (ar, ma, sar, sma, then mean or drift, as R orders them),
     * without estimation: its likelihood by {@code method}, σ², criteria and forecasts, as R's
     * {@code Arima(fixed = …)} would give them (checks against R at R's own estimates).
     *
     * @return empty when the number of coefficients does not match the order or a value is not finite
     */
    public static Optional<Fit> withCoefficients(double[] y, ArimaOrder order, Method method, double[] coefficients) {
        for (double v : y) {
            if (!Double.isFinite(v)) {
                return Optional.empty();
            }
        }
        return new ArimaEstimation(y, order).at(coefficients.clone(), method)
                .map(e -> new Fit(order, method, e, y.length));
    }

    /**
     * Fits {@code order} to {@code y} by {@code method}.
     *
     * @return empty where R's {@code Arima} stops with an error: too few values, a CSS start that is
     * not stationary, a non-finite objective at the start or in a gradient
     */
    public static Optional<Fit> fit(double[] y, ArimaOrder order, Method method) {
        for (double v : y) {
            if (!Double.isFinite(v)) {
                return Optional.empty();
            }
        }
        return new ArimaEstimation(y, order).estimate(method).map(e -> new Fit(order, method, e, y.length));
    }
}
