package org.annalist.analysis.forecast;

import java.util.Locale;
import java.util.Optional;

/**
 * An exponential smoothing state-space model ETS(error, trend, season) [1], [2, Table 2.3]: what it
 * is (its components, the values it estimates, its name in the standard notation) and its
 * parameters and fits. The work is done elsewhere: {@link EtsFilter} runs the model over a series
 * (likelihood, final state, point forecasts) as R's forecast package does [4], {@link EtsEstimation}
 * fits it by maximum likelihood, {@link EtsForecastVariance} gives the closed-form forecast
 * distributions and {@link EtsSimulation} the simulated future paths.
 *
 * <p>Criterion: {@code lik = n log(Σ e²)}, plus {@code 2 Σ log|ŷ|} for multiplicative errors
 * (e the one-step error, relative for multiplicative errors); log-likelihood −lik/2 as forecast
 * reports it; k = parameters and initial states estimated + 1; AICc = AIC + 2k(k+1)/(n − k − 1).
 * β is the trend's smoothing parameter as R writes it (β = α β*).
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J., Koehler, A. B., Snyder, R. D. &amp; Grose, S. (2002). A state space framework
 * for automatic forecasting using exponential smoothing methods. <i>International Journal of
 * Forecasting</i> 18(3), 439–454. DOI 10.1016/S0169-2070(01)00110-8.</li>
 * <li>Hyndman, R. J., Koehler, A. B., Ord, J. K. &amp; Snyder, R. D. (2008). <i>Forecasting with
 * Exponential Smoothing: The State Space Approach</i>. Springer. DOI 10.1007/978-3-540-71918-2.</li>
 * <li>Hyndman, R. J., Akram, M. &amp; Archibald, B. C. (2008). The admissible parameter space for
 * exponential smoothing models. <i>Annals of the Institute of Statistical Mathematics</i> 60(2),
 * 407–426. DOI 10.1007/s10463-006-0109-x.</li>
 * <li>Hyndman, R. J. &amp; Khandakar, Y. (2008). Automatic time series forecasting: the forecast
 * package for R. <i>Journal of Statistical Software</i> 27(3), 1–22. DOI 10.18637/jss.v027.i03.</li>
 * </ol>
 *
 * @param period    the season's length (1 without a season)
 * @param estimator how {@link #fit} searches for the maximum-likelihood parameters
 */
public record EtsModel(Error error, Trend trend, boolean damped, Season season, int period, Estimator estimator) {

    public enum Error { ADDITIVE, MULTIPLICATIVE }

    public enum Trend { NONE, ADDITIVE }

    public enum Season { NONE, ADDITIVE, MULTIPLICATIVE }

    /** How the maximum-likelihood parameters are searched for ({@link EtsEstimation}). */
    public enum Estimator {
        /** The bounded quasi-Newton search ({@link BoundedQuasiNewton}) in the coordinates of {@link EtsEstimation}. */
        QUASI_NEWTON,
        /** The simplex search ({@link EtsSimplexSearch}). */
        SIMPLEX;

        /**
         * The search for the models of a series with {@code seriesPeriod} periods a year, seasonal or
         * not: the simplex search for quarterly series, on whose M3 competition series its coarser
         * optimum forecast better (the whole outlook's mean MASE 1.078 → 1.059), the quasi-Newton
         * search for the others, on whose monthly and yearly M3 series the simplex forecast worse
         * (0.830 → 0.832, 2.663 → 2.688; December 2026, README "The outlook on the M3 competition").
         */
        public static Estimator forPeriod(int seriesPeriod) {
            return seriesPeriod == 4 ? SIMPLEX : QUASI_NEWTON;
        }
    }

    /**
     * @param initial {level, trend (if any), s_1 … s_m (if seasonal)}, s_1 the most recent season
     *                before the first observation, as R's {@code initstate}
     */
    public record Parameters(double alpha, double beta, double gamma, double phi, double[] initial) {

        public Parameters {
            initial = initial.clone();
        }

        @Override
        public double[] initial() {
            return initial.clone();
        }
    }

    /**
     * @param lik   the criterion n log(Σe²) [+ 2 Σ log|ŷ|]
     * @param state the final state {level, trend, s_1 … s_m}
     */
    public record Fit(EtsModel model, Parameters parameters, double lik, double logLik, double aic, double aicc,
                      double bic, double sigma2, double mse, double[] state, int n) {

        public Fit {
            state = state.clone();
        }

        @Override
        public double[] state() {
            return state.clone();
        }

        /** Point forecasts 1 … h ahead from the final state. */
        public double[] forecast(int h) {
            return EtsFilter.forecastFrom(model, state, parameters.phi(), h);
        }

        /**
         * The forecast distribution's mean and variance 1 … h ahead where the model class has them
         * in closed form ({@link EtsForecastVariance}).
         *
         * @throws IllegalStateException for the other models (class 2), see {@link #hasAnalyticIntervals}
         */
        public Prediction predict(int h) {
            return EtsForecastVariance.predict(model, state, parameters, sigma2, h);
        }

        public boolean hasAnalyticIntervals() {
            return EtsForecastVariance.hasClosedForm(model);
        }

        /** Simulated future paths from the final state, one per row of standard normal {@code shocks}. */
        public double[][] paths(double[][] shocks) {
            return EtsSimulation.paths(model, state, parameters, sigma2, shocks);
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
     * The maximum-likelihood fit ({@link EtsEstimation}) by the model's {@link #estimator}.
     *
     * @return empty when no start gives a finite likelihood or the optimum is not admissible
     * @throws IllegalArgumentException for a seasonal model with fewer than two full seasons of values
     */
    public Optional<Fit> fit(double[] y) {
        return EtsEstimation.fit(this, y);
    }

    /**
     * The model with the given parameters run over {@code y} ({@link EtsFilter}).
     *
     * @return empty when a one-step forecast turns non-finite (the parameters do not suit the data)
     */
    public Optional<Fit> filter(double[] y, Parameters p) {
        return EtsFilter.filter(this, y, p);
    }

    /** The number of seasonal states the filter carries: the period, or 1 without a season. */
    int seasonSlots() {
        return season == Season.NONE ? 1 : period;
    }

    /** The index of s_1 in {level, trend (if any), s_1 … s_m}. */
    int firstSeasonIndex() {
        return trend == Trend.NONE ? 1 : 2;
    }
}
