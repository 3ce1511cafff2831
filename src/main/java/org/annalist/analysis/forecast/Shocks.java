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

    /** {@value #PATHS} paths × h steps of the outlook's draws. */
    static double[][] forHorizon(int h) {
        return standardNormals(PATHS, h, SEED);
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
