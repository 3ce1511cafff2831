package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/** A row whose width differs from the header's is never read silently. */
class RaggedRowsTest {

    @Test
    void aRowWithMoreFieldsThanTheHeaderIsAProblemAtItsFirstExtraField() {
        DataProblemException e = catchThrowableOfType(DataProblemException.class,
                () -> Files.read("in.csv", "month,Total,Domestic\n2024-01,10,4\n2024-02,1,200,5\n2024-03,12,6\n"));
        assertThat(e.problems()).extracting(DataProblem::toString).containsExactly(
                "in.csv:3:4: this row has 4 fields but the header has 3; expected at most 3 (quote a cell that holds "
                        + "the delimiter, such as \"1,234\")");
    }

    @Test
    void trailingEmptyFieldsAreNoExtraField() {
        ReadResult read = Files.read("in.csv", "month,Total\n2024-01,10,\n2024-02,11,,\n2024-03,12\n");
        assertThat(read.series()).extracting(Series::name).containsExactly("Total");
    }

    @Test
    void aRowWithFewerFieldsReadsMissingValuesAndSaysWhichLine() {
        ReadResult read = Files.read("in.csv", "month,Total,Domestic\n2024-01,10,4\n2024-02,11\n2024-03,12,6\n");
        Series domestic = read.require("Domestic");
        assertThat(domestic.isMissing(1)).isTrue();
        assertThat(read.warnings()).extracting(DataProblem::toString).containsExactly(
                "in.csv:3: this row has 2 fields but the header has 3; the missing fields were read as missing values");
    }

    @Test
    void manyShortRowsAreOneWarningNamingTheFirstLinesAndCountingTheRest() {
        StringBuilder text = new StringBuilder("month,Total,Domestic\n");
        for (int m = 1; m <= 12; m++) {
            text.append(String.format("2024-%02d,%d%s%n", m, 10 + m, m % 2 == 0 ? "" : ",5"));
        }
        ReadResult read = Files.read("in.csv", text.toString());
        assertThat(read.warnings()).extracting(DataProblem::toString).containsExactly(
                "in.csv:3: rows with fewer fields than expected (lines 3, 5, 7, 9, 11 and 1 more lines): the header "
                        + "has 3; the missing fields were read as missing values");
    }

    @Test
    void withoutAHeaderTheFirstDataRowSetsTheWidth() {
        DataProblemException e = catchThrowableOfType(DataProblemException.class,
                () -> Files.read("in.csv", "2024-01,10\n2024-02,11\n2024-03,1,2\n"));
        assertThat(e.problems().get(0).toString()).startsWith("in.csv:3:3: this row has 3 fields but the first data row has 2");
    }
}
