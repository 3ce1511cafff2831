package org.annalist.render;

import java.awt.geom.Rectangle2D;
import java.nio.charset.StandardCharsets;
import org.annalist.chart.Figure;
import org.jfree.svg.SVGGraphics2D;

/** A chart as a standalone SVG file, for reuse in slides and web pages. */
public final class SvgCharts {

    /** The brief's chart width (166 mm) at 96 px per inch. */
    public static final int WIDTH = 627;

    private SvgCharts() {
    }

    /** @param height in CSS pixels (the brief's charts are 52–70 mm high: 197–265 px) */
    public static byte[] svg(Figure figure, int height) {
        SVGGraphics2D g = new SVGGraphics2D(WIDTH, height);
        figure.chart().draw(g, new Rectangle2D.Double(0, 0, WIDTH, height));
        return g.getSVGDocument().getBytes(StandardCharsets.UTF_8);
    }
}
