package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import java.util.List;
import org.annalist.series.Period;

/**
 * One entry of the findings JSON {@code breaks} list: a structural change. The two regimes'
 * fitted lines (seasonally adjusted) are read at the break, between the old regime's last period
 * and the new regime's first: a regime between two breaks gives the "after" of the one and the
 * "before" of the next from its one line, at the two break dates.
 *
 * @param period      the first period of the new regime
 * @param ci95        95 % interval for that first period [earliest, latest]
 * @param levelBefore the old regime's fitted line at the break, in the series' units
 * @param levelAfter  the new regime's fitted line at the break
 * @param changePct   the gap between the two lines at the break: levelAfter against levelBefore, in %
 * @param statistic   sup-F of this break within the span of its two regimes
 * @param provisional the new regime runs to the series' end and is too short to date the break
 *                    (its 95 % interval reaches the latest period)
 * @param index       the position of {@code period} in the series
 * @param kind        what changed: a step in level, the slope, or both
 * @param slopeBefore the old line's slope at the break, in the series' units a year (0 when the
 *                    regimes were fitted as levels)
 * @param slopeAfter  the new line's slope at the break, in the series' units a year; for the last
 *                    break, when the trend finding has a latest regime from it, that regime's rate
 *                    instead ({@link BreakAnalysis#withLatestRate}), the one rate of the regime
 * @param regimeEnd   the last period of the new regime (the next break's old regime ends there too)
 * @param endLevel    the new regime's fitted line at {@code regimeEnd}
 */
public record BreakFinding(Period period, List<Period> ci95, double levelBefore, double levelAfter, double changePct,
                           double statistic, double pValue, @JsonIgnore boolean provisional,
                           @JsonIgnore int index, BreakKind kind, double slopeBefore, double slopeAfter,
                           @JsonIgnore Period regimeEnd, @JsonIgnore double endLevel) {

    public BreakFinding {
        ci95 = List.copyOf(ci95);
    }
}
