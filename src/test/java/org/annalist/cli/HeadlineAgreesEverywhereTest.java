package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.StreamSupport;
import org.annalist.narrative.Formats;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The same data give the same claims in the findings JSON, in {@code analyze}'s notes and on the
 * brief's first page: the lead, the key figures and the JSON agree on the sign of the latest change
 * and of the trend the page states, and the notes list the JSON's claims one for one.
 */
class HeadlineAgreesEverywhereTest {

    @TempDir
    Path folder;

    private static final Formats F = Formats.forValues(new double[] {1}, Locale.ENGLISH);

    private static String flat(String text) {
        return text.replace('\u00A0', ' ').replaceAll("\\s+", " ");
    }

    private static JsonNode claim(JsonNode statements, String quantity) {
        return StreamSupport.stream(statements.spliterator(), false)
                .filter(c -> c.get("quantity").asText().equals(quantity)).findFirst().orElse(null);
    }

    private static String sign(JsonNode c) {
        return c.get("direction").asText().equals("increasing") ? "+" : "\u2212";
    }

    @ParameterizedTest
    @CsvSource({"demo-data/quennelmark-guest-nights.csv, Total", "demo-data/quennelmark-guest-nights.csv, Long-haul",
        "src/test/resources/reference/AirPassengers.csv, ''"})
    void theLeadTheKeyFiguresTheNotesAndTheJsonClaimsAgree(String file, String series) throws IOException {
        List<String> choice = series == null || series.isEmpty() ? List.of() : List.of("--series", series);
        JsonNode json = new ObjectMapper().readTree(run("analyze", file, choice, "--format", "json").out());
        String notes = flat(run("analyze", file, choice).out()).replace(" claim: ", "\nclaim: ");
        Path pdf = folder.resolve("brief.pdf");
        run("brief", file, choice, "-o", pdf.toString(), "--generated-at", "2026-11-20T08:00:00Z");
        String text = flat(PdfFacts.of(pdf).text());
        JsonNode statements = json.get("claims").get("statements");

        // the latest change: the lead's "more"/"less" and the first tile's sign are the claim's
        JsonNode latest = claim(statements, "latest_calendar_adjusted");
        latest = latest == null ? claim(statements, "latest_vs_year_earlier") : latest;
        assertThat(latest).as("a latest change is claimed").isNotNull();
        String size = F.fixed(Math.abs(latest.get("size").asDouble()), 1) + " %";
        assertThat(text).contains(size + (latest.get("direction").asText().equals("increasing") ? " more than in"
                : " less than in"));
        assertThat(text).contains(sign(latest) + size + " on a year earlier");
        assertThat(notes).contains(sign(latest) + size);

        // the trend of the first page: since the latest break when there is one, and the tile shows its slope
        JsonNode since = claim(statements, "trend_since_break");
        JsonNode trend = since != null ? since : claim(statements, "trend_whole");
        if (trend != null && !trend.get("status").asText().equals("withheld")
                && !trend.get("direction").asText().equals("none")) {
            String verb = trend.get("direction").asText().equals("increasing") ? "rising" : "falling";
            // a monthly flow's slope in units is the change of a month's total each year, and says so everywhere
            assertThat(json.at("/series/frequency").asText() + " " + json.at("/series/measure").asText())
                    .isEqualTo("monthly flow");
            String unit = json.at("/series/unit").asText("");
            String slope = trend.get("unit").asText().equals("percent_per_year")
                    ? F.fixed(Math.abs(trend.get("size").asDouble()), 1) + " % a year"
                    : F.significant(Math.abs(trend.get("size").asDouble())) + (unit.isEmpty() ? "" : " " + unit)
                    + " a year in each month's total";
            if (since != null) {
                Period from = Period.month(Integer.parseInt(since.get("from").asText().substring(0, 4)),
                        Integer.parseInt(since.get("from").asText().substring(5, 7)));
                assertThat(from.frequency()).isEqualTo(Frequency.MONTHLY);
                // a start dated no closer than a year is "about" its month, with the interval, in the lead and the tile
                boolean about = false;
                for (JsonNode q : since.path("qualifications")) {
                    about |= q.path("reason").asText().equals("start_uncertain");
                }
                assertThat(text).contains("Since " + (about ? "about " : "") + F.period(from)
                        + (about ? " (the change may have begun between " : " the level has been " + verb));
                assertThat(text).contains((about ? ") the level has been " : " the level has been ") + verb);
                assertThat(text).contains("since " + (about ? "about " : "") + F.period(from) + ";");
                // the whole period's trend is not the first page's
                assertThat(text).doesNotContain("The underlying trend has been");
            } else {
                assertThat(text).containsIgnoringCase("the underlying trend has been " + verb);
            }
            assertThat(text).contains(sign(trend) + slope);
            assertThat(notes).contains(sign(trend) + (trend.get("unit").asText().equals("percent_per_year")
                    ? slope.replace(" a year", " of the average level a year") : slope));
        }

        // the year so far is one figure: the first page's total is the outlook page's observed part
        java.util.regex.Matcher soFar = java.util.regex.Pattern.compile("the total was ([0-9,]+)").matcher(text);
        java.util.regex.Matcher observedPart = java.util.regex.Pattern.compile("is estimated at [^:]+: ([0-9,]+)")
                .matcher(text);
        if (soFar.find() && observedPart.find()) {
            assertThat(observedPart.group(1)).isEqualTo(soFar.group(1));
        }

        // the notes carry the JSON's claims, one line each, with the same direction
        List<String> lines = new ArrayList<>();
        notes.lines().filter(l -> l.startsWith("claim:")).forEach(lines::add);
        assertThat(lines).hasSize(statements.size());
        for (int i = 0; i < lines.size(); i++) {
            JsonNode c = statements.get(i);
            String span = c.get("from").asText().equals(c.get("to").asText()) ? c.get("from").asText()
                    : c.get("from").asText() + " to " + c.get("to").asText();   // one period is named once
            assertThat(lines.get(i)).contains(c.get("quantity").asText() + " " + span + ": " + c.get("direction").asText() + ",");
        }
        assertThat(json.get("claims").get("headline").get("quantity").asText()).isNotEmpty();
    }

    private static Run run(String command, String file, List<String> choice, String... more) {
        List<String> args = new ArrayList<>(List.of(command, file));
        args.addAll(choice);
        args.addAll(List.of(more));
        Run run = Run.of(args.toArray(String[]::new));
        assertThat(run.exitCode()).as(run.err()).isZero();
        return run;
    }
}
