package org.annalist.analysis.forecast;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * The outlook's methods fitted on all the values they are given, each as a forecast with intervals
 * and sample paths: the best ETS model by AICc ({@link EtsSelection}; closed-form intervals for
 * classes 1 and 3 [1, ch. 6], simulated ones otherwise), the automatic ARIMA model
 * ({@link AutoArima}), Theta ({@link Theta}), the seasonal naive forecast ({@link SeasonalNaive})
 * and the equal-weight combination of the members the back-test scored, whose paths are the
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

    /**
     * The members' models chosen on one span of values — ETS by AICc, ARIMA by the stepwise search
     * (for seasonal periods up to {@value Backtest#MAX_ARIMA_PERIOD}), Theta — each searched once: the
     * outlook forecasts from these fits, and its back-test re-estimates their forms on the values
     * before its first origin ({@link Members}).
     */
    record Searched(double[] y, int period, Optional<EtsModel.Fit> ets, Optional<Arima.Fit> arima,
                    Optional<Theta.Fit> theta) {

        Searched {
            y = y.clone();
        }

        @Override
        public double[] y() {
            return y.clone();
        }

        static Searched on(double[] y, int period) {
            return new Searched(y, period, EtsSelection.select(y, period).map(EtsSelection.Choice::best),
                    period <= Backtest.MAX_ARIMA_PERIOD ? AutoArima.fitForOutlook(y, period) : Optional.empty(),
                    Theta.fit(y, period));
        }
    }

    /** {@link #forecast(Outlook.Method, Searched, int, Outlook.Bounds, List)} with the models searched on {@code y}. */
    static Optional<Outlook.Forecast> forecast(Outlook.Method method, double[] y, int period, int horizon,
                                               Outlook.Bounds bounds, List<Outlook.Method> members) {
        return forecast(method, Searched.on(y, period), horizon, bounds, members);
    }

    /**
     * @param members the methods the combination averages (those the back-test scored)
     * @return empty when the method cannot be fitted to the searched values
     */
    static Optional<Outlook.Forecast> forecast(Outlook.Method method, Searched searched, int horizon,
                                               Outlook.Bounds bounds, List<Outlook.Method> members) {
        double[][] shocks = Shocks.forHorizon(horizon);
        if (method == Outlook.Method.COMBINATION) {
            return combination(searched, horizon, shocks, bounds, members);
        }
        return single(method, searched, horizon, shocks).map(m -> m.forecast(bounds));
    }

    /**
     * A single method's fit: its model, its point forecasts, its paths, and its closed-form means
     * and variances where it has them — made only when its own intervals are asked for: the
     * combination needs the members' point forecasts and paths alone.
     */
    private record Fitted(Outlook.Model model, double[] mean, double[][] paths,
                          Supplier<Optional<Prediction>> prediction) {

        Outlook.Forecast forecast(Outlook.Bounds bounds) {
            return prediction.get().map(p -> Intervals.fromPrediction(model, p, paths, bounds))
                    .orElseGet(() -> Intervals.fromPaths(model, mean, paths, bounds));
        }
    }

    private static Optional<Fitted> single(Outlook.Method method, Searched searched, int horizon, double[][] shocks) {
        int cycle = Math.max(1, searched.period());
        double[] y = searched.y();
        return switch (method) {
            case ETS -> searched.ets().map(fit -> new Fitted(
                    Outlook.Model.single(Outlook.Method.ETS, Optional.of(fit.model().label()), false,
                            fit.model().trend() != EtsModel.Trend.NONE), fit.forecast(horizon),
                    fit.paths(shocks), () -> fit.hasAnalyticIntervals() ? Optional.of(fit.predict(horizon)) : Optional.empty()));
            case ARIMA -> searched.arima().map(fit -> new Fitted(
                    Outlook.Model.single(Outlook.Method.ARIMA, Optional.of(fit.label()), false,
                            fit.order().hasDrift() || fit.order().differences() >= 2), fit.forecast(horizon),
                    fit.paths(shocks), () -> Optional.of(fit.predict(horizon))));
            case THETA -> searched.theta().map(theta -> new Fitted(
                    Outlook.Model.single(Outlook.Method.THETA, Optional.empty(), theta.deseasonalised(), true),
                    theta.forecast(horizon), theta.paths(shocks), () -> Optional.of(theta.predict(horizon))));
            case SEASONAL_NAIVE -> y.length <= cycle ? Optional.empty() : Optional.of(new Fitted(
                    Outlook.Model.single(Outlook.Method.SEASONAL_NAIVE, Optional.empty(), false, false),
                    SeasonalNaive.forecast(y, cycle, horizon), SeasonalNaive.paths(y, cycle, shocks),
                    () -> Optional.of(SeasonalNaive.predict(y, cycle, horizon))));
            case COMBINATION, NAIVE_WITH_DRIFT -> throw new IllegalArgumentException("not a single method: " + method);
        };
    }

    /**
     * The mean of the members' forecasts, and of their paths under the same shocks; a member that
     * cannot be fitted to all values is left out, as long as two remain.
     */
    private static Optional<Outlook.Forecast> combination(Searched searched, int horizon, double[][] shocks,
                                                          Outlook.Bounds bounds, List<Outlook.Method> members) {
        List<Fitted> fitted = new ArrayList<>();
        for (Outlook.Method m : members) {
            single(m, searched, horizon, shocks).filter(f -> Members.finite(f.mean())).ifPresent(fitted::add);
        }
        if (fitted.size() < 2) {
            return Optional.empty();
        }
        double[] mean = Members.mean(fitted.stream().map(Fitted::mean).toArray(double[][]::new));
        double[][] paths = new double[shocks.length][horizon];
        for (Fitted f : fitted) {
            for (int p = 0; p < shocks.length; p++) {
                for (int k = 0; k < horizon; k++) {
                    paths[p][k] += f.paths()[p][k] / fitted.size();
                }
            }
        }
        Outlook.Model model = Outlook.Model.combination(fitted.stream().map(Fitted::model).toList());
        return Optional.of(Intervals.fromPaths(model, mean, paths, bounds));
    }
}
