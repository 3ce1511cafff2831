package org.annalist.findings;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.analysis.TestResult;
import org.annalist.analysis.breaks.BaiPerron;
import org.annalist.analysis.breaks.BreakSearch;
import org.annalist.analysis.breaks.BreakShape;
import org.annalist.series.Series;

/**
 * The breaks finding: runs {@link BreakSearch} with the thresholds of {@link DecisionRules} on the
 * seasonally adjusted series (logs when multiplicative) with outliers screened out, and turns its
 * result into {@link BreakFinding}s and {@link Episode}s with dates as periods, and into the
 * {@link BreakMethod} the methods appendix describes.
 */
final class BreakAnalysis {

    /**
     * @param method      how the breaks were searched, for the methods appendix
     * @param regimeStart first index of the latest regime (0 without breaks)
     */
    record Result(List<BreakFinding> breaks, List<Episode> episodes, BreakMethod method, int regimeStart) {
    }

    private static final BreakSearch SEARCH = BreakSearch.withDefaults()
            .withAlpha(DecisionRules.ALPHA)
            .withMinimumChangePct(DecisionRules.MIN_BREAK_CHANGE_PCT)
            .withPeltAbove(DecisionRules.PELT_ABOVE)
            .withCollapsePct(DecisionRules.COLLAPSE_PCT)
            .withAnnualMinimumRegime(DecisionRules.MIN_REGIME_YEARS_ANNUAL);

    private BreakAnalysis() {
    }

    /** @param screened working-scale adjusted values with outliers replaced, NaN where missing */
    static Result of(Series series, double[] screened, boolean log, List<Caveat> notes) {
        BreakSearch.Result found = SEARCH.search(screened, series.frequency(),
                log ? BreakSearch.Scale.LOGS : BreakSearch.Scale.UNITS);
        if (found.method() == BreakSearch.Method.NOT_SEARCHED_DAILY) {
            notes.add(new Caveat.BreaksNotSearchedInDailyData());
        }
        List<BreakFinding> breaks = new ArrayList<>();
        double perYear = series.frequency().periodsPerYear();
        for (BreakSearch.Break b : found.breaks()) {
            breaks.add(new BreakFinding(series.period(b.start()),
                    List.of(series.period(b.earliest()), series.period(b.latest())),
                    b.levelBefore(), b.levelAfter(), b.changePct(),
                    b.test().map(TestResult::statistic).orElse(Double.NaN),
                    b.test().map(TestResult::pValue).orElse(1.0), b.provisional(), b.start(), kind(b),
                    b.slopeBefore() * perYear, b.slopeAfter() * perYear, series.period(b.end()), b.endLevel()));
        }
        List<Episode> episodes = new ArrayList<>();
        for (BreakSearch.Episode e : found.episodes()) {
            episodes.add(new Episode(series.period(e.start()), e.rise(), e.before(), series.period(e.extreme()),
                    e.extremeLevel(),
                    e.returnStart().isPresent() ? Optional.of(series.period(e.returnStart().getAsInt())) : Optional.empty(),
                    series.period(e.asOf()), e.returnedLevel(), e.returnedShare()));
        }
        return new Result(List.copyOf(breaks), List.copyOf(episodes), method(found), found.latestRegimeStart());
    }

    /**
     * The breaks and episodes with the latest regime read at its one rate ({@link #withLatestRate}).
     *
     * @param breaks   the breaks, the last one's slope after and end level at that rate
     * @param episodes the episodes, those whose return is read on the latest regime's line read again on it
     */
    record Rated(List<BreakFinding> breaks, List<Episode> episodes) {
    }

