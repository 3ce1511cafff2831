package org.annalist.analysis.season;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.annalist.analysis.Reference;
import org.annalist.analysis.TestResult;
import org.apache.commons.math3.stat.inference.MannWhitneyUTest;
import org.junit.jupiter.api.Test;

class SpectralTest {

    @Test
    void autocorrelationMatchesRsAcf() {
        // R 4.2.2: acf(AirPassengers, lag.max = 48, plot = FALSE)
        double[] expected = Reference.csv("acf_AirPassengers.csv").column("acf");
        double[] r = Autocorrelation.of(Reference.dataset("AirPassengers.csv"), 48);
        assertThat(r).containsExactly(expected, within(1e-12));
    }

    @Test
    void periodogramMatchesRsSpecPgramWithoutPadding() {
        // R 4.2.2: spec.pgram(co2, taper = 0, detrend = TRUE, fast = FALSE, plot = FALSE)
        Reference ref = Reference.csv("spec_pgram_co2_nopad.csv");
        Periodogram.Result p = Periodogram.of(Reference.dataset("co2.csv"), 12);
        double[] spec = ref.column("spec");
        double[] freq = ref.column("freq_cycles_per_year");
        assertThat(p.power()).hasSize(spec.length);
        for (int k = 0; k < spec.length; k++) {
            assertThat(p.frequency()[k]).isCloseTo(freq[k], within(1e-12));
            assertThat(p.power()[k]).as("k = %d", k + 1).isCloseTo(spec[k], within(Math.abs(spec[k]) * 1e-8));
        }
        int peak = 0;
        for (int k = 1; k < spec.length; k++) {
            peak = p.power()[k] > p.power()[peak] ? k : peak;
        }
        assertThat(p.period(peak)).as("co2's strongest periodic component is the year").isCloseTo(1.0, within(1e-9));
    }

    @Test
    void kruskalWallisOfTwoGroupsEqualsTheMannWhitneyTest() {
        // With two groups and no ties, H is the square of the Mann-Whitney z (Kruskal & Wallis 1952, §1.3);
        // Commons Math's MannWhitneyUTest (normal approximation, no continuity correction) is the oracle.
        Random random = new Random(11);
        double[] a = new double[15];
        double[] b = new double[19];
        double[] values = new double[34];
        int[] groups = new int[34];
        for (int i = 0; i < 34; i++) {
            values[i] = random.nextGaussian() + (i < 15 ? 0.6 : 0);
            groups[i] = i < 15 ? 0 : 1;
            if (i < 15) {
                a[i] = values[i];
            } else {
                b[i - 15] = values[i];
            }
        }
        TestResult kw = KruskalWallis.test(values, groups, 2);
        double p = new MannWhitneyUTest().mannWhitneyUTest(a, b);
        assertThat(kw.pValue()).isCloseTo(p, within(1e-9));
        assertThat(kw.statistic()).isPositive();
    }

    @Test
    void kruskalWallisFromTheDefinitionWithTies() {
        // Groups {1,2,2}, {3,4}, {4,5,6}: ranks 1, 2.5, 2.5 | 4, 5.5 | 5.5, 7, 8; N = 8.
        // H0 = 12/(8*9) * (6^2/3 + 9.5^2/2 + 20.5^2/3) - 27 = 5.2847...; ties (2,2): sum t^3-t = 12;
        // correction 1 - 12/504; H = H0 / correction (derived in this comment from eq. 1.1 and 1.2).
        double[] values = {1, 2, 2, 3, 4, 4, 5, 6};
        int[] groups = {0, 0, 0, 1, 1, 2, 2, 2};
        double h0 = 12.0 / 72 * (36.0 / 3 + 90.25 / 2 + 420.25 / 3) - 27;
        double expected = h0 / (1 - 12.0 / 504);
        assertThat(KruskalWallis.test(values, groups, 3).statistic()).isCloseTo(expected, within(1e-12));
    }
}
