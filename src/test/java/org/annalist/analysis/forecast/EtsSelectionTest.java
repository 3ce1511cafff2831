package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;

import org.annalist.analysis.Reference;
import org.junit.jupiter.api.Test;

/**
 * Automatic ETS choice on the last-two-seasons hold-out of forecast_accuracy_holdout.csv (R 4.2.2,
 * forecast 8.20: {@code accuracy(forecast(ets(train), h), test)}).
 */
class EtsSelectionTest {

    /**
     * The accuracy bar: averaged over the datasets, our chosen model's hold-out MASE is at
     * most R's automatic ets(). Measured: ours 1.300, R 1.426 (AirPassengers 1.692 against 2.212,
     * co2 0.217 against 0.211, UKgas 2.684 against 2.680, nottem 0.606 against 0.601).
     */
    @Test
    void holdOutMaseAveragedOverDatasetsIsNoWorseThanRsEts() {
        double[] mase = AgainstR.meanHoldOutMase(split ->
                EtsSelection.select(split.training(), split.period()).orElseThrow().best().forecast(split.horizon()));
        assertThat(mase[0]).isLessThanOrEqualTo(mase[1]);
    }

    /** Where R's own optimiser reaches the best likelihood, we choose the model it chose. */
    @Test
    void choosesRsModelOnUkGasAndNottem() {
        for (String dataset : new String[] {"UKgas", "nottem"}) {
            AgainstR.HoldOut split = AgainstR.HoldOut.of(dataset);
            EtsSelection.Choice choice = EtsSelection.select(split.training(), split.period()).orElseThrow();
            assertThat(choice.best().model().label()).as(dataset).isEqualTo(split.rResults().get("ets_model"));
            assertThat(choice.candidates()).extracting(EtsModel.Fit::aicc).isSorted();
        }
    }

    /**
     * The end-to-end check on UKgas (ets.json and ets_UKgas_auto_forecast.csv, R 4.2.2,
     * forecast 8.20, {@code forecast(ets(UKgas), h = 24)}): our own search chooses R's model,
     * its AICc is within 0.5 %, the means within 1 % and the 95 % interval widths within 5 %.
     * AirPassengers is left out of the model check: there our search reaches ETS(M,A,M) with AICc
     * 1390.8, below the 1395–1404 of R's ETS(M,Ad,M) (see EtsModelTest), so the AICc rule rightly
     * picks another model than R's optimiser could reach.
     */
    @Test
    void ukGasSelectionFitAndIntervalsMatchRsEts() {
        EtsModel.Fit best = EtsSelection.select(Reference.dataset("UKgas.csv"), 4).orElseThrow().best();
        assertThat(best.model().label()).isEqualTo("ETS(M,A,M)");
        AgainstR.relative(best.aicc(), 1256.55829416009, 0.005, "AICc");
        Reference r = Reference.csv("ets_UKgas_auto_forecast.csv");
        double[] mean = r.column("mean");
        Prediction ours = best.predict(mean.length);
        double[][] ninetyFive = ours.interval(0.95);
        for (int h = 0; h < mean.length; h++) {
            AgainstR.relative(ours.mean()[h], mean[h], 0.01, "mean " + (h + 1));
            AgainstR.relative(ninetyFive[1][h] - ninetyFive[0][h], r.column("hi95")[h] - r.column("lo95")[h], 0.05,
                    "95 % width " + (h + 1));
        }
    }

    @Test
    void nonPositiveDataGetsOnlyAdditiveModels() {
        double[] y = new double[48];
        for (int i = 0; i < y.length; i++) {
            y[i] = Math.sin(2 * Math.PI * i / 12) * 10 + 0.1 * i; // crosses zero
        }
        EtsSelection.Choice choice = EtsSelection.select(y, 12).orElseThrow();
        assertThat(choice.candidates()).allSatisfy(f -> {
            assertThat(f.model().error()).isEqualTo(EtsModel.Error.ADDITIVE);
            assertThat(f.model().season()).isNotEqualTo(EtsModel.Season.MULTIPLICATIVE);
        });
        assertThat(choice.best().model().season()).isEqualTo(EtsModel.Season.ADDITIVE);
    }
}
