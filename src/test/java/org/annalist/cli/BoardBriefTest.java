package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.annalist.narrative.Formats;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The combined brief of the demo's guest nights by market ({@link DemoBoardBrief}): what its first
 * page and its methods line say of the outlooks and of provisional values comes from each series'
 * findings, which the batch writes beside the brief.
 */
class BoardBriefTest {

    @TempDir
    static Path folder;

    private static String text;
    private static final List<String> PARTS = List.of("domestic", "brevania", "long-haul");

    @BeforeAll
    static void makeTheBoardBrief() throws IOException {
        Path pdf = DemoBoardBrief.makeIn(folder);
        // a hyphen that ends a line is followed by the line break in the extracted text
        text = PdfFacts.of(pdf).text().replace('\u00A0', ' ').replaceAll("\\s+", " ")
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
        assertThat(text).contains("In the recorded values, Domestic, Brevania, Long-haul add up to Total within 0.5 % of it");
        // each market's outlook is made apart from the total's: their sum is its own figure, not the total's
        assertThat(Math.abs(gapPct)).as("the demo's forecasts of the parts miss the total's").isGreaterThan(0.5);
        assertThat(text).contains("Their next-year estimates for 2027 do not add up to Total's within 0.5 %: together about "
                + f.significant(parts).replace('\u00A0', ' ') + ", which is "
                + f.percent(Math.abs(gapPct)).replace('\u00A0', ' ') + (gapPct < 0 ? " below" : " above")
                + " Total's " + totalAsInItsSection(text) + ". Taken together they change by")
                .contains("For the total, quote Total's own estimate");
    }

    /**
     * The parts' growth taken together is stated beside the total's where the two meet, since a reader
     * who adds up the markets' rows finds another growth than the total's row: the sums are derived
     * here from each series' findings (current-year estimate and next-year total).
     */
    @Test
    void theNoteOnThePartsStatesTheirGrowthTogetherBesideTheTotalsAndThatSeparateModelsMakeThem() throws IOException {
        double next = 0;
        double current = 0;
        for (String part : PARTS) {
            next += findings(part).at("/outlook/next_year_total/mean").asDouble();
            current += findings(part).at("/outlook/current_year/estimate/mean").asDouble();
        }
        double partsPct = 100 * (next / current - 1);
        double totalPct = findings("total").at("/outlook/next_year_change/pct").asDouble();
        Formats f = Formats.forValues(new double[] {current}, Locale.ENGLISH);
        assertThat(f.signedPercent(partsPct)).as("the demo's markets grow less together than the total")
                .isNotEqualTo(f.signedPercent(totalPct));
        assertThat(text).contains(("Taken together they change by " + f.signedPercent(partsPct) + " on their estimates for"
                + " 2026, whereas Total's own outlook gives " + f.signedPercent(totalPct) + " on its estimate for 2026: the total"
                + " and each part are"
                + " forecast by separate models").replace('\u00A0', ' '));
        // month by month, from the findings' forecasts of 2027: the parts' sum against the total's
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        JsonNode totals = findings("total").at("/outlook/forecasts");
        for (int k = 0; k < totals.size(); k++) {
            String period = totals.get(k).get("period").asText();
            if (!period.startsWith("2027-")) {
                continue;
            }
            double sum = 0;
            for (String part : PARTS) {
                for (JsonNode p : findings(part).at("/outlook/forecasts")) {
                    sum += p.get("period").asText().equals(period) ? p.get("mean").asDouble() : 0;
                }
            }
            double gap = 100 * (sum / totals.get(k).get("mean").asDouble() - 1);
            low = Math.min(low, gap);
            high = Math.max(high, gap);
        }
        // a month-by-month range is given only when every month lies on one side; with Easter's effect
        // moved to its 2027 date in the markets that have one, March sums above the total's, April below
        assertThat(low).as("some month of 2027 sums below the total's").isNegative();
        assertThat(high).as("and March above it").isPositive();
        assertThat(text).doesNotContain("in each month of 2027 their forecasts sum to");
    }

    /**
     * A next-year change whose 80 % interval holds no change is marked in the table and the note
     * names its interval, so that "−1.0 %" is not read as a fall (intervals from the findings).
     */
    @Test
    void aNextYearChangeWhoseIntervalHoldsNoChangeIsMarkedWithItsInterval() throws IOException {
        List<String> marked = new java.util.ArrayList<>();
        for (String series : List.of("total", "domestic", "brevania", "long-haul")) {
            JsonNode change = findings(series).at("/outlook/next_year_change");
            double lo = change.get("pct_lo80").asDouble();
            double hi = change.get("pct_hi80").asDouble();
            Formats f = Formats.forValues(new double[] {1}, Locale.ENGLISH);
            // the cell's words may be interleaved with its neighbours' in the extracted text: the figure and its mark
            String cell = (f.signedPercent(change.get("pct").asDouble()) + "\u2020").replace('\u00A0', ' ');
            if (lo <= 0 && 0 <= hi) {
                assertThat(text).contains(cell);
                String name = series.equals("long-haul") ? "Long-haul" : Character.toUpperCase(series.charAt(0)) + series.substring(1);
                marked.add((name + " " + f.signedPercent(lo) + " to " + f.signedPercent(hi)).replace('\u00A0', ' '));
            } else {
                assertThat(text).doesNotContain(cell);
            }
        }
        assertThat(marked).as("the demo's Domestic −1.0 % has an interval from below to above zero").isNotEmpty();
        for (String interval : marked) {
            assertThat(text).contains(interval);
        }
        assertThat(text).contains(marked.size() == 1 ? "so it is neither a clear rise nor a clear fall"
                : "so none of them is a clear rise or a clear fall");
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
        String methods = text.replace("Methods ", "");   // the label, wherever it falls inside the cell's text
        assertThat(methods).contains("Outlooks, each made for its series alone:").contains("for Total, Domestic, Brevania and"
                + " Long-haul the average of three methods: exponential smoothing, an ARIMA model and the Theta method, as"
                + " no single method did clearly better than the average in the back-test (clearly:");
        // what "clearly" means is printed beside it (DecisionRules.OUTLOOK_METHOD_ADVANTAGE_PCT, Outlook.choose)
        assertThat(methods).contains("(clearly: its errors over the whole test 50 % or more below the average's, and below"
                + " them in both the earlier and the later half of the test)");
        assertThat(text).doesNotContain("ETS/Theta");
    }

    @Test
    void theReadingGuideExplainsTheIntervalsAndLevelsTheBoardQuotes() {
        String guide = text.substring(text.indexOf("Reading guide"));
        // the captions give 95 % intervals of the breaks' dates and the sections fitted levels (demo-data/README.md)
        assertThat(text).contains("95 % interval").contains("fitted level");
        assertThat(guide).contains("95 % interval The range within which the true value")
                .contains("Fitted level Where the line fitted to the seasonally adjusted series");
    }

    @Test
    void theProvisionalLatestValuesAreSaidOnTheFirstPageAndInEachSection() {
        // the demo file flags September and October 2026 of every series "p"
        assertThat(text).contains("The latest values are provisional and may be revised; so may the figures computed "
                + "from them.");
        // each of the four sections says from when: both flagged months, not only the latest
        assertThat(text.split("The values from September 2026 on are provisional and may be revised\\.", -1)).hasSize(5);
        assertThat(text).doesNotContain("The latest value is provisional");
    }
}
