package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/** What the ARIMA code does where it cannot fit, and that what it hands out cannot change it. */
class ArimaEdgeCasesTest {

    @Test
    void noModelForConstantShortOrNonFiniteSeries() {
        double[] constant = new double[40];
        Arrays.fill(constant, 3);
        assertThat(AutoArima.fit(constant, 4)).as("constant series").isEmpty();
        assertThat(AutoArima.fit(new double[] {1, 2, 4}, 1)).as("three values").isEmpty();
        double[] withNan = ArimaTest.series("Nile").clone();
        withNan[10] = Double.NaN;
        assertThat(AutoArima.fit(withNan, 1)).as("a missing value").isEmpty();
        assertThat(Arima.fit(withNan, ArimaOrder.of(1, 0, 0, true), Arima.Method.ML)).isEmpty();
        // linear series: the differences are constant (R fits fixed coefficients there; we do not)
        double[] line = new double[30];
        for (int t = 0; t < line.length; t++) {
            line[t] = 5 + 2 * t;
        }
        assertThat(AutoArima.fit(line, 1)).as("a straight line").isEmpty();
        // CSS needs more values than it conditions on: d + mD + p + mP = 1 + 12 + 0 + 24 > 30
        assertThat(Arima.fit(Arrays.copyOf(ArimaTest.series("AirPassengers"), 30),
                new ArimaOrder(0, 1, 0, 2, 1, 0, 12, false), Arima.Method.CSS)).isEmpty();
    }

    @Test
    void fitsHandOutCopiesAndPathsFollowTheirShocks() {
        Arima.Fit fit = Arima.fit(ArimaTest.series("Nile"), ArimaOrder.of(1, 0, 1, true), Arima.Method.ML).orElseThrow();
        double[] coef = fit.coefficients();
        coef[0] = 99;
        assertThat(fit.coefficients()[0]).isNotEqualTo(99);
        fit.residuals()[0] = 99;
        assertThat(fit.residuals()[0]).isNotEqualTo(99);
        double[][] shocks = Shocks.standardNormals(3, 5, 1L);
        double[][] first = fit.paths(shocks);
        double[][] again = fit.paths(shocks);
        assertThat(again).isDeepEqualTo(first);
        double[][] zero = fit.paths(new double[][] {new double[5]});
        assertThat(zero[0]).as("a path without shocks is the point forecast")
                .containsExactly(fit.forecast(5), org.assertj.core.api.Assertions.within(1e-9));
        assertThat(fit.label()).isEqualTo("ARIMA(1,0,1) with mean");
        assertThat(ArimaOrder.of(0, 1, 1, true).label()).isEqualTo("ARIMA(0,1,1) with drift");
        assertThat(ArimaOrder.of(1, 0, 0, false).label()).isEqualTo("ARIMA(1,0,0)");
        assertThat(new ArimaOrder(0, 1, 1, 0, 1, 1, 12, false).label()).isEqualTo("ARIMA(0,1,1)(0,1,1)[12]");
    }
}
