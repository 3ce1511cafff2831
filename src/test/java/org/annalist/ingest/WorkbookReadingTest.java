package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.annalist.ingest.WorkbookFiles.Sheet;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * Workbooks written for the purpose ({@link WorkbookFiles}, part by part as the specifications say) read
 * as the same series as the equivalent CSV text, with every problem named by sheet and cell.
 */
class WorkbookReadingTest {

    private static ReadResult read(String name, byte[] bytes) {
        return new SeriesFileReader(ReadOptions.defaults()).read(name, bytes);
    }

    private static ReadResult read(String name, byte[] bytes, ReadOptions options) {
        return new SeriesFileReader(options).read(name, bytes);
    }

    private static Series csvAirPassengers() {
        return Files.read("AirPassengers.csv", Files.resource("/reference/AirPassengers.csv")).series().get(0);
    }

    private static void assertSameSeries(Series read, Series expected) {
        assertThat(read.frequency()).isEqualTo(expected.frequency());
        assertThat(read.start()).isEqualTo(expected.start());
        assertThat(read.values()).containsExactly(expected.values());
    }

    private static List<String> warnings(ReadResult read) {
        return read.warnings().stream().map(DataProblem::toString).toList();
    }

    @Test
    void aReferenceSeriesInAnXlsxAndAnOdsReadsAsItsCsv() {
        // AirPassengers (Box, Jenkins & Reinsel 1976, Series G), as in src/test/resources/reference/
        Series csv = csvAirPassengers();
        ReadResult xlsx = read("AirPassengers.xlsx", WorkbookFiles.xlsx(false, WorkbookFiles.reference("AirPassengers.csv",
                "Passengers")));
        ReadResult ods = read("AirPassengers.ods", WorkbookFiles.ods(WorkbookFiles.reference("AirPassengers.csv",
                "Passengers")));
        assertSameSeries(xlsx.series().get(0), csv);
        assertSameSeries(ods.series().get(0), csv);
        assertThat(xlsx.series().get(0).name()).isEqualTo("AirPassengers");
        assertThat(xlsx.sheet()).contains(new ReadResult.Sheet("xlsx", "Passengers", 1));
        assertThat(ods.sheet()).contains(new ReadResult.Sheet("ods", "Passengers", 1));
        assertThat(xlsx.warnings()).isEmpty();
        assertThat(ods.warnings()).isEmpty();
    }

    @Test
    void everyReferenceSeriesReadsFromXlsxAndOdsAsFromItsCsv() {
        // the public datasets of src/test/resources/reference/ (R 4.2 datasets): monthly, quarterly, annual
        for (String dataset : List.of("AirPassengers.csv", "UKgas.csv", "Nile.csv", "co2.csv", "nottem.csv",
                "sunspot.year.csv")) {
            Series csv = Files.read(dataset, Files.resource("/reference/" + dataset)).series().get(0);
            Sheet sheet = WorkbookFiles.reference(dataset, "Data", dataset.equals("AirPassengers.csv"));
            assertSameSeries(read(dataset + ".xlsx", WorkbookFiles.xlsx(false, sheet)).series().get(0), csv);
            assertSameSeries(read(dataset + ".ods", WorkbookFiles.ods(WorkbookFiles.reference(dataset, "Data")))
                    .series().get(0), csv);
        }
    }

    @Test
    void serialDatesReadInTheWorkbooksDateSystem() {
        // ECMA-376 Part 1 §18.17.4.1: 1900 system, serial 45352 = 2024-03-01; 1904 system (§18.2.28 date1904),
        // the same day is 45352 - 1462 = 43890 (1462 days from 1900-01-00 to 1904-01-01, with the phantom 29 Feb 1900)
        Sheet in1900 = new Sheet("Nights").row("Month", "Nights").row("d:45352", "120").row("d:45383", "130")
                .row("d:45413", "150");
        Sheet in1904 = new Sheet("Nights").row("Month", "Nights").row("d:43890", "120").row("d:43921", "130")
                .row("d:43951", "150");
        for (ReadResult read : List.of(read("a.xlsx", WorkbookFiles.xlsx(false, in1900)),
                read("b.xlsx", WorkbookFiles.xlsx(true, in1904)))) {
            Series s = read.series().get(0);
            assertThat(s.frequency()).isEqualTo(Frequency.MONTHLY);
            assertThat(s.start()).isEqualTo(Period.month(2024, 3));
            assertThat(s.values()).containsExactly(120, 130, 150);
        }
    }

