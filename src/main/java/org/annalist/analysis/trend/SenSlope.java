package org.annalist.analysis.trend;

import java.util.Arrays;
import org.annalist.analysis.CentralBand;
import org.annalist.analysis.OrderStatistics;
import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * Sen's slope, the median of all pairwise slopes {@code (x_j − x_i)/(t_j − t_i)} [1], with the
 * rank-based 95 % interval of Gilbert [2].
 *
 * <p>Time is the position in the series, so a missing period keeps its place and slopes use the
 * real time between observations [1]. The seasonal form uses only pairs of the same season in
 * different years [3].
 *
 * <p>Interval ([2] §16.5): with N′ slopes sorted and C = z_{0.975}·√Var(S), the limits are the
 * slopes of rank M1 = (N′ − C)/2 and M2 + 1 = (N′ + C)/2 + 1 (ranks from 1). The level 95 % is
 * common practice. Ranks outside 1 … N′ are clipped to it, and fractional ranks are interpolated
 * linearly between neighbouring slopes, not rounded (both our rules).
 *
 * <p>References:
 * <ol>
 * <li>P. K. Sen (1968), "Estimates of the Regression Coefficient Based on Kendall's Tau",
 *     <i>Journal of the American Statistical Association</i> 63(324), 1379–1389.
 *     doi:10.1080/01621459.1968.10480934</li>
 * <li>R. O. Gilbert (1987), <i>Statistical Methods for Environmental Pollution Monitoring</i>,
 *     Van Nostrand Reinhold, New York, ch. 16.</li>
 * <li>R. M. Hirsch, J. R. Slack and R. A. Smith (1982), "Techniques of Trend Analysis for Monthly
 *     Water Quality Data", <i>Water Resources Research</i> 18(1), 107–121.
 *     doi:10.1029/WR018i001p00107</li>
 * </ol>
 */
public final class SenSlope {

    /**
     * @param perYear   the slope in series units per year
     * @param lower95   lower 95 % limit per year
     * @param upper95   upper 95 % limit per year
     * @param pairs     number of pairwise slopes (N′)
     */
    public record Result(double perYear, double lower95, double upper95, int pairs, boolean seasonal) {
    }

    /**
     * Pairwise slopes are held in memory; beyond this count the caller should aggregate first (our
     * rule: 160 MB of slopes).
     */
    public static final int MAX_PAIRS = 20_000_000;
    private static final double Z_975 = new NormalDistribution(null, 0, 1).inverseCumulativeProbability(0.975);

    private SenSlope() {
    }

    /**
     * @param periodsPerYear periods in a year, to express the slope per year
     * @param varianceS      Var(S) of the Kendall test on the same values (ties and any serial
     *                       correction included), which sets the width of the interval
     */
    public static Result of(double[] x, double periodsPerYear, double varianceS) {
        double[] slopes = pairwise(x, 1);
        return interval(slopes, null, periodsPerYear, varianceS, false);
    }

    /** The seasonal Sen slope [3]: within-season pairs only, time in years. */
    public static Result seasonal(double[] x, int period, double varianceS) {
        double[] slopes = pairwise(x, period);
        return interval(slopes, null, period, varianceS, true);
    }

    /**
     * How far beyond the median's core (about 4.7 % of the slopes either side of the middle for
     * the 28,680 slopes of 20 monthly years) the median's pass keeps slopes for the interval
     * limits, as a fraction of the slopes. Gilbert's limits lie C/2 ranks from the middle; on 2,000
     * monthly series of 20 years C/N′ (with the serial correction) ran from 0.07 to 0.21, half of
     * them below 0.1, so most limits lie within 10 % of the middle. Of reaches 0.03, 0.05, 0.07 and
     * 0.11, 0.05 took the least time on those series (our rule); limits further out are selected
     * from all the slopes in a pass of their own, exactly as well.
     */
    private static final double LIMITS_REACH = 0.05;

