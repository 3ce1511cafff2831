package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonInclude;
import org.annalist.series.Series;

/**
 * The findings JSON {@code series} block: what series was analysed and over which span.
 *
 * @param observations every period from start to end, missing ones included
 * @param missing      periods without a value
 * @param measure      how values combine and compare (flow, level, rate, interval, ratio); null where
 *                     no analysis decided it (the data check)
 */
public record SeriesFacts(String name, String unit, String frequency, String start, String end, int observations,
                          int missing,
                          @JsonInclude(JsonInclude.Include.NON_NULL) Measure measure) {

    public static SeriesFacts of(Series series) {
        return of(series, null);
    }

    static SeriesFacts of(Series series, Measure measure) {
        return new SeriesFacts(series.name(), series.unit().isEmpty() ? null : series.unit(),
                series.frequency().label(), series.start().label(), series.end().label(), series.size(),
                series.missingCount(), measure);
    }
}
