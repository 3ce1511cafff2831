package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import org.annalist.analysis.Reference;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Intervals as wide as the back-test's errors support (empirical intervals, Williams &amp; Goodman
 * 1971, from memory), calibrated by one factor from the errors pooled over the horizons: the point
 * forecasts are kept, a narrow interval widens, year totals from the paths widen with it, and with
 * enough errors both intervals narrow by the same factor.
 */
class WideningTest {

    /**
     * R's ETS(M,A,M) forecast of AirPassengers (ets_AirPassengers_MAM_forecast.csv, R forecast 8.20,
     * its first twelve steps) against planted back-test errors of 7.5 % of the forecast, two at each
     * horizon (24, too few to narrow): R's point forecasts are kept to the bit, and every step's
     * intervals are R's stretched by one factor, the 80 % quantile of the errors' ratios to R's 80 %
     * half-widths at rank (n + 1)·0.8 = 20 (derived in the test: R's half-width at step 3, 5.88 % of
     * the forecast, gives 7.5 / 5.88 ≈ 1.28). One step is not widened to its own errors: R's one-step
     * half-width, 5.1 %, becomes 6.5 %, not 7.5 %, and the twelfth, 9.1 %, is widened too, to 11.6 % —
     * the one check of the scale, where widening each step to its own few errors and then checking
     * the pooled errors again kept the larger of two noisy estimates and over-covered on M3.
     */
    @Test
    void rsIntervalsAreStretchedByOneFactorFromThePooledErrorsKeepingItsPointForecasts() {
        Reference r = Reference.csv("ets_AirPassengers_MAM_forecast.csv");
        int h = 12;
        double[] mean = Arrays.copyOf(r.column("mean"), h);
        double[] lo80 = Arrays.copyOf(r.column("lo80"), h);
        double[] hi80 = Arrays.copyOf(r.column("hi80"), h);
        double[] lo95 = Arrays.copyOf(r.column("lo95"), h);
        double[] hi95 = Arrays.copyOf(r.column("hi95"), h);
        Outlook.Forecast f = new Outlook.Forecast(Outlook.Model.single(Outlook.Method.SEASONAL_NAIVE,
                java.util.Optional.empty(), false, false), mean, lo80, hi80, lo95, hi95, new double[0][h]);
        int n = 2 * h;
        double[] absolute = new double[n];
        double[] forecast = new double[n];
        int[] horizon = new int[n];
        double[] ratios = new double[n];
        for (int i = 0; i < n; i++) {
            horizon[i] = i % h;
            forecast[i] = mean[horizon[i]];
            absolute[i] = 0.075 * forecast[i];
            ratios[i] = 0.075 * mean[horizon[i]] / ((hi80[horizon[i]] - lo80[horizon[i]]) / 2);
        }
        Arrays.sort(ratios);
        double factor = ratios[(int) Math.round((n + 1) * 0.8) - 1]; // rank (n + 1)·0.8 = 20 exactly
        assertThat(factor).isCloseTo(0.075 / 0.0588, within(0.01));
        double[] planted = new double[h];
        Arrays.fill(planted, 0.075);
        HorizonErrors errors = new HorizonErrors(new double[h], planted, new int[h],
                new HorizonErrors.CycleSums(Double.NaN, Double.NaN, Double.NaN, 0),
                new HorizonErrors.Pairs(absolute, forecast, horizon));
        Widening.Widened w = Widening.apply(f, errors, true, Outlook.Bounds.NON_NEGATIVE);
        assertThat(w.forecast().mean()).containsExactly(mean);
        assertThat(w.factors()).containsOnly(factor);
        for (int k = 0; k < h; k++) {
            double half = (w.forecast().hi80()[k] - w.forecast().lo80()[k]) / 2;
            assertThat(half).as("step %d", k + 1).isCloseTo(factor * (hi80[k] - lo80[k]) / 2, within(1e-9 * mean[k]));
            assertThat(w.forecast().hi95()[k] - mean[k]).isGreaterThanOrEqualTo(factor * (hi95[k] - mean[k]) * (1 - 1e-12));
        }
        assertThat((w.forecast().hi80()[0] - w.forecast().lo80()[0]) / 2 / mean[0]).as("one step ahead")
                .isBetween(0.060, 0.070);
        assertThat((w.forecast().hi80()[h - 1] - w.forecast().lo80()[h - 1]) / 2 / mean[h - 1]).as("twelve steps ahead")
                .isBetween(0.110, 0.120);
    }

