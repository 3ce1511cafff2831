package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.annalist.analysis.Reference;
import org.junit.jupiter.api.Test;

class EtsSimplexSearchTest {

    /**
     * R's {@code ets(UKgas)} (ets.json: R 4.2.2, forecast 8.20) fits ETS(M,A,M) with α = 0.0305,
     * β = 0.0305, γ = 0.6238 and AICc 1256.558 by its simplex search: the same search from the same
     * start reaches the same optimum, where our quasi-Newton search ends elsewhere.
     */
    @Test
    void reachesRsFitOfUkGas() {
        double[] y = Reference.dataset("UKgas.csv");
        EtsModel model = new EtsModel(EtsModel.Error.MULTIPLICATIVE, EtsModel.Trend.ADDITIVE, false,
                EtsModel.Season.MULTIPLICATIVE, 4, EtsModel.Estimator.SIMPLEX);
        EtsModel.Fit fit = EtsSimplexSearch.fit(model, y).orElseThrow();
        AgainstR.relative(fit.aicc(), 1256.55829416009, 1e-4, "AICc");
        assertThat(fit.parameters().alpha()).isCloseTo(0.0305368688940664, within(0.005));
        assertThat(fit.parameters().beta()).isCloseTo(0.0305364435769846, within(0.005));
        assertThat(fit.parameters().gamma()).isCloseTo(0.623838578907128, within(0.02));
        assertThat(fit.parameters().initial()[0]).isCloseTo(124.089942650416, within(1.0));
    }

    /** A quarterly model goes to the simplex search, a yearly or monthly one to the quasi-Newton search. */
    @Test
    void quarterlyModelsAreFittedByTheSimplexSearch() {
        double[] y = Reference.dataset("UKgas.csv");
        EtsModel quarterly = new EtsModel(EtsModel.Error.MULTIPLICATIVE, EtsModel.Trend.ADDITIVE, false,
                EtsModel.Season.NONE, 1, EtsModel.Estimator.forPeriod(4));
        EtsModel yearly = new EtsModel(EtsModel.Error.MULTIPLICATIVE, EtsModel.Trend.ADDITIVE, false,
                EtsModel.Season.NONE, 1, EtsModel.Estimator.forPeriod(1));
        assertThat(EtsModel.Estimator.forPeriod(12)).isEqualTo(EtsModel.Estimator.QUASI_NEWTON);
        assertThat(quarterly.fit(y).orElseThrow().aicc()).isEqualTo(EtsSimplexSearch.fit(quarterly, y).orElseThrow().aicc());
        assertThat(yearly.fit(y).orElseThrow().aicc()).isNotEqualTo(EtsSimplexSearch.fit(yearly, y).orElseThrow().aicc());
    }

    /** Rosenbrock's function (common practice) has its minimum 0 at (1, 1); the search from (−1.2, 1) finds it. */
    @Test
    void nelderMeadFindsRosenbrocksMinimum() {
        NelderMead.Objective rosenbrock = (x, cutoff) -> 100 * Math.pow(x[1] - x[0] * x[0], 2) + Math.pow(1 - x[0], 2);
        BoundedQuasiNewton.Minimum minimum = NelderMead.minimise(rosenbrock, new double[] {-1.2, 1}, 1e-12, 2000);
        assertThat(minimum.point()[0]).isCloseTo(1, within(1e-3));
        assertThat(minimum.point()[1]).isCloseTo(1, within(1e-3));
    }

    /** A start where the function is not finite gives no minimum. */
    @Test
    void nelderMeadRefusesANonFiniteStart() {
        BoundedQuasiNewton.Minimum minimum = NelderMead.minimise((x, cutoff) -> Double.NaN, new double[] {1}, 1e-8, 100);
        assertThat(minimum.value()).isInfinite();
    }
}
