package org.annalist.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.time.Month;
import java.time.format.TextStyle;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.annalist.findings.Analyst;
import org.annalist.findings.BreakFinding;
import org.annalist.findings.BreakKind;
import org.annalist.findings.DecisionRules;
import org.annalist.findings.Episode;
import org.annalist.findings.Form;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.ReadResult;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * What a sceptical reader set side by side in the demo's Long-haul brief now agrees, series by
 * series: a change of slope whose lines stay apart against the rule that keeps a gap only where a
 * bend fits worse; an episode's return against the level its closing break prints; and the first
 * page's trend against the break's uncertain date and the latest month's fall. Demo data invented
 * (demo-data/quennelmark-guest-nights.csv, see its README); the planted series invented here.
 */
class BreakFiguresAndLeadAgreeTest {

    private static final List<String> MARKETS = List.of("Total", "Domestic", "Brevania", "Long-haul");

    private static ReadResult demo() {
        return new SeriesFileReader(ReadOptions.defaults()).read(Path.of("demo-data/quennelmark-guest-nights.csv"));
    }

    /** A month as the brief writes it: {@code March 2023}. */
    private static String month(Period p) {
        return Month.of(p.seasonalPosition()).getDisplayName(TextStyle.FULL, Locale.UK) + " " + p.year();
    }

    @Test
    void aChangeOfSlopeWhoseLinesStayApartSaysABendFitsWorseAsTheMethodsRuleHasIt() {
        ReadResult file = demo();
        int gaps = 0;
        for (String name : MARKETS) {
            AuditedBrief brief = AuditedBrief.of(name, file.require(name));
            String text = brief.text();
            assertThat(text).as(name).doesNotContain("about as well");
            for (BreakFinding b : brief.findings().breaks()) {
                if (b.kind() != BreakKind.SLOPE || Math.abs(b.changePct()) < DecisionRules.MIN_BREAK_CHANGE_PCT) {
                    continue;
                }
                gaps++;
                String at = text.substring(text.indexOf("in " + month(b.period()) + " a change of slope"));
                assertThat(at).as(name + " " + b.period()).contains("apart at the break: a bend without that gap fits"
                        + " the data worse, but not by enough to call the break a step as well");
            }
            if (!brief.findings().breaks().isEmpty()) {
                assertThat(text).as(name).contains("a gap at a break only if a bend fits worse (F-test)");
            }
        }
        // the demo's Long-haul has two such changes of slope (March 2022 and March 2023)
        assertThat(gaps).isPositive();
    }

    @Test
    void anEpisodesReturnIsTheLevelItsClosingBreakPrintsJustBeforeIt() {
        // EpisodeStepBackTest's invented fall of January 2020 whose climb back ends at the step of October 2021
        Series planted = EpisodeStepBackTest.climbThenStepDown();
        AuditedBrief brief = AuditedBrief.of("planted", planted,
                new Analyst(Optional.of(Form.MULTIPLICATIVE), Optional.empty(), List.of(), Optional.of(0)).analyse(planted));
        assertThat(closedEpisodesAgree(brief)).as("the planted climb back is closed by a break").isPositive();
        ReadResult file = demo();
        int closed = 0;
        for (String name : MARKETS) {
            closed += closedEpisodesAgree(AuditedBrief.of(name, file.require(name)));
        }
        // the demo's Long-haul climb back ends at the change of March 2023
        assertThat(closed).isPositive();
    }

    /** The episodes closed by a later break, each checked against it; how many there were. */
    private static int closedEpisodesAgree(AuditedBrief brief) {
        int closed = 0;
        for (Episode e : brief.findings().episodes()) {
            Optional<BreakFinding> closing = brief.findings().breaks().stream()
                    .filter(b -> b.period().equals(e.asOf().plus(1))).findFirst();
            if (closing.isEmpty()) {
                continue;
            }
            closed++;
            BreakFinding b = closing.get();
            // one moment, one figure: the regime's line at the break that ends it
            assertThat(e.returnedLevel()).as(brief.label()).isEqualTo(b.levelBefore());
            String text = brief.text();
            Matcher m = Pattern.compile("([0-9][0-9,.]*) just before " + month(b.period()) + ": ").matcher(text);
            assertThat(m.find()).as(brief.label() + ": the episode's level, read at " + b.period()).isTrue();
            assertThat(text).as(brief.label()).contains("fitted level " + m.group(1) + " just before");
        }
        return closed;
    }

    @Test
    void theLeadGivesALooselyDatedRegimesStartAsAboutWithItsInterval() {
        ReadResult file = demo();
        boolean sawLoose = false;
        for (String name : MARKETS) {
            AuditedBrief brief = AuditedBrief.of(name, file.require(name));
            List<BreakFinding> breaks = brief.findings().breaks();
            String lead = brief.section("lead");
            if (breaks.isEmpty() || brief.findings().trend().latestRegime().isEmpty()) {
                continue;
            }
            BreakFinding latest = breaks.get(breaks.size() - 1);
            // derived in the test: the interval's ends a year (12 months) or more apart
            boolean loose = latest.ci95().get(0).until(latest.ci95().get(1)) >= 12 * DecisionRules.VAGUE_START_YEARS;
            if (loose) {
                sawLoose = true;
                assertThat(lead).as(name).contains("Since about " + month(latest.period()) + " (the change may have begun"
                        + " between " + month(latest.ci95().get(0)) + " and " + month(latest.ci95().get(1)) + ")");
            } else {
                assertThat(lead).as(name).doesNotContain("Since about");
            }
        }
        // the demo's Long-haul change of March 2023 is dated July 2022 to February 2024
        assertThat(sawLoose).isTrue();
    }

    @Test
    void aLatestMonthBelowAYearEarlierIsSaidBesideARisingTrend() {
        // invented: 10 monthly years from 2016 rising 4 % a year, a ±30 % season, 1 % noise (seed 11),
        // the latest month, October 2025, 8 % below where the line would have put it
        Random random = new Random(11);
        double[] x = new double[118];
        for (int t = 0; t < x.length; t++) {
            x[t] = Math.round(20_000 * Math.pow(1.04, t / 12.0) * (1 + 0.3 * Math.sin(2 * Math.PI * (t - 3) / 12))
                    * Math.exp(0.01 * random.nextGaussian()) * (t == x.length - 1 ? 0.92 : 1));
        }
        Series series = Series.builder("nights", Frequency.MONTHLY).append(Period.month(2016, 1), x).snapshot();
        AuditedBrief brief = AuditedBrief.of("planted", series);
        // derived in the test: October 2025 against October 2024, from the values themselves
        double change = 100 * (x[x.length - 1] / x[x.length - 13] - 1);
        assertThat(change).isLessThan(-DecisionRules.MATERIAL_CHANGE_PCT);
        assertThat(brief.section("lead")).contains("has been rising")
                .contains("although October 2025 itself was below October 2024");
        // the same series with its latest month as the line puts it: no such clause
        double[] steady = x.clone();
        steady[steady.length - 1] = Math.round(steady[steady.length - 1] / 0.92);
        AuditedBrief plain = AuditedBrief.of("steady", Series.builder("nights", Frequency.MONTHLY)
                .append(Period.month(2016, 1), steady).snapshot());
        assertThat(plain.section("lead")).contains("has been rising").doesNotContain("itself was below");
    }
}
