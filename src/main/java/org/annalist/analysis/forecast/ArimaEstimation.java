package org.annalist.analysis.forecast;

import java.util.Optional;
import java.util.function.Supplier;

/**
 * Estimation of a seasonal ARIMA model with fixed orders, step for step as R's {@code arima} [1]
 * (the function {@code Arima} of the forecast package [2] calls it): conditional sum of squares
 * (CSS, the first d + mD + p + mP values conditioned on, later innovations from zero MA residuals),
 * exact Gaussian maximum likelihood by the Kalman filter ({@link ArimaKalman}; the search itself
 * maximises the differenced series' exact likelihood, {@link ArmaLikelihood}, some ten to fifty times
 * cheaper, and the estimate found is evaluated by the full filter), or CSS to start ML
 * (R's default "CSS-ML"). The search is R's BFGS ({@link ArimaOptimiser}), for CSS alone with the
 * exact gradient ({@link CssGradient}) in place of R's differences; for ML the AR parts are
 * searched as partial autocorrelations, so the estimate is stationary by construction, and a
 * non-invertible MA estimate is replaced by its invertible twin ({@link ArimaPolynomials}). A CSS start
 * that is not stationary is refused, as R refuses it. A mean or drift enters as a regression term
 * started from least squares on the differenced series.
 *
 * <h2>References</h2>
 * <ol>
 * <li>R Core Team, {@code src/library/stats/R/arima.R} (R 4.2).</li>
 * <li>Hyndman, R. J. &amp; Khandakar, Y. (2008). Automatic time series forecasting: the forecast
 * package for R. <i>Journal of Statistical Software</i> 27(3), 1–22. DOI 10.18637/jss.v027.i03.</li>
 * </ol>
 */
final class ArimaEstimation {

    /**
     * @param coef          ar, ma, sar, sma, then the mean or drift coefficient
     * @param sigma2        R's {@code arima} σ̂²: the ML ssq / n.used, or the CSS mean square
     * @param value         the minimised objective, R's {@code res$value}
     * @param varianceValid whether every diagonal element of the estimates' covariance is non-negative ({@link ArimaCovarianceCheck})
     *                      (the forecast package refuses the model otherwise); computed on demand, since
     *                      its numerical Hessian costs as much as the search
     * @param filtered      the Kalman filter run over the values, whose final state the forecasts
     *                      start from; run on demand for a CSS fit, whose likelihood does not need it
     *                      (a model search fits dozens of models and forecasts from one)
     */
    record Estimate(double[] coef, double[] phi, double[] theta, double sigma2, double logLik, double value,
                    double[] residuals, Supplier<ArimaKalman> filtered, java.util.function.BooleanSupplier varianceValid,
                    int nUsed) {

        Estimate {
            coef = coef.clone();
            phi = phi.clone();
            theta = theta.clone();
            residuals = residuals.clone();
        }

        ArimaKalman kalman() {
            return filtered.get();
        }
    }

    /** The filter over {@code values} with the model's polynomials, run once, when first asked for. */
    private Supplier<ArimaKalman> filteredOnDemand(double[] phi, double[] theta, double[] values) {
        double[] kept = values.clone();
        ArimaKalman[] memo = new ArimaKalman[1];
        return () -> {
            if (memo[0] == null) {
                ArimaKalman kalman = new ArimaKalman(phi, theta, delta);
                kalman.run(kept, null);
                memo[0] = kalman;
            }
            return memo[0];
        };
    }

    private static Supplier<ArimaKalman> ready(ArimaKalman kalman) {
        return () -> kalman;
    }

    private final double[] y;
    private final ArimaOrder order;
    private final double[] delta;
    private final double[] xreg;
    private final int narma;
    private final int npar;
    private final double[] adjusted;
    /** Without a regression term, the differenced values the conditional sum of squares works on. */
    private double[] differencedOnce;
    /** The conditional sum of squares' room: residuals nobody asked for, and the non-zero lags of φ and θ. */
    private double[] scratch;
    private int[] arLags;
    private int[] maLags;

