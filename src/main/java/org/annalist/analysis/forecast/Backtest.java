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
 * (eight periods for non-seasonal data) each method forecasts ahead from the values before the
 * origin; the forecasts up to one cycle ahead are scored by MASE, scaled by the in-sample seasonal naive error
 * before the first origin [2], by sMAPE and by the median absolute percentage error, over all
 * origins and over the earlier and the later half of them apart (a method that is better only in
 * one half is not reliably better). The single methods are prepared once, before the first origin
 * ({@link Members}); the combination is the mean of those of ETS, ARIMA and Theta that forecast from
 * every origin. Forecasts further ahead than a cycle, as far as the outlook looks and the origins
 * allow, are kept for the check of the intervals' coverage ({@link Widening}) only.
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
    /** The single methods, in the order that breaks ties among them. */
    private static final Outlook.Method[] SINGLE = {Outlook.Method.ETS, Outlook.Method.ARIMA, Outlook.Method.THETA,
            Outlook.Method.SEASONAL_NAIVE};
    /** The members the combination may average: the seasonal naive forecast is a yardstick, not a member. */
    static final List<Outlook.Method> COMBINABLE = List.of(Outlook.Method.ETS, Outlook.Method.ARIMA, Outlook.Method.THETA);
    /**
     * The longest seasonal period ARIMA is fitted for: weekly data (52) make seasonal ARIMA states
     * of a hundred elements and more, which the outlook cannot afford (and the literature does
     * not recommend seasonal ARIMA for such periods: Hyndman &amp; Athanasopoulos 2021, §12.1, from
     * memory); there the combination is ETS and Theta.
     */
    static final int MAX_ARIMA_PERIOD = 12;

    /** The members the combination may average for data with this seasonal period. */
    static List<Outlook.Method> combinable(int period) {
        return period <= MAX_ARIMA_PERIOD ? COMBINABLE : List.of(Outlook.Method.ETS, Outlook.Method.THETA);
    }

    /**
     * A back-test's outcome.
     *
     * @param scores   every method's score, the combination first, then the single methods best first
     * @param combined the members of the combination, in the order of {@link #COMBINABLE}
     * @param origins  origins scored
     * @param naiveMae the in-sample seasonal naive error the MASE is scaled by
     */
    record Run(List<Outlook.Score> scores, List<Outlook.Method> combined, int origins, double naiveMae) {

        Run {
            scores = List.copyOf(scores);
            combined = List.copyOf(combined);
        }

        Outlook.Score score(Outlook.Method method) {
            return scores.stream().filter(s -> s.method() == method).findFirst().orElseThrow();
        }
    }

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
     * @return empty when the back-test cannot rank the methods: the values before the first origin
     *         give no seasonal naive error to scale by, fewer than two members of the combination
     *         forecast from every origin, or a forecast is not a number
     * @param forms the members' models searched on the whole span, whose forms the back-test re-estimates
     * @param reach the most steps ahead forecast from an origin (at least {@code cycle})
     */
    static Optional<Run> run(double[] y, CandidateForecasts.Searched forms, int firstOrigin, int cycle, int reach) {
        int period = forms.period();
        double[] training = Arrays.copyOf(y, firstOrigin);
        OptionalDouble scale = Accuracy.naiveScale(training, cycle);
        if (scale.isEmpty()) {
            return Optional.empty();
        }
        int origins = y.length - firstOrigin;
        int pairs = 0;
        for (int o = firstOrigin; o < y.length; o++) {
            pairs += Math.min(reach, y.length - o);
        }
        double[] actual = new double[pairs];
        int[] horizon = new int[pairs];
        int[] origin = new int[pairs];
        double[][] forecasts = new double[SINGLE.length][pairs];
        boolean[] available = new boolean[SINGLE.length];
        List<Members.Updating> prepared = new ArrayList<>();
        for (int m = 0; m < SINGLE.length; m++) {
            Optional<Members.Updating> member = SINGLE[m] == Outlook.Method.ARIMA && period > MAX_ARIMA_PERIOD
                    ? Optional.empty() : Members.prepare(SINGLE[m], training, forms);
            available[m] = member.isPresent();
            prepared.add(member.orElse(null));
        }
        double[][][] fromOrigins = new double[SINGLE.length][][];
        for (int m = 0; m < SINGLE.length; m++) {
            if (available[m]) {
                Optional<double[][]> f = prepared.get(m).fromOrigins(y, firstOrigin, reach);
                available[m] = f.isPresent();
                fromOrigins[m] = f.orElse(null);
            }
        }
        List<Integer> cycleStarts = new ArrayList<>();
        int at = 0;
        for (int o = firstOrigin; o < y.length; o++) {
            int h = Math.min(reach, y.length - o);
            if (h >= cycle) {
                cycleStarts.add(at); // a whole cycle ahead from this origin: its sum is scored too
            }
            for (int m = 0; m < SINGLE.length; m++) {
                if (available[m]) {
                    System.arraycopy(fromOrigins[m][o - firstOrigin], 0, forecasts[m], at, h);
                }
            }
            for (int k = 0; k < h; k++) {
                actual[at + k] = y[o + k];
                horizon[at + k] = k;
                origin[at + k] = o - firstOrigin;
            }
            at += h;
        }
        List<Outlook.Method> combined = new ArrayList<>();
        for (Outlook.Method m : combinable(period)) {
            if (available[indexOf(m)]) {
                combined.add(m);
            }
        }
        if (combined.size() < 2) {
            return Optional.empty();
        }
        double[][] memberForecasts = combined.stream().map(m -> forecasts[indexOf(m)]).toArray(double[][]::new);
        double[] combination = Members.mean(memberForecasts);
        int[] starts = cycleStarts.stream().mapToInt(Integer::intValue).toArray();
        Scoring scoring = new Scoring(actual, horizon, origin, origins, cycle, starts, scale.getAsDouble());
        List<Outlook.Score> singles = new ArrayList<>();
        for (int m = 0; m < SINGLE.length; m++) {
            if (available[m]) {
                Optional<Outlook.Score> s = scoring.score(SINGLE[m], forecasts[m]);
                if (s.isEmpty()) {
                    return Optional.empty();
                }
                singles.add(s.get());
            }
        }
        singles.sort(Comparator.comparingDouble(Outlook.Score::mase)); // stable: ties keep SINGLE's order
        Optional<Outlook.Score> comb = scoring.score(Outlook.Method.COMBINATION, combination);
        if (comb.isEmpty()) {
            return Optional.empty();
        }
        List<Outlook.Score> scores = new ArrayList<>();
        scores.add(comb.get());
        scores.addAll(singles);
        return Optional.of(new Run(scores, combined, origins, scale.getAsDouble()));
    }

    private static int indexOf(Outlook.Method method) {
        return Arrays.asList(SINGLE).indexOf(method);
    }

    /** The scores of one back-test's forecasts against its actual values: those up to a cycle ahead. */
    private record Scoring(double[] actual, int[] horizon, int[] origin, int origins, int cycle, int[] cycleStarts,
                           double scale) {

        /** @return empty when a percentage error is not a number: the forecasts have no rank */
        Optional<Outlook.Score> score(Outlook.Method method, double[] f) {
            int within = 0;
            for (int k : horizon) {
                within += k < cycle ? 1 : 0;
            }
            double[] a = new double[within];
            double[] g = new double[within];
            double[] halves = new double[2];
            int[] counts = new int[2];
            int j = 0;
            for (int i = 0; i < actual.length; i++) {
                if (horizon[i] >= cycle) {
                    continue;
                }
                a[j] = actual[i];
                g[j++] = f[i];
                int half = 2 * origin[i] < origins ? 0 : 1;
                halves[half] += Math.abs(actual[i] - f[i]);
                counts[half]++;
            }
            OptionalDouble medianApe = medianAbsolutePercentError(a, g);
            if (medianApe.isEmpty()) {
                return Optional.empty();
            }
            Accuracy.Result accuracy = Accuracy.scaled(a, g, scale);
            return Optional.of(new Outlook.Score(method, accuracy.mase(), accuracy.smape(), accuracy.mase() * scale,
                    halves[0] / counts[0] / scale, halves[1] / counts[1] / scale, medianApe.getAsDouble(),
                    within, HorizonErrors.of(actual, f, horizon, cycle, cycleStarts)));
        }
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
