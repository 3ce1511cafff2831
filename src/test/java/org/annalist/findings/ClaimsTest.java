package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Optional;
import org.annalist.findings.Claim.Quantity;
import org.annalist.findings.Claim.QualifyReason;
import org.annalist.findings.Claim.Status;
import org.annalist.findings.Claim.WithholdReason;
import org.annalist.series.Period;
import org.junit.jupiter.api.Test;

/**
 * The consistency pass and the headline's choice, on hand-made findings (every number invented;
 * the thresholds they are set against are {@link DecisionRules}' our-rule values).
 */
class ClaimsTest {

    private static final Period END = Period.month(2026, 10);

    @Test
    void aRisingTrendSinceTheBreakBesideAFallingYearToDateAndRollingYearIsQualifiedByTheRollingYear() {
        Claims claims = ClaimsFixture.monthly(END, 190).latest(0.5).yearToDate(-4.0).rollingYear(-1.8)
                .wholeTrend(Direction.INCREASING, 1.9, 0.0001)
                .step(Period.month(2022, 8), 4).sinceBreak(Period.month(2022, 8), Direction.INCREASING, 2900, 0.0001)
                .findings().claims();
        Claim since = claims.find(Quantity.TREND_SINCE_BREAK).orElseThrow();
        assertThat(since.status()).isEqualTo(Status.QUALIFIED);
        assertThat(since.qualification(QualifyReason.RECENT_CHANGE_OPPOSES).orElseThrow().by())
                .isEqualTo(Quantity.ROLLING_YEAR);
        // neither −4.0 % nor −1.8 % is a contradicting fall of 5 % on its own: qualified, not withheld
        assertThat(since.said()).isTrue();
    }

    @Test
    void aTrendIsWithheldWhenTheYearToDateAndTheRollingYearBothFellByAContradictingAmount() {
        Claims claims = ClaimsFixture.monthly(END, 120).latest(-7).yearToDate(-8).rollingYear(-6)
                .wholeTrend(Direction.INCREASING, 2.0, 0.001).findings().claims();
        Claim whole = claims.find(Quantity.TREND_WHOLE).orElseThrow();
        assertThat(whole.status()).isEqualTo(Status.WITHHELD);
        assertThat(whole.withheld().orElseThrow().reason()).isEqualTo(WithholdReason.RECENT_CHANGES_CONTRADICT);
        assertThat(claims.pageTrend()).isEmpty();
        assertThat(claims.headline().orElseThrow().quantity()).isEqualTo(Quantity.LATEST_VS_YEAR_EARLIER);
    }

    @Test
    void aRecentChangeGoingTheSameWayOrBelowTheMaterialSizeLeavesTheTrendAsStated() {
        Claims same = ClaimsFixture.monthly(END, 120).latest(3).yearToDate(4).rollingYear(3)
                .wholeTrend(Direction.INCREASING, 2.0, 0.001).findings().claims();
        assertThat(same.find(Quantity.TREND_WHOLE).orElseThrow().status()).isEqualTo(Status.STATED);
        Claims small = ClaimsFixture.monthly(END, 120).latest(3).yearToDate(-0.4).rollingYear(-0.9)
                .wholeTrend(Direction.INCREASING, 2.0, 0.001).findings().claims();
        assertThat(small.find(Quantity.TREND_WHOLE).orElseThrow().status()).isEqualTo(Status.STATED);
    }

