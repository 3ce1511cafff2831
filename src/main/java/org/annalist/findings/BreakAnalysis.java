package org.annalist.findings;

import java.util.ArrayList;
import java.util.List;
import org.annalist.analysis.DecisionRules;
import org.annalist.analysis.TestResult;
import org.annalist.analysis.breaks.BaiPerron;
import org.annalist.analysis.breaks.BreakSearch;
import org.annalist.series.Series;

/**
 * The breaks finding: runs {@link BreakSearch} with the thresholds of {@link DecisionRules} on the
 * seasonally adjusted series (logs when multiplicative) with outliers screened out, and turns its
 * result into {@link BreakFinding}s and {@link Episode}s, with dates as periods, and into the words
 * of the methods appendix.
 */
final class BreakAnalysis {

    /**
     * @param method   how the breaks were searched, for the methods appendix
     * @param regimeStart first index of the latest regime (0 without breaks)
     */
    record Result(List<BreakFinding> breaks, List<Episode> episodes, String method, int regimeStart) {
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
    static Result of(Series series, double[] screened, boolean log, List<String> notes) {
        BreakSearch.Result found = SEARCH.search(screened, series.frequency(),
                log ? BreakSearch.Scale.LOGS : BreakSearch.Scale.UNITS);
        if (found.method() == BreakSearch.Method.NOT_SEARCHED_DAILY) {
            notes.add(dailyNote());
        }
        List<BreakFinding> breaks = new ArrayList<>();
        for (BreakSearch.Break b : found.breaks()) {
            breaks.add(new BreakFinding(series.period(b.start()).label(),
                    List.of(series.period(b.earliest()).label(), series.period(b.latest()).label()),
                    b.levelBefore(), b.levelAfter(), b.changePct(),
                    b.test().map(TestResult::statistic).orElse(Double.NaN),
                    b.test().map(TestResult::pValue).orElse(1.0), b.provisional(), b.start()));
        }
        List<Episode> episodes = new ArrayList<>();
        for (BreakSearch.Episode e : found.episodes()) {
            episodes.add(new Episode(series.period(e.start()).label(),
                    e.recovery().isPresent() ? series.period(e.recovery().getAsInt()).label() : null,
                    series.period(e.low()).label(), e.lowLevel(), e.regainedShare(), e.start(),
                    e.recovery().orElse(-1), e.low()));
        }
        return new Result(List.copyOf(breaks), List.copyOf(episodes), method(found), found.latestRegimeStart());
    }

    // The words below move to the narrative package later; until then they stay as they were.

    private static String dailyNote() {
        // The weekday pattern is removed, but not the pattern of the year, whose waves would read as breaks.
        return "Structural changes are not searched in daily data, whose yearly pattern is not yet taken out; "
                + "aggregate to weeks or months (--aggregate) to look for them.";
    }

    private static String method(BreakSearch.Result found) {
        int h = found.minimumRegime();
        return switch (found.method()) {
            case NOT_SEARCHED_DAILY -> "not searched in daily data (the yearly pattern is not removed)";
            case NOT_SEARCHED_SHORT -> "not searched: fewer than two regimes of " + h + " periods";
            case PELT -> "PELT, changes in level, penalty 3 log n on the robust noise scale, minimum regime " + h
                    + ", then every break checked by its own sup-F test (AR(1) Monte Carlo null, 5 %)";
            case BAI_PERRON -> "Bai-Perron, changes in "
                    + (found.model().orElseThrow() == BaiPerron.Model.LEVEL ? "level" : "level and slope")
                    + ", number of breaks by BIC, then reduced until every break passes its own sup-F test"
                    + " (AR(1) Monte Carlo null, 5 %), minimum regime " + h;
        };
    }
}
