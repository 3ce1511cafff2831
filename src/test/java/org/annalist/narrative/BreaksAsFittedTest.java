package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.function.IntToDoubleFunction;
import org.annalist.analysis.Reference;
import org.annalist.findings.Analyst;
import org.annalist.findings.BreakFinding;
import org.annalist.findings.BreakKind;
import org.annalist.findings.Episode;
import org.annalist.findings.FigurePlan;
import org.annalist.findings.Transform;
import org.annalist.findings.Findings;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * Breaks are described as fitted: planted truth (invented series, expected values derived here from
 * the planted effects) against the findings and the words of {@code analyze}'s notes.
 */
class BreaksAsFittedTest {

    private static final Period START = Period.month(2010, 1);

    /** 12 years of monthly values: the given level × a summer-peaking season × 2 % noise. */
    private static Series series(long seed, IntToDoubleFunction level) {
        Random random = new Random(seed);
        double[] x = new double[144];
        for (int t = 0; t < x.length; t++) {
            double season = 1 + 0.3 * Math.sin(2 * Math.PI * (t - 3) / 12);
            x[t] = level.applyAsDouble(t) * season * Math.exp(0.02 * random.nextGaussian());
        }
        return Series.builder("synthetic", Frequency.MONTHLY).append(START, x).snapshot();
    }

    private static Findings analyse(Series s) {
        return new Analyst().withoutOutlook().analyse(s);
    }

    @Test
    void aPureStepUpOrDownIsDescribedAsAStepWithItsSignAndSize() {
        for (double factor : new double[] {1.3, 0.75}) {
            Findings f = analyse(series(21, t -> t >= 70 ? 10_000 * factor : 10_000));
            assertThat(f.breaks()).hasSize(1);
            BreakFinding b = f.breaks().get(0);
            assertThat(b.kind()).as("kind of a planted step ×%s", factor).isEqualTo(BreakKind.LEVEL);
            // planted: +30 % and −25 %; 2 % noise and the adjustment leave a few points of error
            assertThat(b.changePct()).isCloseTo(100 * (factor - 1), within(4.0));
            assertThat(b.changePct()).isCloseTo(100 * (b.levelAfter() / b.levelBefore() - 1), within(1e-9));
            assertThat(AnalystNotes.of(f)).contains("step in level");
        }
    }

    @Test
    void aPureChangeOfSlopeIsDescribedAsAChangeOfSlopeNotAStep() {
        // flat at 10,000 for six years, then growing 15 % a year from the same level (no jump):
        // at the break the slope goes from 0 to 10,000 ln 1.15 = 1,398 a year
        double growth = Math.log(1.15);
        Findings f = analyse(series(22, t -> t >= 72 ? 10_000 * Math.exp(growth * (t - 71.5) / 12) : 10_000));
        assertThat(f.breaks()).as(AnalystNotes.of(f)).hasSize(1);
        BreakFinding b = f.breaks().get(0);
        assertThat(b.kind()).isEqualTo(BreakKind.SLOPE);
        assertThat(b.period()).isBetween(START.plus(66), START.plus(78));
        assertThat(b.slopeAfter() - b.slopeBefore()).isCloseTo(10_000 * growth, within(350.0));   // our tolerance: about 3 % of the planted slope change
        assertThat(Math.abs(b.changePct())).isLessThan(3.0);
        String notes = AnalystNotes.of(f);
        assertThat(notes).contains("change of slope").doesNotContain("step in level");
    }

    @Test
    void aFlowsChangeOfSlopeInUnitsIsCountedAYearInEachMonthsTotal() {
        // flat at 10,000 nights a month for six years, then rising 1,800 a month each year, with a
        // season of constant size (so worked in units, not logs) and noise of 100
        Random random = new Random(29);
        double[] x = new double[144];
        for (int t = 0; t < x.length; t++) {
            double level = t >= 72 ? 10_000 + 150 * (t - 71.5) : 10_000;
            x[t] = level + 1_500 * Math.sin(2 * Math.PI * (t - 3) / 12) + 100 * random.nextGaussian();
        }
        Series s = Series.builder("synthetic", Frequency.MONTHLY).unit("nights").append(START, x).snapshot();
        Findings f = analyse(s);
        assertThat(f.transform()).as("a season of constant size is worked in units").isNotEqualTo(Transform.LOG);
        BreakFinding b = f.breaks().stream().filter(k -> k.kind().slope()).findFirst().orElseThrow();
        BreakViews views = new BreakViews(s, f, Formats.forValues(x, Locale.ENGLISH));
        BriefView.BreakRow row = views.breaks().get(f.breaks().indexOf(b));
        // a month's nights change by the slope each year: "a year" alone would read as the yearly total's change
        assertThat(row.slopeChange()).matches("from [+−][0-9,.]+\u00A0nights to [+−][0-9,.]+\u00A0nights a year in each month's total");
        assertThat(AnalystNotes.of(f)).contains(" a year in each month's total; sup-F").doesNotContain("per year (95%");
    }

