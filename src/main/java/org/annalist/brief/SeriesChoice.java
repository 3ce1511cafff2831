package org.annalist.brief;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * Which series of a file a job is about and how each is prepared before the analysis (the
 * selection step, {@link SeriesSelection}).
 *
 * @param names        the series named by the user, in order; a name may also be that of a ratio
 *                     the file offers (average length of stay, occupancy; see
 *                     {@link DerivedSeries})
 * @param whenUnnamed  what to take when {@code names} is empty
 * @param latestPeriod the period to report as latest, as periods are written ({@code 2025-04});
 *                     empty for the last in the data
 * @param units        a unit by series name (or key, in a portal's file), replacing the unit read from the file
 */
public record SeriesChoice(List<String> names, WhenUnnamed whenUnnamed, Optional<String> latestPeriod,
                           Map<String, String> units) {

    /**
     * What a job takes when it names no series. The commands differ here on purpose: a brief is of
     * one series, {@code analyze} shows everything a file holds, and a folder of files gets a brief
     * per series.
     */
    public enum WhenUnnamed {
        /** The file's only series; a file of several is refused, naming them. */
        THE_ONLY_SERIES,
        /** Every series the file holds. */
        EVERY_SERIES,
        /** Every series the file holds, then every ratio derived from them. */
        EVERY_SERIES_AND_RATIOS
    }

    public SeriesChoice {
        names = List.copyOf(names);
        Objects.requireNonNull(whenUnnamed, "whenUnnamed");
        Objects.requireNonNull(latestPeriod, "latestPeriod");
        units = Map.copyOf(units);
    }

    /** One series by name, or the file's only one when {@code name} is empty; no unit overrides. */
    public static SeriesChoice one(Optional<String> name, Optional<String> latestPeriod) {
        return new SeriesChoice(name.map(List::of).orElse(List.of()), WhenUnnamed.THE_ONLY_SERIES, latestPeriod,
                Map.of());
    }
}
