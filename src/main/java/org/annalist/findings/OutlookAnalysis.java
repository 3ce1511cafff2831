package org.annalist.findings;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.IntStream;
import org.annalist.analysis.forecast.Outlook;
import org.annalist.analysis.forecast.YearSums;
import org.annalist.analysis.indicators.LatestIndicators;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * The outlook of a series ({@link Outlook}) as a finding: how far it looks, the bounds the measure
 * keeps, the periods of its forecasts and the next year's total, and, after a structural break,
 * whether the history before it was kept (the outlook decides that on its back-test). Missing
 * values are filled with what trend and season predict there.
 */
final class OutlookAnalysis {

    /** Periods beyond the rest of the last observed year, by default (at least; see {@link #defaultHorizon}). */
    static final int DEFAULT_EXTRA_PERIODS = 12;

    private OutlookAnalysis() {
    }

    /**
     * @param horizon the user's number of periods ahead (0: no outlook), or empty for the default
     * @return null without an outlook
     */
    /**
     * @param episodes the falls and rises that moved back: each one that ended before the latest
     *                 values is bridged before forecasting ({@link #bridged})
     * @param calendar the calendar analysis, whose Easter effect moves the forecasts of March and
     *                 April with Easter's date ({@link EasterAhead}); null without one
     * @param log      the analysis worked on logarithms (the calendar effects are log differences)
     */
    static OutlookFinding of(Series series, Optional<Decomposition> decomposition, int regimeStart,
                             List<Episode> episodes, Measure kind, Optional<Integer> horizon, CalendarFinding calendar,
                             boolean log) {
        LatestIndicators.Measure measure = kind.forIndicators();
        int last = lastObserved(series);
        if (last < 0 || horizon.isPresent() && horizon.get() == 0) {
            return null;
        }
        int period = series.frequency().seasonalPeriod();
        int h = horizon.orElse(defaultHorizon(series.period(last)));
        List<OutlookCaveat> caveats = new ArrayList<>();
        double[] y = bridged(series, filled(series, decomposition, last, caveats), decomposition, episodes, caveats);
        Optional<Outlook.Result> result = Outlook.of(y, period, h,
                kind == Measure.INTERVAL ? Outlook.Bounds.NONE : bounds(series, measure), Math.max(0, regimeStart));
        if (result.isEmpty()) {
            return null;
        }
        Outlook.Result outlook = result.get();
        int from = outlook.span().from();
        history(series, regimeStart, outlook.span(), last + 1).ifPresent(caveats::add);
        if (outlook.backtest().isEmpty()) {
            caveats.add(new OutlookCaveat.NoBacktest(Outlook.backtestPossible(y.length, period)
                    ? OutlookCaveat.NoBacktest.Reason.NO_SCALE : OutlookCaveat.NoBacktest.Reason.SERIES_TOO_SHORT));
        }
        Period lastPeriod = series.period(last);
        List<EasterAhead> easter = EasterAhead.of(series, calendar, log, series.period(from),
                IntStream.range(0, h).mapToObj(k -> lastPeriod.plus(k + 1)).toList(), outlook.chosen().mean());
        Outlook.Forecast f = easterMoved(outlook.chosen(), easter, lastPeriod, log);
        double[] mean = f.mean();
        double[] lo80 = f.lo80();
        double[] hi80 = f.hi80();
        double[] lo95 = f.lo95();
        double[] hi95 = f.hi95();
        List<OutlookFinding.Point> points = new ArrayList<>();
        for (int k = 0; k < h; k++) {
            points.add(new OutlookFinding.Point(lastPeriod.plus(k + 1), mean[k], lo80[k], hi80[k], lo95[k],
                    hi95[k], k));
        }
        int nextYear = lastPeriod.year() + 1;
        OutlookFinding.Span total = null;
        OutlookFinding.Span average = null;
        int[] span = yearSpan(lastPeriod, nextYear, h);
        if (span != null) {
            double[] sum = f.sumOver(span[0], span[1]);
            int count = span[1] - span[0];
            if (kind.summed()) {
                total = new OutlookFinding.Span(sum[0], sum[1], sum[2]);
            } else {
                average = new OutlookFinding.Span(sum[0] / count, sum[1] / count, sum[2] / count);
            }
        }
        List<OutlookFinding.Score> scores = outlook.backtest().stream()
                .map(s -> new OutlookFinding.Score(method(s.method(), period), s.mase(), s.smape())).toList();
        Double typical = outlook.chosenScore().map(s -> Numbers.orNull(s.medianAbsolutePercentError())).orElse(null);
        OutlookYears.Years years = OutlookYears.of(series, last, f, h, kind);
        boolean tested = !outlook.backtest().isEmpty();
        return new OutlookFinding(method(f.method(), period), model(f.model(), period), h, series.period(from), points,
                total, average, scores, choice(outlook.choice(), period), typical, nextYear, outlook.origins(), caveats,
                years.current(), years.change(), outlook.widened(), outlook.narrowed(),
                tested ? series.period(last + 1 - outlook.origins()) : null, tested ? lastPeriod : null,
                typicalYearError(outlook, period), months(lastPeriod, f, h, kind), easter);
    }

