package org.annalist.analysis.decompose;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.annalist.analysis.Reference;
import org.junit.jupiter.api.Test;

class ClassicalDecompositionTest {

    @Test
    void multiplicativeAirPassengersMatchesRsDecompose() {
        // R 4.2.2: decompose(AirPassengers, type = "multiplicative") -> $figure, $seasonal, $random.
        Reference r = Reference.csv("decompose_AirPassengers.csv");
        ClassicalDecomposition.Result d = ClassicalDecomposition.of(r.column("x"), 12,
                ClassicalDecomposition.Type.MULTIPLICATIVE);
        double[] figure = Reference.csv("decompose_AirPassengers_figure.csv").column("seasonal_figure");
        for (int i = 0; i < 12; i++) {
            assertThat(d.figure()[i]).as("figure %d", i + 1).isCloseTo(figure[i], within(1e-12));
        }
        double[] seasonal = r.column("seasonal");
        double[] random = r.column("random");
        for (int t = 0; t < seasonal.length; t++) {
            assertThat(d.seasonal()[t]).isCloseTo(seasonal[t], within(1e-12));
            if (Double.isNaN(random[t])) {
                assertThat(d.remainder()[t]).isNaN();
            } else {
                assertThat(d.remainder()[t]).isCloseTo(random[t], within(1e-12));
            }
        }
    }

    @Test
    void additiveFigureSumsToZeroAndComponentsAddUp() {
        double[] x = new double[48];
        for (int t = 0; t < x.length; t++) {
            x[t] = 100 + 0.5 * t + (t % 4 == 1 ? 8 : t % 4 == 3 ? -8 : 0);
        }
        ClassicalDecomposition.Result d = ClassicalDecomposition.of(x, 4, ClassicalDecomposition.Type.ADDITIVE);
        assertThat(d.figure()).containsExactly(new double[] {0, 8, 0, -8}, within(1e-9));
        for (int t = 2; t < x.length - 2; t++) {
            assertThat(d.trend()[t] + d.seasonal()[t] + d.remainder()[t]).isCloseTo(x[t], within(1e-9));
            assertThat(d.remainder()[t]).isCloseTo(0, within(1e-9));
        }
    }
}
