package org.annalist.findings;

import org.annalist.series.Period;

/** What limits the outlook, for the brief's caution. The narrative words each kind. */
public sealed interface OutlookCaveat {

    /** Fitted on the latest regime only, since the structural change that began it. */
    record FittedSinceBreak(Period start) implements OutlookCaveat {
    }

    /** The latest structural change is too recent to fit on the new level alone: all values are used. */
    record BreakTooRecent(Period start) implements OutlookCaveat {
    }

    /**
     * The forecasts could not be tested on the series' own past.
     *
     * @param since the start of the latest regime, when the outlook is fitted on it alone and it is
     *              that regime, not the series, that is too short (empty otherwise)
     */
    record NoBacktest(Reason reason, java.util.Optional<Period> since) implements OutlookCaveat {

        /** Why. */
        public enum Reason {
            /** The whole series is too short. */
            SERIES_TOO_SHORT,
            /** The series is long enough, but the latest regime the outlook is fitted on is not. */
            REGIME_TOO_SHORT,
            /** Long enough, but the values before the back-test give no seasonal naive error to scale by. */
            NO_SCALE
        }
    }

    /** Missing values were filled with what trend and season predict before forecasting. */
    record GapsFilled(int count) implements OutlookCaveat {
    }
}
