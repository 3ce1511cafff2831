package org.annalist.ingest;

import org.annalist.series.Frequency;
import org.annalist.series.Period;

/**
 * A value cut off from the others by more missing periods than the series has values, and by more
 * than ten years, is an error at its line: a mistyped year (2417 for 2017) would otherwise make a
 * series of centuries, nearly all missing, whose latest period is the typo. The values on the side
 * of the widest gap with fewer of them are the stray ones. Our rule (no source).
 */
final class StrayPeriods {

    /** The shortest gap that may be refused, in years: a series with a few years' hole is read as it is. */
    static final int MIN_GAP_YEARS = 10;

    private StrayPeriods() {
    }

    /**
     * @param base   the period index of slot 0
     * @param first  the slot of the first value
     * @param last   the slot of the last value
     * @param stored which slots hold a value
     * @param lines  the line of each slot's value
     * @param columns the column of each slot's value (a sheet's cell), or null when a line says enough
     */
    static void refuse(String name, Frequency frequency, long base, int first, int last, boolean[] stored, int[] lines,
                       int[] columns, ProblemLog log) {
        int count = 0;
        int previous = -1;
        int widest = 0;
        int before = -1;
        int after = -1;
        for (int i = first; i <= last; i++) {
            if (stored[i]) {
                if (previous >= 0 && i - previous - 1 > widest) {
                    widest = i - previous - 1;
                    before = previous;
                    after = i;
                }
                previous = i;
                count++;
            }
        }
        if (widest <= count || widest <= MIN_GAP_YEARS * frequency.periodsPerYear()) {
            return;
        }
        int valuesBefore = 0;
        for (int i = first; i <= before; i++) {
            valuesBefore += stored[i] ? 1 : 0;
        }
        boolean strayBefore = valuesBefore <= count - valuesBefore;
        int stray = strayBefore ? before : after;
        int near = strayBefore ? after : before;
        log.error(lines[stray], columns == null ? 0 : columns[stray], "period " + new Period(frequency, base + stray).label() + " of series '" + name
                + "' is " + widest + " missing periods away from its other values (next: " + new Period(frequency, base + near).label()
                + "), more than the " + count + " values the series holds; expected periods near the others (a mistyped year?)");
    }
}
