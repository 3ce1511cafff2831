package org.annalist.narrative;

import java.util.List;

/**
 * The multi-series brief: a comparison of several series (a total and its markets, say), small
 * multiples on a shared time axis, whether the parts add up to the total, and a compact section
 * per series built from that series' own {@link BriefView}.
 *
 * @param listedOrder    the rows keep the order in which the brief lists the series
 * @param sortedBy       otherwise, the figure they are sorted by, in words
 * @param allProvisional every series' latest value is provisional or estimated
 * @param provisional    otherwise, the series whose latest value is, in words; empty when none is
 * @param outlookMethods each outlook's method and why it was used, series by series ({@link MultiOutlookWords#methods})
 * @param partsForecasts whether the parts' next-year estimates add up to the total's, a sentence; empty
 *                       without a total or without such estimates
 * @param unclearChanges the table's note on next-year changes whose 80 % interval includes no change
 *                       (marked {@link #UNCLEAR_MARK}), with their intervals; empty when there are none
 */
public record MultiBriefView(BriefView.Document document, Header header, List<ComparisonRow> rows, boolean listedOrder,
                             String sortedBy,
                             Consistency consistency, List<BriefView> sections, List<String> notes,
                             BriefView.Provenance provenance, boolean allProvisional, String provisional, String outlookMethods,
                             String partsForecasts, String unclearChanges) {

    /** The mark beside a next-year change in the table whose 80 % interval includes no change. */
    public static final String UNCLEAR_MARK = "\u2020";

    public MultiBriefView {
        rows = List.copyOf(rows);
        sections = List.copyOf(sections);
        notes = List.copyOf(notes);
    }

    public record Header(String title, String organisation, String periodCovered, String latestPeriod,
                         String generatedAt, String seriesList, String logo) {
    }

    /**
     * One row of the comparison table, formatted; a dash where a figure cannot be given.
     *
     * @param nextYear       next year's central estimate, rounded as the series' outlook section prints it
     * @param nextYearChange its change on the current year, e.g. {@code +1.4 % on 2026}, the figure followed by
     *                       {@link #UNCLEAR_MARK} when its 80 % interval includes no change; empty when not given
     */
    public record ComparisonRow(String series, String unit, String latest, String yearOnYear, String yearToDate,
                                String trend, String peak, String breaks, String outliers, String nextYear,
                                String nextYearChange) {
    }

    /**
     * @param checked      a total was declared, so the parts were checked against it
     * @param periods      the periods where they miss it, in words (the first six, then a count)
     * @param anyChecked   at least one period had the total and every part
     * @param complete     every period had them all, so nothing was left unchecked
     * @param checkedCount how many periods were checked, in figures
     * @param allPresent   the condition of a checked period in words: {@code all four have a value}
     * @param gaps         each period where the parts miss the total, with the sum against the total and
     *                     the gap in units and in % (the first six, then a count)
     * @param offCount     how many periods miss the total, in figures
     * @param unchecked    the periods that could not be checked and what was missing there, in words
     */
    public record Consistency(boolean checked, boolean consistent, String total, String parts, String periods,
                              String largestGap, String tolerance, boolean anyChecked, boolean complete,
                              String checkedCount, String allPresent, String gaps, String offCount,
                              String unchecked) {
    }
}
