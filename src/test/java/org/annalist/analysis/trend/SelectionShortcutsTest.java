package org.annalist.analysis.trend;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;

/**
 * The shortcuts of the trend statistics give the same bits as the plain computations they replace:
 * Kendall's S by merging against the sum over all pairs, and Sen's estimate whose limits come from
 * the band the median's pass kept against the estimate that selects them from all the slopes.
 */
class SelectionShortcutsTest {

    /** Values as series hold them, with ties, gaps, signed zeros and extremes by {@code kind}. */
    private static double[] series(Random random, int n, int kind) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = switch (kind) {
                case 0 -> 100 + 0.3 * i + 10 * random.nextGaussian();         // trend and noise
                case 1 -> Math.round(5 * random.nextGaussian()) / 2.0;          // rounded: many ties
                case 2 -> random.nextInt(4) == 0 ? Double.NaN : random.nextGaussian();
                case 3 -> random.nextBoolean() ? 0.0 : -0.0;                    // signed zeros only
                default -> switch (random.nextInt(6)) {                         // values near the edges
                    case 0 -> Double.MIN_VALUE * random.nextInt(4);
                    case 1 -> -0.0;
                    case 2 -> random.nextBoolean() ? Double.MAX_VALUE : -Double.MAX_VALUE;
                    case 3 -> 0x1p-960 * (1 + random.nextInt(3));
                    default -> random.nextGaussian();
                };
            };
        }
        return x;
    }

    @Property(tries = 300)
    void kendallsScoreByMergingEqualsTheSumOfSignsOverAllPairs(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                                               @ForAll @IntRange(min = 0, max = 400) int n,
                                                               @ForAll @IntRange(min = 0, max = 4) int kind) {
        double[] x = series(new Random(seed), n, kind);
        double[] observed = java.util.Arrays.stream(x).filter(v -> !Double.isNaN(v)).toArray();
        long expected = 0;   // [Mann 1945] S = Σ_{i<j} sgn(x_j − x_i), Double.compare's order (derived in the test)
        for (int i = 0; i < observed.length; i++) {
            for (int j = i + 1; j < observed.length; j++) {
                expected += Integer.signum(Double.compare(observed[j], observed[i]));
            }
        }

        KendallScore score = KendallScore.of(x);

        assertThat(score.s()).isEqualTo(expected);
        assertThat(score.n()).isEqualTo(observed.length);
    }

    @Property(tries = 120)
    void senEstimateFromTheMediansBandHasTheBitsOfTheEstimateFromAllSlopes(
            @ForAll @LongRange(min = 1, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 3, max = 400) int n,
            @ForAll @IntRange(min = 0, max = 4) int kind,
            @ForAll @IntRange(min = 0, max = 40) int varianceScale) {
        double[] x = series(new Random(seed), n, kind);
        if (SenSlope.pairs(x, 1) == 0 || !SenSlope.slopesHaveOneBitPatternPerValue(x)) {
            return;   // slopes that may hold −0.0 or NaN take the plain selections only, as they always did
        }
        // variances from none to far beyond the slopes' count: limits near the middle, in the wings and outside them
        double varianceS = n * (n - 1.0) * (2.0 * n + 5) / 18.0 * varianceScale * varianceScale / 16.0;
        SenSlope.Pairwise pairwise = SenSlope.pairwise(x);
        double median = pairwise.medianPerStep();

        SenSlope.Result banded = pairwise.estimate(12, varianceS);
        SenSlope.Result plain = SenSlope.of(x, 12, varianceS);

        assertThat(bits(banded.perYear())).isEqualTo(bits(plain.perYear()));
        assertThat(bits(banded.lower95())).isEqualTo(bits(plain.lower95()));
        assertThat(bits(banded.upper95())).isEqualTo(bits(plain.upper95()));
        assertThat(bits(median)).isEqualTo(bits(medianOfAllSlopes(x)));
    }

    /** [Sen 1968] the median of all pairwise slopes over the real time between them (derived in the test). */
    private static double medianOfAllSlopes(double[] x) {
        java.util.List<Double> slopes = new java.util.ArrayList<>();
        for (int i = 0; i < x.length; i++) {
            for (int j = i + 1; j < x.length; j++) {
                if (!Double.isNaN(x[i]) && !Double.isNaN(x[j])) {
                    slopes.add((x[j] - x[i]) / (j - i));
                }
            }
        }
        double[] sorted = slopes.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        int m = sorted.length;
        return m % 2 == 1 ? sorted[m / 2] : (sorted[m / 2 - 1] + sorted[m / 2]) / 2;
    }

    @Property(tries = 300)
    void valuesPassedAsPlainMakeNoSlopeThatIsNaNOrNegativeZero(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                                               @ForAll @IntRange(min = 2, max = 60) int n,
                                                               @ForAll @IntRange(min = 0, max = 4) int kind) {
        double[] x = series(new Random(seed), n, kind);
        if (!SenSlope.slopesHaveOneBitPatternPerValue(x)) {
            return;
        }
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (!Double.isNaN(x[i]) && !Double.isNaN(x[j])) {
                    double slope = (x[j] - x[i]) / (j - i);
                    assertThat(Double.isNaN(slope)).isFalse();
                    assertThat(bits(slope)).isNotEqualTo(bits(-0.0));
                }
            }
        }
    }

    private static long bits(double v) {
        return Double.doubleToRawLongBits(v);
    }
}