    /**
     * The pairwise slopes of a series, computed once: their median (which the serial-correlation
     * correction of the Kendall test needs first) and then the estimate with its interval. The
     * median's pass over the slopes keeps those around the middle ({@link CentralBand}), from which
     * the interval's limits are then selected without another pass.
     */
    public static final class Pairwise {
        private final double[] slopes;
        /**
         * No slope is NaN or −0.0 ({@link #slopesHaveOneBitPatternPerValue}): every order statistic
         * then has one bit pattern whichever search finds it, so the kept band may serve the
         * limits. Otherwise they are selected as they always were, for the same bits.
         */
        private final boolean oneBitPatternPerValue;
        /** The slopes around the median, kept by {@link #medianPerStep} for {@link #estimate}; null until then. */
        private CentralBand middle;

        private Pairwise(double[] slopes, boolean oneBitPatternPerValue) {
            this.slopes = slopes;
            this.oneBitPatternPerValue = oneBitPatternPerValue;
        }

        /** Median slope per period. */
        public double medianPerStep() {
            if (oneBitPatternPerValue) {
                middle = CentralBand.around(slopes, LIMITS_REACH);
                int n = slopes.length;
                int[] ranks = n % 2 == 1 ? new int[] {n / 2} : new int[] {n / 2 - 1, n / 2};
                double[] values = new double[ranks.length];
                if (middle != null && middle.select(ranks, values)) {
                    // [1] the median of the pairwise slopes, as medianOf takes it
                    return n % 2 == 1 ? values[0] : (values[0] + values[1]) / 2;
                }
            }
            return medianOf(slopes);
        }

        /** The estimate per year with the Gilbert interval from {@code varianceS}. */
        public Result estimate(double periodsPerYear, double varianceS) {
            return interval(slopes, middle, periodsPerYear, varianceS, false);
        }
    }

    public static Pairwise pairwise(double[] x) {
        return new Pairwise(pairwise(x, 1), slopesHaveOneBitPatternPerValue(x));
    }

    /** Values of this size or more (or +0.0) give pairwise slopes of one bit pattern per value. */
    private static final double SMALLEST_PLAIN = 0x1p-960;

    /**
     * Whether no pairwise slope of {@code x} can be NaN or −0.0. With finite observed values each
     * +0.0 or at least 2^−960 in size: two equal values differ by +0.0, two unequal ones (multiples
     * of 2^−1012 both) by at least 2^−1012, which over fewer than 2^31 steps still rounds to a
     * non-zero slope; and no difference of finite values is NaN (one that overflows is ±∞, of one
     * bit pattern each).
     */
    static boolean slopesHaveOneBitPatternPerValue(double[] x) {
        for (double v : x) {
            if (Double.isNaN(v)) {
                continue;   // missing: it makes no slope
            }
            if (Double.isInfinite(v) || (v == 0 ? Double.doubleToRawLongBits(v) != 0 : Math.abs(v) < SMALLEST_PLAIN)) {
                return false;
            }
        }
        return true;
    }

    /** Median slope per step of a gap-free sequence (used to detrend in the Hamed–Rao correction). */
    static double medianSlope(double[] x) {
        return medianOf(pairwise(x, 1));
    }

    private static double medianOf(double[] slopes) {
        int n = slopes.length;
        // [1] the median of the pairwise slopes
        double[] middle = n % 2 == 1 ? OrderStatistics.select(slopes, n / 2)
                : OrderStatistics.select(slopes, n / 2 - 1, n / 2);
        return n % 2 == 1 ? middle[0] : (middle[0] + middle[1]) / 2;
    }

    /** Pairs of observed values {@code (i, j)} that lie a multiple of {@code stride} apart. */
    public static long pairs(double[] x, int stride) {
        // two positions lie a multiple of the stride apart when they leave the same remainder: each
        // remainder's m observed values make m(m − 1)/2 pairs
        long[] observed = new long[stride];
        for (int i = 0; i < x.length; i++) {
            if (!Double.isNaN(x[i])) {
                observed[i % stride]++;
            }
        }
        long count = 0;
        for (long m : observed) {
            count += m * (m - 1) / 2;
        }
        return count;
    }

