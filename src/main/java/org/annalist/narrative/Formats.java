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
import org.annalist.findings.Numbers;
import org.annalist.series.Frequency;
import org.annalist.series.Period;

/**
 * Numbers, periods and times as the brief writes them, in the brief's language; never in the
 * machine's default locale, so that the same data give the same brief everywhere.
 *
 * <p>One typographic convention for every number (a proof-reader's rules, common practice, no
 * source): a negative number carries the true minus sign U+2212, never the hyphen-minus; a value
 * that rounds to zero in the places shown is written without a sign ({@code 0.0 %}, never
 * {@code −0.0 %} or {@code ±0.0 %}); a number and its {@code %} are joined by a no-break space, as
 * are the parts of {@code p = 0.003}. A change is written either signed ({@link #signedPercent},
 * for tables and after a neutral word: "moved +1.2 %") or as a size after a direction word
 * ({@link #percentSize}: "down 65.7 %"), never both ("down −65.7 %").
 */
public final class Formats {

    private static final String MINUS = "\u2212";
    private static final String NBSP = "\u00A0";

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
        return v == null || v.isNaN() ? "\u2013" : plain(v, decimals);
    }

    /** A signed change in the values' own precision: {@code +1,250} or {@code −3.5}. */
    public String signedValue(Double v) {
        if (v == null || v.isNaN()) {
            return "\u2013";
        }
        return signed(v, decimals);
    }

    /** A signed percentage with one decimal: {@code +4.2 %}. */
    public String signedPercent(Double pct) {
        if (pct == null || pct.isNaN()) {
            return "\u2013";
        }
        return signed(pct, 1) + NBSP + "%";
    }

    /** An unsigned percentage with one decimal: {@code 4.2 %}. */
    public String percent(double pct) {
        return plain(pct, 1) + NBSP + "%";
    }

    /** {@code p < 0.001} or {@code p = 0.023}; at or below {@code floor} (a Monte Carlo test's smallest p), {@code p ≤ floor}. */
    public String pValue(double p, double floor) {
        if (p <= floor) {
            return "p" + NBSP + "\u2264" + NBSP + pattern(3).format(floor);
        }
        if (p < 0.001) {
            return "p" + NBSP + "<" + NBSP + "0.001";
        }
        return "p" + NBSP + "=" + NBSP + pattern(3).format(p);
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
        double rounded = significantValue(v);
        return (rounded < 0 ? MINUS : "") + pattern(places).format(Math.abs(rounded));
    }

    /** The number {@link #significant} prints: {@code v} to three significant digits. */
    public static double significantValue(double v) {
        return Numbers.threeSignificant(v);
    }

    /** As {@link #significant}, with a sign: {@code +2,940}. */
    public String signedSignificant(double v) {
        return v > 0 ? "+" + significant(v) : significant(v);
    }

    /** A number with {@code places} decimals. */
    public String fixed(double v, int places) {
        return plain(v, places);
    }

    /** A signed number with {@code places} decimals: {@code +1.9}. */
    public String signedFixed(double v, int places) {
        return signed(v, places);
    }

    public String count(long n) {
        return plain(n, 0);
    }

    /** A period in words: {@code October 2026}, {@code the first half of 2026}, {@code Q3 2026}, {@code week 5 of 2024}, {@code 2 March 2024}. */
    public String period(Period period) {
        return switch (period.frequency()) {
            case ANNUAL -> String.valueOf(period.year());
            case HALF_YEARLY -> "the " + seasonName(Frequency.HALF_YEARLY, period.seasonalPosition()) + " of " + period.year();
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

    /** A period in few characters, for table rows: {@code Oct 2026}, {@code H1 2026}, {@code Q3 2026}, {@code 2024-W05}, {@code 2 Mar 2024}. */
    public String shortPeriod(Period period) {
        return switch (period.frequency()) {
            case ANNUAL -> String.valueOf(period.year());
            case HALF_YEARLY -> "H" + period.seasonalPosition() + " " + period.year();
            case QUARTERLY -> period.seasonLabel() + " " + period.year();
            case MONTHLY -> period.seasonLabel() + " " + period.year();
            case WEEKLY -> period.label();
            case DAILY, BUSINESS_DAILY -> period.startDate().format(DateTimeFormatter.ofPattern("EEE d MMM yyyy", locale));
        };
    }

    /**
     * A season position in running text: {@code January} (months), {@code first half}, {@code Q3}, {@code W05} (ISO
     * weeks), {@code Mondays} (days, Monday first).
     */
    public String seasonName(Frequency frequency, int position) {
        return switch (frequency) {
            case MONTHLY -> Month.of(position).getDisplayName(TextStyle.FULL, locale);
            case DAILY, BUSINESS_DAILY -> DayOfWeek.of(position).getDisplayName(TextStyle.FULL, locale) + "s";
            case QUARTERLY -> "Q" + position;
            case HALF_YEARLY -> position == 1 ? "first half" : "second half";
            case WEEKLY -> String.format(Locale.ROOT, "W%02d", position);
            case ANNUAL -> String.valueOf(position);
        };
    }

    /** A time stamp in UTC: {@code 2 December 2026, 06:30 UTC}. */
    public String timestamp(Instant instant) {
        return DateTimeFormatter.ofPattern("d MMMM yyyy, HH:mm 'UTC'", locale).format(instant.atZone(ZoneOffset.UTC));
    }

    /**
     * The size of a change with one decimal and no sign, for use after a word that gives the
     * direction: {@code down 65.7 %}, {@code 4.2 % more}.
     */
    public String percentSize(Double pct) {
        return pct == null || pct.isNaN() ? "\u2013" : percent(Math.abs(pct));
    }

    /** The size of a change in the values' own precision, with no sign: {@code 1,250} after "up". */
    public String valueSize(Double v) {
        return v == null || v.isNaN() ? "\u2013" : plain(Math.abs(v), decimals);
    }

    /** {@code v} with {@code places} decimals, a true minus when negative, no sign when it rounds to zero. */
    private String plain(double v, int places) {
        String digits = pattern(places).format(Math.abs(v));
        return v < 0 && !zero(digits) ? MINUS + digits : digits;
    }

    /** As {@link #plain}, with {@code +} before a positive number; a value that rounds to zero has no sign. */
    private String signed(double v, int places) {
        String digits = pattern(places).format(Math.abs(v));
        return zero(digits) ? digits : (v > 0 ? "+" : MINUS) + digits;
    }

    private static boolean zero(String digits) {
        return digits.chars().filter(Character::isDigit).allMatch(c -> c == '0');
    }

    private DecimalFormat pattern(int places) {
        DecimalFormat format = new DecimalFormat(places == 0 ? "#,##0" : "#,##0." + "0".repeat(places),
                DecimalFormatSymbols.getInstance(locale));
        format.setRoundingMode(RoundingMode.HALF_EVEN);
        return format;
    }
}
