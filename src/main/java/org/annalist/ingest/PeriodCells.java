package org.annalist.ingest;

import java.time.DateTimeException;
import java.time.LocalDate;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.annalist.series.Frequency;
import org.annalist.series.Period;

/**
 * Reads one period cell in any of the formats the tool accepts: {@code 2024-03-01},
 * {@code 01/03/2024}, {@code 03/01/2024}, {@code 01.03.2024}, {@code 2024-03}, {@code 2024/03},
 * {@code 03/2024}, {@code Mar 2024}, {@code March 2024}, {@code 2024M03}, {@code 2024-Q1},
 * {@code 2024 Q1}, {@code Q1 2024}, {@code 2024Q1}, {@code 2024}, {@code 2024-W05}. A date may
 * carry a midnight time, as spreadsheet exports write it.
 */
final class PeriodCells {

    /** What a cell says, before the column as a whole decides ambiguous dates and the frequency. */
    sealed interface Parsed permits Fixed, Day, AmbiguousDay {
        String format();
    }

    /** A year, half-year, quarter, month or ISO week, stated as such. */
    record Fixed(Period period, String format) implements Parsed {
    }

    /** A calendar day whose reading is certain. */
    record Day(LocalDate date, String format) implements Parsed {
    }

    /** {@code a/b/yyyy}: day and month in an order the column must settle. */
    record AmbiguousDay(int first, int second, int year, String format) implements Parsed {

        Optional<LocalDate> as(DateOrder order) {
            try {
                return Optional.of(order == DateOrder.MONTH_FIRST
                        ? LocalDate.of(year, first, second) : LocalDate.of(year, second, first));
            } catch (DateTimeException invalid) {
                return Optional.empty();
            }
        }
    }

    private static final String TIME = "(?:[T ]00:00(?::00(?:\\.0+)?)?Z?)?";
    private static final Pattern ISO_DATE = Pattern.compile("(\\d{4})([-/])(\\d{1,2})\\2(\\d{1,2})" + TIME);
    private static final Pattern DOTTED_DATE = Pattern.compile("(\\d{1,2})\\.(\\d{1,2})\\.(\\d{4})" + TIME);
    private static final Pattern SLASH_DATE = Pattern.compile("(\\d{1,2})([/-])(\\d{1,2})\\2(\\d{4})" + TIME);
    private static final Pattern YEAR_MONTH = Pattern.compile("(\\d{4})(?:[-/]|M)(\\d{1,2})", Pattern.CASE_INSENSITIVE);
    private static final Pattern MONTH_YEAR = Pattern.compile("(\\d{1,2})[/.-](\\d{4})");
    private static final Pattern NAME_YEAR = Pattern.compile("(\\p{L}{3,9})\\.?[ \\-]?(\\d{4})");
    private static final Pattern YEAR_NAME = Pattern.compile("(\\d{4})[ \\-](\\p{L}{3,9})\\.?");
    private static final Pattern YEAR_QUARTER = Pattern.compile("(\\d{4})[ \\-]?Q([1-4])", Pattern.CASE_INSENSITIVE);
    private static final Pattern QUARTER_YEAR = Pattern.compile("Q([1-4])[ \\-]?(\\d{4})", Pattern.CASE_INSENSITIVE);
    /** A half-year: {@code 2024-S1} as SDMX writes it, {@code 2024-H1}, {@code H2 2024} as tables often do (common practice, no source). */
    private static final Pattern YEAR_HALF = Pattern.compile("(\\d{4})[ \\-]?([HS])([12])", Pattern.CASE_INSENSITIVE);
    private static final Pattern HALF_YEAR = Pattern.compile("H([12])[ \\-]?(\\d{4})", Pattern.CASE_INSENSITIVE);
    private static final Pattern YEAR_WEEK = Pattern.compile("(\\d{4})-?W(\\d{1,2})", Pattern.CASE_INSENSITIVE);
    private static final Pattern YEAR = Pattern.compile("(1[5-9]\\d\\d|2[01]\\d\\d)");
    private static final Map<String, Integer> MONTHS = monthNames();

    private PeriodCells() {
    }