    /**
     * The forecast with March and April (the first two quarters) moved for Easter's date: every
     * path, the mean and the interval limits by the same factor exp(β·Δ) on logs, or the same
     * amount β·Δ otherwise, so the intervals, the year's totals from the paths and the table agree.
     * A moved value is kept at zero or above where it was (a count cannot fall below zero).
     */
    static Outlook.Forecast easterMoved(Outlook.Forecast f, List<EasterAhead> ahead, Period last, boolean log) {
        if (ahead.isEmpty()) {
            return f;
        }
        double[] mean = f.mean();
        double[][] limits = {f.lo80(), f.hi80(), f.lo95(), f.hi95()};
        double[][] paths = f.paths();
        for (EasterAhead a : ahead) {
            for (EasterAhead.Move m : a.moves()) {
                int k = (int) last.until(m.period()) - 1;
                mean[k] = moved(mean[k], m.working(), log);
                for (double[] limit : limits) {
                    limit[k] = moved(limit[k], m.working(), log);
                }
                for (double[] path : paths) {
                    path[k] = moved(path[k], m.working(), log);
                }
            }
        }
        return new Outlook.Forecast(f.model(), mean, limits[0], limits[1], limits[2], limits[3], paths);
    }

    private static double moved(double value, double working, boolean log) {
        double v = log ? value * Math.exp(working) : value + working;
        return value >= 0 ? Math.max(0, v) : v;
    }

    /** Daily data: every whole calendar month within the horizon, for a table a reader can print. */
    private static List<OutlookFinding.Month> months(Period last, Outlook.Forecast f, int h, Measure kind) {
        List<OutlookFinding.Month> months = new ArrayList<>();
        if (last.frequency().periodsPerYear() <= 53) {
            return months;
        }
        boolean total = kind.summed();
        int k = 0;
        while (k < h && last.plus(k + 1).startDate().getMonth() == last.startDate().getMonth()
                && last.plus(k + 1).year() == last.year()) {
            k++; // the rest of the current month is printed day by day
        }
        while (k < h) {
            LocalDate first = last.plus(k + 1).startDate();
            int end = k;
            while (end < h && last.plus(end + 1).startDate().getMonth() == first.getMonth()) {
                end++;
            }
            if (end == h && last.plus(end + 1).startDate().getMonth() == first.getMonth()) {
                break; // the horizon ends inside this month
            }
            double[] v = YearSums.withLimits(f,
                    new YearSums.Year(0, k, end, total ? 1 : end - k));
            months.add(new OutlookFinding.Month(Period.month(first.getYear(), first.getMonthValue()), total, v[0], v[2],
                    v[3], v[1], v[4]));
            k = end;
        }
        return months;
    }

    /** The chosen method's typical error of a year's total in the back-test, in %, or null. */
    private static Double typicalYearError(Outlook.Result outlook, int period) {
        if (period < 2) {
            return null;
        }
        return outlook.chosenScore().map(s -> s.errors().cycleSums())
                .filter(c -> c.enough() && !Double.isNaN(c.relativeMedian()))
                .map(c -> 100 * c.relativeMedian()).orElse(null);
    }

    /** What the outlook did with the history before a structural break, or empty without one. */
    private static Optional<OutlookCaveat> history(Series series, int regimeStart, Outlook.Span span, int used) {
        if (regimeStart <= 0) {
            return Optional.empty();
        }
        Period start = series.period(regimeStart);
        return Optional.of(switch (span.basis()) {
            case REGIME_CLEARLY_BETTER -> new OutlookCaveat.FittedSinceBreak(start, span.allMae(), span.regimeMae());
            case ALL_VALUES_NOT_BEATEN -> new OutlookCaveat.HistoryKept(start, span.allMae(), span.regimeMae());
            case REGIME_TOO_SHORT, NO_BREAK -> new OutlookCaveat.BreakTooRecent(start, used - regimeStart,
                    Outlook.shortestOwnRegime(used, series.frequency().seasonalPeriod()));
        });
    }

