package org.annalist.findings;

import java.util.Optional;
import org.annalist.series.Period;

/**
 * A large step followed by a movement back the other way (the series fell and rose again, or rose
 * and fell back), read as one event. Nothing here says whether either direction is good.
 *
 * @param start         first period after the step
 * @param rise          the step went up (and the return down); false: it fell and rose again
 * @param before        fitted level just before the step, seasonally adjusted, in the series' units
 * @param extreme       the period where the stepped regime's fitted line lay furthest from {@code before}
 * @param extremeLevel  that level
 * @param returnStart   first period of the regime that moved back, when a later break did; empty
 *                      when the stepped regime's own line moved back
 * @param asOf          the period the return is measured at (end of the regime that moved back)
 * @param returnedLevel the fitted level there: where a later break ends that regime, its line at that
 *                      break (the break's level before), else at {@code asOf}
 * @param returnedShare how much of the step had been undone by {@code asOf} (1 = all)
 */
public record Episode(Period start, boolean rise, double before, Period extreme, double extremeLevel,
                      Optional<Period> returnStart, Period asOf, double returnedLevel, double returnedShare) {

    /** The step from {@code before} to the furthest level, in %. */
    public double stepPct() {
        return 100 * (extremeLevel - before) / Math.abs(before);
    }
}
