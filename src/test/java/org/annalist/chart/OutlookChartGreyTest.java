package org.annalist.chart;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Color;
import org.junit.jupiter.api.Test;

/**
 * The outlook chart printed in greyscale: its lines and bands are told apart by lightness alone.
 * Contrast is WCAG 2.1's ratio of relative luminances, (L1 + 0.05) / (L2 + 0.05), with the sRGB
 * transfer function of its definition; 3:1 is its minimum for graphical objects (success criterion
 * 1.4.11), which a greyscale printer keeps as the luminance is what it prints.
 */
class OutlookChartGreyTest {

    @Test
    void theForecastLineStandsOutFromThe80PercentBandInGrey() {
        assertThat(contrast(OutlookChart.FORECAST, OutlookChart.BAND_80)).isGreaterThanOrEqualTo(3.0);
        assertThat(contrast(OutlookChart.FORECAST, OutlookChart.BAND_95)).isGreaterThanOrEqualTo(3.0);
        // the accent the line had before printed almost as light as the band it runs in
        assertThat(contrast(ChartStyle.ACCENT, OutlookChart.BAND_80)).isLessThan(2.0);
    }

    @Test
    void theTwoBandsDifferInLightness() {
        assertThat(contrast(OutlookChart.BAND_80, OutlookChart.BAND_95)).isGreaterThan(1.5);
    }

    /** WCAG 2.1 contrast ratio of two colours. */
    static double contrast(Color a, Color b) {
        double la = luminance(a);
        double lb = luminance(b);
        return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
    }

    /** WCAG 2.1 relative luminance: 0.2126 R + 0.7152 G + 0.0722 B of the linearised sRGB channels. */
    private static double luminance(Color c) {
        return 0.2126 * linear(c.getRed()) + 0.7152 * linear(c.getGreen()) + 0.0722 * linear(c.getBlue());
    }

    private static double linear(int channel) {
        double v = channel / 255.0;
        return v <= 0.04045 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }
}
