package org.annalist.analysis.forecast;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * The outlook: four candidate methods — the best ETS model by AICc ({@link EtsSelection}), Theta,
 * the seasonal naive forecast and their equal-weight combination ({@link CandidateForecasts}) —
 * compared in a rolling-origin back-test [1] ({@link Backtest}): from every origin in the last two
 * seasonal cycles (eight periods for non-seasonal data) each candidate forecasts up to one cycle
 * ahead from the data before the origin, and is scored by MASE (scaled by the in-sample seasonal
 * naive error before the first origin [2]) and sMAPE.
 *
 * <p>Choice rule: the lowest back-test MASE wins; ties go to the first of ETS, Theta, combination,
 * seasonal naive. Within ETS the model is chosen by AICc at the first origin, and its parameters are
 * kept for the later origins (updating, not re-estimating [1, §2.2]), which keeps the back-test to
 * one model search. A shorter series is back-tested over fewer origins, as many as leave two cycles
 * (and at least {@value #MIN_VALUES} values) before the first, down to one cycle (four origins
 * without a season); shorter still — or when the values before the first origin give no seasonal
 * naive error to scale by — ETS is chosen by AICc, and the result says so ({@link Choice}).
 *
 * <p>The chosen method is then refitted on all values; should that fail for a method other than
 * ETS, the seasonal naive forecast stands in. Intervals at 80 and 95 % ({@link Intervals}) are the
 * normal approximation to the closed-form forecast variance where the model has one (ETS classes 1
 * and 3, Theta, seasonal naive), else quantiles of {@value #PATHS} simulated paths with a fixed seed
 * ({@link Shocks}); the combination's paths are the members' paths averaged under common shocks
 * (every member's path driven by the same standard normal draws), so its intervals keep the
 * members' correlation instead of the false comfort of averaging independent errors. Sums over
 * several periods (the next year's total) come from the paths ({@link YearSums}). Where the chosen
 * model's intervals are narrower than the errors its method made in the back-test, they and the
 * paths are widened to those errors ({@link Widening}). Everything is clipped to the measure's bounds.
 *
 * <p>The result is evidence, not wording: the method, the model it fitted and the account of the
 * choice are typed values; the findings type them as statements and the narrative words them.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Tashman, L. J. (2000). Out-of-sample tests of forecasting accuracy: an analysis and review.
 * <i>International Journal of Forecasting</i> 16(4), 437–450. DOI 10.1016/S0169-2070(00)00065-0.</li>
 * <li>Hyndman, R. J. &amp; Koehler, A. B. (2006). Another look at measures of forecast accuracy.
 * <i>International Journal of Forecasting</i> 22(4), 679–688. DOI 10.1016/j.ijforecast.2006.03.001.</li>
 * </ol>
 */
public final class Outlook {

    /** Simulated paths per forecast: enough for stable 2.5 % and 97.5 % quantiles. */
    public static final int PATHS = Shocks.PATHS;
    /** The fewest values an outlook is made from, and the shortest training span of the back-test. */
    static final int MIN_VALUES = 8;

    /** The candidate methods, in the order that breaks ties. */
    public enum Method { ETS, THETA, COMBINATION, SEASONAL_NAIVE }

    /** The range a measure can take: counts are not negative, rates stay within 0–100 %. */
    public record Bounds(double lower, double upper) {
        public static final Bounds NONE = new Bounds(Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
        public static final Bounds NON_NEGATIVE = new Bounds(0, Double.POSITIVE_INFINITY);
        public static final Bounds PERCENT = new Bounds(0, 100);

        double clip(double v) {
            return Math.min(upper, Math.max(lower, v));
        }
    }

    /**
     * What a forecast's method fitted.
     *
     * @param method             the method
     * @param ets                the ETS model, for ETS and the combination (whose members are that
     *                           model, Theta and the seasonal naive forecast); empty otherwise
     * @param seasonallyAdjusted whether Theta worked on seasonally adjusted values (false for the others)
     */
    public record Model(Method method, Optional<EtsModel> ets, boolean seasonallyAdjusted) {

        public Model {
            boolean withEts = method == Method.ETS || method == Method.COMBINATION;
            if (ets.isPresent() != withEts || seasonallyAdjusted && method != Method.THETA) {
                throw new IllegalArgumentException("a model description must fit its method " + method + ", got "
                        + ets + ", seasonally adjusted " + seasonallyAdjusted);
            }
        }

        static Model ets(EtsModel model) {
            return new Model(Method.ETS, Optional.of(model), false);
        }

        static Model theta(boolean seasonallyAdjusted) {
            return new Model(Method.THETA, Optional.empty(), seasonallyAdjusted);
        }

        static Model seasonalNaive() {
            return new Model(Method.SEASONAL_NAIVE, Optional.empty(), false);
        }

        static Model combination(EtsModel member) {
            return new Model(Method.COMBINATION, Optional.of(member), false);
        }
    }

    /** One method's forecasts 1 … h ahead with their intervals and sample paths. */
    public record Forecast(Model model, double[] mean, double[] lo80, double[] hi80, double[] lo95, double[] hi95,
                           double[][] paths) {

        public Forecast {
            mean = mean.clone();
            lo80 = lo80.clone();
            hi80 = hi80.clone();
            lo95 = lo95.clone();
            hi95 = hi95.clone();
            paths = Matrices.copy(paths);
        }

        public Method method() {
            return model.method();
        }

        @Override
        public double[] mean() {
            return mean.clone();
        }

        @Override
        public double[] lo80() {
            return lo80.clone();
        }

        @Override
        public double[] hi80() {
            return hi80.clone();
        }

        @Override
        public double[] lo95() {
            return lo95.clone();
        }

        @Override
        public double[] hi95() {
            return hi95.clone();
        }

        @Override
        public double[][] paths() {
            return Matrices.copy(paths);
        }

        /** The mean and central 80 % interval of the sum of the forecasts at steps {@code from} … {@code to} − 1. */
        public double[] sumOver(int from, int to) {
            double total = 0;
            for (int i = from; i < to; i++) {
                total += mean[i];
            }
            double[] sums = new double[paths.length];
            for (int p = 0; p < paths.length; p++) {
                for (int i = from; i < to; i++) {
                    sums[p] += paths[p][i];
                }
            }
            double[] q = Intervals.quantiles(sums, 0.10, 0.90);
            return new double[] {total, q[0], q[1]};
        }
    }

    /**
     * A candidate's back-test record.
     *
     * @param ets                        the ETS model the back-test kept (for ETS and the
     *                                   combination; chosen by AICc at the first origin), empty otherwise
     * @param medianAbsolutePercentError the median of 100 |y − f| / |y| over all its back-test forecasts
     * @param errors                     its back-test errors by horizon, for the empirical widening of
     *                                   the intervals ({@link Widening})
     */
    public record Score(Method method, Optional<EtsModel> ets, double mase, double smape,
                        double medianAbsolutePercentError, int forecasts, HorizonErrors errors) {
    }

    /**
     * How the chosen method was chosen.
     *
     * @param basis    the back-test, or AICc among ETS models when there was none
     * @param origins  back-test origins (0 without a back-test)
     * @param best     the back-test's best score (empty without a back-test)
     * @param nextBest the runner-up's score (empty without a back-test, or with one method scored)
     */
    public record Choice(Basis basis, int origins, Optional<Score> best, Optional<Score> nextBest) {

        /** What decided. */
        public enum Basis {
            /** The lowest MASE in the rolling-origin back-test. */
            BACKTEST,
            /**
             * The lowest AICc among ETS models: the values fitted are too few for a back-test, or their
             * values before the first origin give no seasonal naive error to scale by.
             */
            AICC_WITHOUT_BACKTEST
        }
    }

    /**
     * @param backtest every candidate's score, best first (empty when the series is too short)
     * @param origins  back-test origins used; {@code cycle} the longest horizon scored
     * @param widening per step, the factor by which the chosen model's intervals were widened to the
     *                 back-test's errors ({@link Widening}; 1 where they were wide enough, all 1
     *                 without a back-test)
     */
    public record Result(Forecast chosen, List<Score> backtest, int origins, int cycle, double[] widening) {

        public Result {
            backtest = List.copyOf(backtest);
            widening = widening.clone();
        }

        @Override
        public double[] widening() {
            return widening.clone();
        }

        /** Whether any step's intervals were widened to the back-test's errors. */
        public boolean widened() {
            for (double w : widening) {
                if (w > 1) {
                    return true;
                }
            }
            return false;
        }

        /** The account of the choice, from the back-test's scores. */
        public Choice choice() {
            if (backtest.isEmpty()) {
                return new Choice(Choice.Basis.AICC_WITHOUT_BACKTEST, 0, Optional.empty(), Optional.empty());
            }
            return new Choice(Choice.Basis.BACKTEST, origins, Optional.of(backtest.get(0)),
                    backtest.size() > 1 ? Optional.of(backtest.get(1)) : Optional.empty());
        }
    }

    private Outlook() {
    }

    /**
     * @param y      the values to forecast from, without gaps
     * @param period the seasonal period (1 for none)
     * @return empty when there are fewer than {@value #MIN_VALUES} values, the horizon is not
     *         positive, or no method can be fitted
     */
    public static Optional<Result> of(double[] y, int period, int horizon, Bounds bounds) {
        if (y.length < MIN_VALUES || horizon < 1) {
            return Optional.empty();
        }
        int cycle = Math.max(1, period);
        int origins = Backtest.origins(y.length, period);
        List<Score> scores = Backtest.isLongEnough(origins, period)
                ? Backtest.scores(y, period, y.length - origins, cycle).orElse(List.of())
                : List.of();
        Method method = scores.isEmpty() ? Method.ETS : scores.get(0).method();
        Optional<Forecast> chosen = CandidateForecasts.forecast(method, y, period, horizon, bounds);
        if (chosen.isEmpty() && method != Method.ETS && method != Method.SEASONAL_NAIVE) {
            chosen = CandidateForecasts.forecast(Method.SEASONAL_NAIVE, y, period, horizon, bounds);
        }
        if (chosen.isEmpty()) {
            return Optional.empty();
        }
        Forecast forecast = chosen.get();
        double[] widening = new double[horizon];
        Arrays.fill(widening, 1);
        Method chosenMethod = forecast.method();
        Optional<Score> own = scores.stream().filter(s -> s.method() == chosenMethod).findFirst();
        if (own.isPresent()) {
            boolean positive = bounds.lower() >= 0 && Arrays.stream(y).allMatch(v -> v > 0);
            Widening.Widened w = Widening.apply(forecast, own.get().errors(), positive, bounds);
            forecast = w.forecast();
            widening = w.factors();
        }
        return Optional.of(new Result(forecast, scores, scores.isEmpty() ? 0 : origins, cycle, widening));
    }

    /**
     * Whether {@code n} values of a series with this seasonal period are enough for the back-test
     * (its origins and the training span before them), whatever their values.
     */
    public static boolean backtestPossible(int n, int period) {
        return n >= MIN_VALUES && Backtest.isLongEnough(Backtest.origins(n, period), period);
    }
}
