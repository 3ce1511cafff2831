package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.annalist.findings.BreakMethod;
import org.annalist.findings.OutlookCaveat;
import org.annalist.findings.OutlookFinding;
import org.annalist.findings.OutlookMethod;
import org.annalist.findings.Smoothing;
import org.annalist.series.Period;
import org.junit.jupiter.api.Test;

class TermsTest {

    @Test
    void anEvenMovingAverageIsNamedByItsTwoPasses() {
        // the 2×m centred moving average of Hyndman & Athanasopoulos (2021), §3.3; an odd window is a plain m-term one
        assertThat(Terms.movingAverage(new Smoothing.CentredAverage(12))).isEqualTo("2\u00D712 centred moving average");
        assertThat(Terms.movingAverage(new Smoothing.CentredAverage(5))).isEqualTo("5-term centred moving average");
    }

    @Test
    void theOutlooksChoiceIsWordedFromItsScores() {
        // the reason in the words every brief uses (OutlookMethodWords), then the back-test's figures
        assertThat(Terms.choice(new OutlookFinding.Choice(OutlookFinding.Choice.Basis.COMBINATION_NOT_BEATEN, 24, 0.5912,
                Optional.of(OutlookMethod.ETS), 0.6249))).isEqualTo("no single method did clearly better than the"
                + " average in the back-test (rolling-origin back-test over the last 24 periods; MASE: combination 0.59,"
                + " best single method ETS 0.62)");
        assertThat(Terms.choice(new OutlookFinding.Choice(OutlookFinding.Choice.Basis.SINGLE_CLEARLY_BETTER, 8, 0.9,
                Optional.of(OutlookMethod.THETA), 0.7))).isEqualTo("it did clearly better than the average in the"
                + " back-test (rolling-origin back-test over the last 8 periods; MASE: combination 0.90, best single"
                + " method Theta 0.70)");
        assertThat(Terms.choice(new OutlookFinding.Choice(OutlookFinding.Choice.Basis.COMBINATION_TOO_FEW_TESTED, 8, 0.9,
                Optional.of(OutlookMethod.THETA), 0.4))).startsWith("the back-test made too few forecasts to prefer one"
                + " method (rolling-origin back-test over the last 8 periods;");
        assertThat(Terms.choice(new OutlookFinding.Choice(OutlookFinding.Choice.Basis.COMBINATION_WITHOUT_BACKTEST, 0,
                Double.NaN, Optional.empty(), Double.NaN))).isEqualTo("the series is too short to test the methods on"
                + " its own past");
    }

    @Test
    void theCombinationNamesItsMembers() {
        OutlookFinding.Model ets = new OutlookFinding.Model(OutlookMethod.ETS, Optional.of("ETS(A,N,N)"), false, List.of(), false);
        OutlookFinding.Model arima = new OutlookFinding.Model(OutlookMethod.ARIMA, Optional.of("ARIMA(0,1,1)"), false,
                List.of(), false);
        OutlookFinding.Model theta = new OutlookFinding.Model(OutlookMethod.THETA, Optional.empty(), true, List.of(), true);
        assertThat(Terms.forecastModel(new OutlookFinding.Model(OutlookMethod.COMBINATION, Optional.empty(), false,
                List.of(ets, arima, theta), true))).isEqualTo("average of ETS(A,N,N), ARIMA(0,1,1) and Theta, seasonally adjusted");
        assertThat(Terms.forecastModel(theta)).isEqualTo("Theta, seasonally adjusted");
    }

    @Test
    void aBreakInTheOutlooksCaveatIsDatedInWords() {
        Formats f = Formats.forValues(new double[] {1}, Locale.ENGLISH);
        assertThat(Terms.outlookCaveat(new OutlookCaveat.FittedSinceBreak(Period.month(2022, 8), 10, 8), f))
                .isEqualTo("The outlook is fitted on the values since the structural change in August 2022 only: so"
                        + " fitted, its forecasts of the last periods missed by at least 25\u00A0% less than when fitted on"
                        + " all values.");
        // the margin named is the rule's (DecisionRules.OUTLOOK_REGIME_ADVANTAGE_PCT), also when it was not reached
        assertThat(Terms.outlookCaveat(new OutlookCaveat.HistoryKept(Period.month(2022, 8), 10, 8), f))
                .endsWith("did not cut the errors of its forecasts of the last periods by the 25\u00A0% needed to prefer it.");
        assertThat(Terms.outlookCaveat(new OutlookCaveat.GapsFilled(1), f))
                .isEqualTo("1 missing value was filled with what trend and season predict before forecasting.");
    }