    /**
     * The rest of the last observed year and the whole next year — at least
     * {@value #DEFAULT_EXTRA_PERIODS} periods beyond the rest of the year (three years of quarters,
     * a dozen years of annual data); daily data keep those {@value #DEFAULT_EXTRA_PERIODS}.
     */
    static int defaultHorizon(Period last) {
        int rest = restOfYear(last);
        if (last.frequency().periodsPerYear() > 53) {
            return rest + DEFAULT_EXTRA_PERIODS;
        }
        return rest + Math.max(DEFAULT_EXTRA_PERIODS, periodsIn(last.plus(rest + 1)));
    }

    /** Periods of the calendar year that begins at {@code first}. */
    static int periodsIn(Period first) {
        int k = 0;
        while (first.plus(k).year() == first.year()) {
            k++;
        }
        return k;
    }

    /** The method; the seasonal naive forecast of data without a season ({@code period} ≤ 1) is the naive one. */
    private static OutlookMethod method(Outlook.Method method, int period) {
        return switch (method) {
            case COMBINATION -> OutlookMethod.COMBINATION;
            case ETS -> OutlookMethod.ETS;
            case ARIMA -> OutlookMethod.ARIMA;
            case THETA -> OutlookMethod.THETA;
            case SEASONAL_NAIVE -> period <= 1 ? OutlookMethod.NAIVE : OutlookMethod.SEASONAL_NAIVE;
            case NAIVE_WITH_DRIFT -> OutlookMethod.NAIVE_WITH_DRIFT;
        };
    }

    private static OutlookFinding.Model model(Outlook.Model model, int period) {
        return new OutlookFinding.Model(method(model.method(), period), model.label(), model.seasonallyAdjusted(),
                model.members().stream().map(m -> model(m, period)).toList(), model.trended());
    }

    private static OutlookFinding.Choice choice(Outlook.Choice choice, int period) {
        OutlookFinding.Choice.Basis basis = switch (choice.basis()) {
            case COMBINATION_NOT_BEATEN -> OutlookFinding.Choice.Basis.COMBINATION_NOT_BEATEN;
            case SINGLE_CLEARLY_BETTER -> OutlookFinding.Choice.Basis.SINGLE_CLEARLY_BETTER;
            case COMBINATION_TOO_FEW_TESTED -> OutlookFinding.Choice.Basis.COMBINATION_TOO_FEW_TESTED;
            case COMBINATION_WITHOUT_BACKTEST -> OutlookFinding.Choice.Basis.COMBINATION_WITHOUT_BACKTEST;
            case SHORT_SERIES -> OutlookFinding.Choice.Basis.SHORT_SERIES;
        };
        return new OutlookFinding.Choice(basis, choice.origins(),
                choice.combination().map(Outlook.Score::mase).orElse(Double.NaN),
                choice.bestSingle().map(s -> method(s.method(), period)),
                choice.bestSingle().map(Outlook.Score::mase).orElse(Double.NaN));
    }

    /** Percent rates stay within 0–100, values that were never negative stay at or above zero. */
    static Outlook.Bounds bounds(Series series, LatestIndicators.Measure measure) {
        double min = Arrays.stream(series.values()).filter(v -> !Double.isNaN(v)).min().orElse(0);
        if (min < 0) {
            return Outlook.Bounds.NONE;
        }
        String unit = series.unit().toLowerCase(Locale.ROOT);
        boolean percent = unit.contains("%") || unit.contains("percent");
        return percent && measure != LatestIndicators.Measure.FLOW ? Outlook.Bounds.PERCENT : Outlook.Bounds.NON_NEGATIVE;
    }

    /** Periods after {@code last} still in its calendar year. */
    static int restOfYear(Period last) {
        int k = 0;
        while (last.plus(k + 1).year() == last.year()) {
            k++;
        }
        return k;
    }

