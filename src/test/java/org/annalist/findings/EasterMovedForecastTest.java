package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.time.LocalDate;
import java.util.List;
import org.annalist.analysis.forecast.Outlook;
import org.annalist.series.Period;
import org.junit.jupiter.api.Test;

/**
 * The outlook moves March and April for Easter's known date by the same factor (logs) or amount
 * everywhere it prints them: the mean, both intervals and every sample path, so the table, the
 * chart and the year's totals drawn from the paths agree; the other months are left alone.
 */
class EasterMovedForecastTest {

    private static final Period LAST = Period.month(2026, 10);

    /** Invented: Nov 2026 … Jun 2027 (8 steps); March 2027 is step 5 (index 4), April index 5. */
    private static Outlook.Forecast flat(double level) {
        double[] v = new double[8];
        java.util.Arrays.fill(v, level);
        double[] lo = v.clone();
        double[] hi = v.clone();
        for (int k = 0; k < 8; k++) {
            lo[k] = level - 10;
            hi[k] = level + 10;
        }
        return new Outlook.Forecast(null, v, lo, hi, lo, hi, new double[][] {v.clone(), hi.clone()});
    }

    private static List<EasterAhead> ahead(double march, double april) {
        return List.of(new EasterAhead(2027, LocalDate.of(2027, 3, 28), 8, 8, 0.36, 2011, 2026, true,
                List.of(new EasterAhead.Move(Period.month(2027, 3), Double.NaN, march),
                        new EasterAhead.Move(Period.month(2027, 4), Double.NaN, april))));
    }

    @Test
    void onLogsMarchAndAprilAreScaledByTheEffectAndTheOtherMonthsKept() {
        Outlook.Forecast moved = OutlookAnalysis.easterMoved(flat(100), ahead(0.06, -0.055), LAST, true);
        // derived in the test: 100 · exp(0.06), 110 · exp(0.06), 100 · exp(−0.055)
        assertThat(moved.mean()[4]).isCloseTo(100 * Math.exp(0.06), within(1e-9));
        assertThat(moved.hi95()[4]).isCloseTo(110 * Math.exp(0.06), within(1e-9));
        assertThat(moved.lo80()[5]).isCloseTo(90 * Math.exp(-0.055), within(1e-9));
        assertThat(moved.paths()[1][4]).isCloseTo(110 * Math.exp(0.06), within(1e-9));
        assertThat(moved.mean()[3]).isEqualTo(100);
        assertThat(moved.paths()[0][6]).isEqualTo(100);
    }

    @Test
    void onTheOriginalScaleTheEffectIsAddedAndACountStaysAtZeroOrAbove() {
        Outlook.Forecast moved = OutlookAnalysis.easterMoved(flat(5), ahead(3, -8), LAST, false);
        assertThat(moved.mean()[4]).isEqualTo(8);
        assertThat(moved.hi80()[4]).isEqualTo(18);
        // derived in the test: 5 − 8 < 0, held at zero; 15 − 8 = 7
        assertThat(moved.mean()[5]).isZero();
        assertThat(moved.hi80()[5]).isEqualTo(7);
        assertThat(moved.mean()[2]).isEqualTo(5);
    }

    @Test
    void withoutAnEasterEffectTheForecastIsTheSameObject() {
        Outlook.Forecast f = flat(100);
        assertThat(OutlookAnalysis.easterMoved(f, List.of(), LAST, true)).isSameAs(f);
    }
}
