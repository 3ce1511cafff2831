package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;

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
        assertThat(Terms.choice(new OutlookFinding.Choice(true, 24, 0.5912, Optional.of(OutlookMethod.COMBINATION),
                0.6249))).isEqualTo("lowest mean absolute scaled error in a rolling-origin back-test over the last 24"
                + " periods (0.59; next best combination 0.62)");
        assertThat(Terms.choice(new OutlookFinding.Choice(false, 0, Double.NaN, Optional.empty(), Double.NaN)))
                .isEqualTo("chosen by AICc among ETS models, without a back-test");
    }

    @Test
    void theCombinationNamesItsMembersAndANonSeasonalSeriesGetsTheNaiveOne() {
        assertThat(Terms.forecastModel(new OutlookFinding.Model(OutlookMethod.COMBINATION, Optional.of("ETS(A,N,N)"),
                false, OutlookMethod.NAIVE))).isEqualTo("mean of ETS(A,N,N), Theta and naive");
        assertThat(Terms.forecastModel(new OutlookFinding.Model(OutlookMethod.THETA, Optional.empty(), true,
                OutlookMethod.SEASONAL_NAIVE))).isEqualTo("Theta, seasonally adjusted");
    }

    @Test
    void aBreakInTheOutlooksCaveatIsDatedInWords() {
        Formats f = Formats.forValues(new double[] {1}, Locale.ENGLISH);
        assertThat(Terms.outlookCaveat(new OutlookCaveat.FittedSinceBreak(Period.month(2022, 8)), f))
                .isEqualTo("The outlook is fitted on the values since the structural change in August 2022 only.");
        assertThat(Terms.outlookCaveat(new OutlookCaveat.GapsFilled(1), f))
                .isEqualTo("1 missing value was filled with what trend and season predict before forecasting.");
    }

    /** A 14-year series whose latest regime is short is not called too short itself (issue 14, item 6). */
    @Test
    void noBacktestSaysWhetherTheSeriesOrOnlyTheLatestRegimeIsShort() {
        Formats f = Formats.forValues(new double[] {1}, Locale.ENGLISH);
        String regime = Terms.outlookCaveat(new OutlookCaveat.NoBacktest(
                OutlookCaveat.NoBacktest.Reason.REGIME_TOO_SHORT, Optional.of(Period.month(2022, 8))), f);
        assertThat(regime).startsWith("The forecasts use only the values since the structural change in August 2022")
                .doesNotContain("The series is too short");
        assertThat(Terms.outlookCaveat(new OutlookCaveat.NoBacktest(OutlookCaveat.NoBacktest.Reason.SERIES_TOO_SHORT,
                Optional.empty()), f)).startsWith("The series is too short to test the forecasts");
    }

    @Test
    void theBreakSearchIsDescribedWithItsSettings() {
        assertThat(Terms.breakMethod(new BreakMethod(BreakMethod.Search.PELT, false, 52))).isEqualTo("PELT, changes in"
                + " level, penalty 3 log n on the robust noise scale, minimum regime 52, then every break checked by its"
                + " own sup-F test (AR(1) Monte Carlo null, 5 %)");
        assertThat(Terms.breakMethod(new BreakMethod(BreakMethod.Search.BAI_PERRON, true, 12))).isEqualTo("Bai-Perron,"
                + " changes in level and slope, number of breaks by BIC, then reduced until every break passes its own"
                + " sup-F test (AR(1) Monte Carlo null, 5 %), minimum regime 12");
        assertThat(Terms.breakMethod(new BreakMethod(BreakMethod.Search.NOT_SEARCHED_TOO_SHORT, false, 12)))
                .isEqualTo("not searched: fewer than two regimes of 12 periods");
    }
}
