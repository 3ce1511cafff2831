package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import org.annalist.analysis.Reference;
import org.junit.jupiter.api.Test;

/**
 * The back-test's one-pass forecasts from every origin against the slow way: the same model refiltered on
 * the values before each origin. The series: AirPassengers (Box &amp; Jenkins 1976, R's {@code datasets}),
 * copied into the test resources.
 */
class MembersTest {

    private static final double[] AIR = Reference.dataset("AirPassengers.csv");
    private static final int FIRST_ORIGIN = AIR.length - 24;
    private static final int REACH = 18;

    @Test
    void arimaForecastsFromEveryOriginEqualThoseOfTheModelRefilteredOnTheValuesBeforeIt() {
        for (ArimaOrder order : new ArimaOrder[] {new ArimaOrder(0, 1, 1, 0, 1, 1, 12, false),
                new ArimaOrder(1, 0, 0, 1, 1, 0, 12, true)}) {
            Arima.Fit fit = Arima.fit(Arrays.copyOf(AIR, FIRST_ORIGIN), order, Arima.Method.CSS).orElseThrow();
            double[][] onePass = fit.forecastsFromOrigins(AIR, FIRST_ORIGIN, REACH).orElseThrow();
            for (int o = FIRST_ORIGIN; o < AIR.length; o++) {
                double[] refiltered = Arima.withCoefficients(Arrays.copyOf(AIR, o), order, Arima.Method.CSS,
                        fit.coefficients()).orElseThrow().forecast(Math.min(REACH, AIR.length - o));
                assertSame(onePass[o - FIRST_ORIGIN], refiltered, order + " from origin " + o);
            }
        }
    }

    @Test
    void etsForecastsFromEveryOriginEqualThoseOfTheModelRefilteredOnTheValuesBeforeIt() {
        EtsModel model = new EtsModel(EtsModel.Error.MULTIPLICATIVE, EtsModel.Trend.ADDITIVE, true,
                EtsModel.Season.MULTIPLICATIVE, 12);
        EtsModel.Fit fit = model.fit(Arrays.copyOf(AIR, FIRST_ORIGIN)).orElseThrow();
        double[][] onePass = EtsFilter.forecastsFromOrigins(model, AIR, fit.parameters(), FIRST_ORIGIN, REACH)
                .orElseThrow();
        for (int o = FIRST_ORIGIN; o < AIR.length; o++) {
            double[] refiltered = model.filter(Arrays.copyOf(AIR, o), fit.parameters()).orElseThrow()
                    .forecast(Math.min(REACH, AIR.length - o));
            assertSame(onePass[o - FIRST_ORIGIN], refiltered, "from origin " + o);
        }
    }

    /** Equal up to rounding: the one pass and the refiltering do the same arithmetic in the same order. */
    private static void assertSame(double[] onePass, double[] refiltered, String what) {
        assertThat(onePass).as(what).hasSameSizeAs(refiltered);
        for (int k = 0; k < refiltered.length; k++) {
            assertThat(onePass[k]).as(what + ", step " + (k + 1)).isCloseTo(refiltered[k],
                    within(1e-9 * Math.abs(refiltered[k])));
        }
    }
}
