package org.annalist.findings;

import java.util.Locale;
import java.util.regex.Pattern;
import org.annalist.series.Series;

/**
 * Whether a series is a flow (summed over time: nights, arrivals, sales) or a level (averaged:
 * occupancy, rates, prices, averages). Declared by the user, else read from the unit and name:
 * a unit in % or a name that says rate, occupancy, average, mean, price, index, share or "per"
 * makes a level; everything else is a flow, the safer default for counts.
 */
public final class MeasureKind {

    private static final Pattern LEVEL_WORDS = Pattern.compile(
            "(?i).*\\b(rate|rates|occupancy|average|avg|mean|price|prices|index|share|per|ratio|length of stay|alos)\\b.*");

    private MeasureKind() {
    }

    public static Measure infer(Series series) {
        String unit = series.unit().toLowerCase(Locale.ROOT);
        if (unit.contains("%") || unit.contains("percent") || LEVEL_WORDS.matcher(series.name()).matches()
                || LEVEL_WORDS.matcher(unit).matches()) {
            return Measure.LEVEL;
        }
        return Measure.FLOW;
    }
}