    /**
     * A bend whose two fitted lines still lie a reported step apart (at least
     * DecisionRules.MIN_BREAK_CHANGE_PCT) is worded with its gap; a bend whose lines meet, or a
     * break already called a step, is not (invented breaks: the demo long-haul's +5.9 % of March 2022).
     */
    @Test
    void aBendIsSaidToHaveAGapOnlyWhenItsFittedLinesLieAStepApart() {
        assertThat(BreakViews.bendWithGap(bend(BreakKind.SLOPE, 10_360, 10_970))).isTrue();
        assertThat(BreakViews.bendWithGap(bend(BreakKind.SLOPE, 14_562, 14_006))).isTrue();
        assertThat(BreakViews.bendWithGap(bend(BreakKind.SLOPE, 10_000, 10_100))).isFalse();
        assertThat(BreakViews.bendWithGap(bend(BreakKind.BOTH, 10_360, 10_970))).isFalse();
        assertThat(BreakViews.bendWithGap(bend(BreakKind.LEVEL, 10_360, 10_970))).isFalse();
    }

    private static BreakFinding bend(BreakKind kind, double before, double after) {
        Period at = Period.month(2022, 3);
        return new BreakFinding(at, List.of(at.plus(-5), at.plus(4)), before, after, 100 * (after / before - 1), 39,
                0.004, false, 134, kind, 0.5 * before, 0.2 * after, at.plus(11), after * 1.2);
    }

    @Test
    void twoConsecutiveBreaksShareTheirMiddleLevel() {
        Findings f = analyse(series(23, t -> t >= 100 ? 12_000 : t >= 50 ? 16_000 : 10_000));
        assertThat(f.breaks()).as(AnalystNotes.of(f)).hasSizeGreaterThanOrEqualTo(2);
        for (int j = 1; j < f.breaks().size(); j++) {
            BreakFinding first = f.breaks().get(j - 1);
            BreakFinding second = f.breaks().get(j);
            // one fitted line for the middle regime: the two readings differ by its slope times the
            // distance apart (a straight line in logs, or in units), and not at all for a level
            double years = (second.index() - first.index()) / 12.0;
            double inLogs = Math.log(second.levelBefore() / first.levelAfter()) / years - first.slopeAfter() / first.levelAfter();
            double inUnits = (second.levelBefore() - first.levelAfter()) / years - first.slopeAfter();
            assertThat(Math.min(Math.abs(inLogs), Math.abs(inUnits) / first.levelAfter())).isLessThan(1e-6);
        }
        // the overall change is the ratio of fitted levels, not the sum of the steps
        BreakFinding first = f.breaks().get(0);
        BreakFinding last = f.breaks().get(f.breaks().size() - 1);
        double overall = 100 * (last.levelAfter() / first.levelBefore() - 1);
        assertThat(AnalystNotes.of(f)).contains(String.format(java.util.Locale.ROOT, "(%+.1f %%, ratio of the levels)", overall));
    }

    @Test
    void aFallAndAPartialReturnIsOneEpisodeInNeutralWordsWithItsShare() {
        // 10,000 → 6,000 from month 60, → 7,000 from month 100: a quarter of the fall undone
        Findings f = analyse(series(24, t -> t >= 100 ? 7_000 : t >= 60 ? 6_000 : 10_000));
        assertThat(f.episodes()).hasSize(1);
        Episode e = f.episodes().get(0);
        assertThat(e.rise()).isFalse();
        assertThat(e.stepPct()).isCloseTo(-40, within(4.0));   // planted −40 %, our tolerance
        assertThat(e.returnedShare()).isCloseTo(0.25, within(0.08));   // our tolerance for the planted quarter, with noise
        assertThat(Terms.shareOfTheWay(e.returnedShare())).isEqualTo("about a quarter of the way");
        String notes = AnalystNotes.of(f).toLowerCase(java.util.Locale.ROOT);
        assertThat(notes).contains("fell ").doesNotContain("collapse", "recover", "regain", "crash");
    }

