package org.annalist.chart;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/**
 * Axis ticks and bar labels in the text's typography (see narrative.Formats): true minus, no signed zero.
 * Expected strings: the number as written by hand under that convention (U+2212 for minus, comma
 * thousands, half-up at the printed decimals; common typesetting practice, no source).
 */
class NumberFormatsTest {

    @Test
    void negativeAxisTicksCarryTheTrueMinusAsTheTextDoes() {
        assertThat(NumberFormats.axis().format(-20)).isEqualTo("\u221220");
        assertThat(NumberFormats.axis().format(-2000.0)).isEqualTo("\u22122,000");
        assertThat(NumberFormats.axis().format(-0.25)).isEqualTo("\u22120.25");
        assertThat(NumberFormats.axis().format(12500.0)).isEqualTo("12,500");
    }

    @Test
    void aTickThatRoundsToZeroIsPrintedWithoutASign() {
        // a tick computed as a tiny negative number (floating-point steps from a negative lower bound)
        assertThat(NumberFormats.axis().format(-1e-17)).isEqualTo("0");
        assertThat(NumberFormats.axis().format(-0.0)).isEqualTo("0");
        assertThat(NumberFormats.axis().format(-0.001)).isEqualTo("0");
    }

    @Test
    void signedBarLabelsUseTheTrueMinusAndLeaveZeroUnsigned() {
        assertThat(NumberFormats.signed(0).format(14.2)).isEqualTo("+14");
        assertThat(NumberFormats.signed(0).format(-17.4)).isEqualTo("\u221217");
        assertThat(NumberFormats.signed(0).format(-0.3)).isEqualTo("0");
        assertThat(NumberFormats.signed(0).format(0.4)).isEqualTo("0");
        assertThat(NumberFormats.signed(1).format(-3.46)).isEqualTo("\u22123.5");
        assertThat(NumberFormats.signed(1).format(-0.04)).isEqualTo("0");
        assertThat(NumberFormats.signed(1).format(1234.56)).isEqualTo("+1,234.6");
    }
}
