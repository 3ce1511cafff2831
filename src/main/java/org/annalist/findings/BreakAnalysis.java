package org.annalist.findings;

import java.util.ArrayList;
import java.util.List;
import org.annalist.analysis.TestResult;
import org.annalist.analysis.breaks.BaiPerron;
import org.annalist.analysis.breaks.BreakDateInterval;
import org.annalist.analysis.breaks.Pelt;
import org.annalist.analysis.breaks.SupF;
import org.annalist.series.Frequency;
import org.annalist.series.Series;

/**
 * The breaks finding, on the seasonally adjusted series (logs when multiplicative) with outliers
 * screened out first, so that one wild month cannot pull a regime boundary.
 *
 * <p>Up to {@link DecisionRules#PELT_ABOVE} periods: Bai–Perron for changes in level and for
 * changes in level and slope, the model and number of breaks with the lower BIC, then as many
 * breaks as pass their own sup-F test. Longer series: PELT for changes in level. Each break then gets
 * its own sup-F test over the span of its two regimes, a Bai (1997) interval, and levels before
 * and after in the series' units.
 */
final class BreakAnalysis {

    /**
     * @param method   how the breaks were searched, for the methods appendix
     * @param regimeStart first index of the latest regime (0 without breaks)
     */
    record Result(List<BreakFinding> breaks, List<Episode> episodes, String method, int regimeStart) {
    }

    private BreakAnalysis() {
    }

    /** @param screened working-scale adjusted values with outliers replaced, NaN where missing */
    static Result of(Series series, double[] screened, boolean log, List<Caveat> notes) {
        int n = screened.length;
        int h = minimumRegime(series.frequency());
        if (series.frequency() == Frequency.DAILY || series.frequency() == Frequency.BUSINESS_DAILY) {
            // The weekday pattern is removed, but not the pattern of the year, whose waves would read as breaks.
            notes.add(new Caveat.BreaksNotSearchedInDailyData());
            return new Result(List.of(), List.of(), "not searched in daily data (the yearly pattern is not removed)", 0);
        }
        if (n < 2 * h) {
            return new Result(List.of(), List.of(), "not searched: fewer than two regimes of " + h + " periods", 0);
        }
        int[] starts;
        BaiPerron.Model model;
        String method;
        if (n > DecisionRules.PELT_ABOVE) {
            model = BaiPerron.Model.LEVEL;
            Pelt.Result pelt = Pelt.fit(screened, h);
            starts = confirmedPelt(screened, pelt.starts(), h, log);
            method = "PELT, changes in level, penalty 3 log n on the robust noise scale, minimum regime " + h
                    + ", then every break checked by its own sup-F test (AR(1) Monte Carlo null, 5 %)";
        } else {
            BaiPerron.Result level = BaiPerron.withMinimumRegime(Math.max(h, 2)).fit(screened);
            BaiPerron.Result slope = BaiPerron.withMinimumRegime(Math.max(h, 3)).with(BaiPerron.Model.LEVEL_AND_SLOPE)
                    .fit(screened);
            BaiPerron.Result best = slope.chosen().bic() < level.chosen().bic() ? slope : level;
            model = best.model();
            starts = confirmed(screened, best, model, h, log);
            method = "Bai-Perron, changes in " + (model == BaiPerron.Model.LEVEL ? "level" : "level and slope")
                    + ", number of breaks by BIC, then reduced until every break passes its own sup-F test"
                    + " (AR(1) Monte Carlo null, 5 %), minimum regime " + best.minimumRegime();
        }
        List<BreakFinding> breaks = new ArrayList<>();
        for (int j = 0; j < starts.length; j++) {
            int from = j == 0 ? 0 : starts[j - 1];
            int start = starts[j];
            int to = j + 1 < starts.length ? starts[j + 1] - 1 : n - 1;
            breaks.add(describe(series, screened, log, model, h, from, start, to));
        }
        return new Result(List.copyOf(breaks), episodes(series, screened, log, breaks, model), method,
                starts.length == 0 ? 0 : starts[starts.length - 1]);
    }

