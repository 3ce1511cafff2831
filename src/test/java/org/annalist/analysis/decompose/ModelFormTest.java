package org.annalist.analysis.decompose;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.junit.jupiter.api.Test;

class ModelFormTest {

    /** 10 years of monthly values on a level rising ×3, seasonal swing either proportional or fixed. */
    private static double[] synthetic(boolean proportional, double growth) {
        Random random = new Random(5);
        double[] x = new double[120];
        for (int t = 0; t < x.length; t++) {
            double level = 100 * Math.pow(growth, t / 120.0);
            double season = Math.sin(2 * Math.PI * t / 12);
            x[t] = proportional ? level * (1 + 0.3 * season) : level + 30 * season;
            x[t] += random.nextGaussian();
        }
        return x;
    }

    @Test
    void swingGrowingWithTheLevelHasAnElasticityNearOne() {
        ModelForm.Evidence e = ModelForm.measure(synthetic(true, 3), 12);
        assertThat(e.status()).isEqualTo(ModelForm.Status.MEASURED);
        assertThat(e.elasticity()).isBetween(0.8, 1.2);
        assertThat(e.levelRatio()).isGreaterThan(2.0);
        assertThat(e.cycles()).isEqualTo(8);   // ten years, less the first and last, whose ends have no centred window
    }

    @Test
    void swingOfFixedSizeHasAnElasticityNearZero() {
        assertThat(ModelForm.measure(synthetic(false, 3), 12).elasticity()).isBetween(-0.3, 0.3);
    }

    @Test
    void aStableLevelShowsInTheLevelRatio() {
        assertThat(ModelForm.measure(synthetic(true, 1.05), 12).levelRatio()).isLessThan(1.1);
    }

    @Test
    void zerosLeaveNothingToMeasure() {
        double[] x = synthetic(true, 3);
        x[40] = 0;
        ModelForm.Evidence e = ModelForm.measure(x, 12);
        assertThat(e.status()).isEqualTo(ModelForm.Status.NOT_ALL_POSITIVE);
        assertThat(e.elasticity()).isNaN();
    }

    @Test
    void annualDataAndShortSeriesHaveNoEvidence() {
        assertThat(ModelForm.measure(synthetic(true, 3), 1).status()).isEqualTo(ModelForm.Status.NOT_SEASONAL);
        assertThat(ModelForm.measure(java.util.Arrays.copyOf(synthetic(true, 3), 48), 12).status())
                .isEqualTo(ModelForm.Status.TOO_SHORT);
    }
}
