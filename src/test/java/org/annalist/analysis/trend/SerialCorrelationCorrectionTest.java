package org.annalist.analysis.trend;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** Synthetic checks with known truth for the serial-correlation correction. */
class SerialCorrelationCorrectionTest {

    private static double[] ar1(long seed, int n, double phi, double slope) {
        Random random = new Random(seed);
        double[] x = new double[n];
        double e = 0;
        for (int t = 0; t < n; t++) {
            e = phi * e + random.nextGaussian();
            x[t] = slope * t + e;
        }
        return x;
    }

    @Test
    void autocorrelatedNoiseWithoutTrendIsRarelyCalledATrendOnceCorrected() {
        int plainRejections = 0;
        int correctedRejections = 0;
        int runs = 200;
        for (long seed = 1; seed <= runs; seed++) {
            double[] x = ar1(seed, 120, 0.7, 0);
            plainRejections += MannKendall.test(x, MannKendall.Correction.NONE).test().reject(0.05) ? 1 : 0;
            correctedRejections += MannKendall.test(x, MannKendall.Correction.AR1_RANKS).test().reject(0.05) ? 1 : 0;
        }
        // With AR(1) noise of phi = 0.7 the plain test rejects far more often than its nominal 5 %
        // (Hamed & Rao 1998 report the inflation); the AR(1)-corrected test comes back near nominal.
        assertThat(plainRejections).isGreaterThan(runs / 4);
        assertThat(correctedRejections).isLessThanOrEqualTo(runs / 10);
    }

    @Test
    void aClearTrendSurvivesTheCorrection() {
        for (MannKendall.Correction c : new MannKendall.Correction[] {MannKendall.Correction.HAMED_RAO,
            MannKendall.Correction.AR1_RANKS}) {
            MannKendall.Result r = MannKendall.test(ar1(7, 120, 0.5, 0.08), c);
            assertThat(r.test().reject(0.05)).as(c.name()).isTrue();
            assertThat(r.correctionFactor()).as(c.name()).isGreaterThan(1);
        }
    }

    @Test
    void theSignificantLagsFormAlsoReducesFalseTrends() {
        int plain = 0;
        int corrected = 0;
        for (long seed = 1; seed <= 200; seed++) {
            double[] x = ar1(seed, 240, 0.7, 0);
            plain += MannKendall.test(x, MannKendall.Correction.NONE).test().reject(0.05) ? 1 : 0;
            corrected += MannKendall.test(x, MannKendall.Correction.HAMED_RAO).test().reject(0.05) ? 1 : 0;
        }
        assertThat(corrected).isLessThan(plain / 2);
    }

    @Test
    void independentNoiseLeavesTheVarianceAboutAsItIs() {
        MannKendall.Result r = MannKendall.test(ar1(3, 200, 0, 0), MannKendall.Correction.AR1_RANKS);
        assertThat(r.correctionFactor()).isBetween(0.8, 1.3);
    }
}
