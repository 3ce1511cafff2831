package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * The brief's typography for numbers (common practice of proof-readers, no source): the true minus
 * sign U+2212, no sign on a value that rounds to zero, a no-break space between a number and its
 * {@code %} and inside {@code p = …}, and a change either signed or as a size after a direction word.
 */
class FormatsTest {

    private static final String MINUS = "\u2212";
    private static final String NBSP = "\u00A0";
    /** Whole values: changes in whole units. */
    private final Formats whole = Formats.forValues(new double[] {120, 3400}, Locale.ENGLISH);
    /** Values with a decimal and some of 100 or more: one decimal. */
    private final Formats oneDecimal = Formats.forValues(new double[] {120.5, 3.25}, Locale.ENGLISH);

    @Test
    void negativeNumbersCarryTheTrueMinusNeverTheHyphen() {
        assertThat(whole.value(-1250.0)).isEqualTo(MINUS + "1,250");
        assertThat(whole.signedValue(-1250.0)).isEqualTo(MINUS + "1,250");
        assertThat(whole.percent(-3.25)).isEqualTo(MINUS + "3.2" + NBSP + "%");
        assertThat(whole.signedPercent(-65.7)).isEqualTo(MINUS + "65.7" + NBSP + "%");
        assertThat(whole.fixed(-2.5, 2)).isEqualTo(MINUS + "2.50");
        assertThat(whole.signedFixed(-1.94, 1)).isEqualTo(MINUS + "1.9");
        assertThat(whole.significant(-2943)).isEqualTo(MINUS + "2,940");
        assertThat(whole.count(-3)).isEqualTo(MINUS + "3");
        for (String s : new String[] {whole.value(-7.0), whole.percent(-1), whole.fixed(-0.5, 1),
            whole.signedSignificant(-0.071)}) {
            assertThat(s).doesNotContain("-");
        }
    }

    @Test
    void aValueThatRoundsToZeroHasNoSign() {
        assertThat(whole.value(-0.4)).isEqualTo("0");
        assertThat(oneDecimal.value(-0.04)).isEqualTo("0.0");
        assertThat(whole.signedValue(-0.4)).isEqualTo("0");
        assertThat(whole.signedValue(0.0)).isEqualTo("0");
        assertThat(whole.signedPercent(-0.04)).isEqualTo("0.0" + NBSP + "%");
        assertThat(whole.signedPercent(0.049)).isEqualTo("0.0" + NBSP + "%");
        assertThat(whole.signedPercent(0.0)).isEqualTo("0.0" + NBSP + "%");
        assertThat(whole.percent(-0.01)).isEqualTo("0.0" + NBSP + "%");
        assertThat(whole.fixed(-0.001, 2)).isEqualTo("0.00");
        assertThat(whole.signedFixed(-0.004, 2)).isEqualTo("0.00");
        // just past the rounding boundary the sign returns
        assertThat(whole.signedPercent(-0.06)).isEqualTo(MINUS + "0.1" + NBSP + "%");
        assertThat(whole.signedPercent(0.06)).isEqualTo("+0.1" + NBSP + "%");
    }

    @Test
    void aChangeIsEitherSignedOrASizeForADirectionWord() {
        assertThat(whole.signedPercent(9.66)).isEqualTo("+9.7" + NBSP + "%");
        assertThat(whole.percentSize(9.66)).isEqualTo("9.7" + NBSP + "%");
        assertThat(whole.percentSize(-65.7)).isEqualTo("65.7" + NBSP + "%");
        assertThat(whole.valueSize(-1250.0)).isEqualTo("1,250");
        assertThat(whole.percentSize(null)).isEqualTo("\u2013");
        assertThat(whole.percentSize(Double.NaN)).isEqualTo("\u2013");
    }

    @Test
    void aNumberAndItsPercentSignAndThePartsOfAPValueAreJoinedByNoBreakSpaces() {
        assertThat(whole.percent(1.0)).isEqualTo("1.0" + NBSP + "%").doesNotContain(" ");
        assertThat(whole.signedPercent(4.2)).doesNotContain(" ");
        assertThat(whole.pValue(0.0234)).isEqualTo("p" + NBSP + "=" + NBSP + "0.023");
        assertThat(whole.pValue(0.00001)).isEqualTo("p" + NBSP + "<" + NBSP + "0.001");
        assertThat(whole.pValue(0.001, 0.002)).isEqualTo("p" + NBSP + "\u2264" + NBSP + "0.002");
    }
}