    /** The period the cell states, or empty when it is no period in any accepted format. */
    static Optional<Parsed> parse(String cell) {
        String text = cell.trim();
        Matcher m;
        try {
            if (isDigits(text, 0, 4) && text.length() >= 7 && text.charAt(4) == '-' && isDigits(text, 5, 7)) {
                // The commonest cells, 2024-03-01 and 2024-03, read without the patterns (as they would read them).
                if (text.length() == 10 && text.charAt(7) == '-' && isDigits(text, 8, 10)) {
                    return Optional.of(new Day(LocalDate.of(number(text, 0, 4), number(text, 5, 7), number(text, 8, 10)),
                            "YYYY-MM-DD"));
                }
                if (text.length() == 7) {
                    return month(number(text, 0, 4), number(text, 5, 7), "YYYY-MM");
                }
            }
            if ((m = ISO_DATE.matcher(text)).matches()) {
                return Optional.of(new Day(LocalDate.of(i(m, 1), i(m, 3), i(m, 4)), "YYYY-MM-DD"));
            }
            if ((m = DOTTED_DATE.matcher(text)).matches()) {
                return Optional.of(new Day(LocalDate.of(i(m, 3), i(m, 2), i(m, 1)), "DD.MM.YYYY"));
            }
            if ((m = SLASH_DATE.matcher(text)).matches()) {
                return Optional.of(new AmbiguousDay(i(m, 1), i(m, 3), i(m, 4), "NN" + m.group(2) + "NN" + m.group(2) + "YYYY"));
            }
            if ((m = YEAR_MONTH.matcher(text)).matches()) {
                return month(i(m, 1), i(m, 2), text.toUpperCase(Locale.ROOT).contains("M") ? "YYYYMmm" : "YYYY-MM");
            }
            if ((m = MONTH_YEAR.matcher(text)).matches()) {
                return month(i(m, 2), i(m, 1), "MM/YYYY");
            }
            if ((m = NAME_YEAR.matcher(text)).matches() && MONTHS.containsKey(key(m.group(1)))) {
                return month(i(m, 2), MONTHS.get(key(m.group(1))), "Mon YYYY");
            }
            if ((m = YEAR_NAME.matcher(text)).matches() && MONTHS.containsKey(key(m.group(2)))) {
                return month(i(m, 1), MONTHS.get(key(m.group(2))), "YYYY Mon");
            }
            if ((m = YEAR_QUARTER.matcher(text)).matches()) {
                return Optional.of(new Fixed(Period.quarter(i(m, 1), i(m, 2)), "YYYY-Qn"));
            }
            if ((m = QUARTER_YEAR.matcher(text)).matches()) {
                return Optional.of(new Fixed(Period.quarter(i(m, 2), i(m, 1)), "Qn YYYY"));
            }
            if ((m = YEAR_HALF.matcher(text)).matches()) {
                return Optional.of(new Fixed(Period.half(i(m, 1), i(m, 3)), "YYYY-" + m.group(2).toUpperCase(Locale.ROOT) + "n"));
            }
            if ((m = HALF_YEAR.matcher(text)).matches()) {
                return Optional.of(new Fixed(Period.half(i(m, 2), i(m, 1)), "Hn YYYY"));
            }
            if ((m = YEAR_WEEK.matcher(text)).matches()) {
                return Optional.of(new Fixed(Period.isoWeek(i(m, 1), i(m, 2)), "YYYY-Www"));
            }
            if ((m = YEAR.matcher(text)).matches()) {
                return Optional.of(new Fixed(Period.year(i(m, 1)), "YYYY"));
            }
        } catch (DateTimeException | IllegalArgumentException impossible) {
            return Optional.empty();   // 2024-02-30, month 13, week 54: shaped like a period, but none
        }
        return Optional.empty();
    }

    /** Why a cell that looks like a period is not one, for the message; empty when it does not look like one. */
    static String describeFailure(String cell) {
        String text = cell.trim();
        if (ISO_DATE.matcher(text).matches() || DOTTED_DATE.matcher(text).matches()) {
            return "'" + cell + "' is not a calendar date";
        }
        if (YEAR_MONTH.matcher(text).matches() || MONTH_YEAR.matcher(text).matches()) {
            return "'" + cell + "' has no month 1 to 12";
        }
        if (YEAR_WEEK.matcher(text).matches()) {
            return "'" + cell + "' is not an ISO week of that year";
        }
        return "'" + cell + "' is not a date or period";
    }

    static Frequency frequencyOf(Fixed fixed) {
        return fixed.period().frequency();
    }

    private static boolean isDigits(String text, int from, int to) {
        if (text.length() < to) {
            return false;
        }
        for (int i = from; i < to; i++) {
            char c = text.charAt(i);
            if (c < '0' || c > '9') {
                return false;
            }
        }
        return true;
    }

    private static int number(String text, int from, int to) {
        int n = 0;
        for (int i = from; i < to; i++) {
            n = n * 10 + (text.charAt(i) - '0');
        }
        return n;
    }

    private static Optional<Parsed> month(int year, int month, String format) {
        return Optional.of(new Fixed(Period.month(year, month), format));
    }

    private static int i(Matcher m, int group) {
        return Integer.parseInt(m.group(group));
    }

    private static String key(String name) {
        return name.toLowerCase(Locale.ROOT);
    }

    private static Map<String, Integer> monthNames() {
        String[] full = {"january", "february", "march", "april", "may", "june", "july", "august", "september",
            "october", "november", "december"};
        java.util.HashMap<String, Integer> names = new java.util.HashMap<>();
        for (int m = 0; m < 12; m++) {
            names.put(full[m], m + 1);
            names.put(full[m].substring(0, 3), m + 1);
        }
        names.put("sept", 9);
        return Map.copyOf(names);
    }
}
