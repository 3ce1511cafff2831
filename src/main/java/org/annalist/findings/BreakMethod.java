package org.annalist.findings;

/**
 * How structural breaks were searched, for the methods appendix.
 *
 * @param levelAndSlope  whether the regimes were fitted with a slope (Bai–Perron's level-and-slope
 *                       model won on BIC); PELT and the unsearched cases fit levels only
 * @param minimumRegime  the shortest regime allowed, in periods
 */
public record BreakMethod(Search search, boolean levelAndSlope, int minimumRegime) {

    public enum Search {
        /** Bai–Perron, the number of breaks by BIC, then reduced until every break passes its own sup-F test. */
        BAI_PERRON,
        /** PELT for long series, every break then checked by its own sup-F test. */
        PELT,
        /** Daily data still hold the pattern of the year, whose waves would read as breaks. */
        NOT_SEARCHED_IN_DAILY_DATA,
        /** Fewer than two regimes of the minimum length. */
        NOT_SEARCHED_TOO_SHORT
    }
}
