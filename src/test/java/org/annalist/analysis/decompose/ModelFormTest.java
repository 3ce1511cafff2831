package org.annalist.analysis.decompose;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.annalist.analysis.Reference;
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
    void swingGrowingWithTheLevelIsMultiplicative() {
        ModelForm.Choice c = ModelForm.choose(synthetic(true, 3), 12);
        assertThat(c.form()).isEqualTo(ModelForm.Form.MULTIPLICATIVE);
        assertThat(c.elasticity()).isBetween(0.8, 1.2);
    }

    @Test
    void swingOfFixedSizeIsAdditive() {
        ModelForm.Choice c = ModelForm.choose(synthetic(false, 3), 12);
        assertThat(c.form()).isEqualTo(ModelForm.Form.ADDITIVE);
        assertThat(c.reason()).isEqualTo(ModelForm.Reason.SWING_INDEPENDENT_OF_LEVEL);
        assertThat(c.elasticity()).isBetween(-0.3, 0.3);
    }

    @Test
    void aStableLevelCannotTellAndStaysAdditive() {
        assertThat(ModelForm.choose(synthetic(true, 1.05), 12).reason()).isEqualTo(ModelForm.Reason.LEVEL_TOO_STABLE);
    }

    @Test
    void zerosForceAdditive() {
        double[] x = synthetic(true, 3);
        x[40] = 0;
        assertThat(ModelForm.choose(x, 12).reason()).isEqualTo(ModelForm.Reason.NOT_ALL_POSITIVE);
    }

    @Test
    void airPassengersIsMultiplicative() {
        // The classic example of a multiplicative series (Box, Jenkins & Reinsel 1976, Series G, analysed in logs).
        assertThat(ModelForm.choose(Reference.dataset("AirPassengers.csv"), 12).multiplicative()).isTrue();
    }
}
