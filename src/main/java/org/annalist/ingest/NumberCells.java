package org.annalist.ingest;

import java.util.EnumSet;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.annalist.series.ValueFlag;

/**
 * Reads the value cells that statistical offices and spreadsheets write: decimal point or
 * comma, thousands grouped by comma, point, space or apostrophe, missing-value markers, a trailing
 * percent sign, a currency sign before or after the number, and trailing flag letters ({@code 123p}, {@code 45 e}, {@code : c}).
 */
final class NumberCells {

    /** A cell read as a number (or as missing, {@code NaN}) with its flags. */
    record Cell(double value, Set<ValueFlag> flags, boolean percent) {
    }

    /** What a cell's shape says about the decimal mark. */
    enum Evidence { POINT, COMMA, NONE }

    /** Written for "no value" by spreadsheets and statistical offices (common practice). */
    private static final Set<String> MISSING_MARKERS = Set.of(
            "", "na", "n/a", "n.a.", "nan", "null", "none", "-", "--", "\u2013", "\u2014", "..", "...", "\u2026",
            ":", "x", "#n/a", "#value!", "#div/0!");
    /** Currency signs before or after a price ({@code €12.50}, {@code 12,50 €}) are read past (common in exports). */
    private static final String CURRENCY = "[\u20AC$\u00A3\u00A5]";
    private static final String GROUPING_SPACES = " \u00A0\u202F\u2007";
    private static final Pattern NUMBER = Pattern.compile(
            "(?:" + CURRENCY + " ?)?([+\\-\u2212]?)(?:" + CURRENCY + " ?)?([0-9](?:[0-9.,'\u2019" + GROUPING_SPACES
                    + "]*[0-9])?[.,]?)(?: ?" + CURRENCY + ")?(%?)[ ]*([A-Za-z]{0,3})");
    private static final Pattern MISSING_WITH_FLAGS = Pattern.compile("(.*?)[ ]*([A-Za-z]{1,3})");

    /**
     * The largest size of value read (10^100): the methods square values and sum the squares, and
     * from about 10^150 on that overflows double precision into infinities and NaN statistics
     * (a value of 10^-200 underflows the same way, to zeros and NaN).
     */
    static final double MAX_MAGNITUDE = 1e100;
    /** The smallest size of value other than zero read (10^-100): below it the squares underflow to zero. */
    static final double MIN_MAGNITUDE = 1e-100;

    private NumberCells() {
    }

    static boolean isMissingMarker(String cell) {
        if (plainDigits(cell) >= 0) {
            return false;
        }
        return MISSING_MARKERS.contains(cell.toLowerCase(Locale.ROOT)) || missingWithFlags(cell).isPresent();
    }

    /** True when the cell has the shape of a number, whatever its decimal mark. */
    static boolean looksNumeric(String cell) {
        if (plainDigits(cell) >= 0) {
            return true;
        }
        Matcher m = NUMBER.matcher(cell);
        return m.matches() && knownFlags(m).isPresent();
    }

    /** The decimal mark that the digits of {@code cell} prove, if any. */
    static Evidence evidence(String cell) {
        int point = plainDigits(cell);
        if (point == 0) {
            return Evidence.NONE;
        }
        if (point == 1) {
            return pointEvidence(cell);
        }
        return patternEvidence(cell);
    }

