package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Locale;
import org.annalist.findings.PartsCheck;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/** The add-up sentence says what was checked, what was not and why, and where the parts miss by how much. */
class PartsWordsTest {

    private static Series monthly(String name, double... values) {
        return Series.builder(name, Frequency.MONTHLY).append(Period.month(2024, 1), values).snapshot();
    }

    private static final Formats F = Formats.forValues(new double[] {1000}, Locale.ENGLISH);

    /** Invented months: 500 + 300 + 200 = 1,000 where all are present; March and April have parts missing (planted). */
    @Test
    void theUncheckedPeriodsAreNamedWithWhatWasMissing() {
        double n = Double.NaN;
        PartsCheck check = PartsCheck.of(monthly("Total", 1000, 1000, 1000, 1000, 1000),
                List.of(monthly("Domestic", 500, 500, n, n, 500), monthly("Brevania", 300, 300, 300, n, 300),
                        monthly("Long-haul", 200, 200, 200, 200, 200)));
        MultiBriefView.Consistency c = PartsWords.consistency(check, F);
        assertThat(c.consistent()).isTrue();
        assertThat(c.complete()).isFalse();
        assertThat(c.anyChecked()).isTrue();
        assertThat(c.checkedCount()).isEqualTo("3");
        assertThat(c.allPresent()).isEqualTo("all four have a value");
        assertThat(c.unchecked()).isEqualTo("March 2024 (Domestic missing), April 2024 (Domestic and Brevania missing)");
    }

    @Test
    void aMissNamesThePeriodTheSumTheTotalAndTheGapWithItsSign() {
        // March: 520 + 400 = 920 against 1,000: −80, −8.0 % (hand arithmetic)
        PartsCheck check = PartsCheck.of(monthly("Total", 1000, 1000, 1000),
                List.of(monthly("A", 600, 600, 520), monthly("B", 400, 400, 400)));
        MultiBriefView.Consistency c = PartsWords.consistency(check, F);
        assertThat(c.consistent()).isFalse();
        assertThat(c.complete()).isTrue();
        assertThat(c.offCount()).isEqualTo("1");
        assertThat(c.allPresent()).isEqualTo("all three have a value");
        assertThat(c.gaps()).isEqualTo("March 2024 (parts 920 against 1,000, \u221280, \u22128.0\u00A0%)");
    }
}
