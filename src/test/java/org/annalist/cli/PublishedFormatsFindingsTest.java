package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import java.util.stream.Stream;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;

/**
 * A public series (AirPassengers: Box, Jenkins &amp; Reinsel 1976, Series G, as R ships it) written in
 * each statistics-portal format gives the same findings JSON as its CSV, through the real command
 * line; and the portal formats' problems end with exit 2, naming the line or key, with nothing written.
 */
class PublishedFormatsFindingsTest {

    private static final Path CSV = Path.of("src/test/resources/reference/AirPassengers.csv");

    @TempDir
    Path dir;

    private static List<String[]> rows() throws IOException {
        return rows(CSV);
    }

    private static List<String[]> rows(Path csv) throws IOException {
        List<String[]> rows = new ArrayList<>();
        List<String> lines = Files.readAllLines(csv, StandardCharsets.UTF_8);
        for (String line : lines.subList(1, lines.size())) {
            if (!line.isBlank()) {
                rows.add(line.split(","));
            }
        }
        return rows;
    }

    /** SDMX-CSV 1.0 ("Columns": DATAFLOW, dimensions, TIME_PERIOD, OBS_VALUE, attributes). */
    private static String sdmx1(List<String[]> rows) {
        StringBuilder text = new StringBuilder("DATAFLOW,FREQ,INDICATOR,TIME_PERIOD,OBS_VALUE,OBS_STATUS\n");
        rows.forEach(r -> text.append("RBJ:SERIES_G(1.0),").append(r[0].contains("Q") ? "Q" : "M").append(",PAX,").append(r[0]).append(',').append(r[1]).append(",A\n"));
        return text.toString();
    }

    /** SDMX-CSV 2.0 ("Column headers": STRUCTURE, STRUCTURE_ID, ACTION), periods written 1949-M01. */
    private static String sdmx2(List<String[]> rows) {
        StringBuilder text = new StringBuilder("STRUCTURE,STRUCTURE_ID,ACTION,FREQ,TIME_PERIOD,OBS_VALUE\n");
        rows.forEach(r -> text.append("dataflow,RBJ:SERIES_G(1.0),I,").append(r[0].contains("Q") ? "Q," : "M,").append((r[0].contains("Q") ? r[0] : r[0].replace("-", "-M"))).append(',')
                .append(r[1]).append('\n'));
        return text.toString();
    }

    /** The bulk tab layout, periods across written 1949M01 with trailing spaces, newest first. */
    private static String bulk(List<String[]> rows) {
        StringBuilder header = new StringBuilder("freq,indicator\\TIME_PERIOD");
        StringBuilder row = new StringBuilder(rows.get(0)[0].contains("Q") ? "Q,PAX" : "M,PAX");
        for (int i = rows.size() - 1; i >= 0; i--) {
            String period = rows.get(i)[0];
            header.append('\t').append(period.contains("Q") ? period.replace("-", "") : period.replace("-", "M")).append(' ');
            row.append('\t').append(rows.get(i)[1]).append(' ');
        }
        return header + "\n" + row + "\n";
    }

    /** JSON-stat 2.0 ("id", "size", "role", "dimension", "value" as a dense array). */
    private static String jsonStat(List<String[]> rows) {
        StringBuilder times = new StringBuilder();
        StringBuilder values = new StringBuilder();
        for (String[] r : rows) {
            times.append(times.length() == 0 ? "" : ",").append('"').append(r[0]).append('"');
            values.append(values.length() == 0 ? "" : ",").append(r[1]);
        }
        return "{\"version\":\"2.0\",\"class\":\"dataset\",\"label\":\"Series G\",\"id\":[\"indicator\",\"TIME_PERIOD\"],"
                + "\"size\":[1," + rows.size() + "],\"dimension\":{\"indicator\":{\"label\":\"Indicator\",\"category\":"
                + "{\"label\":{\"PAX\":\"Passengers\"}}},\"TIME_PERIOD\":{\"category\":{\"index\":[" + times + "]}}},"
                + "\"value\":[" + values + "]}";
    }

    /** Each format, for AirPassengers (monthly) and UKgas (quarterly; R's datasets, Durbin &amp; Koopman 2001). */
    static Stream<Arguments> formats() {
        return Stream.of("AirPassengers", "UKgas").flatMap(dataset -> Stream.of(
                Arguments.of(dataset, "SDMX-CSV 1.0", "csv", (Function<List<String[]>, String>) PublishedFormatsFindingsTest::sdmx1),
                Arguments.of(dataset, "SDMX-CSV 2.0", "csv", (Function<List<String[]>, String>) PublishedFormatsFindingsTest::sdmx2),
                Arguments.of(dataset, "bulk tab layout", "tsv", (Function<List<String[]>, String>) PublishedFormatsFindingsTest::bulk),
                Arguments.of(dataset, "JSON-stat 2.0", "json", (Function<List<String[]>, String>) PublishedFormatsFindingsTest::jsonStat)));
    }

