package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.annalist.brief.BriefSpec;
import org.annalist.brief.SpecReader;
import org.annalist.ingest.WorkbookFiles;
import org.annalist.ingest.WorkbookFiles.Sheet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Workbooks on the command line: the same findings as the CSV, the sheet chosen, refusals with exit 2 and nothing written. */
class WorkbookCommandsTest {

    private static final String AIR = "src/test/resources/reference/AirPassengers.csv";

    @TempDir
    Path folder;

    private Path write(String name, byte[] bytes) throws IOException {
        return Files.write(folder.resolve(name), bytes);
    }

    @Test
    void aPublicSeriesAsXlsxAndAsOdsGivesTheSameFindingsJsonAsItsCsv() throws IOException {
        // AirPassengers (Box, Jenkins & Reinsel 1976, Series G); the CSV copied beside the workbooks so that
        // every file has the same base name, which names the series; the xlsx stores its months as serial
        // dates, the ods as office:date-value
        Path csv = Files.copy(Path.of(AIR), folder.resolve("AirPassengers.csv"));
        Path xlsx = write("AirPassengers.xlsx", WorkbookFiles.xlsx(false, WorkbookFiles.reference("AirPassengers.csv",
                "Passengers", true)));
        Path ods = write("AirPassengers.ods", WorkbookFiles.ods(WorkbookFiles.reference("AirPassengers.csv", "Passengers")));
        Run fromCsv = Run.of("analyze", "--format", "json", csv.toString());
        Run fromXlsx = Run.of("analyze", "--format", "json", xlsx.toString());
        Run fromOds = Run.of("analyze", "--format", "json", ods.toString());
        assertThat(fromCsv.exitCode()).as(fromCsv.err()).isZero();
        assertThat(fromXlsx.exitCode()).as(fromXlsx.err()).isZero();
        assertThat(fromOds.exitCode()).as(fromOds.err()).isZero();
        assertThat(fromXlsx.out()).isEqualTo(fromCsv.out());
        assertThat(fromOds.out()).isEqualTo(fromCsv.out());
    }

    @Test
    void checkNamesTheSheetAndListsTheSeries() throws IOException {
        Sheet nights = new Sheet("Nights").row("Month", "Domestic", "Brevania").row("D:2024-01-01", "100", "50")
                .row("D:2024-02-01", "110", "e:#N/A").row("D:2024-03-01", "120", "60");
        Path xlsx = write("visitors.xlsx", WorkbookFiles.xlsx(false, new Sheet("About").row("Quennelmark"), nights));
        Run run = Run.of("check", xlsx.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.out()).contains(xlsx + ": 3 data rows, wide layout, sheet 2 'Nights' of an xlsx workbook, "
                        + "periods read as YYYY-MM-DD")
                .contains("series 'Domestic'").contains("series 'Brevania'")
                .contains(xlsx + ", sheet 'Nights', cell C3: holds the error #N/A; read as a missing value");
        Run json = Run.of("check", "--format", "json", xlsx.toString());
        assertThat(json.out().replaceAll("\\s+", "")).contains("\"sheet\":{\"format\":\"xlsx\",\"name\":\"Nights\",\"number\":2}");
    }

    @Test
    void checkInTextAndJsonNamesTheCellOfEachProblem() throws IOException {
        Sheet nights = new Sheet("Nights").row("Guest nights").row("Month", "Domestic").row("2024-01", "100")
                .row("2024-02", "e:#N/A").row("2024-03", "120");
        Path ods = write("visitors.ods", WorkbookFiles.ods(nights));
        Run text = Run.of("check", ods.toString());
        Run json = Run.of("check", "--format", "json", ods.toString());
        assertThat(text.exitCode()).as(text.err()).isZero();
        assertThat(text.out()).contains(ods + ", sheet 'Nights', cell B4: holds the error #N/A; read as a missing value",
                ods + ", sheet 'Nights', row 1: row set aside as a title above the header: 'Guest nights'");
        assertThat(json.out()).contains(ods + ", sheet 'Nights', cell B4: holds the error #N/A; read as a missing value",
                ods + ", sheet 'Nights', row 1: row set aside as a title above the header: 'Guest nights'");
        Path broken = write("broken.xlsx", WorkbookFiles.xlsx(false, new Sheet("Nights").row("Month", "Domestic")
                .row("2024-01", "100").row("2024-01", "110").row("2024-02", "1o0")));
        Run refused = Run.of("check", "--format", "json", broken.toString());
        assertThat(refused.exitCode()).isEqualTo(2);
        assertThat(refused.err()).contains(broken + ", sheet 'Nights', cell B3: period 2024-01 appears again for series "
                + "'Domestic' (first in cell B2)").contains(broken + ", sheet 'Nights', cell B4: '1o0'").doesNotContain("line");
    }

