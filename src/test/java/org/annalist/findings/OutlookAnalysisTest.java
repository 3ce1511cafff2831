package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Optional;
import java.util.Random;
import org.annalist.analysis.Reference;
import org.annalist.analysis.forecast.Outlook;
import org.annalist.analysis.indicators.LatestIndicators;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/** Which values the outlook is fitted on, how far it looks and which bounds it keeps (synthetic series). */
class OutlookAnalysisTest {

    /** Monthly nights from January 2012, seasonal, with the level cut by {@code drop} from month {@code breakAt}. */
    private static Series nights(int n, int breakAt, double drop, long seed) {
        Random random = new Random(seed);
        double[] x = new double[n];
        for (int t = 0; t < n; t++) {
            double level = t >= breakAt ? 1000 * (1 - drop) : 1000;
            x[t] = Math.round(level * (1 + 0.3 * Math.sin(2 * Math.PI * t / 12)) * (1 + 0.03 * random.nextGaussian()));
        }
        return Series.builder("nights", Frequency.MONTHLY).unit("nights").append(Period.month(2012, 1), x).snapshot();
    }

    /**
     * A lasting 40 % step with four and a half years after it: whether the outlook keeps the years
     * before it is the back-test's decision, and the caveat names the break either way; the
     * forecasts continue the new level, not a mix with the old one.
     */
    @Test
    void afterABreakWithALongNewRegimeTheForecastsContinueTheNewLevel() {
        Findings f = new Analyst().analyse(nights(150, 96, 0.4, 5));
        assertThat(f.breaks()).isNotEmpty();
        BreakFinding last = f.breaks().get(f.breaks().size() - 1);
        OutlookFinding o = f.outlook();
        assertThat(o.caveats()).anySatisfy(c -> assertThat(c).isInstanceOfAny(OutlookCaveat.FittedSinceBreak.class,
                OutlookCaveat.HistoryKept.class));
        assertThat(o.fittedFrom()).isIn(last.period(), Period.month(2012, 1));
        assertThat(o.nextYearTotal().mean()).isBetween(0.5 * 12_000, 0.7 * 12_000);
    }

    /**
     * A planted six-month collapse to half, then a full return: the episode is bridged before
     * forecasting, the history before it is kept, and the next year's total is the undisturbed
     * level's (12 × 1,000; the season averages out), not pulled down by the shock.
     */
    @Test
    void aTemporaryCollapseIsBridgedAndTheHistoryKept() {
        Random random = new Random(31);
        double[] x = new double[150];
        for (int t = 0; t < x.length; t++) {
            double shock = t >= 100 && t < 106 ? 0.5 : 1;
            x[t] = Math.round(1000 * shock * (1 + 0.3 * Math.sin(2 * Math.PI * t / 12))
                    * (1 + 0.03 * random.nextGaussian()));
        }
        Series s = Series.builder("nights", Frequency.MONTHLY).unit("nights").append(Period.month(2012, 1), x).snapshot();
        Findings f = new Analyst().analyse(s);
        assertThat(f.episodes()).isNotEmpty();
        OutlookFinding o = f.outlook();
        assertThat(o.caveats()).hasAtLeastOneElementOfType(OutlookCaveat.ShockBridged.class);
        assertThat(o.fittedFrom()).isEqualTo(Period.month(2012, 1));
        assertThat(o.nextYearTotal().mean()).isBetween(0.93 * 12_000, 1.07 * 12_000);
    }

    @Test
    void aBreakTooRecentForItsOwnFitIsNamedAsACaveat() {
        Findings f = new Analyst().analyse(nights(150, 138, 0.4, 6));
        assertThat(f.breaks()).isNotEmpty();
        assertThat(f.outlook().fittedFrom()).isEqualTo(Period.month(2012, 1));
        assertThat(f.outlook().caveats()).hasAtLeastOneElementOfType(OutlookCaveat.BreakTooRecent.class);
    }

    /** Data to October 2016: November and December, then 12 months, so all of 2017 is covered. */
    @Test
    void defaultHorizonIsTheRestOfTheYearPlusTwelvePeriods() {
        Findings f = new Analyst().analyse(nights(58, 1000, 0, 7));
        assertThat(f.outlook().horizon()).isEqualTo(14);
        assertThat(f.outlook().forecasts().get(0).period()).isEqualTo(Period.month(2016, 11));
        assertThat(f.outlook().nextYear()).isEqualTo(2017);
        assertThat(f.outlook().nextYearTotal()).isNotNull();
        assertThat(OutlookAnalysis.restOfYear(Period.quarter(2026, 2))).isEqualTo(2);
        assertThat(OutlookAnalysis.restOfYear(Period.year(2026))).isZero();
    }

    @Test
    void aShortHorizonGivesNoYearTotal() {
        Findings f = new Analyst(Optional.empty(), Optional.empty(), List.of(), Optional.of(6))
                .analyse(nights(58, 1000, 0, 7));
        assertThat(f.outlook().forecasts()).hasSize(6);
        assertThat(f.outlook().nextYearTotal()).isNull();
    }

