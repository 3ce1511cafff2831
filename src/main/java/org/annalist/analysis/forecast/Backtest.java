package org.annalist.analysis.forecast;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.annalist.analysis.OrderStatistics;

/**
 * The outlook's rolling-origin back-test [1]: from every origin in the last two seasonal cycles
 * (eight periods for non-seasonal data) each candidate method forecasts up to one cycle ahead from
 * the values before the origin; the forecasts are scored by MASE, scaled by the in-sample seasonal
 * naive error before the first origin [2], by sMAPE and by the median absolute percentage error.
 * The ETS model is chosen by AICc at the first origin and its parameters are kept for the later
 * origins (updating, not re-estimating [1, §2.2]); Theta is refitted at every origin; the
 * combination is the mean of the three others.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Tashman, L. J. (2000). Out-of-sample tests of forecasting accuracy: an analysis and review.
 * <i>International Journal of Forecasting</i> 16(4), 437–450. DOI 10.1016/S0169-2070(00)00065-0.</li>
 * <li>Hyndman, R. J. &amp; Koehler, A. B. (2006). Another look at measures of forecast accuracy.
 * <i>International Journal of Forecasting</i> 22(4), 679–688. DOI 10.1016/j.ijforecast.2006.03.001.</li>
 * </ol>
 */
final class Backtest {

    /** Origins for non-seasonal data, where two cycles would be only two periods. */
    static final int NON_SEASONAL_ORIGINS = 8;

    private Backtest() {
    }

    /**
     * Origins for a series of {@code n} values: two cycles (or {@value #NON_SEASONAL_ORIGINS}
     * without a season), fewer where that would leave less than two cycles and at least
     * {@value Outlook#MIN_VALUES} values before the first; may be zero or negative.
     */
    static int origins(int n, int period) {
        int minimumTraining = Math.max(Outlook.MIN_VALUES, 2 * period);
        return Math.min(period > 1 ? 2 * period : NON_SEASONAL_ORIGINS, n - minimumTraining);
    }

    /** Whether that many origins make a back-test: at least one cycle (half the non-seasonal origins). */
    static boolean isLongEnough(int origins, int period) {
        return origins >= (period > 1 ? period : NON_SEASONAL_ORIGINS / 2);
    }

