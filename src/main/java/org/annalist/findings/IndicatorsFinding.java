package org.annalist.findings;

import java.util.List;

/**
 * The findings JSON {@code indicators} block: the latest period against earlier ones.
 *
 * @param flagged  the publisher's flags on any value these figures use
 * @param measure  {@code flow} (summed over spans) or {@code level} (averaged)
 * @param rank     among the same period of every year up to this one; 1 = highest
 * @param record   {@code high} or {@code low} when the value is the series' highest or lowest so far, else null
 */
public record IndicatorsFinding(String period, double value, List<String> flagged, String measure,
                                Comparison samePeriodLastYear, Comparison samePeriodTwoYearsAgo, Span yearToDate,
                                Span rollingYear, Double seasonallyAdjustedChangePct, Rank rank, String record) {

    public IndicatorsFinding {
        flagged = List.copyOf(flagged);
    }

    /** @param change in the series' units (percentage points for a rate in %) */
    public record Comparison(String period, double value, double change, Double changePct) {
    }

    /** @param total for a level measure the mean over the span */
    public record Span(String from, String to, double total, double previousTotal, double change, Double changePct) {
    }

    public record Rank(int position, int of) {
    }
}
