package org.annalist.findings;

import java.time.LocalDate;
import java.util.Optional;
import org.annalist.series.Period;

/**
 * How the calendar of the latest period differs from a year earlier, and how much of the
 * year-on-year change the estimated effect explains. The narrative words each kind.
 */
public sealed interface CalendarNote {

    /**
     * Easter moved between the periods compared.
     *
     * @param window       days before Easter Sunday that count as Easter's
     * @param daysNow      of those days, how many fell in the latest period
     * @param explainedPct what the Easter effect's difference did to the change, in %, when the effect
     *                     counts: (1 + change) / (1 + change without it) − 1
     * @param changePct    the year-on-year change, in % (NaN when unknown)
     */
    record EasterShift(Period now, LocalDate easterNow, LocalDate easterBefore, int window, long daysNow,
                       long daysBefore, Optional<Double> explainedPct, double changePct) implements CalendarNote {
    }

    /**
     * Easter moved between the periods compared, but the data cannot yet tell its effect: too few
     * years of each split of the days before it ({@link CalendarFinding.EasterEvidence}).
     */
    record EasterUntold(CalendarFinding.EasterEvidence evidence) implements CalendarNote {
    }

    /**
     * March and April (or the first two quarters) together, which Easter's move does not affect.
     *
     * @param months whether the periods are months (else quarters)
     */
    record EasterSpanTogether(boolean months, double changePct) implements CalendarNote {
    }

    /** A user's moving holiday fell differently: shares of its days in the two periods. */
    record HolidayShift(String holiday, Period now, Period before, double shareNow, double shareBefore,
                        Optional<Double> explainedPct) implements CalendarNote {
    }

    /**
     * A month had more or fewer Friday and Saturday nights than a year earlier (a series of overnight stays).
     *
     * @param effectPct what the difference did to the change, in %, when the effect counts
     * @param pValue    the estimated effect's p-value, whether it counts or not; empty when it was not estimated
     */
    record WeekendNights(Period now, Period before, int nightsNow, int nightsBefore, Optional<Double> effectPct,
                         Optional<Double> pValue) implements CalendarNote {
    }

    /**
     * A month had more or fewer Saturdays and Sundays than a year earlier: noted for day visits, and
     * for other series only when the estimated weekday effect is significant.
     *
     * @param weekdays  the kind of series the count was noted for
     * @param effectPct what the difference did to the change on a year earlier, in %, when the effect
     *                  counts: (1 + change) / (1 + change without it) − 1
     * @param pValue    the estimated effect's p-value, whether it counts or not; empty when it was not estimated
     */
    record WeekendDays(Period now, Period before, int daysNow, int daysBefore, WeekdayKind weekdays,
                       Optional<Double> effectPct, Optional<Double> pValue) implements CalendarNote {
    }

    /**
     * The change on a year earlier with the significant calendar effects allowed for.
     *
     * @param easterLater whether Easter fell later in the year than a year earlier (empty when it
     *                    is not among the effects that differed)
     * @param weekdays    which days the weekday effect counts
     * @param unit        the series' unit, for a change that cannot be given in %
     * @param inLogs      the effects were estimated on logs, each a % of the value; else in the series'
     *                    units, each the same number of units whatever the value (the appendix gives
     *                    such an effect in units and as a % of the average period, a base other than
     *                    the change's; the latest period's share is then said in units too)
     */
    record CalendarAdjusted(CalendarFinding.AdjustedChange change, Optional<Boolean> easterLater,
                            WeekdayKind weekdays, String unit, boolean inLogs) implements CalendarNote {
    }

    /** A February compared with one of another length. */
    record LeapFebruary(Period now, Period before, double morePct) implements CalendarNote {
    }
}
