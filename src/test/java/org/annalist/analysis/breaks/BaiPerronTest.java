package org.annalist.analysis.breaks;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class BaiPerronTest {

    /**
     * The dynamic programme of Bai and Perron (2003, §3) written out plainly: the full table of
     * segment costs, then, one number of breaks after another, every end's optimum, the earliest
     * of equal minima. The fit must give the same partitions, RSS and BIC, bit for bit.
     */
    private static List<BaiPerron.Segmentation> plainProgramme(double[] y, BaiPerron.Model model, int h, int maxBreaks) {
        int n = y.length;
        SegmentCost cost = new SegmentCost(y, model);
        int maxM = Math.min(maxBreaks, Math.max(0, (int) Math.ceil(n / (double) h) - 2));
        double[][] table = new double[n][n];
        for (int j = 0; j < n; j++) {
            for (int s = 0; s <= j; s++) {
                table[s][j] = cost.rss(s, j);
            }
        }
        double[][] best = new double[maxM + 1][n];
        int[][] from = new int[maxM + 1][n];
        for (double[] row : best) {
            Arrays.fill(row, Double.POSITIVE_INFINITY);
        }
        for (int j = h - 1; j < n; j++) {
            best[0][j] = table[0][j];
        }
        for (int m = 1; m <= maxM; m++) {
            for (int j = 0; j < n; j++) {
                for (int i = m * h - 1; i <= j - h; i++) {
                    double candidate = best[m - 1][i] + table[i + 1][j];
                    if (candidate < best[m][j]) {
                        best[m][j] = candidate;
                        from[m][j] = i;
                    }
                }
            }
        }
        double observed = cost.observed(0, n - 1);
        int k = cost.parameters();
        List<BaiPerron.Segmentation> byBreaks = new ArrayList<>();
        for (int m = 0; m <= maxM && best[m][n - 1] < Double.POSITIVE_INFINITY; m++) {
            int[] starts = new int[m];
            for (int b = m, j = n - 1; b >= 1; b--) {
                starts[b - 1] = from[b][j] + 1;
                j = from[b][j];
            }
            double rss = best[m][n - 1];
            double logLik = -observed / 2 * (Math.log(rss) + 1 - Math.log(observed) + Math.log(2 * Math.PI));
            double bic = -2 * logLik + Math.log(observed) * (k + 1) * (m + 1);
            byBreaks.add(new BaiPerron.Segmentation(m, starts, rss, bic));
        }
        return byBreaks;
    }

    private static double[] stepsAndTrends(long seed, int n, boolean gaps) {
        Random random = new Random(seed);
        double[] y = new double[n];
        double level = 50;
        double slope = 0.2;
        for (int t = 0; t < n; t++) {
            if (random.nextInt(40) == 0) {
                level += 10 * random.nextGaussian();
                slope = 0.3 * random.nextGaussian();
            }
            level += slope;
            y[t] = gaps && random.nextInt(8) == 0 ? Double.NaN : level + random.nextGaussian();
        }
        return y;
    }

    @Test
    void everyNumberOfBreaksGetsTheOptimumOfTheFullTableOfCosts() {
        for (BaiPerron.Model model : BaiPerron.Model.values()) {
            for (int h : new int[] {3, 12, 25}) {
                for (long seed = 1; seed <= 4; seed++) {
                    double[] y = stepsAndTrends(seed, 60 + 60 * (int) seed, seed % 2 == 0);
                    for (int maxBreaks : new int[] {0, 2, BaiPerron.DEFAULT_MAX_BREAKS}) {
                        BaiPerron.Result fit = BaiPerron.withMinimumRegime(h).with(model).withMaxBreaks(maxBreaks).fit(y);
                        assertThat(fit.byBreaks()).as("%s, h = %d, seed %d, at most %d breaks", model, h, seed, maxBreaks)
                                .isEqualTo(plainProgramme(y, model, h, maxBreaks));
                    }
                }
            }
        }
    }

    @Test
    void bothModelsTogetherAreEachModelsOwnFit() {
        for (long seed = 1; seed <= 4; seed++) {
            double[] y = stepsAndTrends(seed, 100 + 50 * (int) seed, seed % 2 == 1);
            for (int[] minima : new int[][] {{3, 3}, {12, 12}, {2, 3}, {12, 13}}) {
                BaiPerron.BothModels both = BaiPerron.fitBothModels(y, minima[0], minima[1]);
                assertThat(both.level()).as("seed %d, minimum regimes %s", seed, Arrays.toString(minima))
                        .isEqualTo(BaiPerron.withMinimumRegime(minima[0]).fit(y));
                assertThat(both.levelAndSlope()).as("seed %d, minimum regimes %s", seed, Arrays.toString(minima))
                        .isEqualTo(BaiPerron.withMinimumRegime(minima[1]).with(BaiPerron.Model.LEVEL_AND_SLOPE).fit(y));
            }
        }
    }

    @Test
    void equalCostsGoToTheEarliestBreaks() {
        double[] flat = new double[100];
        Arrays.fill(flat, 3);
        BaiPerron.Result fit = BaiPerron.withMinimumRegime(10).withMaxBreaks(3).fit(flat);
        assertThat(fit.byBreaks().get(1).starts()).containsExactly(10);
        assertThat(fit.byBreaks().get(3).starts()).containsExactly(10, 20, 30);
        assertThat(fit.byBreaks()).isEqualTo(plainProgramme(flat, BaiPerron.Model.LEVEL, 10, 3));
    }
}
