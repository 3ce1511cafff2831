package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.time.DayOfWeek;
import java.util.Random;
import org.annalist.analysis.calendar.CalendarRegressors;
import org.annalist.analysis.calendar.Easter;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * Calendar first, on invented monthly series with planted truth: the Easter and weekday effects
 * are estimated before the one-off search, so a month the calendar explains is not a one-off, a
 * real one-off still is, and the latest change is given with the calendar allowed for.
 */
class CalendarFirstTest {

    private static final Period START = Period.month(2011, 1);
    /** Seasonal factors, January to December (invented). */
    private static final double[] SEASON = {0.80, 0.90, 0.85, 0.95, 1.00, 1.10, 1.45, 1.50, 1.05, 0.90, 0.70, 0.90};
    /** The planted Easter effect: +12 % for a month holding all 8 days before Easter Sunday (invented). */
    private static final double EASTER = 0.12;
    private static final Period ONE_OFF = Period.month(2019, 7);

    /** What the series would be without Easter and without the one-off: 2 % growth a year, season, 1.5 % noise. */
    private static double underlying(int t, Random random) {
        return 10_000 * Math.pow(1.02, t / 12.0) * SEASON[t % 12] * Math.exp(0.015 * random.nextGaussian());
    }

    private static Series withEaster(Period end, long seed, double[] underlying) {
        Random random = new Random(seed);
        int n = (int) START.until(end) + 1;
        double[] x = new double[n];
        for (int t = 0; t < n; t++) {
            Period p = START.plus(t);
            underlying[t] = underlying(t, random);
            x[t] = underlying[t] * (1 + EASTER * CalendarRegressors.easterShare(p, CalendarRegressors.DEFAULT_EASTER_WINDOW))
                    * (p.equals(ONE_OFF) ? 1.35 : 1);
        }
        return Series.builder("guest_nights", Frequency.MONTHLY).unit("nights").append(START, x).snapshot();
    }

    @Test
    void theMarchAndAprilOfEarlyEasterYearsAreNotOneOffsButARealOneOffIsFound() {
        // Easter on 31 March 2013, 27 March 2016, 1 April 2018, 31 March 2024 (Meeus' computus, as Easter.sunday):
        // the days before it fall in March, which leaves April short of its usual Easter share
        for (long seed = 1; seed <= 3; seed++) {
            Findings f = new Analyst().withoutOutlook().analyse(withEaster(Period.month(2025, 4), seed, new double[172]));
            assertThat(f.calendar().effects()).anyMatch(e -> e.name().equals(CalendarFinding.EASTER) && e.kept());
            for (OutlierFinding o : f.outliers()) {
                boolean earlyEaster = Easter.sunday(o.period().year()).getMonthValue() == 3
                        || Easter.sunday(o.period().year()).getDayOfMonth() <= CalendarRegressors.DEFAULT_EASTER_WINDOW;
                boolean marchOrApril = o.period().seasonalPosition() == 3 || o.period().seasonalPosition() == 4;
                assertThat(earlyEaster && marchOrApril).as("seed %d: %s flagged", seed, o.period()).isFalse();
            }
            assertThat(f.outliers()).as("seed %d", seed).anyMatch(o -> o.period().equals(ONE_OFF));
        }
    }

    @Test
    void theLatestChangeWithTheCalendarAllowedForIsCloseToThePlantedUnderlyingChange() {
        // April 2025 (Easter 20 April) against April 2024 (Easter 31 March): the raw change holds
        // the whole planted Easter effect, the calendar-adjusted one should not
        double[] underlying = new double[172];
        Series series = withEaster(Period.month(2025, 4), 7, underlying);
        Findings f = new Analyst().withoutOutlook().analyse(series);
        CalendarFinding.AdjustedChange c = f.calendar().latestChange();
        assertThat(c).isNotNull();
        int now = series.size() - 1;
        double planted = 100 * (underlying[now] / underlying[now - 12] - 1);
        assertThat(c.changePct()).isGreaterThan(planted + 8);   // the raw change carries the planted +12 %
        // the estimate of the Easter effect has its own error (about ±2 % here); 3 points is generous
        assertThat(c.adjustedChangePct()).isCloseTo(planted, within(3.0));
        assertThat(c.calendarPct()).isBetween(8.0, 16.0);
        assertThat(c.effects()).extracting(CalendarFinding.Part::name).containsExactly(CalendarFinding.EASTER);
        assertThat(f.calendar().notes()).anyMatch(n -> n instanceof CalendarNote.CalendarAdjusted a
                && a.easterLater().orElseThrow());
    }

