package org.annalist.findings;

import org.annalist.series.Series;

/**
 * The findings JSON {@code series} block: what series was analysed and over which span.
 *
 * @param observations every period from start to end, missing ones included
 * @param missing      periods without a value
 */
public record SeriesFacts(String name, String unit, String frequency, String start, String end, int observations,
                          int missing) {

    public static SeriesFacts of(Series series) {
        return new SeriesFacts(series.name(), series.unit().isEmpty() ? null : series.unit(),
                series.frequency().label(), series.start().label(), series.end().label(), series.size(),
                series.missingCount());
    }
}
