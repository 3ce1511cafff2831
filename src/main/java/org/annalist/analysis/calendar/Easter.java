package org.annalist.analysis.calendar;

import java.time.LocalDate;

/**
 * Western (Gregorian) Easter Sunday by the "anonymous Gregorian" algorithm of Meeus, Jones and
 * Butcher (J. Meeus, <i>Astronomical Algorithms</i>, 1991, ch. 8; after Butcher's Ecclesiastical
 * Calendar, 1876): integer arithmetic only, valid for every Gregorian year with no exceptions,
 * unlike Gauss's formula, which needs two.
 */
public final class Easter {

    private Easter() {
    }

    /** @throws IllegalArgumentException before 1583, when the Gregorian calendar was not yet in use */
    public static LocalDate sunday(int year) {
        if (year < 1583) {
            throw new IllegalArgumentException("the Gregorian Easter is defined from 1583, not for " + year);
        }
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
