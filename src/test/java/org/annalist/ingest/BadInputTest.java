package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Each unusable file is refused with every problem located as FILE:LINE[:COLUMN] and what was expected. */
class BadInputTest {

    private static List<String> problems(String content) {
        DataProblemException e = catchThrowableOfType(DataProblemException.class, () -> Files.read("in.csv", content));
        assertThat(e).as("expected the file to be refused").isNotNull();
        return e.problems().stream().map(DataProblem::toString).toList();
    }

    @Test
    void emptyFile() {
        assertThat(problems("")).containsExactly("in.csv: the file is empty; expected a header row and rows of dates "
                + "or periods with values");
        assertThat(problems("\n \n")).hasSize(1);
    }

    @Test
    void headerOnly() {
        assertThat(problems("period,value\n")).singleElement().asString()
                .startsWith("in.csv:1: the file has a header but no data rows");
    }

    @Test
    void noDateColumn() {
        assertThat(problems("name,value\nalpha,1\nbeta,2\n")).singleElement().asString()
                .startsWith("in.csv:1: no column holds dates or periods");
    }

    @Test
    void noValueColumn() {
        assertThat(problems("period,market\n2024-01,home\n2024-02,home\n")).singleElement().asString()
                .contains("no column holds numbers");
    }

    @Test
    void everyProblemInTheFileIsReportedInLineOrder() {
        List<String> found = problems("period,value\n2024-01,1\n2024-02,12x\n2024-02,3\n2024-04,abc\n2024-13,5\n");
        assertThat(found).containsExactly(
                "in.csv:3:2: '12x' ends in 'x', which is not a known flag (p (provisional), e (estimated), r (revised), "
                        + "b (break in series), d (definition differs), f (forecast), u (low reliability), c (confidential), "
                        + "n (not significant), z (not applicable)); expected a number (or a missing-value marker such as "
                        + "NA, -, .. or :) in column 'value'",
                "in.csv:4:2: period 2024-02 appears again for series 'in' (first on line 3); expected one row per period",
                "in.csv:5:2: 'abc' is not a number; expected a number (or a missing-value marker such as NA, -, .. or :) "
                        + "in column 'value'",
                "in.csv:6:1: '2024-13' has no month 1 to 12; expected a date or period such as 2024-03, 2024-Q1 or 2024-03-01");
    }

    @Test
    void cellsOfATransposedTableAreLocatedWhereTheyAreInTheFile() {
        assertThat(problems("market;2024-01;2024-02;2024-03\nDomestic;100;110;12y\n")).singleElement().asString()
                .startsWith("in.csv:2:4: '12y' ends in 'y'");
    }

    @Test
    void mixedFrequencies() {
        assertThat(problems("period,value\n2024-01,1\n2024-02,2\n2024-Q1,3\n2024-03,4\n")).singleElement().asString()
                .isEqualTo("in.csv:4:1: mixed frequencies: '2024-Q1' is a quarterly period while most rows are monthly; "
                        + "expected one frequency per file");
    }

    @Test
    void dayMonthOrderThatTheDataCannotSettleIsNeverGuessed() {
        assertThat(problems("date,value\n01/02/2024,1\n01/03/2024,2\n")).singleElement().asString()
                .contains("cannot tell whether '01/02/2024' is day/month/year or month/day/year")
                .contains("--date-order");
        ReadResult settled = Files.read("in.csv", "date,value\n01/02/2024,1\n01/03/2024,2\n",
                ReadOptions.defaults().withDateOrder(DateOrder.MONTH_FIRST));
        assertThat(settled.series().get(0).start().label()).isEqualTo("2024-01-02");
    }

    @Test
    void conflictingDayMonthOrders() {
        assertThat(problems("date,value\n13/01/2024,1\n01/14/2024,2\n")).singleElement().asString()
                .contains("needs month first").contains("needs day first");
    }

    @Test
    void unclosedQuote() {
        assertThat(problems("period,value\n2024-01,\"1\n2024-02,2\n")).singleElement().asString()
                .contains("a quoted cell is never closed");
    }

    @Test
    void binaryData() {
        DataProblemException e = catchThrowableOfType(DataProblemException.class,
                () -> new SeriesFileReader(ReadOptions.defaults()).read("x.bin", new byte[] {1, 2, 3, 4, 0, 0, 8}));
        assertThat(e.problems().get(0).message()).contains("binary data");
    }

    @Test
    void theStartOfAZipIsADamagedWorkbook() {
        // 'PK\3\4' begins a zip (APPNOTE.TXT §4.3.7), as every xlsx and ods; cut short, it is a damaged workbook
        DataProblemException e = catchThrowableOfType(DataProblemException.class,
                () -> new SeriesFileReader(ReadOptions.defaults()).read("x.xlsx", new byte[] {80, 75, 3, 4, 0, 0, 8}));
        assertThat(e.problems().get(0).message()).startsWith("is a damaged workbook");
    }

    @Test
    void mixedDecimalMarks() {
        assertThat(problems("period,value\n2024-01,\"1,5\"\n2024-02,2.5\n")).singleElement().asString()
                .contains("decimal point (line 3) and a decimal comma (line 2)");
    }

    @Test
    void unevenlySpacedDates() {
        assertThat(problems("date,value\n2024-01-01,1\n2024-01-20,2\n2024-03-01,3\n")).singleElement().asString()
                .contains("unevenly spaced");
    }

    @Test
    void missingFileIsADataProblem() {
        DataProblemException e = catchThrowableOfType(DataProblemException.class,
                () -> new SeriesFileReader(ReadOptions.defaults()).read(java.nio.file.Path.of("no/such/file.csv")));
        assertThat(e.getMessage()).isEqualTo("no/such/file.csv: no such file; expected a CSV file");
    }
}
