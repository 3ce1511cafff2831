package org.annalist.render;

import com.openhtmltopdf.extend.FSTextBreaker;
import java.text.BreakIterator;
import java.util.Locale;

/**
 * Line-break opportunities as the JDK's line {@link BreakIterator} finds them, less the ones it
 * wrongly offers inside a signed number: it breaks "+0.7" and "−0.7" after the decimal point
 * (seen with JDK 17; Unicode's line-breaking rules, UAX #14 rule LB25, keep a number whole), and
 * the ones it offers right after an opening bracket. A number split across two lines, or a bracket
 * left at a line's end, is a proof-reader's mark in a printed brief.
 */
final class NumberKeepingLineBreaker implements FSTextBreaker {

    private final BreakIterator lines = BreakIterator.getLineInstance(Locale.ROOT);
    private String text = "";

    @Override
    public void setText(String newText) {
        text = newText;
        lines.setText(newText);
    }

    @Override
    public int next() {
        int at = lines.next();
        while (at != BreakIterator.DONE && (insideNumber(at) || afterOpeningBracket(at))) {
            at = lines.next();
        }
        return at;
    }

    /** A break right after "(" (the JDK offers one before a letter, which strands the bracket at a line's end; UAX #14 rule LB14 forbids it). */
    private boolean afterOpeningBracket(int at) {
        return at >= 1 && at < text.length() && (text.charAt(at - 1) == '(' || text.charAt(at - 1) == '[');
    }

    /** A break between a decimal mark (or thousands separator) and the digit after it. */
    private boolean insideNumber(int at) {
        if (at < 2 || at >= text.length()) {
            return false;
        }
        char before = text.charAt(at - 1);
        return (before == '.' || before == ',') && Character.isDigit(text.charAt(at))
                && Character.isDigit(text.charAt(at - 2));
    }
}
