package org.annalist.analysis.forecast;

/**
 * The forecast distribution's mean and variance 1 … h ahead for the ETS models that have them in
 * closed form [1, ch. 6]: class 1, additive error without multiplicative parts (§6.2), and class 3,
 * multiplicative error and season (§6.4, the recursions for M<sub>h</sub> and V<sub>h</sub>; the
 * mean departs from the point forecast beyond one season, because the future level and seasonal
 * factors are correlated). The other models (class 2) are simulated ({@link EtsSimulation}).
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J., Koehler, A. B., Ord, J. K. &amp; Snyder, R. D. (2008). <i>Forecasting with
 * Exponential Smoothing: The State Space Approach</i>. Springer. DOI 10.1007/978-3-540-71918-2.</li>
 * </ol>
 */
final class EtsForecastVariance {

    private EtsForecastVariance() {
    }

    static boolean hasClosedForm(EtsModel model) {
        return isClassOne(model) || isClassThree(model);
    }

    private static boolean isClassOne(EtsModel model) {
        return model.error() == EtsModel.Error.ADDITIVE && model.season() != EtsModel.Season.MULTIPLICATIVE;
    }

    private static boolean isClassThree(EtsModel model) {
        return model.error() == EtsModel.Error.MULTIPLICATIVE && model.season() == EtsModel.Season.MULTIPLICATIVE;
    }

    /**
     * @param state the final state {level, trend, s_1 … s_m}, only read
     * @throws IllegalStateException for the other models (class 2), see {@link #hasClosedForm}
     */
    static Prediction predict(EtsModel model, double[] state, EtsModel.Parameters p, double sigma2, int h) {
        if (isClassOne(model)) {
            return classOne(model, state, p, sigma2, h);
        }
        if (isClassThree(model)) {
            return classThree(model, state, p, sigma2, h);
        }
        throw new IllegalStateException(model.label() + " has no closed-form forecast variance");
    }

    /**
     * Class-1 forecast variances (additive errors, no multiplicative component; [1] §6.2, eq. 6.3):
     * v_h = σ²(1 + Σ_{j=1}^{h−1} c_j²), c_j = w′F^{j−1}g.
     */
    private static Prediction classOne(EtsModel model, double[] state, EtsModel.Parameters p, double sigma2, int h) {
        EtsLinearForm form = EtsLinearForm.of(model, p);
        double[][] f = form.f();
        double[] w = form.w();
        double[] mean = EtsFilter.forecastFrom(model, state, p.phi(), h);
        double[] variance = new double[h];
        double[] fg = form.g(); // F^{j−1} g
        double sum = 0;
        for (int i = 0; i < h; i++) {
            variance[i] = sigma2 * (1 + sum); // [1] §6.2, eq. 6.3
            double c = 0;
            for (int k = 0; k < fg.length; k++) {
                c += w[k] * fg[k];
            }
            sum += c * c;
            double[] next = new double[fg.length];
            for (int r = 0; r < fg.length; r++) {
                for (int k = 0; k < fg.length; k++) {
                    next[r] += f[r][k] * fg[k];
                }
            }
            fg = next;
        }
        return new Prediction(mean, variance);
    }

    /**
     * Class-3 recursions ([1] §6.4) with the level–trend part x = (l, b) and seasonal part
     * s = (s_1 … s_m): y = (H1 x)(H2 s)(1 + ε), x' = F1 x + G1 x ε, s' = F2 s + G2 s ε.
     * M = E[x s'] and V = Var(vec M) are carried forward; H1 = (1, φ) and F1's first row (1, φ)
     * carry the damping, so the one-step mean equals the point forecast also for damped trends.
     */
    private static Prediction classThree(EtsModel model, double[] state, EtsModel.Parameters p, double sigma2,
                                         int h) {
        int m = model.period();
        int k = model.trend() == EtsModel.Trend.NONE ? 1 : 2;
        double phi = model.damped() ? p.phi() : 1;
        double[][] h1 = k == 1 ? new double[][] {{1}} : new double[][] {{1, phi}};
        double[][] f1 = k == 1 ? new double[][] {{1}} : new double[][] {{1, phi}, {0, phi}};
        double[][] g1 = k == 1 ? new double[][] {{p.alpha()}}
                : new double[][] {{p.alpha(), p.alpha() * phi}, {p.beta(), p.beta() * phi}};
        double[][] h2 = new double[1][m];
        h2[0][m - 1] = 1;
        double[][] f2 = new double[m][m];
        f2[0][m - 1] = 1;
        for (int i = 1; i < m; i++) {
            f2[i][i - 1] = 1;
        }
        double[][] g2 = new double[m][m];
        g2[0][m - 1] = p.gamma();
        double[][] means = new double[k][m];
        for (int r = 0; r < k; r++) {
            for (int c = 0; c < m; c++) {
                means[r][c] = state[r] * state[2 + c];
            }
        }
        double[][] h21 = Matrices.kronecker(h2, h1);
        double[][] f21 = Matrices.kronecker(f2, f1);
        double[][] g21 = Matrices.kronecker(g2, g1);
        double[][] cross = Matrices.add(Matrices.kronecker(g2, f1), Matrices.kronecker(f2, g1));
        double[][] v = new double[k * m][k * m];
        double[] mean = new double[h];
        double[] variance = new double[h];
        for (int i = 0; i < h; i++) {
            // [1] §6.4: the h-step mean and variance from M_h and V_h
            mean[i] = Matrices.product(h1, means, Matrices.transpose(h2))[0][0];
            variance[i] = (1 + sigma2) * Matrices.product(h21, v, Matrices.transpose(h21))[0][0]
                    + sigma2 * mean[i] * mean[i];
            // [1] §6.4: the recursions for V_{h+1} and M_{h+1}
            double[][] vecM = Matrices.vec(means);
            double[][] outer = Matrices.product(vecM, Matrices.transpose(vecM));
            double[][] noise = Matrices.add(
                    Matrices.add(Matrices.product(f21, v, Matrices.transpose(g21)),
                            Matrices.product(g21, v, Matrices.transpose(f21))),
                    Matrices.add(Matrices.product(cross, Matrices.add(v, outer), Matrices.transpose(cross)),
                            Matrices.scale(sigma2, Matrices.product(g21,
                                    Matrices.add(Matrices.scale(3, v), Matrices.scale(2, outer)),
                                    Matrices.transpose(g21)))));
            v = Matrices.add(Matrices.product(f21, v, Matrices.transpose(f21)), Matrices.scale(sigma2, noise));
            means = Matrices.add(Matrices.product(f1, means, Matrices.transpose(f2)),
                    Matrices.scale(sigma2, Matrices.product(g1, means, Matrices.transpose(g2))));
        }
        return new Prediction(mean, variance);
    }
}
