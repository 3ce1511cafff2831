package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonValue;
import java.util.List;
import java.util.Locale;
import org.annalist.series.Period;

/**
 * The findings JSON {@code indicators} block: the latest period against earlier ones.
 *
 * @param flagged  the publisher's flags on any value these figures use
 * @param rank        among the same period of every year up to this one; 1 = highest
 * @param record      whether the value is the series' highest or lowest so far, beyond every earlier
 *                    value; null when neither (and when an earlier value equals it: see {@code equalRecord})
 * @param equalRecord the value equals the series' highest or lowest so far, which an earlier period
 *                    also had: a tie, never called "the highest"; null when there is none
 * @param seasonallyAdjustedChangePct the change on the period before of the seasonally adjusted values,
 *                    with the calendar effects the analysis kept taken out as well where they touch
 *                    either period ({@code adjustedForCalendar}); null where not stated
 * @param adjustedForCalendar whether that change is also adjusted for calendar effects
 */
public record IndicatorsFinding(Period period, double value, List<String> flagged, Measure measure,
                                Comparison samePeriodLastYear, Comparison samePeriodTwoYearsAgo, Span yearToDate,
                                Span rollingYear, Double seasonallyAdjustedChangePct, Rank rank, Extreme record,
                                EqualRecord equalRecord, boolean adjustedForCalendar) {

    public IndicatorsFinding {
        flagged = List.copyOf(flagged);
    }

    /** Without a tie for the record, and no calendar effect in the adjusted change. */
    public IndicatorsFinding(Period period, double value, List<String> flagged, Measure measure,
                             Comparison samePeriodLastYear, Comparison samePeriodTwoYearsAgo, Span yearToDate,
                             Span rollingYear, Double seasonallyAdjustedChangePct, Rank rank, Extreme record) {
        this(period, value, flagged, measure, samePeriodLastYear, samePeriodTwoYearsAgo, yearToDate, rollingYear,
                seasonallyAdjustedChangePct, rank, record, null, false);
    }

    /**
     * The latest value ties with the highest (or lowest) of the series so far.
     *
     * @param with the earlier periods that had the same value, in time order
     */
    public record EqualRecord(Extreme extreme, List<Period> with) {
        public EqualRecord {
            with = List.copyOf(with);
        }
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

    /**
     * @param position 1 + the number of same periods with a higher value (so tied values share a position)
     * @param tiedWith the earlier same periods with exactly the latest value, in time order: the rank is
     *                 shared with them ("equal highest")
     */
    public record Rank(int position, int of, List<Period> tiedWith) {
        public Rank {
            tiedWith = List.copyOf(tiedWith);
        }

        /** Without ties. */
        public Rank(int position, int of) {
            this(position, of, List.of());
        }

        /** Whether no same period ranks below this one. */
        public boolean lowest() {
            return position + tiedWith.size() == of;
        }
    }
}
