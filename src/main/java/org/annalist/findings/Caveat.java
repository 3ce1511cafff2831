package org.annalist.findings;

import org.annalist.series.Period;

/** What limits the findings of a series, for the brief's notes. The narrative words each kind. */
public sealed interface Caveat {

    /** A position of the seasonal period has fewer than two observed values: no decomposition. */
    record NotDecomposed() implements Caveat {
    }

    /** Fewer than {@link DecisionRules#MIN_YEARS_FOR_SEASON} full years: no seasonal statement. */
    record TooShortForSeason() implements Caveat {
    }

    /** Fewer than {@link DecisionRules#MIN_VALUES_FOR_TREND} values: no trend statement. */
    record TooShortForTrend() implements Caveat {
    }

    /** Several values far from trend and season in a stretch, not reported as one-off outliers. */
    record UnusualStretch(Period from, Period to) implements Caveat {
    }

    /** Daily data: structural changes are not searched, the yearly pattern being still in them. */
    record BreaksNotSearchedInDailyData() implements Caveat {
    }

    /**
     * The series has periods before {@code firstYear}, the first full year of the Gregorian calendar:
     * its dates may be Julian ones, so Easter, weekday and holiday effects are not estimated.
     */
    record CalendarBeforeGregorian(int firstYear) implements Caveat {
    }

    /** The latest regime is still short: the break that started it may not hold. */
    record ProvisionalBreak(Period start) implements Caveat {
    }
}
