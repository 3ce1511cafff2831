package org.annalist.chart;

import java.util.Objects;
import java.util.OptionalInt;
import org.annalist.findings.FigurePlan;
import org.jfree.chart.JFreeChart;

/**
 * A chart ready to be placed in the brief.
 *
 * <p>Its words for readers who cannot see it (the PDF's alternative text) are written by the
 * template that places it, with the rest of the narrative.
 *
 * @param kind   which of the brief's charts it is
 * @param series for a chart of one series in a multi-series brief, that series' position
 */
public record Figure(FigurePlan.Chart kind, OptionalInt series, JFreeChart chart) {

    /**
     * The font family figures are drawn in. The PDF renderer registers the brief's font under this
     * name (with AWT and with the layout engine), so that chart text is embedded as real text.
     */
    public static final String FONT_FAMILY = "DejaVu Sans";

    public Figure {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(series, "series");
        Objects.requireNonNull(chart, "chart");
    }

    public Figure(FigurePlan.Chart kind, JFreeChart chart) {
        this(kind, OptionalInt.empty(), chart);
    }

    /** How the page places it: {@code overview}, or {@code overview-2} for the third series' overview. */
    public String id() {
        return kind.id() + (series.isPresent() ? "-" + series.getAsInt() : "");
    }

    /** The same chart as the one of the series at {@code position} of a multi-series brief. */
    public Figure ofSeries(int position) {
        return new Figure(kind, OptionalInt.of(position), chart);
    }
}
