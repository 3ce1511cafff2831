package org.annalist.chart;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

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
        assertThat(NumberFormats.signed(1).format(-0.04)).isEqualTo("0.0");
        assertThat(NumberFormats.signed(1).format(1234.56)).isEqualTo("+1,234.6");
    }

    /** Bar labels side by side share their decimals: never "+12" beside "+3.5" (the glassworks profile). */
    @Test
    void barLabelsSideBySideShareTheirDecimals() {
        assertThat(NumberFormats.signed(1).format(12.0)).isEqualTo("+12.0");
        assertThat(NumberFormats.signed(1).format(3.5)).isEqualTo("+3.5");
        // three significant digits of the largest bar, as the text gives peak and trough (invented profiles)
        assertThat(SeasonalProfileChart.labelStep(profile(5137.7, -4824.0, 976.3))).isEqualTo(10);
        assertThat(SeasonalProfileChart.labelStep(profile(12.04, 3.5, -7.2))).isCloseTo(0.1, within(1e-12));
        assertThat(SeasonalProfileChart.labelStep(profile(0.31, -0.2))).isCloseTo(0.001, within(1e-15));
    }

    private static java.util.List<org.annalist.findings.SeasonalityFinding.ProfilePoint> profile(double... indices) {
        java.util.List<org.annalist.findings.SeasonalityFinding.ProfilePoint> points = new java.util.ArrayList<>();
        for (int i = 0; i < indices.length; i++) {
            points.add(new org.annalist.findings.SeasonalityFinding.ProfilePoint(i + 1, "M" + (i + 1), indices[i]));
        }
        return points;
    }
}
