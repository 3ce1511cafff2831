package org.annalist.analysis.decompose;

import static org.assertj.core.api.Assertions.assertThat;

import org.annalist.analysis.Reference;
import org.junit.jupiter.api.Test;

/** STL against R 4.2.2 stats::stl (reference files stl_*.csv, parameters in stl_params.json). */
class StlTest {

    /** |ours − R| ≤ 1e-6 · max(|R|, 1e-3 · scale), scale = largest |input|: relative, with a floor near zero. */
    private static void assertMatches(String what, double[] ours, double[] reference, double scale) {
        double worst = 0;
        int at = -1;
        for (int i = 0; i < reference.length; i++) {
            double error = Math.abs(ours[i] - reference[i]) / Math.max(Math.abs(reference[i]), 1e-3 * scale);
            if (error > worst) {
                worst = error;
                at = i;
            }
        }
        assertThat(worst).as("%s: worst relative error at index %d (ours %s, R %s)", what, at,
                at < 0 ? "" : ours[at], at < 0 ? "" : reference[at]).isLessThanOrEqualTo(1e-6);
    }

    private static double maxAbs(double[] x) {
        double m = 0;
        for (double v : x) {
            m = Math.max(m, Math.abs(v));
        }
        return m;
    }

    private static void check(String file, Stl stl, boolean weights) {
        Reference r = Reference.csv(file);
        double[] input = r.column("input");
        Stl.Result fit = stl.fit(input);
        double scale = maxAbs(input);
        assertMatches(file + " seasonal", fit.seasonal(), r.column("seasonal"), scale);
        assertMatches(file + " trend", fit.trend(), r.column("trend"), scale);
        assertMatches(file + " remainder", fit.remainder(), r.column("remainder"), scale);
        if (weights) {
            assertMatches(file + " weights", fit.weights(), r.column("robustness_weight"), 1.0);
        }
    }

    @Test
    void periodicRobustFitOfLogAirPassengersMatchesR() {
        // R: stl(log(AirPassengers), s.window = "periodic", robust = TRUE): t.window 19, l.window 13, inner 1, outer 15.
        Stl stl = Stl.withPeriod(12).periodic().with(Stl.Robustness.ON);
        check("stl_AirPassengers_log.csv", stl, true);
        Stl.Parameters p = stl.fit(Reference.csv("stl_AirPassengers_log.csv").column("input")).parameters();
        assertThat(p.seasonalWindow()).isEqualTo(1441);
        assertThat(p.trendWindow()).isEqualTo(19);
        assertThat(p.lowPassWindow()).isEqualTo(13);
        assertThat(p.seasonalJump()).isEqualTo(145);
        assertThat(p.trendJump()).isEqualTo(2);
        assertThat(p.lowPassJump()).isEqualTo(2);
    }

    @Test
    void nonRobustFitOfCo2MatchesR() {
        // R: stl(co2, s.window = 7, robust = FALSE): t.window 23, inner 2, outer 0, jumps 1/3/2.
        Stl stl = Stl.withPeriod(12).withSeasonalWindow(7).with(Stl.Robustness.OFF);
        check("stl_co2.csv", stl, false);
        Stl.Parameters p = stl.fit(Reference.csv("stl_co2.csv").column("input")).parameters();
        assertThat(p.trendWindow()).isEqualTo(23);
        assertThat(p.inner()).isEqualTo(2);
        assertThat(p.outer()).isZero();
    }

    @Test
    void robustFitOfNottemMatchesR() {
        // R: stl(nottem, s.window = 13, robust = TRUE): t.window 21, inner 1, outer 15.
        check("stl_nottem.csv", Stl.withPeriod(12).withSeasonalWindow(13).with(Stl.Robustness.ON), true);
    }
}
