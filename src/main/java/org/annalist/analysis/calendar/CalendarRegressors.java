package org.annalist.analysis.calendar;

import java.time.DayOfWeek;
import java.time.LocalDate;
import org.annalist.series.Period;

/**
 * What the calendar puts into a period: the share of the days before Easter that fall in it, how
 * many of each weekday it has, and its length. Tourism counts respond to all three: Easter
 * holidays move between March and April, Friday and Saturday nights fill hotels, and a leap-year
 * February has 3.6 % more days.
 *
 * <p>The Easter share is the Easter regressor of [1]: activity changes on the w days before
 * Easter Sunday, and a period's regressor is the fraction of those days it holds (the form
 * attributed to [1] from memory). Counting weekdays is plain calendar arithmetic.
 *
 * <p>References:
 * <ol>
 * <li>W. R. Bell and S. C. Hillmer (1983), "Modeling Time Series With Calendar Variation",
 *     <i>Journal of the American Statistical Association</i> 78(383), 526–534.
 *     doi:10.1080/01621459.1983.10478005</li>
 * <li>The R package rjd3toolkit (the R interface of JDemetra+ 3), documentation of
 *     {@code set_easter}: the duration of the Easter effect defaults to 8 days in the
 *     RegARIMA/X-13 specification and to 6 in TRAMO.</li>
 * </ol>
 */
public final class CalendarRegressors {

    /**
     * The days before Easter Sunday counted as its holiday: 8, the default duration of the Easter
     * regressor in the X-13 (RegARIMA) specification as JDemetra+ documents it [2] (TRAMO's is 6).
     * 1 (Holy Saturday only) and 15 are tested alternatives.
     */
    public static final int DEFAULT_EASTER_WINDOW = 8;

    private CalendarRegressors() {
    }

    /** Share of the {@code window} days before Easter Sunday (the Sunday itself not counted) that lie in {@code period}. */
    public static double easterShare(Period period, int window) {
        if (window < 1) {
            throw new IllegalArgumentException("the Easter window needs at least one day, was " + window);
        }
        LocalDate from = period.startDate();
        LocalDate to = period.endDate();
        long first = from.toEpochDay();
        long last = to.toEpochDay();
        long inside = 0;
        for (int year = from.getYear(); year <= to.getYear(); year++) {
            long easter = Easter.sunday(year).toEpochDay();
            // [1] the window's days easter − window .. easter − 1 that the period covers
            inside += Math.max(0, Math.min(easter - 1, last) - Math.max(easter - window, first) + 1);
        }
        return inside / (double) window;
    }

    /** How many times {@code weekday} occurs in the period. */
    public static int count(Period period, DayOfWeek weekday) {
        LocalDate start = period.startDate();
        int days = (int) (period.endDate().toEpochDay() - start.toEpochDay() + 1);
        // whole weeks hold the weekday once each; the remaining days from the start hold it once
        // more when it falls within them
        int offset = Math.floorMod(weekday.getValue() - start.getDayOfWeek().getValue(), 7);
        return days / 7 + (offset < days % 7 ? 1 : 0);
    }

    /** Fridays plus Saturdays: the nights of the weekend. */
    public static int weekendNights(Period period) {
        return count(period, DayOfWeek.FRIDAY) + count(period, DayOfWeek.SATURDAY);
    }

    /** Saturdays plus Sundays: the days of the weekend. */
    public static int weekendDays(Period period) {
        return count(period, DayOfWeek.SATURDAY) + count(period, DayOfWeek.SUNDAY);
    }
}
