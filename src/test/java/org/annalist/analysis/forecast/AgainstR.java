package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.Map;
import java.util.function.Function;
import org.annalist.analysis.Reference;

/** Shared checks of our forecasts against R's reference results. */
final class AgainstR {

    private AgainstR() {
    }

    /** |ours − R| / |R| ≤ tolerance, with both values in the failure message. */
    static void relative(double ours, double r, double tolerance, String what) {
        assertThat(Math.abs(ours - r) / Math.abs(r)).as("%s: ours %s, R %s", what, ours, r).isLessThanOrEqualTo(tolerance);
    }

    /** The datasets of forecast_accuracy_holdout.csv. */
    static final String[] HOLD_OUT_DATASETS = {"AirPassengers", "co2", "UKgas", "nottem"};

    /**
     * {ours, R's}: the hold-out MASE of {@code forecaster} and of R's automatic ets(), each averaged
     * over {@link #HOLD_OUT_DATASETS}.
     */
    static double[] meanHoldOutMase(Function<HoldOut, double[]> forecaster) {
        double ours = 0;
        double rs = 0;
        for (String dataset : HOLD_OUT_DATASETS) {
            HoldOut split = HoldOut.of(dataset);
            ours += Accuracy.of(split.training(), split.test(), forecaster.apply(split), split.period()).orElseThrow().mase();
            rs += split.rValue("ets_MASE");
        }
        return new double[] {ours / HOLD_OUT_DATASETS.length, rs / HOLD_OUT_DATASETS.length};
    }

    /**
     * A dataset split as forecast_accuracy_holdout.csv splits it (the last two seasons held out),
     * with that file's row of R's results.
     */
    record HoldOut(int period, double[] training, double[] test, Map<String, String> rResults) {

        static HoldOut of(String dataset) {
            Map<String, String> row = Reference.csv("forecast_accuracy_holdout.csv").row(dataset);
            int train = Integer.parseInt(row.get("n_train"));
            int h = Integer.parseInt(row.get("h"));
            double[] x = Reference.dataset(dataset + ".csv");
            return new HoldOut(Integer.parseInt(row.get("frequency")), Arrays.copyOf(x, train),
                    Arrays.copyOfRange(x, train, train + h), row);
        }

        int horizon() {
            return test.length;
        }

        double rValue(String column) {
            return Double.parseDouble(rResults.get(column));
        }
    }

    /** The datasets of forecast_accuracy_holdout8.csv: the four above and four more of R's. */
    static final String[] EIGHT = {"AirPassengers", "co2", "UKgas", "nottem", "USAccDeaths", "ldeaths",
        "JohnsonJohnson", "austres"};

    /**
     * A dataset of forecast_accuracy_holdout8.csv split as that file splits it (the last two seasons
     * held out), with its row of R's results.
     */
    static HoldOut ofEight(String dataset) {
        Map<String, String> row = Reference.csv("forecast_accuracy_holdout8.csv").row(dataset);
        int train = Integer.parseInt(row.get("n_train"));
        int h = Integer.parseInt(row.get("h"));
        double[] x = Reference.dataset(row.get("file"));
        return new HoldOut(Integer.parseInt(row.get("frequency")), Arrays.copyOf(x, train),
                Arrays.copyOfRange(x, train, train + h), row);
    }
}