    @ParameterizedTest(name = "{0} in {1}")
    @MethodSource("formats")
    void aPublicSeriesInEachPortalFormatGivesTheSameFindingsAsItsCsv(String dataset, String format, String extension,
                                                                     Function<List<String[]>, String> writer) throws IOException {
        Path csv = Path.of("src/test/resources/reference/" + dataset + ".csv");
        Path file = dir.resolve(dataset + "." + extension);   // one series takes the file's name, as the CSV's does
        Files.writeString(file, writer.apply(rows(csv)), StandardCharsets.UTF_8);
        Run expected = Run.of("analyze", csv.toString(), "--format", "json");
        Run actual = Run.of("analyze", file.toString(), "--format", "json");
        assertThat(expected.exitCode()).isZero();
        assertThat(actual.err()).isEmpty();
        assertThat(actual.exitCode()).isZero();
        assertThat(actual.out()).isEqualTo(expected.out());
    }

    @Test
    void checkListsTheKeysAndAnalyzeTakesAKeyOrALabel() throws IOException {
        Path file = dir.resolve("nights.csv");
        Files.writeString(file, "DATAFLOW,FREQ,MARKET: Market,TIME_PERIOD,OBS_VALUE\n"
                + "QM:N(1.0),M,DOM: Domestic,2024-01,5\nQM:N(1.0),M,DOM: Domestic,2024-02,6\n"
                + "QM:N(1.0),M,LH: Long-haul,2024-01,1\nQM:N(1.0),M,LH: Long-haul,2024-02,2\n");
        Run check = Run.of("check", file.toString());
        assertThat(check.exitCode()).isZero();
        assertThat(check.out()).contains("SDMX-CSV 1.0 layout").contains("data set: DATAFLOW: QM:N(1.0); FREQ: M")
                .contains("series 'Domestic', key M.DOM").contains("series 'Long-haul', key M.LH");
        assertThat(Run.of("check", file.toString(), "--format", "json").out()).contains("\"key\" : \"M.LH\"");
        for (String asked : List.of("M.LH", "LH", "Long-haul")) {
            Run analyze = Run.of("analyze", file.toString(), "--series", asked, "--format", "json");
            assertThat(analyze.exitCode()).as(asked).isZero();
            assertThat(analyze.out()).as(asked).contains("\"name\" : \"Long-haul\"");
        }
        Run unknown = Run.of("analyze", file.toString(), "--series", "M.XX");
        assertThat(unknown.exitCode()).isEqualTo(2);
        assertThat(unknown.err()).contains("'Domestic' (M.DOM), 'Long-haul' (M.LH)");
    }

    @Test
    void aSpecNamesASeriesOfAPortalFileByItsKey() throws IOException {
        StringBuilder text = new StringBuilder("DATAFLOW,FREQ,INDICATOR,TIME_PERIOD,OBS_VALUE\n");
        for (String[] r : rows()) {
            text.append("RBJ:G(1.0),M,PAX,").append(r[0]).append(',').append(r[1]).append('\n');
            text.append("RBJ:G(1.0),M,HALF,").append(r[0]).append(',').append(Integer.parseInt(r[1]) / 2.0).append('\n');
        }
        Files.writeString(dir.resolve("g.csv"), text.toString());
        Files.writeString(dir.resolve("spec.yaml"), "briefs:\n  - data: g.csv\n    series: [M.HALF]\n"
                + "    output: out/{series}.pdf\n    generated_at: 2026-11-20T08:00:00Z\n    horizon: 0\n");
        Run batch = Run.of("batch", dir.resolve("spec.yaml").toString(), "--jobs", "1");
        assertThat(batch.err()).doesNotContain("Exception");
        assertThat(batch.exitCode()).isZero();
        try (Stream<Path> made = Files.list(dir.resolve("out"))) {
            assertThat(made.map(p -> p.getFileName().toString())).containsExactly("half.pdf");
        }
    }

    @Test
    void aJsonStatWithoutTimeEndsWithExit2NamingTheKeyAndWritesNothing() throws IOException {
        Path file = dir.resolve("markets.json");
        Files.writeString(file, "{\"version\":\"2.0\",\"class\":\"dataset\",\"id\":[\"market\"],\"size\":[2],"
                + "\"dimension\":{\"market\":{\"category\":{\"index\":[\"DOM\",\"LH\"]}}},\"value\":[1,2]}");
        Path pdf = dir.resolve("out.pdf");
        Run run = Run.of("brief", file.toString(), "-o", pdf.toString(), "--generated-at", "2026-11-20T08:00:00Z");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("markets.json").contains("role.time").doesNotContain("Exception").doesNotContain("\tat ");
        assertThat(pdf).doesNotExist();
    }

    @Test
    void anSdmxCsvProblemEndsWithExit2NamingTheLine() throws IOException {
        Path file = dir.resolve("bad.csv");
        Files.writeString(file, "DATAFLOW,TIME_PERIOD,OBS_VALUE\nQM:N(1.0),2024-01,5\nQM:N(1.0),2024-02,five\n");
        Run run = Run.of("check", file.toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("bad.csv:3:3: 'five' is not a number");
    }
}
