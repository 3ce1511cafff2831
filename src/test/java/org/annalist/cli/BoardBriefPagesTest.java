package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.BasicStroke;
import java.awt.Color;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.annalist.chart.Figure;
import org.annalist.chart.SmallMultiplesChart;
import org.annalist.findings.Analyst;
import org.annalist.findings.Findings;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.series.Series;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The board's brief as the demo makes it ({@link DemoBoardBrief}): every page carries text of its
 * own, the terms it uses are explained in a reading guide, its methods line does not assume the
 * reader holds another document, and its small multiples are described, and drawn, so that they
 * read in greyscale.
 */
class BoardBriefPagesTest {

    @TempDir
    static Path folder;

    private static Path pdf;
    private static String text;

    @BeforeAll
    static void makeTheBoardBrief() throws IOException {
        pdf = DemoBoardBrief.makeIn(folder);
        text = PdfFacts.of(pdf).text().replace('\u00A0', ' ').replaceAll("\\s+", " ");
    }

    @Test
    void noPageHoldsOnlyTheRunningTitleAndTheFooter() throws IOException {
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            for (int page = 1; page <= document.getNumberOfPages(); page++) {
                PDFTextStripper stripper = new PDFTextStripper();
                stripper.setStartPage(page);
                stripper.setEndPage(page);
                List<String> body = new ArrayList<>();
                for (String line : stripper.getText(document).split("\\R")) {
                    // the running title names the organisation; the footer counts the pages
                    if (!line.isBlank() && !line.contains("(invented demo)") && !line.matches(".*page \\d+ of \\d+.*")) {
                        body.add(line);
                    }
                }
                // before: the body's bottom margin spilled onto a sixth page that held nothing else
                assertThat(body).as("page %d of %d", page, document.getNumberOfPages()).isNotEmpty();
            }
        }
    }

    /**
     * Every page but the last is filled to below its middle: a series' section that did not fit
     * whole used to move to the next page, leaving page 2 with the small multiples alone (its
     * lowest line at about 45 % of the page, pdftoppm -r 70 of the demo before the change) and each later
     * page with one series. The 60 % floor is our rule.
     */
    @Test
    void noPageButTheLastEndsInItsUpperHalf() throws IOException {
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            for (int page = 1; page < document.getNumberOfPages(); page++) {
                float height = document.getPage(page - 1).getMediaBox().getHeight();
                float[] lowest = {0};
                PDFTextStripper stripper = new PDFTextStripper() {
                    @Override
                    protected void writeString(String line, List<TextPosition> positions) throws IOException {
                        // the footer sits in the bottom margin (22 mm of 297, brief.css); above it is the body
                        for (TextPosition p : positions) {
                            if (p.getYDirAdj() < height * (1 - 22.0 / 297)) {
                                lowest[0] = Math.max(lowest[0], p.getYDirAdj());
                            }
                        }
                        super.writeString(line, positions);
                    }
                };
                stripper.setStartPage(page);
                stripper.setEndPage(page);
                stripper.getText(document);
                assertThat(lowest[0] / height).as("lowest line of page %d of %d", page, document.getNumberOfPages())
                        .isGreaterThan(0.6f);
            }
        }
    }

    @Test
    void aSeriesChartNamesItsSeriesSoThatItReadsAloneAtThePageTop() {
        for (String name : List.of("Total", "Domestic", "Brevania", "Long-haul")) {
            assertThat(text).contains(name + " (nights), January 2011 to October 2026.");
        }
    }

    @Test
    void theReadingGuideExplainsTheTermsTheBoardBriefUses() {
        int guide = text.indexOf("Reading guide");
        assertThat(guide).as("a reading guide").isPositive();
        String before = text.substring(0, guide);
        String glossary = text.substring(guide, text.indexOf("Data and methods", guide));
        // each term the pages before the guide use, and its entry (worded once, in report-templates/guide.ftlx)
        assertThat(before).contains("p < ").contains("80 % interval").contains("back-tests").contains("Structural changes")
                .contains("Unusual single periods").contains("Trend-cycle");
        assertThat(glossary).contains("p-value The probability of seeing a pattern")
                .contains("Forecast interval The range the outcome should fall in with the stated probability (80 %)")
                .contains("Back-test Forecasting periods already known").contains("Structural change A lasting shift")
                .contains("One-off A single period").contains("Trend-cycle The smooth path");
        // terms the board does not print are left out: no sup-F, no sMAPE, no robust scores
        assertThat(glossary).doesNotContain("sup-F").doesNotContain("sMAPE").doesNotContain("Robust score");
    }

    @Test
    void theMethodsLineSaysHowToGetTheOneSeriesBriefRatherThanAssumingIt() {
        assertThat(text).doesNotContain("As in the one-series brief")
                .contains("Each series is analysed as in a one-series brief, which can be made for any series in the data"
                        + " file and gives every method with its source and settings");
    }

    @Test
    void theSmallMultiplesAreToldApartByLineStyleAndLightnessNotByColourWords() throws IOException {
        assertThat(text).contains("the values as a thin solid line, the trend-cycle as a thick dashed one")
                .doesNotContain("orange").doesNotContain("grey the values");
        List<Series> series = new ArrayList<>();
        List<Findings> findings = new ArrayList<>();
        var file = new SeriesFileReader(ReadOptions.defaults()).read(Path.of("demo-data/quennelmark-guest-nights.csv"));
        for (String name : List.of("Total", "Long-haul")) {
            Series s = file.require(name);
            series.add(s);
            findings.add(new Analyst().withoutOutlook().analyse(s));
        }
        Figure figure = SmallMultiplesChart.of(series, findings);
        for (Object sub : ((CombinedDomainXYPlot) figure.chart().getXYPlot()).getSubplots()) {
            XYPlot plot = (XYPlot) sub;
            BasicStroke values = (BasicStroke) plot.getRenderer().getSeriesStroke(0);
            BasicStroke trend = (BasicStroke) plot.getRenderer().getSeriesStroke(1);
            assertThat(values.getDashArray()).as("the values solid").isNull();
            assertThat(trend.getDashArray()).as("the trend-cycle dashed").isNotNull();
            assertThat(trend.getLineWidth()).as("the trend-cycle thick").isGreaterThanOrEqualTo(3 * values.getLineWidth());
            // and some lightness: the trend-cycle prints darker than the values (WCAG 2.1 relative luminance,
            // which is what a greyscale printer keeps; the width and the dash carry the difference)
            assertThat(luminance((Color) plot.getRenderer().getSeriesPaint(1)))
                    .isLessThan(luminance((Color) plot.getRenderer().getSeriesPaint(0)) - 0.1);
        }
    }

    /** WCAG 2.1 relative luminance: 0.2126 R + 0.7152 G + 0.0722 B of the linearised sRGB channels. */
    private static double luminance(Color c) {
        return 0.2126 * linear(c.getRed()) + 0.7152 * linear(c.getGreen()) + 0.0722 * linear(c.getBlue());
    }

    private static double linear(int channel) {
        double v = channel / 255.0;
        return v <= 0.04045 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }
}