    ArimaEstimation(double[] y, ArimaOrder order) {
        this.y = y;
        this.order = order;
        delta = ArimaPolynomials.differencing(order.d(), order.seasonalD(), order.period());
        narma = order.armaCount();
        int n = y.length;
        if (order.hasMean()) {
            xreg = new double[n];
            java.util.Arrays.fill(xreg, 1);
        } else if (order.hasDrift()) {
            xreg = new double[n];
            for (int t = 0; t < n; t++) {
                xreg[t] = t + 1;
            }
        } else {
            xreg = null;
        }
        npar = narma + (xreg == null ? 0 : 1);
        adjusted = new double[n];
    }

    /** @return empty where R's {@code arima} stops with an error */
    Optional<Estimate> estimate(Arima.Method method) {
        int n = y.length;
        int nUsed = n - delta.length;
        if (nUsed <= 0) {
            return Optional.empty();
        }
        double[] init = new double[npar];
        double[] parscale = new double[npar];
        java.util.Arrays.fill(parscale, 1);
        if (xreg != null && !regressionStart(init, parscale)) {
            return Optional.empty();
        }
        int m = order.period();
        int ncond = order.d() + order.seasonalD() * m + order.p() + m * order.seasonalP();
        if (ncond >= n && method != Arima.Method.ML) {
            return Optional.empty();
        }
        if (method == Arima.Method.CSS) {
            // the exact gradient, not R's differences: a model search fits dozens of these
            CssGradient gradient = new CssGradient(order, ncond, differenced(y), xreg == null ? null : differenced(xreg));
            ArimaOptimiser css = new ArimaOptimiser(par -> cssObjective(par, ncond, gradient), parscale, gradient::at);
            Optional<ArimaOptimiser.Result> found = css.minimise(init, ArimaOptimiser.MAX_ITERATIONS);
            if (found.isEmpty()) {
                return Optional.empty();
            }
            double[] coef = found.get().par();
            double[] at = coef.clone();
            java.util.function.BooleanSupplier valid = () -> npar == 0
                    || css.hessian(at).map(h -> ArimaCovarianceCheck.varianceValid(h, nUsed, null)).orElse(false);
            double[][] pt = ArimaPolynomials.expand(coef, order, false);
            removeRegression(coef);
            double[] residuals = new double[n];
            double sigma2 = css(adjusted, pt[0], pt[1], ncond, residuals);
            double value = found.get().value();
            return Optional.of(new Estimate(coef, pt[0], pt[1], sigma2, logLik(value, nUsed), value, residuals,
                    filteredOnDemand(pt[0], pt[1], adjusted), valid, nUsed));
        }
        if (method == Arima.Method.CSS_ML) {
            Optional<ArimaOptimiser.Result> found = new ArimaOptimiser(par -> cssObjective(par, ncond, null), parscale)
                    .minimise(init, ArimaOptimiser.MAX_ITERATIONS);
            if (found.isEmpty()) {
                return Optional.empty();
            }
            if (found.get().converged()) {
                init = found.get().par();
            }
            if (!ArimaPolynomials.isStationary(init, 0, order.p())
                    || !ArimaPolynomials.isStationary(init, order.p() + order.q(), order.seasonalP())) {
                return Optional.empty(); // R: "non-stationary AR part from CSS"
            }
        }
        boolean transform = npar > 0;
        if (transform) {
            ArimaPolynomials.invpartrans(order.p(), init, 0, init, 0);
            ArimaPolynomials.invpartrans(order.seasonalP(), init, order.p() + order.q(), init, order.p() + order.q());
            invertMa(init);
            for (double v : init) {
                if (!Double.isFinite(v)) {
                    return Optional.empty();
                }
            }
        }
        ArimaOptimiser ml = new ArimaOptimiser(par -> mlObjective(par, transform), parscale);
        Optional<ArimaOptimiser.Result> found = ml.minimise(init, ArimaOptimiser.MAX_ITERATIONS);
        if (found.isEmpty()) {
            return Optional.empty();
        }
        double[] coef = found.get().par();
        java.util.function.BooleanSupplier valid = () -> true;
        if (transform) {
            invertMa(coef); // R refits with maxit = 0 at the inverted MA: the value below is taken there
            double[] raw = coef.clone();
            valid = () -> ml.hessian(raw).map(h -> ArimaCovarianceCheck.varianceValid(h, nUsed,
                    ArimaCovarianceCheck.gradTransform(order, raw))).orElse(false);
            ArimaPolynomials.partrans(order.p(), coef, 0, coef, 0);
            ArimaPolynomials.partrans(order.seasonalP(), coef, order.p() + order.q(), coef, order.p() + order.q());
        }
        double[][] pt = ArimaPolynomials.expand(coef, order, false);
        removeRegression(coef);
        ArimaKalman kalman = new ArimaKalman(pt[0], pt[1], delta);
        double[] residuals = new double[n];
        ArimaKalman.Likelihood like = kalman.run(adjusted, residuals);
        // R's objective at the estimate: the search minimised the differenced series' exact likelihood
        double value = objective(like);
        double sigma2 = like.ssq() / nUsed;
        return Optional.of(new Estimate(coef, pt[0], pt[1], sigma2, logLik(value, nUsed), value, residuals,
                ready(kalman), valid, nUsed));
    }

