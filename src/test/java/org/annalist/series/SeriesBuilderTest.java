package org.annalist.series;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Set;
import org.junit.jupiter.api.Test;

class SeriesBuilderTest {

    @Test
    void periodsWithoutValueBecomeMissingAndOrderDoesNotMatter() {
        Series s = Series.builder("nights", Frequency.MONTHLY).unit("nights")
                .put(Period.month(2024, 3), 30, Set.of(ValueFlag.PROVISIONAL))
                .put(Period.month(2024, 1), 10)
                .snapshot();
        assertThat(s.start()).isEqualTo(Period.month(2024, 1));
        assertThat(s.end()).isEqualTo(Period.month(2024, 3));
        assertThat(s.size()).isEqualTo(3);
        assertThat(s.isMissing(1)).isTrue();
        assertThat(s.missingPeriods()).containsExactly(Period.month(2024, 2));
        assertThat(s.flags(2)).containsExactly(ValueFlag.PROVISIONAL);
        assertThat(s.periodsFlagged(ValueFlag.PROVISIONAL)).containsExactly(Period.month(2024, 3));
    }

    @Test
    void aPeriodTakesOneValueOnly() {
        SeriesBuilder b = Series.builder("x", Frequency.ANNUAL).put(Period.year(2020), 1);
        assertThatThrownBy(() -> b.put(Period.year(2020), 2)).hasMessageContaining("already has a value for 2020");
        assertThatThrownBy(() -> b.put(Period.month(2020, 1), 2)).hasMessageContaining("is annual");
    }

    @Test
    void valuesHandedOutAreCopies() {
        Series s = Series.builder("x", Frequency.ANNUAL).append(Period.year(2000), 1, 2, 3).snapshot();
        s.values()[0] = 99;
        assertThat(s.value(0)).isEqualTo(1);
    }

    @Test
    void infiniteValuesAndEmptySeriesAreRejected() {
        assertThatThrownBy(() -> Series.builder("x", Frequency.ANNUAL).put(Period.year(2000), Double.POSITIVE_INFINITY)
                .snapshot()).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Series.builder("x", Frequency.ANNUAL).snapshot()).isInstanceOf(IllegalStateException.class);
    }
}