    /** Slopes per step of pairs {@code (i, j)} that lie a multiple of {@code stride} apart. */
    private static double[] pairwise(double[] x, int stride) {
        int n = x.length;
        long count = pairs(x, stride);
        if (count > MAX_PAIRS) {
            throw new IllegalArgumentException("Sen's slope over " + count + " pairs exceeds " + MAX_PAIRS
                    + "; aggregate the series first");
        }
        if (count == 0) {
            throw new IllegalArgumentException("Sen's slope needs at least one pair of values");
        }
        double[] slopes = new double[(int) count];
        int k = 0;
        if (stride == 1 && count == (long) n * (n - 1) / 2) {
            // no value missing: the same slopes in the same order, without testing each value for NaN
            for (int i = 0; i < n; i++) {
                double first = x[i];
                for (int j = i + 1; j < n; j++) {
                    // [1] the pair's slope over the time between them
                    slopes[k++] = (x[j] - first) / (j - i);
                }
            }
            return slopes;
        }
        for (int i = 0; i < n; i++) {
            double first = x[i];
            if (!Double.isNaN(first)) {
                for (int j = i + stride; j < n; j += stride) {
                    double second = x[j];
                    if (!Double.isNaN(second)) {
                        // [1] the pair's slope over the real time between them ([3] with stride = period)
                        slopes[k++] = (second - first) / (j - i);
                    }
                }
            }
        }
        return slopes;
    }

    /**
     * @param middle the slopes around the median kept by its pass, to select the limits from (null
     *               when there are none, or when the slopes may hold −0.0 or NaN)
     */
    private static Result interval(double[] slopes, CentralBand middle, double periodsPerYear, double varianceS,
                                   boolean seasonal) {
        int pairs = slopes.length;
        // [2] §16.5: C = z_{0.975} √Var(S); limits at ranks M1 = (N′ − C)/2 and M2 + 1 = (N′ + C)/2 + 1
        double c = Z_975 * Math.sqrt(varianceS);
        double lowerRank = clip((pairs - c) / 2, pairs);
        double upperRank = clip((pairs + c) / 2 + 1, pairs);
        // Only the order statistics the estimate needs: the median and the neighbours of each limit's rank.
        int[] wanted = ascendingDistinct((pairs - 1) / 2, pairs / 2, (int) Math.floor(lowerRank) - 1,
                Math.min(pairs - 1, (int) Math.floor(lowerRank)), (int) Math.floor(upperRank) - 1,
                Math.min(pairs - 1, (int) Math.floor(upperRank)));
        double[] values = new double[wanted.length];
        if (middle == null || !middle.select(wanted, values)) {
            values = OrderStatistics.select(slopes, wanted);
        }
        // [1] the median of the slopes (the mean of the two middle ones for an even count)
        double median = (valueAt(wanted, values, (pairs - 1) / 2) + valueAt(wanted, values, pairs / 2)) / 2;
        return new Result(median * periodsPerYear, atRank(wanted, values, lowerRank, pairs) * periodsPerYear,
                atRank(wanted, values, upperRank, pairs) * periodsPerYear, pairs, seasonal);
    }

    /** The ranks in ascending order, each once. */
    private static int[] ascendingDistinct(int... ranks) {
        int[] sorted = ranks.clone();
        Arrays.sort(sorted);
        int distinct = 0;
        for (int rank : sorted) {
            if (distinct == 0 || rank != sorted[distinct - 1]) {
                sorted[distinct++] = rank;
            }
        }
        return Arrays.copyOf(sorted, distinct);
    }

    /** The selected value of {@code rank}, one of {@code wanted}. */
    private static double valueAt(int[] wanted, double[] values, int rank) {
        int i = 0;
        while (wanted[i] != rank) {
            i++;
        }
        return values[i];
    }

    private static double clip(double rank, int pairs) {
        return Math.max(1, Math.min(pairs, rank));
    }

    /** The value at 1-based rank {@code r}, interpolated linearly between its neighbours (our rule). */
    private static double atRank(int[] wanted, double[] values, double r, int pairs) {
        int below = (int) Math.floor(r);
        if (below >= pairs) {
            return valueAt(wanted, values, pairs - 1);
        }
        double lowerValue = valueAt(wanted, values, below - 1);
        return lowerValue + (r - below) * (valueAt(wanted, values, below) - lowerValue);
    }
}