    /**
     * R's ETS(M,A,M) forecast of AirPassengers (as above) against planted back-test errors of 0.5 % to
     * 1.5 % of the forecast spread over its twelve horizons, all inside R's 80 % intervals: with
     * {@value Widening#NARROWING_PAIRS} errors the 80 % intervals narrow until eight in ten of the
     * errors lie inside (no fewer than ⌊(n + 1)·0.8⌋, no more than ⌈(n + 1)·0.8⌉), and the 95 %
     * intervals narrow by the same factor — the errors' largest are well inside them, so the tail
     * check asks for nothing more (before, they stayed R's and over-covered on M3 monthly data, 0.971);
     * with one error fewer nothing changes.
     */
    @ParameterizedTest
    @ValueSource(ints = {Widening.NARROWING_PAIRS, Widening.NARROWING_PAIRS - 1})
    void onlyAHundredErrorsOrMoreNarrowTheIntervalsBothByTheSameFactor(int planted) {
        Reference r = Reference.csv("ets_AirPassengers_MAM_forecast.csv");
        double[] mean = Arrays.copyOf(r.column("mean"), 12);
        Outlook.Forecast f = new Outlook.Forecast(Outlook.Model.single(Outlook.Method.SEASONAL_NAIVE, java.util.Optional.empty(), false, false),
                mean, Arrays.copyOf(r.column("lo80"), 12), Arrays.copyOf(r.column("hi80"), 12),
                Arrays.copyOf(r.column("lo95"), 12), Arrays.copyOf(r.column("hi95"), 12), new double[0][12]);
        double[] absolute = new double[planted];
        double[] forecast = new double[planted];
        int[] horizon = new int[planted];
        for (int i = 0; i < planted; i++) {
            horizon[i] = i % 12;
            forecast[i] = mean[horizon[i]];
            absolute[i] = (0.005 + 0.0001 * i) * forecast[i];
        }
        double[] quantile = new double[12];
        Arrays.fill(quantile, 0.01);
        HorizonErrors errors = new HorizonErrors(new double[12], quantile, new int[12],
                new HorizonErrors.CycleSums(Double.NaN, Double.NaN, Double.NaN, 0),
                new HorizonErrors.Pairs(absolute, forecast, horizon));
        Widening.Widened w = Widening.apply(f, errors, true, Outlook.Bounds.NON_NEGATIVE);
        int inside = 0;
        for (int i = 0; i < planted; i++) {
            int k = horizon[i];
            inside += absolute[i] <= (w.forecast().hi80()[k] - w.forecast().lo80()[k]) / 2 * (1 + 1e-9) ? 1 : 0;
        }
        for (int k = 0; k < 12; k++) {
            double c = w.factors()[k];
            assertThat(w.forecast().lo95()[k]).isCloseTo(mean[k] - c * (mean[k] - r.column("lo95")[k]), within(1e-9 * mean[k]));
            assertThat(w.forecast().hi95()[k]).isCloseTo(mean[k] + c * (r.column("hi95")[k] - mean[k]), within(1e-9 * mean[k]));
        }
        if (planted >= Widening.NARROWING_PAIRS) {
            assertThat(Arrays.stream(w.factors()).allMatch(c -> c < 1)).isTrue();
            assertThat(inside).isBetween((int) Math.floor((planted + 1) * 0.8), (int) Math.ceil((planted + 1) * 0.8));
        } else {
            assertThat(w.factors()).containsOnly(1.0);
            assertThat(w.forecast().lo80()).containsExactly(Arrays.copyOf(r.column("lo80"), 12));
        }
    }

