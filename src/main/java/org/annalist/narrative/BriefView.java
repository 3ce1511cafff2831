package org.annalist.narrative;

import java.util.List;

/**
 * Everything the brief template shows, already worded and formatted: the template arranges, it
 * does not compute.
 *
 * @param language     BCP 47 tag of the narrative, e.g. {@code en}
 * @param latest       the latest period's comparison with a year before, absent when it cannot be made
 * @param facts        the data summary, label and value
 * @param notes        what the reader of the data should know (warnings from reading the file)
 */
public record BriefView(String language, String title, String organisation, String seriesName, String unit,
                        String periodCovered, String latestPeriod, Latest latest, List<Fact> facts,
                        FigureView overview, String smoothingNote, List<Row> recent, List<String> notes,
                        Provenance provenance) {

    public BriefView {
        facts = List.copyOf(facts);
        recent = List.copyOf(recent);
        notes = List.copyOf(notes);
    }

    public record Fact(String label, String value) {
    }

    /**
     * A chart's place on the page: {@code id} matches the drawn chart.
     *
     * @param smoothing the trend-cycle method drawn, empty when none
     */
    public record FigureView(String id, String smoothing) {
    }

    /**
     * @param atPeriod  the latest period as a sentence opens with it: {@code In October 2026}
     * @param direction {@code up}, {@code down} or {@code flat}
     * @param provisional true when the latest value is flagged provisional or estimated
     */
    public record Latest(String atPeriod, String value, String yearEarlierPeriod, String changePercent,
                         String direction, boolean provisional) {
    }

    /** A row of the table of latest periods. */
    public record Row(String period, String value, String yearEarlier, String change, String changePercent,
                      String note) {
    }

    public record Provenance(String file, String sha256, String rowsRead, String reading, String software,
                             String generatedAt) {
    }
}
