package org.annalist.series;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.LocalDate;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.junit.jupiter.api.Test;

class PeriodTest {

    @Test
    void labelsFollowTheFindingsContract() {
        assertThat(Period.year(1898).label()).isEqualTo("1898");
        assertThat(Period.quarter(1960, 1).label()).isEqualTo("1960-Q1");
        assertThat(Period.month(1949, 1).label()).isEqualTo("1949-01");
        assertThat(Period.isoWeek(2024, 5).label()).isEqualTo("2024-W05");
        assertThat(Period.day(LocalDate.of(2024, 3, 1)).label()).isEqualTo("2024-03-01");
    }

    @Test
    void isoWeeksBelongToTheirWeekBasedYear() {
        // ISO 8601: week 1 holds the year's first Thursday. 2021-01-01 (a Friday) lies in 2020-W53,
        // and 2020 has 53 weeks while 2021 has 52 (facts of the standard; checked against java.time).
        Period week = Period.containing(Frequency.WEEKLY, LocalDate.of(2021, 1, 1));
        assertThat(week.label()).isEqualTo("2020-W53");
        assertThat(week.startDate()).isEqualTo(LocalDate.of(2020, 12, 28));
        assertThat(week.plus(1).label()).isEqualTo("2021-W01");
        assertThatThrownBy(() -> Period.isoWeek(2021, 53)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("weeks 1 to 52");
    }

    @Test
    void businessDaysSkipWeekends() {
        Period friday = Period.containing(Frequency.BUSINESS_DAILY, LocalDate.of(2024, 3, 1));
        assertThat(friday.plus(1).startDate()).isEqualTo(LocalDate.of(2024, 3, 4));
        assertThat(friday.seasonalPosition()).isEqualTo(5);
        assertThat(friday.plus(1).seasonLabel()).isEqualTo("Mon");
        assertThatThrownBy(() -> Period.containing(Frequency.BUSINESS_DAILY, LocalDate.of(2024, 3, 2)))
                .hasMessageContaining("SATURDAY");
    }

    @Test
    void seasonalPositionsAndLabels() {
        assertThat(Period.month(2024, 7).seasonalPosition()).isEqualTo(7);
        assertThat(Period.month(2024, 7).seasonLabel()).isEqualTo("Jul");
        assertThat(Period.quarter(2024, 3).seasonLabel()).isEqualTo("Q3");
        assertThat(Period.day(LocalDate.of(2024, 3, 4)).seasonLabel()).isEqualTo("Mon");
        assertThat(Period.month(2024, 2).lengthInDays()).isEqualTo(29);
        assertThat(Period.month(2023, 12).plus(1)).isEqualTo(Period.month(2024, 1));
        assertThat(Period.quarter(2023, 4).until(Period.quarter(2025, 1))).isEqualTo(5);
    }

    @Property
    void everyDateLiesInsideTheOneperiodThatContainsIt(@ForAll @LongRange(min = -40_000, max = 60_000) long epochDay) {
        LocalDate date = LocalDate.ofEpochDay(epochDay);
        for (Frequency f : Frequency.values()) {
            if (f == Frequency.BUSINESS_DAILY && date.getDayOfWeek().getValue() > 5) {
                continue;
            }
            Period p = Period.containing(f, date);
            assertThat(p.startDate()).isBeforeOrEqualTo(date);
            assertThat(p.endDate()).isAfterOrEqualTo(date);
            assertThat(p.plus(1).startDate()).isEqualTo(p.endDate().plusDays(f == Frequency.BUSINESS_DAILY
                    && p.endDate().getDayOfWeek().getValue() == 5 ? 3 : 1));
        }
    }

    @Property
    void plusAndUntilAreInverse(@ForAll @IntRange(min = -5000, max = 5000) int steps) {
        for (Frequency f : Frequency.values()) {
            Period origin = Period.containing(f, LocalDate.of(2024, 3, 4));
            assertThat(origin.until(origin.plus(steps))).isEqualTo(steps);
        }
    }

    /**
     * A period's year is its first day's year (the week-based year for ISO weeks), also for periods
     * before year 0, which {@link Period#year} finds without making the date (java.time's calendar
     * is the reference).
     */
    @Property
    void theYearIsTheFirstDaysYear(@ForAll @LongRange(min = -40_000, max = 60_000) long epochDay) {
        LocalDate date = LocalDate.ofEpochDay(epochDay * 37);
        for (Frequency f : Frequency.values()) {
            if (f == Frequency.BUSINESS_DAILY && date.getDayOfWeek().getValue() > 5) {
                continue;
            }
            Period period = Period.containing(f, date);
            int expected = f == Frequency.WEEKLY ? period.startDate().get(java.time.temporal.IsoFields.WEEK_BASED_YEAR)
                    : period.startDate().getYear();
            assertThat(period.year()).as(period.label()).isEqualTo(expected);
        }
    }

    @Test
    void aYearBeyondTheCalendarIsRefusedAsTheDateWouldBe() {
        assertThatThrownBy(() -> new Period(Frequency.MONTHLY, 12L * 1_000_000_000L).year())
                .isInstanceOf(java.time.DateTimeException.class);
        assertThatThrownBy(() -> new Period(Frequency.MONTHLY, 12L * 1_000_000_000L).startDate())
                .isInstanceOf(java.time.DateTimeException.class);
    }
}