    @Test
    void theSheetOptionChoosesAmongSheetsWithSeries() throws IOException {
        Path xlsx = write("two.xlsx", WorkbookFiles.xlsx(false, WorkbookFiles.reference("AirPassengers.csv", "Nights"),
                WorkbookFiles.reference("Nile.csv", "Flow")));
        Run ambiguous = Run.of("check", xlsx.toString());
        assertThat(ambiguous.exitCode()).isEqualTo(2);
        assertThat(ambiguous.err()).contains("several sheets hold a time series: 1 'Nights', 2 'Flow'")
                .doesNotContain("Exception");
        Run chosen = Run.of("check", "--sheet", "Flow", xlsx.toString());
        assertThat(chosen.exitCode()).as(chosen.err()).isZero();
        assertThat(chosen.out()).contains("sheet 2 'Flow' of an xlsx workbook").contains("annual");
        assertThat(Run.of("check", "--sheet", "1", xlsx.toString()).out()).contains("sheet 1 'Nights'");
    }

    @Test
    void aSpecNamesTheSheet() throws IOException {
        write("two.ods", WorkbookFiles.ods(WorkbookFiles.reference("AirPassengers.csv", "Nights"),
                WorkbookFiles.reference("Nile.csv", "Flow")));
        Path spec = Files.writeString(folder.resolve("briefs.yaml"), "briefs:\n  - data: two.ods\n    sheet: Flow\n");
        BriefSpec read = SpecReader.read(spec);
        assertThat(read.briefs().get(0).job().input().readOptions().sheet()).contains("Flow");
    }

    @Test
    void aProtectedDamagedOrTimelessWorkbookExitsTwoAndWritesNothing() throws IOException {
        byte[] cfb = new byte[2048];   // [MS-CFB] §2.2 signature, and the EncryptionInfo stream of [MS-OFFCRYPTO] §2.3.4
        System.arraycopy(new byte[] {(byte) 0xD0, (byte) 0xCF, 0x11, (byte) 0xE0, (byte) 0xA1, (byte) 0xB1, 0x1A, (byte) 0xE1},
                0, cfb, 0, 8);
        byte[] name = "EncryptionInfo".getBytes(java.nio.charset.StandardCharsets.UTF_16LE);
        System.arraycopy(name, 0, cfb, 1024, name.length);
        byte[] whole = WorkbookFiles.xlsx(false, WorkbookFiles.reference("AirPassengers.csv", "Data"));
        Path out = Files.createDirectories(folder.resolve("out"));
        String[][] cases = {
            {"secret.xlsx", "is a password-protected (encrypted) workbook"},
            {"cut.xlsx", "cut.xlsx: is a damaged workbook"},
            {"regions.ods", "regions.ods, sheet 'Regions', row 1: no column holds dates or periods"},
        };
        write("secret.xlsx", cfb);
        write("cut.xlsx", java.util.Arrays.copyOf(whole, whole.length - 30));
        write("regions.ods", WorkbookFiles.ods(new Sheet("Regions").row("Region", "Nights").row("North", "10")
                .row("South", "20")));
        for (String[] c : cases) {
            Path file = folder.resolve(c[0]);
            Run run = Run.of("brief", file.toString(), "-o", out.resolve("brief.pdf").toString());
            assertThat(run.exitCode()).as(c[0]).isEqualTo(2);
            assertThat(run.err()).as(c[0]).contains(c[1]).doesNotContain("Exception");
            try (Stream<Path> left = Files.list(out)) {
                assertThat(left).as(c[0]).isEmpty();
            }
        }
    }
}
