package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.junit.jupiter.api.Test;

class SeasonalForecastabilityTest {

    /**
     * On random smoothing parameters (invented for this test, spread over and beyond the usual region
     * so that both answers occur), the characteristic polynomial's Schur–Cohn test agrees with the
     * discount matrix's eigenvalues for every seasonal model form, quarterly and monthly.
     */
    @Test
    void agreesWithTheDiscountMatrixEigenvalues() {
        Random random = new Random(15);
        int admissible = 0;
        int refused = 0;
        for (int period : new int[] {4, 12}) {
            for (EtsModel.Trend trend : EtsModel.Trend.values()) {
                for (boolean damped : new boolean[] {false, true}) {
                    if (damped && trend == EtsModel.Trend.NONE) {
                        continue;
                    }
                    EtsModel model = new EtsModel(EtsModel.Error.ADDITIVE, trend, damped, EtsModel.Season.ADDITIVE, period,
                            EtsModel.Estimator.forPeriod(period));
                    for (int i = 0; i < 400; i++) {
                        double alpha = 1.3 * random.nextDouble();
                        double beta = trend == EtsModel.Trend.NONE ? 0 : alpha * (1.4 * random.nextDouble() - 0.2);
                        double gamma = 1.2 * random.nextDouble() * (1 - alpha + 0.2);
                        double phi = damped ? 0.8 + 0.2 * random.nextDouble() : 1;
                        boolean expected = EtsEstimation.isAdmissible(model,
                                new EtsModel.Parameters(alpha, beta, gamma, phi, new double[2 + period]));
                        assertThat(SeasonalForecastability.holds(model, alpha, beta, gamma, phi))
                                .as("%s α=%f β=%f γ=%f φ=%f", model.label(), alpha, beta, gamma, phi).isEqualTo(expected);
                        admissible += expected ? 1 : 0;
                        refused += expected ? 0 : 1;
                    }
                }
            }
        }
        assertThat(admissible).isGreaterThan(300);
        assertThat(refused).isGreaterThan(300);
    }

    /** z² − 0.25 has its roots at ±0.5, z² − 4 at ±2, (z − 1)(z − 0.5) one on the circle (not strictly inside). */
    @Test
    void schurCohnFindsRootsInsideOutsideAndOnTheCircle() {
        assertThat(SeasonalForecastability.schurStable(new double[] {-0.25, 0, 1})).isTrue();
        assertThat(SeasonalForecastability.schurStable(new double[] {-4, 0, 1})).isFalse();
        assertThat(SeasonalForecastability.schurStable(new double[] {0.5, -1.5, 1})).isFalse();
    }
}