    /** R's {@code arima} objective: half the log of σ̂² plus the mean log variance. */
    private static double objective(ArimaKalman.Likelihood like) {
        return 0.5 * (Math.log(like.ssq() / like.used()) + like.sumLog() / like.used());
    }

    /**
     * The model with the given coefficients (R's order, AR untransformed), no search: the
     * likelihood of {@code method} (CSS or exact), residuals and final state as a fit would give them.
     */
    Optional<Estimate> at(double[] coef, Arima.Method method) {
        int n = y.length;
        int nUsed = n - delta.length;
        if (coef.length != npar || nUsed <= 0) {
            return Optional.empty();
        }
        double[][] pt = ArimaPolynomials.expand(coef, order, false);
        removeRegression(coef);
        double[] residuals = new double[n];
        if (method == Arima.Method.CSS) {
            int m = order.period();
            int ncond = order.d() + order.seasonalD() * m + order.p() + m * order.seasonalP();
            double sigma2 = css(adjusted, pt[0], pt[1], ncond, residuals);
            double value = 0.5 * Math.log(sigma2);
            return Optional.of(new Estimate(coef, pt[0], pt[1], sigma2, logLik(value, nUsed), value, residuals,
                    filteredOnDemand(pt[0], pt[1], adjusted), () -> true, nUsed));
        }
        ArimaKalman kalman = new ArimaKalman(pt[0], pt[1], delta);
        ArimaKalman.Likelihood like = kalman.run(adjusted, residuals);
        double value = objective(like);
        return Optional.of(new Estimate(coef, pt[0], pt[1], like.ssq() / nUsed, logLik(value, nUsed), value,
                residuals, ready(kalman), () -> true, nUsed));
    }

    /** R: −0.5 (2 n.used · value + n.used + n.used log 2π). */
    private static double logLik(double value, int nUsed) {
        return -0.5 * (2 * nUsed * value + nUsed + nUsed * Math.log(2 * Math.PI));
    }

    /**
     * R's start for the regression coefficient: least squares of the differenced series on the
     * differenced regressor, with parscale ten standard errors.
     */
    private boolean regressionStart(double[] init, double[] parscale) {
        double[] dx = difference(y);
        double[] dr = difference(xreg);
        if (dx.length <= 1) {
            return false;
        }
        double sxy = 0;
        double sxx = 0;
        for (int i = 0; i < dx.length; i++) {
            sxy += dx[i] * dr[i];
            sxx += dr[i] * dr[i];
        }
        if (!(sxx > 0)) {
            return false;
        }
        double beta = sxy / sxx;
        double rss = 0;
        for (int i = 0; i < dx.length; i++) {
            double e = dx[i] - beta * dr[i];
            rss += e * e;
        }
        double se = Math.sqrt(rss / (dx.length - 1) / sxx);
        init[narma] = beta;
        parscale[narma] = se > 0 ? 10 * se : 1;
        return true;
    }

    private double[] difference(double[] v) {
        double[] w = v.clone();
        int len = w.length;
        for (int k = 0; k < order.d(); k++) {
            for (int t = 0; t < len - 1; t++) {
                w[t] = w[t + 1] - w[t];
            }
            len--;
        }
        int m = order.period();
        for (int k = 0; k < order.seasonalD(); k++) {
            for (int t = 0; t < len - m; t++) {
                w[t] = w[t + m] - w[t];
            }
            len -= m;
        }
        return java.util.Arrays.copyOf(w, Math.max(len, 0));
    }