    @Test
    void aFlatLatestRegimeAfterALargeRecentStepMakesTheStepTheHeadlineNotTheWholePeriodsTrend() {
        Period stepAt = Period.month(2024, 10);   // two years before the latest period
        Claims claims = ClaimsFixture.monthly(END, 180).latest(0.3).yearToDate(-0.5).rollingYear(-0.2)
                .wholeTrend(Direction.DECREASING, -1.7, 0.001)
                .step(Period.month(2016, 3), 8).step(stepAt, -20)
                .sinceBreak(stepAt, Direction.NONE, 120, 0.6).findings().claims();
        Claim headline = claims.headline().orElseThrow();
        assertThat(headline.quantity()).isEqualTo(Quantity.BREAK_STEP);
        assertThat(headline.from()).isEqualTo(stepAt);
        assertThat(headline.direction()).isEqualTo(Direction.DECREASING);
        Claim whole = claims.find(Quantity.TREND_WHOLE).orElseThrow();
        assertThat(whole.withheld().orElseThrow().reason()).isEqualTo(WithholdReason.LATEST_REGIME_PREFERRED);
        Claim since = claims.pageTrend().orElseThrow();
        assertThat(since.quantity()).isEqualTo(Quantity.TREND_SINCE_BREAK);
        assertThat(since.qualification(QualifyReason.LONGER_RUN_DIFFERS)).isPresent();
    }

    @Test
    void aLargeStepLongerAgoThanTheRecentWindowDoesNotLead() {
        Period old = END.plus(-12L * DecisionRules.RECENT_BREAK_YEARS);
        Claims claims = ClaimsFixture.monthly(END, 180).latest(2.5).yearToDate(2).rollingYear(2)
                .step(old, -30).sinceBreak(old, Direction.INCREASING, 900, 0.01).findings().claims();
        assertThat(claims.headline().orElseThrow().quantity()).isEqualTo(Quantity.LATEST_VS_YEAR_EARLIER);
    }

    @Test
    void aSmallLatestChangeGivesTheLeadToATrendWithADirection() {
        Claims claims = ClaimsFixture.monthly(END, 120).latest(0.4).yearToDate(2).rollingYear(2.5)
                .wholeTrend(Direction.INCREASING, 2.2, 0.001).findings().claims();
        assertThat(claims.headline().orElseThrow().quantity()).isEqualTo(Quantity.TREND_WHOLE);
    }

    @Test
    void aWholePeriodTrendAcrossBreaksWithoutARegimeOfItsOwnIsQualified() {
        Claims claims = ClaimsFixture.monthly(END, 120).latest(2).yearToDate(2).rollingYear(2)
                .wholeTrend(Direction.DECREASING, -1.7, 0.01).step(Period.month(2026, 2), -5).findings().claims();
        assertThat(claims.find(Quantity.TREND_WHOLE).orElseThrow().qualification(QualifyReason.SPANS_BREAKS))
                .isPresent();
    }

    @Test
    void aCalendarAdjustedChangeLeadsAndQualifiesTheChangeAsCounted() {
        Findings findings = ClaimsFixture.monthly(END, 120).latest(7.6).yearToDate(2).rollingYear(2)
                .wholeTrend(Direction.INCREASING, 2.0, 0.001).findings();
        Claims claims = Claims.of(findings, Optional.of(new Claims.AdjustedChange(-300, Optional.of(-0.3))));
        Claim latest = claims.pageLatest().orElseThrow();
        assertThat(latest.quantity()).isEqualTo(Quantity.LATEST_CALENDAR_ADJUSTED);
        assertThat(latest.direction()).isEqualTo(Direction.DECREASING);
        assertThat(claims.find(Quantity.LATEST_VS_YEAR_EARLIER).orElseThrow().qualification(QualifyReason.CALENDAR_EFFECT))
                .isPresent();
        // −0.3 % is not material: the trend leads, not the Easter-made +7.6 %
        assertThat(claims.headline().orElseThrow().quantity()).isEqualTo(Quantity.TREND_WHOLE);
    }

