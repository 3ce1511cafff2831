package org.annalist.analysis.forecast;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.annalist.analysis.OrderStatistics;
import org.annalist.analysis.SeededNormals;

/**
 * The outlook: four candidate methods — the best ETS model by AICc ({@link EtsSelection}), Theta,
 * the seasonal naive forecast and their equal-weight combination — compared in a rolling-origin
 * back-test (Tashman 2000, <i>International Journal of Forecasting</i> 16, 437–450): from every
 * origin in the last two seasonal cycles (eight periods for non-seasonal data) each candidate
 * forecasts up to one cycle ahead from the data before the origin, and is scored by MASE (scaled by
 * the in-sample seasonal naive error before the first origin, Hyndman &amp; Koehler 2006) and sMAPE.
 *
 * <p>Choice rule: the lowest back-test MASE wins; ties go to the first of ETS, Theta, combination,
 * seasonal naive. Within ETS the model is chosen by AICc at the first origin, and its parameters are
 * kept for the later origins (updating, not re-estimating: Tashman 2000, §2.2), which keeps the
 * back-test to one model search. A shorter series is back-tested over fewer origins, as many as
 * leave two cycles (and at least eight values) before the first, down to one cycle (four origins
 * without a season); shorter still, ETS is chosen by AICc, and the result says so.
 *
 * <p>The chosen method is then refitted on all values. Intervals at 80 and 95 % are the normal
 * approximation to the closed-form forecast variance where the model has one (ETS classes 1 and 3,
 * Theta, seasonal naive), else quantiles of {@value #PATHS} simulated paths with a fixed seed; the
 * combination's paths are the members' paths averaged under common shocks (every member's path
 * driven by the same standard normal draws), so its intervals keep the members' correlation
 * instead of the false comfort of averaging independent errors. Sums over several periods (the
 * next year's total) come from the paths. Everything is clipped to the measure's bounds.
 */
public final class Outlook {

    public static final int PATHS = 2000;
    private static final long SEED = 20_261_202L;
    private static final int NON_SEASONAL_BACKTEST = 8;
    private static final int MIN_VALUES = 8;

    public enum Method {
        ETS("ETS"), THETA("Theta"), COMBINATION("combination"), SEASONAL_NAIVE("seasonal naive");

        private final String label;

        Method(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }

        /** As {@link #label()}; the seasonal naive forecast of non-seasonal data is the plain naive one. */
        public String label(int period) {
            return this == SEASONAL_NAIVE && period <= 1 ? "naive" : label;
        }
    }

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
     * One method's forecasts 1 … h ahead with their intervals and sample paths.
     *
     * @param model e.g. {@code ETS(M,A,M)}; for the combination its members
     */
    public record Forecast(Method method, String model, double[] mean, double[] lo80, double[] hi80, double[] lo95,
                           double[] hi95, double[][] paths) {

        /** The mean and central 80 % interval of the sum of the forecasts at steps {@code from} … {@code to} − 1. */
        public double[] sumOver(int from, int to) {
            double mean = 0;
            for (int i = from; i < to; i++) {
                mean += this.mean[i];
            }
            double[] sums = new double[paths.length];
            for (int p = 0; p < paths.length; p++) {
                for (int i = from; i < to; i++) {
                    sums[p] += paths[p][i];
                }
            }
            double[] q = quantiles(sums, 0.10, 0.90);
            return new double[] {mean, q[0], q[1]};
        }
    }

    /**
     * A candidate's back-test record.
     *
     * @param medianAbsolutePercentError the median of 100 |y − f| / |y| over all its back-test forecasts
     */
    public record Score(Method method, String model, double mase, double smape, double medianAbsolutePercentError,
                        int forecasts) {
    }

    /**
     * @param backtest      every candidate's score, best first (empty when the series is too short)
     * @param chosenBecause the choice rule as it applied, in words
     * @param origins       back-test origins used; {@code cycle} the longest horizon scored
     */
    public record Result(Forecast chosen, List<Score> backtest, String chosenBecause, int origins, int cycle) {
    }

    private Outlook() {
    }

    /**
     * @param y      the values to forecast from, without gaps
     * @param period the seasonal period (1 for none)
     * @return empty when there are fewer than {@value #MIN_VALUES} values
     */
    public static Optional<Result> of(double[] y, int period, int horizon, Bounds bounds) {
        if (y.length < MIN_VALUES || horizon < 1) {
            return Optional.empty();
        }
        int cycle = Math.max(1, period);
        int minimumTraining = Math.max(MIN_VALUES, 2 * period);
        int origins = Math.min(period > 1 ? 2 * period : NON_SEASONAL_BACKTEST, y.length - minimumTraining);
        int firstOrigin = y.length - origins;
        List<Score> scores = List.of();
        if (origins >= (period > 1 ? period : NON_SEASONAL_BACKTEST / 2)) {
            try {
                scores = backtest(y, period, firstOrigin, cycle);
            } catch (IllegalArgumentException constantBeforeFirstOrigin) {
                // no seasonal naive error to scale by: the back-test cannot rank the methods
            }
        }
        Method method = scores.isEmpty() ? Method.ETS : scores.get(0).method();
        Forecast chosen = forecast(method, y, period, horizon, bounds);
        if (chosen == null && method != Method.ETS) {
            method = Method.SEASONAL_NAIVE;
            chosen = forecast(method, y, period, horizon, bounds);
        }
        if (chosen == null) {
            return Optional.empty();
        }
        return Optional.of(new Result(chosen, scores, because(scores, Math.max(origins, 0), period),
                scores.isEmpty() ? 0 : origins, cycle));
    }

