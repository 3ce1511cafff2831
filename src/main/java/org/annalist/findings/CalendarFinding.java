package org.annalist.findings;

import java.util.List;

/**
 * The findings JSON {@code calendar} block.
 *
 * @param easter  Easter Sunday of every year the series covers
 * @param effects the calendar effects estimated (kept or not; {@code kept} says which count)
 * @param notes   how the calendar of the latest period differs from a year earlier
 */
public record CalendarFinding(List<EasterDate> easter, List<Effect> effects, List<CalendarNote> notes) {

    public CalendarFinding {
        easter = List.copyOf(easter);
        effects = List.copyOf(effects);
        notes = List.copyOf(notes);
    }

    public record EasterDate(int year, String date) {
    }

    /**
     * @param coefficient per whole Easter window in the period, or per extra Friday or Saturday night,
     *                    on the working scale (logs when multiplicative)
     * @param effectPct   the same as a % of the period's value
     */
    public record Effect(String name, double coefficient, double effectPct, double pValue, boolean kept) {
    }
}
