package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonValue;
import java.util.List;
import java.util.Locale;
import org.annalist.series.Period;

/**
 * The findings JSON {@code indicators} block: the latest period against earlier ones.
 *
 * @param flagged  the publisher's flags on any value these figures use
 * @param rank     among the same period of every year up to this one; 1 = highest
 * @param record   whether the value is the series' highest or lowest so far; null when neither
 */
public record IndicatorsFinding(Period period, double value, List<String> flagged, Measure measure,
                                Comparison samePeriodLastYear, Comparison samePeriodTwoYearsAgo, Span yearToDate,
                                Span rollingYear, Double seasonallyAdjustedChangePct, Rank rank, Extreme record) {

    public IndicatorsFinding {
        flagged = List.copyOf(flagged);
    }

    /** The highest or the lowest value of the whole series so far. */
    public enum Extreme {
        HIGH, LOW;

        /** The findings JSON's code: {@code high}, {@code low}. */
        @JsonValue
        public String code() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /**
     * @param change    in the series' units (percentage points for a rate in %)
     * @param changePct null where the measure has no % change (a rate, an interval-scale quantity)
     */
    public record Comparison(Period period, double value, double change, Double changePct) {
    }

    /**
     * @param total     the sum over the span for a flow; the mean for a level, rate or interval-scale
     *                  quantity; the ratio of the parts' sums for a ratio
     * @param changePct null where the measure has no % change (a rate, an interval-scale quantity)
     */
    public record Span(Period from, Period to, double total, double previousTotal, double change, Double changePct) {
    }

    public record Rank(int position, int of) {
    }
}
