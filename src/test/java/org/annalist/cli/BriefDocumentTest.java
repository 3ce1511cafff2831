package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.annalist.findings.Analyst;
import org.annalist.findings.BreakFinding;
import org.annalist.findings.Findings;
import org.annalist.findings.OutlookFinding;
import org.annalist.findings.OutlookMethod;
import org.annalist.findings.OutlierFinding;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.render.PdfConformance;
import org.annalist.series.Series;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The brief as a document: its statements, its conformance, its reproducibility, its template sandbox. */
class BriefDocumentTest {

    private static final String NIGHTS = "demo-data/quennelmark-guest-nights.csv";
    private static final String TIME = "2026-11-20T08:00:00Z";

    @TempDir
    static Path folder;

    static Path total;
    static PdfFacts totalFacts;
    static Findings totalFindings;

    @BeforeAll
    static void makeTheDemoBrief() throws IOException {
        total = folder.resolve("total.pdf");
        Run run = Run.of("brief", NIGHTS, "--series", "Total", "-o", total.toString(), "--generated-at", TIME,
                "--title", "Guest nights in Quennelmark");
        assertThat(run.exitCode()).as(run.err()).isZero();
        totalFacts = PdfFacts.of(total);
        Series s = new SeriesFileReader(ReadOptions.defaults()).read(Path.of(NIGHTS)).require("Total");
        totalFindings = new Analyst().analyse(s);
    }

    private static String flat(String text) {
        return text.replace('\u00A0', ' ').replaceAll("\\s+", " ");
    }

    @Test
    void everyFindingIsStatedWithItsNumbers() {
        String text = flat(totalFacts.text());
        Findings f = totalFindings;
        // a monthly flow's slope is the change of a month's total each year: never "nights a year" (12 times too small)
        assertThat(text).contains("the series has been increasing, by about 2,120 nights a year in each month's total");
        // and the year's total beside it: 2,120 × 12 = 25,440, three significant digits (derived in the test)
        assertThat(text).contains("about 25,400 nights a year in the year's total");
        assertThat(text.replace("nights a year in each month's total", "").replace("nights a year in the year's total", ""))
                .doesNotContain("nights a year");
        assertThat(text).contains(String.format(java.util.Locale.ROOT, "z = %.2f", f.trend().statistic()));
        assertThat(text).contains("It peaks in August");
        assertThat(text).contains("No cycle longer than a year stands out");
        assertThat(text).contains("The fitted line changed " + f.breaks().size() + " times");
        for (BreakFinding b : f.breaks()) {
            if (b.kind().step()) {
                assertThat(text).contains(String.format(java.util.Locale.ROOT, "%.1f %%", Math.abs(b.changePct())));
            }
        }
        for (OutlierFinding o : f.outliers()) {
            assertThat(text).contains(String.format(java.util.Locale.ROOT, "%,.0f", o.observed()));
        }
        // the demo's planted 2021 fall, as the episode the findings hold
        assertThat(f.episodes()).hasSize(1);
        assertThat(text).contains(String.format(java.util.Locale.ROOT, "The series fell by about %.1f %% in January 2021 "
                + "and has since risen back", Math.abs(f.episodes().get(0).stepPct())));
        assertThat(text).contains("Reading guide", "p-value", "Seasonally adjusted", "Trend-cycle");
        assertThat(text).contains("decisions rest with the reader");
        assertThat(text).contains(f.series().name());
    }

    @Test
    void theAppendixStatesTheSha256OfTheFileRead() throws Exception {
        // the digest computed here from the file's bytes (derived in the test), as the brief must state it
        String sha256 = java.util.HexFormat.of().formatHex(java.security.MessageDigest.getInstance("SHA-256")
                .digest(Files.readAllBytes(Path.of(NIGHTS))));
        assertThat(totalFacts.text().replaceAll("\\s+", "")).contains("SHA-256ofthefile" + sha256);
    }

    /** The outlook page states the findings' forecasts, rounded to three significant digits, and the caution. */
    @Test
    void theOutlookPageStatesTheForecastsTheirAccuracyAndTheCaution() {
        String text = flat(totalFacts.text());
        OutlookFinding o = totalFindings.outlook();
        assertThat(text).contains("Outlook", "If the pattern of the past continues, the total for " + o.nextYear());
        assertThat(text).contains(String.format(java.util.Locale.ROOT,
                "forecasts up to one year ahead were typically within \u00B1%.1f %%", o.typicalErrorPct()));
        // the back-test names its span; the current year is observed plus forecast; every forecast
        // period is printed and no file the printed reader lacks is named
        assertThat(text).contains("In back-tests on this series (forecasts of each period from ");
        if (o.currentYear() != null && o.currentYear().forecastPeriods() > 0) {
            assertThat(text).contains("The total for " + o.currentYear().year() + " is estimated at ");
        }
        assertThat(text).contains(o.intervalsWidened() ? "widened to match the errors of forecasts" : "Outlook");
        assertThat(text).doesNotContain("findings file");
        for (OutlookFinding.Point p : o.forecasts()) {
            assertThat(text).contains(roundedToThree(p.mean()));
        }
        assertThat(text).contains(roundedToThree(o.forecasts().get(0).mean()));
        assertThat(text).contains("Forecasts are estimates, not promises");
        assertThat(text).contains(o.method() == OutlookMethod.ETS ? "exponential smoothing" : o.method().code());
    }

    /** As the brief rounds forecasts: three significant digits, grouped ({@code 77,700}). */
    private static String roundedToThree(double v) {
        double magnitude = Math.pow(10, Math.floor(Math.log10(Math.abs(v))) - 2);
        return String.format(java.util.Locale.ROOT, "%,.0f", Math.round(v / magnitude) * magnitude);
    }

