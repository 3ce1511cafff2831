package org.annalist.analysis;

/**
 * Standard normal draws from a seed, exactly the sequence {@code new java.util.Random(seed)}
 * gives with {@code nextGaussian()}, without its locking.
 *
 * <p>The Monte Carlo nulls and simulated paths draw hundreds of thousands of normals per series;
 * {@code java.util.Random} takes a lock and a compare-and-set for every draw, which made those
 * draws most of the cost of a break test. The algorithm is the one {@code java.util.Random}
 * specifies in its documentation: the 48-bit linear congruential generator of Knuth (TAOCP vol. 2,
 * §3.2.1) with multiplier 0x5DEECE66D and increment 11, doubles from 53 bits, and the polar method
 * of Box, Muller and Marsaglia (Knuth, §3.4.1, Algorithm C) with {@code StrictMath}, so that every
 * seeded result stays as it was. One instance serves one thread.
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
        do {
            v1 = 2 * nextDouble() - 1;
            v2 = 2 * nextDouble() - 1;
            s = v1 * v1 + v2 * v2;
        } while (s >= 1 || s == 0);
        double multiplier = StrictMath.sqrt(-2 * StrictMath.log(s) / s);
        spare = v2 * multiplier;
        hasSpare = true;
        return v1 * multiplier;
    }

    private double nextDouble() {
        return (((long) bits(26) << 27) + bits(27)) * DOUBLE_UNIT;
    }

    private int bits(int count) {
        state = (state * MULTIPLIER + INCREMENT) & MASK;
        return (int) (state >>> (48 - count));
    }
}
