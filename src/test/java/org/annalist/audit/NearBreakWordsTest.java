package org.annalist.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import org.annalist.findings.BreakFinding;
import org.annalist.findings.OutlierFinding;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.ingest.ReadResult;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * What the methods table and the chart captions say about the periods around a structural change
 * agrees with what the breaks section reports there, series by series (the demo's invented guest
 * nights by market, demo-data/quennelmark-guest-nights.csv, whose Long-haul has a one-off, August
 * 2022, inside the 95 % interval of the change from March 2023), and the overview's caption warns
 * that the centred average moves ahead of a sudden change only where the chart holds one.
 */
class NearBreakWordsTest {

    private static final String LAG_ONLY = "the bars there show that lag rather than one-offs";
    private static final String LEAD = "A centred average starts to move up to half a year before a sudden change.";

    @Test
    void theMethodsLineAndTheIrregularCaptionNameTheOneOffsInsideABreaksInterval() {
        ReadResult file = new SeriesFileReader(ReadOptions.defaults()).read(Path.of("demo-data/quennelmark-guest-nights.csv"));
        boolean sawOne = false;
        for (String name : List.of("Total", "Domestic", "Brevania", "Long-haul")) {
            AuditedBrief brief = AuditedBrief.of(name, file.require(name));
            List<OutlierFinding> inside = brief.findings().outliers().stream()
                    .filter(o -> brief.findings().breaks().stream().anyMatch(b -> within(o.period(), b)))
                    .toList();
            String text = brief.text();
            if (inside.isEmpty()) {
                assertThat(text).as(name).doesNotContain("is reported as well").doesNotContain("are reported as well");
                if (!brief.findings().breaks().isEmpty()) {
                    assertThat(text).as(name).contains(LAG_ONLY);
                }
                continue;
            }
            sawOne = true;
            String first = text.substring(text.indexOf("95\u00A0% interval of the structural change from") - 60);
            assertThat(first).as(name).contains("It is reported as a one-off as well");
            // before: "none reported next to a break" and "rather than one-offs", against the breaks section
            assertThat(text).as(name).doesNotContain("none reported next to a break").doesNotContain(LAG_ONLY)
                    .contains("structural change's 95\u00A0% interval, " + (inside.size() == 1 ? "is" : "are")
                            + " reported as well")
                    .contains("the bars there show that lag, apart from ");
            assertThat(text).as(name).contains(inside.size() == 1 ? "reported as a one-off above" : "reported as one-offs above");
        }
        assertThat(sawOne).as("Long-haul's August 2022 lies inside the interval of the change from March 2023").isTrue();
    }

    @Test
    void theIrregularShareTheCaptionAndTheAppendixAgreeOnThePeriodsLeftOutAroundBreaks() {
        ReadResult file = new SeriesFileReader(ReadOptions.defaults()).read(Path.of("demo-data/quennelmark-guest-nights.csv"));
        for (String name : List.of("Total", "Domestic", "Brevania", "Long-haul")) {
            AuditedBrief brief = AuditedBrief.of(name, file.require(name));
            int leftOut = brief.findings().irregular().leftOutNearBreaks();
            // the demo's January 2021 collapse is a step in every market (demo-data/README.md)
            assertThat(leftOut).as(name).isPositive();
            String text = brief.text().replaceAll("\\s+", " ");
            assertThat(text).as(name).contains("leaving out the " + leftOut + " months around its structural")
                    .contains("The share above leaves those periods out.");
            long sentences = text.split("leaving out the " + leftOut + " months", -1).length - 1;
            assertThat(sentences).as(name + ": the section and the methods row").isEqualTo(2);
        }
    }

    private static boolean within(Period p, BreakFinding b) {
        return b.ci95().get(0).compareTo(p) <= 0 && p.compareTo(b.ci95().get(1)) <= 0;
    }

    @Test
    void theOverviewCaptionWarnsOfTheAveragesLeadOnlyWhereTheChartHoldsASuddenChange() {
        ReadResult file = new SeriesFileReader(ReadOptions.defaults()).read(Path.of("demo-data/quennelmark-guest-nights.csv"));
        // the demo's January 2021 collapse is a step in every market
        assertThat(AuditedBrief.of("long-haul", file.require("Long-haul")).text()).contains(LEAD);
        // a steady series with a season and nothing sudden (invented)
        Random random = new Random(5);
        double[] x = new double[96];
        for (int t = 0; t < x.length; t++) {
            x[t] = Math.round(1_000 * Math.pow(1.02, t / 12.0) * (1 + 0.3 * Math.sin(2 * Math.PI * t / 12))
                    * Math.exp(0.01 * random.nextGaussian()));
        }
        AuditedBrief steady = AuditedBrief.of("steady", Series.builder("arrivals", Frequency.MONTHLY)
                .append(Period.month(2017, 1), x).snapshot());
        assertThat(steady.findings().breaks()).isEmpty();
        assertThat(steady.text()).doesNotContain("before a sudden change");
    }

    @Test
    void a2x12CentredAverageLeavesTheOldLevelSixMonthsBeforeAStep() {
        // a flat level of 100 that steps to 50 in January 2021 (invented, no season, no noise)
        double[] x = new double[72];
        for (int t = 0; t < x.length; t++) {
            x[t] = t < 36 ? 100 : 50;
        }
        Series s = Series.builder("arrivals", Frequency.MONTHLY).append(Period.month(2018, 1), x).snapshot();
        double[] line = AuditedBrief.of("step", s).findings().smoothing().trendCycle();
        int first = -1;
        for (int t = 0; t < line.length; t++) {
            if (!Double.isNaN(line[t]) && Math.abs(line[t] - 100) > 1e-9) {
                first = t;
                break;
            }
        }
        // derived in the test: the 2×12 average at t weighs t − 6 … t + 6, so it first takes in the step at 36 − 6
        assertThat(first).isEqualTo(30);
    }
    @Test
    void theOverviewCaptionSaysWhyItsLinesBreakAtAMissingValue() {
        // a steady seasonal series with March 2019 missing (invented)
        double[] x = new double[96];
        for (int t = 0; t < x.length; t++) {
            x[t] = Math.round(1_000 * (1 + 0.3 * Math.sin(2 * Math.PI * t / 12)));
        }
        x[26] = Double.NaN;
        AuditedBrief gap = AuditedBrief.of("gap", Series.builder("arrivals", Frequency.MONTHLY)
                .append(Period.month(2017, 1), x).snapshot());
        // derived in the test: a 2×12 average needs the 13 values t − 6 … t + 6, so one gap blanks 13 points
        assertThat(gap.text()).contains("The lines break where a value is missing (March 2019); the trend-cycle "
                + "breaks for 13 months there, as long as a missing value lies within its average.");

        x[26] = 1_000;
        AuditedBrief whole = AuditedBrief.of("whole", Series.builder("arrivals", Frequency.MONTHLY)
                .append(Period.month(2017, 1), x).snapshot());
        assertThat(whole.text()).doesNotContain("The lines break");
    }
}
