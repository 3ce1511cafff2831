package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class EtsGradientTest {

    /** A seeded positive monthly series with a slope and a multiplicative season (planted truth, invented for this test). */
    private static double[] seasonal(long seed, int n) {
        Random random = new Random(seed);
        double[] y = new double[n];
        for (int t = 0; t < n; t++) {
            y[t] = (200 + 0.8 * t) * (1 + 0.25 * Math.sin(2 * Math.PI * t / 12)) * Math.exp(0.04 * random.nextGaussian());
        }
        return y;
    }

    /** Every form of ETS model with a monthly season where it has one: each error, trend, damping and season. */
    private static List<EtsModel> everyModel() {
        List<EtsModel> models = new ArrayList<>();
        for (EtsModel.Error error : EtsModel.Error.values()) {
            for (EtsModel.Trend trend : EtsModel.Trend.values()) {
                for (boolean damped : new boolean[] {false, true}) {
                    for (EtsModel.Season season : EtsModel.Season.values()) {
                        if (!damped || trend != EtsModel.Trend.NONE) {
                            models.add(new EtsModel(error, trend, damped, season, 12,
                                    EtsModel.Estimator.QUASI_NEWTON));
                        }
                    }
                }
            }
        }
        return models;
    }

    /**
     * The exact gradient of the estimation criterion agrees with central differences of
     * {@link EtsFilter#criterion} (steps of 10⁻⁶ relative, common practice (no source)) to 10⁻⁵
     * relative, for every combination of error, trend, damping and season, with respect to α, β/α,
     * γ, φ and every initial state.
     */
    @Test
    void exactGradientAgreesWithCentralDifferencesOfTheCriterion() {
        for (long seed = 1; seed <= 2; seed++) {
            double[] y = seasonal(seed, 96);
            for (EtsModel model : everyModel()) {
                check(model, y);
            }
        }
    }

    /**
     * In the search's own variables (α, β/α, γ/(1 − α), φ and the states' scaled offsets, the last
     * season following from the others) the gradient agrees with central differences of the search's
     * criterion to 10⁻⁵ relative, for every model, at a point off the start.
     */
    @Test
    void searchGradientAgreesWithDifferencesInTheSearchsVariables() {
        double[] y = seasonal(3, 84);
        for (EtsModel model : everyModel()) {
            EtsEstimation.Coordinates c = new EtsEstimation.Coordinates(model, y);
            double[] z = smoothingAt(c.guess, 0.3, 0.15, 0.2, 0.93);
            for (int i = 4; i < z.length; i++) {
                z[i] = 0.004 * (i % 3 - 1);
            }
            double[] g = new double[z.length];
            assertThat(c.gradient(z, g)).as(model.label()).isTrue();
            for (int i = 0; i < z.length; i++) {
                double h = 1e-6;
                double[] up = z.clone();
                double[] down = z.clone();
                up[i] += h;
                down[i] -= h;
                double fd = (c.criterion(up) - c.criterion(down)) / (2 * h);
                assertThat(g[i]).as(model.label() + " z" + i).isCloseTo(fd, within(1e-5 * Math.max(1, Math.abs(fd))));
            }
        }
    }

    /**
     * After the criterion at a point, the search's gradient there comes from the criterion's kept
     * forward pass: bit for bit the gradient of a whole pass of its own, for every model (the
     * search's path, and so every fit, must not depend on which pass served).
     */
    @Test
    void gradientFromTheCriterionsKeptPassIsTheWholePasssGradient() {
        double[] y = seasonal(4, 72);
        for (EtsModel model : everyModel()) {
            EtsEstimation.Coordinates kept = new EtsEstimation.Coordinates(model, y);
            EtsEstimation.Coordinates fresh = new EtsEstimation.Coordinates(model, y);
            double[] z = smoothingAt(kept.guess, 0.4, 0.1, 0.3, 0.9);
            double[] fromKept = new double[z.length];
            double[] fromWhole = new double[z.length];
            assertThat(kept.criterion(z)).as(model.label()).isFinite();
            assertThat(kept.gradient(z, fromKept)).as(model.label()).isTrue();
            assertThat(fresh.gradient(z, fromWhole)).as(model.label()).isTrue();
            assertThat(fromKept).as(model.label()).containsExactly(fromWhole);
        }
    }

    private static void check(EtsModel model, double[] y) {
        double[] start = EtsEstimation.initialStates(model, y, false);
        double[] x = new double[EtsGradient.STATES + start.length];
        x[EtsGradient.ALPHA] = 0.35;
        x[EtsGradient.BETA_STAR] = 0.2;
        x[EtsGradient.GAMMA] = 0.15;
        x[EtsGradient.PHI] = 0.9;
        for (int i = 0; i < start.length; i++) {
            x[EtsGradient.STATES + i] = start[i] * (1 + 0.01 * (i % 3 - 1)); // off the start, so no term vanishes
        }
        double[] g = new double[x.length];
        assertThat(new EtsGradient(model, y, start.length).at(x[0], x[1], x[2], x[3], tail(x), g))
                .as(model.label()).isTrue();
        for (int i = 0; i < x.length; i++) {
            double h = 1e-6 * Math.max(1, Math.abs(x[i]));
            double[] up = x.clone();
            double[] down = x.clone();
            up[i] += h;
            down[i] -= h;
            double fd = (criterion(model, y, up) - criterion(model, y, down)) / (2 * h);
            assertThat(g[i]).as(model.label() + " variable " + i).isCloseTo(fd, within(1e-5 * Math.max(1, Math.abs(fd))));
        }
    }

    private static double criterion(EtsModel model, double[] y, double[] x) {
        return EtsFilter.criterion(model, y, x[0], x[0] * x[1], x[2], x[3], tail(x));
    }

    private static double[] tail(double[] x) {
        return java.util.Arrays.copyOfRange(x, EtsGradient.STATES, x.length);
    }

    /** The search's start with its first four variables set: α, β/α, γ/(1 − α), and φ for a damped model (else the first state's offset). */
    private static double[] smoothingAt(double[] guess, double alpha, double betaShare, double gammaShare, double phi) {
        double[] z = guess.clone();
        z[0] = alpha;
        z[1] = betaShare;
        z[2] = gammaShare;
        z[3] = phi;
        return z;
    }
}
