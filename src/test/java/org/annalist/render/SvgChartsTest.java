package org.annalist.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.Font;
import java.awt.font.FontRenderContext;
import java.io.ByteArrayInputStream;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import javax.xml.parsers.DocumentBuilderFactory;
import org.annalist.chart.ChartStyle;
import org.annalist.chart.Figure;
import org.annalist.findings.FigurePlan;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.Node;
import org.w3c.dom.NodeList;

/**
 * The side-output SVG of a chart: the brief's size, its words as {@code <text>} in the brief's
 * named font (so that a web page or slide can search, read aloud and restyle them), valid XML,
 * the same bytes for the same chart, and a layout measured as the text is set.
 */
class SvgChartsTest {

    private static final int HEIGHT = 265;

    /** Long enough that whole-pixel advances would move its centre by several pixels (10 at 9 px). */
    private static final String TITLE = "Guest nights in an invented region, by month, with their trend-cycle";

    @BeforeAll
    static void style() {
        ChartStyle.install();
    }

    /** An invented chart in the brief's style: a legend of two entries, a rotated axis label, year ticks. */
    private static Figure figure() {
        XYSeries observed = new XYSeries("Observed");
        XYSeries trend = new XYSeries("Trend-cycle (2×12 centred moving average)");
        for (int i = 0; i < 48; i++) {
            observed.add(2020 + i / 12.0, 100_000 + 40_000 * Math.sin(i * Math.PI / 6) + 500 * i);
            trend.add(2020 + i / 12.0, 100_000 + 500 * i);
        }
        XYSeriesCollection data = new XYSeriesCollection(observed);
        data.addSeries(trend);
        JFreeChart chart = ChartFactory.createXYLineChart(TITLE, "year", "nights", data);
        // in the 9 px of the legends and ticks, where whole-pixel advances are some 7 % wider
        chart.getTitle().setFont(new Font(Figure.FONT_FAMILY, Font.PLAIN, 9));
        return new Figure(FigurePlan.Chart.OVERVIEW, chart);
    }

    private static Document parsed(byte[] svg) throws Exception {
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setNamespaceAware(true);
        // the file names the SVG 1.0 DTD; a viewer does not fetch it, and neither does this test
        factory.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return factory.newDocumentBuilder().parse(new ByteArrayInputStream(svg));
    }

    private static List<Element> texts(Document svg) {
        NodeList nodes = svg.getElementsByTagNameNS("http://www.w3.org/2000/svg", "text");
        List<Element> texts = new ArrayList<>();
        for (int i = 0; i < nodes.getLength(); i++) {
            texts.add((Element) nodes.item(i));
        }
        return texts;
    }

    /** A property as in effect on an element: its own (style, then attribute), else its nearest ancestor's. */
    private static String inherited(Element element, String property) {
        for (Node n = element; n instanceof Element e; n = n.getParentNode()) {
            Map<String, String> style = new HashMap<>();
            for (String declaration : e.getAttribute("style").split(";")) {
                String[] pair = declaration.split(":", 2);
                if (pair.length == 2) {
                    style.put(pair[0].trim(), pair[1].trim());
                }
            }
            if (style.containsKey(property)) {
                return style.get(property);
            }
            if (e.hasAttribute(property)) {
                return e.getAttribute(property);   // a presentation attribute, which a page's CSS may override
            }
        }
        return "";
    }

    @Test
    void aChartIsValidSvgOfTheBriefsChartSizeThatScales() throws Exception {
        Element root = parsed(SvgCharts.svg(figure(), HEIGHT)).getDocumentElement();
        assertThat(root.getLocalName()).isEqualTo("svg");
        assertThat(root.getNamespaceURI()).isEqualTo("http://www.w3.org/2000/svg");
        // the sizes JFreeSVG wrote before (627 x 265 CSS px), and a viewBox so that a page can scale it
        assertThat(Double.parseDouble(root.getAttribute("width"))).isEqualTo(SvgCharts.WIDTH);
        assertThat(Double.parseDouble(root.getAttribute("height"))).isEqualTo(HEIGHT);
        assertThat(root.getAttribute("viewBox")).isEqualTo("0 0 627 265");
    }

    @Test
    void everyWordOfTheChartIsTextInTheBriefsNamedFont() throws Exception {
        List<Element> texts = texts(parsed(SvgCharts.svg(figure(), HEIGHT)));
        assertThat(texts).extracting(Node::getTextContent)
                .contains("Observed", "Trend-cycle (2×12 centred moving average)", "nights", "year", "2021.0", "2023.0", TITLE);
        assertThat(texts).allSatisfy(t -> {
            assertThat(inherited(t, "font-family")).as(t.getTextContent()).isEqualTo("'" + Figure.FONT_FAMILY + "'");
            assertThat(inherited(t, "font-size")).as(t.getTextContent()).matches("\\d+(\\.\\d+)?px");
        });
    }

    @Test
    void theSameChartGivesTheSameBytes() {
        // no time-based identifiers: a side output is as reproducible as the brief beside it
        assertThat(SvgCharts.svg(figure(), HEIGHT)).isEqualTo(SvgCharts.svg(figure(), HEIGHT));
    }

    @Test
    void aCentredTitleIsCentredAsTheTextIsSet() throws Exception {
        // the generator measures text through whole-pixel advances unless told otherwise: the title,
        // centred on those widths, would sit several pixels off the middle as a viewer sets it
        Element title = texts(parsed(SvgCharts.svg(figure(), HEIGHT))).stream()
                .filter(t -> t.getTextContent().equals(TITLE)).findFirst().orElseThrow();
        Font font = new Font(Figure.FONT_FAMILY, inherited(title, "font-weight").equals("bold") ? Font.BOLD : Font.PLAIN,
                Integer.parseInt(inherited(title, "font-size").replace("px", "")));
        double width = font.getStringBounds(TITLE, new FontRenderContext(null, true, true)).getWidth();
        double middle = Double.parseDouble(title.getAttribute("x")) + width / 2;
        // JFreeChart rounds a width to whole pixels: half a pixel off the middle at most
        assertThat(middle).isCloseTo(SvgCharts.WIDTH / 2.0, within(0.5));
    }
}