    @Test
    void theYear1900CountsAPhantomLeapDay() {
        // ECMA-376 1st ed. Part 4 §3.17.4.1: serial 59 is 1900-02-28, 60 the non-existent 1900-02-29, 61 is 1900-03-01;
        // 1 is 1900-01-01; in the 1904 system 0 is 1904-01-01
        assertThat(SheetCells.serialDate(1, false).map(SheetCells::date)).contains("1900-01-01");
        assertThat(SheetCells.serialDate(59, false).map(SheetCells::date)).contains("1900-02-28");
        assertThat(SheetCells.serialDate(60, false)).isEmpty();
        assertThat(SheetCells.serialDate(61, false).map(SheetCells::date)).contains("1900-03-01");
        assertThat(SheetCells.serialDate(0, true).map(SheetCells::date)).contains("1904-01-01");
        assertThat(SheetCells.serialDate(45352.5, false).map(SheetCells::date)).contains("2024-03-01 12:00");
    }

    @Test
    void numbersAndDatesStoredAsTextReadAsInACsv() {
        Sheet sheet = new Sheet("Nights").row("Month", "Nights").row("t:2024-01", "t:1200").row("t:Feb 2024", "t:1 300")
                .row("t:2024-03", "1400");
        Series s = read("v.xlsx", WorkbookFiles.xlsx(false, sheet)).series().get(0);
        assertThat(s.start()).isEqualTo(Period.month(2024, 1));
        assertThat(s.values()).containsExactly(1200, 1300, 1400);
    }

    @Test
    void aFractionWithThreeDecimalsStaysAFraction() {
        // 1.234 in a file where no number shows a decimal mark would read as 1,234 with a thousands point
        Sheet sheet = new Sheet("Rates").row("Month", "Rate").row("D:2024-01-01", "1.234").row("D:2024-02-01", "2.5")
                .row("D:2024-03-01", "3");
        assertThat(read("r.xlsx", WorkbookFiles.xlsx(false, sheet)).series().get(0).values()).containsExactly(1.234, 2.5, 3);
        assertThat(read("r.ods", WorkbookFiles.ods(sheet)).series().get(0).values()).containsExactly(1.234, 2.5, 3);
    }

    @Test
    void formulasAreReadByTheirCachedValue() {
        // ECMA-376 Part 1 §18.3.1.40 f and §18.3.1.96 v: v holds the formula's last calculated value
        Sheet sheet = new Sheet("Nights").row("Month", "Nights").row("D:2024-01-01", "100").row("D:2024-02-01", "f:B2*2=200")
                .row("D:2024-03-01", "F:B3*2").row("D:2024-04-01", "300");
        for (ReadResult read : List.of(read("f.xlsx", WorkbookFiles.xlsx(false, sheet)), read("f.ods", WorkbookFiles.ods(sheet)))) {
            assertThat(read.series().get(0).values()).containsExactly(100, 200, Double.NaN, 300);
            assertThat(warnings(read)).anySatisfy(w -> assertThat(w).startsWith(read.file() + ", sheet 'Nights', cell B4: "
                    + "holds a formula without a stored result"));
        }
    }

