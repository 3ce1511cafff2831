package org.annalist.analysis.forecast;

import java.util.Optional;

/**
 * The outlook's candidate methods fitted on all values, each as a forecast with intervals and
 * sample paths: the best ETS model by AICc ({@link EtsSelection}; closed-form intervals for classes
 * 1 and 3 [1, ch. 6], simulated ones otherwise), Theta ({@link Theta}), the seasonal naive forecast
 * ({@link SeasonalNaive}) and the equal-weight combination of the three, whose paths are the
 * members' paths averaged under common shocks ({@link Shocks}).
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J., Koehler, A. B., Ord, J. K. &amp; Snyder, R. D. (2008). <i>Forecasting with
 * Exponential Smoothing: The State Space Approach</i>. Springer. DOI 10.1007/978-3-540-71918-2.</li>
 * </ol>
 */
final class CandidateForecasts {

    private CandidateForecasts() {
    }

    /** @return empty when the method cannot be fitted to {@code y} */
    static Optional<Outlook.Forecast> forecast(Outlook.Method method, double[] y, int period, int horizon,
                                               Outlook.Bounds bounds) {
        double[][] shocks = Shocks.forHorizon(horizon);
        int cycle = Math.max(1, period);
        return switch (method) {
            case ETS -> EtsSelection.select(y, period).map(c -> ets(c.best(), horizon, shocks, bounds));
            case THETA -> Theta.fit(y, period).map(theta -> Intervals.fromPrediction(
                    Outlook.Model.theta(theta.deseasonalised()), theta.predict(horizon), theta.paths(shocks), bounds));
            case SEASONAL_NAIVE -> y.length <= cycle ? Optional.empty() : Optional.of(Intervals.fromPrediction(
                    Outlook.Model.seasonalNaive(), SeasonalNaive.predict(y, cycle, horizon),
                    SeasonalNaive.paths(y, cycle, shocks), bounds));
            case COMBINATION -> combination(y, period, horizon, shocks, bounds);
        };
    }

    private static Outlook.Forecast ets(EtsModel.Fit fit, int horizon, double[][] shocks, Outlook.Bounds bounds) {
        double[][] paths = fit.paths(shocks);
        Outlook.Model model = Outlook.Model.ets(fit.model());
        if (fit.hasAnalyticIntervals()) {
            return Intervals.fromPrediction(model, fit.predict(horizon), paths, bounds);
        }
        return Intervals.fromPaths(model, fit.forecast(horizon), paths, bounds);
    }

    /** The mean of the ETS, Theta and seasonal naive forecasts, and of their paths under the same shocks. */
    private static Optional<Outlook.Forecast> combination(double[] y, int period, int horizon, double[][] shocks,
                                                          Outlook.Bounds bounds) {
        Optional<EtsSelection.Choice> ets = EtsSelection.select(y, period);
        Optional<Theta.Fit> thetaFit = Theta.fit(y, period);
        int cycle = Math.max(1, period);
        if (ets.isEmpty() || thetaFit.isEmpty() || y.length <= cycle) {
            return Optional.empty();
        }
        EtsModel.Fit best = ets.get().best();
        Theta.Fit theta = thetaFit.get();
        double[][][] members = {best.paths(shocks), theta.paths(shocks), SeasonalNaive.paths(y, cycle, shocks)};
        double[][] means = {best.forecast(horizon), theta.forecast(horizon), SeasonalNaive.forecast(y, cycle, horizon)};
        double[] mean = new double[horizon];
        double[][] paths = new double[shocks.length][horizon];
        for (int k = 0; k < horizon; k++) {
            for (int m = 0; m < members.length; m++) {
                mean[k] += means[m][k] / members.length;
                for (int p = 0; p < shocks.length; p++) {
                    paths[p][k] += members[m][p][k] / members.length;
                }
            }
        }
        return Optional.of(Intervals.fromPaths(Outlook.Model.combination(best.model()), mean, paths, bounds));
    }
}
