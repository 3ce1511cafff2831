package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import java.util.List;
import org.annalist.series.Period;

/**
 * One entry of the findings JSON {@code breaks} list: a structural change.
 *
 * @param period      the first period of the new regime
 * @param ci95        95 % interval for that first period [earliest, latest]
 * @param levelBefore fitted level of the old regime at its last period, seasonally adjusted, in the series' units
 * @param levelAfter  fitted level of the new regime at its first period
 * @param changePct   levelAfter against levelBefore, in %
 * @param statistic   sup-F of this break within the span of its two regimes
 * @param provisional the new regime is still shorter than two minimum regimes: the break may not hold
 * @param index       the position of {@code period} in the series
 */
public record BreakFinding(Period period, List<Period> ci95, double levelBefore, double levelAfter, double changePct,
                           double statistic, double pValue, @JsonIgnore boolean provisional,
                           @JsonIgnore int index) {

    public BreakFinding {
        ci95 = List.copyOf(ci95);
    }
}
