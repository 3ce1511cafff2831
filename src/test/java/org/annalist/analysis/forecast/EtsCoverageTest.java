package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/**
 * Interval coverage on series simulated from a known model: 1,000 series of ETS(M,N,M) — the model
 * of a seasonal flow whose swing grows with its level — each fitted by maximum likelihood on its
 * first 120 months, then forecast 12 months ahead. The share of the held-out months inside the
 * 80 % and 95 % intervals must be within ±2 points of nominal (the acceptance rule). The
 * truth (α = 0.3, γ = 0.1, σ = 0.05, a ±30 % season about a level of 1,000) is invented for this
 * test; the seed fixes it.
 */
class EtsCoverageTest {

    private static final int SERIES = 1000;
    private static final int FITTED = 120;
    private static final int AHEAD = 12;

    @Test
    void intervalsOfAFittedEtsMnmCoverTheirNominalShareOfSimulatedOutcomes() {
        EtsModel model = new EtsModel(EtsModel.Error.MULTIPLICATIVE, EtsModel.Trend.NONE, false,
                EtsModel.Season.MULTIPLICATIVE, 12, EtsModel.Estimator.QUASI_NEWTON);
        double[] state = new double[2 + 12];
        state[0] = 1000;
        for (int j = 0; j < 12; j++) {
            state[2 + j] = 1 + 0.3 * Math.sin(2 * Math.PI * j / 12);
        }
        EtsModel.Parameters truth = new EtsModel.Parameters(0.3, 0, 0.1, 1, new double[0]);
        double[][] series = EtsSimulation.paths(model, state, truth, 0.05 * 0.05,
                Shocks.standardNormals(SERIES, FITTED + AHEAD, 20_261_203L));
        int in80 = 0;
        int in95 = 0;
        int counted = 0;
        for (double[] y : series) {
            double[] history = java.util.Arrays.copyOf(y, FITTED);
            EtsModel.Fit fit = model.fit(history).orElseThrow();
            Prediction p = fit.predict(AHEAD);
            double[][] eighty = p.interval(0.80);
            double[][] ninetyFive = p.interval(0.95);
            for (int k = 0; k < AHEAD; k++) {
                double outcome = y[FITTED + k];
                in80 += outcome >= eighty[0][k] && outcome <= eighty[1][k] ? 1 : 0;
                in95 += outcome >= ninetyFive[0][k] && outcome <= ninetyFive[1][k] ? 1 : 0;
                counted++;
            }
        }
        assertThat(in80 / (double) counted).isBetween(0.78, 0.82);
        assertThat(in95 / (double) counted).isBetween(0.93, 0.97);
    }
}