    /**
     * The breaks with the latest regime's one rate: the last break's slope after is the trend
     * finding's over the regime it opens (Sen's slope, {@link TrendAnalysis}), not the fitted
     * line's. The segmented line is fitted to every regime at once, joined at a bend, so its last
     * slope leans on the regime before (on the demo's domestic nights +0.7 % a year, against Sen's
     * +1.7 % over the same months, the planted growth being 1.5 %); a reader must find one rate for
     * one span, and the trend's carries its interval and test. On logs the slope is read as the
     * fitted lines are, at the break: the compound rate's log times the level after, so that the
     * brief's % a year of it is the trend finding's. The regime's line is then read at its end as
     * the search reads it ({@link BreakSearch#lineAt}). An episode whose return is measured on that
     * regime (the regime that moved back is the latest one) gives the level that line reaches at
     * its end, so that "at the latest period" agrees with the rate the brief gives; one whose
     * furthest point is that end, or measured on an earlier regime, is unchanged. All unchanged when
     * the trend has no latest regime or it starts elsewhere.
     */
    static Rated withLatestRate(Result found, Optional<TrendFinding.LatestRegime> latest, boolean log,
                                double periodsPerYear) {
        List<BreakFinding> breaks = found.breaks();
        Rated unchanged = new Rated(breaks, found.episodes());
        if (breaks.isEmpty() || latest.isEmpty()) {
            return unchanged;
        }
        BreakFinding last = breaks.get(breaks.size() - 1);
        TrendFinding.LatestRegime regime = latest.get();
        if (!last.period().equals(regime.since()) || log && regime.changePctPerYear() == null) {
            return unchanged;
        }
        double logRate = log ? Math.log1p(regime.changePctPerYear() / 100) : Double.NaN;
        double slope = log ? logRate * last.levelAfter() : regime.slopePerYear();
        // the regime's line on the working scale: from the level after at the break, the rate per period
        double endLevel = BreakSearch.lineAt(log ? Math.log(last.levelAfter()) : last.levelAfter(),
                (log ? logRate : slope) / periodsPerYear, last.period().until(last.regimeEnd()), log);
        List<BreakFinding> rated = new ArrayList<>(breaks.subList(0, breaks.size() - 1));
        rated.add(new BreakFinding(last.period(), last.ci95(), last.levelBefore(), last.levelAfter(), last.changePct(),
                last.statistic(), last.pValue(), last.provisional(), last.index(), last.kind(), last.slopeBefore(),
                slope, last.regimeEnd(), endLevel));
        List<Episode> read = new ArrayList<>();
        for (Episode e : found.episodes()) {
            // the regime the return is read on: the later break's that moved back, else the stepped one
            boolean onLatest = e.returnStart().orElse(e.start()).equals(last.period())
                    && !e.extreme().equals(last.regimeEnd());
            if (!onLatest) {
                read.add(e);
                continue;
            }
            double share = Math.min(BreakSearch.MAX_REGAINED_SHARE,
                    (endLevel - e.extremeLevel()) / (e.before() - e.extremeLevel()));
            read.add(new Episode(e.start(), e.rise(), e.before(), e.extreme(), e.extremeLevel(), e.returnStart(), e.asOf(),
                    endLevel, share));
        }
        return new Rated(List.copyOf(rated), List.copyOf(read));
    }

    /**
     * What a break changed. A break of a level model is a step. Of a level-and-slope model, a step
     * is reported only when the data carry it against one line bent at the break, on the working
     * scale and the other, at {@link DecisionRules#ALPHA} (the search then leaves a gap; else it
     * joins the lines and the gap is 0: {@link org.annalist.analysis.breaks.StepOrBend}), and when
     * the gap at the break reaches {@link DecisionRules#MIN_BREAK_CHANGE_PCT}
     * and a change of slope only when it carries the lines that far apart within one minimum regime;
     * when both reach it, BIC over the two regimes chooses between parallel lines with a jump and
     * one bent line, and "both" only when separate lines are better by
     * {@link DecisionRules#BREAK_KIND_BIC_MARGIN} (Schwarz 1978; Kass and Raftery 1995, §3.2).
     */
    static BreakKind kind(BreakSearch.Break b) {
        boolean step = Math.abs(b.changePct()) >= DecisionRules.MIN_BREAK_CHANGE_PCT;
        boolean slope = Math.abs(b.divergencePct()) >= DecisionRules.MIN_BREAK_CHANGE_PCT;
        if (b.shape().isEmpty() || !slope) {
            return BreakKind.LEVEL;
        }
        if (!step) {
            return BreakKind.SLOPE;
        }
        BreakShape shape = b.shape().get();
        if (Double.isNaN(shape.bicStep()) || Double.isNaN(shape.bicSlope()) || Double.isNaN(shape.bicBoth())) {
            return BreakKind.BOTH;   // no comparison possible: both changes are large enough to report
        }
        if (shape.bicBoth() <= Math.min(shape.bicStep(), shape.bicSlope()) - DecisionRules.BREAK_KIND_BIC_MARGIN) {
            return BreakKind.BOTH;
        }
        return shape.bicStep() <= shape.bicSlope() ? BreakKind.LEVEL : BreakKind.SLOPE;
    }

    private static BreakMethod method(BreakSearch.Result found) {
        BreakMethod.Search search = switch (found.method()) {
            case BAI_PERRON -> BreakMethod.Search.BAI_PERRON;
            case PELT -> BreakMethod.Search.PELT;
            case NOT_SEARCHED_DAILY -> BreakMethod.Search.NOT_SEARCHED_IN_DAILY_DATA;
            case NOT_SEARCHED_SHORT -> BreakMethod.Search.NOT_SEARCHED_TOO_SHORT;
        };
        return new BreakMethod(search, found.model().filter(m -> m == BaiPerron.Model.LEVEL_AND_SLOPE).isPresent(),
                found.minimumRegime());
    }
}