    /** {@link #evidence} by the number pattern alone, for any cell (the shortcuts above agree with it). */
    static Evidence patternEvidence(String cell) {
        Matcher m = NUMBER.matcher(cell);
        if (!m.matches()) {
            return Evidence.NONE;
        }
        String body = m.group(2);
        int lastPoint = body.lastIndexOf('.');
        int lastComma = body.lastIndexOf(',');
        if (lastPoint >= 0 && lastComma >= 0) {
            return lastPoint > lastComma ? Evidence.POINT : Evidence.COMMA;
        }
        int last = Math.max(lastPoint, lastComma);
        if (last < 0) {
            return Evidence.NONE;
        }
        char mark = body.charAt(last);
        boolean repeated = body.indexOf(mark) != last;
        if (repeated) {
            return mark == '.' ? Evidence.COMMA : Evidence.POINT;   // a repeated mark can only group thousands
        }
        int digitsAfter = body.length() - last - 1;
        String integerPart = body.substring(0, last).replaceAll("[^0-9]", "");
        boolean groupable = digitsAfter == 3 && !integerPart.isEmpty() && !integerPart.equals("0")
                && integerPart.length() <= 3 && body.substring(0, last).chars().allMatch(Character::isDigit);
        if (groupable) {
            return Evidence.NONE;                                    // 1,234 or 1.234: either reading fits
        }
        return mark == '.' ? Evidence.POINT : Evidence.COMMA;
    }

    /**
     * {@link #evidence} of a cell of an optional minus and digits with one point between digits
     * ({@code 12.5}, {@code -1.234}), as the pattern's reading below decides it, without the patterns
     * (the commonest value cell; a file of millions of them spent most of its reading time there):
     * the point proves itself unless it could group thousands, that is, exactly three digits follow
     * it and one to three digits other than a lone 0 precede it.
     */
    private static Evidence pointEvidence(String cell) {
        int start = cell.charAt(0) == '-' ? 1 : 0;
        int point = cell.indexOf('.');
        int digitsBefore = point - start;
        int digitsAfter = cell.length() - point - 1;
        boolean loneZero = digitsBefore == 1 && cell.charAt(start) == '0';
        boolean groupable = digitsAfter == 3 && digitsBefore <= 3 && !loneZero;
        return groupable ? Evidence.NONE : Evidence.POINT;
    }

    /**
     * Reads {@code cell} with {@code mark} as the decimal mark.
     *
     * @return the value, or empty with {@code why} filled when the cell is no number in that convention
     */
    static Optional<Cell> parse(String cell, DecimalMark mark, StringBuilder why) {
        int point = plainDigits(cell);
        if (point == 0 || (point == 1 && mark == DecimalMark.POINT)) {
            double value = Double.parseDouble(cell);   // the common case, read directly
            if (Math.abs(value) <= MAX_MAGNITUDE && (value == 0 || Math.abs(value) >= MIN_MAGNITUDE)) {
                return Optional.of(new Cell(value, Set.of(), false));
            }
        }
        if (MISSING_MARKERS.contains(cell.toLowerCase(Locale.ROOT))) {
            return Optional.of(new Cell(Double.NaN, Set.of(), false));
        }
        Optional<Set<ValueFlag>> missingFlags = missingWithFlags(cell);
        if (missingFlags.isPresent()) {
            return Optional.of(new Cell(Double.NaN, missingFlags.get(), false));
        }
        Matcher m = NUMBER.matcher(cell);
        if (!m.matches()) {
            why.append("'").append(cell).append("' is not a number");
            return Optional.empty();
        }
        Optional<Set<ValueFlag>> flags = knownFlags(m);
        if (flags.isEmpty()) {
            why.append("'").append(cell).append("' ends in '").append(m.group(4))
                    .append("', which is not a known flag (").append(ValueFlag.knownCodes()).append(')');
            return Optional.empty();
        }
        String digits = ungroup(m.group(2), mark);
        if (digits == null) {
            why.append("'").append(cell).append("' is not a number with a decimal ")
                    .append(mark == DecimalMark.POINT ? "point" : "comma").append(" and thousands in groups of three");
            return Optional.empty();
        }
        double value = Double.parseDouble(digits);
        if (!(Math.abs(value) <= MAX_MAGNITUDE)) {
            why.append("'").append(cell).append("' is beyond ±1e100, the largest size of value the methods can square and sum");
            return Optional.empty();
        }
        if (value != 0 && Math.abs(value) < MIN_MAGNITUDE) {
            why.append("'").append(cell).append("' is nearer zero than ±1e-100 without being zero, smaller than the methods can square and sum");
            return Optional.empty();
        }
        if (!m.group(1).isEmpty() && m.group(1).charAt(0) != '+') {
            value = -value;
        }
        return Optional.of(new Cell(value, flags.get(), !m.group(3).isEmpty()));
    }

