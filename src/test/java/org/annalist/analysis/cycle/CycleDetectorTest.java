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
        CycleDetector.Result r = CycleDetector.withDefaults().detect(Reference.dataset("sunspot.year.csv"));
        assertThat(r.status()).isEqualTo(CycleDetector.Status.MEASURED);
        // R 4.2.2: spec.pgram(sunspot.year, taper = 0, detrend = TRUE, fast = FALSE) peaks at
        // 11.1153846153846 years (cycle_sunspot_year.json); the Schwabe cycle of about 11 years (from memory).
        assertThat(r.spectralPeriod()).isCloseTo(11.1153846153846, within(1e-9));
        assertThat(r.length()).isBetween(10.0, 12.0);
        assertThat(r.pValue()).isLessThan(0.001);
    }

    @Test
    void seriesWithoutACycleHaveNoSignificantPeak() {
        assertThat(CycleDetector.withDefaults().detect(Reference.dataset("Nile.csv")).pValue()).isGreaterThan(0.05);
        assertThat(CycleDetector.withDefaults().detect(yearlyMeans(Reference.dataset("co2.csv"))).pValue())
                .isGreaterThan(0.05);
        // whether no cycle is then claimed is the findings' decision: AnalystReferenceTest
    }

    @Test
    void aSyntheticEightYearCycleIsFoundAndRegular() {
        Random random = new Random(8);
        double[] x = new double[64];
        for (int t = 0; t < x.length; t++) {
            x[t] = 100 + 0.5 * t + 10 * Math.sin(2 * Math.PI * t / 8) + random.nextGaussian();
        }
        CycleDetector.Result r = CycleDetector.withDefaults().detect(x);
        assertThat(r.pValue()).isLessThan(0.05);
        assertThat(r.spectralPeriod()).isEqualTo(8.0);
        assertThat(r.gapVariation()).isLessThan(0.25);
        assertThat(r.gaps()).allSatisfy(g -> assertThat(g).isBetween(7, 9));
    }

    @Test
    void fewerYearsThanTheMinimumAreNotSearched() {
        CycleDetector.Result r = CycleDetector.withDefaults().withMinimumYears(20).detect(new double[19]);
        assertThat(r.status()).isEqualTo(CycleDetector.Status.TOO_FEW_YEARS);
        assertThat(r.years()).isEqualTo(19);
        assertThat(r.spectralPeriod()).isNaN();
    }

    @Test
    void whiteNoiseHasNoCycle() {
        Random random = new Random(9);
        double[] x = new double[80];
        for (int t = 0; t < x.length; t++) {
            x[t] = random.nextGaussian();
        }
        assertThat(CycleDetector.withDefaults().detect(x).pValue()).isGreaterThan(0.05);
    }

    @Test
    void variationOfTheGapsBetweenPeaks() {
        // sample sd / mean, derived by hand: 5, 4, 5 → 0.577 / 4.667 = 0.124; 4, 10, 2 → 4.163 / 5.333 = 0.781
        assertThat(CycleDetector.variation(List.of(5, 4, 5))).isCloseTo(0.1237, within(1e-4));
        assertThat(CycleDetector.variation(List.of(4, 10, 2))).isCloseTo(0.7806, within(1e-4));
        assertThat(CycleDetector.variation(List.of(5))).isNaN();
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
