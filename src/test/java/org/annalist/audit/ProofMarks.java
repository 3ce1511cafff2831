package org.annalist.audit;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * What a proof-reader marks in a brief's words, as patterns: each names the mistake it finds. The
 * conventions are the trade's (a true minus, a number kept with its % sign, no space before a
 * full stop; common practice in typesetting, no source) and the project's (a direction is said by
 * a word or by a sign, not both).
 */
enum ProofMarks {
    DIRECTION_AND_SIGN("a direction word and a sign together",
            "\\b(?:up|down|rose|fell|higher|lower)[ \\u00a0][+\\u2212-]\\d"),
    NEGATIVE_ZERO("a negative zero", "[\\u2212-]0(?:[.,]0+)?(?![\\d.,])"),
    SPACE_BEFORE_PUNCTUATION("a space before punctuation", "\\S[ \\u00a0][.,;:](?:\\s|$)"),
    BREAKABLE_PERCENT("a breakable space between a number and %", "\\d %"),
    HYPHEN_AS_MINUS("a hyphen used as a minus sign", "(?<![\\dA-Za-z])-\\d"),
    DEVELOPMENT_VERSION("a development version in a brief", "SNAPSHOT");

    final String mistake;
    private final Pattern pattern;

    ProofMarks(String mistake, String regex) {
        this.mistake = mistake;
        this.pattern = Pattern.compile(regex);
    }

    /** Each place in {@code text} with this mistake, with some words around it. */
    List<String> in(String text) {
        return matches(pattern, text);
    }

    static List<String> matches(Pattern pattern, String text) {
        List<String> found = new ArrayList<>();
        Matcher m = pattern.matcher(text);
        while (m.find()) {
            found.add(text.substring(Math.max(0, m.start() - 40), Math.min(text.length(), m.end() + 20)));
        }
        return found;
    }
}
