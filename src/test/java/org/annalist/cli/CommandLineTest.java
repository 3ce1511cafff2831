package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CommandLineTest {

    private static final String AIR = "src/test/resources/reference/AirPassengers.csv";

    @TempDir
    Path folder;

    @Test
    void versionAndHelp() {
        Run version = Run.of("--version");
        assertThat(version.exitCode()).isZero();
        assertThat(version.out()).startsWith("annalist ");
        Run help = Run.of("check", "--help");
        assertThat(help.exitCode()).isZero();
        assertThat(help.out()).contains("--format", "--date-order", "--decimal-mark", "--aggregate");
    }

    @Test
    void checkReportsWhatWasRead() {
        Run run = Run.of("check", AIR);
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).contains("series 'AirPassengers'", "monthly, 1949-01 to 1960-12, 144 periods, 0 missing");
    }

    @Test
    void checkJsonIsAnArrayOfSeriesBlocks() throws IOException {
        Run run = Run.of("check", "--format", "json", AIR);
        assertThat(run.exitCode()).isZero();
        JsonNode json = new ObjectMapper().readTree(run.out());
        assertThat(json.isArray()).isTrue();
        JsonNode block = json.get(0);
        assertThat(block.get("name").asText()).isEqualTo("AirPassengers");
        assertThat(block.get("frequency").asText()).isEqualTo("monthly");
        assertThat(block.get("start").asText()).isEqualTo("1949-01");
        assertThat(block.get("end").asText()).isEqualTo("1960-12");
        assertThat(block.get("observations").asInt()).isEqualTo(144);
        assertThat(block.get("missing").isNumber()).isTrue();
        assertThat(block.get("unit").isNull()).isTrue();
    }

    @Test
    void badDataExitsTwoWithLocatedMessagesAndNoStackTrace() throws IOException {
        Path bad = Files.writeString(folder.resolve("bad.csv"), "period,value\n2024-01,1\n2024-02,oops\n");
        Run run = Run.of("check", bad.toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains(bad + ":3:2: 'oops' is not a number");
        assertThat(run.err()).doesNotContain("Exception", "\tat ");
    }

    @Test
    void usageMistakesExitTwo() {
        assertThat(Run.of("check").exitCode()).isEqualTo(2);
        assertThat(Run.of("check", "--format", "xml", AIR).exitCode()).isEqualTo(2);
        assertThat(Run.of("frobnicate").exitCode()).isEqualTo(2);
    }

    @Test
    void briefWritesAPdfWithEmbeddedFontsAndAVectorChart() throws IOException {
        Path pdf = folder.resolve("air.pdf");
        Run run = Run.of("brief", AIR, "-o", pdf.toString(), "--title", "Airline passengers");
        assertThat(run.exitCode()).as(run.err()).isZero();
        PdfFacts facts = PdfFacts.of(pdf);
        assertThat(facts.pages()).isBetween(3, 9);   // 9 with a long back-test table, as BriefDocumentTest allows
        assertThat(facts.unembeddedFonts()).isEmpty();
        assertThat(facts.fonts()).allSatisfy(f -> assertThat(f).contains("DejaVuSans"));
        assertThat(facts.images()).as("the chart is vector, not a picture").isZero();
        // Chart text is real text: its legend and axis years can be found by text extraction.
        assertThat(facts.text()).contains("Airline passengers", "Trend-cycle (2\u00D712 centred moving average)", "1955",
                "Latest periods compared with a year earlier", "Dec 1960", "+6.7");
        assertThat(facts.text()).containsPattern("page\\s*1\\s*of\\s*" + facts.pages());
        assertThat(facts.text()).contains("decisions rest with the reader");
    }

    @Test
    void aFailedBriefLeavesTheEarlierFileAsItWas() throws IOException {
        Path pdf = Files.writeString(folder.resolve("brief.pdf"), "earlier brief");
        Path bad = Files.writeString(folder.resolve("bad.csv"), "period,value\n");
        Run run = Run.of("brief", bad.toString(), "-o", pdf.toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(Files.readString(pdf, StandardCharsets.UTF_8)).isEqualTo("earlier brief");
        try (var left = Files.list(folder)) {
            assertThat(left.map(p -> p.getFileName().toString())).containsExactlyInAnyOrder("brief.pdf", "bad.csv");
        }
    }

    @Test
    void aFileOfSeveralSeriesNeedsSeriesNamed() throws IOException {
        Path two = Files.writeString(folder.resolve("two.csv"), "month,home,abroad\n2024-01,1,2\n2024-02,3,4\n");
        Run run = Run.of("brief", two.toString(), "-o", folder.resolve("x.pdf").toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("holds 2 series", "'home', 'abroad'");
        Run unknown = Run.of("brief", two.toString(), "--series", "elsewhere", "-o", folder.resolve("x.pdf").toString());
        assertThat(unknown.exitCode()).isEqualTo(2);
        assertThat(unknown.err()).contains("no series named 'elsewhere'");
    }

    @Test
    void demoWritesItsBriefs() throws IOException {
        Run run = Run.of("demo", "--data", "demo-data", "--out", folder.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        try (var briefs = Files.list(folder)) {
            assertThat(briefs.map(p -> p.getFileName().toString())).contains("guest-nights-total.pdf",
                    "glassworks-visitors-monthly.pdf", "guest-nights-total-2025-04.pdf",
                    // from demo-data/monthly-briefs.yaml: the board's combined brief and two market briefs
                    "board-2026-10.pdf", "market-brevania-2026-10.pdf", "market-long-haul-2026-10.pdf").hasSize(10);
        }
        assertThat(PdfFacts.of(folder.resolve("guest-nights-total.pdf")).text()).contains("provisional");
        // Easter moved from 31 March 2024 to 20 April 2025: the April brief explains the swing
        assertThat(PdfFacts.of(folder.resolve("guest-nights-total-2025-04.pdf")).text().replaceAll("\\s+", " "))
                .contains("Easter Sunday was on 20 April 2025", "allowing for it, April 2025 was about", "March and April together");
    }
}