    /** {from, to} steps (0-based, to exclusive) of the whole calendar year {@code year} within the horizon, or null. */
    private static int[] yearSpan(Period last, int year, int h) {
        int from = -1;
        int to = -1;
        for (int k = 0; k < h; k++) {
            if (last.plus(k + 1).year() == year) {
                from = from < 0 ? k : from;
                to = k + 1;
            }
        }
        return from < 0 || last.plus(to + 1).year() == year ? null : new int[] {from, to};
    }

    private static int lastObserved(Series series) {
        for (int i = series.size() - 1; i >= 0; i--) {
            if (!series.isMissing(i)) {
                return i;
            }
        }
        return -1;
    }

    /**
     * Temporary shocks taken out before forecasting (an intervention for a known episode, rather
     * than cutting the history at it): the values of every episode that moved back before the
     * series' latest values — from its step to the break that moved back, or to the end of the
     * stepped regime when its own line moved back — are replaced by a straight line between the
     * seasonally adjusted level of the cycle before it and of the cycle after it, with the season put
     * back. The forecasts then neither expect the shock to recur nor lose the years before it; what
     * remains after the return is kept as it was.
     */
    private static double[] bridged(Series series, double[] y, Optional<Decomposition> d, List<Episode> episodes,
                                    List<OutlookCaveat> caveats) {
        int cycle = Math.max(1, series.frequency().seasonalPeriod());
        double[] seasonal = d.map(Decomposition::seasonal).orElse(null);
        boolean multiplicative = d.map(Decomposition::multiplicative).orElse(false);
        double[] out = y.clone();
        for (Episode e : episodes) {
            int from = series.indexOf(e.start());
            // to the break that moved back, or, when the stepped regime's own line moved back, to its end
            int to = e.returnStart().map(series::indexOf).orElse(series.indexOf(e.asOf()) + 1);
            if (from < 1 || to <= from || to >= y.length) {
                continue;
            }
            double before = meanAdjusted(y, seasonal, multiplicative, Math.max(0, from - cycle), from);
            double after = meanAdjusted(y, seasonal, multiplicative, to, Math.min(y.length, to + cycle));
            for (int t = from; t < to; t++) {
                double level = before + (after - before) * (t - from + 1) / (double) (to - from + 1);
                out[t] = seasonal == null ? level : multiplicative ? level * seasonal[t] : level + seasonal[t];
            }
            caveats.add(new OutlookCaveat.ShockBridged(e.start(), series.period(to - 1), e.rise()));
        }
        return out;
    }

    /** The mean of the values from {@code from} to {@code to} − 1 with the season taken out. */
    private static double meanAdjusted(double[] y, double[] seasonal, boolean multiplicative, int from, int to) {
        double sum = 0;
        for (int t = from; t < to; t++) {
            sum += seasonal == null ? y[t] : multiplicative ? y[t] / seasonal[t] : y[t] - seasonal[t];
        }
        return sum / (to - from);
    }

    /**
     * The values from {@code from} to {@code last}, gaps filled with trend-cycle and season there
     * (or, without a decomposition, by straight lines between their neighbours).
     */
    private static double[] filled(Series series, Optional<Decomposition> d, int last, List<OutlookCaveat> caveats) {
        int from = 0;
        double[] trendCycle = d.map(Decomposition::trendCycle).orElse(null);
        double[] seasonal = d.map(Decomposition::seasonal).orElse(null);
        boolean multiplicative = d.map(Decomposition::multiplicative).orElse(false);
        double[] y = Arrays.copyOfRange(series.values(), from, last + 1);
        int gaps = 0;
        for (int i = 0; i < y.length; i++) {
            if (!Double.isNaN(y[i])) {
                continue;
            }
            gaps++;
            int t = from + i;
            if (trendCycle != null && !Double.isNaN(trendCycle[t])) {
                y[i] = multiplicative ? trendCycle[t] * seasonal[t] : trendCycle[t] + seasonal[t];
            }
        }
        for (int i = 0; i < y.length; i++) {
            if (Double.isNaN(y[i])) {
                int before = i - 1;
                int after = i + 1;
                while (after < y.length && Double.isNaN(y[after])) {
                    after++;
                }
                double left = before >= 0 ? y[before] : y[after];
                double right = after < y.length ? y[after] : left;
                y[i] = left + (right - left) * (i - before) / (double) (after - before);
            }
        }
        if (gaps > 0) {
            caveats.add(new OutlookCaveat.GapsFilled(gaps));
        }
        return y;
    }
}
