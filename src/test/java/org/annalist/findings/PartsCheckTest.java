package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

class PartsCheckTest {

    private static Series monthly(String name, double... values) {
        return Series.builder(name, Frequency.MONTHLY).append(Period.month(2024, 1), values).snapshot();
    }

    @Test
    void gapsWithinTheToleranceAreAcceptedAndLargerOnesNamed() {
        Series total = monthly("Total", 1000, 1000, 1000, 1000);
        Series a = monthly("A", 600, 604, 600, Double.NaN);
        Series b = monthly("B", 400, 400, 420, 400);
        // March: parts 1,020 against 1,000 = 2 % off; February 0.4 % (within 0.5 %); April not judged (A missing)
        PartsCheck check = PartsCheck.of(total, List.of(a, b));
        assertThat(check.consistent()).isFalse();
        assertThat(check.periods()).containsExactly(Period.month(2024, 3));
        assertThat(check.largestGapPct()).isCloseTo(2.0, within(1e-9));
        assertThat(PartsCheck.of(total, List.of(monthly("A", 600, 600, 600, 600), monthly("B", 400, 400, 400, 400)))
                .consistent()).isTrue();
    }
}
