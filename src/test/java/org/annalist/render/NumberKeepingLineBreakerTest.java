package org.annalist.render;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

// The expected pieces are the line-break opportunities UAX #14 gives the invented sentence (break after
// a space, none inside a number or after "("), worked out by hand.
class NumberKeepingLineBreakerTest {

    private static List<String> pieces(String text) {
        NumberKeepingLineBreaker breaker = new NumberKeepingLineBreaker();
        breaker.setText(text);
        List<String> pieces = new ArrayList<>();
        int from = 0;
        for (int at = breaker.next(); at >= 0; at = breaker.next()) {
            pieces.add(text.substring(from, at));
            from = at;
        }
        return pieces;
    }

    /** The JDK's line iterator splits "+0.7" after the point (seen with JDK 17); a brief must not. */
    @Test
    void aSignedNumberIsNeverSplitAtItsDecimalPoint() {
        assertThat(pieces("interval), +0.7\u00A0% on the estimate and \u22120.7\u00A0% or 1,620,000 x"))
                .containsExactly("interval), ", "+0.7\u00A0% ", "on ", "the ", "estimate ", "and ", "\u22120.7\u00A0% ",
                        "or ", "1,620,000 ", "x");
    }

    @Test
    void anOpeningBracketStaysWithTheWordAfterIt() {
        assertThat(pieces("a year (p\u00A0<\u00A00.001) and")).doesNotContain("(").allSatisfy(p -> assertThat(p).doesNotEndWith("("));
    }
}
