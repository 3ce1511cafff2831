package org.annalist.analysis.calendar;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.MonthDay;
import java.util.Map;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.annalist.series.Period;
import org.junit.jupiter.api.Test;

class CalendarTest {

    /** G. M. Arts, "Easter Sunday Dates", tables 1990-2049 (http://dates.gmarts.org/eastdate.htm). */
    private static final Map<Integer, String> PUBLISHED = Map.ofEntries(
            Map.entry(1990, "04-15"), Map.entry(1991, "03-31"), Map.entry(1995, "04-16"), Map.entry(2000, "04-23"),
            Map.entry(2002, "03-31"), Map.entry(2005, "03-27"), Map.entry(2008, "03-23"), Map.entry(2009, "04-12"),
            Map.entry(2010, "04-04"), Map.entry(2011, "04-24"), Map.entry(2013, "03-31"), Map.entry(2014, "04-20"),
            Map.entry(2015, "04-05"), Map.entry(2016, "03-27"), Map.entry(2017, "04-16"), Map.entry(2018, "04-01"),
            Map.entry(2019, "04-21"), Map.entry(2020, "04-12"), Map.entry(2021, "04-04"), Map.entry(2022, "04-17"),
            Map.entry(2023, "04-09"), Map.entry(2024, "03-31"), Map.entry(2025, "04-20"), Map.entry(2026, "04-05"),
            Map.entry(2027, "03-28"), Map.entry(2028, "04-16"), Map.entry(2029, "04-01"), Map.entry(2030, "04-21"),
            Map.entry(2031, "04-13"), Map.entry(2032, "03-28"), Map.entry(2035, "03-25"), Map.entry(2038, "04-25"),
            Map.entry(2040, "04-01"), Map.entry(2043, "03-29"), Map.entry(2046, "03-25"), Map.entry(2049, "04-18"));

    @Test
    void easterMatchesThePublishedTable() {
        PUBLISHED.forEach((year, date) -> assertThat(Easter.sunday(year)).as("Easter %d", year)
                .isEqualTo(LocalDate.of(year, Integer.parseInt(date.substring(0, 2)), Integer.parseInt(date.substring(3)))));
    }

    @Test
    void easterExtremes() {
        // Known extremes (from memory): 22 March in 1818 and 2285, 25 April in 1886, 1943 and 2038;
        // and the worked examples 1961 -> 2 April, 2008 -> 23 March (Meeus).
        assertThat(Easter.sunday(1818)).isEqualTo(LocalDate.of(1818, 3, 22));
        assertThat(Easter.sunday(2285)).isEqualTo(LocalDate.of(2285, 3, 22));
        assertThat(Easter.sunday(1886)).isEqualTo(LocalDate.of(1886, 4, 25));
        assertThat(Easter.sunday(1943)).isEqualTo(LocalDate.of(1943, 4, 25));
        assertThat(Easter.sunday(1961)).isEqualTo(LocalDate.of(1961, 4, 2));
    }

    @Property
    void easterIsASundayBetween22MarchAnd25April(@ForAll @IntRange(min = 1583, max = 4099) int year) {
        LocalDate easter = Easter.sunday(year);
        assertThat(easter.getDayOfWeek()).isEqualTo(DayOfWeek.SUNDAY);
        MonthDay day = MonthDay.from(easter);
        assertThat(day).isBetween(MonthDay.of(3, 22), MonthDay.of(4, 25));
    }

    @Test
    void theEasterWindowSplitsAcrossMarchAndApril() {
        // Easter 2024: 31 March. The 8 days before (23-30 March) are all in March.
        assertThat(CalendarRegressors.easterShare(Period.month(2024, 3), 8)).isEqualTo(1.0);
        assertThat(CalendarRegressors.easterShare(Period.month(2024, 4), 8)).isEqualTo(0.0);
        // Easter 2018: 1 April. The 8 days before are 24-31 March: all March.
        assertThat(CalendarRegressors.easterShare(Period.month(2018, 3), 8)).isEqualTo(1.0);
        // Easter 2021: 4 April. Days 27 March - 3 April: 5 in March, 3 in April.
        assertThat(CalendarRegressors.easterShare(Period.month(2021, 3), 8)).isCloseTo(5 / 8.0, within(1e-12));
        assertThat(CalendarRegressors.easterShare(Period.month(2021, 4), 8)).isCloseTo(3 / 8.0, within(1e-12));
        // other windows: Holy Saturday only (3 April 2021), and 15 days (20 March - 3 April: 12 March, 3 April)
        assertThat(CalendarRegressors.easterShare(Period.month(2021, 4), 1)).isEqualTo(1.0);
        assertThat(CalendarRegressors.easterShare(Period.month(2021, 3), 15)).isCloseTo(12 / 15.0, within(1e-12));
        assertThat(CalendarRegressors.easterShare(Period.quarter(2021, 1), 8)).isCloseTo(5 / 8.0, within(1e-12));
        assertThat(CalendarRegressors.easterShare(Period.month(2021, 7), 8)).isZero();
    }

    @Test
    void weekdayCountsAreCalendarFacts() {
        // October 2026 starts on a Thursday and has 31 days: five Thursdays, Fridays and Saturdays.
        assertThat(CalendarRegressors.count(Period.month(2026, 10), DayOfWeek.FRIDAY)).isEqualTo(5);
        assertThat(CalendarRegressors.weekendNights(Period.month(2026, 10))).isEqualTo(10);
        // October 2025 starts on a Wednesday: five Wednesdays, Thursdays, Fridays; four Saturdays.
        assertThat(CalendarRegressors.weekendNights(Period.month(2025, 10))).isEqualTo(9);
        // February 2024 (leap) has 29 days: five Thursdays; February 2023 four of each.
        assertThat(CalendarRegressors.count(Period.month(2024, 2), DayOfWeek.THURSDAY)).isEqualTo(5);
        assertThat(CalendarRegressors.weekendNights(Period.month(2023, 2))).isEqualTo(8);
    }

    /** The arithmetic weekday count equals counting day by day, for every month and quarter of 1990–2040. */
    @org.junit.jupiter.api.Test
    void weekdayCountsEqualADayByDayCount() {
        for (int year = 1990; year <= 2040; year++) {
            for (int m = 1; m <= 12; m++) {
                for (Period p : new Period[] {Period.month(year, m), Period.quarter(year, (m - 1) / 3 + 1)}) {
                    for (DayOfWeek weekday : DayOfWeek.values()) {
                        int byDay = 0;
                        for (java.time.LocalDate d = p.startDate(); !d.isAfter(p.endDate()); d = d.plusDays(1)) {
                            byDay += d.getDayOfWeek() == weekday ? 1 : 0;
                        }
                        assertThat(CalendarRegressors.count(p, weekday)).as("%s %s", p, weekday).isEqualTo(byDay);
                    }
                }
            }
        }
    }
}
