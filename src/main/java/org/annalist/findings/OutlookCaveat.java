package org.annalist.findings;

import org.annalist.series.Period;

/** What limits the outlook, for the brief's caution. The narrative words each kind. */
public sealed interface OutlookCaveat {

    /**
     * Fitted on the latest regime only, since the structural change that began it: so fitted, the
     * forecasts did clearly better on the series' own past.
     *
     * @param allMae    the back-test's mean absolute error fitted on all values, in the series' units
     * @param regimeMae … and fitted on the latest regime alone
     */
    record FittedSinceBreak(Period start, double allMae, double regimeMae) implements OutlookCaveat {
    }

    /**
     * The latest structural change is too recent to fit on the new level alone: all values are used.
     *
     * @param periodsSince  periods from the change to the latest value
     * @param periodsNeeded periods needed since the change to compare fitting on them alone
     *                      ({@link org.annalist.analysis.forecast.Outlook#shortestOwnRegime}); when
     *                      {@code periodsSince} reaches it, the comparison failed for want of a back-test
     */
    record BreakTooRecent(Period start, int periodsSince, int periodsNeeded) implements OutlookCaveat {
    }

    /**
     * After the structural change that began the latest regime, all values are used: fitted on that
     * regime alone, the forecasts did not do clearly better on the series' own past.
     *
     * @param allMae    the back-test's mean absolute error fitted on all values, in the series' units
     * @param regimeMae … and fitted on the latest regime alone
     */
    record HistoryKept(Period start, double allMae, double regimeMae) implements OutlookCaveat {
    }

    /** The forecasts could not be tested on the series' own past. */
    record NoBacktest(Reason reason) implements OutlookCaveat {

        /** Why. */
        public enum Reason {
            /** The whole series is too short. */
            SERIES_TOO_SHORT,
            /** Long enough, but the values before the back-test give no seasonal naive error to scale by. */
            NO_SCALE
        }
    }

    /**
     * A temporary shock — a fall (or rise) that moved back — was bridged before
     * forecasting: its values replaced by a line between the levels before and after, with the
     * usual season.
     *
     * @param from first period bridged
     * @param to   last period bridged
     * @param rise the shock was a rise (false: a fall)
     */
    record ShockBridged(Period from, Period to, boolean rise) implements OutlookCaveat {
    }

    /** Missing values were filled with what trend and season predict before forecasting. */
    record GapsFilled(int count) implements OutlookCaveat {
    }
}