    /**
     * On the hold-out training spans of forecast_accuracy_holdout.csv (R datasets): the outlook's
     * forecast keeps the chosen method's own point forecasts; the 80 % interval narrows only with at
     * least {@value Widening#NARROWING_PAIRS} back-test errors, and afterwards holds eight in ten of
     * those errors pooled over the horizons (the predictive quantile at rank (n + 1)·0.8: at least
     * ⌊(n + 1)·0.8⌋ of n inside, and when it was narrowed no more than ⌈(n + 1)·0.8⌉); the 95 %
     * interval is never narrowed by more than the 80 % one, so never narrowed where the 80 % one was
     * not. Where nothing was narrowed, the year total's interval from the paths is at least as wide
     * as the unwidened one.
     */
    @ParameterizedTest
    @ValueSource(strings = {"AirPassengers", "co2", "UKgas", "nottem"})
    void theEightyPercentIntervalHoldsEightInTenBacktestErrorsAndTheNinetyFiveNarrowsNoMoreThanIt(String dataset) {
        AgainstR.HoldOut split = AgainstR.HoldOut.of(dataset);
        Outlook.Bounds bounds = dataset.equals("nottem") ? Outlook.Bounds.NONE : Outlook.Bounds.NON_NEGATIVE;
        int h = split.horizon();
        Outlook.Result result = Outlook.of(split.training(), split.period(), h, bounds).orElseThrow();
        Outlook.Forecast adjusted = result.chosen();
        Outlook.Forecast own = CandidateForecasts.forecast(adjusted.method(), split.training(), split.period(), h,
                bounds, adjusted.model().members().stream().map(Outlook.Model::method).toList()).orElseThrow();
        assertThat(adjusted.mean()).containsExactly(own.mean());
        double[] factors = result.widening();
        HorizonErrors errors = result.backtest().stream().filter(s -> s.method() == adjusted.method()).findFirst()
                .orElseThrow().errors();
        HorizonErrors.Pairs pairs = errors.pairs();
        for (int k = 0; k < h; k++) {
            double c95 = (adjusted.hi95()[k] - adjusted.mean()[k]) / (own.hi95()[k] - own.mean()[k]);
            assertThat(c95).as("%s step %d: the 95 %% interval's factor", dataset, k + 1)
                    .isGreaterThanOrEqualTo(Math.min(1, factors[k]) * (1 - 1e-9));
            assertThat(adjusted.lo95()[k]).isLessThanOrEqualTo(adjusted.lo80()[k]);
            assertThat(adjusted.hi95()[k]).isGreaterThanOrEqualTo(adjusted.hi80()[k]);
            if (factors[k] < 1) {
                assertThat(pairs.size()).isGreaterThanOrEqualTo(Widening.NARROWING_PAIRS);
            }
        }
        boolean relative = Arrays.stream(split.training()).allMatch(v -> v > 0) && bounds.lower() >= 0;
        int n = 0;
        int inside = 0;
        for (int i = 0; i < pairs.size(); i++) {
            int k = pairs.horizon()[i];
            if (k >= h) {
                continue;
            }
            double half = (adjusted.hi80()[k] - adjusted.lo80()[k]) / 2;
            double allowed = relative ? half / Math.abs(adjusted.mean()[k]) * Math.abs(pairs.forecast()[i]) : half;
            n++;
            inside += pairs.absolute()[i] <= allowed * (1 + 1e-9) ? 1 : 0;
        }
        assertThat(inside).as("%s: errors inside the 80 %% interval", dataset)
                .isGreaterThanOrEqualTo((int) Math.floor((n + 1) * 0.8));
        if (result.narrowed()) {
            assertThat(inside).as("%s: narrowed, so no wider than the errors support", dataset)
                    .isLessThanOrEqualTo((int) Math.ceil((n + 1) * 0.8));
        }
        boolean wider95 = false;
        for (int k = 0; k < h; k++) {
            wider95 |= adjusted.hi95()[k] - adjusted.lo95()[k] > (own.hi95()[k] - own.lo95()[k]) * (1 + 1e-9);
        }
        assertThat(result.widened()).isEqualTo(Arrays.stream(factors).anyMatch(c -> c > 1) || wider95);
        assertThat(result.narrowed()).isEqualTo(Arrays.stream(factors).anyMatch(c -> c < 1));
        if (result.narrowed()) {
            return;
        }
        int year = split.period();
        double[] before = own.sumOver(0, year);
        double[] after = adjusted.sumOver(0, year);
        assertThat(after[0]).isEqualTo(before[0]);
        assertThat(after[2] - after[1]).isGreaterThanOrEqualTo(before[2] - before[1] - 1e-9);
    }

