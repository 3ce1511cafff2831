package org.annalist.analysis.calendar;

import java.time.LocalDate;

/**
 * Western (Gregorian) Easter Sunday by the "anonymous Gregorian" algorithm of Meeus, Jones and
 * Butcher ([1] ch. 8; after Butcher's <i>Ecclesiastical Calendar</i>, 1876): integer arithmetic
 * only, valid for every Gregorian year with no exceptions, unlike Gauss's formula, which needs two.
 *
 * <p>References:
 * <ol>
 * <li>J. Meeus (1991), <i>Astronomical Algorithms</i>, Willmann-Bell, Richmond, ch. 8 "Date of
 *     Easter" (no DOI; the chapter title from memory).</li>
 * </ol>
 */
public final class Easter {

    private Easter() {
    }

    /** The first full year of the Gregorian calendar, from which its Easter rule holds. */
    public static final int FIRST_YEAR = 1583;

    /**
     * @throws IllegalArgumentException before 1583, the first full year of the Gregorian calendar
     *                                  (introduced in October 1582)
     */
    public static LocalDate sunday(int year) {
        if (year < FIRST_YEAR) {
            throw new IllegalArgumentException("the Gregorian Easter is defined from 1583, not for " + year);
        }
        // [1] ch. 8: the anonymous Gregorian algorithm, step by step (a … m, then month and day)
        int a = year % 19;
        int b = year / 100;
        int c = year % 100;
        int d = b / 4;
        int e = b % 4;
        int f = (b + 8) / 25;
        int g = (b - f + 1) / 3;
        int h = (19 * a + b - d - g + 15) % 30;
        int i = c / 4;
        int k = c % 4;
        int l = (32 + 2 * e + 2 * i - h - k) % 7;
        int m = (a + 11 * h + 22 * l) / 451;
        int month = (h + l - 7 * m + 114) / 31;
        int day = (h + l - 7 * m + 114) % 31 + 1;
        return LocalDate.of(year, month, day);
    }
}
