package org.annalist.series;

import java.time.LocalDate;
import java.util.Objects;
import java.util.Set;

/**
 * A moving holiday of the user's (a festival, a school break): its name and every day it covers,
 * over all the years. Treated like Easter: the share of a year's holiday days that fall in a
 * period is a calendar regressor (our generalisation of the Easter regressor of the analysis'
 * calendar effects).
 */
public record Holiday(String name, Set<LocalDate> days) {

    public Holiday {
        Objects.requireNonNull(name, "name");
        days = Set.copyOf(days);
        if (days.isEmpty()) {
            throw new IllegalArgumentException("holiday " + name + " has no days");
        }
    }

    /** Share of this holiday's days of the period's year (or years) that fall in the period; 0 in years without it. */
    public double share(Period period) {
        LocalDate from = period.startDate();
        LocalDate to = period.endDate();
        int inside = 0;
        int ofYears = 0;
        for (LocalDate d : days) {
            if (d.getYear() >= from.getYear() && d.getYear() <= to.getYear()) {
                ofYears++;
                if (!d.isBefore(from) && !d.isAfter(to)) {
                    inside++;
                }
            }
        }
        return ofYears == 0 ? 0 : inside / (double) ofYears;
    }
}