    @Test
    void aTrendSinceABreakDatedNoCloserThanAYearStartsAboutItsDateWithTheInterval() {
        Period at = Period.month(2023, 3);
        // 19 months between the interval's ends: at least VAGUE_START_YEARS (1) of 12 months
        Claim vague = ClaimsFixture.monthly(END, 190).latest(2).yearToDate(3).rollingYear(2.5)
                .bend(at, Period.month(2022, 7), Period.month(2024, 2))
                .sinceBreak(at, Direction.INCREASING, 750, 0.0001).findings().claims()
                .find(Quantity.TREND_SINCE_BREAK).orElseThrow();
        Claim.Qualification q = vague.qualification(QualifyReason.START_UNCERTAIN).orElseThrow();
        assertThat(q.within()).containsExactly(Period.month(2022, 7), Period.month(2024, 2));
        assertThat(vague.said()).isTrue();
        // 11 months between the ends: below a year, the date stands as it is
        Claim dated = ClaimsFixture.monthly(END, 190).latest(2).yearToDate(3).rollingYear(2.5)
                .bend(at, Period.month(2022, 9), Period.month(2023, 8))
                .sinceBreak(at, Direction.INCREASING, 750, 0.0001).findings().claims()
                .find(Quantity.TREND_SINCE_BREAK).orElseThrow();
        assertThat(dated.qualification(QualifyReason.START_UNCERTAIN)).isEmpty();
        assertThat(dated.status()).isEqualTo(Status.STATED);
    }

    @Test
    void aLatestPeriodThatFellOnAYearEarlierQualifiesARisingTrendThoughTheYearRose() {
        Period at = Period.month(2023, 3);
        Claim since = ClaimsFixture.monthly(END, 190).latest(-4.3).yearToDate(2.7).rollingYear(2.4)
                .step(at, 4).sinceBreak(at, Direction.INCREASING, 750, 0.0001).findings().claims()
                .find(Quantity.TREND_SINCE_BREAK).orElseThrow();
        assertThat(since.status()).isEqualTo(Status.QUALIFIED);
        assertThat(since.qualification(QualifyReason.LATEST_PERIOD_OPPOSES).orElseThrow().by())
                .isEqualTo(Quantity.LATEST_VS_YEAR_EARLIER);
        // the year to date and the rolling year rose with it: nothing else qualifies it
        assertThat(since.qualification(QualifyReason.RECENT_CHANGE_OPPOSES)).isEmpty();
        // −0.5 % is below the material 1 %: stated as it is
        Claim small = ClaimsFixture.monthly(END, 190).latest(-0.5).yearToDate(2.7).rollingYear(2.4)
                .step(at, 4).sinceBreak(at, Direction.INCREASING, 750, 0.0001).findings().claims()
                .find(Quantity.TREND_SINCE_BREAK).orElseThrow();
        assertThat(small.status()).isEqualTo(Status.STATED);
    }

    @Test
    void aLatestFallMadeByTheCalendarDoesNotQualifyTheTrend() {
        Findings findings = ClaimsFixture.monthly(END, 120).latest(-4.3).yearToDate(2).rollingYear(2)
                .wholeTrend(Direction.INCREASING, 2.0, 0.001).findings();
        // the calendar-adjusted change, +0.6 %, is the one the page quotes, and it did not fall
        Claims claims = Claims.of(findings, Optional.of(new Claims.AdjustedChange(600, Optional.of(0.6))));
        assertThat(claims.find(Quantity.TREND_WHOLE).orElseThrow().qualification(QualifyReason.LATEST_PERIOD_OPPOSES))
                .isEmpty();
    }

    @Test
    void noTwoSaidClaimsAboutTheTrendOfTheFirstPageDisagreeInDirection() {
        Claims claims = ClaimsFixture.monthly(END, 190).latest(1).yearToDate(3).rollingYear(3)
                .wholeTrend(Direction.DECREASING, -1.0, 0.01).step(Period.month(2022, 8), 12)
                .sinceBreak(Period.month(2022, 8), Direction.INCREASING, 2000, 0.001).findings().claims();
        assertThat(claims.statements().stream().filter(Claim::said)
                .filter(c -> c.quantity() == Quantity.TREND_WHOLE || c.quantity() == Quantity.TREND_SINCE_BREAK)
                .map(Claim::direction).distinct()).hasSize(1);
    }
}
