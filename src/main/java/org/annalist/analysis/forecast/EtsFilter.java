package org.annalist.analysis.forecast;

import java.util.Arrays;
import java.util.Optional;

/**
 * Runs an ETS model over a series: the one-step forecasts, the state equations and the likelihood
 * criterion, and the point forecasts from a final state, as R's forecast package computes them [3]
 * (its C routines {@code etscalc}, {@code forecast} and {@code update}), so that a model with R's
 * parameters and initial states gives R's log-likelihood, information criteria and point forecasts.
 * The equations are those of the state-space models [1], [2, Table 2.3]; the criterion and AICc are
 * as {@link EtsModel} states them.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J., Koehler, A. B., Snyder, R. D. &amp; Grose, S. (2002). A state space framework
 * for automatic forecasting using exponential smoothing methods. <i>International Journal of
 * Forecasting</i> 18(3), 439–454. DOI 10.1016/S0169-2070(01)00110-8.</li>
 * <li>Hyndman, R. J., Koehler, A. B., Ord, J. K. &amp; Snyder, R. D. (2008). <i>Forecasting with
 * Exponential Smoothing: The State Space Approach</i>. Springer. DOI 10.1007/978-3-540-71918-2.</li>
 * <li>Hyndman, R. J. &amp; Khandakar, Y. (2008). Automatic time series forecasting: the forecast
 * package for R. <i>Journal of Statistical Software</i> 27(3), 1–22. DOI 10.18637/jss.v027.i03.</li>
 * </ol>
 */
final class EtsFilter {

    private EtsFilter() {
    }

    /** @return empty when a forecast turns non-finite (the parameters are not admissible for the data) */
    static Optional<EtsModel.Fit> filter(EtsModel model, double[] y, EtsModel.Parameters p) {
        EtsModel.Error error = model.error();
        EtsModel.Trend trend = model.trend();
        EtsModel.Season season = model.season();
        int m = model.seasonSlots();
        double[] initial = p.initial();
        double l = initial[0];
        double b = trend != EtsModel.Trend.NONE ? initial[1] : 0;
        double[] s = new double[m];
        if (season != EtsModel.Season.NONE) {
            System.arraycopy(initial, model.firstSeasonIndex(), s, 0, m);
        }
        double phi = model.damped() ? p.phi() : 1;
        double sumE2 = 0;
        double sumLogF = 0;
        double sumSq = 0;
        double[] lb = new double[2];
        for (double v : y) {
            double f = point(model, l, b, s, phi, 1); // one step ahead: φ* = φ
            if (!Double.isFinite(f)) {
                return Optional.empty();
            }
            double e = error == EtsModel.Error.ADDITIVE ? v - f : (v - f) / f;
            sumE2 += e * e;
            sumLogF += Math.log(Math.abs(f));
            sumSq += (v - f) * (v - f);
            lb[0] = l;
            lb[1] = b;
            advance(model, lb, s, phi, p, v);
            l = lb[0];
            b = lb[1];
        }
        int n = y.length;
        double lik = n * Math.log(sumE2) + (error == EtsModel.Error.MULTIPLICATIVE ? 2 * sumLogF : 0); // [2] §5.2
        int k = model.parameterCount() + 1;
        double logLik = -0.5 * lik;
        double aic = -2 * logLik + 2 * k;
        double aicc = aic + 2.0 * k * (k + 1) / (n - k - 1); // [2] §7.1
        double bic = aic + (Math.log(n) - 2) * k;
        double[] state = new double[2 + m];
        state[0] = l;
        state[1] = b;
        System.arraycopy(s, 0, state, 2, m);
        return Optional.of(new EtsModel.Fit(model, p, lik, logLik, aic, aicc, bic, sumE2 / (n - k + 1), sumSq / n,
                state, n));
    }

