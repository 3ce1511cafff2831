package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.annalist.ingest.WorkbookFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code batch FOLDER} takes every file the tool reads, known by content (a workbook, SDMX-CSV, a CSV under
 * another name), skips the others with a note; a spec's {@code measure} and {@code unit} take a series' key.
 */
class BatchFolderFormatsTest {

    @TempDir
    Path folder;

    /** Invented monthly nights of two Quennelmark markets as SDMX-CSV 1.0 (a FREQ, a UNIT and a MARKET dimension). */
    private static String sdmx(int years) {
        StringBuilder text = new StringBuilder("DATAFLOW,FREQ,UNIT,MARKET,TIME_PERIOD,OBS_VALUE\n");
        for (String market : new String[] {"DOM", "BRE"}) {
            for (int i = 0; i < years * 12; i++) {
                double v = (market.equals("DOM") ? 1000 : 300) * (1 + 0.004 * i) * (1 + 0.3 * Math.sin(i * Math.PI / 6));
                text.append(String.format(Locale.ROOT, "QM:NIGHTS(1.0),M,NR,%s,%d-%02d,%.1f%n", market, 2018 + i / 12,
                        i % 12 + 1, v));
            }
        }
        return text.toString();
    }

    @Test
    void everyReadableFileIsBriefedAndTheOthersAreSkippedWithANote() throws IOException {
        Files.write(folder.resolve("passengers.xlsx"), WorkbookFiles.xlsx(false, WorkbookFiles.reference("AirPassengers.csv",
                "Passengers")));
        Files.writeString(folder.resolve("markets.sdmx"), sdmx(6));   // SDMX-CSV under a name that says nothing
        Files.writeString(folder.resolve("notes.md"), "# Notes\nThe survey changed in 2021.\n");
        Files.write(folder.resolve("logo.png"), new byte[] {(byte) 0x89, 'P', 'N', 'G', 13, 10, 26, 10, 0, 0, 0, 13});
        try (var zip = new java.util.zip.ZipOutputStream(Files.newOutputStream(folder.resolve("archive.zip")))) {
            zip.putNextEntry(new java.util.zip.ZipEntry("readme.txt"));
            zip.write("hello".getBytes(java.nio.charset.StandardCharsets.UTF_8));
            zip.closeEntry();
        }
        Files.writeString(folder.resolve(".hidden.csv"), "period,value\n2024-01,1\n");
        Run run = Run.of("batch", folder.toString(), "--jobs", "1");
        assertThat(run.exitCode()).as(run.out() + run.err()).isZero();
        assertThat(run.out()).contains("3 of 3 briefs made")
                .contains("skipped archive.zip: a zip archive but not a workbook")
                .contains("skipped logo.png: binary data, neither text nor a workbook")
                .contains("skipped notes.md: not a table of dates and values (")
                .doesNotContain(".hidden");
        try (var briefs = Files.list(folder.resolve("briefs"))) {
            assertThat(briefs.map(p -> p.getFileName().toString()).sorted()).containsExactly(
                    "markets-bre-2023-12.pdf", "markets-dom-2023-12.pdf", "passengers-passengers-1960-12.pdf");
        }
    }

    @Test
    void aFolderWithNothingReadableIsRefusedNamingWhatWasSkipped() throws IOException {
        Files.writeString(folder.resolve("notes.md"), "# Notes\n");
        Run run = Run.of("batch", folder.toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("no data files in this folder").contains("skipped: notes.md: ");
    }

    @Test
    void aSpecsMeasureAndUnitTakeASeriesKey() throws IOException {
        Files.writeString(folder.resolve("markets.csv"), sdmx(6));
        Files.writeString(folder.resolve("spec.yaml"), """
                briefs:
                  - data: markets.csv
                    series: [DOM, M.NR.BRE]
                    measure: {M.NR.DOM: level, BRE: flow}
                    unit: {DOM: beds, M.NR.BRE: guest nights}
                    output: out/{series}.pdf
                    generated_at: 2026-11-20T08:00:00Z
                """);
        Run run = Run.of("batch", folder.resolve("spec.yaml").toString(), "--jobs", "1");
        assertThat(run.exitCode()).as(run.out() + run.err()).isZero();
        String dom = PdfFacts.of(folder.resolve("out/dom.pdf")).text().replaceAll("\\s+", " ");
        String bre = PdfFacts.of(folder.resolve("out/bre.pdf")).text().replaceAll("\\s+", " ");
        assertThat(dom).contains("(beds)").contains("Each value is a level or stock");
        assertThat(bre).contains("(guest nights)").contains("Each value is a count for its period");
    }
}