    @Test
    void boundsFollowTheMeasure() {
        Series occupancy = Series.builder("occupancy", Frequency.MONTHLY).unit("%")
                .append(Period.month(2020, 1), 55, 60, 71).snapshot();
        Series change = Series.builder("balance", Frequency.MONTHLY).append(Period.month(2020, 1), 5, -2, 3).snapshot();
        assertThat(OutlookAnalysis.bounds(occupancy, LatestIndicators.Measure.LEVEL)).isEqualTo(Outlook.Bounds.PERCENT);
        assertThat(OutlookAnalysis.bounds(nights(24, 1000, 0, 1), LatestIndicators.Measure.FLOW))
                .isEqualTo(Outlook.Bounds.NON_NEGATIVE);
        assertThat(OutlookAnalysis.bounds(change, LatestIndicators.Measure.FLOW)).isEqualTo(Outlook.Bounds.NONE);
    }

    /** The outlook's choice, as typed evidence: the back-test's origins, the combination's score and the best single one. */
    @Test
    void theChoiceByBacktestCarriesItsScores() {
        OutlookFinding o = new Analyst().analyse(nights(72, 1000, 0, 8)).outlook();
        assertThat(o.backtest()).extracting(OutlookFinding.Score::method).startsWith(OutlookMethod.COMBINATION)
                .contains(OutlookMethod.ETS, OutlookMethod.ARIMA, OutlookMethod.THETA, OutlookMethod.SEASONAL_NAIVE);
        OutlookFinding.Score combination = o.backtest().get(0);
        OutlookFinding.Score best = o.backtest().get(1);
        assertThat(o.backtestPeriods()).isEqualTo(24);
        assertThat(o.chosenBecause()).isIn(
                new OutlookFinding.Choice(OutlookFinding.Choice.Basis.COMBINATION_NOT_BEATEN, 24, combination.mase(),
                        Optional.of(best.method()), best.mase()),
                new OutlookFinding.Choice(OutlookFinding.Choice.Basis.SINGLE_CLEARLY_BETTER, 24, combination.mase(),
                        Optional.of(best.method()), best.mase()));
        OutlookFinding.Model model = o.model();
        assertThat(model.method()).isEqualTo(o.method());
        if (o.method() == OutlookMethod.COMBINATION) {
            assertThat(model.members()).extracting(OutlookFinding.Model::method)
                    .containsExactly(OutlookMethod.ETS, OutlookMethod.ARIMA, OutlookMethod.THETA);
            assertThat(model.members().get(0).label()).hasValueSatisfying(e -> assertThat(e)
                    .matches("ETS\\([AM],(N|A|Ad),[NAM]\\)"));
            assertThat(model.members().get(1).label()).hasValueSatisfying(e -> assertThat(e).startsWith("ARIMA("));
        }
    }

    /** Annual data (Nile, R datasets): the yardstick is the plain naive forecast and is named so. */
    @Test
    void theSeasonalNaiveForecastOfAnnualDataIsCalledNaive() {
        Series nile = Series.builder("Nile", Frequency.ANNUAL).unit("10^8 m^3")
                .append(Period.year(1871), Reference.dataset("Nile.csv")).snapshot();
        OutlookFinding o = new Analyst().analyse(nile).outlook();
        assertThat(o.backtest()).extracting(OutlookFinding.Score::method).contains(OutlookMethod.NAIVE)
                .doesNotContain(OutlookMethod.SEASONAL_NAIVE);
        assertThat(o.chosenBecause().bestSingle()).isNotEqualTo(Optional.of(OutlookMethod.SEASONAL_NAIVE));
    }

    @Test
    void aSeriesTooShortForTheBacktestSaysSo() {
        OutlookFinding o = new Analyst().analyse(nights(30, 1000, 0, 9)).outlook();
        assertThat(o.backtest()).isEmpty();
        assertThat(o.method()).isEqualTo(OutlookMethod.COMBINATION);
        assertThat(o.chosenBecause().basis()).isEqualTo(OutlookFinding.Choice.Basis.COMBINATION_WITHOUT_BACKTEST);
        assertThat(o.chosenBecause().backtested()).isFalse();
        assertThat(o.caveats()).contains(new OutlookCaveat.NoBacktest(OutlookCaveat.NoBacktest.Reason.SERIES_TOO_SHORT));
    }

    @Test
    void aGapInsideTheFittedSpanIsFilledAndSaidSo() {
        Series full = nights(72, 1000, 0, 8);
        double[] x = full.values();
        x[40] = Double.NaN;
        Series gappy = Series.builder("nights", Frequency.MONTHLY).unit("nights").append(Period.month(2012, 1), x)
                .snapshot();
        Findings f = new Analyst().analyse(gappy);
        assertThat(f.outlook()).isNotNull();
        assertThat(f.outlook().caveats()).contains(new OutlookCaveat.GapsFilled(1));
    }
}
