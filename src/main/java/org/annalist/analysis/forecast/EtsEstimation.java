package org.annalist.analysis.forecast;

import java.util.Arrays;
import java.util.Optional;
import org.annalist.analysis.decompose.ClassicalDecomposition;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;

/**
 * Maximum-likelihood estimation of an ETS model's smoothing parameters and initial states [1, §5.2],
 * started from the usual heuristic ({@link #initialStates}) and α = 0.5, β = 0.1α, γ = 0.05(1 − α),
 * φ = 0.978 as common practice. The usual bounds hold by construction: 10⁻⁴ ≤ α ≤ 0.9999, β = αu
 * and γ = (1 − α)v with u, v in the same range, 0.8 ≤ φ ≤ 0.98. The optimum found must also be
 * forecastable ({@link #isAdmissible}, [2]); the search is a quasi-Newton one
 * ({@link BoundedQuasiNewton}) with the criterion's exact gradient ({@link EtsGradient}). (A second
 * search from the same start with a short first step, kept
 * until December 2026 because it found a better basin of the likelihood for some models, changed no
 * model choice in the tests against R and no M3 score beyond the third digit, at 30 % of the outlook's time.)
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J., Koehler, A. B., Ord, J. K. &amp; Snyder, R. D. (2008). <i>Forecasting with
 * Exponential Smoothing: The State Space Approach</i>. Springer. DOI 10.1007/978-3-540-71918-2.</li>
 * <li>Hyndman, R. J., Akram, M. &amp; Archibald, B. C. (2008). The admissible parameter space for
 * exponential smoothing models. <i>Annals of the Institute of Statistical Mathematics</i> 60(2),
 * 407–426. DOI 10.1007/s10463-006-0109-x.</li>
 * <li>Hyndman, R. J. &amp; Khandakar, Y. (2008). Automatic time series forecasting: the forecast
 * package for R. <i>Journal of Statistical Software</i> 27(3), 1–22. DOI 10.18637/jss.v027.i03.</li>
 * </ol>
 */
final class EtsEstimation {

    /** Lower bounds of α, u = β/α, v = γ/(1 − α) and φ, as common practice. */
    private static final double[] LOWER = {1e-4, 1e-4, 1e-4, 0.8};
    /** Upper bounds of α, u, v and φ, as common practice. */
    private static final double[] UPPER = {0.9999, 0.9999, 0.9999, 0.98};
    /** The search's start: α = 0.5, β = 0.1α, γ = 0.05(1 − α), φ = 0.978, as common practice. */
    private static final double[] START = {0.5, 0.1, 0.05, 0.978};
    /** How far outside the unit circle an eigenvalue of the discount matrix may lie (rounding). */
    private static final double ADMISSIBLE_TOLERANCE = 1e-6;
    /** The smallest seasonal factor a multiplicative model's start may be searched down to: a bound of this search. */
    private static final double SMALLEST_FACTOR = 0.01;
    /**
     * How far the level and trend starts are searched from the heuristic ones, in units of the
     * series' mean absolute value, and how large a seasonal factor may get: a bound of this search.
     */
    private static final double STATE_RANGE = 10;
    /** The smallest seasonal factor the start divides by when it adjusts the first seasons: a guard against a factor near zero. */
    private static final double ADJUSTMENT_FLOOR = 1e-2;
    /**
     * The search stops when an iteration improves the criterion by less than this, relative: about
     * R's {@code optim} default, √ε ≈ 1.5·10⁻⁸, which the forecast package's {@code ets} keeps
     * (from memory).
     */
    private static final double RELATIVE_CHANGE = 1e-8;
    /** The most quasi-Newton iterations per search. */
    private static final int MAX_ITERATIONS = 500;

    private EtsEstimation() {
    }

    /**
     * @return empty when no start gives a finite likelihood or the optimum is not admissible
     * @throws IllegalArgumentException for a seasonal model with fewer than two full seasons of values
     */
    static Optional<EtsModel.Fit> fit(EtsModel model, double[] y) {
        if (model.estimator() == EtsModel.Estimator.SIMPLEX) {
            return EtsSimplexSearch.fit(model, y);
        }
        Coordinates coordinates = new Coordinates(model, y);
        BoundedQuasiNewton.Minimum best = new BoundedQuasiNewton(coordinates.lower, coordinates.upper,
                coordinates::criterion, coordinates::gradient).minimise(coordinates.guess, RELATIVE_CHANGE, MAX_ITERATIONS);
        if (!Double.isFinite(best.value())) {
            return Optional.empty();
        }
        return coordinates.parameters(best.point())
                .flatMap(p -> EtsFilter.filter(model, y, p))
                .filter(fit -> isAdmissible(model, fit.parameters()));
    }

