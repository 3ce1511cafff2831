package org.annalist.findings;

/**
 * A collapse followed by a recovery: two breaks read as one event.
 *
 * @param start         first period of the collapse
 * @param recovery      first period of the regime after the collapsed one (null while the series is still in it)
 * @param lowPoint      the period where the collapsed regime's fitted level is lowest
 * @param lowValue      that level, seasonally adjusted, in the series' units
 * @param regainedShare how much of the fall the level had regained by then, or by the latest period (1 = all)
 * @param recoveryIndex position of {@code recovery}, or -1
 */
public record Episode(String start, String recovery, String lowPoint, double lowValue, double regainedShare,
                      int startIndex, int recoveryIndex, int lowIndex) {
}
