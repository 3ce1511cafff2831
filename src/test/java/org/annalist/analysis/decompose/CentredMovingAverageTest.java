package org.annalist.analysis.decompose;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class CentredMovingAverageTest {

    /** Rows of decompose_AirPassengers.csv: index, period, x, trend, seasonal, random. */
    private static List<String[]> reference() throws IOException {
        try (InputStream in = CentredMovingAverageTest.class.getResourceAsStream("/reference/decompose_AirPassengers.csv")) {
            String[] lines = new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n");
            List<String[]> rows = new ArrayList<>();
            for (int i = 1; i < lines.length; i++) {
                rows.add(lines[i].split(",", -1));
            }
            return rows;
        }
    }

    @Test
    void twoByTwelveAverageMatchesTheTrendOfRsDecompose() throws IOException {
        // R 4.2.2: decompose(AirPassengers, type = "multiplicative")$trend, the 2x12 centred moving average.
        List<String[]> rows = reference();
        double[] x = rows.stream().mapToDouble(r -> Double.parseDouble(r[2])).toArray();
        CentredMovingAverage.Result ma = CentredMovingAverage.of(x, 12);
        double[] trend = ma.trendCycle();
        for (int i = 0; i < rows.size(); i++) {
            String expected = rows.get(i)[3];
            if (expected.isEmpty()) {
                assertThat(trend[i]).as("no centred window at %s", rows.get(i)[1]).isNaN();
            } else {
                assertThat(trend[i]).as(rows.get(i)[1]).isCloseTo(Double.parseDouble(expected), within(1e-9));
            }
        }
        assertThat(ma.window()).isEqualTo(12);
    }

    @Test
    void oddWindowIsAPlainCentredMean() {
        double[] smooth = CentredMovingAverage.of(new double[] {1, 2, 3, 4, 5, 6, 7}, 7).trendCycle();
        assertThat(smooth[3]).isCloseTo(4.0, within(1e-12));
        assertThat(smooth[2]).isNaN();
    }

    @Test
    void aMissingValueBlanksEveryWindowThatHoldsIt() {
        double[] x = {1, 2, 3, 4, Double.NaN, 6, 7, 8, 9, 10, 11};
        double[] smooth = CentredMovingAverage.of(x, 4).trendCycle();   // 2x4: windows of 5 values
        assertThat(smooth[2]).isNaN();
        assertThat(smooth[6]).isNaN();
        assertThat(smooth[7]).isCloseTo((0.5 * 6 + 7 + 8 + 9 + 0.5 * 10) / 4, within(1e-12));
    }

    @Test
    void tooShortForTheWindow() {
        assertThatThrownBy(() -> CentredMovingAverage.of(new double[12], 12)).hasMessageContaining("at least 13 values");
    }
}
