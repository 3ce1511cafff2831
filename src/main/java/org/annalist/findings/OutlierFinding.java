package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import org.annalist.series.Period;

/**
 * One entry of the findings JSON {@code outliers} list: a single period far from what trend and
 * season predict.
 *
 * @param expected     trend-cycle, seasonal effect and the significant calendar effects at that
 *                     period, in the series' units
 * @param score        robust z of the remainder
 * @param direction    above or below what was expected
 * @param calendar     the calendar effect the expected value allows for, when the significant
 *                     calendar effects moved it by at least {@link DecisionRules#CALENDAR_NAMED_PCT}; else null
 * @param deviationPct observed against expected, in %
 */
public record OutlierFinding(Period period, double observed, double expected, double score, Side direction,
                             CalendarAllowance calendar, @JsonIgnore double deviationPct, @JsonIgnore int index) {

    /**
     * @param effect       the largest significant calendar effect at the period ({@code easter},
     *                     {@code friday_saturday_nights}, {@code weekend_days} or a holiday's name)
     * @param effectPct    what it put into the expected value, in %
     * @param calendarPct  what all significant calendar effects together put into it, in %
     * @param regressor    the effect's measure in that period: days of Easter's window, weekend
     *                     nights or days, or the share of a holiday's days
     * @param typical      the same on average in that calendar month (or quarter) over the data
     * @param easterSunday that year's Easter Sunday (ISO date) for the Easter effect, else null
     * @param easterWindow the days before Easter Sunday that count as Easter's, else null
     */
    public record CalendarAllowance(String effect, double effectPct, double calendarPct, double regressor,
                                    double typical, String easterSunday, Integer easterWindow) {
    }
}