    /**
     * From BIC's number of breaks down: the first partition in which every break moves the level by
     * at least {@link DecisionRules#MIN_BREAK_CHANGE_PCT} % and passes its own sup-F test (over the
     * span of its two regimes), or none. Serial correlation makes BIC propose too
     * many breaks (Bai &amp; Perron 2003); this backward check removes those the data do not carry.
     */
    private static int[] confirmed(double[] y, BaiPerron.Result fit, BaiPerron.Model model, int h, boolean log) {
        for (int m = fit.chosen().breaks(); m >= 1; m--) {
            int[] starts = fit.byBreaks().get(m).starts();
            boolean all = true;
            for (int j = 0; j < starts.length && all; j++) {
                int from = j == 0 ? 0 : starts[j - 1];
                int to = j + 1 < starts.length ? starts[j + 1] - 1 : y.length - 1;
                all = Math.abs(changePct(y, model, from, starts[j], to, log)) >= DecisionRules.MIN_BREAK_CHANGE_PCT
                        && localRejects(y, model, h, from, starts[j], to);
            }
            if (all) {
                return starts;
            }
        }
        return new int[0];
    }

    /**
     * PELT's breaks, checked as Bai–Perron's are: while some break moves the level by less than
     * {@link DecisionRules#MIN_BREAK_CHANGE_PCT} % or fails its own sup-F test, the weakest of those
     * (smallest change) is removed and the rest are checked again. A smooth yearly wave in daily
     * data otherwise reads as a staircase of level changes.
     */
    private static int[] confirmedPelt(double[] y, int[] proposed, int h, boolean log) {
        List<Integer> starts = new ArrayList<>();
        for (int s : proposed) {
            starts.add(s);
        }
        while (!starts.isEmpty()) {
            int weakest = -1;
            double weakestChange = Double.POSITIVE_INFINITY;
            for (int j = 0; j < starts.size(); j++) {
                int from = j == 0 ? 0 : starts.get(j - 1);
                int to = j + 1 < starts.size() ? starts.get(j + 1) - 1 : y.length - 1;
                double change = Math.abs(changePct(y, BaiPerron.Model.LEVEL, from, starts.get(j), to, log));
                boolean holds = change >= DecisionRules.MIN_BREAK_CHANGE_PCT
                        && localRejects(y, BaiPerron.Model.LEVEL, h, from, starts.get(j), to);
                if (!holds && change < weakestChange) {
                    weakest = j;
                    weakestChange = change;
                }
            }
            if (weakest < 0) {
                break;
            }
            starts.remove(weakest);
        }
        return starts.stream().mapToInt(Integer::intValue).toArray();
    }

    /** Change of the fitted level at the break, in % of the level before. */
    private static double changePct(double[] y, BaiPerron.Model model, int from, int start, int to, boolean log) {
        double before = BaiPerron.regimeFit(y, model, from, start - 1, start - 1)[0];
        double after = BaiPerron.regimeFit(y, model, start, to, start)[0];
        return log ? 100 * (Math.exp(after - before) - 1) : 100 * (after - before) / Math.abs(before);
    }

    private static boolean localRejects(double[] y, BaiPerron.Model model, int h, int from, int start, int to) {
        double[] span = java.util.Arrays.copyOfRange(y, from, to + 1);
        try {
            return SupF.rejects(span, model, localMinimum(model, h, from, start, to), DecisionRules.ALPHA);
        } catch (IllegalArgumentException tooShort) {
            return false;
        }
    }

    private static int localMinimum(BaiPerron.Model model, int h, int from, int start, int to) {
        return Math.max(model == BaiPerron.Model.LEVEL ? 2 : 3, Math.min(h, Math.min(start - from, to - start + 1)));
    }

    private static TestResult localTest(double[] y, BaiPerron.Model model, int h, int from, int start, int to) {
        double[] span = java.util.Arrays.copyOfRange(y, from, to + 1);
        try {
            return SupF.test(span, model, localMinimum(model, h, from, start, to)).test();
        } catch (IllegalArgumentException tooShort) {
            return new TestResult(TestResult.Method.SUP_F_MONTE_CARLO, Double.NaN, 1, span.length);
        }
    }

    /** One seasonal period for sub-annual data; {@link DecisionRules#MIN_REGIME_YEARS_ANNUAL} years for annual. */
    static int minimumRegime(Frequency frequency) {
        return frequency == Frequency.ANNUAL ? DecisionRules.MIN_REGIME_YEARS_ANNUAL
                : Math.max(3, frequency.seasonalPeriod());
    }