    /**
     * Point forecasts from every origin o = {@code firstOrigin} … n − 1 of {@code y}, 1 … min({@code reach},
     * n − o) ahead, with the parameters {@code p} kept: what {@link #filter} on the values before each
     * origin followed by {@link #forecastFrom} would give, from one pass.
     *
     * @return empty when a one-step forecast turns non-finite, as {@link #filter} would at some origin
     */
    static Optional<double[][]> forecastsFromOrigins(EtsModel model, double[] y, EtsModel.Parameters p,
                                                     int firstOrigin, int reach) {
        int m = model.seasonSlots();
        double[] initial = p.initial();
        double[] state = new double[2 + m];
        state[0] = initial[0];
        state[1] = model.trend() != EtsModel.Trend.NONE ? initial[1] : 0;
        if (model.season() != EtsModel.Season.NONE) {
            System.arraycopy(initial, model.firstSeasonIndex(), state, 2, m);
        }
        double phi = model.damped() ? p.phi() : 1;
        double[] lb = new double[2];
        double[] s = new double[m];
        double[][] forecasts = new double[y.length - firstOrigin][];
        for (int t = 0; t < y.length; t++) {
            if (t >= firstOrigin) {
                forecasts[t - firstOrigin] = forecastFrom(model, state, phi, Math.min(reach, y.length - t));
            }
            System.arraycopy(state, 2, s, 0, m);
            if (!Double.isFinite(point(model, state[0], state[1], s, phi, 1))) {
                return Optional.empty();
            }
            lb[0] = state[0];
            lb[1] = state[1];
            advance(model, lb, s, phi, p, y[t]);
            state[0] = lb[0];
            state[1] = lb[1];
            System.arraycopy(s, 0, state, 2, m);
        }
        return Optional.of(forecasts);
    }

    /** The criterion of {@link #filter} alone, for {@code p}. */
    static double criterion(EtsModel model, double[] y, EtsModel.Parameters p) {
        return criterion(model, y, p.alpha(), p.beta(), p.gamma(), p.phi(), p.initial());
    }

    /**
     * The criterion of {@link #filter} alone, the estimation's objective: the same recursions on a
     * circular buffer of seasons and without the fit's bookkeeping, about twice as fast. Takes the
     * parameters one by one so that the search evaluates it without building (and copying) a
     * {@link EtsModel.Parameters} each time; {@code initial} is only read.
     *
     * @return +∞ where {@code filter} gives no fit
     */
    static double criterion(EtsModel model, double[] y, double alpha, double beta, double gamma, double phiValue,
                            double[] initial) {
        return criterion(model, y, alpha, beta, gamma, phiValue, initial, null);
    }

    /**
     * {@link #criterion(EtsModel, double[], double, double, double, double, double[])}, its forward
     * pass kept in {@code keep} (when not null) for the gradient at the same point
     * ({@link EtsGradient#fromKeptPass}); marked whole only when the criterion is reached.
     */
    static double criterion(EtsModel model, double[] y, double alpha, double beta, double gamma, double phiValue,
                            double[] initial, EtsGradient keep) {
        if (keep != null) {
            keep.forgetKept();
        }
        EtsModel.Error error = model.error();
        EtsModel.Trend trend = model.trend();
        EtsModel.Season season = model.season();
        int m = model.seasonSlots();
        double l = initial[0];
        double b = trend != EtsModel.Trend.NONE ? initial[1] : 0;
        double[] s = new double[m]; // s_j at s[(head + j − 1) mod m]
        if (season != EtsModel.Season.NONE) {
            System.arraycopy(initial, model.firstSeasonIndex(), s, 0, m);
        }
        int head = 0;
        double phi = model.damped() ? phiValue : 1;
        double betaStar = beta / alpha;
        double sumE2 = 0;
        double sumLogF = 0;
        double productF = 1; // Σ log|ŷ| as the log of a running product, taken before it can overflow
        for (int step = 0; step < y.length; step++) {
            double v = y[step];
            int oldestSlot = head == 0 ? m - 1 : head - 1;
            double phib = trend == EtsModel.Trend.NONE ? 0 : phi * b;
            double q = l + phib;
            double oldest = season == EtsModel.Season.NONE ? 0 : s[oldestSlot];
            // [2] Table 2.3: the one-step forecast
            double f = season == EtsModel.Season.NONE ? q : season == EtsModel.Season.ADDITIVE ? q + oldest : q * oldest;
            if (!Double.isFinite(f)) {
                return Double.POSITIVE_INFINITY;
            }
            double e = error == EtsModel.Error.ADDITIVE ? v - f : (v - f) / f;
            sumE2 += e * e;
            if (keep != null) {
                keep.keep(step, l, b, oldest, f, e);
            }
            if (error == EtsModel.Error.MULTIPLICATIVE) {
                double size = Math.abs(f);
                if (size > 1e100 || size < 1e-100) {
                    sumLogF += Math.log(size);
                } else {
                    productF *= size;
                    if (productF > 1e150 || productF < 1e-150) {
                        sumLogF += Math.log(productF);
                        productF = 1;
                    }
                }
            }
            // [2] Table 2.3: the state equations, written with the observed value as R's update() does [3]
            double pp = season == EtsModel.Season.NONE ? v : season == EtsModel.Season.ADDITIVE ? v - oldest : v / oldest;
            double newL = q + alpha * (pp - q);
            if (trend != EtsModel.Trend.NONE) {
                b = phib + betaStar * ((newL - l) - phib);
            }
            if (season != EtsModel.Season.NONE) {
                double t = season == EtsModel.Season.ADDITIVE ? v - q : v / q;
                head = oldestSlot; // the new s_1 takes the slot of the old s_m
                s[head] = oldest + gamma * (t - oldest);
            }
            l = newL;
        }
        sumLogF += Math.log(productF);
        if (keep != null) {
            keep.finishKept(sumE2);
        }
        return y.length * Math.log(sumE2) + 2 * sumLogF; // [2] §5.2: n log(Σe²) + 2 Σ log|ŷ|
    }

