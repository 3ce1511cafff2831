package org.annalist.analysis.forecast;

import java.util.Arrays;
import java.util.Locale;
import java.util.function.Function;
import org.annalist.analysis.decompose.ClassicalDecomposition;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;

/**
 * An exponential smoothing state-space model ETS(error, trend, season) (Hyndman, Koehler, Snyder &amp;
 * Grose 2002, <i>International Journal of Forecasting</i> 18, 439–454; Hyndman, Koehler, Ord &amp;
 * Snyder 2008, <i>Forecasting with Exponential Smoothing</i>, Springer, Table 2.3): the filter and
 * likelihood as R's forecast package computes them (its C routines {@code etscalc},
 * {@code forecast} and {@code update}), so that a model with R's parameters and initial states
 * gives R's log-likelihood, information criteria and point forecasts.
 *
 * <p>Criterion: {@code lik = n log(Σ e²)}, plus {@code 2 Σ log|ŷ|} for multiplicative errors
 * (e the one-step error, relative for multiplicative errors); log-likelihood −lik/2 as forecast
 * reports it; k = parameters and initial states estimated + 1; AICc = AIC + 2k(k+1)/(n − k − 1).
 * β is the trend's smoothing parameter as R writes it (β = α β*).
 */
public record EtsModel(Error error, Trend trend, boolean damped, Season season, int period) {

    public enum Error { ADDITIVE, MULTIPLICATIVE }

    public enum Trend { NONE, ADDITIVE }

    public enum Season { NONE, ADDITIVE, MULTIPLICATIVE }

    /**
     * @param initial {level, trend (if any), s_1 … s_m (if seasonal)}, s_1 the most recent season
     *                before the first observation, as R's {@code initstate}
     */
    public record Parameters(double alpha, double beta, double gamma, double phi, double[] initial) {
    }

    /**
     * @param lik   the criterion n log(Σe²) [+ 2 Σ log|ŷ|]
     * @param state the final state {level, trend, s_1 … s_m}
     */
    public record Fit(EtsModel model, Parameters parameters, double lik, double logLik, double aic, double aicc,
                      double bic, double sigma2, double mse, double[] state, int n) {

        /** Point forecasts 1 … h ahead from the final state. */
        public double[] forecast(int h) {
            return model.forecastFrom(state, parameters.phi(), h);
        }

        /**
         * The forecast distribution's mean and variance 1 … h ahead where the model class has them
         * in closed form (Hyndman, Koehler, Ord &amp; Snyder 2008, ch. 6): class 1, additive error
         * without multiplicative parts (§6.2), and class 3, multiplicative error and season
         * (§6.4, the recursions for M<sub>h</sub> and V<sub>h</sub>; the mean departs from the point
         * forecast beyond one season, because the future level and seasonal factors are correlated).
         *
         * @throws IllegalStateException for the other models (class 2), see {@link #hasAnalyticIntervals}
         */
        public Prediction predict(int h) {
            if (model.error == Error.ADDITIVE && model.season != Season.MULTIPLICATIVE) {
                return model.classOne(state, parameters, sigma2, h);
            }
            if (model.error == Error.MULTIPLICATIVE && model.season == Season.MULTIPLICATIVE) {
                return model.classThree(state, parameters, sigma2, h);
            }
            throw new IllegalStateException(model.label() + " has no closed-form forecast variance");
        }

        public boolean hasAnalyticIntervals() {
            return model.error == Error.ADDITIVE && model.season != Season.MULTIPLICATIVE
                    || model.error == Error.MULTIPLICATIVE && model.season == Season.MULTIPLICATIVE;
        }

        /** Simulated future paths from the final state, one per row of standard normal {@code shocks}. */
        public double[][] paths(double[][] shocks) {
            return model.paths(state, parameters, sigma2, shocks);
        }
    }

    /** Means and variances of the h-step forecast distributions, step 1 first. */
    public record Prediction(double[] mean, double[] variance) {

        /**
         * The normal-approximation interval mean ± z·sd at {@code level} (e.g. 0.8), as
         * {lower[], upper[]}; for class-3 models the distribution is not normal, so this is the
         * approximation Hyndman et al. (2008, §6.4) recommend for short horizons.
         */
        public double[][] interval(double level) {
            double z = new NormalDistribution(null, 0, 1).inverseCumulativeProbability(0.5 + level / 2);
            double[] lower = new double[mean.length];
            double[] upper = new double[mean.length];
            for (int i = 0; i < mean.length; i++) {
                double half = z * Math.sqrt(variance[i]);
                lower[i] = mean[i] - half;
                upper[i] = mean[i] + half;
            }
            return new double[][] {lower, upper};
        }
    }