    /**
     * The value of a cell of an optional minus and up to 15 digits ({@code -1234}), read without the
     * patterns or any object, as {@link #parse} reads it with either mark; {@code NaN} for any other cell.
     */
    static double plainInteger(String cell) {
        int length = cell.length();
        boolean negative = length > 1 && cell.charAt(0) == '-';
        int start = negative ? 1 : 0;
        if (length == start || length > 15) {
            return Double.NaN;
        }
        long n = 0;
        for (int i = start; i < length; i++) {
            char c = cell.charAt(i);
            if (c < '0' || c > '9') {
                return Double.NaN;
            }
            n = n * 10 + (c - '0');
        }
        return negative ? -(double) n : (double) n;
    }

    /**
     * For the commonest cells, a shortcut past the patterns: 0 for an optional minus and digits only
     * ({@code -1234}), 1 for digits with one point between digits ({@code 12.5}), -1 for anything else.
     */
    private static int plainDigits(String cell) {
        int length = cell.length();
        int start = length > 1 && cell.charAt(0) == '-' ? 1 : 0;
        if (length == start || length > 15) {
            return -1;
        }
        int points = 0;
        for (int i = start; i < length; i++) {
            char c = cell.charAt(i);
            if (c == '.') {
                if (points++ > 0 || i == start || i == length - 1) {
                    return -1;
                }
            } else if (c < '0' || c > '9') {
                return -1;
            }
        }
        return points;
    }

    /** Plain digits with '.' as decimal point, or null when the grouping is not in threes. */
    private static String ungroup(String body, DecimalMark mark) {
        int decimalAt = body.indexOf(mark.symbol());
        if (decimalAt >= 0 && body.indexOf(mark.symbol(), decimalAt + 1) >= 0) {
            return null;
        }
        String integerPart = decimalAt >= 0 ? body.substring(0, decimalAt) : body;
        String fraction = decimalAt >= 0 ? body.substring(decimalAt + 1) : "";
        if (!fraction.chars().allMatch(Character::isDigit) || (decimalAt >= 0 && fraction.isEmpty())) {
            return null;
        }
        String[] groups = integerPart.split("[" + (mark == DecimalMark.POINT ? "," : ".") + "'\u2019" + GROUPING_SPACES + "]", -1);
        if (groups.length > 1) {
            if (groups[0].isEmpty() || groups[0].length() > 3) {
                return null;
            }
            for (int g = 1; g < groups.length; g++) {
                if (groups[g].length() != 3) {
                    return null;
                }
            }
        }
        StringBuilder plain = new StringBuilder();
        for (String group : groups) {
            if (!group.chars().allMatch(Character::isDigit)) {
                return null;
            }
            plain.append(group);
        }
        if (plain.length() == 0) {
            return null;
        }
        return fraction.isEmpty() ? plain.toString() : plain + "." + fraction;
    }

    private static Optional<Set<ValueFlag>> knownFlags(Matcher m) {
        return flagsOf(m.group(4));
    }

    private static Optional<Set<ValueFlag>> flagsOf(String letters) {
        EnumSet<ValueFlag> flags = EnumSet.noneOf(ValueFlag.class);
        for (char c : letters.toCharArray()) {
            Optional<ValueFlag> flag = ValueFlag.fromCode(c);
            if (flag.isEmpty()) {
                return Optional.empty();
            }
            flags.add(flag.get());
        }
        return Optional.of(Set.copyOf(flags));
    }

    private static Optional<Set<ValueFlag>> missingWithFlags(String cell) {
        Matcher m = MISSING_WITH_FLAGS.matcher(cell);
        if (!m.matches() || m.group(1).isEmpty() || !MISSING_MARKERS.contains(m.group(1).toLowerCase(Locale.ROOT))) {
            return Optional.empty();
        }
        return flagsOf(m.group(2));
    }
}