    /**
     * Every candidate's score, best first (a stable sort: equal MASE keeps the order of
     * {@link Outlook.Method}, the tie rule); methods that cannot be fitted at some origin are left out.
     *
     * @return empty when the back-test cannot rank the methods: the values before the first origin
     *         give no seasonal naive error to scale by, or a forecast is not a number
     */
    static Optional<List<Outlook.Score>> scores(double[] y, int period, int firstOrigin, int cycle) {
        double[] training = Arrays.copyOf(y, firstOrigin);
        OptionalDouble scale = Accuracy.naiveScale(training, cycle);
        if (scale.isEmpty()) {
            return Optional.empty();
        }
        Optional<EtsSelection.Choice> ets = EtsSelection.select(training, period);
        int pairs = 0;
        for (int o = firstOrigin; o < y.length; o++) {
            pairs += Math.min(cycle, y.length - o);
        }
        Outlook.Method[] methods = Outlook.Method.values();
        int etsIndex = Outlook.Method.ETS.ordinal();
        int thetaIndex = Outlook.Method.THETA.ordinal();
        int naiveIndex = Outlook.Method.SEASONAL_NAIVE.ordinal();
        double[] actual = new double[pairs];
        int[] horizon = new int[pairs];
        double[][] forecasts = new double[methods.length][pairs];
        boolean[] available = new boolean[methods.length];
        Arrays.fill(available, true);
        available[etsIndex] = ets.isPresent();
        int at = 0;
        int[] cycleStarts = new int[y.length - firstOrigin];
        int fullCycles = 0;
        for (int o = firstOrigin; o < y.length; o++) {
            int h = Math.min(cycle, y.length - o);
            if (h == cycle) {
                cycleStarts[fullCycles++] = at; // a whole cycle ahead from this origin: its sum is scored too
            }
            double[] before = Arrays.copyOf(y, o);
            Optional<double[]> etsForecast = Optional.empty();
            if (ets.isPresent()) {
                EtsModel.Fit best = ets.get().best();
                // [1] §2.2: the parameters are updated with the new values, not re-estimated
                Optional<EtsModel.Fit> updated = best.model().filter(before, best.parameters());
                available[etsIndex] &= updated.isPresent();
                etsForecast = updated.map(fit -> fit.forecast(h));
            }
            Optional<double[]> thetaForecast = Theta.fit(before, period).map(theta -> theta.forecast(h));
            available[thetaIndex] &= thetaForecast.isPresent();
            double[] naive = SeasonalNaive.forecast(before, cycle, h);
            for (int k = 0; k < h; k++) {
                actual[at + k] = y[o + k];
                horizon[at + k] = k;
                forecasts[naiveIndex][at + k] = naive[k];
            }
            if (etsForecast.isPresent()) {
                System.arraycopy(etsForecast.get(), 0, forecasts[etsIndex], at, h);
            }
            if (thetaForecast.isPresent()) {
                System.arraycopy(thetaForecast.get(), 0, forecasts[thetaIndex], at, h);
            }
            at += h;
        }
        int combinationIndex = Outlook.Method.COMBINATION.ordinal();
        available[combinationIndex] = available[etsIndex] && available[thetaIndex];
        for (int i = 0; i < pairs; i++) {
            forecasts[combinationIndex][i] = (forecasts[etsIndex][i] + forecasts[thetaIndex][i]
                    + forecasts[naiveIndex][i]) / 3;
        }
        Optional<EtsModel> etsModel = ets.map(c -> c.best().model());
        List<Outlook.Score> scores = new ArrayList<>();
        for (Outlook.Method method : methods) {
            if (!available[method.ordinal()]) {
                continue;
            }
            double[] f = forecasts[method.ordinal()];
            OptionalDouble medianApe = medianAbsolutePercentError(actual, f);
            if (medianApe.isEmpty()) {
                return Optional.empty();
            }
            Accuracy.Result accuracy = Accuracy.scaled(actual, f, scale.getAsDouble());
            boolean withEts = method == Outlook.Method.ETS || method == Outlook.Method.COMBINATION;
            scores.add(new Outlook.Score(method, withEts ? etsModel : Optional.empty(), accuracy.mase(),
                    accuracy.smape(), medianApe.getAsDouble(), pairs, HorizonErrors.of(actual, f, horizon, cycle,
                    Arrays.copyOf(cycleStarts, fullCycles))));
        }
        // stable sort: equal MASE keeps the enum order, the tie rule
        scores.sort(Comparator.comparingDouble(Outlook.Score::mase));
        return Optional.of(List.copyOf(scores));
    }

    /**
     * The median of 100 |y − f| / |y| over the actual values that are not zero (NaN when all are).
     *
     * @return empty when a forecast (or an actual value) makes a percentage error that is not a
     *         number: it has no rank
     */
    private static OptionalDouble medianAbsolutePercentError(double[] actual, double[] forecast) {
        double[] ape = new double[actual.length];
        int counted = 0;
        for (int i = 0; i < actual.length; i++) {
            if (actual[i] != 0) {
                ape[counted++] = 100 * Math.abs(actual[i] - forecast[i]) / Math.abs(actual[i]);
            }
        }
        if (counted == 0) {
            return OptionalDouble.of(Double.NaN);
        }
        double[] errors = Arrays.copyOf(ape, counted);
        for (double e : errors) {
            if (Double.isNaN(e)) {
                return OptionalDouble.empty();
            }
        }
        return OptionalDouble.of(OrderStatistics.median(errors));
    }
}
