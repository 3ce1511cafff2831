package org.annalist.analysis;

/**
 * Standard normal draws from a seed, exactly the sequence {@code new java.util.Random(seed)}
 * gives with {@code nextGaussian()}, without its locking.
 *
 * <p>The Monte Carlo nulls and simulated paths draw hundreds of thousands of normals per series;
 * {@code java.util.Random} takes a lock and a compare-and-set for every draw, which made those
 * draws most of the cost of a break test. The algorithm is the one {@code java.util.Random}
 * specifies in its documentation [4]: the 48-bit linear congruential generator of Knuth [1]
 * §3.2.1 with multiplier 0x5DEECE66D and increment 11, doubles from 53 bits, and the polar method
 * of Box, Muller and Marsaglia [2, 3] ([1] §3.4.1, subsection C, Algorithm P) with
 * {@code StrictMath}, so that every seeded result stays as it was. One instance serves one thread.
 *
 * <p>References:
 * <ol>
 * <li>D. E. Knuth (1997), <i>The Art of Computer Programming</i>, Vol. 2: <i>Seminumerical
 *     Algorithms</i>, 3rd ed., Addison-Wesley.</li>
 * <li>G. E. P. Box and M. E. Muller (1958), "A Note on the Generation of Random Normal Deviates",
 *     <i>Annals of Mathematical Statistics</i> 29(2), 610–611. doi:10.1214/aoms/1177706645</li>
 * <li>G. Marsaglia and T. A. Bray (1964), "A Convenient Method for Generating Normal Variables",
 *     <i>SIAM Review</i> 6(3), 260–264. doi:10.1137/1006063</li>
 * <li>Oracle, <i>Java SE 17 API Specification</i>, {@code java.util.Random}: {@code next(int)},
 *     {@code nextDouble()} and {@code nextGaussian()}.</li>
 * </ol>
 */
public final class SeededNormals {

    private static final long MULTIPLIER = 0x5DEECE66DL;
    private static final long INCREMENT = 0xBL;
    private static final long MASK = (1L << 48) - 1;
    private static final double DOUBLE_UNIT = 0x1.0p-53;

    private long state;
    private double spare;
    private boolean hasSpare;

    public SeededNormals(long seed) {
        // [4] the seed scrambled as Random(long) does
        state = (seed ^ MULTIPLIER) & MASK;
    }

    /** The next standard normal draw. */
    public double next() {
        if (hasSpare) {
            hasSpare = false;
            return spare;
        }
        double v1;
        double v2;
        double s;
        // [1] §3.4.1 C, Algorithm P: a point uniform in the unit disc, by rejection
        do {
            v1 = 2 * nextDouble() - 1;
            v2 = 2 * nextDouble() - 1;
            s = v1 * v1 + v2 * v2;
        } while (s >= 1 || s == 0);
        // [3] two independent normals v·√(−2 ln s / s); the second is kept for the next call
        double multiplier = StrictMath.sqrt(-2 * StrictMath.log(s) / s);
        spare = v2 * multiplier;
        hasSpare = true;
        return v1 * multiplier;
    }

    private double nextDouble() {
        // [4] nextDouble(): 26 + 27 bits, times 2^−53
        return (((long) bits(26) << 27) + bits(27)) * DOUBLE_UNIT;
    }

    private int bits(int count) {
        // [1] §3.2.1: x ← (a x + c) mod 2^48, the top bits returned ([4] next(int))
        state = (state * MULTIPLIER + INCREMENT) & MASK;
        return (int) (state >>> (48 - count));
    }
}
