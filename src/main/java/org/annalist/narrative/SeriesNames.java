package org.annalist.narrative;

import org.annalist.series.Frequency;

/** The names and units of the series the tool derives: ratios of a file's series, per-day figures. */
public final class SeriesNames {

    /** The unit of an average length of stay. */
    public static final String NIGHTS_PER_ARRIVAL = "nights per arrival";
    /** The unit of an occupancy rate. */
    public static final String PERCENT = "%";

    private SeriesNames() {
    }

    /** {@code Domestic average length of stay} for the base name {@code domestic}; without a base, capitalised. */
    public static String averageLengthOfStay(String base) {
        return named(base, "average length of stay");
    }

    /** {@code Total occupancy} for the base name {@code total}. */
    public static String occupancy(String base) {
        return named(base, "occupancy");
    }

    /** The unit of per-day figures: {@code nights per average month}. */
    public static String perAveragePeriod(String unit, Frequency frequency) {
        return (unit.isEmpty() ? "" : unit + " ") + "per average " + (frequency == Frequency.MONTHLY ? "month" : "quarter");
    }

    private static String named(String base, String what) {
        return base.isEmpty() ? Character.toUpperCase(what.charAt(0)) + what.substring(1)
                : Character.toUpperCase(base.charAt(0)) + base.substring(1) + " " + what;
    }
}
