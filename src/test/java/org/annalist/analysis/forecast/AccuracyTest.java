package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Seasonal naive hold-out accuracy against forecast_accuracy_holdout.csv (R 4.2.2, forecast 8.20:
 * {@code accuracy(snaive(train, h), test)} with the last two seasons held out).
 */
class AccuracyTest {

    @ParameterizedTest
    @ValueSource(strings = {"AirPassengers", "co2", "UKgas", "nottem"})
    void seasonalNaiveMaseAndSmapeMatchR(String dataset) {
        AgainstR.HoldOut split = AgainstR.HoldOut.of(dataset);
        Accuracy.Result r = Accuracy.of(split.training(), split.test(),
                SeasonalNaive.forecast(split.training(), split.period(), split.horizon()), split.period()).orElseThrow();
        assertThat(r.mase()).isCloseTo(split.rValue("snaive_MASE"), within(1e-9));
        assertThat(r.smape()).isCloseTo(split.rValue("snaive_sMAPE"), within(1e-9));
    }
}
