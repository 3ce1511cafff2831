package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Workbooks saved by a real spreadsheet program (LibreOffice Calc 7.4, src/test/resources/spreadsheets/README.md),
 * not written by our own test code, give the same findings JSON as the public CSV they were made from
 * (AirPassengers: Box, Jenkins &amp; Reinsel 1976, Series G; UKgas: Durbin &amp; Koopman 2001; nottem:
 * Anderson 1976, Series R; as R's datasets package ships them), one of them with its months stored as
 * serial numbers with a date style.
 */
class SpreadsheetProgramWorkbooksTest {

    @TempDir
    Path dir;

    @ParameterizedTest(name = "{0}.{1}")
    @CsvSource({"AirPassengers, xlsx", "AirPassengers, ods", "UKgas, xlsx", "UKgas, ods", "nottem, xlsx", "nottem, ods"})
    void aWorkbookSavedByCalcGivesTheFindingsOfItsCsv(String dataset, String format) throws IOException {
        // copied into one folder so that the two files differ in nothing but their format
        Path csv = Files.copy(Path.of("src/test/resources/reference/" + dataset + ".csv"), dir.resolve(dataset + ".csv"));
        Path book = Files.copy(Path.of("src/test/resources/spreadsheets/" + dataset + "." + format),
                dir.resolve(dataset + "." + format));
        Run fromCsv = Run.of("analyze", "--format", "json", csv.toString());
        Run fromBook = Run.of("analyze", "--format", "json", book.toString());
        assertThat(fromCsv.exitCode()).as(fromCsv.err()).isZero();
        assertThat(fromBook.exitCode()).as(fromBook.err()).isZero();
        assertThat(fromBook.out()).isEqualTo(fromCsv.out());
        assertThat(fromBook.err()).as("no reading warnings").isEqualTo(fromCsv.err());
    }

    @org.junit.jupiter.api.Test
    void calcStoredNottemsMonthsAsSerialNumbersWithADateStyle() throws IOException {
        // ECMA-376 Part 1 §18.3.1.4 (c: s the style, t="n" a number) and §18.8.30 (numFmt): 7306 is 1920-01-01
        try (var zip = new java.util.zip.ZipFile("src/test/resources/spreadsheets/nottem.xlsx")) {
            String sheet = new String(zip.getInputStream(zip.getEntry("xl/worksheets/sheet1.xml")).readAllBytes(),
                    java.nio.charset.StandardCharsets.UTF_8);
            String styles = new String(zip.getInputStream(zip.getEntry("xl/styles.xml")).readAllBytes(),
                    java.nio.charset.StandardCharsets.UTF_8);
            assertThat(sheet).contains("<c r=\"A2\" s=\"1\" t=\"n\"><v>7306</v></c>");
            assertThat(styles).contains("<numFmt numFmtId=\"165\" formatCode=\"yyyy\\-mm\\-dd\"/>");
        }
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({"nottem.xlsx, YYYY-MM-DD", "AirPassengers.xlsx, YYYY-MM"})
    void checkSaysHowCalcStoredThePeriods(String file, String format) {
        Run check = Run.of("check", "src/test/resources/spreadsheets/" + file);
        assertThat(check.exitCode()).as(check.err()).isZero();
        assertThat(check.out()).contains("sheet 1 '" + file.substring(0, file.indexOf('.')) + "' of an xlsx workbook, "
                + "periods read as " + format);
    }
}