    /**
     * Planted truth: a random walk with unit steps, forecast by its last value, whose k-step errors
     * are N(0, k) (Hyndman &amp; Athanasopoulos 2021, §5.5, from memory), back-tested four steps ahead
     * with the exact 80 % quantiles 1.2816·√k (normal quantile, published tables); the model's own
     * intervals grow as those errors for four steps (±1.2816·√k and ±1.96·√k) and then stay flat.
     * Steps five to eight: the 80 % interval keeps the model's own (±1.2816·2), the 95 % interval
     * grows as the errors did, ±1.96·√k, and on 20,000 seeded simulated continuations it holds
     * 95 % ± 1 point of the values eight steps ahead, where the model's own holds about 83 %
     * (P(|Z| &lt; 1.96·2/√8)).
     */
    @Test
    void beyondTheTestedHorizonsTheNinetyFivePercentIntervalGrowsAsTheErrorsDid() {
        int h = 8;
        double z80 = 1.2815516;
        double z95 = 1.9599640;
        Outlook.Forecast f = centredForecast(h, k -> Math.sqrt(Math.min(k + 1, 4)));
        HorizonErrors errors = randomWalkErrors(4);
        Outlook.Forecast w = Widening.apply(f, errors, false, Outlook.Bounds.NONE).forecast();
        for (int k = 4; k < h; k++) {
            assertThat(w.hi80()[k]).as("step %d, 80 %%", k + 1).isCloseTo(2 * z80, within(1e-9));
            assertThat(w.hi95()[k]).as("step %d, 95 %%", k + 1).isCloseTo(z95 * Math.sqrt(k + 1), within(1e-9));
            assertThat(w.lo95()[k]).isCloseTo(-z95 * Math.sqrt(k + 1), within(1e-9));
        }
        java.util.Random random = new java.util.Random(20261203L);
        int paths = 20_000;
        int inside = 0;
        for (int p = 0; p < paths; p++) {
            double y = 0;
            for (int k = 0; k < h; k++) {
                y += random.nextGaussian();
            }
            inside += y >= w.lo95()[h - 1] && y <= w.hi95()[h - 1] ? 1 : 0;
        }
        assertThat(inside / (double) paths).isCloseTo(0.95, within(0.01));
    }

    /**
     * A forecast whose 80 % intervals match the back-test's errors at every step (so none is widened)
     * but whose intervals stop growing beyond the four steps tested, while the errors grew as √h: its
     * 95 % interval alone is widened there, and the result says it was widened, so that the brief
     * never describes those intervals as the method's own (planted truth: a random walk's quantiles).
     */
    @Test
    void aNinetyFivePercentIntervalWidenedOnItsOwnCountsAsWidened() {
        int h = 8;
        double z95 = 1.9599640;
        Outlook.Forecast f = centredForecast(h, k -> Math.sqrt(Math.min(k + 1, 4)));
        HorizonErrors errors = randomWalkErrors(4);
        Widening.Widened w = Widening.apply(f, errors, false, Outlook.Bounds.NONE);
        assertThat(w.factors()).containsOnly(1.0);
        assertThat(w.forecast().hi95()[h - 1]).isCloseTo(z95 * Math.sqrt(h), within(1e-9));
        assertThat(w.widened95()).isTrue();
        Outlook.Result result = new Outlook.Result(w.forecast(), new Outlook.Choice(Outlook.Choice.Basis.SHORT_SERIES, 0,
                java.util.Optional.empty(), java.util.Optional.empty()), Outlook.Span.ALL, java.util.List.of(), 0, 4,
                w.factors(), w.widened95());
        assertThat(result.widened()).isTrue();
        assertThat(result.narrowed()).isFalse();
    }