    @Test
    void errorCellsAreMissingWithAWarningNamingTheCell() {
        // ECMA-376 Part 1 §18.18.11 ST_CellType e; ODF: LibreOffice's calcext:value-type="error"
        Sheet sheet = new Sheet("Nights").row("Month", "Domestic", "Brevania").row("D:2024-01-01", "100", "50")
                .row("D:2024-02-01", "110", "e:#N/A").row("D:2024-03-01", "e:#DIV/0!", "60").row("D:2024-04-01", "120", "70");
        for (String name : List.of("visitors.xlsx", "visitors.ods")) {
            byte[] bytes = name.endsWith("xlsx") ? WorkbookFiles.xlsx(false, sheet) : WorkbookFiles.ods(sheet);
            ReadResult read = read(name, bytes);
            assertThat(read.find("Brevania").orElseThrow().values()).containsExactly(50, Double.NaN, 60, 70);
            assertThat(read.find("Domestic").orElseThrow().values()).containsExactly(100, 110, Double.NaN, 120);
            assertThat(warnings(read)).contains(name + ", sheet 'Nights', cell C3: holds the error #N/A; read as a missing value",
                    name + ", sheet 'Nights', cell B4: holds the error #DIV/0!; read as a missing value");
        }
    }

    @Test
    void mergedHeaderCellsNameEachColumnTheyCover() {
        // ECMA-376 Part 1 §18.3.1.55 mergeCell; ODF 1.2 Part 1 §9.1.5 covered cells: the label is in the top-left cell
        Sheet sheet = new Sheet("Nights").row("Month", "Guest nights", "").row("", "Domestic", "Brevania")
                .row("D:2024-01-01", "100", "50").row("D:2024-02-01", "110", "55").row("D:2024-03-01", "120", "60")
                .merge("A1:A2").merge("B1:C1");
        for (String name : List.of("m.xlsx", "m.ods")) {
            byte[] bytes = name.endsWith("xlsx") ? WorkbookFiles.xlsx(false, sheet) : WorkbookFiles.ods(sheet);
            ReadResult read = read(name, bytes);
            assertThat(read.series().stream().map(Series::name)).containsExactly("Domestic", "Brevania");
            assertThat(read.find("Brevania").orElseThrow().values()).containsExactly(50, 55, 60);
        }
    }

    @Test
    void hiddenRowsAndColumnsAreReadWithAWarning() {
        // ECMA-376 Part 1 §18.3.1.73 row hidden, §18.3.1.13 col hidden; ODF 1.2 Part 1 §9.1.3/§9.1.6 table:visibility
        Sheet sheet = new Sheet("Nights").row("Month", "Domestic", "Brevania").row("D:2024-01-01", "100", "50")
                .row("D:2024-02-01", "110", "55").row("D:2024-03-01", "120", "60").hideRow(3).hideColumn(3);
        for (String name : List.of("h.xlsx", "h.ods")) {
            byte[] bytes = name.endsWith("xlsx") ? WorkbookFiles.xlsx(false, sheet) : WorkbookFiles.ods(sheet);
            ReadResult read = read(name, bytes);
            assertThat(read.find("Brevania").orElseThrow().values()).containsExactly(50, 55, 60);
            assertThat(warnings(read)).contains(name + ", sheet 'Nights', row 3: this row is hidden in the workbook; read "
                    + "like the others", name + ", sheet 'Nights': column C is hidden in the workbook; read like the others");
        }
    }

    @Test
    void theSheetWithATimeSeriesIsChosen() {
        Sheet notes = new Sheet("About").row("Guest nights in Quennelmark").row("Source: the accommodation survey");
        Sheet data = WorkbookFiles.reference("AirPassengers.csv", "Data");
        ReadResult xlsx = read("two.xlsx", WorkbookFiles.xlsx(false, notes, data));
        ReadResult ods = read("two.ods", WorkbookFiles.ods(notes, data));
        assertThat(xlsx.sheet().orElseThrow().name()).isEqualTo("Data");
        assertThat(ods.sheet().orElseThrow().name()).isEqualTo("Data");
        assertSameSeries(ods.series().get(0), csvAirPassengers());
    }