    /** ETS(M,Ad,M) style: error, trend (d when damped), season. */
    public String label() {
        String t = trend == Trend.NONE ? "N" : damped ? "Ad" : "A";
        String s = season == Season.NONE ? "N" : season == Season.ADDITIVE ? "A" : "M";
        return String.format(Locale.ROOT, "ETS(%s,%s,%s)", error == Error.ADDITIVE ? "A" : "M", t, s);
    }

    /** Parameters estimated with the initial states: smoothing parameters, φ, level, trend, m − 1 seasons. */
    public int parameterCount() {
        int smoothing = 1 + (trend != Trend.NONE ? 1 : 0) + (season != Season.NONE ? 1 : 0) + (damped ? 1 : 0);
        int states = 1 + (trend != Trend.NONE ? 1 : 0) + (season != Season.NONE ? period - 1 : 0);
        return smoothing + states;
    }

    /**
     * Maximum-likelihood fit of the smoothing parameters and initial states (Hyndman et al. 2008,
     * §5.2), started from the usual heuristic ({@link #initialStates}) and α = 0.5, β = 0.1α,
     * γ = 0.05(1 − α), φ = 0.978 as common practice. The usual bounds hold by construction:
     * 10⁻⁴ ≤ α ≤ 0.9999, β = αu and γ = (1 − α)v with u, v in the same range, 0.8 ≤ φ ≤ 0.98.
     * The optimum found must also be forecastable ({@link #isAdmissible}); the search is a
     * quasi-Newton one ({@link BoundedQuasiNewton}) started twice from the same point.
     *
     * @return the fit, or null when no start gives a finite likelihood or the optimum is not admissible
     */
    public Fit fit(double[] y) {
        double[] start = initialStates(y);
        int states = start.length - (season == Season.NONE ? 0 : 1); // the last season follows from the others
        double scale = Arrays.stream(y).map(Math::abs).average().orElse(1);
        int smoothing = 3 + (damped ? 1 : 0);
        int dimension = smoothing + states;
        double[] lower = new double[dimension];
        double[] upper = new double[dimension];
        double[] guess = new double[dimension];
        double[] boundsLow = {1e-4, 1e-4, 1e-4, 0.8};
        double[] boundsHigh = {0.9999, 0.9999, 0.9999, 0.98};
        double[] guesses = {0.5, 0.1, 0.05, 0.978};
        for (int i = 0; i < smoothing; i++) {
            lower[i] = boundsLow[i];
            upper[i] = boundsHigh[i];
            guess[i] = guesses[i];
        }
        // states are searched as offsets from the heuristic start in units of the series' scale
        // (seasonal factors in their own units), so that the search sees variables of similar size
        for (int i = 0; i < states; i++) {
            boolean seasonalFactor = season == Season.MULTIPLICATIVE && i >= stateOffsetOfSeasons();
            lower[smoothing + i] = seasonalFactor ? 0.01 - start[i] : -10;
            upper[smoothing + i] = seasonalFactor ? 10 - start[i] : 10;
        }
        Function<double[], Parameters> parametersOf = z -> {
            double alpha = z[0];
            double beta = trend == Trend.NONE ? 0 : alpha * z[1];
            double gamma = season == Season.NONE ? 0 : (1 - alpha) * z[2];
            double phi = damped ? z[3] : 1;
            double[] initial = new double[start.length];
            double seasonalSum = 0;
            for (int i = 0; i < states; i++) {
                boolean seasonalFactor = season == Season.MULTIPLICATIVE && i >= stateOffsetOfSeasons();
                initial[i] = start[i] + (seasonalFactor ? 1 : scale) * z[smoothing + i];
                if (i >= stateOffsetOfSeasons()) {
                    seasonalSum += initial[i];
                }
            }
            if (season != Season.NONE) {
                initial[start.length - 1] = (season == Season.MULTIPLICATIVE ? period : 0) - seasonalSum;
                if (season == Season.MULTIPLICATIVE && initial[start.length - 1] <= 0) {
                    return null;
                }
            }
            return new Parameters(alpha, beta, gamma, phi, initial);
        };
        // two searches from the same start, one with a free first step and one with a short one: on
        // the reference series each finds the better of the likelihood's basins for some models
        BoundedQuasiNewton search = new BoundedQuasiNewton(lower, upper, z -> {
            Parameters p = parametersOf.apply(z);
            return p == null ? Double.POSITIVE_INFINITY : criterion(y, p);
        });
        BoundedQuasiNewton.Minimum best = null;
        for (double firstStepLimit : new double[] {Double.POSITIVE_INFINITY, 0.5}) {
            BoundedQuasiNewton.Minimum found = search.minimise(guess, 1e-10, 500, firstStepLimit);
            if (best == null || found.value() < best.value()) {
                best = found;
            }
        }
        Fit fit = Double.isFinite(best.value()) ? filter(y, parametersOf.apply(best.point())) : null;
        return fit != null && isAdmissible(fit.parameters()) ? fit : null;
    }

