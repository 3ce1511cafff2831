package org.annalist.analysis.decompose;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.annalist.analysis.Reference;
import org.junit.jupiter.api.Test;

class StlPropertiesTest {

    @Property(tries = 60)
    void componentsAddUpToTheObservedValues(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                            @ForAll @IntRange(min = 2, max = 12) int period,
                                            @ForAll @IntRange(min = 0, max = 10) int missing) {
        Random random = new Random(seed);
        int n = period * (3 + random.nextInt(8)) + random.nextInt(period);
        double[] y = new double[n];
        for (int t = 0; t < n; t++) {
            y[t] = 50 + 0.1 * t + 10 * Math.sin(2 * Math.PI * t / period) + random.nextGaussian() * 3;
        }
        for (int m = 0; m < missing; m++) {
            y[random.nextInt(n)] = Double.NaN;
        }
        Assume.that(twoObservedPerPosition(y, period)); // below that, fit refuses the series
        Stl.Result fit = Stl.withPeriod(period).fit(y);
        for (int t = 0; t < n; t++) {
            assertThat(fit.seasonal()[t]).isFinite();
            assertThat(fit.trend()[t]).isFinite();
            if (Double.isNaN(y[t])) {
                assertThat(fit.remainder()[t]).isNaN();
                assertThat(fit.weights()[t]).isZero();
            } else {
                assertThat(fit.seasonal()[t] + fit.trend()[t] + fit.remainder()[t]).isCloseTo(y[t], within(1e-9));
                assertThat(fit.weights()[t]).isBetween(0.0, 1.0);
            }
        }
    }

    @Test
    void refusesASeriesWithFewerThanTwoObservedValuesAtAPosition() {
        double[] y = {1, 2, Double.NaN, 4, 5, Double.NaN, 7, 8, Double.NaN};
        assertThatThrownBy(() -> Stl.withPeriod(3).fit(y)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("position 3 of 3 has 0");
    }

    private static boolean twoObservedPerPosition(double[] y, int period) {
        for (int j = 0; j < period; j++) {
            int seen = 0;
            for (int t = j; t < y.length; t += period) {
                seen += Double.isNaN(y[t]) ? 0 : 1;
            }
            if (seen < 2) {
                return false;
            }
        }
        return true;
    }

    @Test
    void aFewMissingMonthsBarelyMoveTheFitElsewhere() {
        // Missing values take zero weight (Cleveland et al. 1990, §3): the fit at the other months
        // stays close to the fit of the complete series (co2, R's datasets).
        double[] co2 = Reference.dataset("co2.csv");
        Stl stl = Stl.withPeriod(12).withSeasonalWindow(7).with(Stl.Robustness.OFF);
        Stl.Result complete = stl.fit(co2);
        double[] gappy = co2.clone();
        int[] holes = {50, 51, 200, 333};
        for (int h : holes) {
            gappy[h] = Double.NaN;
        }
        Stl.Result fit = stl.fit(gappy);
        for (int h : holes) {
            // the value filled in at a hole is close to the real one
            assertThat(fit.trend()[h] + fit.seasonal()[h]).isCloseTo(co2[h], within(1.0));
        }
        double worst = 0;
        for (int t = 0; t < co2.length; t++) {
            worst = Math.max(worst, Math.abs(fit.trend()[t] - complete.trend()[t]));
        }
        assertThat(worst).isLessThan(0.5);
    }

    @Test
    void tooShortSeriesAreRefused() {
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> Stl.withPeriod(12).fit(new double[24]))
                .hasMessageContaining("more than two full periods");
    }
}