    @Test
    void severalSheetsWithSeriesAreListedAndOneIsChosenByNameOrNumber() {
        Sheet nights = WorkbookFiles.reference("AirPassengers.csv", "Nights");
        Sheet arrivals = WorkbookFiles.reference("Nile.csv", "Arrivals");
        byte[] xlsx = WorkbookFiles.xlsx(false, new Sheet("About").row("text only"), nights, arrivals);
        assertThatThrownBy(() -> read("v.xlsx", xlsx)).isInstanceOf(DataProblemException.class)
                .hasMessage("v.xlsx: several sheets hold a time series: 2 'Nights', 3 'Arrivals'; expected --sheet "
                        + "NAME|NUMBER (sheet: in a spec) to choose one");
        assertThat(read("v.xlsx", xlsx, ReadOptions.defaults().withSheet("arrivals")).series().get(0).frequency())
                .isEqualTo(Frequency.ANNUAL);
        assertThat(read("v.xlsx", xlsx, ReadOptions.defaults().withSheet("2")).series().get(0).frequency())
                .isEqualTo(Frequency.MONTHLY);
        assertThatThrownBy(() -> read("v.xlsx", xlsx, ReadOptions.defaults().withSheet("Stays")))
                .hasMessage("v.xlsx: no sheet named or numbered 'Stays'; expected one of 1 'About', 2 'Nights', 3 'Arrivals'");
        byte[] ods = WorkbookFiles.ods(nights, arrivals);
        assertThatThrownBy(() -> read("v.ods", ods)).hasMessageContaining("several sheets hold a time series: 1 'Nights', "
                + "2 'Arrivals'");
        assertThat(read("v.ods", ods, ReadOptions.defaults().withSheet("Arrivals")).sheet().orElseThrow().number())
                .isEqualTo(2);
    }

    @Test
    void aSheetWithoutATimeColumnIsRefusedByName() {
        Sheet text = new Sheet("Contents").row("Region", "Nights").row("North", "100").row("South", "200");
        assertThatThrownBy(() -> read("v.xlsx", WorkbookFiles.xlsx(false, text))).isInstanceOf(DataProblemException.class)
                .hasMessageStartingWith("v.xlsx, sheet 'Contents', row 1: no column holds dates or periods");
        assertThatThrownBy(() -> read("v.ods", WorkbookFiles.ods(text, new Sheet("Other").row("x"))))
                .hasMessageStartingWith("v.ods: no sheet holds a time series (1 'Contents': no column holds dates or "
                        + "periods; 2 'Other': ");
    }

    @Test
    void aPercentageFormatReadsAsPercent() {
        // ECMA-376 Part 1 §18.8.30: built-in format 10 is 0.00%
        Sheet sheet = new Sheet("Occupancy").row("Month", "Occupancy").row("D:2024-01-01", "p:0.625")
                .row("D:2024-02-01", "p:0.7").row("D:2024-03-01", "p:0.655");
        Series s = read("o.xlsx", WorkbookFiles.xlsx(false, sheet)).series().get(0);
        assertThat(s.values()).containsExactly(62.5, 70, 65.5);
        Series o = read("o.ods", WorkbookFiles.ods(sheet)).series().get(0);
        assertThat(o.values()).containsExactly(62.5, 70, 65.5);
    }

    @Test
    void aTableBelowTitleRowsWithNotesBelowReadsAsInACsv() {
        Sheet sheet = new Sheet("Nights").startingAt(3).row("Guest nights, Quennelmark").row("Month", "Nights")
                .row("D:2024-01-01", "100").row("D:2024-02-01", "110").row("D:2024-03-01", "120")
                .row("Source: accommodation survey");
        ReadResult read = read("t.xlsx", WorkbookFiles.xlsx(false, sheet));
        assertThat(read.series().get(0).values()).containsExactly(100, 110, 120);
        assertThat(warnings(read)).contains("t.xlsx, sheet 'Nights', row 3: row set aside as a title above the header: "
                + "'Guest nights, Quennelmark'", "t.xlsx, sheet 'Nights', row 8: row set aside as a note below the data: "
                + "'Source: accommodation survey'");
    }

    @Test
    void aWorkbookNamedCsvIsReadAsAWorkbookWithANote() {
        ReadResult read = read("nights.csv", WorkbookFiles.xlsx(false, WorkbookFiles.reference("AirPassengers.csv", "S")));
        assertThat(warnings(read)).containsExactly("nights.csv: the file is an xlsx workbook despite its name, and was read as one");
    }

