package org.annalist.narrative;

import java.util.regex.Pattern;

/**
 * The brief's number typography (see {@link Formats}) applied to a sentence built with
 * {@code String.format}, where a {@code %+.1f} writes the hyphen-minus and may write {@code -0.0}:
 * the calendar notes and the plain-text notes. Numbers formatted by {@link Formats} need none of it.
 */
final class Typography {

    /** A sign before a number that rounds to zero in the places shown: {@code +0.0}, {@code −0}. */
    private static final Pattern SIGNED_ZERO = Pattern.compile("(?<![\\p{L}\\p{N}.])[+\u2212]0(?:\\.0+)?(?!\\d|\\.\\d)");
    /** A space between a number and its per cent sign. */
    private static final Pattern PERCENT_SPACE = Pattern.compile("(?<=\\d) (?=%)");

    private Typography() {
    }

    /** The true minus sign for the hyphen-minus before a number, and no sign on a value that rounds to zero. */
    static String signs(String text) {
        String minus = minusSigns(text);
        // a signed zero starts with a sign and a 0: most sentences have none, and skip the pattern
        if (!minus.contains("+0") && !minus.contains("\u22120")) {
            return minus;
        }
        return SIGNED_ZERO.matcher(minus).replaceAll(m -> m.group().substring(1));
    }

    /**
     * The true minus sign for each hyphen-minus that opens a number: one before an ASCII digit and not
     * after a letter, a digit, an underscore or another hyphen-minus (not inside a period label such
     * as 2024-03, nor in 2.5e-05). A scan rather than a pattern with a look-behind: the notes of a
     * file of 10,000 series spent over a second of CPU in that pattern.
     */
    static String minusSigns(String text) {
        StringBuilder out = null;
        for (int i = text.indexOf('-'); i >= 0; i = text.indexOf('-', i + 1)) {
            boolean beforeDigit = i + 1 < text.length() && text.charAt(i + 1) >= '0' && text.charAt(i + 1) <= '9';
            // the character before, as the pattern's look-behind saw it: half of a pair of surrogates is no letter
            if (beforeDigit && (i == 0 || !partOfAWord(text.charAt(i - 1)))) {
                if (out == null) {
                    out = new StringBuilder(text);
                }
                out.setCharAt(i, '\u2212');
            }
        }
        return out == null ? text : out.toString();
    }

    /** A letter, a number (any script), an underscore or a hyphen-minus, one UTF-16 unit at a time as the pattern saw it. */
    private static boolean partOfAWord(char c) {
        if (c == '_' || c == '-' || Character.isLetter(c)) {
            return true;
        }
        int type = Character.getType(c);
        return type == Character.DECIMAL_DIGIT_NUMBER || type == Character.LETTER_NUMBER || type == Character.OTHER_NUMBER;
    }

    /** As {@link #signs}, and a no-break space between a number and its {@code %}: for printed text. */
    static String printed(String text) {
        return PERCENT_SPACE.matcher(signs(text)).replaceAll("\u00A0");
    }
}
