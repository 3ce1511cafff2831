package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import java.util.List;
import org.annalist.series.Period;

/**
 * One row of the table of latest periods.
 *
 * @param value       {@code null} when missing
 * @param yearEarlierPeriod the same period a year before
 * @param yearEarlier value of that period; {@code null} when unknown
 * @param changePct   year-on-year change in %; {@code null} when it cannot be computed
 * @param flags       the publisher's flags on either value (e.g. {@code provisional})
 */
public record RecentPeriod(@JsonIgnore Period period, Double value, @JsonIgnore Period yearEarlierPeriod,
                           Double yearEarlier, Double change, Double changePct,
                           List<String> flags) {

    public RecentPeriod {
        flags = List.copyOf(flags);
    }

    /** The period as the findings JSON writes it. */
    @com.fasterxml.jackson.annotation.JsonProperty("period")
    public String label() {
        return period.label();
    }
}