    /**
     * A break too recent for the outlook says how recent is too recent: the periods needed since it
     * (Outlook.shortestOwnRegime: 24 to fit on and 24 to test, for monthly data) and those there are
     * (invented: 44 months since March 2023).
     */
    @Test
    void aBreakTooRecentForTheOutlookSaysItsThreshold() {
        Formats f = Formats.forValues(new double[] {1}, Locale.ENGLISH);
        assertThat(org.annalist.analysis.forecast.Outlook.shortestOwnRegime(190, 12)).isEqualTo(48);
        assertThat(Terms.outlookCaveat(new OutlookCaveat.BreakTooRecent(Period.month(2023, 3), 44, 48), f))
                .contains("in March 2023, is too recent", "needs at least 48 months since the change", "there are 44.");
        assertThat(Terms.outlookCaveat(new OutlookCaveat.BreakTooRecent(Period.quarter(2020, 2), 20, 16), f))
                .doesNotContain("too recent").contains("without a back-test");
    }

    /** After a break the outlook keeps the history unless the regime alone did clearly better: the caveat says which. */
    @Test
    void theHistoryKeptAfterABreakIsSaidWithItsReason() {
        Formats f = Formats.forValues(new double[] {1}, Locale.ENGLISH);
        assertThat(Terms.outlookCaveat(new OutlookCaveat.HistoryKept(Period.month(2022, 8), 10, 9.5), f))
                .startsWith("The outlook is fitted on all values, the years before the structural change in August 2022"
                        + " included");
        assertThat(Terms.outlookCaveat(new OutlookCaveat.NoBacktest(OutlookCaveat.NoBacktest.Reason.SERIES_TOO_SHORT), f))
                .startsWith("The series is too short to test the forecasts");
    }

    @Test
    void theBreakSearchIsDescribedWithItsSettings() {
        assertThat(Terms.breakMethod(new BreakMethod(BreakMethod.Search.PELT, false, 52))).isEqualTo("PELT, changes in"
                + " level, penalty 3 log n on the robust noise scale, minimum regime 52, then every break checked by its"
                + " own sup-F test (AR(1) Monte Carlo null, 5 %)");
        assertThat(Terms.breakMethod(new BreakMethod(BreakMethod.Search.BAI_PERRON, true, 12))).isEqualTo("Bai-Perron,"
                + " changes in level and slope, number of breaks by BIC, then reduced until every break passes its own"
                + " sup-F test (AR(1) Monte Carlo null, 5 %), minimum regime 12; a gap at a break only if a bend fits"
                + " worse (F-test)");
        assertThat(Terms.breakMethod(new BreakMethod(BreakMethod.Search.BAI_PERRON, false, 12))).isEqualTo("Bai-Perron,"
                + " changes in level, number of breaks by BIC, then reduced until every break passes its own"
                + " sup-F test (AR(1) Monte Carlo null, 5 %), minimum regime 12");
        assertThat(Terms.breakMethod(new BreakMethod(BreakMethod.Search.NOT_SEARCHED_TOO_SHORT, false, 12)))
                .isEqualTo("not searched: fewer than two regimes of 12 periods");
    }

    /**
     * A bridged fall names the span the outlook replaced, not the end of the climb back: the trend
     * section dates that by its own rule, and the two dates may differ (the demo's long-haul market:
     * bridged to February 2022, back above the old level by February 2023).
     */
    @Test
    void aBridgedFallNamesTheSpanReplacedWithoutDatingTheClimbBack() {
        Formats f = Formats.forValues(new double[] {1}, Locale.ENGLISH);
        String words = Terms.outlookCaveat(new OutlookCaveat.ShockBridged(Period.month(2021, 1), Period.month(2022, 2),
                false), f);
        assertThat(words).startsWith("For the fall of January 2021, the values from January 2021 to February 2022"
                + " were replaced by a line").doesNotContain("movement back");
    }
}