    private static BreakFinding describe(Series series, double[] y, boolean log, BaiPerron.Model model, int h, int from,
                                         int start, int to) {
        double before = BaiPerron.regimeFit(y, model, from, start - 1, start - 1)[0];
        double after = BaiPerron.regimeFit(y, model, start, to, start)[0];
        double sdBefore = residualSd(y, model, from, start - 1);
        double sdAfter = residualSd(y, model, start, to);
        BreakDateInterval.Offsets ci = BreakDateInterval.of(after - before, sdBefore, sdAfter, start - from - 1,
                to - start);
        TestResult local = localTest(y, model, h, from, start, to);
        double levelBefore = log ? Math.exp(before) : before;
        double levelAfter = log ? Math.exp(after) : after;
        double changePct = 100 * (levelAfter - levelBefore) / Math.abs(levelBefore);
        boolean provisional = to == y.length - 1 && to - start + 1 < 2 * h;   // the latest regime, still short
        // No regime may be shorter than h, so a break found as close to an end of the series as
        // that allows may really lie closer still, where the search could not place it: the
        // interval then reaches that end rather than claim a precision the search did not have.
        int lower = from == 0 && start - from <= h ? 1 : start + ci.lower();
        int upper = to == y.length - 1 && to - start + 1 <= h ? to : start + ci.upper();
        return new BreakFinding(series.period(start).label(),
                List.of(series.period(lower).label(), series.period(upper).label()),
                levelBefore, levelAfter, changePct, local.statistic(), local.pValue(), provisional, start);
    }

    private static double residualSd(double[] y, BaiPerron.Model model, int from, int to) {
        double[] fit = BaiPerron.regimeFit(y, model, from, to, from);
        double ss = 0;
        int n = 0;
        for (int i = from; i <= to; i++) {
            if (!Double.isNaN(y[i])) {
                double r = y[i] - (fit[0] + fit[1] * (i - from));
                ss += r * r;
                n++;
            }
        }
        return n > 1 ? Math.sqrt(ss / n) : 0;
    }

    /**
     * A collapse (a break that lowers the level by {@link DecisionRules#COLLAPSE_PCT} % or more)
     * followed by a recovery: the next break raises the level again, or the collapsed regime itself
     * rises (a level-and-slope regime that ends higher than it began). The low point is the lower
     * end of the collapsed regime's fitted line; the share regained compares the level after the
     * recovery (or at the latest period) with it.
     */
    private static List<Episode> episodes(Series series, double[] y, boolean log, List<BreakFinding> breaks,
                                          BaiPerron.Model model) {
        List<Episode> episodes = new ArrayList<>();
        for (int j = 0; j < breaks.size(); j++) {
            BreakFinding fall = breaks.get(j);
            if (fall.changePct() > DecisionRules.COLLAPSE_PCT) {
                continue;
            }
            boolean followed = j + 1 < breaks.size();
            int end = followed ? breaks.get(j + 1).index() - 1 : y.length - 1;
            double atStart = BaiPerron.regimeFit(y, model, fall.index(), end, fall.index())[0];
            double atEnd = BaiPerron.regimeFit(y, model, fall.index(), end, end)[0];
            double recovered = followed ? breaks.get(j + 1).levelAfter() : log ? Math.exp(atEnd) : atEnd;
            int lowIndex = atEnd < atStart ? end : fall.index();
            double low = log ? Math.exp(Math.min(atStart, atEnd)) : Math.min(atStart, atEnd);
            if (recovered <= low * (1 + DecisionRules.MIN_BREAK_CHANGE_PCT / 100)) {
                continue;   // no recovery to speak of: a lasting fall, which the break itself describes
            }
            double fallSize = fall.levelBefore() - low;
            double regained = fallSize <= 0 ? 1 : Math.min(1.5, (recovered - low) / fallSize);
            episodes.add(new Episode(fall.period(), followed ? breaks.get(j + 1).period() : null,
                    series.period(lowIndex).label(), low, regained, fall.index(),
                    followed ? breaks.get(j + 1).index() : -1, lowIndex));
        }
        return List.copyOf(episodes);
    }
}
