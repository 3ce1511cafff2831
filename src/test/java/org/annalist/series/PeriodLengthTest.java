package org.annalist.series;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class PeriodLengthTest {

    @Test
    void perDayFiguresUseTheAverageMonth() {
        // 2,800 nights in February 2023 (28 days) and 3,100 in March 2023 (31 days): both 100 a day,
        // i.e. 3,043.75 per average month of 30.4375 days (365.25 / 12).
        Series s = Series.builder("nights", Frequency.MONTHLY).append(Period.month(2023, 2), 2800, 3100).snapshot();
        Series perDay = PeriodLength.perAveragePeriod(s, "nights per average month");
        assertThat(perDay.value(0)).isCloseTo(3043.75, within(1e-9));
        assertThat(perDay.value(1)).isCloseTo(3043.75, within(1e-9));
        assertThat(perDay.unit()).isEqualTo("nights per average month");
    }
}