    /**
     * The search's variables z: α, u, v (and φ when damped), then the states as offsets from the
     * heuristic start in units of the series' scale (seasonal factors in their own units), so that
     * the search sees variables of similar size; the last season follows from the others.
     */
    static final class Coordinates {

        private final EtsModel model;
        private final double[] y;
        private final double[] start;
        private final int smoothing;
        private final int states;
        private final double scale;
        private final double[] lower;
        private final double[] upper;
        final double[] guess;
        /** The initial states of the point being evaluated, reused from one evaluation to the next. */
        private final double[] initial;
        /** The gradient's passes and its result in α, β*, γ, φ and the states. */
        private final EtsGradient gradient;
        private final double[] natural;
        /** The point whose forward pass the gradient keeps, valid while it {@link EtsGradient#hasKeptPass}. */
        private final double[] keptAt;

        Coordinates(EtsModel model, double[] y) {
            this.model = model;
            this.y = y;
            start = initialStates(model, y, false);
            states = start.length - (model.season() == EtsModel.Season.NONE ? 0 : 1);
            scale = Arrays.stream(y).map(Math::abs).average().orElse(1);
            smoothing = 3 + (model.damped() ? 1 : 0);
            int dimension = smoothing + states;
            lower = new double[dimension];
            upper = new double[dimension];
            guess = new double[dimension];
            for (int i = 0; i < smoothing; i++) {
                lower[i] = LOWER[i];
                upper[i] = UPPER[i];
                guess[i] = START[i];
            }
            for (int i = 0; i < states; i++) {
                boolean factor = isSeasonalFactor(i);
                lower[smoothing + i] = factor ? SMALLEST_FACTOR - start[i] : -STATE_RANGE;
                upper[smoothing + i] = factor ? STATE_RANGE - start[i] : STATE_RANGE;
            }
            initial = new double[start.length];
            gradient = new EtsGradient(model, y, initial.length);
            natural = new double[EtsGradient.STATES + initial.length];
            keptAt = new double[dimension];
        }

        private boolean isSeasonalFactor(int state) {
            return model.season() == EtsModel.Season.MULTIPLICATIVE && state >= model.firstSeasonIndex();
        }

        /** The likelihood criterion at z; +∞ where z gives a last seasonal factor at or below zero. */
        double criterion(double[] z) {
            gradient.forgetKept();
            if (!fillInitial(z)) {
                return Double.POSITIVE_INFINITY;
            }
            System.arraycopy(z, 0, keptAt, 0, z.length);
            return EtsFilter.criterion(model, y, z[0], beta(z), gamma(z), phi(z), initial, gradient);
        }

        /**
         * The criterion's exact gradient at z ({@link EtsGradient}), by the chain rule through β* = β/α = u,
         * γ = (1 − α)v and the states' offsets (the last season minus the sum of the others).
         */
        boolean gradient(double[] z, double[] g) {
            if (!fillInitial(z)) {
                return false;
            }
            boolean trended = model.trend() != EtsModel.Trend.NONE;
            boolean seasonal = model.season() != EtsModel.Season.NONE;
            double betaStar = trended ? beta(z) / z[0] : 0;
            // the search asks for the gradient where it has just evaluated the criterion: its pass serves
            boolean found = gradient.hasKeptPass() && Arrays.equals(z, keptAt)
                    ? gradient.fromKeptPass(z[0], betaStar, gamma(z), phi(z), natural)
                    : gradient.at(z[0], betaStar, gamma(z), phi(z), initial, natural);
            if (!found) {
                return false;
            }
            java.util.Arrays.fill(g, 0);
            g[0] = natural[EtsGradient.ALPHA] - (seasonal ? z[2] * natural[EtsGradient.GAMMA] : 0);
            g[1] = trended ? natural[EtsGradient.BETA_STAR] : 0;
            g[2] = seasonal ? (1 - z[0]) * natural[EtsGradient.GAMMA] : 0;
            if (model.damped()) {
                g[3] = natural[EtsGradient.PHI];
            }
            double last = seasonal ? natural[EtsGradient.STATES + initial.length - 1] : 0;
            for (int i = 0; i < states; i++) {
                double own = natural[EtsGradient.STATES + i] - (seasonal && i >= model.firstSeasonIndex() ? last : 0);
                g[smoothing + i] = (isSeasonalFactor(i) ? 1 : scale) * own;
            }
            return true;
        }

        /** The parameters at z, empty where z gives a last seasonal factor at or below zero. */
        Optional<EtsModel.Parameters> parameters(double[] z) {
            if (!fillInitial(z)) {
                return Optional.empty();
            }
            return Optional.of(new EtsModel.Parameters(z[0], beta(z), gamma(z), phi(z), initial));
        }

