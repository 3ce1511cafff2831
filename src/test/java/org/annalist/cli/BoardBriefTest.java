package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.annalist.narrative.Formats;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The combined brief of the demo's guest nights by market (invented data): what its first page and
 * its methods line say of the outlooks and of provisional values comes from each series' findings,
 * which the batch writes beside the brief.
 */
class BoardBriefTest {

    @TempDir
    static Path folder;

    private static String text;
    private static final List<String> PARTS = List.of("domestic", "brevania", "long-haul");

    @BeforeAll
    static void makeTheBoardBrief() throws IOException {
        Files.copy(Path.of("demo-data/quennelmark-guest-nights.csv"), folder.resolve("nights.csv"));
        Path spec = folder.resolve("briefs.yaml");
        Files.writeString(spec, """
                briefs:
                  - title: Guest nights by market
                    data: nights.csv
                    series: [Total, Domestic, Brevania, Long-haul]
                    combined: true
                    total: Total
                    output: board-{period}.pdf
                    generated_at: 2026-11-20T08:00:00Z
                    side_outputs: [findings]
                """);
        Run run = Run.of("batch", spec.toString());
        assertThat(run.exitCode()).as(run.out() + run.err()).isZero();
        // a hyphen that ends a line is followed by the line break in the extracted text
        text = PdfFacts.of(folder.resolve("board-2026-10.pdf")).text().replace('\u00A0', ' ').replaceAll("\\s+", " ")
                .replaceAll("(\\p{L})- (\\p{L})", "$1-$2");
    }

    private static JsonNode findings(String series) throws IOException {
        return new ObjectMapper().readTree(folder.resolve("board-2026-10-" + series + ".findings.json").toFile());
    }

    @Test
    void theNoteOnThePartsSaysWhetherTheirNextYearEstimatesAddUpAndByHowMuch() throws IOException {
        double total = findings("total").at("/outlook/next_year_total/mean").asDouble();
        double parts = 0;
        for (String part : PARTS) {
            parts += findings(part).at("/outlook/next_year_total/mean").asDouble();
        }
        double gapPct = 100 * (parts / total - 1);
        Formats f = Formats.forValues(new double[] {total}, Locale.ENGLISH);
        assertThat(text).contains("In the recorded values, Domestic, Brevania, Long-haul add up to Total, within 0.5 %");
        // each market's outlook is made apart from the total's: their sum is its own figure, not the total's
        assertThat(Math.abs(gapPct)).as("the demo's forecasts of the parts miss the total's").isGreaterThan(0.5);
        assertThat(text).contains("Their next-year estimates for 2027 do not add up within 0.5 %: together about "
                + f.significant(parts).replace('\u00A0', ' ') + ", which is "
                + f.percent(Math.abs(gapPct)).replace('\u00A0', ' ') + (gapPct < 0 ? " below" : " above")
                + " Total's " + totalAsInItsSection(text) + ". For the total, quote Total's own estimate");
    }

    /** Total's next-year figure as its outlook section on the board prints it (the first outlook sentence). */
    private static String totalAsInItsSection(String text) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("Total In .*?Outlook: the total for 2027 would be about ([0-9,]+)")
                .matcher(text);
        assertThat(m.find()).as("Total's outlook sentence").isTrue();
        return m.group(1);
    }

    @Test
    void theMethodsLineNamesTheOutlookEachSeriesActuallyUsed() throws IOException {
        for (String series : List.of("total", "domestic", "brevania", "long-haul")) {
            JsonNode outlook = findings(series).get("outlook");
            // the demo's four outlooks are all the combination, none beaten in its back-test
            assertThat(outlook.get("method").asText()).isEqualTo("combination");
            assertThat(outlook.get("chosen_because").asText()).contains("no single method did clearly better");
        }
        // the table's "Methods" label, centred beside the longer cell, falls inside the cell's text when extracted
        assertThat(text).contains("Outlooks, each made for its series alone:").contains("for Total, Domestic, Brevania and"
                + " Long-haul the average of three methods: exponential smoothing, an ARIMA model and the Theta method, as"
                + " no single method did clearly better than the average in the back-test.");
        assertThat(text).doesNotContain("ETS/Theta");
    }

    @Test
    void theProvisionalLatestValuesAreSaidOnTheFirstPageAndInEachSection() {
        // the demo file flags September and October 2026 of every series "p"
        assertThat(text).contains("The latest values are provisional and may be revised; so may the figures computed "
                + "from them.");
        assertThat(text.split("The latest value is provisional and may be revised\\.", -1)).hasSize(5);
    }
}
