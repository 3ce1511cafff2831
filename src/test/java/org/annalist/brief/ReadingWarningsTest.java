package org.annalist.brief;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Set;
import org.annalist.findings.Measure;
import org.annalist.series.Frequency;
import org.annalist.series.Holiday;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/** What was read but is doubtful is said: negative counts with their periods, holiday dates the data cannot use. */
class ReadingWarningsTest {

    private static Series nights(double... values) {
        return Series.builder("Guest nights", Frequency.MONTHLY).append(Period.month(2024, 1), values).snapshot();
    }

    @Test
    void negativeValuesOfACountAreNamedWithTheirPeriods() {
        assertThat(ReadingWarnings.negativeCount(nights(10, -3, 12, -1), Measure.FLOW)).hasValue(
                "series 'Guest nights' is read as a count (a flow such as nights or arrivals) but has 2 negative values, "
                        + "in 2024-02, 2024-04; check the data, or declare the measure (--measure level) if values below "
                        + "zero are meant");
    }

    @Test
    void negativeValuesOfALevelOrACleanCountAreNoWarning() {
        assertThat(ReadingWarnings.negativeCount(nights(10, -3), Measure.LEVEL)).isEmpty();
        assertThat(ReadingWarnings.negativeCount(nights(10, 0, 3), Measure.FLOW)).isEmpty();
    }

    @Test
    void holidayDatesOutsideTheDataAreListed() {
        Holiday lake = new Holiday("Lake festival", Set.of(LocalDate.of(2023, 5, 9), LocalDate.of(2024, 2, 10),
                LocalDate.of(2025, 5, 9)));
        assertThat(ReadingWarnings.holidaysOutside(Path.of("h.csv"), List.of(lake), nights(1, 2, 3, 4))).hasValue(
                "h.csv: 2 holiday dates fall outside the span of series 'Guest nights' (2024-01 to 2024-04) and do not "
                        + "enter the estimate of the holiday's effect: 2023-05-09 (Lake festival), 2025-05-09 (Lake festival)");
        Holiday inside = new Holiday("Lake festival", Set.of(LocalDate.of(2024, 2, 10)));
        assertThat(ReadingWarnings.holidaysOutside(Path.of("h.csv"), List.of(inside), nights(1, 2, 3, 4))).isEmpty();
    }
}
