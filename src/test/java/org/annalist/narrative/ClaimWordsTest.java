package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Locale;
import org.annalist.findings.Claim;
import org.annalist.findings.Measure;
import org.annalist.findings.Claims;
import org.annalist.findings.ClaimsFixture;
import org.annalist.findings.Direction;
import org.annalist.series.Period;
import org.junit.jupiter.api.Test;

/** The first page's sentences and trend tile say what the claims say (hand-made findings, numbers invented). */
class ClaimWordsTest {

    private static final Period END = Period.month(2026, 10);

    private static ClaimWords words(Claims claims) {
        return new ClaimWords(claims, Formats.forValues(new double[] {100_000}, Locale.ENGLISH), "nights", Measure.FLOW);
    }

    @Test
    void theTrendTileShowsTheSlopeSinceTheLatestBreakAndNamesItsSpan() {
        Claims claims = ClaimsFixture.monthly(END, 190).latest(1).yearToDate(4).rollingYear(4)
                .wholeTrend(Direction.INCREASING, 1.9, 0.0001).step(Period.month(2022, 8), 4)
                .sinceBreak(Period.month(2022, 8), Direction.INCREASING, 2935, 0.0001).findings().claims();
        String[] tile = words(claims).trendTile();
        // 2935 to three significant digits (Formats.significant); not the whole period's +1.9 % a year
        // a monthly flow: the slope is the change of a month's nights each year, not of the year's
        // the tile's value is short; its note says what the slope is a year of
        assertThat(tile[0]).isEqualTo("+2,940 a\u00a0year");
        assertThat(tile[1]).startsWith("since August 2022; in each month's total; Sen slope");
    }

    @Test
    void aMonthlyFlowsSlopeIsSaidAsAYearlyChangeInEachMonthsTotalAndInTheYearsTotal() {
        Claims claims = ClaimsFixture.monthly(END, 190).latest(1).yearToDate(4).rollingYear(4)
                .wholeTrend(Direction.INCREASING, 1.9, 0.0001).step(Period.month(2022, 8), 4)
                .sinceBreak(Period.month(2022, 8), Direction.INCREASING, 2935, 0.0001).findings().claims();
        ClaimWords words = words(claims);
        assertThat(words.trendSentence())
                // derived in the test: 2,935 prints as 2,940; 2,940 × 12 = 35,280, three significant digits 35,300
                .startsWith("Since August 2022 the level has been rising, by about 2,940\u00a0nights a year in each month's total"
                        + " (about 35,300\u00a0nights a year in the year's total; p");
        // analyze's claim lines size the same claim in the same words
        assertThat(words.signedSize(claims.find(Claim.Quantity.TREND_SINCE_BREAK).orElseThrow()))
                .isEqualTo("+2,940\u00a0nights a year in each month's total");
    }

    @Test
    void aStocksSlopeStaysAYearBecauseItsLevelIsNotSummed() {
        Claims claims = ClaimsFixture.monthly(END, 190).latest(1).yearToDate(4).rollingYear(4)
                .wholeTrend(Direction.INCREASING, 1.9, 0.0001).step(Period.month(2022, 8), 4)
                .sinceBreak(Period.month(2022, 8), Direction.INCREASING, 2935, 0.0001).findings().claims();
        ClaimWords beds = new ClaimWords(claims, Formats.forValues(new double[] {100_000}, Locale.ENGLISH), "beds",
                Measure.LEVEL);
        assertThat(beds.trendTile()[0]).isEqualTo("+2,940\u00a0beds a year");
    }

    @Test
    void anUncertainStartIsSaidAsAboutWithItsIntervalAndALatestFallBesideARisingTrend() {
        Period at = Period.month(2023, 3);
        Claims claims = ClaimsFixture.monthly(END, 190).latest(-4.3).yearToDate(2.7).rollingYear(2.4)
                .bend(at, Period.month(2022, 7), Period.month(2024, 2))
                .sinceBreak(at, Direction.INCREASING, 753, 0.0001).findings().claims();
        ClaimWords words = words(claims);
        assertThat(words.trendSentence()).startsWith("Since about March 2023 (the change may have begun between July 2022"
                + " and February 2024) the level has been rising, by about 753\u00a0nights")
                .endsWith(", although October 2026 itself was below October 2025.");
        assertThat(words.trendTile()[1]).startsWith("since about March 2023; ");
        assertThat(words.trendCell()).isEqualTo("increasing since about Mar 2023");
    }

    @Test
    void aQualifiedRisingTrendIsWordedWithTheRollingYearThatFell() {
        Claims claims = ClaimsFixture.monthly(END, 190).latest(0.5).yearToDate(-4.0).rollingYear(-1.8)
                .wholeTrend(Direction.INCREASING, 1.9, 0.0001).step(Period.month(2022, 8), 4)
                .sinceBreak(Period.month(2022, 8), Direction.INCREASING, 2900, 0.0001).findings().claims();
        ClaimWords words = words(claims);
        assertThat(words.trendSentence()).startsWith("Since August 2022 the level has been rising")
                .endsWith(", although the last twelve months were 1.8\u00A0% below the twelve before.");
        assertThat(words.trendTile()[1]).endsWith("last twelve months \u22121.8\u00A0%");
    }

    @Test
    void aFlatLatestRegimeAfterARecentStepLeadsWithTheStepAndSaysNoClearTrendSinceIt() {
        Period stepAt = Period.month(2024, 10);
        Claims claims = ClaimsFixture.monthly(END, 180).latest(0.3).yearToDate(-0.5).rollingYear(-0.2)
                .wholeTrend(Direction.DECREASING, -1.7, 0.001).step(stepAt, -20)
                .sinceBreak(stepAt, Direction.NONE, 120, 0.6).findings().claims();
        ClaimWords words = words(claims);
        assertThat(words.stepSentence()).startsWith("From October 2024 the level stepped down by 20.0\u00A0%");
        assertThat(words.trendSentence())
                .isEqualTo("Since October 2024 the level has shown no clear direction, whereas over the whole period it fell.");
        assertThat(words.trendTile()[0]).isEqualTo("no clear trend");
        assertThat(words.trendTile()[1]).startsWith("since October 2024");
        assertThat(words.trendSentence()).doesNotContain("1.7");
    }

    @Test
    void aWithheldTrendIsNotGivenADirectionOnTheTile() {
        Claims claims = ClaimsFixture.monthly(END, 120).latest(-7).yearToDate(-8).rollingYear(-6)
                .wholeTrend(Direction.INCREASING, 2.0, 0.001).findings().claims();
        ClaimWords words = words(claims);
        assertThat(words.trendTile()[0]).isEqualTo("not stated");
        assertThat(words.trendSentence()).doesNotContain("been rising");
    }
}
