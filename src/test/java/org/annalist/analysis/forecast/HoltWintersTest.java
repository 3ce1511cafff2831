package org.annalist.analysis.forecast;

import static org.annalist.analysis.forecast.AgainstR.relative;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.annalist.analysis.Reference;
import org.junit.jupiter.api.Test;

/**
 * Holt–Winters against R 4.2.2 stats::HoltWinters (holtwinters.json, holtwinters_*_forecast.csv):
 * {@code HoltWinters(co2)} and {@code HoltWinters(AirPassengers, seasonal = "multiplicative")}.
 */
class HoltWintersTest {

    @Test
    void additiveFilterOnCo2ReproducesRsSseCoefficientsAndForecasts() {
        HoltWinters.Fit fit = HoltWinters.of(12, HoltWinters.Seasonality.ADDITIVE)
                .filter(Reference.dataset("co2.csv"), 0.512648443564179, 0.00949766904602902, 0.472886787994818);
        relative(fit.sse(), 43.1298613676973, 1e-6, "SSE");
        relative(fit.level(), 364.761623668987, 1e-6, "a");
        relative(fit.trend(), 0.124743804250424, 1e-6, "b");
        relative(fit.seasonal()[0], 0.221527459955157, 1e-6, "s1");
        relative(fit.seasonal()[11], -0.584424985579845, 1e-6, "s12");
        double[] expected = Reference.csv("holtwinters_co2_forecast.csv").column("fit");
        double[] ours = fit.forecast(24);
        for (int h = 0; h < 24; h++) {
            relative(ours[h], expected[h], 1e-6, "forecast " + (h + 1));
        }
    }

    @Test
    void multiplicativeFilterOnAirPassengersReproducesR() {
        HoltWinters.Fit fit = HoltWinters.of(12, HoltWinters.Seasonality.MULTIPLICATIVE)
                .filter(Reference.dataset("AirPassengers.csv"), 0.27559247473635, 0.0326929527336615, 0.870729222265009);
        relative(fit.sse(), 16570.7778669999, 1e-6, "SSE");
        relative(fit.level(), 469.32322056716, 1e-6, "a");
        relative(fit.seasonal()[6], 1.35907775097163, 1e-6, "s7");
        double[] expected = Reference.csv("holtwinters_AirPassengers_mult_forecast.csv").column("fit");
        double[] ours = fit.forecast(24);
        for (int h = 0; h < 24; h++) {
            relative(ours[h], expected[h], 1e-6, "forecast " + (h + 1));
        }
    }

    @Test
    void ourOwnFitIsNoWorseThanRsByMoreThanHalfAPercent() {
        HoltWinters.Fit co2 = HoltWinters.of(12, HoltWinters.Seasonality.ADDITIVE).fit(Reference.dataset("co2.csv"));
        assertThat(co2.sse()).isLessThanOrEqualTo(43.1298613676973 * 1.005);
        HoltWinters.Fit air = HoltWinters.of(12, HoltWinters.Seasonality.MULTIPLICATIVE)
                .fit(Reference.dataset("AirPassengers.csv"));
        assertThat(air.sse()).isLessThanOrEqualTo(16570.7778669999 * 1.005);
        assertThat(air.alpha()).isBetween(0.0, 1.0);
    }
}
