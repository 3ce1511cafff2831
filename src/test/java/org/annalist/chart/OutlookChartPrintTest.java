package org.annalist.chart;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.annalist.findings.Analyst;
import org.annalist.findings.Findings;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.series.Series;
import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.RectangleEdge;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;

/**
 * The outlook chart of the demo's long-haul market (invented data, demo-data/README.md) at the size
 * the brief prints it (166 × 50 mm, report-templates/brief.css, .outlook .figure object.chart.medium,
 * drawn in CSS pixels as the PDF renderer draws it):
 * its forecast months wide enough for the bands of neighbouring months not to run into one another,
 * the legend's entries apart, and the 95 % band darker than the grid lines it lies over. Before, the
 * fan had about 3 mm a month beside three years of history, the legend's entries stood 2 pt apart, and
 * the 95 % band was the grid's own grey.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class OutlookChartPrintTest {

    /** The chart is drawn in CSS pixels, 96 to the inch (render.PdfRenderer's chart drawer). */
    private static final double PX_PER_MM = 96 / 25.4;
    private static final double PT_PER_PX = 72 / 96.0;
    private static final double WIDTH = 166 * PX_PER_MM;
    private static final double HEIGHT = 50 * PX_PER_MM;
    private static final int SCALE = 4;

    private JFreeChart chart;
    private ChartRenderingInfo info;
    private BufferedImage image;
    private Series longHaul;

    @BeforeAll
    void drawTheLongHaulOutlook() throws IOException {
        longHaul = new SeriesFileReader(ReadOptions.defaults()).read(Path.of("demo-data/quennelmark-guest-nights.csv"))
                .series().stream().filter(s -> s.name().startsWith("Long-haul")).findFirst().orElseThrow();
        Findings findings = new Analyst().analyse(longHaul);
        chart = OutlookChart.of(longHaul, findings.outlook(), new Captions("Observed", "", "Forecast", "Forecast",
                "80 % interval", "95 % interval", "", "", "", "nights")).chart();
        image = new BufferedImage((int) (WIDTH * SCALE), (int) (HEIGHT * SCALE), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, image.getWidth(), image.getHeight());
        g.scale(SCALE, SCALE);
        info = new ChartRenderingInfo();
        chart.draw(g, new Rectangle2D.Double(0, 0, WIDTH, HEIGHT), info);
        g.dispose();
    }

    /** Each forecast month gets at least 3.5 mm of the printed width (derived from the drawn plot area and its axis). */
    @Test
    void eachForecastMonthHasRoomForItsBands() {
        XYPlot plot = chart.getXYPlot();
        Rectangle2D area = info.getPlotInfo().getDataArea();
        double monthMillis = 365.2425 / 12 * 86_400_000.0;
        double start = plot.getDomainAxis().getRange().getLowerBound();
        double perMonth = plot.getDomainAxis().valueToJava2D(start + monthMillis, area, RectangleEdge.BOTTOM)
                - plot.getDomainAxis().valueToJava2D(start, area, RectangleEdge.BOTTOM);
        // our rule (no source): a forecast month gets at least 3.5 mm, against the 3 mm at which the bands
        // of neighbouring months ran into one another on this page
        assertThat(perMonth / PX_PER_MM).as("mm of print per month").isGreaterThanOrEqualTo(3.5);
    }

    /**
     * The legend's four entries (a line or swatch and its words each) stand at least 6 pt apart, twice
     * the gap between an entry's mark and its words, so that no two labels read as one. Measured on
     * the drawn chart: the legend's row, its columns with ink, the gaps between them.
     */
    @Test
    void theLegendsEntriesStandApart() {
        Rectangle2D area = info.getPlotInfo().getDataArea();
        int bottom = (int) (area.getMinY() * SCALE) - 2;
        List<int[]> runs = new ArrayList<>();
        int startRun = -1;
        for (int x = 0; x < image.getWidth(); x++) {
            boolean ink = false;
            for (int y = 0; y < bottom && !ink; y++) {
                Color c = new Color(image.getRGB(x, y));
                ink = c.getRed() + c.getGreen() + c.getBlue() < 3 * 235;
            }
            if (ink && startRun < 0) {
                startRun = x;
            } else if (!ink && startRun >= 0) {
                runs.add(new int[] {startRun, x});
                startRun = -1;
            }
        }
        List<Double> gaps = new ArrayList<>();
        for (int k = 1; k < runs.size(); k++) {
            gaps.add(PT_PER_PX * (runs.get(k)[0] - runs.get(k - 1)[1]) / SCALE);
        }
        gaps.sort(java.util.Comparator.reverseOrder());
        assertThat(gaps).as("gaps in the legend row, pt").hasSizeGreaterThanOrEqualTo(3);
        // the three widest gaps are those between the four entries
        assertThat(gaps.get(2)).as("the narrowest gap between two entries, pt; all gaps " + gaps).isGreaterThanOrEqualTo(6.0);
    }

    /** The 95 % band prints darker than the grid lines (which it covered unseen when both were one grey) and than paper. */
    @Test
    void the95PercentBandIsNotTheGridsGrey() {
        // WCAG 2.1 contrast ratios (OutlookChartGreyTest.contrast); the floors are our rule (no source): 1.1 tells
        // the band from a grid line it covers, 1.55 from paper, as the 80 % band stands from the 95 % one (> 1.5)
        assertThat(OutlookChartGreyTest.contrast(OutlookChart.BAND_95, ChartStyle.GRID)).isGreaterThanOrEqualTo(1.1);
        assertThat(OutlookChartGreyTest.contrast(OutlookChart.BAND_95, Color.WHITE)).isGreaterThanOrEqualTo(1.55);
    }
}
