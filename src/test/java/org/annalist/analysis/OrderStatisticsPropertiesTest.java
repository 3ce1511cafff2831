package org.annalist.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Arrays;
import java.util.Random;
import java.util.TreeSet;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.junit.jupiter.api.Test;

/** Selection must give exactly what sorting gives (the definition of an order statistic). */
class OrderStatisticsPropertiesTest {

    @Property(tries = 300)
    void selectedValuesEqualTheSortedArrayAtEveryWantedRank(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                                            @ForAll @IntRange(min = 1, max = 30_000) int n,
                                                            @ForAll @IntRange(min = 1, max = 8) int wanted,
                                                            @ForAll @IntRange(min = 0, max = 3) int ties) {
        Random random = new Random(seed);
        double[] a = new double[n];
        for (int i = 0; i < n; i++) {
            // ties = 0: continuous values; otherwise few distinct values, as slopes of rounded data have
            a[i] = ties == 0 ? random.nextGaussian() : random.nextInt(1 + ties * 2) - ties;
        }
        TreeSet<Integer> rankSet = new TreeSet<>();
        for (int k = 0; k < wanted; k++) {
            rankSet.add(random.nextInt(n));
        }
        int[] ranks = rankSet.stream().mapToInt(Integer::intValue).toArray();
        double[] sorted = a.clone();
        Arrays.sort(sorted);
        double[] work = a.clone();

        double[] values = OrderStatistics.select(work, ranks);

        for (int i = 0; i < ranks.length; i++) {
            assertThat(values[i]).isEqualTo(sorted[ranks[i]]);
            assertThat(work[ranks[i]]).isEqualTo(sorted[ranks[i]]);
        }
        double[] rearranged = work.clone();
        Arrays.sort(rearranged);
        assertThat(rearranged).containsExactly(sorted);   // reordered, nothing lost
    }

    @Test
    void medianOfAnEvenCountIsTheMeanOfTheTwoMiddleValuesAndLeavesTheInputAlone() {
        double[] x = {9, 1, 7, 3};
        // sorted 1, 3, 7, 9: the median of an even count is the mean of 3 and 7 (common practice)
        assertThat(OrderStatistics.median(x)).isEqualTo(5.0);
        assertThat(x).containsExactly(9, 1, 7, 3);
    }

    @Test
    void refusesRanksOutOfOrderOrOutsideTheArrayAndValuesWithoutRank() {
        assertThatThrownBy(() -> OrderStatistics.select(new double[] {1, 2, 3}, 2, 1))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("ascending");
        assertThatThrownBy(() -> OrderStatistics.select(new double[] {1, 2, 3}, 3))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("outside");
        double[] withNaN = new double[40];
        java.util.Arrays.fill(withNaN, Double.NaN);
        assertThatThrownBy(() -> OrderStatistics.select(withNaN, 20))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("NaN");
    }
}
