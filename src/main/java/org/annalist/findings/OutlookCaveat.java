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

    /** Too short to test the forecasts on the series' own past. */
    record NoBacktest() implements OutlookCaveat {
    }

    /** Missing values were filled with what trend and season predict before forecasting. */
    record GapsFilled(int count) implements OutlookCaveat {
    }
}
