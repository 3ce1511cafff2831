package org.annalist.analysis.forecast;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * The outlook. Its default forecast is the equal-weight combination of three automatic methods —
 * the best ETS model by AICc ({@link EtsSelection}), the automatic ARIMA model ({@link AutoArima})
 * and Theta ({@link Theta}) — because averages of forecasts from different methods have been more
 * accurate, on average and with less risk of a large miss, than any single method chosen in advance
 * in the forecasting competitions [1, 2]. The combination, the single methods and the seasonal naive
 * forecast are compared in a rolling-origin back-test [3] ({@link Backtest}) over the last two
 * seasonal cycles (eight periods for non-seasonal data), scored by MASE [4] and sMAPE; a single
 * method replaces the combination only when it was clearly and steadily better there, over at
 * least {@value #MIN_CHOICE_FORECASTS} forecasts: its mean
 * absolute error at least {@value #METHOD_ADVANTAGE_PCT} % lower than the combination's over all
 * origins and lower in the earlier and the later half of them apart (our rule: picking the lowest
 * score of a short, noisy back-test is itself a source of error — on the M3 data every smaller
 * margin tried, 10 %, 25 % and 40 %, lost accuracy against the combination alone — so a single
 * method must halve the error, steadily, which guards against a member that fails outright).
 *
 * <p>History: after a structural break the forecasts are fitted on all values unless fitting on the
 * latest regime alone did clearly better (its error at least {@value #REGIME_ADVANTAGE_PCT} % lower)
 * in a back-test over the same origins —
 * a break changes the level or the slope, not the need for the seasonal pattern that the longer
 * history shows, and a fall-and-return episode leaves the old level and season in place. ETS and
 * ARIMA re-anchor their level on the latest values by themselves.
 *
 * <p>A series with at least {@value #MIN_VALUES} values but too short for the back-test gets the
 * combination; a shorter one, down to {@value #SHORT_MIN_VALUES} values, gets the naive forecast
 * with drift [5, §5.2] (the seasonal naive forecast when a season can be repeated), whose intervals
 * use Student's t for the few values its spread is estimated from, and the result says so.
 *
 * <p>Intervals at 80 and 95 % ({@link Intervals}): the normal approximation to a single model's
 * closed-form forecast variance where it has one, else quantiles of {@value #PATHS} simulated paths
 * with a fixed seed ({@link Shocks}); the combination's paths are its members' paths averaged under
 * common shocks, so that its intervals keep the members' correlation. Where the intervals are
 * narrower than the errors the chosen method made in the back-test — the combination's errors when a
 * single method was chosen over it ({@link Widening#yardstick}) — they and the paths are widened
 * to those errors by one factor over all steps; intervals wider than a hundred or more such errors
 * support are narrowed to them by that factor ({@link Widening}). Sums over several periods come from the paths
 * ({@link YearSums}). Everything is clipped to the measure's bounds: counts are never forecast below
 * zero.
 *
 * <p>The result is evidence, not wording: the method, the models it fitted, the span it used and
 * the account of both choices are typed values; the findings type them as statements and the
 * narrative words them.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Makridakis, S. &amp; Hibon, M. (2000). The M3-Competition: results, conclusions and
 * implications. <i>International Journal of Forecasting</i> 16(4), 451–476.
 * DOI 10.1016/S0169-2070(00)00057-1.</li>
 * <li>Makridakis, S., Spiliotis, E. &amp; Assimakopoulos, V. (2020). The M4 Competition: 100,000 time
 * series and 61 forecasting methods. <i>International Journal of Forecasting</i> 36(1), 54–74.
 * DOI 10.1016/j.ijforecast.2019.04.014.</li>
 * <li>Tashman, L. J. (2000). Out-of-sample tests of forecasting accuracy: an analysis and review.
 * <i>International Journal of Forecasting</i> 16(4), 437–450. DOI 10.1016/S0169-2070(00)00065-0.</li>
 * <li>Hyndman, R. J. &amp; Koehler, A. B. (2006). Another look at measures of forecast accuracy.
 * <i>International Journal of Forecasting</i> 22(4), 679–688. DOI 10.1016/j.ijforecast.2006.03.001.</li>
 * <li>Hyndman, R. J. &amp; Athanasopoulos, G. (2021). <i>Forecasting: Principles and Practice</i>,
 * 3rd ed. OTexts, Melbourne (an online textbook; no DOI).</li>
 * </ol>
 */
public final class Outlook {

    /** Simulated paths per forecast: enough for stable 2.5 % and 97.5 % quantiles. */
    public static final int PATHS = Shocks.PATHS;
    /** The fewest values the combination is fitted to, and the shortest training span of the back-test. */
    static final int MIN_VALUES = 8;
    /** The fewest values any forecast is made from: the naive forecast with drift needs two differences. */
    public static final int SHORT_MIN_VALUES = 3;
    /** By how much, in %, a single method's back-test error must be below the combination's to replace it (our rule). */
    public static final int METHOD_ADVANTAGE_PCT = 50;
    /**
     * The fewest back-test forecasts (up to a cycle ahead, over all origins) on which a single method
     * may replace the combination (our rule): yearly data give eight one-step forecasts, too few — on
     * the M3 yearly series the choice made on them raised the mean MASE from 2.665 (the combination
     * always) to 2.716; quarterly data give 26 and monthly data some 200.
     */
    public static final int MIN_CHOICE_FORECASTS = 20;
    /** The back-test errors from which the intervals may be narrowed to them, the 95 % with the 80 % ({@link Widening#NARROWING_PAIRS}). */
    public static final int NARROWING_ERRORS = Widening.NARROWING_PAIRS;
    /** The fewest back-test errors from which the intervals are widened to them ({@link Widening#POOLED_PAIRS}). */
    public static final int WIDENING_ERRORS = Widening.POOLED_PAIRS;
    /** The slowest and fastest growth exponents of the back-test's errors beyond the horizons tested ({@link Widening}). */
    public static final double SLOWEST_FAR_GROWTH = Widening.SLOWEST_FAR_GROWTH;
    public static final double FASTEST_FAR_GROWTH = Widening.FASTEST_FAR_GROWTH;
    /** By how much, in %, the latest regime's back-test error must be below all values' to replace them (our rule). */
    public static final int REGIME_ADVANTAGE_PCT = 25;

    /** The methods: the combination first, the order that breaks ties. */
    public enum Method { COMBINATION, ETS, ARIMA, THETA, SEASONAL_NAIVE, NAIVE_WITH_DRIFT }

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
     * @param label              the fitted model in its usual notation — {@code ETS(M,A,M)},
     *                           {@code ARIMA(0,1,1)(0,1,1)[12]} — for ETS and ARIMA; empty otherwise
     * @param seasonallyAdjusted whether Theta worked on seasonally adjusted values (false for the others)
     * @param members            the combination's members, each with its own model (empty for a single method)
     * @param trended            whether the model has a term that carries growth forward: an ETS trend
     *                           (damped or not), an ARIMA drift or two differences (Box &amp; Jenkins: the
     *                           forecasts of d + D = 2 follow the latest slope), Theta's drift, the naive
     *                           rule's drift; for a combination, any member's. Without one (ETS(·,N,·), an
     *                           ARIMA with one difference and no drift or none and a mean, the seasonal naive
     *                           rule) the forecasts hold the latest level with its season
     */
    public record Model(Method method, Optional<String> label, boolean seasonallyAdjusted, List<Model> members,
                        boolean trended) {

        public Model {
            members = List.copyOf(members);
            boolean labelled = method == Method.ETS || method == Method.ARIMA;
            if (label.isPresent() != labelled || seasonallyAdjusted && method != Method.THETA
                    || members.isEmpty() == (method == Method.COMBINATION)) {
                throw new IllegalArgumentException("a model description must fit its method " + method + ", got "
                        + label + ", seasonally adjusted " + seasonallyAdjusted + ", members " + members);
            }
        }

        static Model single(Method method, Optional<String> label, boolean seasonallyAdjusted, boolean trended) {
            return new Model(method, label, seasonallyAdjusted, List.of(), trended);
        }

        static Model combination(List<Model> members) {
            return new Model(Method.COMBINATION, Optional.empty(), false, members, members.stream().anyMatch(Model::trended));
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
     * A method's back-test record.
     *
     * @param mae                        its mean absolute error, in the series' units
     * @param maseEarlier                its MASE over the earlier half of the origins
     * @param maseLater                  … and over the later half
     * @param medianAbsolutePercentError the median of 100 |y − f| / |y| over all its back-test forecasts
     * @param errors                     its back-test errors by horizon, for the empirical widening of
     *                                   the intervals ({@link Widening})
     */
    public record Score(Method method, double mase, double smape, double mae, double maseEarlier, double maseLater,
                        double medianAbsolutePercentError, int forecasts, HorizonErrors errors) {
    }

    /**
     * How the method was chosen.
     *
     * @param origins     back-test origins (0 without a back-test)
     * @param combination the combination's back-test score (empty without a back-test)
     * @param bestSingle  the best single method's score (empty without a back-test)
     */
    public record Choice(Basis basis, int origins, Optional<Score> combination, Optional<Score> bestSingle) {

        /** What decided. */
        public enum Basis {
            /** The back-test did not show a single method clearly and steadily better: the combination. */
            COMBINATION_NOT_BEATEN,
            /** A single method was clearly and steadily better in the back-test. */
            SINGLE_CLEARLY_BETTER,
            /** The back-test scored fewer than {@value Outlook#MIN_CHOICE_FORECASTS} forecasts: the combination. */
            COMBINATION_TOO_FEW_TESTED,
            /** Too few values, or no error to scale by, for a back-test: the combination by default. */
            COMBINATION_WITHOUT_BACKTEST,
            /** Too few values for the usual methods: the naive forecast with drift, or the seasonal naive one. */
            SHORT_SERIES
        }
    }

    /**
     * Which values the forecasts were fitted on, after a structural break.
     *
     * @param from       the first value used (0: all)
     * @param allMae     the back-test's mean absolute error fitted on all values (NaN when not compared)
     * @param regimeMae  … and on the latest regime alone (NaN likewise)
     */
    public record Span(int from, Basis basis, double allMae, double regimeMae) {

        public static final Span ALL = new Span(0, Basis.NO_BREAK, Double.NaN, Double.NaN);

        /** What decided. */
        public enum Basis {
            /** No break was given. */
            NO_BREAK,
            /** Fitted on the latest regime alone, it did no clearly better in the back-test: all values. */
            ALL_VALUES_NOT_BEATEN,
            /** Fitted on the latest regime alone, it did clearly better in the back-test: that regime. */
            REGIME_CLEARLY_BETTER,
            /** The latest regime is too short for a back-test of its own: all values. */
            REGIME_TOO_SHORT
        }
    }

    /**
     * @param backtest every method's score, the combination first (empty without a back-test)
     * @param origins  back-test origins used; {@code cycle} the longest horizon scored
     * @param widening per step, the factor by which the chosen forecast's 80 % interval was widened
     *                 (above 1) or narrowed (below 1) to the back-test's errors ({@link Widening}; 1
     *                 where it matched them, all 1 without a back-test)
     * @param widened95 whether any step's 95 % interval was widened to the back-test's errors, with
     *                 the 80 % interval or on its own (beyond the horizons tested, or by the pooled check)
     */
    public record Result(Forecast chosen, Choice choice, Span span, List<Score> backtest, int origins, int cycle,
                         double[] widening, boolean widened95) {

        public Result {
            backtest = List.copyOf(backtest);
            widening = widening.clone();
        }

        /** A result whose 95 % intervals were widened only where its 80 % intervals were. */
        public Result(Forecast chosen, Choice choice, Span span, List<Score> backtest, int origins, int cycle,
                      double[] widening) {
            this(chosen, choice, span, backtest, origins, cycle, widening, Arrays.stream(widening).anyMatch(w -> w > 1));
        }

        @Override
        public double[] widening() {
            return widening.clone();
        }

        /** Whether any step's intervals (80 % or 95 %) were widened to the back-test's errors. */
        public boolean widened() {
            return widened95 || Arrays.stream(widening).anyMatch(w -> w > 1);
        }

        /** Whether any step's 80 % interval was narrowed to the back-test's errors. */
        public boolean narrowed() {
            for (double w : widening) {
                if (w < 1) {
                    return true;
                }
            }
            return false;
        }

        /** The chosen method's back-test score, when there was a back-test. */
        public Optional<Score> chosenScore() {
            return backtest.stream().filter(s -> s.method() == chosen.method()).findFirst();
        }
    }

    private Outlook() {
    }

    /** {@link #of(double[], int, int, Bounds, int)} without a break. */
    public static Optional<Result> of(double[] y, int period, int horizon, Bounds bounds) {
        return of(y, period, horizon, bounds, 0);
    }

    /**
     * @param y           the values to forecast from, without gaps
     * @param period      the seasonal period (1 for none)
     * @param regimeStart the first value of the latest regime after a structural break (0 for none)
     * @return empty when there are fewer than {@value #SHORT_MIN_VALUES} values, the horizon is not
     *         positive, or no method can be fitted
     */
    public static Optional<Result> of(double[] y, int period, int horizon, Bounds bounds, int regimeStart) {
        if (y.length < SHORT_MIN_VALUES || horizon < 1) {
            return Optional.empty();
        }
        int cycle = Math.max(1, period);
        if (y.length < MIN_VALUES) {
            return ShortSeries.forecast(y, period, horizon, bounds).map(f -> new Result(f,
                    new Choice(Choice.Basis.SHORT_SERIES, 0, Optional.empty(), Optional.empty()), Span.ALL, List.of(),
                    0, cycle, ones(horizon)));
        }
        int origins = Backtest.origins(y.length, period);
        int reach = Math.max(cycle, Math.min(horizon, origins));
        CandidateForecasts.Searched onAll = CandidateForecasts.Searched.on(y, period);
        Optional<Backtest.Run> all = Backtest.isLongEnough(origins, period)
                ? Backtest.run(y, onAll, y.length - origins, cycle, reach) : Optional.empty();
        Span span = Span.ALL;
        Optional<Backtest.Run> run = all;
        CandidateForecasts.Searched fitted = onAll;
        if (regimeStart > 0 && regimeStart < y.length) {
            double[] regime = Arrays.copyOfRange(y, regimeStart, y.length);
            // the regime is back-tested with the forms found on all values, so the two spans differ in their values only
            Optional<Backtest.Run> own = all.isPresent() && regime.length >= shortestOwnRegime(y.length, period)
                    ? Backtest.run(regime, onAll, regime.length - origins, cycle, reach) : Optional.empty();
            span = own.map(o -> weigh(regimeStart, all.get(), o))
                    .orElse(new Span(0, Span.Basis.REGIME_TOO_SHORT, Double.NaN, Double.NaN));
            if (span.basis() == Span.Basis.REGIME_CLEARLY_BETTER) {
                run = own;
                fitted = CandidateForecasts.Searched.on(regime, period);
            }
        }
        Choice choice = run.map(Outlook::choose).orElse(new Choice(Choice.Basis.COMBINATION_WITHOUT_BACKTEST, 0,
                Optional.empty(), Optional.empty()));
        Method method = choice.basis() == Choice.Basis.SINGLE_CLEARLY_BETTER ? choice.bestSingle().orElseThrow().method()
                : Method.COMBINATION;
        List<Method> members = run.map(Backtest.Run::combined).orElse(Backtest.combinable(period));
        Optional<Forecast> forecast = CandidateForecasts.forecast(method, fitted, horizon, bounds, members);
        if (forecast.isEmpty() && method != Method.COMBINATION) {
            forecast = CandidateForecasts.forecast(Method.COMBINATION, fitted, horizon, bounds, members);
        }
        if (forecast.isEmpty()) {
            forecast = CandidateForecasts.forecast(Method.SEASONAL_NAIVE, fitted, horizon, bounds, members);
        }
        if (forecast.isEmpty()) {
            return Optional.empty();
        }
        Forecast f = forecast.get();
        Method chosen = f.method();
        List<Score> scores = run.map(Backtest.Run::scores).orElse(List.of());
        double[] widening = ones(horizon);
        boolean widened95 = false;
        Method judgedBy = Widening.yardstick(choice, chosen);
        Optional<Score> yardstick = scores.stream().filter(s -> s.method() == judgedBy).findFirst();
        if (yardstick.isPresent()) {
            boolean positive = bounds.lower() >= 0 && Arrays.stream(fitted.y()).allMatch(v -> v > 0);
            Widening.Widened w = Widening.apply(f, yardstick.get().errors(), positive, bounds);
            f = w.forecast();
            widening = w.factors();
            widened95 = w.widened95();
        }
        return Optional.of(new Result(f, choice, span, scores, scores.isEmpty() ? 0 : origins, cycle, widening,
                widened95));
    }

    /**
     * The fewest values since the latest break for the outlook to weigh fitting on them alone: the
     * shortest training span, then as many back-test origins as a back-test on all {@code n} values
     * has, so that both back-tests forecast the same periods (for monthly data 24 + 24 = 48).
     */
    public static int shortestOwnRegime(int n, int period) {
        return Math.max(MIN_VALUES, 2 * period) + Backtest.origins(n, period);
    }

    /** The combination, unless a single method was clearly and steadily better in the back-test. */
    static Choice choose(Backtest.Run run) {
        Score combination = run.score(Method.COMBINATION);
        Score best = run.scores().stream().filter(s -> s.method() != Method.COMBINATION).findFirst().orElseThrow();
        boolean clearly = clearlyBelow(best.mae(), combination.mae(), METHOD_ADVANTAGE_PCT) && best.maseEarlier() < combination.maseEarlier()
                && best.maseLater() < combination.maseLater();
        Choice.Basis basis = combination.forecasts() < MIN_CHOICE_FORECASTS ? Choice.Basis.COMBINATION_TOO_FEW_TESTED
                : clearly ? Choice.Basis.SINGLE_CLEARLY_BETTER : Choice.Basis.COMBINATION_NOT_BEATEN;
        return new Choice(basis, run.origins(), Optional.of(combination), Optional.of(best));
    }

    /**
     * All values against the latest regime alone, by the errors of the methods each back-test would
     * choose over the same origins: the regime only when clearly better.
     */
    static Span weigh(int regimeStart, Backtest.Run all, Backtest.Run regime) {
        double allMae = chosenScore(all).mae();
        double regimeMae = chosenScore(regime).mae();
        boolean better = clearlyBelow(regimeMae, allMae, REGIME_ADVANTAGE_PCT);
        return new Span(better ? regimeStart : 0, better ? Span.Basis.REGIME_CLEARLY_BETTER
                : Span.Basis.ALL_VALUES_NOT_BEATEN, allMae, regimeMae);
    }

    /** The score of the method a back-test would choose. */
    private static Score chosenScore(Backtest.Run run) {
        Choice c = choose(run);
        return c.basis() == Choice.Basis.SINGLE_CLEARLY_BETTER ? c.bestSingle().orElseThrow() : c.combination().orElseThrow();
    }

    /** Whether {@code error} is at least {@code marginPct} % below {@code against}. */
    private static boolean clearlyBelow(double error, double against, int marginPct) {
        return error <= (1 - marginPct / 100.0) * against;
    }

    private static double[] ones(int h) {
        double[] v = new double[h];
        Arrays.fill(v, 1);
        return v;
    }

    /**
     * Whether {@code n} values of a series with this seasonal period are enough for the back-test
     * (its origins and the training span before them), whatever their values.
     */
    public static boolean backtestPossible(int n, int period) {
        return n >= MIN_VALUES && Backtest.isLongEnough(Backtest.origins(n, period), period);
    }
}
