package org.annalist.narrative;

import java.util.regex.Pattern;

/**
 * The brief's number typography (see {@link Formats}) applied to a sentence built with
 * {@code String.format}, where a {@code %+.1f} writes the hyphen-minus and may write {@code -0.0}:
 * the calendar notes and the plain-text notes. Numbers formatted by {@link Formats} need none of it.
 */
final class Typography {

    /** A hyphen-minus that opens a number (not one inside a period label such as 2024-03, nor in 2.5e-05). */
    private static final Pattern HYPHEN_MINUS = Pattern.compile("(?<![\\p{L}\\p{N}_\\-])-(?=\\d)");
    /** A sign before a number that rounds to zero in the places shown: {@code +0.0}, {@code −0}. */
    private static final Pattern SIGNED_ZERO = Pattern.compile("(?<![\\p{L}\\p{N}.])[+\u2212]0(?:\\.0+)?(?!\\d|\\.\\d)");
    /** A space between a number and its per cent sign. */
    private static final Pattern PERCENT_SPACE = Pattern.compile("(?<=\\d) (?=%)");

    private Typography() {
    }

    /** The true minus sign for the hyphen-minus before a number, and no sign on a value that rounds to zero. */
    static String signs(String text) {
        String minus = HYPHEN_MINUS.matcher(text).replaceAll("\u2212");
        return SIGNED_ZERO.matcher(minus).replaceAll(m -> m.group().substring(1));
    }

    /** As {@link #signs}, and a no-break space between a number and its {@code %}: for printed text. */
    static String printed(String text) {
        return PERCENT_SPACE.matcher(signs(text)).replaceAll("\u00A0");
    }
}
