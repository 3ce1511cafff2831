package org.annalist.analysis.decompose;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** The irregular share around a planted step (synthetic series; every check value derived in the test). */
class IrregularTest {

    private static final int N = 240;
    private static final int STEP_AT = 120;

    /** 20 years of monthly logs: a seasonal swing of ±0.3, a step down of 0.7 at month 120, noise of sd 0.02 (seeded). */
    private static double[] plantedStep() {
        Random random = new Random(20261204L);
        double[] y = new double[N];
        for (int t = 0; t < N; t++) {
            y[t] = 10 + 0.3 * Math.sin(2 * Math.PI * t / 12) + (t >= STEP_AT ? -0.7 : 0) + 0.02 * random.nextGaussian();
        }
        return y;
    }

    private static double[] remainder(Stl.Result fit, double[] y) {
        double[] r = new double[y.length];
        for (int t = 0; t < y.length; t++) {
            r[t] = y[t] - fit.trend()[t] - fit.seasonal()[t];
        }
        return r;
    }

    @Test
    void theTrendsLagAroundAStepIsLeftOutOfTheShareAndTheNoiseIsWhatRemains() {
        double[] y = plantedStep();
        Stl.Result fit = Stl.withPeriod(12).with(Stl.Robustness.ON).fit(y);
        double[] r = remainder(fit, y);
        int window = fit.parameters().trendWindow();

        double everyPeriod = Irregular.of(y, r).orElseThrow().share();
        Irregular.Result nearBreaksLeftOut = Irregular.of(y, r, new int[] {STEP_AT}, window).orElseThrow();

        // the window's half-width on each side of the step: (w - 1) / 2 periods before it, the step's own and (w - 1) / 2 - 1 after
        assertThat(nearBreaksLeftOut.reach()).isEqualTo((window - 1) / 2);
        assertThat(nearBreaksLeftOut.leftOut()).isEqualTo(2 * nearBreaksLeftOut.reach());
        // the noise's variance, 0.02^2, against the variation around the least-squares line: the season's
        // 0.3^2 / 2 = 0.045, the step's 0.7^2 / 4 less the three quarters of it a line takes (a step at the
        // middle correlates sqrt(3)/2 with time) = 0.031, and the noise: 0.0004 / 0.076 = 0.53 %; counted
        // everywhere, the trend's lag around the step adds several times that
        assertThat(nearBreaksLeftOut.share()).isBetween(0.003, 0.008);
        assertThat(everyPeriod).isGreaterThan(3 * nearBreaksLeftOut.share());
    }

    @Test
    void withoutBreaksEveryPeriodCountsAsBefore() {
        double[] y = plantedStep();
        Stl.Result fit = Stl.withPeriod(12).with(Stl.Robustness.ON).fit(y);
        double[] r = remainder(fit, y);

        Irregular.Result none = Irregular.of(y, r, new int[0], fit.parameters().trendWindow()).orElseThrow();

        assertThat(none.share()).isEqualTo(Irregular.of(y, r).orElseThrow().share());
        assertThat(none.leftOut()).isZero();
    }

    @Test
    void whenTooFewPeriodsWouldRemainEveryPeriodIsCountedAndNoneSaidLeftOut() {
        double[] y = plantedStep();
        Stl.Result fit = Stl.withPeriod(12).with(Stl.Robustness.ON).fit(y);
        double[] r = remainder(fit, y);
        // breaks every 20 months: their windows cover the whole series
        int[] starts = {10, 30, 50, 70, 90, 110, 130, 150, 170, 190, 210, 230};

        Irregular.Result crowded = Irregular.of(y, r, starts, fit.parameters().trendWindow()).orElseThrow();

        assertThat(crowded.leftOut()).isZero();
        assertThat(crowded.share()).isEqualTo(Irregular.of(y, r).orElseThrow().share());
    }
}
