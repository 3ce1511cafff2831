package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.Test;

class CssGradientTest {

    /**
     * A seeded seasonal ARMA series with a level and a slope: (1 − 0.5B)(1 − 0.3B¹²) x_t =
     * (1 + 0.4B)(1 + 0.5B¹²) a_t, a_t ~ N(0, 1) (planted truth, invented for this test).
     */
    private static double[] seasonalArma(long seed, int n) {
        Random random = new Random(seed);
        double[] a = new double[n + 100];
        double[] x = new double[n + 100];
        for (int t = 0; t < a.length; t++) {
            a[t] = random.nextGaussian();
            double v = a[t];
            v += t >= 1 ? 0.5 * x[t - 1] + 0.4 * a[t - 1] : 0;
            v += t >= 12 ? 0.3 * x[t - 12] + 0.5 * a[t - 12] : 0;
            v -= t >= 13 ? 0.15 * x[t - 13] - 0.2 * a[t - 13] : 0;
            x[t] = v;
        }
        double[] y = new double[n];
        for (int t = 0; t < n; t++) {
            y[t] = 50 + 0.05 * t + x[t + 100];
        }
        return y;
    }

    /** Central differences of the CSS objective ½ log σ̂² with a step of 10⁻⁶ (common practice (no source)). */
    private static double[] differences(ArimaEstimation estimation, double[] par) {
        double[] g = new double[par.length];
        double h = 1e-6;
        for (int i = 0; i < par.length; i++) {
            double[] up = par.clone();
            double[] down = par.clone();
            up[i] += h;
            down[i] -= h;
            g[i] = (estimation.at(up, Arima.Method.CSS).orElseThrow().value()
                    - estimation.at(down, Arima.Method.CSS).orElseThrow().value()) / (2 * h);
        }
        return g;
    }

    /**
     * The exact CSS gradient agrees with central differences of the objective to 10⁻⁶ (their
     * truncation and rounding error at this step), for seasonal and non-seasonal orders, with a mean,
     * a drift and none, at coefficients away from zero (so that every seasonal product term counts).
     */
    @Test
    void exactGradientAgreesWithCentralDifferencesOfTheObjective() {
        Object[][] cases = {
            {new ArimaOrder(1, 0, 1, 1, 0, 1, 12, true), new double[] {0.4, 0.3, 0.2, 0.4, 55}},
            {new ArimaOrder(2, 1, 1, 1, 1, 1, 12, false), new double[] {0.3, -0.2, 0.35, 0.1, -0.5}},
            {new ArimaOrder(1, 1, 2, 0, 0, 0, 12, true), new double[] {-0.3, 0.5, 0.1, 0.04}},
            {new ArimaOrder(0, 1, 1, 0, 1, 1, 12, false), new double[] {-0.6, -0.3}},
            {new ArimaOrder(3, 0, 0, 2, 0, 0, 4, true), new double[] {0.5, 0.1, -0.2, 0.3, 0.2, 52}},
        };
        for (long seed = 1; seed <= 3; seed++) {
            double[] y = seasonalArma(seed, 180);
            for (Object[] c : cases) {
                ArimaOrder order = (ArimaOrder) c[0];
                double[] par = (double[]) c[1];
                int m = order.period();
                int ncond = order.d() + order.seasonalD() * m + order.p() + m * order.seasonalP();
                double[] xreg = null;
                if (order.hasMean() || order.hasDrift()) {
                    xreg = new double[y.length];
                    for (int t = 0; t < y.length; t++) {
                        xreg[t] = order.hasDrift() ? t + 1 : 1;
                    }
                }
                CssGradient exact = new CssGradient(order, ncond, differenced(y, order), xreg == null ? null
                        : differenced(xreg, order));
                double[] g = new double[par.length];
                assertThat(exact.at(par, g)).as(order + " finite").isTrue();
                double[] fd = differences(new ArimaEstimation(y, order), par);
                for (int i = 0; i < par.length; i++) {
                    assertThat(g[i]).as(order + " seed " + seed + " ∂F/∂par[" + i + "]")
                            .isCloseTo(fd[i], within(1e-6 * Math.max(1, Math.abs(fd[i]))));
                }
            }
        }
    }