        private double beta(double[] z) {
            return model.trend() == EtsModel.Trend.NONE ? 0 : z[0] * z[1];
        }

        private double gamma(double[] z) {
            return model.season() == EtsModel.Season.NONE ? 0 : (1 - z[0]) * z[2];
        }

        private double phi(double[] z) {
            return model.damped() ? z[3] : 1;
        }

        /** Writes the initial states at z into {@link #initial}; false if the last seasonal factor is not positive. */
        private boolean fillInitial(double[] z) {
            double seasonalSum = 0;
            int firstSeason = model.firstSeasonIndex();
            for (int i = 0; i < states; i++) {
                initial[i] = start[i] + (isSeasonalFactor(i) ? 1 : scale) * z[smoothing + i];
                if (i >= firstSeason) {
                    seasonalSum += initial[i];
                }
            }
            if (model.season() != EtsModel.Season.NONE) {
                boolean multiplicative = model.season() == EtsModel.Season.MULTIPLICATIVE;
                initial[start.length - 1] = (multiplicative ? model.period() : 0) - seasonalSum;
                return !(multiplicative && initial[start.length - 1] <= 0);
            }
            return true;
        }
    }

    /**
     * Whether the smoothing parameters lie in the forecastable region of the model's linear form
     * [2]: no eigenvalue of the discount matrix D = F − g w′ outside the unit circle. With m
     * seasonal states D keeps one unit eigenvalue from their redundancy, so unit moduli are allowed
     * (tolerance {@value #ADMISSIBLE_TOLERANCE}). Hyndman et al. [1, §10.1] apply the same region to
     * the multiplicative models as common practice.
     */
    static boolean isAdmissible(EtsModel model, EtsModel.Parameters p) {
        double[][] d = EtsLinearForm.of(model, p).discount();
        EigenDecomposition eigen = new EigenDecomposition(new Array2DRowRealMatrix(d, false));
        for (int i = 0; i < d.length; i++) {
            if (Math.hypot(eigen.getRealEigenvalue(i), eigen.getImagEigenvalue(i)) > 1 + ADMISSIBLE_TOLERANCE) {
                return false;
            }
        }
        return true;
    }

    /**
     * The usual starting states ([1, §2.6.1], as R's forecast computes them [3]): the seasonal states
     * from a classical decomposition of the first three seasons (at least two), or of the whole series
     * as forecast 8.20's {@code initstate} does it (read from the installed package's code, December
     * 2026), s_1 the season just before the first observation; level and trend from a least-squares
     * line through the first max(10, 2m) seasonally adjusted values (the level their mean without a trend).
     *
     * @param wholeSeries the seasons from the whole series, not its first three seasons
     * @return {level, trend (if any), s_1 … s_m (if seasonal)}
     * @throws IllegalArgumentException for a seasonal model with fewer than two full seasons of values
     */
    static double[] initialStates(EtsModel model, double[] y, boolean wholeSeries) {
        int m = model.seasonSlots();
        double[] adjusted = y;
        double[] seasons = new double[0];
        if (model.season() != EtsModel.Season.NONE) {
            int cycles = Math.min(3, y.length / m);
            if (cycles < 2) {
                throw new IllegalArgumentException("a seasonal ETS model needs two full seasons, got " + y.length
                        + " values for period " + m);
            }
            boolean additive = model.season() == EtsModel.Season.ADDITIVE;
            double[] head = wholeSeries ? y.clone() : Arrays.copyOf(y, cycles * m);
            ClassicalDecomposition.Result d = ClassicalDecomposition.of(head, m,
                    additive ? ClassicalDecomposition.Type.ADDITIVE : ClassicalDecomposition.Type.MULTIPLICATIVE);
            double[] figure = d.figure();
            double[] seasonal = d.seasonal();
            seasons = new double[m];
            for (int j = 0; j < m; j++) {
                seasons[j] = figure[m - 1 - j];
            }
            adjusted = new double[head.length];
            for (int i = 0; i < head.length; i++) {
                adjusted[i] = additive ? head[i] - seasonal[i] : head[i] / Math.max(seasonal[i], ADJUSTMENT_FLOOR);
            }
        }
        int count = Math.min(Math.max(10, 2 * m), adjusted.length);
        StartLine line = StartLine.through(adjusted, count);
        double[] levelAndTrend = model.trend() == EtsModel.Trend.NONE ? new double[] {line.mean()}
                : new double[] {line.intercept(), line.slope()};
        double[] out = Arrays.copyOf(levelAndTrend, levelAndTrend.length + seasons.length);
        System.arraycopy(seasons, 0, out, levelAndTrend.length, seasons.length);
        return out;
    }
}