    /** The series minus the regression term, into {@link #adjusted}. */
    private void removeRegression(double[] par) {
        if (xreg == null) {
            System.arraycopy(y, 0, adjusted, 0, y.length);
            return;
        }
        double beta = par[narma];
        for (int t = 0; t < y.length; t++) {
            adjusted[t] = y[t] - beta * xreg[t];
        }
    }

    /** With the residuals kept for {@code gradient}'s forward pass at {@code par} where it takes them (null: none). */
    private double cssObjective(double[] par, int ncond, CssGradient gradient) {
        double[][] pt = ArimaPolynomials.expand(par, order, false);
        removeRegression(par);
        double[] residuals = gradient == null ? null : gradient.residualsKeptFor(par);
        return 0.5 * Math.log(css(adjusted, pt[0], pt[1], ncond, residuals));
    }

    /**
     * The search's objective: R's, with the exact likelihood of the differenced series
     * ({@link ArmaLikelihood}) in place of the diffuse filter over the series itself.
     */
    private double mlObjective(double[] par, boolean transform) {
        double[][] pt = ArimaPolynomials.expand(par, order, transform);
        double[] w;
        if (xreg == null) {
            if (differencedOnce == null) {
                differencedOnce = differenced(y);
            }
            w = differencedOnce;
        } else {
            removeRegression(par);
            w = differenced(adjusted);
        }
        return objective(ArmaLikelihood.of(pt[0], pt[1], w, delta.length));
    }

    /**
     * [1] {@code ARIMA_CSS}: the mean square of the innovations of the differenced series from
     * {@code ncond} on, earlier innovations taken as zero.
     */
    private double css(double[] x, double[] phi, double[] theta, int ncond, double[] residuals) {
        int n = x.length;
        double[] w;
        if (xreg == null) { // the values do not depend on the coefficients: difference them once
            if (differencedOnce == null) {
                differencedOnce = differenced(x);
            }
            w = differencedOnce;
        } else {
            w = differenced(x);
        }
        if (scratch == null) { // room reused by every evaluation of the search
            scratch = new double[n];
            arLags = new int[phi.length];
            maLags = new int[theta.length];
        }
        double[] resid = residuals != null ? residuals : scratch;
        double ssq = 0;
        int nu = 0;
        // the expanded seasonal polynomials are mostly zeros: (1 − φB)(1 − ΦB¹²) has 2 of its 13 lags
        int arCount = nonZero(phi, arLags);
        int maCount = nonZero(theta, maLags);
        for (int l = ncond; l < n; l++) {
            double tmp = w[l];
            for (int a = 0; a < arCount; a++) {
                int j = arLags[a];
                tmp -= phi[j] * w[l - j - 1];
            }
            int jmax = l - ncond;
            for (int a = 0; a < maCount; a++) {
                int j = maLags[a];
                if (j >= jmax) {
                    break;
                }
                tmp -= theta[j] * resid[l - j - 1];
            }
            resid[l] = tmp;
            if (!Double.isNaN(tmp)) {
                nu++;
                ssq += tmp * tmp;
            }
        }
        return ssq / nu;
    }

    /** {@code x} differenced d times at lag 1 and D times at the seasonal lag, in place of a copy. */
    private double[] differenced(double[] x) {
        int n = x.length;
        double[] w = x.clone();
        for (int i = 0; i < order.d(); i++) {
            for (int l = n - 1; l > 0; l--) {
                w[l] -= w[l - 1];
            }
        }
        int ns = order.period();
        for (int i = 0; i < order.seasonalD(); i++) {
            for (int l = n - 1; l >= ns; l--) {
                w[l] -= w[l - ns];
            }
        }
        return w;
    }

    /** Writes the indices of the coefficients that are not zero into {@code lags}, in increasing order; returns how many. */
    private static int nonZero(double[] coefficients, int[] lags) {
        int count = 0;
        for (int j = 0; j < coefficients.length; j++) {
            if (coefficients[j] != 0) {
                lags[count++] = j;
            }
        }
        return count;
    }

    private void invertMa(double[] par) {
        ArimaPolynomials.invertMovingAverage(par, order.p(), order.q());
        ArimaPolynomials.invertMovingAverage(par, order.p() + order.q() + order.seasonalP(), order.seasonalQ());
    }
}
