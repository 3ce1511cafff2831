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
                EtsModel.Season.MULTIPLICATIVE, 12, EtsModel.Estimator.QUASI_NEWTON);
        EtsModel.Fit fit = model.fit(Arrays.copyOf(AIR, FIRST_ORIGIN)).orElseThrow();
        double[][] onePass = EtsFilter.forecastsFromOrigins(model, AIR, fit.parameters(), FIRST_ORIGIN, REACH)
                .orElseThrow();
        for (int o = FIRST_ORIGIN; o < AIR.length; o++) {
            double[] refiltered = model.filter(Arrays.copyOf(AIR, o), fit.parameters()).orElseThrow()
                    .forecast(Math.min(REACH, AIR.length - o));
            assertSame(onePass[o - FIRST_ORIGIN], refiltered, "from origin " + o);
        }
    }

    @Test
    void thetaInTheBacktestKeepsTheSeasonalAdjustmentChosenOnAllValuesThoughTwoSeasonsAreTooFewToTestIt() {
        // invented: 46 months, a ±40 % season around 10,000 rising 2 % a year, 3 % noise
        java.util.Random random = new java.util.Random(46);
        double[] y = new double[46];
        for (int t = 0; t < y.length; t++) {
            y[t] = 10_000 * Math.pow(1.02, t / 12.0) * (1 + 0.4 * Math.sin(2 * Math.PI * (t - 3) / 12))
                    * Math.exp(0.03 * random.nextGaussian());
        }
        int firstOrigin = 24;
        double[] training = Arrays.copyOf(y, firstOrigin);
        CandidateForecasts.Searched forms = CandidateForecasts.Searched.on(y, 12);
        assertThat(forms.theta().orElseThrow().deseasonalised()).isTrue();
        assertThat(Theta.isSeasonal(training, 12)).isFalse();   // the test needs more than two seasons
        double[][] fromOrigins = Members.prepare(Outlook.Method.THETA, training, forms).orElseThrow()
                .fromOrigins(y, firstOrigin, 12).orElseThrow();
        double sum = 0;
        int count = 0;
        for (int o = firstOrigin; o < y.length; o++) {
            for (int k = 0; k < fromOrigins[o - firstOrigin].length; k++) {
                sum += Math.abs(fromOrigins[o - firstOrigin][k] / y[o + k] - 1);
                count++;
            }
        }
        // our bound: with the season taken out the errors are of the noise's size (3 %) and the
        // trend's; a flat line through a ±40 % season missed by a third (0.333) before the form was kept
        assertThat(sum / count).isLessThan(0.08);
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
