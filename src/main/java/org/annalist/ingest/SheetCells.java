package org.annalist.ingest;

import java.math.BigDecimal;
import java.math.MathContext;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.Optional;
import java.util.Set;

/**
 * Turns the typed values of workbook cells into the text a CSV export of the sheet would hold, so that
 * a sheet goes through the same reading as a CSV file: numbers in plain decimal notation with a point,
 * dates as ISO 8601 ({@code 2024-03-01}), percentages with their sign, errors as missing cells.
 */
final class SheetCells {

    /**
     * The error values a cell can hold (ECMA-376 Part 1 §18.17.3 and the cell type {@code e}, §18.18.11;
     * OpenFormula, ODF 1.2 Part 2 §5.12, with LibreOffice's {@code Err:nnn}); a text cell that says one
     * of them (pasted from a sheet) is taken as the error too.
     */
    private static final Set<String> ERRORS = Set.of("#NULL!", "#DIV/0!", "#VALUE!", "#REF!", "#NAME?", "#NUM!",
            "#N/A", "#GETTING_DATA", "#SPILL!", "#CALC!", "#FIELD!", "#BLOCKED!", "#UNKNOWN!", "#CONNECT!", "#BUSY!");

    /** Spreadsheet programs keep and show 15 significant digits (common practice, no source). */
    private static final MathContext DIGITS = new MathContext(15);

    private SheetCells() {
    }

    private static final java.util.regex.Pattern NUMBERED_ERROR = java.util.regex.Pattern.compile("Err:\\d{3}");

    static boolean isError(String text) {
        if (text.isEmpty() || (text.charAt(0) != '#' && text.charAt(0) != 'E')) {
            return false;   // the commonest cells, without a look-up
        }
        return ERRORS.contains(text) || NUMBERED_ERROR.matcher(text).matches();
    }

    /**
     * The text of a number: an integer without a point, else 15 significant digits in plain notation.
     * A number such as 1.234 gets a fourth decimal ({@code 1.2340}), because the reader takes a lone
     * {@code 1.234} in a file whose numbers show no other decimal point for 1,234 with a thousands point.
     */
    static String number(double value) {
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return Long.toString((long) value);
        }
        if (!Double.isFinite(value)) {
            return "";
        }
        String text = new BigDecimal(value).round(DIGITS).stripTrailingZeros().toPlainString();
        int point = text.indexOf('.');
        int integerDigits = point - (text.startsWith("-") ? 1 : 0);
        if (point > 0 && text.length() - point - 1 == 3 && integerDigits <= 3) {
            text += "0";
        }
        return text;
    }

    /** The text of a percentage cell ({@code 0.125} → {@code 12.5%}), as a spreadsheet shows it. */
    static String percent(double fraction) {
        return number(new BigDecimal(fraction).round(DIGITS).movePointRight(2).doubleValue()) + "%";
    }

    /**
     * The date and time of a serial value (ECMA-376 Part 1 §18.17.4.1, Date Conversion for Serial Values):
     * in the 1904 date system day 0 is 1 January 1904; in the 1900 system day 1 is 1 January 1900 and,
     * "for legacy reasons", 1900 counts as a leap year (1st edition, Part 4 §3.17.4.1: serial 60 is the
     * 29 February 1900 that never was, serial 61 is 1 March 1900). Empty for serial 60 of the 1900 system
     * and for values outside the systems' range (before their first day, after 9999-12-31).
     */
    static Optional<LocalDateTime> serialDate(double serial, boolean date1904) {
        if (!Double.isFinite(serial) || serial >= 2_958_466 || serial < (date1904 ? 0 : 1)) {
            return Optional.empty();
        }
        long day = (long) Math.floor(serial);
        long seconds = Math.round((serial - day) * 86_400);
        if (seconds == 86_400) {
            day++;
            seconds = 0;
        }
        LocalDate date;
        if (date1904) {
            date = LocalDate.of(1904, 1, 1).plusDays(day);
        } else if (day == 60) {
            return Optional.empty();
        } else {
            date = (day < 60 ? LocalDate.of(1899, 12, 31) : LocalDate.of(1899, 12, 30)).plusDays(day);
        }
        return Optional.of(date.atStartOfDay().plusSeconds(seconds));
    }

    /** A date as the reader's period cells take it: {@code 2024-03-01}, with the time only when there is one. */
    static String date(LocalDateTime when) {
        return when.toLocalTime().toSecondOfDay() == 0 ? when.toLocalDate().toString() : when.toString().replace('T', ' ');
    }

    /**
     * Whether a number format shows a date (ECMA-376 Part 1 §18.8.30, numFmt): the built-in date formats
     * 14–22 and 45–47 (and 27–36, 50–58, the East Asian dates), or a format code that, outside quoted
     * text, escapes and bracketed colours or locales, has a year, a day, or a month without hours or
     * seconds beside it (an {@code m} next to {@code h} or {@code s} is minutes).
     */
    static boolean isDateFormat(int id, String code) {
        if ((id >= 14 && id <= 22) || (id >= 45 && id <= 47) || (id >= 27 && id <= 36) || (id >= 50 && id <= 58)) {
            return true;
        }
        if (code == null || code.isEmpty()) {
            return false;
        }
        String plain = plainFormat(code);
        boolean year = plain.indexOf('y') >= 0;
        boolean day = plain.indexOf('d') >= 0;   // 'General' has no y, d, m, h or s
        boolean month = plain.indexOf('m') >= 0 && plain.indexOf('h') < 0 && plain.indexOf('s') < 0;
        return year || day || month;
    }

    /** Whether a number format shows a percentage (built-in 9 and 10, or a {@code %} outside quotes). */
    static boolean isPercentFormat(int id, String code) {
        return id == 9 || id == 10 || (code != null && plainFormat(code).indexOf('%') >= 0);
    }

    /** The first section of a format code, lower-cased, without quoted text, escapes and [brackets]. */
    private static String plainFormat(String code) {
        StringBuilder plain = new StringBuilder();
        boolean quoted = false;
        int bracket = 0;
        for (int i = 0; i < code.length(); i++) {
            char c = code.charAt(i);
            if (quoted) {
                quoted = c != '"';
            } else if (c == '"') {
                quoted = true;
            } else if (c == '\\' || c == '_' || c == '*') {
                i++;
            } else if (c == '[') {
                bracket++;
            } else if (c == ']') {
                bracket = Math.max(0, bracket - 1);
            } else if (c == ';' && bracket == 0) {
                break;
            } else if (bracket == 0) {
                plain.append(Character.toLowerCase(c));
            }
        }
        return plain.toString();
    }
}
