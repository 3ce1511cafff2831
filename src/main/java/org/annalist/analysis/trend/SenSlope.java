package org.annalist.analysis.trend;

import java.util.HashMap;
import java.util.Map;
import java.util.TreeSet;
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
        return interval(slopes, periodsPerYear, varianceS, false);
    }

    /** The seasonal Sen slope [3]: within-season pairs only, time in years. */
    public static Result seasonal(double[] x, int period, double varianceS) {
        double[] slopes = pairwise(x, period);
        return interval(slopes, period, varianceS, true);
    }

    /**
     * The pairwise slopes of a series, computed once: their median (which the serial-correlation
     * correction of the Kendall test needs first) and then the estimate with its interval.
     */
    public static final class Pairwise {
        private final double[] slopes;

        private Pairwise(double[] slopes) {
            this.slopes = slopes;
        }

        /** Median slope per period. */
        public double medianPerStep() {
            return medianOf(slopes);
        }

        /** The estimate per year with the Gilbert interval from {@code varianceS}. */
        public Result estimate(double periodsPerYear, double varianceS) {
            return interval(slopes, periodsPerYear, varianceS, false);
        }
    }

    public static Pairwise pairwise(double[] x) {
        return new Pairwise(pairwise(x, 1));
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
        for (int i = 0; i < n; i++) {
            if (!Double.isNaN(x[i])) {
                for (int j = i + stride; j < n; j += stride) {
                    if (!Double.isNaN(x[j])) {
                        // [1] the pair's slope over the real time between them ([3] with stride = period)
                        slopes[k++] = (x[j] - x[i]) / (j - i);
                    }
                }
            }
        }
        return slopes;
    }

    private static Result interval(double[] slopes, double periodsPerYear, double varianceS, boolean seasonal) {
        int pairs = slopes.length;
        // [2] §16.5: C = z_{0.975} √Var(S); limits at ranks M1 = (N′ − C)/2 and M2 + 1 = (N′ + C)/2 + 1
        double c = Z_975 * Math.sqrt(varianceS);
        double lowerRank = clip((pairs - c) / 2, pairs);
        double upperRank = clip((pairs + c) / 2 + 1, pairs);
        // Only the order statistics the estimate needs: the median and the neighbours of each limit's rank.
        TreeSet<Integer> ranks = new TreeSet<>();
        ranks.add((pairs - 1) / 2);
        ranks.add(pairs / 2);
        for (double r : new double[] {lowerRank, upperRank}) {
            ranks.add((int) Math.floor(r) - 1);
            ranks.add(Math.min(pairs - 1, (int) Math.floor(r)));
        }
        int[] wanted = ranks.stream().mapToInt(Integer::intValue).toArray();
        double[] values = OrderStatistics.select(slopes, wanted);
        Map<Integer, Double> at = new HashMap<>();
        for (int i = 0; i < wanted.length; i++) {
            at.put(wanted[i], values[i]);
        }
        // [1] the median of the slopes (the mean of the two middle ones for an even count)
        double median = (at.get((pairs - 1) / 2) + at.get(pairs / 2)) / 2;
        return new Result(median * periodsPerYear, atRank(at, lowerRank, pairs) * periodsPerYear,
                atRank(at, upperRank, pairs) * periodsPerYear, pairs, seasonal);
    }

    private static double clip(double rank, int pairs) {
        return Math.max(1, Math.min(pairs, rank));
    }

    /** The value at 1-based rank {@code r}, interpolated linearly between its neighbours (our rule). */
    private static double atRank(Map<Integer, Double> at, double r, int pairs) {
        int below = (int) Math.floor(r);
        if (below >= pairs) {
            return at.get(pairs - 1);
        }
        return at.get(below - 1) + (r - below) * (at.get(below) - at.get(below - 1));
    }
}