    /**
     * Whether the smoothing parameters lie in the forecastable region of the model's linear form
     * (Hyndman, Akram &amp; Archibald 2008, <i>Annals of the Institute of Statistical Mathematics</i>
     * 60, 407–426): no eigenvalue of the discount matrix D = F − g w′ outside the unit circle. With
     * m seasonal states D keeps one unit eigenvalue from their redundancy, so unit moduli are allowed
     * (tolerance 10⁻⁶). Hyndman et al. (2008, §10.1) apply the same region to the multiplicative
     * models as common practice.
     */
    boolean isAdmissible(Parameters p) {
        LinearForm form = linearForm(p);
        int size = form.g().length;
        double[][] d = new double[size][size];
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < size; j++) {
                d[i][j] = form.f()[i][j] - form.g()[i] * form.w()[j];
            }
        }
        EigenDecomposition eigen = new EigenDecomposition(new Array2DRowRealMatrix(d, false));
        for (int i = 0; i < size; i++) {
            if (Math.hypot(eigen.getRealEigenvalue(i), eigen.getImagEigenvalue(i)) > 1 + 1e-6) {
                return false;
            }
        }
        return true;
    }

    private int stateOffsetOfSeasons() {
        return trend == Trend.NONE ? 1 : 2;
    }

    /**
     * The usual starting states (Hyndman et al. 2008, §2.6.1, as R's forecast computes them): the
     * seasonal states from a classical decomposition of the first three seasons (at least two),
     * s_1 the season just before the first observation; level and trend from a least-squares line
     * through the first max(10, 2m) seasonally adjusted values (the level their mean without a trend).
     *
     * @return {level, trend (if any), s_1 … s_m (if seasonal)}
     */
    double[] initialStates(double[] y) {
        int m = season == Season.NONE ? 1 : period;
        double[] adjusted = y;
        double[] seasons = new double[0];
        if (season != Season.NONE) {
            int cycles = Math.min(3, y.length / m);
            if (cycles < 2) {
                throw new IllegalArgumentException("a seasonal ETS model needs two full seasons, got " + y.length
                        + " values for period " + m);
            }
            boolean additive = season == Season.ADDITIVE;
            double[] head = Arrays.copyOf(y, cycles * m);
            ClassicalDecomposition.Result d = ClassicalDecomposition.of(head, m,
                    additive ? ClassicalDecomposition.Type.ADDITIVE : ClassicalDecomposition.Type.MULTIPLICATIVE);
            seasons = new double[m];
            for (int j = 0; j < m; j++) {
                seasons[j] = d.figure()[m - 1 - j];
            }
            adjusted = new double[head.length];
            for (int i = 0; i < head.length; i++) {
                adjusted[i] = additive ? head[i] - d.seasonal()[i] : head[i] / Math.max(d.seasonal()[i], 1e-2);
            }
        }
        int count = Math.min(Math.max(10, 2 * m), adjusted.length);
        StartLine line = StartLine.through(adjusted, count);
        double[] levelAndTrend = trend == Trend.NONE ? new double[] {line.mean()}
                : new double[] {line.intercept(), line.slope()};
        double[] out = Arrays.copyOf(levelAndTrend, levelAndTrend.length + seasons.length);
        System.arraycopy(seasons, 0, out, levelAndTrend.length, seasons.length);
        return out;
    }

    /**
     * The criterion of {@link #filter} alone, the search's objective: the same recursions on a
     * circular buffer of seasons and without the fit's bookkeeping, about twice as fast.
     *
     * @return +∞ where {@code filter} gives null
     */
    double criterion(double[] y, Parameters p) {
        int m = season == Season.NONE ? 1 : period;
        double l = p.initial()[0];
        double b = trend != Trend.NONE ? p.initial()[1] : 0;
        double[] s = new double[m]; // s_j at s[(head + j − 1) mod m]
        if (season != Season.NONE) {
            System.arraycopy(p.initial(), trend != Trend.NONE ? 2 : 1, s, 0, m);
        }
        int head = 0;
        double phi = damped ? p.phi() : 1;
        double alpha = p.alpha();
        double betaStar = p.beta() / alpha;
        double gamma = p.gamma();
        double sumE2 = 0;
        double sumLogF = 0;
        for (double v : y) {
            int oldestSlot = head == 0 ? m - 1 : head - 1;
            double phib = trend == Trend.NONE ? 0 : phi * b;
            double q = l + phib;
            double oldest = season == Season.NONE ? 0 : s[oldestSlot];
            double f = season == Season.NONE ? q : season == Season.ADDITIVE ? q + oldest : q * oldest;
            if (!Double.isFinite(f)) {
                return Double.POSITIVE_INFINITY;
            }
            double e = error == Error.ADDITIVE ? v - f : (v - f) / f;
            sumE2 += e * e;
            if (error == Error.MULTIPLICATIVE) {
                sumLogF += Math.log(Math.abs(f));
            }
            double pp = season == Season.NONE ? v : season == Season.ADDITIVE ? v - oldest : v / oldest;
            double newL = q + alpha * (pp - q);
            if (trend != Trend.NONE) {
                b = phib + betaStar * ((newL - l) - phib);
            }
            if (season != Season.NONE) {
                double t = season == Season.ADDITIVE ? v - q : v / q;
                head = oldestSlot; // the new s_1 takes the slot of the old s_m
                s[head] = oldest + gamma * (t - oldest);
            }
            l = newL;
        }
        return y.length * Math.log(sumE2) + 2 * sumLogF;
    }

    /** @return the fit, or null when a forecast turns non-finite (the parameters are not admissible for the data) */
    public Fit filter(double[] y, Parameters p) {
        int m = season == Season.NONE ? 1 : period;
        double l = p.initial()[0];
        double b = trend != Trend.NONE ? p.initial()[1] : 0;
        double[] s = new double[m];
        if (season != Season.NONE) {
            System.arraycopy(p.initial(), trend != Trend.NONE ? 2 : 1, s, 0, m);
        }
        double phi = damped ? p.phi() : 1;
        double sumE2 = 0;
        double sumLogF = 0;
        double sumSq = 0;
        double[] lb = new double[2];
        for (double v : y) {
            double f = point(l, b, s, phi, 1); // one step ahead: φ* = φ
            if (!Double.isFinite(f)) {
                return null;
            }
            double e = error == Error.ADDITIVE ? v - f : (v - f) / f;
            sumE2 += e * e;
            sumLogF += Math.log(Math.abs(f));
            sumSq += (v - f) * (v - f);
            lb[0] = l;
            lb[1] = b;
            advance(lb, s, phi, p, v);
            l = lb[0];
            b = lb[1];
        }
        int n = y.length;
        double lik = n * Math.log(sumE2) + (error == Error.MULTIPLICATIVE ? 2 * sumLogF : 0);
        int k = parameterCount() + 1;
        double logLik = -0.5 * lik;
        double aic = -2 * logLik + 2 * k;
        double aicc = aic + 2.0 * k * (k + 1) / (n - k - 1);
        double bic = aic + (Math.log(n) - 2) * k;
        double[] state = new double[2 + m];
        state[0] = l;
        state[1] = b;
        System.arraycopy(s, 0, state, 2, m);
        return new Fit(this, p, lik, logLik, aic, aicc, bic, sumE2 / (n - k + 1), sumSq / n, state, n);
    }

    /**
     * The state equations for one observed value v (R forecast: {@code update()}): level and trend
     * in {@code lb}, seasons in {@code s} (s_1 the most recent), both updated in place.
     */
    private void advance(double[] lb, double[] s, double phi, Parameters p, double v) {
        int m = s.length;
        double l = lb[0];
        double phib = trend == Trend.NONE ? 0 : phi * lb[1];
        double q = l + phib;
        double oldest = season == Season.NONE ? 0 : s[m - 1];
        double pp = season == Season.NONE ? v : season == Season.ADDITIVE ? v - oldest : v / oldest;
        double newL = q + p.alpha() * (pp - q);
        if (trend != Trend.NONE) {
            lb[1] = phib + (p.beta() / p.alpha()) * ((newL - l) - phib);
        }
        if (season != Season.NONE) {
            double t = season == Season.ADDITIVE ? v - q : v / q;
            double newS = oldest + p.gamma() * (t - oldest);
            System.arraycopy(s, 0, s, 1, m - 1);
            s[0] = newS;
        }
        lb[0] = newL;
    }

    /**
     * Future sample paths from a final state: each step draws y = ŷ + σz (additive error) or
     * ŷ(1 + σz) (multiplicative) with z from {@code shocks}, then updates the state with y
     * (Hyndman et al. 2008, §6.1, simulation of the forecast distribution).
     *
     * @param shocks standard normal draws, one row per path, one column per step
     */
    double[][] paths(double[] state, Parameters p, double sigma2, double[][] shocks) {
        int m = season == Season.NONE ? 1 : period;
        double phi = damped ? p.phi() : 1;
        double sigma = Math.sqrt(sigma2);
        double[][] out = new double[shocks.length][];
        double[] lb = new double[2];
        double[] s = new double[m];
        for (int path = 0; path < shocks.length; path++) {
            lb[0] = state[0];
            lb[1] = state[1];
            System.arraycopy(state, 2, s, 0, m);
            double[] y = new double[shocks[path].length];
            for (int i = 0; i < y.length; i++) {
                double f = point(lb[0], lb[1], s, phi, 1);
                double z = shocks[path][i];
                y[i] = error == Error.ADDITIVE ? f + sigma * z : f * (1 + sigma * z);
                advance(lb, s, phi, p, y[i]);
            }
            out[path] = y;
        }
        return out;
    }

    /**
     * Class-1 forecast variances (additive errors, no multiplicative component; Hyndman et al.
     * 2008, §6.2, eq. 6.3): v_h = σ²(1 + Σ_{j=1}^{h−1} c_j²), c_j = w′F^{j−1}g.
     */
    private Prediction classOne(double[] state, Parameters p, double sigma2, int h) {
        LinearForm form = linearForm(p);
        double[] mean = forecastFrom(state, p.phi(), h);
        double[] variance = new double[h];
        double[] fg = form.g().clone(); // F^{j−1} g
        double sum = 0;
        for (int i = 0; i < h; i++) {
            variance[i] = sigma2 * (1 + sum);
            double c = 0;
            for (int k = 0; k < fg.length; k++) {
                c += form.w()[k] * fg[k];
            }
            sum += c * c;
            double[] next = new double[fg.length];
            for (int r = 0; r < fg.length; r++) {
                for (int k = 0; k < fg.length; k++) {
                    next[r] += form.f()[r][k] * fg[k];
                }
            }
            fg = next;
        }
        return new Prediction(mean, variance);
    }

    /** The linear state-space form x_t = F x_{t−1} + g ε_t, y_t = w′x_{t−1} + ε_t, state (l, b, s_1 … s_m). */
    private record LinearForm(double[][] f, double[] g, double[] w) {
    }

    private LinearForm linearForm(Parameters p) {
        int m = season == Season.NONE ? 0 : period;
        int t = trend == Trend.NONE ? 0 : 1;
        int size = 1 + t + m;
        double phi = damped ? p.phi() : 1;
        double[][] f = new double[size][size];
        double[] g = new double[size];
        double[] w = new double[size];
        f[0][0] = 1;
        w[0] = 1;
        g[0] = p.alpha();
        if (t == 1) {
            f[0][1] = phi;
            f[1][1] = phi;
            w[1] = phi;
            g[1] = p.beta();
        }
        if (m > 0) {
            int first = 1 + t;
            f[first][first + m - 1] = 1; // the new first season is the oldest one, updated
            for (int i = 1; i < m; i++) {
                f[first + i][first + i - 1] = 1;
            }
            w[first + m - 1] = 1;
            g[first] = p.gamma();
        }
        return new LinearForm(f, g, w);
    }

    double[] forecastFrom(double[] state, double phi, int h) {
        int m = season == Season.NONE ? 1 : period;
        double[] s = Arrays.copyOfRange(state, 2, 2 + m);
        double damping = damped ? phi : 1;
        double[] f = new double[h];
        double phistar = 0;
        double power = 1;
        for (int i = 1; i <= h; i++) {
            power *= damping;
            phistar += power;
            f[i - 1] = point(state[0], state[1], s, phistar, i);
        }
        return f;
    }

    /**
     * Class-3 recursions with the level–trend part x = (l, b) and seasonal part s = (s_1 … s_m):
     * y = (H1 x)(H2 s)(1 + ε), x' = F1 x + G1 x ε, s' = F2 s + G2 s ε. M = E[x s'] and V = Var(vec M)
     * are carried forward; H1 = (1, φ) and F1's first row (1, φ) carry the damping, so the one-step
     * mean equals the point forecast also for damped trends.
     */
    private Prediction classThree(double[] state, Parameters p, double sigma2, int h) {
        int m = period;
        int k = trend == Trend.NONE ? 1 : 2;
        double phi = damped ? p.phi() : 1;
        double[][] h1 = k == 1 ? new double[][] {{1}} : new double[][] {{1, phi}};
        double[][] f1 = k == 1 ? new double[][] {{1}} : new double[][] {{1, phi}, {0, phi}};
        double[][] g1 = k == 1 ? new double[][] {{p.alpha()}}
                : new double[][] {{p.alpha(), p.alpha() * phi}, {p.beta(), p.beta() * phi}};
        double[][] h2 = new double[1][m];
        h2[0][m - 1] = 1;
        double[][] f2 = new double[m][m];
        f2[0][m - 1] = 1;
        for (int i = 1; i < m; i++) {
            f2[i][i - 1] = 1;
        }
        double[][] g2 = new double[m][m];
        g2[0][m - 1] = p.gamma();
        double[][] means = new double[k][m];
        for (int r = 0; r < k; r++) {
            for (int c = 0; c < m; c++) {
                means[r][c] = state[r] * state[2 + c];
            }
        }
        double[][] h21 = Matrices.kronecker(h2, h1);
        double[][] f21 = Matrices.kronecker(f2, f1);
        double[][] g21 = Matrices.kronecker(g2, g1);
        double[][] cross = Matrices.add(Matrices.kronecker(g2, f1), Matrices.kronecker(f2, g1));
        double[][] v = new double[k * m][k * m];
        double[] mean = new double[h];
        double[] variance = new double[h];
        for (int i = 0; i < h; i++) {
            mean[i] = Matrices.product(h1, means, Matrices.transpose(h2))[0][0];
            variance[i] = (1 + sigma2) * Matrices.product(h21, v, Matrices.transpose(h21))[0][0]
                    + sigma2 * mean[i] * mean[i];
            double[][] vecM = Matrices.vec(means);
            double[][] outer = Matrices.product(vecM, Matrices.transpose(vecM));
            double[][] noise = Matrices.add(
                    Matrices.add(Matrices.product(f21, v, Matrices.transpose(g21)),
                            Matrices.product(g21, v, Matrices.transpose(f21))),
                    Matrices.add(Matrices.product(cross, Matrices.add(v, outer), Matrices.transpose(cross)),
                            Matrices.scale(sigma2, Matrices.product(g21,
                                    Matrices.add(Matrices.scale(3, v), Matrices.scale(2, outer)),
                                    Matrices.transpose(g21)))));
            v = Matrices.add(Matrices.product(f21, v, Matrices.transpose(f21)), Matrices.scale(sigma2, noise));
            means = Matrices.add(Matrices.product(f1, means, Matrices.transpose(f2)),
                    Matrices.scale(sigma2, Matrices.product(g1, means, Matrices.transpose(g2))));
        }
        return new Prediction(mean, variance);
    }

    /**
     * The h-step point forecast from a state (R forecast: forecast()), given φ* = φ + φ² + … + φ^h
     * (h when undamped).
     */
    private double point(double l, double b, double[] s, double phistar, int h) {
        double f = trend == Trend.NONE ? l : l + phistar * b;
        if (season != Season.NONE) {
            double factor = s[Math.floorMod(s.length - h, s.length)]; // s_1 the most recent season
            f = season == Season.ADDITIVE ? f + factor : f * factor;
        }
        return f;
    }
}
