package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class OutlookTest {

    /**
     * The accuracy table: with the last two seasons held out (forecast_accuracy_holdout.csv,
     * R 4.2.2, forecast 8.20), the method our back-test chooses has a mean MASE at most that of R's
     * automatic ets(). Measured: ours 1.406, R 1.426 (AirPassengers combination 2.130 against
     * 2.212; co2 ETS(M,A,M) 0.217 against 0.211; UKgas ETS(M,A,M) 2.670 against 2.680; nottem
     * ETS(A,N,A) 0.606 against 0.601).
     */
    @Test
    void chosenMethodsHoldOutMaseIsNoWorseThanRsEtsOnAverage() {
        double[] mase = AgainstR.meanHoldOutMase(split -> {
            Outlook.Result outlook = Outlook.of(split.training(), split.period(), split.horizon(),
                    Outlook.Bounds.NON_NEGATIVE).orElseThrow();
            assertThat(outlook.backtest()).extracting(Outlook.Score::method).startsWith(Outlook.Method.COMBINATION)
                    .contains(Outlook.Method.ETS, Outlook.Method.ARIMA, Outlook.Method.THETA);
            assertThat(outlook.chosenScore()).isPresent();
            return outlook.chosen().mean();
        });
        assertThat(mase[0]).isLessThanOrEqualTo(mase[1]);
    }

    /**
     * Eight public series with the last two seasons held out (forecast_accuracy_holdout8.csv, made by
     * make-holdout8.R with R 4.2.2 and forecast 8.20). The goal is a mean MASE at most R's automatic
     * ets() (1.084 over the eight rows); the mean of the eight rows' MASE of the mean of R's ets,
     * auto.arima and thetaf is 1.214. Measured in December 2026: 1.142 with the ARIMA member searched
     * by conditional sum of squares on seasonal data; 1.128 since it is searched by exact likelihood
     * as R's default does for these lengths (USAccDeaths 0.609 → 0.523 against ets's 0.431, two
     * years of training values; ldeaths 0.569 → 0.536), still behind ets on JohnsonJohnson (2.292
     * against 1.856). This pins that the outlook stays within 5 % of R's ets and below the mean of
     * three while that gap is open.
     */
    @Test
    void onEightPublicSeriesTheOutlookStaysWithinFivePercentOfRsEtsAndBelowTheMeanOfThree() {
        double ours = 0;
        double ets = 0;
        double mean3 = 0;
        StringBuilder each = new StringBuilder();
        for (String dataset : AgainstR.EIGHT) {
            AgainstR.HoldOut split = AgainstR.ofEight(dataset);
            double[] f = Outlook.of(split.training(), split.period(), split.horizon(), Outlook.Bounds.NON_NEGATIVE)
                    .orElseThrow().chosen().mean();
            double mase = Accuracy.of(split.training(), split.test(), f, split.period()).orElseThrow().mase();
            each.append(String.format(java.util.Locale.ROOT, "%s %.3f (R ets %.3f); ", dataset, mase,
                    split.rValue("ets_MASE")));
            ours += mase / AgainstR.EIGHT.length;
            ets += split.rValue("ets_MASE") / AgainstR.EIGHT.length;
            mean3 += split.rValue("mean3_MASE") / AgainstR.EIGHT.length;
        }
        assertThat(ours).as("%s; R's mean of three %.3f", each, mean3).isLessThanOrEqualTo(1.05 * ets)
                .isLessThan(mean3);
    }

    @Test
    void intervalsAreNestedAroundTheMeanAndWidenWithTheHorizon() {
        AgainstR.HoldOut split = AgainstR.HoldOut.of("nottem");
        Outlook.Forecast f = Outlook.of(split.training(), 12, 24, Outlook.Bounds.NONE).orElseThrow().chosen();
        for (int h = 0; h < 24; h++) {
            assertThat(f.lo95()[h]).isLessThan(f.lo80()[h]);
            assertThat(f.lo80()[h]).isLessThan(f.mean()[h]);
            assertThat(f.mean()[h]).isLessThan(f.hi80()[h]);
            assertThat(f.hi80()[h]).isLessThan(f.hi95()[h]);
        }
        assertThat(f.hi95()[23] - f.lo95()[23]).isGreaterThan(f.hi95()[0] - f.lo95()[0]);
    }

    /** An occupancy rate close to its ceiling: forecasts and intervals stay within 0–100 %. */
    @Test
    void ratesStayWithinZeroAndHundredPercent() {
        Random random = new Random(11);
        double[] occupancy = new double[72];
        for (int t = 0; t < occupancy.length; t++) {
            occupancy[t] = Math.min(100, 90 + 8 * Math.sin(2 * Math.PI * t / 12) + 0.05 * t + 2 * random.nextGaussian());
        }
        Outlook.Forecast f = Outlook.of(occupancy, 12, 18, Outlook.Bounds.PERCENT).orElseThrow().chosen();
        for (double[] values : new double[][] {f.mean(), f.lo80(), f.hi80(), f.lo95(), f.hi95()}) {
            for (double v : values) {
                assertThat(v).isBetween(0.0, 100.0);
            }
        }
        assertThat(f.hi95()).contains(100.0);
        double[] year = f.sumOver(0, 12);
        assertThat(year[1]).isLessThanOrEqualTo(year[0]);
        assertThat(year[2]).isBetween(year[0], 1200.0);
    }

    /**
     * Annual data have no season: the yardstick is the plain naive forecast, the seasonal naive
     * forecast of a one-period cycle (Nile, R datasets); the findings name it naive
     * (OutlookAnalysisTest). The back-test scores the combination first, then the single methods.
     */
    @Test
    void nonSeasonalDataAreBackTestedAgainstThePlainNaiveForecast() {
        double[] nile = org.annalist.analysis.Reference.dataset("Nile.csv");
        Outlook.Result outlook = Outlook.of(nile, 1, 5, Outlook.Bounds.NON_NEGATIVE).orElseThrow();
        assertThat(outlook.backtest()).extracting(Outlook.Score::method).startsWith(Outlook.Method.COMBINATION)
                .contains(Outlook.Method.SEASONAL_NAIVE, Outlook.Method.ETS, Outlook.Method.THETA);
        assertThat(outlook.cycle()).isEqualTo(1);
        assertThat(outlook.origins()).isEqualTo(8);
        Outlook.Choice choice = outlook.choice();
        assertThat(choice.basis()).as("eight one-step forecasts are too few to choose on")
                .isEqualTo(Outlook.Choice.Basis.COMBINATION_TOO_FEW_TESTED);
        assertThat(outlook.chosen().method()).isEqualTo(Outlook.Method.COMBINATION);
        assertThat(choice.origins()).isEqualTo(8);
        assertThat(choice.combination()).contains(outlook.backtest().get(0));
        assertThat(choice.bestSingle()).contains(outlook.backtest().get(1));
        // the naive forecast of a one-period cycle repeats the last value
        double[] last = new double[5];
        java.util.Arrays.fill(last, nile[nile.length - 1]);
        assertThat(SeasonalNaive.forecast(nile, outlook.cycle(), 5)).containsExactly(last);
    }

    @Test
    void aSeriesTooShortForTheBacktestGetsTheCombinationAndSaysSo() {
        double[] y = new double[30];
        for (int t = 0; t < y.length; t++) {
            y[t] = 100 + 20 * Math.sin(2 * Math.PI * t / 12) + t;
        }
        Outlook.Result outlook = Outlook.of(y, 12, 12, Outlook.Bounds.NON_NEGATIVE).orElseThrow();
        assertThat(outlook.backtest()).isEmpty();
        assertThat(outlook.chosen().method()).isEqualTo(Outlook.Method.COMBINATION);
        assertThat(outlook.chosen().model().members()).extracting(Outlook.Model::method).contains(Outlook.Method.ETS,
                Outlook.Method.THETA);
        Outlook.Choice choice = outlook.choice();
        assertThat(choice.basis()).isEqualTo(Outlook.Choice.Basis.COMBINATION_WITHOUT_BACKTEST);
        assertThat(choice.origins()).isZero();
        assertThat(choice.combination()).isEmpty();
        assertThat(choice.bestSingle()).isEmpty();
    }

    /**
     * Values that repeat exactly one cycle back before the first origin give the MASE nothing to
     * scale by: the back-test cannot rank the methods, so the combination stands, as for a short series.
     */
    @Test
    void noSeasonalNaiveErrorBeforeTheFirstOriginMeansNoBacktest() {
        double[] y = new double[20];
        for (int t = 0; t < y.length; t++) {
            y[t] = t < 12 ? 50 : 50 + (t - 11) * 3 + (t % 2 == 0 ? 1 : -1);
        }
        assertThat(Accuracy.of(java.util.Arrays.copyOf(y, 12), new double[] {1}, new double[] {2}, 1)).isEmpty();
        Outlook.Result outlook = Outlook.of(y, 1, 4, Outlook.Bounds.NON_NEGATIVE).orElseThrow();
        assertThat(outlook.backtest()).isEmpty();
        assertThat(outlook.origins()).isZero();
        assertThat(outlook.chosen().method()).isEqualTo(Outlook.Method.COMBINATION);
        assertThat(outlook.choice().basis()).isEqualTo(Outlook.Choice.Basis.COMBINATION_WITHOUT_BACKTEST);
    }

    /**
     * Seven yearly values are too few for the usual methods but get the naive forecast with drift:
     * the last value plus the mean change, c = (y_n − y_1)/(n − 1), here (19 − 7)/6 = 2, and a
     * standard deviation σ√(h(1 + h/(n − 1))) (Hyndman &amp; Athanasopoulos 2021, FPP3 §5.5 Table 5.2,
     * from memory) with Student's t on n − 2 = 5 degrees of freedom: t(0.975, 5) = 2.5706 (standard
     * tables). The differences 2, 1, 3, 2, 3, 1 have σ² = Σ(d − 2)²/5 = 4/5.
     */
    @Test
    void sevenYearlyValuesGetTheNaiveForecastWithDriftAndWideIntervals() {
        double[] y = {7, 9, 10, 13, 15, 18, 19};
        Outlook.Result outlook = Outlook.of(y, 1, 3, Outlook.Bounds.NON_NEGATIVE).orElseThrow();
        assertThat(outlook.chosen().method()).isEqualTo(Outlook.Method.NAIVE_WITH_DRIFT);
        assertThat(outlook.choice().basis()).isEqualTo(Outlook.Choice.Basis.SHORT_SERIES);
        assertThat(outlook.chosen().mean()).containsExactly(new double[] {21, 23, 25}, within(1e-12));
        double sd1 = Math.sqrt(0.8 * (1 + 1 / 6.0));
        assertThat(outlook.chosen().hi95()[0]).isCloseTo(21 + 2.5706 * sd1, within(1e-3));
        double sd3 = Math.sqrt(0.8 * 3 * (1 + 3 / 6.0));
        assertThat(outlook.chosen().lo95()[2]).isCloseTo(25 - 2.5706 * sd3, within(1e-3));
    }

    /** Fewer than three values (two differences), or no horizon: no outlook. */
    @Test
    void tooFewValuesOrNoHorizonGiveNoOutlook() {
        assertThat(Outlook.of(new double[] {1, 2}, 1, 3, Outlook.Bounds.NONE)).isEmpty();
        assertThat(Outlook.of(new double[] {1, 2, 3, 4, 5, 6, 7, 8, 9}, 1, 0, Outlook.Bounds.NONE)).isEmpty();
    }

    /**
     * Theta as simple smoothing with half the slope as drift (Hyndman &amp; Billah 2003): on a
     * noiseless line of slope 2 the forecasts rise by 1 per period beyond the first step.
     */
    @Test
    void thetaForecastsRiseByHalfTheFittedSlope() {
        double[] line = new double[40];
        for (int t = 0; t < line.length; t++) {
            line[t] = 50 + 2 * t + (t % 2 == 0 ? 0.5 : -0.5); // a little alternation keeps the smoothing off α = 1
        }
        Theta.Fit theta = Theta.fit(line, 1).orElseThrow();
        double[] f = theta.forecast(6);
        assertThat(theta.drift()).isCloseTo(1, within(0.01));
        for (int h = 1; h < 6; h++) {
            assertThat(f[h] - f[h - 1]).isCloseTo(1, within(0.01));
        }
    }

    /** R's quantile(1:10, c(0.1, 0.5, 0.975)) with its default type 7 gives 1.9, 5.5 and 9.775. */
    @Test
    void quantilesInterpolateAsRsDefault() {
        double[] x = {10, 9, 8, 7, 6, 5, 4, 3, 2, 1};
        assertThat(Intervals.quantiles(x, 0.1, 0.5, 0.975)).containsExactly(new double[] {1.9, 5.5, 9.775}, within(1e-12));
    }

    /**
     * The type 6 quantile at rank (n + 1)·p, checked against R 4.2.2 {@code quantile(x, p, type = 6)}
     * (run on this project's machine): 1:10 at 0.8 gives 8.8 and at 0.95 gives 10 (rank 10.45 beyond
     * n: the largest); 1:4 at 0.5 gives 2.5; c(2, 7, 1, 8, 2, 8, 1, 8) at 0.8 gives 8.
     */
    @Test
    void predictiveQuantilesTakeRankNPlusOneTimesPAsRsTypeSix() {
        double[] x = {10, 9, 8, 7, 6, 5, 4, 3, 2, 1};
        assertThat(Intervals.predictive(x, 0.80)).isCloseTo(8.8, within(1e-12));
        assertThat(Intervals.predictive(x, 0.95)).isEqualTo(10);
        assertThat(Intervals.predictive(new double[] {3, 1, 2, 4}, 0.5)).isCloseTo(2.5, within(1e-12));
        assertThat(Intervals.predictive(new double[] {2, 7, 1, 8, 2, 8, 1, 8}, 0.8)).isEqualTo(8);
    }

    /** Seasonal random walk: variance σ²(⌊(h − 1)/m⌋ + 1) (Hyndman &amp; Athanasopoulos 2021, Table 5.2). */
    @Test
    void seasonalNaiveVarianceStepsUpEachCycle() {
        double[] y = {10, 20, 30, 12, 21, 33, 11, 23, 30};
        // seasonal differences 2, 1, 3, −1, 2, −3: σ² = 28/6
        Prediction p = SeasonalNaive.predict(y, 3, 7);
        double sigma2 = 28.0 / 6;
        assertThat(p.variance()).containsExactly(new double[] {sigma2, sigma2, sigma2, 2 * sigma2, 2 * sigma2,
            2 * sigma2, 3 * sigma2}, within(1e-12));
        assertThat(p.mean()).containsExactly(11, 23, 30, 11, 23, 30, 11);
    }

    /**
     * A break given where nothing changed (planted: one level and season throughout): fitted on the
     * values after it alone, the forecasts did not do clearly better in the back-test, so all values
     * are kept, with the two errors as evidence.
     */
    @Test
    void aBreakThatChangedNothingKeepsTheHistory() {
        Random random = new Random(21);
        double[] y = new double[144];
        for (int t = 0; t < y.length; t++) {
            y[t] = 1000 * (1 + 0.3 * Math.sin(2 * Math.PI * t / 12)) * (1 + 0.03 * random.nextGaussian());
        }
        Outlook.Result outlook = Outlook.of(y, 12, 12, Outlook.Bounds.NON_NEGATIVE, 66).orElseThrow();
        assertThat(outlook.span().basis()).isEqualTo(Outlook.Span.Basis.ALL_VALUES_NOT_BEATEN);
        assertThat(outlook.span().from()).isZero();
        assertThat(outlook.span().regimeMae()).isGreaterThan(0.75 * outlook.span().allMae());
    }

    /**
     * The span rule on planted back-test errors (the combination's, as no single method is clearly
     * better): the latest regime replaces all values only when its error is at least 25 % lower —
     * 8 against 10 is not enough, 7.5 against 10 is the margin exactly.
     */
    @Test
    void theLatestRegimeReplacesAllValuesOnlyWhenClearlyBetter() {
        Backtest.Run all = new Backtest.Run(List.of(score(Outlook.Method.COMBINATION, 10, 10, 10),
                score(Outlook.Method.ETS, 10.5, 10, 11)), Backtest.COMBINABLE, 24, 10);
        Backtest.Run close = new Backtest.Run(List.of(score(Outlook.Method.COMBINATION, 8, 8, 8),
                score(Outlook.Method.ETS, 8.5, 8, 9)), Backtest.COMBINABLE, 24, 10);
        Backtest.Run clear = new Backtest.Run(List.of(score(Outlook.Method.COMBINATION, 7.5, 7, 8),
                score(Outlook.Method.ETS, 8.5, 8, 9)), Backtest.COMBINABLE, 24, 10);
        assertThat(Outlook.weigh(96, all, close)).isEqualTo(new Outlook.Span(0, Outlook.Span.Basis.ALL_VALUES_NOT_BEATEN,
                10, 8));
        assertThat(Outlook.weigh(96, all, clear)).isEqualTo(new Outlook.Span(96,
                Outlook.Span.Basis.REGIME_CLEARLY_BETTER, 10, 7.5));
    }

    /** A break too close to the end for a back-test of its own: all values, and the span says why. */
    @Test
    void aBreakTooCloseToTheEndKeepsTheHistory() {
        double[] y = new double[144];
        for (int t = 0; t < y.length; t++) {
            y[t] = (t < 130 ? 1000 : 700) * (1 + 0.3 * Math.sin(2 * Math.PI * t / 12)) + (t % 5);
        }
        Outlook.Result outlook = Outlook.of(y, 12, 12, Outlook.Bounds.NON_NEGATIVE, 130).orElseThrow();
        assertThat(outlook.span().basis()).isEqualTo(Outlook.Span.Basis.REGIME_TOO_SHORT);
        assertThat(outlook.span().from()).isZero();
    }

    private static Outlook.Score score(Outlook.Method method, double mae, double earlier, double later) {
        return score(method, mae, earlier, later, 24);
    }

    private static Outlook.Score score(Outlook.Method method, double mae, double earlier, double later, int forecasts) {
        HorizonErrors none = new HorizonErrors(new double[1], new double[1], new int[1],
                new HorizonErrors.CycleSums(Double.NaN, Double.NaN, Double.NaN, 0));
        return new Outlook.Score(method, mae / 10, 5, mae, earlier / 10, later / 10, 5, forecasts, none);
    }

    /** The rule's minimum (Outlook.MIN_CHOICE_FORECASTS = 20): eight forecasts, as yearly data give, choose nothing. */
    @Test
    void aSingleMethodDoesNotReplaceTheCombinationOnTooFewBacktestForecasts() {
        Outlook.Score combination = score(Outlook.Method.COMBINATION, 10, 10, 10, 8);
        Outlook.Score clear = score(Outlook.Method.THETA, 4, 4.5, 3.5, 8);
        Outlook.Choice choice = Outlook.choose(new Backtest.Run(List.of(combination, clear), Backtest.COMBINABLE, 8, 10));
        assertThat(choice.basis()).isEqualTo(Outlook.Choice.Basis.COMBINATION_TOO_FEW_TESTED);
        assertThat(choice.bestSingle()).contains(clear);
    }

    /**
     * The choice rule on planted back-test scores (MASE scale 10): a single method replaces the
     * combination only when its error is at least 50 % lower over all origins and lower in both
     * halves; 6 against 10 is not clear, and 4 against 10 made of one good half is not steady.
     */
    @Test
    void aSingleMethodReplacesTheCombinationOnlyWhenClearlyAndSteadilyBetter() {
        Outlook.Score combination = score(Outlook.Method.COMBINATION, 10, 10, 10);
        Outlook.Score clear = score(Outlook.Method.THETA, 4, 4.5, 3.5);
        Outlook.Score unsteady = score(Outlook.Method.THETA, 4, 0.5, 11);
        Outlook.Score close = score(Outlook.Method.THETA, 6, 5, 7);
        for (Outlook.Score single : List.of(clear, unsteady, close)) {
            Backtest.Run run = new Backtest.Run(List.of(combination, single), Backtest.COMBINABLE, 24, 10);
            Outlook.Choice choice = Outlook.choose(run);
            assertThat(choice.basis()).as("best single %s", single).isEqualTo(single == clear
                    ? Outlook.Choice.Basis.SINGLE_CLEARLY_BETTER : Outlook.Choice.Basis.COMBINATION_NOT_BEATEN);
            assertThat(choice.combination()).contains(combination);
            assertThat(choice.bestSingle()).contains(single);
        }
    }
}