    @Test
    void aPasswordProtectedWorkbookIsRefused() {
        // An encrypted OOXML package is a compound file ([MS-CFB] §2.2 signature) with an EncryptionInfo stream
        // ([MS-OFFCRYPTO] §2.3.4); the directory entry's name is UTF-16LE
        byte[] cfb = new byte[4096];
        System.arraycopy(new byte[] {(byte) 0xD0, (byte) 0xCF, 0x11, (byte) 0xE0, (byte) 0xA1, (byte) 0xB1, 0x1A, (byte) 0xE1},
                0, cfb, 0, 8);
        byte[] name = "EncryptionInfo".getBytes(java.nio.charset.StandardCharsets.UTF_16LE);
        System.arraycopy(name, 0, cfb, 1024, name.length);
        assertThatThrownBy(() -> read("secret.xlsx", cfb)).isInstanceOf(DataProblemException.class)
                .hasMessage("secret.xlsx: is a password-protected (encrypted) workbook, which cannot be read; expected the "
                        + "workbook saved without a password (or its sheet exported as CSV)");
        byte[] xls = java.util.Arrays.copyOf(cfb, 1024);
        assertThatThrownBy(() -> read("old.xls", xls)).hasMessageStartingWith("old.xls: is an older binary workbook (.xls)");
    }

    @Test
    void aDamagedWorkbookIsRefused() {
        byte[] whole = WorkbookFiles.xlsx(false, WorkbookFiles.reference("AirPassengers.csv", "Data"));
        byte[] cut = java.util.Arrays.copyOf(whole, whole.length / 2);
        assertThatThrownBy(() -> read("cut.xlsx", cut)).isInstanceOf(DataProblemException.class)
                .hasMessageStartingWith("cut.xlsx: ");
        java.util.Map<String, byte[]> parts = new java.util.LinkedHashMap<>();
        parts.put("xl/workbook.xml", ("<workbook xmlns:r=\"http://schemas.openxmlformats.org/officeDocument/2006/"
                + "relationships\"><sheets><sheet name=\"Nights\" sheetId=\"1\" r:id=\"rId1\"/></sheets></workbook>").getBytes());
        parts.put("xl/_rels/workbook.xml.rels", ("<Relationships><Relationship Id=\"rId1\" Type=\"http://x/relationships/"
                + "worksheet\" Target=\"worksheets/sheet1.xml\"/></Relationships>").getBytes());
        parts.put("xl/worksheets/sheet1.xml", "<worksheet><sheetData><row r=\"1\"><c r=\"A1\"><v>1</v></c>".getBytes());
        assertThatThrownBy(() -> read("broken.xlsx", WorkbookFiles.zip(parts, false)))
                .hasMessageStartingWith("broken.xlsx, sheet 'Nights': is a damaged workbook (its XML is malformed");
        assertThatThrownBy(() -> read("other.zip", WorkbookFiles.zip(java.util.Map.of("a.txt", new byte[] {1}), false)))
                .hasMessageStartingWith("other.zip: is a zip archive but not a workbook");
    }

    @Test
    void theRowsGoThroughTheCsvLayoutsLongAndTransposed() {
        Sheet longLayout = new Sheet("Long").row("Month", "Market", "Nights").row("D:2024-01-01", "Domestic", "100")
                .row("D:2024-01-01", "Brevania", "50").row("D:2024-02-01", "Domestic", "110")
                .row("D:2024-02-01", "Brevania", "55");
        ReadResult read = read("l.ods", WorkbookFiles.ods(longLayout));
        assertThat(read.layout()).isEqualTo("long");
        assertThat(read.find("Brevania").orElseThrow().values()).containsExactly(50, 55);
        Sheet grid = new Sheet("Grid").row("Year", "Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct",
                "Nov", "Dec").row("2023", "1", "2", "3", "4", "5", "6", "7", "8", "9", "10", "11", "12")
                .row("2024", "13", "14", "15", "", "", "", "", "", "", "", "", "");
        Series s = read("g.xlsx", WorkbookFiles.xlsx(false, grid)).series().get(0);
        assertThat(s.frequency()).isEqualTo(Frequency.MONTHLY);
        assertThat(s.start()).isEqualTo(Period.month(2023, 1));
    }

