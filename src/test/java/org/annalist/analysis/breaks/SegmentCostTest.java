package org.annalist.analysis.breaks;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

class SegmentCostTest {

    /** A random walk with a gap of missing values, scattered missing values and a flat stretch. */
    private static double[] awkwardSeries(long seed, int n) {
        Random random = new Random(seed);
        double[] y = new double[n];
        double level = 100;
        for (int t = 0; t < n; t++) {
            level += random.nextGaussian();
            y[t] = level + 0.1 * t * random.nextGaussian();
        }
        for (int t = n / 3; t < n / 3 + 5; t++) {
            y[t] = Double.NaN;
        }
        for (int t = 2 * n / 3; t < 2 * n / 3 + 6; t++) {
            y[t] = 7;
        }
        for (int t = 3; t < n; t += 17) {
            y[t] = Double.NaN;
        }
        return y;
    }

    @Test
    void aRowOfCostsHoldsEachSegmentsOwnCostBitForBit() {
        for (BaiPerron.Model model : BaiPerron.Model.values()) {
            for (long seed = 1; seed <= 3; seed++) {
                double[] y = awkwardSeries(seed, 150);
                SegmentCost cost = new SegmentCost(y, model);
                for (int to = 0; to < y.length; to++) {
                    double[] row = new double[y.length];
                    cost.rssEndingAt(to, 0, to, row);
                    for (int from = 0; from <= to; from++) {
                        assertThat(Double.doubleToRawLongBits(row[from]))
                                .as("%s, seed %d, segment %d..%d", model, seed, from, to)
                                .isEqualTo(Double.doubleToRawLongBits(cost.rss(from, to)));
                    }
                }
            }
        }
    }

    @Test
    void theLinesRowComesWithTheLevelModelsRowBitForBit() {
        for (long seed = 1; seed <= 3; seed++) {
            double[] y = awkwardSeries(seed, 150);
            SegmentCost line = new SegmentCost(y, BaiPerron.Model.LEVEL_AND_SLOPE);
            SegmentCost level = new SegmentCost(y, BaiPerron.Model.LEVEL);
            for (int to = 0; to < y.length; to++) {
                double[] lineRow = new double[y.length];
                double[] levelRow = new double[y.length];
                line.rssEndingAt(to, 0, to, lineRow, levelRow);
                for (int from = 0; from <= to; from++) {
                    assertThat(Double.doubleToRawLongBits(lineRow[from])).as("line, seed %d, %d..%d", seed, from, to)
                            .isEqualTo(Double.doubleToRawLongBits(line.rss(from, to)));
                    assertThat(Double.doubleToRawLongBits(levelRow[from])).as("level, seed %d, %d..%d", seed, from, to)
                            .isEqualTo(Double.doubleToRawLongBits(level.rss(from, to)));
                }
            }
        }
    }

    @Test
    void aRowOfCostsFillsOnlyTheStartsAskedFor() {
        double[] y = awkwardSeries(4, 40);
        SegmentCost cost = new SegmentCost(y, BaiPerron.Model.LEVEL_AND_SLOPE);
        double[] row = new double[y.length];
        Arrays.fill(row, -1);
        cost.rssEndingAt(30, 10, 20, row);
        for (int from = 0; from < y.length; from++) {
            if (from >= 10 && from <= 20) {
                assertThat(row[from]).as("start %d", from).isEqualTo(cost.rss(from, 30));
            } else {
                assertThat(row[from]).as("start %d", from).isEqualTo(-1);
            }
        }
    }
}