    private static String because(List<Score> scores, int origins, int period) {
        if (scores.isEmpty()) {
            return "chosen by AICc among ETS models; the series is too short for a back-test";
        }
        Score best = scores.get(0);
        String next = scores.size() > 1
                ? String.format(Locale.ROOT, "; next best %s %.2f", scores.get(1).method().label(period), scores.get(1).mase()) : "";
        return String.format(Locale.ROOT,
                "lowest mean absolute scaled error in a rolling-origin back-test over the last %d periods (%.2f%s)",
                origins, best.mase(), next);
    }

    private static List<Score> backtest(double[] y, int period, int firstOrigin, int cycle) {
        double[] training = Arrays.copyOf(y, firstOrigin);
        Optional<EtsSelection.Choice> ets = EtsSelection.select(training, period);
        int pairs = 0;
        for (int o = firstOrigin; o < y.length; o++) {
            pairs += Math.min(cycle, y.length - o);
        }
        double[] actual = new double[pairs];
        double[][] forecasts = new double[Method.values().length][pairs];
        boolean[] available = new boolean[Method.values().length];
        Arrays.fill(available, true);
        available[Method.ETS.ordinal()] = ets.isPresent();
        int at = 0;
        for (int o = firstOrigin; o < y.length; o++) {
            int h = Math.min(cycle, y.length - o);
            double[] before = Arrays.copyOf(y, o);
            double[] etsForecast = null;
            if (ets.isPresent()) {
                EtsModel.Fit best = ets.get().best();
                EtsModel.Fit updated = best.model().filter(before, best.parameters());
                available[Method.ETS.ordinal()] &= updated != null;
                etsForecast = updated == null ? null : updated.forecast(h);
            }
            Theta.Fit theta = Theta.fit(before, period);
            available[Method.THETA.ordinal()] &= theta != null;
            double[] thetaForecast = theta == null ? null : theta.forecast(h);
            double[] naive = SeasonalNaive.forecast(before, cycle, h);
            for (int k = 0; k < h; k++) {
                actual[at + k] = y[o + k];
                forecasts[Method.SEASONAL_NAIVE.ordinal()][at + k] = naive[k];
                if (etsForecast != null) {
                    forecasts[Method.ETS.ordinal()][at + k] = etsForecast[k];
                }
                if (thetaForecast != null) {
                    forecasts[Method.THETA.ordinal()][at + k] = thetaForecast[k];
                }
            }
            at += h;
        }
        available[Method.COMBINATION.ordinal()] = available[Method.ETS.ordinal()] && available[Method.THETA.ordinal()];
        for (int i = 0; i < pairs; i++) {
            forecasts[Method.COMBINATION.ordinal()][i] = (forecasts[Method.ETS.ordinal()][i]
                    + forecasts[Method.THETA.ordinal()][i] + forecasts[Method.SEASONAL_NAIVE.ordinal()][i]) / 3;
        }
        List<Score> scores = new ArrayList<>();
        String etsModel = ets.map(c -> c.best().model().label()).orElse("");
        for (Method method : Method.values()) {
            if (!available[method.ordinal()]) {
                continue;
            }
            double[] f = forecasts[method.ordinal()];
            Accuracy.Result accuracy = Accuracy.of(training, actual, f, cycle);
            double[] ape = new double[pairs];
            int counted = 0;
            for (int i = 0; i < pairs; i++) {
                if (actual[i] != 0) {
                    ape[counted++] = 100 * Math.abs(actual[i] - f[i]) / Math.abs(actual[i]);
                }
            }
            double medianApe = counted == 0 ? Double.NaN : OrderStatistics.median(Arrays.copyOf(ape, counted));
            String model = switch (method) {
                case ETS -> etsModel;
                case COMBINATION -> "mean of " + etsModel + ", Theta and " + Method.SEASONAL_NAIVE.label(period);
                default -> method.label(period);
            };
            scores.add(new Score(method, model, accuracy.mase(), accuracy.smape(), medianApe, pairs));
        }
        // stable sort: equal MASE keeps the enum order, the tie rule
        scores.sort(Comparator.comparingDouble(Score::mase));
        return List.copyOf(scores);
    }

