package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.util.List;
import java.util.function.Function;
import org.annalist.ingest.WorkbookFiles.Sheet;
import org.junit.jupiter.api.Test;

/**
 * Problems found by the reading a workbook shares with CSV text (numbers, periods, repeats, stray years,
 * flags, day/month order, titles and notes) name the sheet and the cell in A1 notation, in their lead and
 * in their cross-references, in an xlsx and an ods alike; the same problems in a CSV keep naming lines.
 */
class WorkbookProblemPlacesTest {

    private static final List<Function<Sheet, byte[]>> BOOKS = List.of(s -> WorkbookFiles.xlsx(false, s), WorkbookFiles::ods);
    private static final List<String> NAMES = List.of("visitors.xlsx", "visitors.ods");

    private static List<String> errors(String name, byte[] bytes) {
        DataProblemException e = catchThrowableOfType(() -> new SeriesFileReader(ReadOptions.defaults()).read(name, bytes),
                DataProblemException.class);
        assertThat(e).as("a problem was expected").isNotNull();
        return e.problems().stream().map(DataProblem::toString).toList();
    }

    private static List<String> warnings(String name, byte[] bytes) {
        return new SeriesFileReader(ReadOptions.defaults()).read(name, bytes).warnings().stream().map(DataProblem::toString)
                .toList();
    }

    @Test
    void aBadNumberARepeatedPeriodAndABadMonthNameTheirCells() {
        Sheet nights = new Sheet("Nights").row("Month", "Domestic", "Brevania")
                .row("2024-01", "100", "10").row("2024-02", "12x3", "11").row("2024-03", "130", "12")
                .row("2024-03", "140", "13").row("2024-13", "150", "14").row("2024-05", "160", "15");
        for (int b = 0; b < BOOKS.size(); b++) {
            String name = NAMES.get(b);
            assertThat(errors(name, BOOKS.get(b).apply(nights))).contains(
                    name + ", sheet 'Nights', cell B3: '12x3' is not a number; expected a number (or a missing-value marker "
                            + "such as NA, -, .. or :) in column 'Domestic'",
                    name + ", sheet 'Nights', cell B5: period 2024-03 appears again for series 'Domestic' (first in cell B4); "
                            + "expected one row per period",
                    name + ", sheet 'Nights', cell C5: period 2024-03 appears again for series 'Brevania' (first in cell C4); "
                            + "expected one row per period",
                    name + ", sheet 'Nights', cell A6: '2024-13' has no month 1 to 12; expected a date or period such as "
                            + "2024-03, 2024-Q1 or 2024-03-01");
        }
    }

    @Test
    void aStrayYearIsNamedByTheCellOfItsValue() {
        Sheet nights = new Sheet("Nights").row("Month", "Nights");
        for (int m = 1; m <= 12; m++) {
            nights.row(String.format("2023-%02d", m), Integer.toString(100 + m));
        }
        nights.row("2093-01", "113");   // a mistyped year, row 14
        for (int b = 0; b < BOOKS.size(); b++) {
            String name = NAMES.get(b);
            assertThat(errors(name, BOOKS.get(b).apply(nights))).singleElement().asString()
                    .startsWith(name + ", sheet 'Nights', cell B14: period 2093-01 of series 'Nights' is ");
        }
    }

    @Test
    void aRepeatInAYearByMonthGridNamesBothCells() {
        Sheet grid = new Sheet("Grid").startingAt(3).row("", "Year", "Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug",
                        "Sep", "Oct", "Nov", "Dec")
                .row("", "2022", "1", "2", "3", "4", "5", "6", "7", "8", "9", "10", "11", "12")
                .row("", "2022", "1", "2", "3", "4", "5", "6", "7", "8", "9", "10", "11", "12");
        for (int b = 0; b < BOOKS.size(); b++) {
            String name = NAMES.get(b);
            assertThat(errors(name, BOOKS.get(b).apply(grid))).contains(name + ", sheet 'Grid', cell E5: period 2022-03 "
                    + "appears again for series 'visitors' (first in cell E4); expected one row per period");
        }
    }

    @Test
    void aBadFlagAndADayMonthConflictNameTheirCells() {
        Sheet flags = new Sheet("Nights").row("Month", "Nights", "Flag")
                .row("2024-01", "100", "p").row("2024-02", "110", "??").row("2024-03", "120", "");
        Sheet dates = new Sheet("Days").row("Day", "Nights")
                .row("t:13/01/2024", "1").row("t:01/14/2024", "2").row("t:01/15/2024", "3");
        for (int b = 0; b < BOOKS.size(); b++) {
            String name = NAMES.get(b);
            assertThat(errors(name, BOOKS.get(b).apply(flags))).singleElement().asString()
                    .startsWith(name + ", sheet 'Nights', cell C3: '??' is not a flag");
            assertThat(errors(name, BOOKS.get(b).apply(dates))).singleElement().asString()
                    .contains(", sheet 'Days', cell A").contains("(cell A");
        }
    }

    @Test
    void titleAndNoteRowsAreRowsNotLines() {
        Sheet nights = new Sheet("Nights").row("Guest nights, Quennelmark").row("Month", "Nights")
                .row("2024-01", "100").row("2024-02", "110").row("2024-03", "120").row("Source: invented");
        for (int b = 0; b < BOOKS.size(); b++) {
            String name = NAMES.get(b);
            assertThat(warnings(name, BOOKS.get(b).apply(nights))).contains(
                    name + ", sheet 'Nights', row 1: row set aside as a title above the header: 'Guest nights, Quennelmark'",
                    name + ", sheet 'Nights', row 6: row set aside as a note below the data: 'Source: invented'");
        }
    }

    @Test
    void theSameProblemsInACsvStillNameLines() {
        byte[] csv = "Month,Nights\n2024-01,100\n2024-02,110\n2024-02,120\n".getBytes(java.nio.charset.StandardCharsets.UTF_8);
        assertThat(errors("v.csv", csv)).containsExactly(
                "v.csv:4:2: period 2024-02 appears again for series 'Nights' (first on line 3); expected one row per period");
    }
}
