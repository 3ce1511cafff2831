package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import org.annalist.analysis.Reference;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Intervals no narrower than the back-test's errors (empirical intervals, Williams &amp; Goodman
 * 1971, from memory): the point forecasts are kept, intervals only ever widen, the widened 80 %
 * half-width reaches the errors' 80 % quantile, and year totals from the paths widen with them.
 */
class WideningTest {

    /**
     * R's ETS(M,A,M) forecast of AirPassengers (ets_AirPassengers_MAM_forecast.csv, R forecast
     * 8.20) against planted back-test errors of 7.5 % at every horizon: R's point forecasts are kept to
     * the bit; where R's 80 % half-width is below 7.5 % of the forecast it becomes exactly that, and
     * where it is wider it stays R's.
     */
    @Test
    void rsPointForecastsAreKeptAndOnlyNarrowIntervalsWiden() {
        Reference r = Reference.csv("ets_AirPassengers_MAM_forecast.csv");
        double[] mean = r.column("mean");
        int h = mean.length;
        Outlook.Forecast f = new Outlook.Forecast(Outlook.Model.single(Outlook.Method.SEASONAL_NAIVE, java.util.Optional.empty(), false), mean, r.column("lo80"),
                r.column("hi80"), r.column("lo95"), r.column("hi95"), new double[0][h]);
        double[] planted = new double[12];
        Arrays.fill(planted, 0.075);
        HorizonErrors errors = new HorizonErrors(new double[12], planted, new int[12],
                new HorizonErrors.CycleSums(Double.NaN, Double.NaN, Double.NaN, 0));
        Widening.Widened w = Widening.apply(f, errors, true, Outlook.Bounds.NON_NEGATIVE);
        assertThat(w.forecast().mean()).containsExactly(mean);
        boolean someWidened = false;
        boolean someKept = false;
        for (int k = 0; k < 12; k++) {
            double own = (r.column("hi80")[k] - r.column("lo80")[k]) / 2;
            double half = (w.forecast().hi80()[k] - w.forecast().lo80()[k]) / 2;
            if (own < 0.075 * mean[k]) {
                assertThat(half).as("step %d widened", k + 1).isCloseTo(0.075 * mean[k], within(1e-9 * mean[k]));
                someWidened = true;
            } else {
                assertThat(w.forecast().lo80()[k]).isEqualTo(r.column("lo80")[k]);
                assertThat(w.forecast().hi80()[k]).isEqualTo(r.column("hi80")[k]);
                someKept = true;
            }
            assertThat(w.forecast().lo95()[k]).isLessThanOrEqualTo(r.column("lo95")[k]);
            assertThat(w.forecast().hi95()[k]).isGreaterThanOrEqualTo(r.column("hi95")[k]);
        }
        assertThat(someWidened).as("R's one-step interval is narrower than ±7.5 %").isTrue();
        assertThat(someKept).as("R's one-year-ahead interval is wider than ±7.5 % (R: ±9.1 %)").isTrue();
    }

    /**
     * On the hold-out training spans of forecast_accuracy_holdout.csv (R datasets): the outlook's
     * forecast keeps the chosen method's own point forecasts, never narrows its intervals, reaches
     * the back-test's 80 % error quantile where it widens, and its year total's interval from the
     * paths is at least as wide as the unwidened one and as the back-test's errors of year totals.
     */
    @ParameterizedTest
    @ValueSource(strings = {"AirPassengers", "co2", "UKgas", "nottem"})
    void theOutlookNeverNarrowsAndReachesTheBacktestErrors(String dataset) {
        AgainstR.HoldOut split = AgainstR.HoldOut.of(dataset);
        Outlook.Bounds bounds = dataset.equals("nottem") ? Outlook.Bounds.NONE : Outlook.Bounds.NON_NEGATIVE;
        int h = split.horizon();
        Outlook.Result result = Outlook.of(split.training(), split.period(), h, bounds).orElseThrow();
        Outlook.Forecast widened = result.chosen();
        Outlook.Forecast own = CandidateForecasts.forecast(widened.method(), split.training(), split.period(), h,
                bounds, widened.model().members().stream().map(Outlook.Model::method).toList()).orElseThrow();
        assertThat(widened.mean()).containsExactly(own.mean());
        double[] factors = result.widening();
        for (int k = 0; k < h; k++) {
            assertThat(widened.lo80()[k]).isLessThanOrEqualTo(own.lo80()[k]);
            assertThat(widened.hi80()[k]).isGreaterThanOrEqualTo(own.hi80()[k]);
            assertThat(factors[k]).isGreaterThanOrEqualTo(1);
        }
        HorizonErrors errors = result.backtest().stream().filter(s -> s.method() == widened.method()).findFirst()
                .orElseThrow().errors();
        boolean relative = Arrays.stream(split.training()).allMatch(v -> v > 0) && bounds.lower() >= 0;
        double[] quantile = relative ? errors.relative80() : errors.absolute80();
        for (int k = 0; k < quantile.length; k++) {
            double wanted = relative ? quantile[k] * Math.abs(widened.mean()[k]) : quantile[k];
            double half = (widened.hi80()[k] - widened.lo80()[k]) / 2;
            assertThat(half).as("%s step %d", dataset, k + 1).isGreaterThanOrEqualTo(wanted * (1 - 1e-9));
        }
        int year = split.period();
        double[] before = own.sumOver(0, year);
        double[] after = widened.sumOver(0, year);
        assertThat(after[0]).isEqualTo(before[0]);
        assertThat(after[2] - after[1]).isGreaterThanOrEqualTo(before[2] - before[1] - 1e-9);
        assertThat(result.widened()).isEqualTo(Arrays.stream(factors).anyMatch(c -> c > 1));
        // a year's total: its 80 % interval reaches the back-test's errors of such totals
        HorizonErrors.CycleSums sums = errors.cycleSums();
        if (sums.enough() && relative) {
            assertThat((after[2] - after[1]) / 2).as("%s year total", dataset)
                    .isGreaterThanOrEqualTo(sums.relative80() * after[0] * (1 - 1e-6));
        }
    }
}
