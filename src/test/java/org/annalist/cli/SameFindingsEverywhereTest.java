package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.annalist.brief.BriefPipeline;
import org.annalist.brief.Reports;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * {@code analyze}, {@code brief} and {@code batch} go through one pipeline: given the same file and
 * the same choices — on the command line or as a spec's keys — they analyse the same series into
 * the same findings, byte for byte in the findings JSON.
 */
class SameFindingsEverywhereTest {

    @TempDir
    Path folder;

    /** Every analysis and reading choice the command line has, each one away from its default. */
    private static final String[] CHOICES = {"--series", "Total", "--form", "multiplicative", "--measure", "level",
        "--horizon", "6", "--per-day", "--period", "2025-12", "--holidays", "holidays.csv", "--date-order", "day-first",
        "--decimal-mark", "point"};

    /** The same choices as a spec's keys. */
    private static final String SPEC = """
            briefs:
              - data: nights.csv
                series: Total
                form: multiplicative
                measure: {Total: level}
                horizon: 6
                per_day: true
                period: 2025-12
                holidays: holidays.csv
                date_order: day-first
                decimal_mark: point
                output: "{series}-{period}.pdf"
                generated_at: 2026-11-20T08:00:00Z
                side_outputs: [findings]
            """;

    private Path inFolder(String name) {
        return folder.resolve(name);
    }

    private void writeInputs() throws IOException {
        Files.copy(Path.of("demo-data/quennelmark-guest-nights.csv"), inFolder("nights.csv"));
        // an invented festival on the second Thursday of May, estimated beside Easter
        Files.writeString(inFolder("holidays.csv"), "date,name\n2022-05-12,Lake festival\n2023-05-11,Lake festival\n"
                + "2024-05-09,Lake festival\n2025-05-08,Lake festival\n");
        Files.writeString(inFolder("briefs.yaml"), SPEC);
    }

    /** The command line's arguments with the files in the test's folder. */
    private String[] commandLine(String command, String... more) {
        String[] args = new String[2 + CHOICES.length + more.length];
        args[0] = command;
        args[1] = inFolder("nights.csv").toString();
        for (int i = 0; i < CHOICES.length; i++) {
            args[2 + i] = CHOICES[i].equals("holidays.csv") ? inFolder("holidays.csv").toString() : CHOICES[i];
        }
        System.arraycopy(more, 0, args, 2 + CHOICES.length, more.length);
        return args;
    }

    @Test
    void analyzeBriefAndBatchFindTheSameWithTheSameChoices() throws IOException {
        writeInputs();

        Run analyze = Run.of(commandLine("analyze", "--format", "json"));
        assertThat(analyze.exitCode()).as(analyze.err()).isZero();
        String analyzed = analyze.out();

        Run batch = Run.of("batch", inFolder("briefs.yaml").toString(), "--jobs", "1");
        assertThat(batch.exitCode()).as(batch.out() + batch.err()).isZero();
        String batched = Files.readString(inFolder("total-2025-12.findings.json"), StandardCharsets.UTF_8);

        // what brief analysed: the brief command's options mapped to its job, through the pipeline
        String[] briefArgs = commandLine("brief", "-o", inFolder("brief.pdf").toString(),
                "--generated-at", "2026-11-20T08:00:00Z");
        CommandLine cli = Main.commandLine();
        cli.parseArgs(briefArgs);
        BriefCommand brief = cli.getSubcommands().get("brief").getCommand();
        List<BriefPipeline.Made> made = new BriefPipeline().briefs(brief.job());
        assertThat(made).hasSize(1);
        assertThat(made.get(0).file()).isEqualTo(inFolder("brief.pdf")).exists();
        String briefed = Reports.json(made.get(0).findings().get(0));

        assertThat(batched).isEqualTo(analyzed);
        assertThat(briefed).isEqualTo(analyzed);
        // and the command itself accepts the same options
        Run briefRun = Run.of(briefArgs);
        assertThat(briefRun.exitCode()).as(briefRun.err()).isZero();
        assertThat(briefRun.out()).contains("(Total)");

        // every choice took effect, so that the equality above is about them and not about defaults
        JsonNode f = new ObjectMapper().readTree(analyzed);
        assertThat(f.get("series").get("unit").asText()).isEqualTo("nights per average month");
        assertThat(f.get("series").get("end").asText()).isEqualTo("2025-12");
        assertThat(f.get("transform").asText()).isEqualTo("log");
        assertThat(f.get("indicators").get("measure").asText()).isEqualTo("level");
        assertThat(f.get("outlook").get("horizon").asInt()).isEqualTo(6);
        assertThat(f.get("calendar").get("effects").findValuesAsText("name")).contains("Lake festival");
        Run plain = Run.of("analyze", inFolder("nights.csv").toString(), "--series", "Total", "--format", "json");
        assertThat(plain.out()).as("the defaults find otherwise").isNotEqualTo(analyzed);
    }
}
