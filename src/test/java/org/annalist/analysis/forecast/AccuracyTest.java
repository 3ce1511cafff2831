package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import java.util.Map;
import org.annalist.analysis.Reference;
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
        Map<String, String> ref = Reference.csv("forecast_accuracy_holdout.csv").row(dataset);
        int period = Integer.parseInt(ref.get("frequency"));
        int train = Integer.parseInt(ref.get("n_train"));
        int h = Integer.parseInt(ref.get("h"));
        double[] x = Reference.dataset(dataset + ".csv");
        double[] training = Arrays.copyOf(x, train);
        double[] test = Arrays.copyOfRange(x, train, train + h);
        Accuracy.Result r = Accuracy.of(training, test, SeasonalNaive.forecast(training, period, h), period);
        assertThat(r.mase()).isCloseTo(Double.parseDouble(ref.get("snaive_MASE")), within(1e-9));
        assertThat(r.smape()).isCloseTo(Double.parseDouble(ref.get("snaive_sMAPE")), within(1e-9));
    }
}
