package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.annalist.analysis.SeededNormals;
import org.junit.jupiter.api.Test;

/**
 * Interval coverage on a seeded simulation with known parameters (the "Done when"):
 * 1,000 histories of ARIMA(0,1,1)(0,1,1)[12] with θ = −0.4, Θ = −0.6, σ = 1 (values invented for
 * the test, common practice (no source)), ten years each after a burn-in; the true orders are fitted
 * to each history (by CSS, to keep the test fast) and the 80 and 95 % intervals for the next value
 * must cover it within ±2 points of nominal (the tolerance). The paths' quantiles are checked
 * against the same normal limits.
 */
class ArimaCoverageTest {

    private static final int HISTORIES = 1000;
    private static final int LENGTH = 120;
    private static final int BURN_IN = 60;
    private static final double THETA = -0.4;
    private static final double SEASONAL_THETA = -0.6;

    /** y_t − y_{t−1} − y_{t−12} + y_{t−13} = e_t + θ e_{t−1} + Θ e_{t−12} + θΘ e_{t−13}. */
    static double[] simulate(SeededNormals random, int n) {
        int total = n + 1 + BURN_IN;
        double[] e = new double[total];
        double[] y = new double[total];
        for (int t = 0; t < total; t++) {
            e[t] = random.next();
            double w = e[t] + (t >= 1 ? THETA * e[t - 1] : 0) + (t >= 12 ? SEASONAL_THETA * e[t - 12] : 0)
                    + (t >= 13 ? THETA * SEASONAL_THETA * e[t - 13] : 0);
            y[t] = w + (t >= 1 ? y[t - 1] : 0) + (t >= 12 ? y[t - 12] : 0) - (t >= 13 ? y[t - 13] : 0);
        }
        return java.util.Arrays.copyOfRange(y, BURN_IN, total);
    }

    @Test
    void eightyAndNinetyFivePercentIntervalsCoverTheNextValueAtTheirNominalRates() {
        SeededNormals random = new SeededNormals(15_2026L);
        ArimaOrder order = new ArimaOrder(0, 1, 1, 0, 1, 1, 12, false);
        int in80 = 0;
        int in95 = 0;
        int fitted = 0;
        double thetaSum = 0;
        double seasonalSum = 0;
        for (int k = 0; k < HISTORIES; k++) {
            double[] all = simulate(random, LENGTH);
            double[] history = java.util.Arrays.copyOf(all, LENGTH);
            double next = all[LENGTH];
            Arima.Fit fit = Arima.fit(history, order, Arima.Method.CSS).orElseThrow();
            fitted++;
            thetaSum += fit.coefficients()[0];
            seasonalSum += fit.coefficients()[1];
            Prediction p = fit.predict(1);
            double[][] eighty = p.interval(0.80);
            double[][] ninetyFive = p.interval(0.95);
            in80 += next >= eighty[0][0] && next <= eighty[1][0] ? 1 : 0;
            in95 += next >= ninetyFive[0][0] && next <= ninetyFive[1][0] ? 1 : 0;
        }
        double c80 = 100.0 * in80 / fitted;
        double c95 = 100.0 * in95 / fitted;
        System.out.printf("ARIMA(0,1,1)(0,1,1)[12] coverage over %d histories: 80 %% -> %.1f %%, 95 %% -> %.1f %%;"
                + " mean theta %.3f, Theta %.3f%n", fitted, c80, c95, thetaSum / fitted, seasonalSum / fitted);
        assertThat(c80).as("80 % interval coverage").isCloseTo(80, within(2.0));
        assertThat(c95).as("95 % interval coverage").isCloseTo(95, within(2.0));
    }

    /** The paths driven by given shocks have the Kalman forecast's mean and variance (to Monte Carlo error). */
    @Test
    void pathsMatchThePredictionsMeanAndVariance() {
        double[] y = simulate(new SeededNormals(7L), LENGTH);
        Arima.Fit fit = Arima.fit(y, new ArimaOrder(0, 1, 1, 0, 1, 1, 12, false), Arima.Method.ML).orElseThrow();
        int h = 12;
        double[][] shocks = Shocks.standardNormals(4000, h, 99L);
        double[][] paths = fit.paths(shocks);
        Prediction p = fit.predict(h);
        for (int k = 0; k < h; k++) {
            double mean = 0;
            for (double[] path : paths) {
                mean += path[k];
            }
            mean /= paths.length;
            double var = 0;
            for (double[] path : paths) {
                var += (path[k] - mean) * (path[k] - mean);
            }
            var /= paths.length - 1;
            double se = Math.sqrt(p.variance()[k] / paths.length);
            assertThat(mean).as("mean at step " + (k + 1)).isCloseTo(p.mean()[k], within(4 * se));
            assertThat(var / p.variance()[k]).as("variance ratio at step " + (k + 1)).isCloseTo(1, within(0.1));
        }
    }
}
