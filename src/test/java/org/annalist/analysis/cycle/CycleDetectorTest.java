package org.annalist.analysis.cycle;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Random;
import org.annalist.analysis.Reference;
import org.junit.jupiter.api.Test;

class CycleDetectorTest {

    @Test
    void sunspotsHaveARoughlyElevenYearCycle() {
        CycleDetector.Result r = CycleDetector.detect(Reference.dataset("sunspot.year.csv"));
        assertThat(r.present()).isTrue();
        // R 4.2.2: spec.pgram(sunspot.year, taper = 0, detrend = TRUE, fast = FALSE) peaks at
        // 11.1153846153846 years (cycle_sunspot_year.json); the Schwabe cycle of about 11 years (from memory).
        assertThat(r.spectralPeriod()).isCloseTo(11.1153846153846, within(1e-9));
        assertThat(r.length()).isBetween(10.0, 12.0);
        assertThat(r.pValue()).isLessThan(0.001);
    }

    @Test
    void seriesWithoutACycleReportNone() {
        assertThat(CycleDetector.detect(Reference.dataset("Nile.csv")).present()).isFalse();
        assertThat(CycleDetector.detect(yearlyMeans(Reference.dataset("co2.csv"))).present()).isFalse();
        assertThat(CycleDetector.detect(yearlyMeans(Reference.dataset("AirPassengers.csv"))).present()).isFalse();
    }

    @Test
    void aSyntheticEightYearCycleIsFoundAndRegular() {
        Random random = new Random(8);
        double[] x = new double[64];
        for (int t = 0; t < x.length; t++) {
            x[t] = 100 + 0.5 * t + 10 * Math.sin(2 * Math.PI * t / 8) + random.nextGaussian();
        }
        CycleDetector.Result r = CycleDetector.detect(x);
        assertThat(r.present()).isTrue();
        assertThat(r.spectralPeriod()).isEqualTo(8.0);
        assertThat(r.regular()).isTrue();
        assertThat(r.gaps()).allSatisfy(g -> assertThat(g).isBetween(7, 9));
    }

    @Test
    void whiteNoiseHasNoCycle() {
        Random random = new Random(9);
        double[] x = new double[80];
        for (int t = 0; t < x.length; t++) {
            x[t] = random.nextGaussian();
        }
        assertThat(CycleDetector.detect(x).present()).isFalse();
    }

    @Test
    void regularityOfTheGapsBetweenPeaks() {
        // Common practice: gaps of 5, 4, 5 years count as regular; 4, 10, 2 do not.
        assertThat(CycleDetector.isRegular(List.of(5, 4, 5))).isTrue();
        assertThat(CycleDetector.isRegular(List.of(4, 10, 2))).isFalse();
        assertThat(CycleDetector.isRegular(List.of(5))).isFalse();
    }

    private static double[] yearlyMeans(double[] monthly) {
        double[] y = new double[monthly.length / 12];
        for (int i = 0; i < y.length; i++) {
            for (int j = 0; j < 12; j++) {
                y[i] += monthly[12 * i + j] / 12;
            }
        }
        return y;
    }
}
