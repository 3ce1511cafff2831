package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * A period far from all the others (a mistyped year: 2417-04 among months of 2011–2026) is refused
 * at its line, not read as a series of four centuries whose latest month is the typo (which took the
 * outlook minutes, found by HostileInputPropertyTest, seed 9049). A long gap in a series with more
 * values than the gap is long is read as missing values, as before. Invented data.
 */
class StrayPeriodsTest {

    private static String months(int fromYear, int count) {
        StringBuilder text = new StringBuilder();
        for (int t = 0; t < count; t++) {
            text.append(String.format(Locale.ROOT, "%d-%02d,%d%n", fromYear + t / 12, t % 12 + 1, 100 + t % 12));
        }
        return text.toString();
    }

    @Test
    void aMistypedYearFarAfterTheOthersIsAProblemAtItsLine() {
        String text = "month,nights\n" + months(2011, 60) + "2417-04,99\n" + months(2016, 12);
        DataProblemException e = catchThrowableOfType(DataProblemException.class, () -> Files.read("in.csv", text));
        assertThat(e.problems()).extracting(DataProblem::toString).containsExactly("in.csv:62: period 2417-04 of series "
                + "'nights' is 4803 missing periods away from its other values (next: 2016-12), more than the 73 values the series "
                + "holds; expected periods near the others (a mistyped year?)");
    }

    @Test
    void aMistypedYearBeforeTheOthersIsNamedToo() {
        String text = "month,nights\n1917-04,99\n" + months(2011, 72);
        DataProblemException e = catchThrowableOfType(DataProblemException.class, () -> Files.read("in.csv", text));
        assertThat(e.problems()).singleElement().extracting(DataProblem::toString).asString()
                .startsWith("in.csv:2: period 1917-04 of series 'nights' is ").contains("(next: 2011-01)");
    }

    @Test
    void aGapShorterThanTheValuesOrThanTenYearsIsReadAsMissingValues() {
        // 12 years of months with a 3-year hole: 108 values, a gap of 36
        String withHole = "month,nights\n" + months(2000, 48) + months(2007, 60);
        assertThat(Files.read("in.csv", withHole).require("nights").size()).isEqualTo(144);
        // two values eight years apart: the gap is longer than the values but shorter than ten years
        String sparse = "month,nights\n2010-01,5\n2018-01,6\n";
        assertThat(Files.read("in.csv", sparse).require("nights").size()).isEqualTo(97);
    }
}