    /**
     * The caveat on revisions names every provisional value, not only the latest: the demo's file
     * flags its last months provisional (demo-data/README.md), and the caveat starts where the run of
     * flagged values that ends the series starts (derived in the test from the flags as read).
     */
    @Test
    void theRevisionCaveatStartsAtTheFirstOfTheProvisionalValuesThatEndTheSeries() throws IOException {
        Series s = new SeriesFileReader(ReadOptions.defaults()).read(Path.of(NIGHTS)).require("Total");
        int first = s.size();
        while (first > 0 && s.flags(first - 1).contains(org.annalist.series.ValueFlag.PROVISIONAL)) {
            first--;
        }
        assertThat(s.size() - first).as("the demo ends in more than one provisional value").isGreaterThan(1);
        String month = s.period(first).toString();   // ISO, e.g. 2026-09
        String said = java.time.YearMonth.parse(month).format(java.time.format.DateTimeFormatter.ofPattern("MMMM yyyy",
                java.util.Locale.ENGLISH));
        assertThat(flat(totalFacts.text())).contains("The values from " + said + " on are provisional and may be revised.")
                .doesNotContain("The latest value is provisional");
    }

    @Test
    void fontsAreEmbeddedAndChartsAreVectors() {
        assertThat(totalFacts.unembeddedFonts()).isEmpty();
        assertThat(totalFacts.images()).isZero();
        assertThat(totalFacts.pages()).isBetween(4, 9);   // the appendix lists every rule in force (issue 14 added the claims, measure and outlook rules)
    }

    @Test
    void theDemoBriefIsPdfA2uAndPdfUa1() throws Exception {
        assertThat(PdfConformance.violations(total, "2u")).isEmpty();
        assertThat(PdfConformance.violations(total, "ua1")).isEmpty();
    }

    @Test
    void briefsOfOtherLayoutsConformToo() throws Exception {
        // annual (Nile), quarterly (UKgas), and daily data aggregated to months, on US Letter
        for (String[] c : List.of(new String[] {"src/test/resources/reference/Nile.csv"},
                new String[] {"src/test/resources/reference/UKgas.csv", "--paper", "letter"},
                new String[] {"demo-data/glassworks-daily-visitors.csv", "--aggregate", "month"})) {
            Path pdf = folder.resolve(Path.of(c[0]).getFileName() + ".pdf");
            String[] args = new String[c.length + 5];
            args[0] = "brief";
            System.arraycopy(c, 0, args, 1, c.length);
            args[c.length + 1] = "-o";
            args[c.length + 2] = pdf.toString();
            args[c.length + 3] = "--generated-at";
            args[c.length + 4] = TIME;
            Run run = Run.of(args);
            assertThat(run.exitCode()).as(run.err()).isZero();
            assertThat(PdfConformance.violations(pdf, "2u")).as(c[0]).isEmpty();
            assertThat(PdfConformance.violations(pdf, "ua1")).as(c[0]).isEmpty();
        }
    }

    @Test
    void twoRendersOfTheSameInputAreByteIdentical() throws IOException {
        Path again = folder.resolve("again.pdf");
        Run run = Run.of("brief", NIGHTS, "--series", "Total", "-o", again.toString(), "--generated-at", TIME,
                "--title", "Guest nights in Quennelmark");
        assertThat(run.exitCode()).isZero();
        assertThat(Files.readAllBytes(again)).isEqualTo(Files.readAllBytes(total));
    }

    @Test
    void aTemplateThatTriesToRunJavaIsRefused() throws IOException {
        Path templates = Files.createDirectories(folder.resolve("evil"));
        Files.writeString(templates.resolve("brief.ftlx"),
                "<html>\n<#assign run = \"freemarker.template.utility.Execute\"?new()>${run(\"id\")}</html>\n");
        Run run = Run.of("brief", "src/test/resources/reference/Nile.csv", "-o", folder.resolve("evil.pdf").toString(),
                "--templates", templates.toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("brief.ftlx:2:").doesNotContain("uid=");
        assertThat(folder.resolve("evil.pdf")).doesNotExist();
    }

    @Test
    void aTemplateCannotReachOutsideItsFolder() throws IOException {
        Path templates = Files.createDirectories(folder.resolve("escape/templates"));
        Files.writeString(folder.resolve("escape/secret.ftl"), "SECRET");
        Files.writeString(templates.resolve("brief.ftlx"), "<html><#include \"../secret.ftl\"></html>\n");
        Run run = Run.of("brief", "src/test/resources/reference/Nile.csv", "-o", folder.resolve("escape.pdf").toString(),
                "--templates", templates.toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("brief.ftlx:1:");
    }

    @Test
    void charactersOutsideTheFontRenderAndWarn() throws IOException {
        Path csv = folder.resolve("cjk.csv");
        Files.writeString(csv, "month,\u6e38\u5ba2 nights\n" + String.join("\n",
                java.util.stream.IntStream.range(0, 40).mapToObj(i -> String.format(java.util.Locale.ROOT,
                        "%d-%02d,%d", 2020 + i / 12, i % 12 + 1, 100 + (i % 12) * 10 + i)).toList()) + "\n",
                StandardCharsets.UTF_8);
        Path pdf = folder.resolve("cjk.pdf");
        Run run = Run.of("brief", csv.toString(), "-o", pdf.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.err()).contains("warning: the brief's font has no glyph for '\u6e38' (U+6E38)");
        assertThat(PdfFacts.of(pdf).text()).contains("no glyph for");
    }
}
