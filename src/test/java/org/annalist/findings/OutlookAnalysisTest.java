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

    @Test
    void afterABreakWithALongNewRegimeTheOutlookIsFittedOnThatRegimeOnly() {
        Findings f = new Analyst().analyse(nights(150, 96, 0.4, 5));
        assertThat(f.breaks()).isNotEmpty();
        BreakFinding last = f.breaks().get(f.breaks().size() - 1);
        assertThat(f.outlook().fittedFrom()).isEqualTo(last.period());
        assertThat(f.outlook().caveats()).contains(new OutlookCaveat.FittedSinceBreak(last.period()));
        // the forecasts continue the new level, not a mix with the old one
        assertThat(f.outlook().nextYearTotal().mean()).isBetween(0.5 * 12_000, 0.7 * 12_000);
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

    /** The outlook's choice, as typed evidence: the back-test's origins and its best two scores. */
    @Test
    void theChoiceByBacktestCarriesItsScores() {
        OutlookFinding o = new Analyst().analyse(nights(72, 1000, 0, 8)).outlook();
        assertThat(o.backtest()).hasSize(4).extracting(OutlookFinding.Score::method)
                .containsExactlyInAnyOrder(OutlookMethod.ETS, OutlookMethod.THETA, OutlookMethod.COMBINATION,
                        OutlookMethod.SEASONAL_NAIVE);
        OutlookFinding.Score best = o.backtest().get(0);
        OutlookFinding.Score next = o.backtest().get(1);
        assertThat(o.method()).isEqualTo(best.method());
        assertThat(o.backtestPeriods()).isEqualTo(24);
        assertThat(o.chosenBecause()).isEqualTo(new OutlookFinding.Choice(true, 24, best.mase(),
                Optional.of(next.method()), next.mase()));
        String ets = "ETS\\([AM],(N|A|Ad),[NAM]\\)";
        OutlookFinding.Model model = o.model();
        assertThat(model.method()).isEqualTo(o.method());
        assertThat(model.naive()).isEqualTo(OutlookMethod.SEASONAL_NAIVE);
        switch (o.method()) {
            case ETS, COMBINATION -> assertThat(model.ets()).hasValueSatisfying(e -> assertThat(e).matches(ets));
            default -> assertThat(model.ets()).isEmpty();
        }
    }

    /** Annual data (Nile, R datasets): the benchmark is the plain naive forecast and is named so. */
    @Test
    void theSeasonalNaiveForecastOfAnnualDataIsCalledNaive() {
        Series nile = Series.builder("Nile", Frequency.ANNUAL).unit("10^8 m^3")
                .append(Period.year(1871), Reference.dataset("Nile.csv")).snapshot();
        OutlookFinding o = new Analyst().analyse(nile).outlook();
        assertThat(o.backtest()).extracting(OutlookFinding.Score::method).contains(OutlookMethod.NAIVE)
                .doesNotContain(OutlookMethod.SEASONAL_NAIVE);
        assertThat(o.chosenBecause().nextBest()).isNotEqualTo(Optional.of(OutlookMethod.SEASONAL_NAIVE));
        // measured: the combination wins the back-test (MASE 0.95; ETS 0.97, Theta 0.98, naive 1.09)
        assertThat(o.method()).isEqualTo(OutlookMethod.COMBINATION);
        assertThat(o.model().naive()).isEqualTo(OutlookMethod.NAIVE);
        assertThat(o.model().ets()).hasValueSatisfying(e -> assertThat(e).matches("ETS\\([AM],(N|A|Ad),N\\)"));
    }

    @Test
    void aSeriesTooShortForTheBacktestSaysSo() {
        OutlookFinding o = new Analyst().analyse(nights(30, 1000, 0, 9)).outlook();
        assertThat(o.backtest()).isEmpty();
        assertThat(o.method()).isEqualTo(OutlookMethod.ETS);
        assertThat(o.model().ets()).hasValueSatisfying(e -> assertThat(e).matches("ETS\\([AM],(N|A|Ad),[NAM]\\)"));
        assertThat(o.chosenBecause().backtested()).isFalse();
        assertThat(o.caveats()).contains(new OutlookCaveat.NoBacktest(OutlookCaveat.NoBacktest.Reason.SERIES_TOO_SHORT,
                Optional.empty()));
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
