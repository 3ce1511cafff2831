package org.annalist.narrative;

import java.math.RoundingMode;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.time.DayOfWeek;
import java.time.Instant;
import java.time.Month;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.format.TextStyle;
import java.util.Locale;
import org.annalist.series.Frequency;
import org.annalist.series.Period;

/**
 * Numbers, periods and times as the brief writes them, in the brief's language; never in the
 * machine's default locale, so that the same data give the same brief everywhere.
 */
public final class Formats {

    private final Locale locale;
    private final int decimals;

    private Formats(Locale locale, int decimals) {
        this.locale = locale;
        this.decimals = decimals;
    }

    /**
     * Formats for a series' values: whole numbers stay whole; otherwise one decimal for values of
     * 100 and more and two below (enough to show the data's own precision in a table row).
     */
    public static Formats forValues(double[] values, Locale locale) {
        boolean whole = true;
        double largest = 0;
        for (double v : values) {
            if (!Double.isNaN(v)) {
                whole &= v == Math.rint(v);
                largest = Math.max(largest, Math.abs(v));
            }
        }
        return new Formats(locale, whole ? 0 : largest >= 100 ? 1 : 2);
    }

    public String value(Double v) {
        return v == null || v.isNaN() ? "\u2013" : pattern(decimals).format(v);
    }

    /** A signed change in the values' own precision: {@code +1,250} or {@code −3.5}. */
    public String signedValue(Double v) {
        if (v == null || v.isNaN()) {
            return "\u2013";
        }
        return sign(v) + pattern(decimals).format(Math.abs(v));
    }

    /** A signed percentage with one decimal: {@code +4.2 %}. */
    public String signedPercent(Double pct) {
        if (pct == null || pct.isNaN()) {
            return "\u2013";
        }
        return sign(pct) + pattern(1).format(Math.abs(pct)) + "\u00A0%";
    }

    /** An unsigned percentage with one decimal: {@code 4.2 %}. */
    public String percent(double pct) {
        return pattern(1).format(pct) + "\u00A0%";
    }

    /** {@code p < 0.001} or {@code p = 0.023}; at or below {@code floor} (a Monte Carlo test's smallest p), {@code p ≤ floor}. */
    public String pValue(double p, double floor) {
        if (p <= floor) {
            return "p \u2264 " + pattern(3).format(floor);
        }
        if (p < 0.001) {
            return "p < 0.001";
        }
        return "p = " + pattern(3).format(p);
    }

    public String pValue(double p) {
        return pValue(p, 0);
    }

    /** Three significant digits, grouped: {@code 2,940}, {@code 1.34}, {@code 0.0712}. */
    public String significant(double v) {
        if (v == 0 || Double.isNaN(v)) {
            return Double.isNaN(v) ? "\u2013" : "0";
        }
        double magnitude = Math.floor(Math.log10(Math.abs(v)));
        int places = (int) Math.max(0, 2 - magnitude);
        double rounded = Math.round(v / Math.pow(10, magnitude - 2)) * Math.pow(10, magnitude - 2);
        return (rounded < 0 ? "\u2212" : "") + pattern(places).format(Math.abs(rounded));
    }

    /** As {@link #significant}, with a sign: {@code +2,940}. */
    public String signedSignificant(double v) {
        return v > 0 ? "+" + significant(v) : significant(v);
    }

    /** A number with {@code places} decimals. */
    public String fixed(double v, int places) {
        return pattern(places).format(v);
    }

    /** A signed number with {@code places} decimals: {@code +1.9}. */
    public String signedFixed(double v, int places) {
        return sign(v) + pattern(places).format(Math.abs(v));
    }

    public String count(long n) {
        return pattern(0).format(n);
    }

    /** A period in words: {@code October 2026}, {@code Q3 2026}, {@code week 5 of 2024}, {@code 2 March 2024}. */
    public String period(Period period) {
        return switch (period.frequency()) {
            case ANNUAL -> String.valueOf(period.year());
            case QUARTERLY -> period.seasonLabel() + " " + period.year();
            case MONTHLY -> period.startDate().format(DateTimeFormatter.ofPattern("MMMM yyyy", locale));
            case WEEKLY -> "week " + period.seasonalPosition() + " of " + period.year();
            case DAILY, BUSINESS_DAILY -> period.startDate().format(DateTimeFormatter.ofPattern("d MMMM yyyy", locale));
        };
    }

    /** A period as a sentence opens with it: {@code In October 2026}, {@code On 31 October 2026}. */
    public String atPeriod(Period period) {
        boolean day = period.frequency() == Frequency.DAILY
                || period.frequency() == Frequency.BUSINESS_DAILY;
        return (day ? "On " + period.startDate().format(DateTimeFormatter.ofPattern("EEEE", locale)) + " " : "In ")
                + period(period);
    }

    /** A period in few characters, for table rows: {@code Oct 2026}, {@code Q3 2026}, {@code 2024-W05}, {@code 2 Mar 2024}. */
    public String shortPeriod(Period period) {
        return switch (period.frequency()) {
            case ANNUAL -> String.valueOf(period.year());
            case QUARTERLY -> period.seasonLabel() + " " + period.year();
            case MONTHLY -> period.seasonLabel() + " " + period.year();
            case WEEKLY -> period.label();
            case DAILY, BUSINESS_DAILY -> period.startDate().format(DateTimeFormatter.ofPattern("EEE d MMM yyyy", locale));
        };
    }

    /**
     * A season position in running text: {@code January} (months), {@code Q3}, {@code W05} (ISO
     * weeks), {@code Mondays} (days, Monday first).
     */
    public String seasonName(Frequency frequency, int position) {
        return switch (frequency) {
            case MONTHLY -> Month.of(position).getDisplayName(TextStyle.FULL, locale);
            case DAILY, BUSINESS_DAILY -> DayOfWeek.of(position).getDisplayName(TextStyle.FULL, locale) + "s";
            case QUARTERLY -> "Q" + position;
            case WEEKLY -> String.format(Locale.ROOT, "W%02d", position);
            case ANNUAL -> String.valueOf(position);
        };
    }

    /** A time stamp in UTC: {@code 2 December 2026, 06:30 UTC}. */
    public String timestamp(Instant instant) {
        return DateTimeFormatter.ofPattern("d MMMM yyyy, HH:mm 'UTC'", locale).format(instant.atZone(ZoneOffset.UTC));
    }

    private String sign(double v) {
        return v > 0 ? "+" : v < 0 ? "\u2212" : "\u00B1";
    }

    private DecimalFormat pattern(int places) {
        DecimalFormat format = new DecimalFormat(places == 0 ? "#,##0" : "#,##0." + "0".repeat(places),
                DecimalFormatSymbols.getInstance(locale));
        format.setRoundingMode(RoundingMode.HALF_EVEN);
        return format;
    }
}
