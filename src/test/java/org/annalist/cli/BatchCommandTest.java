package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code annalist batch}: the spec validated before any work, failures isolated, parallel = serial. */
class BatchCommandTest {

    @TempDir
    Path folder;

    private Path spec(String yaml) throws IOException {
        Files.copy(Path.of("demo-data/quennelmark-guest-nights.csv"), folder.resolve("nights.csv"),
                java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        Path spec = folder.resolve("briefs.yaml");
        Files.writeString(spec, yaml);
        return spec;
    }

    private static Run batch(Path spec, String... more) {
        String[] args = new String[2 + more.length];
        args[0] = "batch";
        args[1] = spec.toString();
        System.arraycopy(more, 0, args, 2, more.length);
        return Run.of(args);
    }

    @Test
    void specMistakesAreReportedAtTheirLineAndColumnBeforeAnyWork() throws IOException {
        String[][] cases = {
            {"briefs:\n  - data: nights.csv\n    colour: blue\n", ":3:5: unknown key 'colour'"},
            {"briefs:\n  - data: nights.csv\n    series: {Total: x}\n", ":3:13: series: expected a single value"},
            {"briefs:\n  - data: missing.csv\n", ":2:11: no such file"},
            {"briefs:\n  - data: ../nights.csv\n", ":2:11: data '../nights.csv' leaves the spec's folder"},
            {"briefs:\n  - data: nights.csv\n    paper: a3\n", ":3:12: paper 'a3'; expected a4 or letter"},
            {"briefs:\n  - data: nights.csv\n    horizon: soon\n", ":3:14: horizon 'soon'"},
            {"briefs:\n  - data: nights.csv\n    measure: {Total: heavy}\n", ":3:22: measure of 'Total' is 'heavy'"},
            {"reports: []\n", ":1:1: unknown key 'reports'"},
            {"briefs:\n  - data: nights.csv\n    series: Total\n    combined: true\n", ":4:15: a combined brief needs two"},
            {"briefs:\n  - data: nights.csv\n    series: [Domestic, Brevania]\n    total: Total\n",
                ":4:12: total 'Total' is not one of the series"},
            {"briefs:\n  - data: nights.csv\n    sort_by: size\n", ":3:14: sort_by 'size'"},
            {"briefs:\n  - data: nights.csv\n    logo: nights.csv\n", ":3:11: logo nights.csv is not an image"},
            {"briefs:\n  - data: nights.csv\n    title: [unclosed\n", ":3:21: not valid YAML"},
        };
        for (String[] c : cases) {
            Path spec = spec(c[0]);
            Run run = batch(spec);
            assertThat(run.exitCode()).as(c[0]).isEqualTo(2);
            assertThat(run.err()).as(c[0]).startsWith(spec + c[1]).doesNotContain("Exception");
            try (var files = Files.list(folder)) {
                assertThat(files.filter(p -> p.toString().endsWith(".pdf"))).as("nothing written").isEmpty();
            }
        }
    }

    @Test
    void aBrokenFileFailsItsOwnBriefAndTheOthersAreMade() throws IOException {
        Files.writeString(folder.resolve("broken.csv"), "period,value\n2024-01,12\n2024-02,twelve\n");
        Path spec = spec("""
                briefs:
                  - data: nights.csv
                    series: [Brevania, Nowhere]
                    output: "{series}.pdf"
                    generated_at: 2026-11-20T08:00:00Z
                  - data: broken.csv
                    output: broken.pdf
                """);
        Run run = batch(spec);
        assertThat(run.exitCode()).as(run.err()).isEqualTo(ExitCodes.SOME_FAILED);
        assertThat(folder.resolve("brevania.pdf")).exists();
        assertThat(run.out()).contains("1 of 3 briefs made, 2 failed:");
        assertThat(run.out()).contains("FAILED  briefs.yaml:2 Nowhere  no series named 'Nowhere'");
        assertThat(run.out()).contains("FAILED  briefs.yaml:6 broken.csv").contains("broken.csv:3");
    }

    /**
     * A combined brief compares the series and checks the parts against the declared total: here
     * June 2020's total is 5 % above its parts (synthetic data), and the brief names that month.
     */
    @Test
    void aCombinedBriefComparesTheSeriesAndNamesThePeriodsWhereThePartsMissTheTotal() throws Exception {
        StringBuilder csv = new StringBuilder("period,Total,North,South\n");
        java.util.Random random = new java.util.Random(4);
        for (int t = 0; t < 60; t++) {
            int year = 2018 + t / 12;
            int month = t % 12 + 1;
            long north = Math.round(1000 * (1 + 0.3 * Math.sin(2 * Math.PI * t / 12)) + 30 * random.nextGaussian());
            long south = Math.round(400 * (1 + 0.5 * Math.sin(2 * Math.PI * (t - 2) / 12)) + 20 * random.nextGaussian());
            long total = year == 2020 && month == 6 ? Math.round((north + south) * 1.05) : north + south;
            // March 2021: South not reported, so that month cannot be checked
            String southCell = year == 2021 && month == 3 ? "" : String.valueOf(south);
            csv.append(String.format(java.util.Locale.ROOT, "%d-%02d,%d,%d,%s%n", year, month, total, north, southCell));
        }
        Files.writeString(folder.resolve("regions.csv"), csv);
        Path spec = spec("""
                briefs:
                  - title: Nights by region
                    data: regions.csv
                    series: [Total, North, South]
                    combined: true
                    total: Total
                    sort_by: name
                    output: regions-{period}.pdf
                    generated_at: 2026-11-20T08:00:00Z
                    horizon: 0
                    side_outputs: [findings, charts]
                """);
        Run run = batch(spec);
        assertThat(run.exitCode()).as(run.out() + run.err()).isZero();
        String text = PdfFacts.of(folder.resolve("regions-2022-12.pdf")).text().replace('\u00A0', ' ')
                .replaceAll("\\s+", " ");
        // June 2020: the parts are 1/1.05 of the total, 4.8 % short of it (hand arithmetic); of the 60
        // months, 59 have all three values and were checked
        assertThat(text).contains("The series side by side", "The parts do not add up.",
                "North, South miss Total by more than 0.5 % of it in 1 of the 59 periods where all three have a value: June 2020 (parts ",
                ", \u22124.8 %). Not checked: March 2021 (South missing).");
        Path pdf = folder.resolve("regions-2022-12.pdf");
        assertThat(folder.resolve("regions-2022-12-north.findings.json")).exists();
        assertThat(folder.resolve("regions-2022-12-multiples.svg")).exists();
        String northChart = Files.readString(folder.resolve("regions-2022-12-north-overview.svg"));
        assertThat(northChart).contains("<svg").isNotEqualTo(Files.readString(folder.resolve("regions-2022-12-south-overview.svg")));
        assertThat(org.annalist.render.PdfConformance.violations(pdf, "2u")).isEmpty();
        assertThat(org.annalist.render.PdfConformance.violations(pdf, "ua1")).isEmpty();
        // sorted by name: after the table's heading the rows name North, South, Total first in that order
        assertThat(text).contains("Rows in order of name");
        String table = text.substring(text.indexOf("The series side by side"));
        assertThat(table.indexOf("North")).isLessThan(table.indexOf("South"));
        assertThat(table.indexOf("South")).isLessThan(table.indexOf("Total"));
    }

    /** A logo is printed in the masthead: the one image of a brief whose charts are all vectors. */
    @Test
    void theLogoIsPrintedInTheMasthead() throws Exception {
        java.awt.image.BufferedImage logo = new java.awt.image.BufferedImage(120, 40, java.awt.image.BufferedImage.TYPE_INT_RGB);
        java.awt.Graphics2D g = logo.createGraphics();
        g.setColor(java.awt.Color.DARK_GRAY);
        g.fillRect(0, 0, 120, 40);
        g.dispose();
        javax.imageio.ImageIO.write(logo, "png", folder.resolve("logo.png").toFile());
        Path spec = spec("""
                briefs:
                  - data: nights.csv
                    series: Brevania
                    organisation: Invented Board
                    logo: logo.png
                    output: with-logo.pdf
                    horizon: 0
                    generated_at: 2026-11-20T08:00:00Z
                """);
        Run run = batch(spec);
        assertThat(run.exitCode()).as(run.out() + run.err()).isZero();
        Path pdf = folder.resolve("with-logo.pdf");
        assertThat(PdfFacts.of(pdf).images()).isEqualTo(1);
        assertThat(org.annalist.render.PdfConformance.violations(pdf, "2u")).isEmpty();
        assertThat(org.annalist.render.PdfConformance.violations(pdf, "ua1")).isEmpty();
    }

    /** A ratio the file offers (nights per arrival of a market) can be briefed by its name. */
    @Test
    void aDerivedAverageLengthOfStayIsBriefedByName() throws IOException {
        StringBuilder csv = new StringBuilder("period,Domestic nights,Domestic arrivals\n");
        for (int t = 0; t < 48; t++) {
            long arrivals = Math.round(1000 * (1 + 0.3 * Math.sin(2 * Math.PI * t / 12)));
            csv.append(String.format(java.util.Locale.ROOT, "%d-%02d,%d,%d%n", 2021 + t / 12, t % 12 + 1,
                    Math.round(arrivals * (2.5 + 0.01 * t)), arrivals));
        }
        Files.writeString(folder.resolve("stays.csv"), csv);
        Path spec = spec("""
                briefs:
                  - data: stays.csv
                    series: Domestic average length of stay
                    output: "{series}.pdf"
                    horizon: 0
                """);
        Run run = batch(spec);
        assertThat(run.exitCode()).as(run.out() + run.err()).isZero();
        assertThat(PdfFacts.of(folder.resolve("domestic-average-length-of-stay.pdf")).text())
                .contains("nights per arrival");
    }

    @Test
    void aFolderGetsOneBriefPerSeriesOfEachCsvFile() throws IOException {
        Files.copy(Path.of("demo-data/quennelmark-arrivals.csv"), folder.resolve("arrivals.csv"));
        Files.writeString(folder.resolve("zz-broken.csv"), "period,value\n2024-01,12\n2024-02,twelve\n");
        Run run = Run.of("batch", folder.toString(), "--jobs", "2");
        assertThat(run.exitCode()).as(run.err()).isEqualTo(ExitCodes.SOME_FAILED);
        assertThat(run.out()).contains("4 of 5 briefs made, 1 failed:", "FAILED  zz-broken.csv");
        try (var briefs = Files.list(folder.resolve("briefs"))) {
            assertThat(briefs.map(p -> p.getFileName().toString()).sorted()).containsExactly(
                    "arrivals-brevania-2026-10.pdf", "arrivals-domestic-2026-10.pdf", "arrivals-long-haul-2026-10.pdf",
                    "arrivals-total-2026-10.pdf");
        }
    }

    @Test
    void sideOutputsAreWrittenBesideTheBrief() throws IOException {
        Path spec = spec("""
                briefs:
                  - data: nights.csv
                    series: Brevania
                    output: brevania.pdf
                    horizon: 0
                    side_outputs: [findings, components, charts]
                """);
        Run run = batch(spec);
        assertThat(run.exitCode()).as(run.out() + run.err()).isZero();
        var json = new com.fasterxml.jackson.databind.ObjectMapper().readTree(folder.resolve("brevania.findings.json").toFile());
        assertThat(json.get("schema").asText()).isEqualTo("annalist.findings/1");
        java.util.List<String> rows = Files.readAllLines(folder.resolve("brevania.components.csv"));
        assertThat(rows.get(0)).isEqualTo("period,observed,trend_cycle,seasonal,irregular,seasonally_adjusted");
        assertThat(rows).hasSize(1 + json.get("series").get("observations").asInt());
        // the components multiply (or add) back to the observed value, as the findings' form says
        boolean multiplicative = json.get("transform").asText().equals("log");
        for (String row : rows.subList(1, rows.size())) {
            String[] c = row.split(",", -1);
            if (c[2].isEmpty()) {
                continue;
            }
            double observed = Double.parseDouble(c[1]);
            double rebuilt = multiplicative
                    ? Double.parseDouble(c[2]) * Double.parseDouble(c[3]) * Double.parseDouble(c[4])
                    : Double.parseDouble(c[2]) + Double.parseDouble(c[3]) + Double.parseDouble(c[4]);
            assertThat(rebuilt).as(c[0]).isCloseTo(observed, within(1e-4 * observed));
        }
        assertThat(Files.readString(folder.resolve("brevania-overview.svg"))).contains("<svg").contains("</svg>");
        assertThat(folder.resolve("brevania-outlook.svg")).doesNotExist(); // horizon 0: no outlook chart
    }

    @Test
    void parallelOutputEqualsSerialOutputByteForByte() throws IOException {
        String yaml = """
                briefs:
                  - data: nights.csv
                    series: [Total, Domestic, Brevania]
                    output: "%s/{series}-{period}.pdf"
                    generated_at: 2026-11-20T08:00:00Z
                    horizon: 6
                """;
        Path spec = spec(yaml.formatted("serial") + yaml.substring(yaml.indexOf("  - data")).formatted("parallel"));
        // the same three briefs twice, one set made serially, the other in parallel
        Run serial = batch(spec, "--jobs", "1");
        assertThat(serial.exitCode()).as(serial.out() + serial.err()).isZero();
        Path serialTotal = folder.resolve("serial/total-2026-10.pdf");
        byte[] first = Files.readAllBytes(serialTotal);
        Run parallel = batch(spec, "--jobs", "3");
        assertThat(parallel.exitCode()).isZero();
        for (String name : new String[] {"total", "domestic", "brevania"}) {
            assertThat(Files.readAllBytes(folder.resolve("parallel/" + name + "-2026-10.pdf")))
                    .as(name).isEqualTo(Files.readAllBytes(folder.resolve("serial/" + name + "-2026-10.pdf")));
        }
        assertThat(Files.readAllBytes(serialTotal)).isEqualTo(first);
    }
}