    /** @return null when the method cannot be fitted to {@code y} */
    static Forecast forecast(Method method, double[] y, int period, int horizon, Bounds bounds) {
        double[][] shocks = shocks(horizon);
        int cycle = Math.max(1, period);
        return switch (method) {
            case ETS -> EtsSelection.select(y, period).map(c -> ets(c.best(), horizon, shocks, bounds)).orElse(null);
            case THETA -> {
                Theta.Fit theta = Theta.fit(y, period);
                yield theta == null ? null : fromPrediction(Method.THETA, theta.deseasonalised()
                        ? "Theta, seasonally adjusted" : "Theta", theta.predict(horizon), theta.paths(shocks), bounds);
            }
            case SEASONAL_NAIVE -> y.length <= cycle ? null : fromPrediction(Method.SEASONAL_NAIVE,
                    Method.SEASONAL_NAIVE.label(period), SeasonalNaive.predict(y, cycle, horizon),
                    SeasonalNaive.paths(y, cycle, shocks), bounds);
            case COMBINATION -> combination(y, period, horizon, shocks, bounds);
        };
    }

    private static Forecast ets(EtsModel.Fit fit, int horizon, double[][] shocks, Outlook.Bounds bounds) {
        double[][] paths = fit.paths(shocks);
        if (fit.hasAnalyticIntervals()) {
            return fromPrediction(Method.ETS, fit.model().label(), fit.predict(horizon), paths, bounds);
        }
        return fromPaths(Method.ETS, fit.model().label(), fit.forecast(horizon), paths, bounds);
    }

    private static Forecast combination(double[] y, int period, int horizon, double[][] shocks, Bounds bounds) {
        Optional<EtsSelection.Choice> ets = EtsSelection.select(y, period);
        Theta.Fit theta = Theta.fit(y, period);
        int cycle = Math.max(1, period);
        if (ets.isEmpty() || theta == null || y.length <= cycle) {
            return null;
        }
        EtsModel.Fit best = ets.get().best();
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
        return fromPaths(Method.COMBINATION, "mean of " + best.model().label() + ", Theta and "
                + Method.SEASONAL_NAIVE.label(period), mean,
                paths, bounds);
    }

    private static Forecast fromPrediction(Method method, String model, EtsModel.Prediction prediction,
                                           double[][] paths, Bounds bounds) {
        double[][] eighty = prediction.interval(0.80);
        double[][] ninetyFive = prediction.interval(0.95);
        return clipped(new Forecast(method, model, prediction.mean(), eighty[0], eighty[1], ninetyFive[0],
                ninetyFive[1], paths), bounds);
    }

    private static Forecast fromPaths(Method method, String model, double[] mean, double[][] paths, Bounds bounds) {
        int h = mean.length;
        double[] lo80 = new double[h];
        double[] hi80 = new double[h];
        double[] lo95 = new double[h];
        double[] hi95 = new double[h];
        double[] column = new double[paths.length];
        for (int k = 0; k < h; k++) {
            for (int p = 0; p < paths.length; p++) {
                column[p] = paths[p][k];
            }
            double[] q = quantiles(column, 0.025, 0.10, 0.90, 0.975);
            lo95[k] = q[0];
            lo80[k] = q[1];
            hi80[k] = q[2];
            hi95[k] = q[3];
        }
        return clipped(new Forecast(method, model, mean, lo80, hi80, lo95, hi95, paths), bounds);
    }

    private static Forecast clipped(Forecast f, Bounds bounds) {
        double[][] paths = new double[f.paths().length][];
        for (int p = 0; p < paths.length; p++) {
            paths[p] = clip(f.paths()[p], bounds);
        }
        return new Forecast(f.method(), f.model(), clip(f.mean(), bounds), clip(f.lo80(), bounds),
                clip(f.hi80(), bounds), clip(f.lo95(), bounds), clip(f.hi95(), bounds), paths);
    }

    private static double[] clip(double[] v, Bounds bounds) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = bounds.clip(v[i]);
        }
        return out;
    }

    /** Standard normal draws, {@value #PATHS} paths × h steps, the same for the same h. */
    private static double[][] shocks(int h) {
        return standardNormals(PATHS, h, SEED);
    }

    static double[][] standardNormals(int paths, int h, long seed) {
        SeededNormals random = new SeededNormals(seed);
        double[][] z = new double[paths][h];
        for (double[] row : z) {
            for (int k = 0; k < h; k++) {
                row[k] = random.next();
            }
        }
        return z;
    }

    /** Sample quantiles by linear interpolation between order statistics (Hyndman &amp; Fan 1996, type 7). */
    static double[] quantiles(double[] x, double... probabilities) {
        double[] sorted = x.clone();
        Arrays.sort(sorted);
        double[] q = new double[probabilities.length];
        for (int i = 0; i < probabilities.length; i++) {
            double position = probabilities[i] * (sorted.length - 1);
            int below = (int) Math.floor(position);
            int above = Math.min(below + 1, sorted.length - 1);
            q[i] = sorted[below] + (position - below) * (sorted[above] - sorted[below]);
        }
        return q;
    }
}
