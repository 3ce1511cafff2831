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
        // ties = 0: continuous values; otherwise few distinct values, as slopes of rounded data have
        double[] a = filled(n, i -> ties == 0 ? random.nextGaussian() : random.nextInt(1 + ties * 2) - ties);
        TreeSet<Integer> rankSet = new TreeSet<>();
        for (int k = 0; k < wanted; k++) {
            rankSet.add(random.nextInt(n));
        }
        assertSelectsWhatSortingGives(a, rankSet.stream().mapToInt(Integer::intValue).toArray());
    }

    private static double[] filled(int n, java.util.function.IntToDoubleFunction value) {
        double[] a = new double[n];
        for (int i = 0; i < n; i++) {
            a[i] = value.applyAsDouble(i);
        }
        return a;
    }

    /** The values {@link OrderStatistics#select} gives are those of the sorted array, and no value is lost. */
    private static void assertSelectsWhatSortingGives(double[] a, int[] ranks) {
        double[] sorted = a.clone();
        Arrays.sort(sorted);
        double[] work = a.clone();

        double[] values = OrderStatistics.select(work, ranks);

        for (int i = 0; i < ranks.length; i++) {
            assertThat(values[i]).isEqualTo(sorted[ranks[i]]);
        }
        Arrays.sort(work);
        assertThat(work).containsExactly(sorted);   // perhaps reordered, nothing lost
    }

    /**
     * Ranks close together in a large array, as the median and the interval limits of Sen's slope
     * are: they are looked for in a band bounded from a sample, and must come out as sorting gives
     * them whether the band holds them or not (values in runs of rising order, as pairwise slopes
     * run, or heavily tied).
     */
    @Property(tries = 200)
    void ranksCloseTogetherInALargeArrayEqualTheSortedArray(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                                            @ForAll @IntRange(min = 2048, max = 40_000) int n,
                                                            @ForAll @IntRange(min = 0, max = 2) int kind,
                                                            @ForAll @IntRange(min = 0, max = 1000) int spreadPerMille) {
        Random random = new Random(seed);
        double[] a = filled(n, i -> switch (kind) {
            case 0 -> random.nextGaussian();
            case 1 -> (i % 240) + random.nextGaussian() * 3;   // rising runs, repeated
            default -> random.nextInt(3);                       // three values only
        });
        int middle = n / 2;
        int spread = (int) ((long) n * spreadPerMille / 4000);   // up to an eighth of n either side
        int[] ranks = new TreeSet<>(java.util.List.of(Math.max(0, middle - spread - 1), Math.max(0, middle - spread),
                middle - 1, middle, Math.min(n - 1, middle + spread), Math.min(n - 1, middle + spread + 1)))
                .stream().mapToInt(Integer::intValue).toArray();
        assertSelectsWhatSortingGives(a, ranks);
    }

    @Test
    void aSampleThatMissesTheWantedRanksStillGivesThem() {
        // every value the sample takes is larger than all others, so the band its bounds cut holds
        // none of the middle ranks, and the whole array is partitioned instead (values derived in the test)
        int n = 8192;
        double[] a = new double[n];
        for (int i = 0; i < n; i++) {
            a[i] = n - i;
        }
        for (int place : BandSelection.samplePlaces(n, BandSelection.sampleSize(n))) {
            a[place] = 1_000_000 + place;
        }
        double[] sorted = a.clone();
        Arrays.sort(sorted);
        assertThat(BandSelection.select(a.clone(), new int[] {n / 2 - 1, n / 2}, new double[2])).isFalse();

        double[] values = OrderStatistics.select(a.clone(), n / 2 - 1, n / 2);

        assertThat(values).containsExactly(sorted[n / 2 - 1], sorted[n / 2]);
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
