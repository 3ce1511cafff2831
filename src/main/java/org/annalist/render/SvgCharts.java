package org.annalist.render;

import java.awt.Dimension;
import java.awt.Font;
import java.awt.Graphics;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.io.ByteArrayOutputStream;
import java.util.Locale;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.transform.OutputKeys;
import javax.xml.transform.Transformer;
import javax.xml.transform.TransformerException;
import javax.xml.transform.TransformerFactory;
import javax.xml.transform.dom.DOMSource;
import javax.xml.transform.stream.StreamResult;
import javax.xml.parsers.ParserConfigurationException;
import org.annalist.chart.Figure;
import org.apache.batik.svggen.SVGGeneratorContext;
import org.apache.batik.svggen.SVGGraphics2D;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

/**
 * A chart as a standalone SVG file, for reuse in slides and web pages: drawn through Apache Batik's
 * SVG generator (Apache-2.0), with text as {@code <text>} elements in the brief's named font, so
 * that it can be searched, read aloud and edited; colours and fonts are presentation attributes,
 * which a web page's style sheet may override.
 */
public final class SvgCharts {

    /** The brief's chart width (166 mm) at 96 px per inch. */
    public static final int WIDTH = 627;

    private static final String SVG_NAMESPACE = "http://www.w3.org/2000/svg";

    private SvgCharts() {
    }

    /** @param height in CSS pixels (the brief's charts are 52–70 mm high: 197–265 px) */
    public static byte[] svg(Figure figure, int height) {
        Document document = document();
        SVGGeneratorContext context = SVGGeneratorContext.createDefault(document);
        // no generator comment, and coordinates to a hundredth of a pixel, as the figure is laid out
        context.setComment(null);
        context.setPrecision(2);
        // the root's default font is the brief's, not the JDK's logical "Dialog"
        SVGGeneratorContext.GraphicContextDefaults defaults = new SVGGeneratorContext.GraphicContextDefaults();
        defaults.setFont(new Font(Figure.FONT_FAMILY, Font.PLAIN, 9));
        context.setGraphicContextDefaults(defaults);
        SVGGraphics2D g = new FractionalMetrics(context);
        g.setSVGCanvasSize(new Dimension(WIDTH, height));
        figure.chart().draw(g, new Rectangle2D.Double(0, 0, WIDTH, height));
        Element root = g.getRoot();
        // a viewBox lets a web page or a slide scale the chart without cutting it
        root.setAttributeNS(null, "viewBox", String.format(Locale.ROOT, "0 0 %d %d", WIDTH, height));
        g.dispose();
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try {
            // the JDK's serialiser: compact, UTF-8 (a × stays a character, not an entity)
            Transformer xml = TransformerFactory.newInstance().newTransformer();
            xml.setOutputProperty(OutputKeys.ENCODING, "UTF-8");
            xml.setOutputProperty(OutputKeys.INDENT, "no");
            xml.transform(new DOMSource(root), new StreamResult(bytes));
        } catch (TransformerException e) {
            throw new IllegalStateException("an SVG document in memory could not be written", e);
        }
        return bytes.toByteArray();
    }

    /**
     * The generator measures text for the chart's layout (legend spacing, centred and right-aligned
     * labels) through a {@code FontMetrics} of its own, with whole-pixel advances: at 9 px a legend
     * entry comes out some 7 % wider than a browser sets it. Here those metrics are fractional, as
     * the text is drawn; every graphics the chart derives with {@link #create()} measures the same.
     */
    private static final class FractionalMetrics extends SVGGraphics2D {

        FractionalMetrics(SVGGeneratorContext context) {
            super(context, false);
            fractional();
        }

        private FractionalMetrics(FractionalMetrics parent) {
            super(parent);
            fractional();
        }

        private void fractional() {
            fmg.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
        }

        @Override
        public Graphics create() {
            return new FractionalMetrics(this);
        }
    }

    /** An empty DOM document from the JDK's own XML implementation, which the generator fills. */
    private static Document document() {
        try {
            return DocumentBuilderFactory.newInstance().newDocumentBuilder().getDOMImplementation()
                    .createDocument(SVG_NAMESPACE, "svg", null);
        } catch (ParserConfigurationException e) {
            throw new IllegalStateException("the JDK's XML implementation is not configured", e);
        }
    }
}
