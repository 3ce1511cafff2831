package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The Theta method's two forms: on the logarithms of a series it deseasonalised, linear otherwise.
 * Synthetic series (invented, seeded); the expected values are derived from the method's definition
 * in the test.
 */
class ThetaTest {

    /** Quarterly values growing 3 % a quarter with a season proportional to the level and 1 % noise. */
    private static double[] compounding(int n, long seed) {
        double[] season = {0.8, 1.1, 1.3, 0.8};
        Random random = new Random(seed);
        double[] y = new double[n];
        for (int t = 0; t < n; t++) {
            y[t] = 100 * Math.pow(1.03, t) * season[t % 4] * (1 + 0.01 * random.nextGaussian());
        }
        return y;
    }

    @Test
    void aDeseasonalisedSeriesIsForecastAtAConstantGrowthRate() {
        double[] y = compounding(40, 7);
        Theta.Fit fit = Theta.fit(y, 4).orElseThrow();
        assertThat(fit.deseasonalised()).isTrue();
        assertThat(fit.logarithmic()).isTrue();
        double[] f = fit.forecast(8);
        double[] index = fit.seasonalIndex();
        // exp(ℓ + drift·(h − 1 + c)) · s: once the season is divided out, each step is exp(drift) times the one before
        for (int i = 1; i < f.length; i++) {
            double ratio = (f[i] / index[(40 + i) % 4]) / (f[i - 1] / index[(40 + i - 1) % 4]);
            assertThat(ratio).isCloseTo(Math.exp(fit.drift()), within(1e-12));
        }
        // the drift is half the slope of the logarithms' line, and that slope is the planted log(1.03) nearly
        assertThat(2 * fit.drift()).isCloseTo(Math.log(1.03), within(0.003));
    }

    @Test
    void onTheLogarithmsTheVarianceGrowsWithTheSquareOfTheForecast() {
        Theta.Fit fit = Theta.fit(compounding(40, 11), 4).orElseThrow();
        Prediction p = fit.predict(6);
        double[] logVariance = fit.smoothing().predict(6).variance();
        for (int i = 0; i < 6; i++) {
            // the delta method: Var(exp(z)·s) ≈ (exp(z)·s)²·Var(z), exp(z)·s being the forecast
            assertThat(p.variance()[i]).isCloseTo(p.mean()[i] * p.mean()[i] * logVariance[i],
                    within(1e-9 * p.variance()[i]));
        }
    }

    @Test
    void aSeriesLeftUnadjustedKeepsTheLinearForm() {
        Random random = new Random(3);
        double[] y = new double[30];
        for (int t = 0; t < y.length; t++) {
            y[t] = 50 + 2 * t + random.nextGaussian();
        }
        Theta.Fit fit = Theta.fit(y, 1).orElseThrow();
        assertThat(fit.deseasonalised()).isFalse();
        assertThat(fit.logarithmic()).isFalse();
        double[] f = fit.forecast(5);
        for (int i = 1; i < f.length; i++) {
            assertThat(f[i] - f[i - 1]).isCloseTo(fit.drift(), within(1e-9));   // a constant increment
        }
    }

    @Test
    void anUpdatedFitKeepsItsFormAndItsSmoothing() {
        double[] y = compounding(48, 5);
        Theta.Fit early = Theta.fit(java.util.Arrays.copyOf(y, 36), 4).orElseThrow();
        Theta.Fit updated = early.updated(y).orElseThrow();
        assertThat(updated.logarithmic()).isTrue();
        assertThat(updated.smoothing().parameters().alpha()).isEqualTo(early.smoothing().parameters().alpha());
        assertThat(updated.seasonalIndex()).containsExactly(early.seasonalIndex());
        // through twelve more quarters of 3 % growth, the updated forecast starts well above the early one's end
        assertThat(updated.forecast(1)[0] / early.forecast(1)[0]).isGreaterThan(1.3);
    }
}
