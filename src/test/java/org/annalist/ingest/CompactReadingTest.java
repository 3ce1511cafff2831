package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * The reader keeps rows and values compactly (one text buffer, primitive arrays): lines are still
 * counted as an editor counts them, values land on their periods in any order, and the layout is
 * settled on the first rows without losing a column that only fills in further down.
 */
class CompactReadingTest {

    @Test
    void linesAreCountedAcrossEveryKindOfLineBreak() {
        DataProblemException e = catchThrowableOfType(DataProblemException.class,
                () -> Files.read("in.csv", "month,v\r\n2024-01,1\r2024-02,2\n2024-03,y\r\n2024-04,4\n"));
        assertThat(e.problems()).extracting(DataProblem::toString)
                .containsExactly("in.csv:4:2: 'y' is not a number; expected a number (or a missing-value marker such as "
                        + "NA, -, .. or :) in column 'v'");
    }

    @Test
    void aQuotedCellOverTwoLinesKeepsTheLinesAfterItRight() {
        DataProblemException e = catchThrowableOfType(DataProblemException.class,
                () -> Files.read("in.csv", "month,v,remark\n2024-01,1,\"two\nlines\"\n2024-02,y,\n"));
        assertThat(e.problems().get(0).toString()).startsWith("in.csv:4:2: 'y' is not a number");
    }

    @Test
    void rowsInReverseOrderLandOnTheirPeriods() {
        StringBuilder text = new StringBuilder("month,v\n");
        for (int m = 12; m >= 1; m--) {
            text.append(String.format("2023-%02d,%d%n", m, m * 10));
        }
        ReadResult read = Files.read("in.csv", text.toString());
        Series s = read.series().get(0);
        assertThat(s.start()).isEqualTo(Period.month(2023, 1));
        assertThat(s.size()).isEqualTo(12);
        for (int i = 0; i < 12; i++) {
            assertThat(s.value(i)).isEqualTo((i + 1) * 10.0);
        }
        assertThat(read.warnings()).extracting(DataProblem::message).containsExactly("rows of series 'v' are not in time "
                + "order; sorted them");
    }

    @Test
    void aColumnEmptyInTheFirstRowsIsStillAColumnOfValues() {
        int rows = TableShape.LAYOUT_SAMPLE + 100;
        StringBuilder text = new StringBuilder("day,a,\n");
        java.time.LocalDate day = java.time.LocalDate.of(2000, 1, 1);
        for (int r = 0; r < rows; r++) {
            text.append(day.plusDays(r)).append(',').append(r).append(',').append(r < rows - 50 ? "" : "7").append('\n');
        }
        ReadResult read = Files.read("in.csv", text.toString());
        assertThat(read.series()).extracting(Series::name).containsExactly("a", "column 3");
        assertThat(read.rowsRead()).isEqualTo(rows);
    }

    @Test
    void theCommonNumberShortcutReadsAsThePatternsDo() {
        for (String cell : new String[] {"0", "-0", "12", "-12", "0012", "12.5", "-0.25", "123456789012345"}) {
            StringBuilder viaShortcut = new StringBuilder();
            double value = NumberCells.parse(cell, DecimalMark.POINT, viaShortcut).orElseThrow().value();
            assertThat(value).as(cell).isEqualTo(Double.parseDouble(cell));
            assertThat(NumberCells.looksNumeric(cell)).isTrue();
            assertThat(NumberCells.isMissingMarker(cell)).isFalse();
        }
        for (String cell : new String[] {"0", "-0", "12", "-12", "0012", "123456789012345"}) {
            assertThat(NumberCells.plainInteger(cell)).as(cell).isEqualTo(Double.parseDouble(cell));
        }
        for (String cell : new String[] {"", "-", "12.5", "1,234", "12p", "1234567890123456", "NA", "--1"}) {
            assertThat(NumberCells.plainInteger(cell)).as(cell).isNaN();
        }
        assertThat(NumberCells.parse("12.5", DecimalMark.COMMA, new StringBuilder())).isEmpty();
        assertThat(NumberCells.evidence("12.5")).isEqualTo(NumberCells.Evidence.POINT);
        assertThat(NumberCells.evidence("1234")).isEqualTo(NumberCells.Evidence.NONE);
    }

    @Test
    void thousandsOfNoteLinesAreAHundredWarningsAndACount() {
        StringBuilder text = new StringBuilder("month,v\n2024-01,1\n2024-02,2\n");
        for (int i = 0; i < 5000; i++) {
            text.append("note ").append(i).append('\n');
        }
        ReadResult read = Files.read("in.csv", text.toString());
        assertThat(read.warnings()).hasSize(101);
        assertThat(read.warnings().get(100).message()).isEqualTo("4900 more warnings of the same kinds not shown");
    }
}
