package org.annalist.analysis.season;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.annalist.analysis.decompose.Stl;
import org.annalist.series.Period;
import org.junit.jupiter.api.Test;

class SeasonalPatternTest {

    private static SeasonalPattern.Result assess(double amplitude, int years, long seed) {
        Random random = new Random(seed);
        double[] y = new double[12 * years];
        for (int t = 0; t < y.length; t++) {
            // peak in July (position 7), trough in January
            y[t] = 500 + 0.5 * t + amplitude * -Math.cos(2 * Math.PI * t / 12) + 5 * random.nextGaussian();
        }
        Stl.Result stl = Stl.withPeriod(12).fit(y);
        return SeasonalPattern.assess(y, Period.month(2015, 1), stl, false, 500).orElseThrow();
    }

    @Test
    void aClearPatternIsFoundWithItsPeakAndTrough() {
        SeasonalPattern.Result r = assess(60, 8, 1);
        assertThat(r.test().reject(0.05)).isTrue();
        assertThat(r.peak().label()).isEqualTo("Jul");
        assertThat(r.trough().label()).isEqualTo("Jan");
        assertThat(r.strength()).isGreaterThan(0.9);
        assertThat(r.swing()).isBetween(100.0, 140.0);   // 2 × amplitude 60, smoothed by STL
        assertThat(r.periodCheck().confirmed()).isTrue();
        assertThat(r.earlyPeak().position()).isEqualTo(r.peak().position());
        assertThat(r.largestShift()).isLessThan(0.25 * r.swing());
    }

    /**
     * A multiplicative profile reads "% against the yearly average": with exact factors 0.6 … 1.5
     * (arithmetic mean 1, a synthetic series without noise) the profile gives each month's factor
     * minus 1, and the months average to zero. A geometric centring would lift them all by ~3 points.
     */
    @Test
    void multiplicativeProfileIsPercentAgainstTheArithmeticYearlyAverage() {
        double[] factors = {0.6, 0.7, 0.9, 1.0, 1.1, 1.3, 1.5, 1.4, 1.1, 0.9, 0.8, 0.7};
        double[] y = new double[12 * 8];
        double[] logs = new double[y.length];
        for (int t = 0; t < y.length; t++) {
            y[t] = 1000 * factors[t % 12];
            logs[t] = Math.log(y[t]);
        }
        SeasonalPattern.Result r = SeasonalPattern.assess(logs, Period.month(2015, 1),
                Stl.withPeriod(12).fit(logs), true, 1000).orElseThrow();
        double sum = 0;
        for (SeasonalPattern.Index month : r.profile()) {
            assertThat(month.value()).as(month.label()).isCloseTo(100 * (factors[month.position() - 1] - 1),
                    within(0.5));
            sum += month.value();
        }
        assertThat(sum).isCloseTo(0, within(1e-9));
    }

    @Test
    void noiseAloneHasAWeakPattern() {
        SeasonalPattern.Result r = assess(0, 8, 2);
        assertThat(r.strength()).isLessThan(0.3);
    }

    @Test
    void aDetectableButTinyPatternIsNotClaimed() {
        // Amplitude 2 on a level of 500: a swing under 1 % of the level, yet very regular (noise 0.2).
        Random random = new Random(3);
        double[] y = new double[96];
        for (int t = 0; t < y.length; t++) {
            y[t] = 500 + 2 * Math.sin(2 * Math.PI * t / 12) + 0.2 * random.nextGaussian();
        }
        SeasonalPattern.Result r = SeasonalPattern.assess(y, Period.month(2015, 1), Stl.withPeriod(12).fit(y), false, 500)
                .orElseThrow();
        assertThat(r.test().reject(0.05)).isTrue();
        assertThat(r.swingPctOfLevel()).isLessThan(1.0);
    }

    @Test
    void fewerThanThreeYearsGiveNoProfile() {
        double[] y = new double[30];
        for (int t = 0; t < y.length; t++) {
            y[t] = 100 + 20 * Math.sin(2 * Math.PI * t / 12);
        }
        assertThat(SeasonalPattern.assess(y, Period.month(2020, 1), Stl.withPeriod(12).fit(y), false, 100)).isEmpty();
    }

    @Test
    void aPatternWhosePeakMovesShowsInTheEarlyProfile() {
        double[] y = new double[12 * 10];
        for (int t = 0; t < y.length; t++) {
            double peakMonth = t < 60 ? 6 : 1;   // from a July peak to a February peak
            y[t] = 500 + 50 * Math.cos(2 * Math.PI * (t % 12 - peakMonth) / 12);
        }
        SeasonalPattern.Result r = SeasonalPattern.assess(y, Period.month(2010, 1),
                Stl.withPeriod(12).withSeasonalWindow(7).fit(y), false, 500).orElseThrow();
        assertThat(r.fullYears()).isEqualTo(10);
        assertThat(r.earlyPeak().label()).isEqualTo("Jul");
        assertThat(r.peak().label()).isEqualTo("Feb");
    }
}
