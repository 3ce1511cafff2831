package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import org.annalist.findings.Analyst;
import org.annalist.findings.CalendarFinding;
import org.annalist.findings.Claim;
import org.annalist.findings.Findings;
import org.annalist.findings.OutlookFinding;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.series.Series;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;

/**
 * The outlook page's cautions on the demo's home market (invented data, demo-data/README.md): a
 * rising trend since its latest break beside a forecast fall for next year, and a kept Easter
 * effect beside forecasts for March and April. Every figure checked is read from the findings.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class OutlookCautionsTest {

    private Series domestic;
    private Findings findings;
    private Formats f;

    @BeforeAll
    void analyseTheHomeMarket() throws IOException {
        domestic = new SeriesFileReader(ReadOptions.defaults()).read(Path.of("demo-data/quennelmark-guest-nights.csv"))
                .series().stream().filter(s -> s.name().startsWith("Domestic")).findFirst().orElseThrow();
        findings = new Analyst().analyse(domestic);
        f = Formats.forValues(domestic.values(), Locale.UK);
    }

    @Test
    void aForecastFallBesideARisingTrendIsExplainedFromTheFindings() {
        OutlookFinding.YearChange change = findings.outlook().nextYearChange();
        Claim trend = findings.claims().pageTrend().orElseThrow();
        // the demo's home market: rising since its latest break, next year forecast lower (the reviewer's case)
        assertThat(trend.quantity()).isEqualTo(Claim.Quantity.TREND_SINCE_BREAK);
        assertThat(change.pct()).isNegative();
        String why = OutlookCautions.againstTrend(domestic, findings, f);
        // its own 80 % interval holds zero: the change points down, it is not called a fall
        assertThat(change.pctLo80()).isNegative();
        assertThat(change.pctHi80()).isPositive();
        assertThat(why).startsWith("Next year's " + f.signedPercent(change.pct())
                + " points down (its 80\u00A0% interval also holds no change), while the trend since "
                + f.period(trend.from()) + " rises")
                .contains("does not extend the trend line", "fitted on all values from "
                        + f.period(findings.outlook().fittedFrom()));
        // how the method works is said apart, not as the cause: this market's recent months rose strongly
        assertThat(why).doesNotContain("because").contains(". On this series, ", "the outlook is fitted on all values from ");
        // the base effect: the year set against ran above the trend's pace (its year to date, from the findings)
        double soFar = findings.claims().find(Claim.Quantity.YEAR_TO_DATE).flatMap(Claim::relativePct).orElseThrow();
        assertThat(why).contains(change.againstYear() + " itself ran high: its months so far were "
                + f.signedPercent(soFar) + " on a year earlier");
        // the trend's pace lies inside the change's 80 % interval, and the brief says so with that interval
        assertThat(why).contains(f.signedPercent(change.pctLo80()) + " to " + f.signedPercent(change.pctHi80())
                + ", holds the trend's pace");
    }

    /**
     * The board's short section gives one reason, read from the evidence: here the trend's pace lies
     * inside the change's 80 % interval. How the method works is not offered as the cause (the
     * reviewer read "the outlook starts from the latest level" as one).
     */
    @Test
    void theShortSectionGivesTheUncertaintyAsItsReasonWhenTheIntervalHoldsTheTrendsPace() {
        OutlookFinding.YearChange change = findings.outlook().nextYearChange();
        String shortWhy = OutlookCautions.againstTrend(domestic, findings, f, false);
        assertThat(shortWhy).startsWith("Next year's " + f.signedPercent(change.pct()) + " points down against the trend since ")
                .endsWith("the difference lies within the outlook's uncertainty (the 80\u00A0% interval of the change, "
                        + f.signedPercent(change.pctLo80()) + " to " + f.signedPercent(change.pctHi80())
                        + ", holds the trend's pace).")
                .doesNotContain("latest level");
    }

    @Test
    void anEasterEffectIsSaidNotToMoveWithTheDateWhenTheOutlookReachesMarchOrApril() {
        CalendarFinding.Effect easter = findings.calendar().effects().stream()
                .filter(e -> e.name().equals(CalendarFinding.EASTER)).findFirst().orElseThrow();
        assertThat(easter.kept()).as("the demo plants an Easter effect in the home market").isTrue();
        String note = OutlookCautions.easter(findings, f, true);
        assertThat(note).contains("about " + f.percent(easter.effectPct()) + " higher", "do not move it with Easter's date",
                "wherever Easter falls in 2027");
        assertThat(OutlookViews.of(domestic, findings, f, MeasureWords.of(domestic, findings, f)).caveats()).contains(note);
    }

    @Test
    void noEasterWordsWhenTheOutlookStopsBeforeMarch() {
        Findings shortOutlook = new Analyst(java.util.Optional.empty(), java.util.Optional.empty(), java.util.List.of(),
                java.util.Optional.of(3)).analyse(domestic);   // November 2026 to January 2027
        assertThat(OutlookCautions.easter(shortOutlook, f, true)).isEmpty();
    }
}