    /**
     * The growth of the errors beyond the horizons tested (our rule, see {@link Widening}): one
     * horizon tested gives the random walk's √h; errors that grew as k² over the tested horizons are
     * carried on in proportion to h, not faster; errors that did not grow, as √h, not slower; within
     * the tested horizons no growth.
     */
    @Test
    void theErrorsGrowthBeyondTheTestedHorizonsLiesBetweenARandomWalksAndASlopes() {
        assertThat(Widening.farGrowth(new double[] {2}, 3)).isCloseTo(Math.sqrt(4), within(1e-12));
        assertThat(Widening.farGrowth(new double[] {1, 4, 9, 16}, 7)).isCloseTo(8 / 4.0, within(1e-12));
        assertThat(Widening.farGrowth(new double[] {3, 3, 3, 3}, 7)).isCloseTo(Math.sqrt(2), within(1e-12));
        assertThat(Widening.farGrowth(new double[] {1, 2, 3, 4}, 2)).isEqualTo(1);
        assertThat(Widening.farGrowth(new double[] {Double.NaN, 2}, 3)).isCloseTo(Math.sqrt(2), within(1e-12));
    }

    /**
     * Planted: a model whose intervals grow as a random walk's errors (±1.2816·√k at 80 %), right at
     * steps one to three of the four tested, and a fourth step whose few errors' 80 % quantile came
     * out 1.5 times the model's (one noisy quantile; no pooled errors to recalibrate with). The
     * 95 % interval beyond the tested steps carries on from the width at step four, grown as the
     * errors grew (b = log(1.5·2 / 1) / log 4 = 0.79, derived in the test), so step five's is at
     * most (5 / 4)^1 times step four's, the fastest growth the rule allows. Taking its width from the
     * noisy quantile itself made it 1.79 times step four's (derived in the test: 1.5 · 2 · 1.25^0.79
     * / 2), the jump a reader saw in a brief's last forecast month.
     */
    @Test
    void beyondTheTestedHorizonsTheNinetyFivePercentIntervalCarriesOnFromItsWidthWithoutAJump() {
        int h = 8;
        Outlook.Forecast f = centredForecast(h, k -> Math.sqrt(k + 1));
        double[] quantile = {1.2815516, 1.2815516 * Math.sqrt(2), 1.2815516 * Math.sqrt(3), 1.5 * 1.2815516 * 2};
        HorizonErrors errors = new HorizonErrors(quantile, new double[4], new int[4],
                new HorizonErrors.CycleSums(Double.NaN, Double.NaN, Double.NaN, 0));
        Outlook.Forecast w = Widening.apply(f, errors, false, Outlook.Bounds.NONE).forecast();
        assertThat(w.hi95()[3]).isCloseTo(1.9599640 * 2, within(1e-9));
        assertThat(w.hi95()[4] / w.hi95()[3]).isGreaterThanOrEqualTo(Math.sqrt(5) / 2).isLessThanOrEqualTo(5 / 4.0);
        double b = Math.log(1.5 * 2) / Math.log(4);
        assertThat(w.hi95()[4]).isCloseTo(1.9599640 * 2 * Math.pow(5 / 4.0, b), within(1e-9));
    }

    /**
     * The 95 % interval's allowance for a scale set from few back-test origins: Student's t with
     * origins − 1 degrees of freedom against the normal, as ratios of the 97.5 % and 90 % quantiles —
     * from published tables, t_7: 2.365 and 1.415, t_23: 2.069 and 1.319, normal 1.960 and 1.282 (so
     * 1.093 for eight origins, 1.025 for 24); none with fewer than two origins, next to none with
     * thousands.
     */
    @Test
    void aScaleSetFromFewOriginsWidensTheNinetyFivePercentIntervalAsStudentsT() {
        assertThat(Widening.studentTail(8)).isCloseTo((2.365 / 1.415) / (1.960 / 1.282), within(2e-3));
        assertThat(Widening.studentTail(24)).isCloseTo((2.069 / 1.319) / (1.960 / 1.282), within(2e-3));
        assertThat(Widening.studentTail(1)).isEqualTo(1);
        assertThat(Widening.studentTail(0)).isEqualTo(1);
        assertThat(Widening.studentTail(100_000)).isCloseTo(1, within(1e-4));
        assertThat(Widening.studentTail(8)).isGreaterThan(Widening.studentTail(24));
    }

