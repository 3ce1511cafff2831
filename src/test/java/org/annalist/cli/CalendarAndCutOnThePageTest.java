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
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * What the one-series brief of the demo's total guest nights (invented data, demo-data/README.md)
 * says of its calendar analysis and of a cut at an earlier latest period; every figure is read from
 * the findings the same run writes, or counted in the data file.
 */
class CalendarAndCutOnThePageTest {

    private static final Path DATA = Path.of("demo-data/quennelmark-guest-nights.csv");

    @TempDir
    Path folder;

    private String brief(String... extra) throws IOException {
        Path pdf = folder.resolve("total.pdf");
        List<String> args = new java.util.ArrayList<>(List.of("brief", DATA.toString(), "--series", "Total", "-o",
                pdf.toString(), "--generated-at", "2026-11-20T08:00:00Z"));
        args.addAll(List.of(extra));
        Run run = Run.of(args.toArray(String[]::new));
        assertThat(run.exitCode()).as(run.err()).isZero();
        return PdfFacts.of(pdf).text().replace('\u00A0', ' ').replaceAll("\\s+", " ")
                .replaceAll("(\\p{L})- (\\p{L})", "$1-$2");
    }

    private static JsonNode findings(String... extra) {
        List<String> args = new java.util.ArrayList<>(List.of("analyze", DATA.toString(), "--series", "Total",
                "--format", "json"));
        args.addAll(List.of(extra));
        Run run = Run.of(args.toArray(String[]::new));
        assertThat(run.exitCode()).as(run.err()).isZero();
        try {
            return new ObjectMapper().readTree(run.out());
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }

    private static JsonNode effect(JsonNode findings, String name) {
        for (JsonNode e : findings.at("/calendar/effects")) {
            if (e.get("name").asText().equals(name)) {
                return e;
            }
        }
        throw new AssertionError("no effect " + name);
    }

    /**
     * October 2026 has one Friday or Saturday night more than October 2025 (calendar arithmetic);
     * the demo's total was tested for that effect and it is not significant: page 1 says so with its
     * p-value rather than leaving the count unexplained.
     */
    @Test
    void aWeekendNightCountThatDiffersIsSaidWithWhatTheCalendarAnalysisFoundOfIt() throws IOException {
        JsonNode weekend = effect(findings(), "friday_saturday_nights");
        assertThat(weekend.get("kept").asBoolean()).isFalse();
        Formats f = Formats.forValues(new double[0], Locale.ENGLISH);
        assertThat(brief()).contains("October 2026 had 10 Friday and Saturday nights, one more than October 2025; the"
                + " calendar analysis found no significant effect of Friday and Saturday nights on this series ("
                + f.pValue(weekend.get("p_value").asDouble()).replace('\u00A0', ' ')
                + "), so the difference is not allowed for.");
    }

    /**
     * A brief cut at April 2025 says so on its first page, with the number of later months of the
     * file left out, counted here from the file's rows after 2025-04.
     */
    @Test
    void aBriefCutBeforeTheFilesEndSaysSoWithHowManyLaterPeriodsWereLeftOut() throws IOException {
        long later = Files.readAllLines(DATA).stream().skip(1).map(l -> l.substring(0, 7))
                .filter(p -> p.compareTo("2025-04") > 0).count();
        assertThat(later).isEqualTo(18);
        String text = brief("--period", "2025-04");
        assertThat(text).contains("Latest period in this brief: April 2025").contains("Data cut at April 2025 on request: "
                + later + " later months in the file (May 2025 to October 2026) left out.");
        assertThat(brief()).doesNotContain("Data cut at");
    }
}
