package org.annalist.analysis.breaks;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.junit.jupiter.api.Test;

class PeltTest {

    private static double[] steps(long seed, int n, double sd, double... levelsEvery1000) {
        Random random = new Random(seed);
        double[] y = new double[n];
        for (int t = 0; t < n; t++) {
            y[t] = levelsEvery1000[Math.min(levelsEvery1000.length - 1, t / 1000)] + sd * random.nextGaussian();
        }
        return y;
    }

    @Test
    void findsLevelShiftsWhereTheyAre() {
        Pelt.Result r = Pelt.fit(steps(1, 3650, 2, 10, 14, 11, 11), 7);
        assertThat(r.starts()).hasSize(2);
        assertThat(r.starts()[0]).isBetween(995, 1005);
        assertThat(r.starts()[1]).isBetween(1995, 2005);
    }

    @Test
    void resultsCopyTheirBreaksInAndOut() {
        Pelt.Result r = Pelt.fit(steps(1, 3650, 2, 10, 14, 11, 11), 7);
        int[] first = r.starts();
        first[0] = -1;
        assertThat(r.starts()[0]).isBetween(995, 1005);
        int[] given = {5, 9};
        Pelt.Result made = new Pelt.Result(given, 1, 1);
        given[0] = 7;
        assertThat(made.starts()).containsExactly(5, 9);
        assertThat(made).isEqualTo(new Pelt.Result(new int[] {5, 9}, 1, 1));
    }

    @Test
    void theUnitsDoNotChangeTheBreaks() {
        double[] y = steps(2, 2000, 1, 5, 6);
        double[] scaled = y.clone();
        for (int i = 0; i < scaled.length; i++) {
            scaled[i] *= 1000;
        }
        assertThat(Pelt.fit(scaled, 7).starts()).containsExactly(Pelt.fit(y, 7).starts());
    }

    @Test
    void noiseAloneHasNoBreak() {
        for (long seed = 3; seed < 8; seed++) {
            assertThat(Pelt.fit(steps(seed, 3000, 1, 0), 7).starts()).as("seed %d", seed).isEmpty();
        }
    }

    @Test
    void prunedSearchEqualsTheFullSearchOnASmallSeries() {
        // Optimal partitioning without pruning (Jackson et al. 2005), written out here: PELT must match it.
        double[] y = steps(9, 200, 1, 0);
        for (int t = 60; t < 130; t++) {
            y[t] += 3;
        }
        int h = 5;
        SegmentCost cost = new SegmentCost(y, BaiPerron.Model.LEVEL);
        double sd = Pelt.robustNoiseSd(y);
        double beta = 3 * Math.log(y.length);
        double[] f = new double[y.length + 1];
        int[] last = new int[y.length + 1];
        java.util.Arrays.fill(f, Double.POSITIVE_INFINITY);
        f[0] = -beta;
        for (int t = h; t <= y.length; t++) {
            for (int tau = 0; tau <= t - h; tau++) {
                if (tau != 0 && tau < h) {
                    continue;
                }
                double v = f[tau] + cost.rss(tau, t - 1) / (sd * sd) + beta;
                if (v < f[t]) {
                    f[t] = v;
                    last[t] = tau;
                }
            }
        }
        java.util.List<Integer> full = new java.util.ArrayList<>();
        for (int t = last[y.length]; t > 0; t = last[t]) {
            full.add(0, t);
        }
        assertThat(Pelt.fit(y, h).starts()).containsExactly(full.stream().mapToInt(Integer::intValue).toArray());
        assertThat(full).containsExactly(60, 130);
    }
}
