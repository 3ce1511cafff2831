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
        // (hand arithmetic)
        PartsCheck check = PartsCheck.of(total, List.of(a, b));
        assertThat(check.consistent()).isFalse();
        assertThat(check.periods()).containsExactly(Period.month(2024, 3));
        assertThat(check.largestGapPct()).isCloseTo(2.0, within(1e-9));
        assertThat(PartsCheck.of(total, List.of(monthly("A", 600, 600, 600, 600), monthly("B", 400, 400, 400, 400)))
                .consistent()).isTrue();
    }

    /** A month where a part is missing is not passed over: it is named, with the part, and not counted as checked. */
    @Test
    void aPeriodWithAMissingPartIsNamedWithThePartAndNotCountedAsChecked() {
        Series total = monthly("Total", 1000, 1000, 1000, 1000, 1000);
        Series a = monthly("Domestic", 600, 600, Double.NaN, 600, 600);
        Series b = monthly("Brevania", 400, 400, 400, 400, Double.NaN);
        PartsCheck check = PartsCheck.of(total, List.of(a, b));
        assertThat(check.consistent()).isTrue();
        assertThat(check.complete()).isFalse();
        assertThat(check.checked()).isEqualTo(3);
        assertThat(check.uncheckedCount()).isEqualTo(2);
        assertThat(check.unchecked()).containsExactly(
                new PartsCheck.Unchecked(Period.month(2024, 3), Period.month(2024, 3), List.of("Domestic")),
                new PartsCheck.Unchecked(Period.month(2024, 5), Period.month(2024, 5), List.of("Brevania")));
    }

    /** Consecutive months with the same series missing form one span; the total's own gaps and a part running longer are named too. */
    @Test
    void consecutiveMissingPeriodsFormOneSpanAndATotalThatEndsEarlierIsNamed() {
        Series total = monthly("Total", Double.NaN, Double.NaN, 1000, 1000);
        Series a = monthly("A", 600, 600, 600, 600, 600);
        Series b = monthly("B", 400, 400, 400, 400, 400);
        PartsCheck check = PartsCheck.of(total, List.of(a, b));
        assertThat(check.checked()).isEqualTo(2);
        assertThat(check.unchecked()).containsExactly(
                new PartsCheck.Unchecked(Period.month(2024, 1), Period.month(2024, 2), List.of("Total")),
                new PartsCheck.Unchecked(Period.month(2024, 5), Period.month(2024, 5), List.of("Total")));
        assertThat(check.uncheckedCount()).isEqualTo(3);
    }

    /** A gap keeps its sign and size: parts below the total give a negative gap, in units and in % of the total. */
    @Test
    void aGapIsReportedWithItsSignAndSizeInUnitsAndPercent() {
        Series total = monthly("Total", 1000, 2000);
        Series a = monthly("A", 600, 1100);
        Series b = monthly("B", 400, 800);
        PartsCheck check = PartsCheck.of(total, List.of(a, b));
        // February: 1,900 against 2,000 = −100, −5 % (hand arithmetic)
        assertThat(check.gaps()).hasSize(1);
        PartsCheck.Gap gap = check.gaps().get(0);
        assertThat(gap.period()).isEqualTo(Period.month(2024, 2));
        assertThat(gap.gap()).isCloseTo(-100, within(1e-9));
        assertThat(gap.gapPct()).isCloseTo(-5.0, within(1e-9));
        assertThat(check.largestGapPct()).isCloseTo(5.0, within(1e-9));
        assertThat(check.checked()).isEqualTo(2);
        assertThat(check.complete()).isTrue();
    }

    /** A zero total is checked too: parts that do not sum to zero there are a gap without a percentage. */
    @Test
    void aZeroTotalIsCheckedAndAGapAgainstItHasNoPercentage() {
        PartsCheck check = PartsCheck.of(monthly("Total", 0, 0), List.of(monthly("A", 0, 5), monthly("B", 0, 0)));
        assertThat(check.checked()).isEqualTo(2);
        assertThat(check.periods()).containsExactly(Period.month(2024, 2));
        assertThat(check.gaps().get(0).gapPct()).isNaN();
        assertThat(check.largestGapPct()).isZero();
    }
}
