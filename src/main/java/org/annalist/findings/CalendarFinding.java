package org.annalist.findings;

import java.util.List;
import org.annalist.analysis.calendar.CalendarEffects;
import org.annalist.series.Period;

/**
 * The findings JSON {@code calendar} block.
 *
 * @param easter       Easter Sunday of every year the series covers
 * @param effects      the calendar effects estimated (kept or not; {@code kept} says which count)
 * @param notes        how the calendar of the latest period differs from a year earlier
 * @param weekdays     which days of the week the weekday effect counts, decided from the series' words
 * @param screenedOut  periods kept out of the calendar estimate as one-offs (robust screen)
 * @param latestChange the latest period's change on a year earlier with the significant calendar
 *                     effects allowed for; null when no significant effect differed between the two
 */
public record CalendarFinding(List<EasterDate> easter, List<Effect> effects, List<CalendarNote> notes,
                              WeekdayKind weekdays, List<Period> screenedOut, AdjustedChange latestChange) {

    /** The name of the Easter effect in {@code effects}. */
    public static final String EASTER = CalendarEffects.EASTER;
    /** The name of the Friday-and-Saturday-nights effect (series of overnight stays). */
    public static final String WEEKEND_NIGHTS = CalendarEffects.WEEKEND;
    /** The name of the Saturdays-and-Sundays effect (day visits and other series). */
    public static final String WEEKEND_DAYS = CalendarEffects.WEEKEND_DAYS;

    public CalendarFinding {
        easter = List.copyOf(easter);
        effects = List.copyOf(effects);
        notes = List.copyOf(notes);
        screenedOut = List.copyOf(screenedOut);
    }

    public record EasterDate(int year, String date) {
    }

    /**
     * @param coefficient per whole Easter window in the period, or per extra Friday or Saturday night
     *                    (or Saturday or Sunday), on the working scale (logs when multiplicative)
     * @param effectPct   the same as a % of the period's value
     */
    public record Effect(String name, double coefficient, double effectPct, double pValue, boolean kept) {
    }

    /**
     * The latest period against a year earlier, as observed and with the significant calendar
     * effects taken out of both periods (each value less what those effects put into it).
     *
     * @param change            observed change, in the series' units (percentage points for a rate in %)
     * @param changePct         observed change in %; null where a % change means nothing (a value ≤ 0 a year earlier)
     * @param adjustedChange    the change of the calendar-adjusted values, in the series' units
     * @param adjustedChangePct the same in %; null as {@code changePct}
     * @param calendarPct       how much the calendar's difference moved the latest period, in % of the
     *                          value it would have had with the calendar of a year earlier
     * @param calendarShare     the share of the observed % change the calendar accounts for,
     *                          (changePct − adjustedChangePct) / changePct; null when changePct is
     *                          null or within ±0.05 of zero
     * @param effects           the significant effects that differed, with their evidence
     */
    public record AdjustedChange(Period period, Period comparedWith, double change, Double changePct,
                                 double adjustedChange, Double adjustedChangePct, double calendarPct,
                                 Double calendarShare, List<Part> effects) {

        public AdjustedChange {
            effects = List.copyOf(effects);
        }
    }

    /**
     * @param effectPct what this effect's difference put into the latest period, in %
     * @param pValue    the effect's p-value (Newey–West)
     */
    public record Part(String name, double effectPct, double pValue) {
    }
}