    /**
     * Planted back-test errors from eight origins (counts 8 at one step ahead) that widen a flat
     * forecast's 80 % interval: its 95 % interval is widened by the same factor times the Student
     * allowance for eight origins; where the model's own 80 % interval is wide enough (the errors
     * ask for no change of scale) the 95 % interval stays the model's own.
     */
    @Test
    void theStudentAllowanceAppliesOnlyWhereTheErrorsSetTheScale() {
        int h = 4;
        Outlook.Forecast f = centredForecast(h, k -> 1.0);
        int n = 8 * h;
        for (double size : new double[] {3.0, 0.5}) {
            double[] absolute = new double[n];
            double[] forecast = new double[n];
            int[] horizon = new int[n];
            for (int i = 0; i < n; i++) {
                horizon[i] = i % h;
                absolute[i] = size * (0.5 + i / (double) n); // spread, so that the quantiles differ
            }
            int[] counts = {8, 8, 8, 8};
            HorizonErrors errors = new HorizonErrors(new double[h], new double[h], counts,
                    new HorizonErrors.CycleSums(Double.NaN, Double.NaN, Double.NaN, 0),
                    new HorizonErrors.Pairs(absolute, forecast, horizon));
            Widening.Widened w = Widening.apply(f, errors, false, Outlook.Bounds.NONE);
            double c = w.factors()[0];
            for (int k = 0; k < h; k++) {
                double c95 = w.forecast().hi95()[k] / 1.9599640;
                if (size > 1) {
                    assertThat(c).isGreaterThan(1);
                    assertThat(c95).as("step %d", k + 1).isGreaterThanOrEqualTo(c * Widening.studentTail(8) * (1 - 1e-12));
                } else {
                    assertThat(c).isEqualTo(1);
                    assertThat(c95).as("step %d", k + 1).isCloseTo(1, within(1e-12));
                }
            }
        }
    }

    /**
     * A forecast of 0 with normal intervals, ±1.2816 and ±1.96 (published normal tables) times
     * {@code scale} at each 0-based step.
     */
    private static Outlook.Forecast centredForecast(int h, java.util.function.IntToDoubleFunction scale) {
        double[] lo80 = new double[h];
        double[] hi80 = new double[h];
        double[] lo95 = new double[h];
        double[] hi95 = new double[h];
        for (int k = 0; k < h; k++) {
            double s = scale.applyAsDouble(k);
            lo80[k] = -1.2815516 * s;
            hi80[k] = 1.2815516 * s;
            lo95[k] = -1.9599640 * s;
            hi95[k] = 1.9599640 * s;
        }
        return new Outlook.Forecast(Outlook.Model.single(Outlook.Method.SEASONAL_NAIVE, java.util.Optional.empty(),
                false, false), new double[h], lo80, hi80, lo95, hi95, new double[0][h]);
    }

