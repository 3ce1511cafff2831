package org.annalist.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.junit.jupiter.api.Test;

class RanksTest {

    /** The order ranks are read from is that of a stable sort of the positions by Double.compare. */
    @Property(tries = 300)
    void sortedOrderIsTheStableOrderOfDoubleCompare(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                                    @ForAll @IntRange(min = 0, max = 300) int n,
                                                    @ForAll @IntRange(min = 0, max = 2) int kind) {
        Random random = new Random(seed);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = switch (kind) {
                case 0 -> random.nextGaussian();
                case 1 -> random.nextInt(5) - 2;   // many ties
                default -> new double[] {0.0, -0.0, Double.NaN, -1, Double.NEGATIVE_INFINITY, Double.MAX_VALUE,
                        Double.MIN_VALUE, -Double.MIN_VALUE}[random.nextInt(8)];
            };
        }
        Integer[] expected = new Integer[n];
        for (int i = 0; i < n; i++) {
            expected[i] = i;
        }
        Arrays.sort(expected, (a, b) -> Double.compare(x[a], x[b]));   // stable (derived in the test)

        assertThat(Ranks.sortedOrder(x)).containsExactly(Arrays.stream(expected).mapToInt(Integer::intValue).toArray());
    }

    @Test
    void tiesShareTheirMeanRank() {
        // sorted 1, 2, 2, 2, 5: the three 2s hold ranks 2, 3 and 4, so each gets 3 ([Kruskal and Wallis 1952])
        assertThat(Ranks.of(new double[] {2, 5, 2, 1, 2})).containsExactly(3, 5, 3, 1, 3);
    }
}
