package org.annalist.findings;

import java.util.Collections;
import java.util.Set;
import org.annalist.series.Period;
import org.annalist.series.ValueFlag;

/**
 * One row of the table of latest periods.
 *
 * @param value             {@code null} when missing
 * @param yearEarlierPeriod the same period a year before
 * @param yearEarlier       value of that period; {@code null} when unknown
 * @param changePct         year-on-year change in %; {@code null} when it cannot be computed
 * @param flags             the publisher's flags on the value (e.g. provisional)
 * @param yearEarlierFlags  the publisher's flags on the value a year before
 */
public record RecentPeriod(Period period, Double value, Period yearEarlierPeriod, Double yearEarlier, Double change,
                           Double changePct, Set<ValueFlag> flags, Set<ValueFlag> yearEarlierFlags) {

    public RecentPeriod {
        flags = Collections.unmodifiableSet(flags);
        yearEarlierFlags = Collections.unmodifiableSet(yearEarlierFlags);
    }
}