    @Test
    void aGradualDeclineThenAStepUpIsNoEpisode() {
        // falling 8 % a year for eight years, then a 20 % step up
        Findings f = analyse(series(25, t -> 10_000 * Math.pow(0.92, t / 12.0) * (t >= 96 ? 1.2 : 1)));
        assertThat(f.breaks()).isNotEmpty();
        assertThat(f.breaks()).noneMatch(b -> b.kind().step() && b.changePct() <= -10);
        assertThat(f.episodes()).isEmpty();
    }

    @Test
    void aOnePeriodIntervalReadsAsOnePeriod() {
        // a 50 % step in 2 % noise is dated to its month
        Findings f = analyse(series(26, t -> t >= 72 ? 15_000 : 10_000));
        BreakFinding b = f.breaks().get(0);
        assertThat(b.ci95().get(0)).isEqualTo(b.ci95().get(1));
        String notes = AnalystNotes.of(f);
        assertThat(notes).contains("95% interval " + b.period() + " only").doesNotContain(b.period() + " to " + b.period());
    }

    @Test
    void aBreakTwoYearsBeforeTheEndIsNotProvisionalOneInTheLastCycleIs() {
        // the rule stated in the README and the appendix: provisional when the interval reaches the latest period
        Findings older = analyse(series(27, t -> t >= 144 - 23 ? 13_000 : 10_000));
        BreakFinding latest = older.breaks().get(older.breaks().size() - 1);
        assertThat(latest.period()).as(AnalystNotes.of(older)).isBetween(START.plus(144 - 26), START.plus(144 - 20));
        assertThat(latest.ci95().get(1)).isLessThan(START.plus(143));
        assertThat(latest.provisional()).isFalse();
        Findings recent = analyse(series(28, t -> t >= 144 - 10 ? 13_000 : 10_000));
        assertThat(recent.breaks()).hasSize(1);
        assertThat(recent.breaks().get(0).provisional()).isTrue();
        assertThat(recent.breaks().get(0).ci95().get(1)).isEqualTo(START.plus(143));
    }

    @Test
    void theProvisionalRuleIsStatedAlikeInTheReadmeAndTheAppendix() throws IOException {
        String readme = Files.readString(Path.of("README.md"), StandardCharsets.UTF_8).replaceAll("\\s+", " ");
        assertThat(readme).contains("its 95 % interval reaches the latest period");
        assertThat(RulesInForce.all()).anySatisfy(r -> assertThat(r.value().replace('\u00A0', ' ')).contains("its 95 % interval reaches the latest period"));
    }

    /**
     * The appendix's episode rule names its refinement (Regimes.episodes): along the stepped line,
     * only a climb beyond where the old line's slope would have carried the level counts as a move
     * back (3 % is DecisionRules.MIN_BREAK_CHANGE_PCT).
     */
    @Test
    void theAppendixEpisodeRuleSaysOnlyAClimbBeyondTheOldSlopeCounts() {
        assertThat(RulesInForce.all()).filteredOn(r -> r.decides().contains("episode")).singleElement()
                .satisfies(r -> assertThat(r.value()).contains("a move back of at least 3\u00A0% beyond where the old line's"
                        + " slope would have carried it"));
    }

    @Test
    void theNileIsStillDatedTo1899AndDescribedAsAStepDown() {
        // R 4.2.2, strucchange: breakpoints(Nile ~ 1) puts the break after 1898 (nile_breakpoints.json)
        double[] nile = Reference.dataset("Nile.csv");
        Series s = Series.builder("Nile", Frequency.ANNUAL).append(Period.year(1871), nile).snapshot();
        Findings f = analyse(s);
        assertThat(f.breaks()).hasSize(1);
        BreakFinding b = f.breaks().get(0);
        assertThat(b.period()).isEqualTo(Period.year(1899));
        assertThat(b.kind()).isEqualTo(BreakKind.LEVEL);
        assertThat(b.changePct()).isNegative();
        assertThat(AnalystNotes.of(f)).contains("1899", "step in level");
    }

    @Test
    void sharesOfTheWayAreWordedByTheNearestFraction() {
        // common practice (no source): the fractions a reader says aloud
        assertThat(Terms.shareOfTheWay(0.27)).isEqualTo("about a quarter of the way");
        assertThat(Terms.shareOfTheWay(0.5)).isEqualTo("about half way");
        assertThat(Terms.shareOfTheWay(0.7)).isEqualTo("about two thirds of the way");
        assertThat(Terms.shareOfTheWay(1.0)).isEqualTo("to about its level before the step");
        assertThat(Terms.shareOfTheWay(1.3)).isEqualTo("past its level before the step");
    }
}