    /** Six years to October 2026 with a weekend effect per Saturday and Sunday of the month (invented). */
    private static Series weekdays(String name, String unit, double perWeekendDay, long seed) {
        Random random = new Random(seed);
        Period start = Period.month(2015, 1);
        int n = (int) start.until(Period.month(2026, 10)) + 1;
        double[] x = new double[n];
        for (int t = 0; t < n; t++) {
            Period p = start.plus(t);
            int weekend = CalendarRegressors.count(p, DayOfWeek.SATURDAY) + CalendarRegressors.count(p, DayOfWeek.SUNDAY);
            x[t] = 500 * SEASON[t % 12] * (1 + perWeekendDay * (weekend - 8.7)) * Math.exp(0.01 * random.nextGaussian());
        }
        return Series.builder(name, Frequency.MONTHLY).unit(unit).append(start, x).snapshot();
    }

    @Test
    void aMuseumIsToldOfSaturdaysAndSundaysNeverOfFridayAndSaturdayNights() {
        // October 2026 has 9 Saturdays and Sundays and 10 Friday and Saturday nights, October 2025 8 and 9
        Findings f = new Analyst().withoutOutlook().analyse(weekdays("museum_visitors", "", 0.03, 11));
        assertThat(f.calendar().weekdays()).isEqualTo(WeekdayKind.DAY_VISITS);
        assertThat(f.calendar().notes()).noneMatch(n -> n instanceof CalendarNote.WeekendNights);
        assertThat(f.calendar().notes()).anyMatch(n -> n instanceof CalendarNote.WeekendDays w
                && w.daysNow() == 9 && w.daysBefore() == 8 && w.effectPct().isPresent());
    }

    @Test
    void roadDeathsGetAWeekdayNoteOnlyWhenTheirWeekdayEffectIsSignificant() {
        Findings none = new Analyst().withoutOutlook().analyse(weekdays("RoadDeaths", "persons", 0, 12));
        assertThat(none.calendar().weekdays()).isEqualTo(WeekdayKind.OTHER);
        assertThat(none.calendar().effects()).noneMatch(e -> e.name().equals(CalendarFinding.WEEKEND_DAYS) && e.kept());
        assertThat(none.calendar().notes()).noneMatch(n -> n instanceof CalendarNote.WeekendNights
                || n instanceof CalendarNote.WeekendDays);
        assertThat(none.calendar().latestChange()).isNull();

        Findings some = new Analyst().withoutOutlook().analyse(weekdays("RoadDeaths", "persons", 0.04, 12));
        assertThat(some.calendar().effects()).anyMatch(e -> e.name().equals(CalendarFinding.WEEKEND_DAYS) && e.kept());
        assertThat(some.calendar().notes()).noneMatch(n -> n instanceof CalendarNote.WeekendNights);
        assertThat(some.calendar().notes()).anyMatch(n -> n instanceof CalendarNote.WeekendDays);
        // one more weekend day at +4 % each (planted): the calendar-adjusted change is about 4 points lower
        CalendarFinding.AdjustedChange c = some.calendar().latestChange();
        assertThat(c.changePct() - c.adjustedChangePct()).isCloseTo(4.0, within(1.5));
    }

    private static Series named(String name, String unit) {
        return Series.builder(name, Frequency.MONTHLY).unit(unit).append(START, 1.0).snapshot();
    }

    @Test
    void theSeriesWordsDecideWhichDaysCount() {
        // names and units as users write them (invented): snake_case, CamelCase and a unit in brackets
        assertThat(WeekdayKind.of(named("BedNights", ""))).isEqualTo(WeekdayKind.NIGHTS);
        assertThat(WeekdayKind.of(named("Total", "nights")))
                .isEqualTo(WeekdayKind.NIGHTS);
        assertThat(WeekdayKind.of(named("museum_admissions", "")))
                .isEqualTo(WeekdayKind.DAY_VISITS);
        assertThat(WeekdayKind.of(named("Footfall2024", "")))
                .isEqualTo(WeekdayKind.DAY_VISITS);
        assertThat(WeekdayKind.of(named("RoadDeaths", ""))).isEqualTo(WeekdayKind.OTHER);
        assertThat(WeekdayKind.of(named("arrivals", ""))).isEqualTo(WeekdayKind.OTHER);
    }
}