    /** The search with the exact gradient ends where R's differences end: the same optimum to 10⁻⁸ of the objective. */
    @Test
    void searchWithExactGradientReachesTheSameOptimumAsDifferences() {
        ArimaOrder order = new ArimaOrder(1, 1, 1, 0, 1, 1, 12, false);
        for (long seed = 1; seed <= 3; seed++) {
            double[] y = seasonalArma(seed, 180);
            Arima.Fit fit = Arima.fit(y, order, Arima.Method.CSS).orElseThrow();
            ArimaEstimation estimation = new ArimaEstimation(y, order);
            double[] start = new double[3];
            ArimaOptimiser differences = new ArimaOptimiser(
                    par -> estimation.at(par, Arima.Method.CSS).orElseThrow().value(), new double[] {1, 1, 1});
            double value = differences.minimise(start, ArimaOptimiser.MAX_ITERATIONS).orElseThrow().value();
            double exact = estimation.at(fit.coefficients(), Arima.Method.CSS).orElseThrow().value();
            assertThat(exact).as("seed " + seed).isCloseTo(value, within(1e-8 * Math.max(1, Math.abs(value))));
        }
    }

    /**
     * Given the objective's residuals at the same coefficients (those a CSS fit with these
     * coefficients reports), the gradient is bit for bit the one of its own forward pass, so the
     * search's path does not depend on which pass served; with a regression term it keeps none.
     */
    @Test
    void gradientFromTheObjectivesResidualsIsTheWholePasssGradient() {
        double[] y = seasonalArma(4, 150);
        Object[][] cases = {
            {new ArimaOrder(2, 1, 1, 1, 1, 1, 12, false), new double[] {0.3, -0.2, 0.35, 0.1, -0.5}},
            {new ArimaOrder(0, 1, 1, 0, 1, 1, 12, false), new double[] {-0.6, -0.3}},
        };
        for (Object[] c : cases) {
            ArimaOrder order = (ArimaOrder) c[0];
            double[] par = (double[]) c[1];
            int m = order.period();
            int ncond = order.d() + order.seasonalD() * m + order.p() + m * order.seasonalP();
            double[] whole = new double[par.length];
            assertThat(new CssGradient(order, ncond, differenced(y, order), null).at(par, whole)).isTrue();
            CssGradient kept = new CssGradient(order, ncond, differenced(y, order), null);
            double[] residuals = Arima.withCoefficients(y, order, Arima.Method.CSS, par).orElseThrow().residuals();
            System.arraycopy(residuals, 0, kept.residualsKeptFor(par), 0, residuals.length);
            double[] fromKept = new double[par.length];
            assertThat(kept.at(par, fromKept)).isTrue();
            assertThat(fromKept).as(order.label()).containsExactly(whole);
        }
        ArimaOrder withMean = new ArimaOrder(1, 0, 1, 1, 0, 1, 12, true);
        double[] ones = new double[y.length];
        java.util.Arrays.fill(ones, 1);
        assertThat(new CssGradient(withMean, 13, y, ones).residualsKeptFor(new double[] {0.4, 0.3, 0.2, 0.4, 55}))
                .isNull();
    }

    /** d times at lag 1, D times at the seasonal lag, in place, as {@link ArimaEstimation} differences. */
    private static double[] differenced(double[] x, ArimaOrder order) {
        double[] w = x.clone();
        for (int i = 0; i < order.d(); i++) {
            for (int l = w.length - 1; l > 0; l--) {
                w[l] -= w[l - 1];
            }
        }
        for (int i = 0; i < order.seasonalD(); i++) {
            for (int l = w.length - 1; l >= order.period(); l--) {
                w[l] -= w[l - order.period()];
            }
        }
        return w;
    }
}
