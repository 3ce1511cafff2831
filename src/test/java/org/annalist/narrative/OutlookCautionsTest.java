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
        // its own 80 % interval holds zero: no clear fall, by the rule the board's table marks it with too
        assertThat(change.pctLo80()).isNegative();
        assertThat(change.pctHi80()).isPositive();
        assertThat(why).startsWith("Next year's " + f.signedPercent(change.pct()) + " is no clear fall (its 80\u00A0% interval, "
                + f.signedPercent(change.pctLo80()) + " to " + f.signedPercent(change.pctHi80())
                + ", includes no change), while the trend since "
                + f.period(trend.from()) + " rises")
                .contains("does not extend the trend line");
        // how the method works is said apart, not as the cause: this market's recent months rose strongly
        assertThat(why).doesNotContain("because").contains(". On this series, ");
        // the base effect: the year set against ran above the trend's pace (its year to date, from the findings)
        double soFar = findings.claims().find(Claim.Quantity.YEAR_TO_DATE).flatMap(Claim::relativePct).orElseThrow();
        assertThat(why).contains(change.againstYear() + " itself ran high: its months so far were "
                + f.signedPercent(soFar) + " on a year earlier");
        // the trend's pace lies inside the change's 80 % interval, and the brief says so with that interval
        assertThat(why).contains(f.signedPercent(change.pctLo80()) + " to " + f.signedPercent(change.pctHi80())
                + ", holds the trend's pace");
    }

    /**
     * The home market's outlook averages three methods of which two have no term for growth: the
     * exponential smoothing model has no trend (its notation's second letter N) and the ARIMA model no
     * drift and one difference (d + D = 1: its forecasts hold the level a year on). Read in the test
     * from the models' notation, the findings' flags must agree, and the page must say it plainly
     * beside the trend it falls short of: before, it said only that the methods "start from the
     * latest level", which holds for every method and explains no −1.0 % against a +1.8 % trend.
     */
    @Test
    void methodsWithoutATermForGrowthAreNamedWhenTheOutlookFallsShortOfTheTrend() {
        OutlookFinding.Model model = findings.outlook().model();
        assertThat(model.members()).hasSize(3);
        for (OutlookFinding.Model m : model.members()) {
            String label = m.label().orElse("");
            java.util.regex.Matcher arima = java.util.regex.Pattern.compile("ARIMA\\(\\d+,(\\d+),\\d+\\)(?:\\(\\d+,(\\d+),\\d+\\))?")
                    .matcher(label);
            boolean expected = switch (m.method()) {
                case ETS -> !label.matches("ETS\\([AM],N,[ANM]\\)");
                case ARIMA -> arima.find() && (label.endsWith("with drift")
                        || Integer.parseInt(arima.group(1)) + (arima.group(2) == null ? 0 : Integer.parseInt(arima.group(2))) >= 2);
                default -> true;
            };
            assertThat(m.trended()).as(m.method() + " " + label).isEqualTo(expected);
        }
        assertThat(model.members().stream().filter(m -> !m.trended()).map(OutlookFinding.Model::method))
                .as("the demo's home market: ETS(M,N,M) and an ARIMA without drift")
                .containsExactly(org.annalist.findings.OutlookMethod.ETS, org.annalist.findings.OutlookMethod.ARIMA);
        String why = OutlookCautions.againstTrend(domestic, findings, f);
        assertThat(why).contains("Two of the three methods averaged, exponential smoothing ("
                + model.members().get(0).label().orElseThrow() + ") and an ARIMA model ("
                + model.members().get(1).label().orElseThrow() + "), have no term for growth (no trend, no drift)")
                .contains("only the Theta method carries a trend, with a third of the weight");
        // the board's short form gives the interval first, which holds the trend's pace here
        assertThat(OutlookCautions.againstTrend(domestic, findings, f, false)).contains("holds the trend's pace");
    }

    /**
     * The long-haul market (same demo file): next year's +1.8 % is slower than the +5.1 % a year since
     * March 2023, and the last twelve months rose by less than that pace: given as a reason, they are
     * said to have risen "only" so much, or "2.4 % above the twelve before" would read as a reason for
     * growth. The figures are read from the findings.
     */
    @Test
    void aSmallerRiseOfTheLastTwelveMonthsIsSaidToBeOnlyThatMuch() throws IOException {
        Series longHaul = new SeriesFileReader(ReadOptions.defaults()).read(Path.of("demo-data/quennelmark-guest-nights.csv"))
                .series().stream().filter(s -> s.name().startsWith("Long-haul")).findFirst().orElseThrow();
        Findings lh = new Analyst().analyse(longHaul);
        Formats lf = Formats.forValues(longHaul.values(), Locale.UK);
        double rolling = lh.claims().find(Claim.Quantity.ROLLING_YEAR).flatMap(Claim::relativePct).orElseThrow();
        double pace = lh.trend().latestRegime().orElseThrow().changePctPerYear();
        assertThat(rolling).isPositive().isLessThan(pace);
        assertThat(OutlookCautions.againstTrend(longHaul, lh, lf))
                .contains("the last twelve months were only " + lf.percent(rolling) + " above the twelve before");
    }

    /** A single method without a term for growth is named as such; one with a trend is not (invented models). */
    @Test
    void aSingleMethodWithoutGrowthIsSaidToHoldTheLevel() {
        var flat = ets("ETS(A,N,A)", false);
        var trended = ets("ETS(A,A,A)", true);
        assertThat(OutlookCautions.withoutGrowth(flat)).contains("the method used, exponential smoothing (ETS(A,N,A)),"
                + " has no term for growth (no trend) and carries the latest level forward with its season");
        assertThat(OutlookCautions.withoutGrowth(trended)).isEmpty();
    }

    /**
     * The reason "the years before the change included" names the rates of the fitted lines, as the
     * structural changes table prints them, and is given only when they lie on the side that would
     * pull the outlook the way it differs. The home market's outlook lies below its trend's pace, and
     * the line before January 2021 rose less steeply than the one since October 2022, whose rate is
     * the trend section's Sen slope (its break findings; the bridged fall between is left out): the
     * reason is given, with both rates; read the other way it would not be.
     */
    /** An exponential smoothing model in its notation (invented), with or without a term for growth. */
    private static OutlookFinding.Model ets(String label, boolean trended) {
        return new OutlookFinding.Model(org.annalist.findings.OutlookMethod.ETS, java.util.Optional.of(label), false,
                java.util.List.of(), trended);
    }

    /** A damped trend (Gardner & McKenzie 1985) is a reason for a slower outlook; an undamped one is not (invented models). */
    @Test
    void aDampedExponentialSmoothingIsSaidToSlowTheGrowthItCarriesForward() {
        var damped = ets("ETS(M,Ad,M)", true);
        var straight = ets("ETS(M,A,M)", true);
        var theta = new OutlookFinding.Model(org.annalist.findings.OutlookMethod.THETA, java.util.Optional.empty(),
                true, java.util.List.of(), true);
        var average = new OutlookFinding.Model(org.annalist.findings.OutlookMethod.COMBINATION, java.util.Optional.empty(),
                false, java.util.List.of(damped, theta), true);
        assertThat(OutlookCautions.dampedTrend(damped)).contains(
                "exponential smoothing (ETS(M,Ad,M)) damps its trend, so the growth it carries forward fades over the forecast");
        assertThat(OutlookCautions.dampedTrend(average)).contains("exponential smoothing (ETS(M,Ad,M)), one of the methods"
                + " averaged, damps its trend, so the growth it carries forward fades over the forecast");
        assertThat(OutlookCautions.dampedTrend(straight)).isEmpty();
        assertThat(OutlookCautions.dampedTrend(new OutlookFinding.Model(org.annalist.findings.OutlookMethod.COMBINATION,
                java.util.Optional.empty(), false, java.util.List.of(straight, theta), true))).isEmpty();
    }

    @Test
    void theEarlierYearsAreGivenAsAReasonOnlyWhenTheBreakTablesRatesBearItOut() {
        var breaks = findings.breaks();
        var first = breaks.get(0);
        var latest = breaks.get(breaks.size() - 1);
        // the table's rates on logs: exp(slope / level) − 1, derived in the test from the break findings
        double before = 100 * Math.expm1(first.slopeBefore() / first.levelBefore());
        double since = 100 * Math.expm1(latest.slopeAfter() / latest.levelAfter());
        assertThat(before).as("the line before the first break rose less steeply than the latest").isLessThan(since);
        assertThat(findings.outlook().nextYearChange().pct()).isLessThan(since);
        String rates = f.signedPercent(before) + " a year before " + f.period(first.period()) + ", against "
                + f.signedPercent(since) + " a year since " + f.period(latest.period());
        assertThat(OutlookCautions.earlierRegimes(domestic, findings, latest.period(), -1, f)).hasValue(rates);
        assertThat(OutlookCautions.againstTrend(domestic, findings, f)).contains("the years before the change in "
                + f.period(latest.period()) + " included, over which the fitted line rose less steeply (" + rates + ")");
        // read the other way (an outlook above the trend's pace), the same rates would not bear the reason out
        assertThat(OutlookCautions.earlierRegimes(domestic, findings, latest.period(), +1, f)).isEmpty();
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
        assertThat(shortWhy).startsWith("Next year's " + f.signedPercent(change.pct()) + " is no clear fall (its 80\u00A0% interval"
                + " includes no change) and runs against the trend since ")
                .endsWith("the difference lies within the outlook's uncertainty (the 80\u00A0% interval of the change, "
                        + f.signedPercent(change.pctLo80()) + " to " + f.signedPercent(change.pctHi80())
                        + ", holds the trend's pace).")
                .doesNotContain("latest level");
    }

    /**
     * Easter 2027 is on 28 March (the published table of Easter dates), so all eight days before it
     * fall in March; the methods carry March's average share of those days over the years fitted, and
     * the outlook moves the two months by the effect. The move is derived here from the definition:
     * on logs, exp(β · (share − average)) − 1.
     */
    @Test
    void anEasterEffectNamesNextEastersDateAndHowFarItMovesTheForecastsOfMarchAndApril() {
        CalendarFinding.Effect easter = findings.calendar().effects().stream()
                .filter(e -> e.name().equals(CalendarFinding.EASTER)).findFirst().orElseThrow();
        assertThat(easter.kept()).as("the demo plants an Easter effect in the home market").isTrue();
        assertThat(findings.transform()).isEqualTo(org.annalist.findings.Transform.LOG);
        // March's share of the 8 days before Easter, averaged over the years fitted (derived in the test)
        double sum = 0;
        int years = 0;
        for (int y = findings.outlook().fittedFrom().year(); y <= 2026; y++) {
            java.time.LocalDate sunday = org.annalist.analysis.calendar.Easter.sunday(y);
            long inMarch = 0;
            for (int d = 1; d <= 8; d++) {
                inMarch += sunday.minusDays(d).getMonthValue() == 3 ? 1 : 0;
            }
            sum += inMarch / 8.0;
            years++;
        }
        double average = sum / years;
        double march = 100 * Math.expm1(easter.coefficient() * (1 - average));
        double april = 100 * Math.expm1(easter.coefficient() * (average - 1));
        String note = OutlookCautions.easter(domestic, findings, f, true);
        assertThat(note).contains("about " + f.percent(easter.effectPct()) + " higher", "move it with Easter's date",
                "Easter 2027 falls on 28 March, with all 8 days before it in March, against "
                        + f.fixed(100 * average, 0) + "\u00A0% of them on average in 2011 to 2026: by the estimated effect,"
                        + " the forecast for March 2027 is set about " + f.percent(march) + " higher and that for April 2027"
                        + " about " + f.percent(-april) + " lower.");
        assertThat(march).as("a late-March Easter in a year fitted mostly on later ones").isGreaterThan(3);
        assertThat(OutlookViews.of(domestic, findings, f, MeasureWords.of(domestic, findings, f)).caveats()).contains(note);
    }

    @Test
    void noEasterWordsWhenTheOutlookStopsBeforeMarch() {
        Findings shortOutlook = new Analyst(java.util.Optional.empty(), java.util.Optional.empty(), java.util.List.of(),
                java.util.Optional.of(3)).analyse(domestic);   // November 2026 to January 2027
        assertThat(OutlookCautions.easter(domestic, shortOutlook, f, true)).isEmpty();
    }
}