    /**
     * UKgas with its last two years held out (forecast_accuracy_holdout8.csv, R datasets): the
     * back-test chooses ETS over the combination, and ETS's intervals are those its own fit gives,
     * checked against the combination's back-test errors — not against its own, the best of four
     * records, which ask for less (their 80 % quantile one quarter ahead 7.8 % of the forecast
     * against the combination's 13.2 %) and never leave its intervals wider. Here neither record's
     * pooled errors exceed ETS's own 80 % intervals, and both grow its 95 % intervals alike beyond
     * the four quarters tested (the errors give only the growth there), so the two agree; which
     * record is the yardstick is pinned by the next test.
     */
    @Test
    void aSingleMethodChosenOverTheCombinationAnswersToTheCombinationsErrors() {
        AgainstR.HoldOut split = AgainstR.ofEight("UKgas");
        Outlook.Result outlook = Outlook.of(split.training(), split.period(), split.horizon(),
                Outlook.Bounds.NON_NEGATIVE).orElseThrow();
        assertThat(outlook.choice().basis()).isEqualTo(Outlook.Choice.Basis.SINGLE_CLEARLY_BETTER);
        Outlook.Forecast chosen = outlook.chosen();
        assertThat(chosen.method()).isEqualTo(Outlook.Method.ETS);
        HorizonErrors combination = outlook.backtest().get(0).errors();
        HorizonErrors own = outlook.chosenScore().orElseThrow().errors();
        assertThat(combination.relative80()[0]).isGreaterThan(own.relative80()[0]);
        Outlook.Forecast ets = CandidateForecasts.forecast(Outlook.Method.ETS, split.training(), split.period(),
                split.horizon(), Outlook.Bounds.NON_NEGATIVE, java.util.List.of()).orElseThrow();
        Outlook.Forecast byCombination = Widening.apply(ets, combination, true, Outlook.Bounds.NON_NEGATIVE).forecast();
        Outlook.Forecast byOwn = Widening.apply(ets, own, true, Outlook.Bounds.NON_NEGATIVE).forecast();
        assertThat(chosen.lo95()).containsExactly(byCombination.lo95(), within(1e-9));
        assertThat(chosen.hi95()).containsExactly(byCombination.hi95(), within(1e-9));
        assertThat(chosen.hi80()).containsExactly(byCombination.hi80(), within(1e-9));
        double[] combinationWidth = new double[split.horizon()];
        double[] ownWidth = new double[split.horizon()];
        for (int k = 0; k < split.horizon(); k++) {
            combinationWidth[k] = byCombination.hi95()[k] - byCombination.lo95()[k];
            ownWidth[k] = byOwn.hi95()[k] - byOwn.lo95()[k];
            assertThat(combinationWidth[k]).isGreaterThanOrEqualTo(ownWidth[k]);
        }
    }

    /** The combination and any method the back-test did not choose over it keep their own errors as the yardstick. */
    @Test
    void onlyAMethodChosenOverTheCombinationIsJudgedByTheCombinationsErrors() {
        Outlook.Score combination = score(Outlook.Method.COMBINATION);
        Outlook.Score ets = score(Outlook.Method.ETS);
        Outlook.Choice etsChosen = new Outlook.Choice(Outlook.Choice.Basis.SINGLE_CLEARLY_BETTER, 8,
                java.util.Optional.of(combination), java.util.Optional.of(ets));
        Outlook.Choice notBeaten = new Outlook.Choice(Outlook.Choice.Basis.COMBINATION_NOT_BEATEN, 8,
                java.util.Optional.of(combination), java.util.Optional.of(ets));
        assertThat(Widening.yardstick(etsChosen, Outlook.Method.ETS)).isEqualTo(Outlook.Method.COMBINATION);
        assertThat(Widening.yardstick(notBeaten, Outlook.Method.COMBINATION)).isEqualTo(Outlook.Method.COMBINATION);
        // the seasonal naive forecast standing in when neither ETS nor the combination could be fitted
        assertThat(Widening.yardstick(etsChosen, Outlook.Method.SEASONAL_NAIVE)).isEqualTo(Outlook.Method.SEASONAL_NAIVE);
    }

    private static Outlook.Score score(Outlook.Method method) {
        return new Outlook.Score(method, 1, 10, 1, 1, 1, 10, 26, randomWalkErrors(4));
    }

    /** A random walk's back-test errors over {@code tested} horizons: 80 % quantiles 1.2816·√k (normal tables). */
    private static HorizonErrors randomWalkErrors(int tested) {
        double[] quantile = new double[tested];
        for (int k = 0; k < tested; k++) {
            quantile[k] = 1.2815516 * Math.sqrt(k + 1);
        }
        return new HorizonErrors(quantile, new double[tested], new int[tested],
                new HorizonErrors.CycleSums(Double.NaN, Double.NaN, Double.NaN, 0));
    }
}
