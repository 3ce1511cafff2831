package org.annalist.findings;

import java.util.Optional;
import org.annalist.series.Period;

/**
 * A collapse followed by a recovery: two breaks read as one event.
 *
 * @param start         first period of the collapse
 * @param recovery      first period of the regime after the collapsed one; empty while the series is still in it
 * @param lowPoint      the period where the collapsed regime's fitted level is lowest
 * @param lowValue      that level, seasonally adjusted, in the series' units
 * @param regainedShare how much of the fall the level had regained by then, or by the latest period (1 = all)
 */
public record Episode(Period start, Optional<Period> recovery, Period lowPoint, double lowValue,
                      double regainedShare) {
}