    /**
     * The state equations for one observed value v (R forecast: {@code update()}, [2] Table 2.3):
     * level and trend in {@code lb}, seasons in {@code s} (s_1 the most recent), both updated in place.
     */
    static void advance(EtsModel model, double[] lb, double[] s, double phi, EtsModel.Parameters p, double v) {
        EtsModel.Trend trend = model.trend();
        EtsModel.Season season = model.season();
        int m = s.length;
        double l = lb[0];
        double phib = trend == EtsModel.Trend.NONE ? 0 : phi * lb[1];
        double q = l + phib;
        double oldest = season == EtsModel.Season.NONE ? 0 : s[m - 1];
        double pp = season == EtsModel.Season.NONE ? v : season == EtsModel.Season.ADDITIVE ? v - oldest : v / oldest;
        double newL = q + p.alpha() * (pp - q);
        if (trend != EtsModel.Trend.NONE) {
            lb[1] = phib + (p.beta() / p.alpha()) * ((newL - l) - phib);
        }
        if (season != EtsModel.Season.NONE) {
            double t = season == EtsModel.Season.ADDITIVE ? v - q : v / q;
            double newS = oldest + p.gamma() * (t - oldest);
            System.arraycopy(s, 0, s, 1, m - 1);
            s[0] = newS;
        }
        lb[0] = newL;
    }

    /** Point forecasts 1 … h ahead from a final state {level, trend, s_1 … s_m}, which is only read. */
    static double[] forecastFrom(EtsModel model, double[] state, double phi, int h) {
        int m = model.seasonSlots();
        double[] s = Arrays.copyOfRange(state, 2, 2 + m);
        double damping = model.damped() ? phi : 1;
        double[] f = new double[h];
        double phistar = 0;
        double power = 1;
        for (int i = 1; i <= h; i++) {
            power *= damping;
            phistar += power;
            f[i - 1] = point(model, state[0], state[1], s, phistar, i);
        }
        return f;
    }

    /**
     * The h-step point forecast from a state (R forecast: forecast(), [2] Table 2.3), given
     * φ* = φ + φ² + … + φ^h (h when undamped).
     */
    static double point(EtsModel model, double l, double b, double[] s, double phistar, int h) {
        double f = model.trend() == EtsModel.Trend.NONE ? l : l + phistar * b;
        if (model.season() != EtsModel.Season.NONE) {
            double factor = s[Math.floorMod(s.length - h, s.length)]; // s_1 the most recent season
            f = model.season() == EtsModel.Season.ADDITIVE ? f + factor : f * factor;
        }
        return f;
    }
}