    @Test
    void aMacroWorkbookIsAnXlsxWithAVbaPart() {
        // ECMA-376 Part 1 / [MS-OFFMACRO]: an .xlsm is an xlsx package with a vbaProject.bin part, which is not run
        java.util.Map<String, byte[]> parts = new java.util.LinkedHashMap<>();
        try (java.util.zip.ZipInputStream in = new java.util.zip.ZipInputStream(new java.io.ByteArrayInputStream(
                WorkbookFiles.xlsx(false, WorkbookFiles.reference("AirPassengers.csv", "Data"))))) {
            for (var e = in.getNextEntry(); e != null; e = in.getNextEntry()) {
                parts.put(e.getName(), in.readAllBytes());
            }
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        parts.put("xl/vbaProject.bin", new byte[] {1, 2, 3});
        ReadResult read = read("macros.xlsm", WorkbookFiles.zip(parts, false));
        assertThat(read.sheet().orElseThrow().format()).isEqualTo("xlsm");
        assertThat(read.warnings()).isEmpty();
    }

    @Test
    void anEncryptedOdsIsRefused() {
        // ODF 1.2 Part 3 §4.8: an encrypted part is listed in the manifest with manifest:encryption-data
        java.util.Map<String, byte[]> parts = new java.util.LinkedHashMap<>();
        parts.put("mimetype", "application/vnd.oasis.opendocument.spreadsheet".getBytes());
        parts.put("META-INF/manifest.xml", ("<manifest:manifest xmlns:manifest=\"urn:oasis:names:tc:opendocument:xmlns:"
                + "manifest:1.0\"><manifest:file-entry manifest:full-path=\"content.xml\"><manifest:encryption-data "
                + "manifest:checksum-type=\"SHA1/1K\"/></manifest:file-entry></manifest:manifest>").getBytes());
        parts.put("content.xml", new byte[] {17, 99, 4, 120});
        assertThatThrownBy(() -> read("locked.ods", WorkbookFiles.zip(parts, true)))
                .hasMessage("locked.ods: is a password-protected (encrypted) workbook, which cannot be read; expected the "
                        + "workbook saved without a password (or its sheet exported as CSV)");
    }

    @Test
    void aHiddenSheetIsNotChosenUnlessNamed() {
        Sheet hidden = WorkbookFiles.reference("Nile.csv", "Old").hidden();
        Sheet shown = WorkbookFiles.reference("AirPassengers.csv", "Current");
        for (String name : List.of("h.xlsx", "h.ods")) {
            byte[] bytes = name.endsWith("xlsx") ? WorkbookFiles.xlsx(false, hidden, shown) : WorkbookFiles.ods(hidden, shown);
            assertThat(read(name, bytes).sheet().orElseThrow().name()).isEqualTo("Current");
            assertThat(read(name, bytes, ReadOptions.defaults().withSheet("Old")).series().get(0).frequency())
                    .isEqualTo(Frequency.ANNUAL);
        }
    }

    @Test
    void aPartThatInflatesPastTheLimitIsRefused() throws java.io.IOException {
        // a "zip bomb": a part far bigger inflated than the package; here 2 MB of zeros against a limit of 1 MB
        byte[] zip = WorkbookFiles.zip(java.util.Map.of("xl/workbook.xml", new byte[2 << 20]), false);
        assertThatThrownBy(() -> ZipParts.of(zip, 1 << 20)).isInstanceOf(ZipParts.TooLarge.class)
                .hasMessage("xl/workbook.xml inflates to more than 1 MB");
        assertThat(ZipParts.inflationLimit(1 << 20)).isEqualTo(100L * (1 << 20) + (64L << 20));
    }
}
