package org.annalist.findings;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.analysis.TestResult;
import org.annalist.analysis.breaks.BaiPerron;
import org.annalist.analysis.breaks.BreakSearch;
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
        for (BreakSearch.Break b : found.breaks()) {
            breaks.add(new BreakFinding(series.period(b.start()),
                    List.of(series.period(b.earliest()), series.period(b.latest())),
                    b.levelBefore(), b.levelAfter(), b.changePct(),
                    b.test().map(TestResult::statistic).orElse(Double.NaN),
                    b.test().map(TestResult::pValue).orElse(1.0), b.provisional(), b.start()));
        }
        List<Episode> episodes = new ArrayList<>();
        for (BreakSearch.Episode e : found.episodes()) {
            episodes.add(new Episode(series.period(e.start()),
                    e.recovery().isPresent() ? Optional.of(series.period(e.recovery().getAsInt())) : Optional.empty(),
                    series.period(e.low()), e.lowLevel(), e.regainedShare()));
        }
        return new Result(List.copyOf(breaks), List.copyOf(episodes), method(found), found.latestRegimeStart());
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
