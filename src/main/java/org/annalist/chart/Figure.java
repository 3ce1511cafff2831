package org.annalist.chart;

import java.util.Objects;
import org.jfree.chart.JFreeChart;

/**
 * A chart ready to be placed in the brief.
 *
 * <p>Its words for readers who cannot see it (the PDF's alternative text) are written by the
 * template that places it, with the rest of the narrative.
 *
 * @param id how the page refers to it
 */
public record Figure(String id, JFreeChart chart) {

    public Figure {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(chart, "chart");
    }
}
