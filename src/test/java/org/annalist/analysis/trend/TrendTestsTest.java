package org.annalist.analysis.trend;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Map;
import org.annalist.analysis.Reference;
import org.assertj.core.data.Offset;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Kendall statistics and Sen slopes against the reference results computed in R 4.2.2 from the
 * textbook formulas and checked there against {@code cor.test(method = "kendall")} (files
 * mann_kendall.csv, seasonal_kendall_*.csv, sen_slope.csv; see reference-data/README.md b–d).
 */
class TrendTestsTest {

    private static double d(Map<String, String> row, String column) {
        return Double.parseDouble(row.get(column));
    }

    private static Offset<Double> relative(double expected) {
        return within(Math.max(Math.abs(expected), 1e-300) * 1e-9);
    }

    @ParameterizedTest
    @ValueSource(strings = {"AirPassengers", "co2", "Nile", "UKgas", "nottem", "sunspot.year"})
    void mannKendallMatchesTheReference(String dataset) {
        Map<String, String> ref = Reference.csv("mann_kendall.csv").row(dataset);
        MannKendall.Result r = MannKendall.test(Reference.dataset(dataset + ".csv"), MannKendall.Correction.NONE);
        assertThat(r.test().n()).isEqualTo((int) d(ref, "n"));
        assertThat((double) r.s()).isEqualTo(d(ref, "S"));
        assertThat(r.varianceTies()).isCloseTo(d(ref, "var_S_ties"), relative(d(ref, "var_S_ties")));
        assertThat(r.tau()).isCloseTo(d(ref, "tau_a"), within(1e-12));
        assertThat(r.test().statistic()).isCloseTo(d(ref, "formula_z_cc"), within(1e-10));
        // R's cor.test gives the same z (the time index has no ties); p compared relatively.
        assertThat(r.test().statistic()).isCloseTo(d(ref, "cortest_z_cc"), within(1e-8));
        double p = d(ref, "formula_p_cc");
        assertThat(r.test().pValue()).isCloseTo(p, within(p * 1e-6));
    }

    @ParameterizedTest
    @ValueSource(strings = {"AirPassengers", "co2", "UKgas", "nottem"})
    void seasonalKendallMatchesTheReference(String dataset) {
        Map<String, String> ref = Reference.csv("seasonal_kendall_summary.csv").row(dataset);
        int period = (int) d(ref, "seasons");
        SeasonalKendall.Result r = SeasonalKendall.test(Reference.dataset(dataset + ".csv"), period).orElseThrow();
        assertThat((double) r.s()).isEqualTo(d(ref, "S"));
        assertThat(r.variance()).isCloseTo(d(ref, "var_S"), relative(d(ref, "var_S")));
        assertThat(r.test().statistic()).isCloseTo(d(ref, "Z_cc"), within(1e-10));
        double p = d(ref, "p_two_sided_cc");
        assertThat(r.test().pValue()).isCloseTo(p, within(p * 1e-6));
        assertThat(r.seasonalSlope().pairs()).isEqualTo((int) d(ref, "n_within_season_slopes"));
        assertThat(r.seasonalSlope().perYear()).isCloseTo(d(ref, "seasonal_sen_slope_per_year"), within(1e-9));
    }

    @ParameterizedTest
    @CsvSource({"AirPassengers,12", "co2,12", "Nile,1", "UKgas,4", "nottem,12", "sunspot.year,1"})
    void senSlopeAndGilbertIntervalMatchTheReference(String dataset, int frequency) {
        Map<String, String> ref = Reference.csv("sen_slope.csv").row(dataset);
        double[] x = Reference.dataset(dataset + ".csv");
        MannKendall.Result mk = MannKendall.test(x, MannKendall.Correction.NONE);
        SenSlope.Result r = SenSlope.of(x, frequency, mk.varianceTies());
        assertThat(r.pairs()).isEqualTo((int) d(ref, "N_pairs"));
        assertThat(r.perYear()).isCloseTo(d(ref, "sen_slope_per_year"), within(1e-9));
        // Gilbert (1987) ranks M1 and M2 + 1, interpolated: lower_gilbert and upper_gilbert.
        assertThat(r.lower95() / frequency).isCloseTo(d(ref, "lower_gilbert"), within(1e-9));
        assertThat(r.upper95() / frequency).isCloseTo(d(ref, "upper_gilbert"), within(1e-9));
    }

    @Test
    void pairsCountsEveryPairAMultipleOfTheStrideApartWithBothValuesObserved() {
        java.util.Random random = new java.util.Random(17);
        for (int trial = 0; trial < 200; trial++) {
            double[] x = new double[random.nextInt(300)];
            for (int i = 0; i < x.length; i++) {
                x[i] = random.nextInt(5) == 0 ? Double.NaN : random.nextGaussian();
            }
            int stride = 1 + random.nextInt(13);
            long expected = 0;   // counted pair by pair (derived in the test)
            for (int i = 0; i < x.length; i++) {
                for (int j = i + stride; j < x.length; j += stride) {
                    expected += Double.isNaN(x[i]) || Double.isNaN(x[j]) ? 0 : 1;
                }
            }
            assertThat(SenSlope.pairs(x, stride)).as("stride %d, %d values", stride, x.length).isEqualTo(expected);
        }
    }

    @Test
    void aSeasonalSlopeOverTooManyPairsIsNotTried() {
        // 6,400 values one season apart (period 1): 20,476,800 pairs, above SenSlope.MAX_PAIRS
        double[] x = new double[6400];
        for (int t = 0; t < x.length; t++) {
            x[t] = t % 97;
        }
        assertThat(SenSlope.pairs(x, 1)).isGreaterThan(SenSlope.MAX_PAIRS);
        assertThat(SeasonalKendall.test(x, 1)).isEmpty();
    }
}
