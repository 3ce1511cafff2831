package org.annalist.series;

import java.util.Locale;

/**
 * How often a series is observed, with the seasonal period that goes with it.
 *
 * <p>The seasonal period is the number of observations in one seasonal cycle: months in a year,
 * quarters in a year, ISO weeks in a (52-week) year, and days in a week for daily data. Daily data
 * that skip weekends (prices, office counts) are {@link #BUSINESS_DAILY}: their week has five days
 * and a Saturday is not a missing value.
 */
public enum Frequency {
    ANNUAL("annual", 1, 1.0),
    /**
     * Two halves of a calendar year, January–June and July–December (the SDMX frequency {@code S},
     * "half-yearly, semester", periods {@code 2024-S1}, {@code 2024-S2}).
     */
    HALF_YEARLY("half-yearly", 2, 2.0),
    QUARTERLY("quarterly", 4, 4.0),
    MONTHLY("monthly", 12, 12.0),
    /** ISO 8601 weeks, Monday to Sunday; week 53 exists in some years. */
    WEEKLY("weekly", 52, 365.2425 / 7.0),
    DAILY("daily", 7, 365.2425),
    /** Monday to Friday only. */
    BUSINESS_DAILY("business-daily", 5, 365.2425 * 5.0 / 7.0);

    private final String label;
    private final int seasonalPeriod;
    private final double periodsPerYear;

    Frequency(String label, int seasonalPeriod, double periodsPerYear) {
        this.label = label;
        this.seasonalPeriod = seasonalPeriod;
        this.periodsPerYear = periodsPerYear;
    }

    /** The name used in the findings JSON and on the command line, e.g. {@code business-daily}. */
    public String label() {
        return label;
    }

    /** Observations per seasonal cycle: 12 for monthly, 4 quarterly, 2 half-yearly, 52 weekly, 7 daily, 5 business-daily, 1 annual. */
    public int seasonalPeriod() {
        return seasonalPeriod;
    }

    /** Mean number of periods in a Gregorian year (365.2425 days), used to express slopes per year. */
    public double periodsPerYear() {
        return periodsPerYear;
    }

    /** True when every period of this frequency lies inside exactly one period of {@code coarser}. */
    public boolean nestsIn(Frequency coarser) {
        if (this == coarser) {
            return false;
        }
        return switch (this) {
            case DAILY, BUSINESS_DAILY -> coarser != DAILY && coarser != BUSINESS_DAILY;
            case MONTHLY -> coarser == QUARTERLY || coarser == HALF_YEARLY || coarser == ANNUAL;
            case QUARTERLY -> coarser == HALF_YEARLY || coarser == ANNUAL;
            case HALF_YEARLY -> coarser == ANNUAL;
            case WEEKLY, ANNUAL -> false;
        };
    }

    /** The frequency named by {@link #label()} (case-insensitive), or an IAE that lists the names. */
    public static Frequency fromLabel(String text) {
        String wanted = text.trim().toLowerCase(Locale.ROOT);
        for (Frequency f : values()) {
            if (f.label.equals(wanted)) {
                return f;
            }
        }
        throw new IllegalArgumentException("unknown frequency '" + text
                + "'; expected one of annual, half-yearly, quarterly, monthly, weekly, daily, business-daily");
    }

    @Override
    public String toString() {
        return label;
    }
}
