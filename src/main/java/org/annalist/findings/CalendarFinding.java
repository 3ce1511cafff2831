package org.annalist.findings;

import java.util.List;
import java.util.Optional;
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
 * @param easterEvidence whether the data can tell an Easter effect, and from which years; null where
 *                     no calendar effect was estimated
 */
public record CalendarFinding(List<EasterDate> easter, List<Effect> effects, List<CalendarNote> notes,
                              WeekdayKind weekdays, List<Period> screenedOut, AdjustedChange latestChange,
                              EasterEvidence easterEvidence) {

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

    /** The Easter effect, when it was estimated and kept; empty otherwise. */
    public Optional<Effect> keptEaster() {
        return effects.stream().filter(e -> e.name().equals(EASTER) && e.kept()).findFirst();
    }

    public record EasterDate(int year, String date) {
    }

    /**
     * The years that can tell Easter's effect apart ({@code EasterSplits}).
     *
     * @param mostlyEarlier years whose days before Easter fell mostly in March (the first quarter)
     * @param mostlyLater   years whose days before Easter fell mostly in April (the second quarter)
     * @param needed        years of each needed ({@link DecisionRules#MIN_EASTER_YEARS_EACH_MONTH})
     * @param tested        whether there were enough of both, so that the Easter effect was estimated
     * @param months        whether the periods are months (else quarters)
     */
    public record EasterEvidence(List<Integer> mostlyEarlier, List<Integer> mostlyLater, int needed, boolean tested,
                                 boolean months) {

        public EasterEvidence {
            mostlyEarlier = List.copyOf(mostlyEarlier);
            mostlyLater = List.copyOf(mostlyLater);
        }
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
     * @param adjustedChangePct the same in %; null as {@code changePct}. In units (not on logs), the
     *                          latest value less the calendar's difference (to the three significant
     *                          digits the brief prints it with) against a year earlier as counted, as the
     *                          brief's sentence reads; on logs the two ways agree
     * @param calendarPct       how much the calendar's difference moved the change, in %:
     *                          (1 + changePct/100) / (1 + adjustedChangePct/100) − 1, so that the three
     *                          recompute from one another (on logs the latest value's calendar factor
     *                          against a year earlier's); where changes are not in %, the difference's
     *                          part in % of the value the latest period would have had with a year
     *                          earlier's calendar
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
     * @param effectPct what this effect's difference did to the change on a year earlier, in %: the
     *                  change's ratio as counted over its ratio with this effect's part taken out of
     *                  both values, less one (alone among the parts, it equals {@code calendarPct})
     * @param pValue    the effect's p-value (Newey–West)
     */
    public record Part(String name, double effectPct, double pValue) {
    }
}
