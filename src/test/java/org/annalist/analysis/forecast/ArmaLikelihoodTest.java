package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * The fast likelihood of the differenced series ({@link ArmaLikelihood}) against the Gaussian
 * density written out in full (derived in the test), and against the full filter ({@link ArimaKalman},
 * which reproduces R's {@code arima}: {@link ArimaTest}).
 */
class ArmaLikelihoodTest {

    /** Coefficients invented for the test, of the sizes fitted to monthly series (stationary, invertible). */
    private static final double[][] MODELS = {
        // ARIMA(0,1,1)(0,1,1)[12]: θ, Θ
        {0, 1, 1, 0, 1, 1, -0.4, -0.6},
        // ARIMA(2,1,1)(1,1,1)[12]: φ₁, φ₂, θ, Φ, Θ
        {2, 1, 1, 1, 1, 1, 0.5, -0.2, -0.3, 0.3, -0.5},
        // ARIMA(1,0,2)(1,1,2)[12]: φ, θ₁, θ₂, Φ, Θ₁, Θ₂
        {1, 0, 2, 1, 1, 2, 0.6, 0.3, -0.2, -0.4, -0.3, 0.2}};

    /** One model on USAccDeaths: its expanded polynomials, the differenced values, and the fast likelihood of those after the first {@code skip}. */
    private record Case(ArimaOrder order, double[][] polynomials, int skip, double[] differenced, ArimaKalman.Likelihood fast) {

        static Case of(double[] model, double[] y) {
            ArimaOrder o = ArmaLikelihoodTest.order(model);
            double[][] pt = ArimaPolynomials.expand(coefficients(model), o, false);
            int skip = o.d() + 12 * o.seasonalD();
            double[] w = ArmaLikelihoodTest.differenced(y, o);
            return new Case(o, pt, skip, w, ArmaLikelihood.of(pt[0], pt[1], w, skip));
        }

        double[] used() {
            return java.util.Arrays.copyOfRange(differenced, skip, differenced.length);
        }
    }

    private static java.util.List<Case> cases(double[] y) {
        return java.util.Arrays.stream(MODELS).map(model -> Case.of(model, y)).toList();
    }

    private static ArimaOrder order(double[] model) {
        return new ArimaOrder((int) model[0], (int) model[1], (int) model[2], (int) model[3], (int) model[4],
                (int) model[5], 12, false);
    }

    private static double[] coefficients(double[] model) {
        return java.util.Arrays.copyOfRange(model, 6, model.length);
    }

    private static double[] differenced(double[] y, ArimaOrder o) {
        double[] w = y.clone();
        for (int i = 0; i < o.d(); i++) {
            for (int l = w.length - 1; l > 0; l--) {
                w[l] -= w[l - 1];
            }
        }
        for (int i = 0; i < o.seasonalD(); i++) {
            for (int l = w.length - 1; l >= 12; l--) {
                w[l] -= w[l - 12];
            }
        }
        return w;
    }

    /**
     * −2 log L of w ~ N(0, σ²Γ) with σ² concentrated out needs w'Γ⁻¹w and log det Γ: here Γ is built
     * from autocovariances summed from 4,000 ψ weights (ψ_j = θ_j + Σ φ_i ψ_{j−i}, the MA(∞) form) and
     * factored by Cholesky, independently of the filter's moment equations and recursions.
     */
    private static double[] dense(double[] phi, double[] theta, double[] w) {
        int lags = 4000;
        double[] psi = new double[lags];
        for (int j = 0; j < lags; j++) {
            double s = j == 0 ? 1 : j - 1 < theta.length ? theta[j - 1] : 0;
            for (int i = 1; i <= Math.min(j, phi.length); i++) {
                s += phi[i - 1] * psi[j - i];
            }
            psi[j] = s;
        }
        int n = w.length;
        double[] gamma = new double[n];
        for (int k = 0; k < n; k++) {
            for (int j = 0; j + k < lags; j++) {
                gamma[k] += psi[j] * psi[j + k];
            }
        }
        double[][] l = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j <= i; j++) {
                double s = gamma[i - j];
                for (int k = 0; k < j; k++) {
                    s -= l[i][k] * l[j][k];
                }
                l[i][j] = i == j ? Math.sqrt(s) : s / l[j][j];
            }
        }
        double[] z = new double[n];
        double ssq = 0;
        double logDet = 0;
        for (int i = 0; i < n; i++) {
            double s = w[i];
            for (int k = 0; k < i; k++) {
                s -= l[i][k] * z[k];
            }
            z[i] = s / l[i][i];
            ssq += z[i] * z[i];
            logDet += 2 * Math.log(l[i][i]);
        }
        return new double[] {ssq, logDet};
    }

    /**
     * On the monthly USAccDeaths values (R's datasets, 72 values), the filter's sum of squares and
     * sum of log variances are the dense Gaussian density's to 1e-9 relative, for three seasonal models.
     */
    @Test
    void fastLikelihoodIsTheDifferencedSeriesExactGaussianLikelihood() {
        double[] y = ArimaTest.series("USAccDeaths");
        for (Case c : cases(y)) {
            ArimaOrder o = c.order();
            ArimaKalman.Likelihood fast = c.fast();
            double[] dense = dense(c.polynomials()[0], c.polynomials()[1], c.used());
            assertThat(fast.used()).as(o.label() + " values used").isEqualTo(y.length - c.skip());
            assertSameLikelihood(o.label(), fast, dense[0], dense[1]);
        }
    }

    /**
     * Without differencing the full filter has no diffuse states and computes the same likelihood
     * (there with Gardner et al.'s Q₀, here from the autocovariances): equal to 1e-9 relative; with
     * differencing, R's κ = 10⁶ leaves a difference of order 1/κ: R's objective within 1e-4 relative.
     */
    @Test
    void fullFilterAgreesExactlyWithoutDifferencesAndToOrderOneOverKappaWith() {
        double[] y = ArimaTest.series("USAccDeaths");
        for (Case c : cases(y)) {
            ArimaOrder o = c.order();
            double[][] pt = c.polynomials();
            ArimaKalman.Likelihood fast = c.fast();
            ArimaKalman.Likelihood stationary = new ArimaKalman(pt[0], pt[1], new double[0]).run(c.used(), null);
            assertSameLikelihood(o.label(), fast, stationary.ssq(), stationary.sumLog());
            ArimaKalman.Likelihood full = new ArimaKalman(pt[0], pt[1], ArimaPolynomials.differencing(o.d(), o.seasonalD(), 12))
                    .run(y, null);
            assertThat(full.used()).as(o.label() + " values used").isEqualTo(fast.used());
            double ours = objective(fast);
            double rs = objective(full);
            assertThat(ours).as(o.label() + " objective").isCloseTo(rs, within(1e-4 * Math.abs(rs)));
        }
    }

    /** The autocovariances of an AR(1) with unit innovations: φ^k / (1 − φ²) (the textbook formula, e.g. Brockwell &amp; Davis 1991, §3.3; from memory). */
    @Test
    void autocovariancesOfAnAutoregressionAreTheTextbookOnes() {
        double[] gamma = ArmaLikelihood.autocovariances(new double[] {0.7}, new double[0], 5);
        for (int k = 0; k <= 5; k++) {
            assertThat(gamma[k]).as("lag " + k).isCloseTo(Math.pow(0.7, k) / (1 - 0.49), within(1e-12));
        }
    }

    /** The sum of squares and the sum of log variances to 1e-9 relative. */
    private static void assertSameLikelihood(String label, ArimaKalman.Likelihood fast, double ssq, double sumLog) {
        assertThat(fast.ssq()).as(label + " ssq").isCloseTo(ssq, within(1e-9 * ssq));
        assertThat(fast.sumLog()).as(label + " log det").isCloseTo(sumLog, within(1e-9 * Math.abs(sumLog) + 1e-9));
    }

    private static double objective(ArimaKalman.Likelihood like) {
        return 0.5 * (Math.log(like.ssq() / like.used()) + like.sumLog() / like.used());
    }
}
