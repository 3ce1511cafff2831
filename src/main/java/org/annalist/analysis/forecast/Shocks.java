package org.annalist.analysis.forecast;

import org.annalist.analysis.SeededNormals;

/**
 * The standard normal draws that drive every simulated path of the outlook: {@value #PATHS} paths,
 * from a fixed seed, the same for the same horizon, so that every method's paths share them
 * (common shocks) and every run gives the same intervals.
 */
final class Shocks {

    /** Simulated paths per forecast: enough for stable 2.5 % and 97.5 % quantiles. */
    static final int PATHS = 2000;
    /** A fixed seed: the intervals are reproducible to the bit. */
    private static final long SEED = 20_261_202L;

    private Shocks() {
    }

    /** The horizons whose draws are kept once made: the outlook's usual ones, a few hundred kilobytes each. */
    private static final int KEPT_HORIZONS = 60;
    private static final java.util.concurrent.atomic.AtomicReferenceArray<double[][]> KEPT =
            new java.util.concurrent.atomic.AtomicReferenceArray<>(KEPT_HORIZONS + 1);

    /**
     * {@value #PATHS} paths × h steps of the outlook's draws, made once per horizon up to
     * {@value #KEPT_HORIZONS} and shared: the caller must only read them.
     */
    static double[][] forHorizon(int h) {
        if (h > KEPT_HORIZONS) {
            return standardNormals(PATHS, h, SEED);
        }
        double[][] kept = KEPT.get(h);
        if (kept == null) {
            kept = standardNormals(PATHS, h, SEED);
            KEPT.compareAndSet(h, null, kept);
        }
        return kept;
    }

    /** Standard normal draws, row by row, from {@code seed}. */
    static double[][] standardNormals(int paths, int h, long seed) {
        SeededNormals random = new SeededNormals(seed);
        double[][] z = new double[paths][h];
        for (double[] row : z) {
            for (int k = 0; k < h; k++) {
                row[k] = random.next();
            }
        }
        return z;
    }
}
