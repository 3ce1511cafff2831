package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.annalist.analysis.Reference;
import org.annalist.analysis.decompose.ModelForm;
import org.junit.jupiter.api.Test;

class FormChoiceTest {

    /** 10 years of monthly values on a level rising by {@code growth}, seasonal swing either proportional or fixed. */
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

    private static FormChoice choose(double[] x) {
        return FormChoice.of(ModelForm.measure(x, 12));
    }

    @Test
    void swingGrowingWithTheLevelIsMultiplicative() {
        FormChoice c = choose(synthetic(true, 3));
        assertThat(c.form()).isEqualTo(Form.MULTIPLICATIVE);
        assertThat(c.reason()).isEqualTo(FormChoice.Reason.SWING_GROWS_WITH_LEVEL);
        assertThat(c.elasticity()).isBetween(0.8, 1.2);
    }

    @Test
    void swingOfFixedSizeIsAdditive() {
        FormChoice c = choose(synthetic(false, 3));
        assertThat(c.form()).isEqualTo(Form.ADDITIVE);
        assertThat(c.reason()).isEqualTo(FormChoice.Reason.SWING_INDEPENDENT_OF_LEVEL);
    }

    @Test
    void aStableLevelCannotTellAndStaysAdditive() {
        FormChoice c = choose(synthetic(true, 1.05));
        assertThat(c.form()).isEqualTo(Form.ADDITIVE);
        assertThat(c.reason()).isEqualTo(FormChoice.Reason.LEVEL_TOO_STABLE);
    }

    @Test
    void zerosForceAdditive() {
        double[] x = synthetic(true, 3);
        x[40] = 0;
        assertThat(choose(x).reason()).isEqualTo(FormChoice.Reason.NOT_ALL_POSITIVE);
        assertThat(choose(x).elasticity()).isNull();
    }

    @Test
    void airPassengersIsMultiplicative() {
        // The classic example of a multiplicative series (Box, Jenkins & Reinsel 1976, Series G, analysed in logs).
        assertThat(choose(Reference.dataset("AirPassengers.csv")).multiplicative()).isTrue();
    }
}
