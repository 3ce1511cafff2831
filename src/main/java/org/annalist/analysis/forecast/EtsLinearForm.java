package org.annalist.analysis.forecast;

/**
 * The linear state-space form of an ETS model, x_t = F x_{t−1} + g ε_t, y_t = w′x_{t−1} + ε_t, with
 * the state (l, b, s_1 … s_m) [1, ch. 3]: exact for the additive models, and the form whose
 * discount matrix D = F − g w′ defines the forecastable region [2].
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J., Koehler, A. B., Ord, J. K. &amp; Snyder, R. D. (2008). <i>Forecasting with
 * Exponential Smoothing: The State Space Approach</i>. Springer. DOI 10.1007/978-3-540-71918-2.</li>
 * <li>Hyndman, R. J., Akram, M. &amp; Archibald, B. C. (2008). The admissible parameter space for
 * exponential smoothing models. <i>Annals of the Institute of Statistical Mathematics</i> 60(2),
 * 407–426. DOI 10.1007/s10463-006-0109-x.</li>
 * </ol>
 */
record EtsLinearForm(double[][] f, double[] g, double[] w) {

    EtsLinearForm {
        f = Matrices.copy(f);
        g = g.clone();
        w = w.clone();
    }

    @Override
    public double[][] f() {
        return Matrices.copy(f);
    }

    @Override
    public double[] g() {
        return g.clone();
    }

    @Override
    public double[] w() {
        return w.clone();
    }

    static EtsLinearForm of(EtsModel model, EtsModel.Parameters p) {
        int m = model.season() == EtsModel.Season.NONE ? 0 : model.period();
        int t = model.trend() == EtsModel.Trend.NONE ? 0 : 1;
        int size = 1 + t + m;
        double phi = model.damped() ? p.phi() : 1;
        double[][] f = new double[size][size];
        double[] g = new double[size];
        double[] w = new double[size];
        f[0][0] = 1;
        w[0] = 1;
        g[0] = p.alpha();
        if (t == 1) {
            f[0][1] = phi;
            f[1][1] = phi;
            w[1] = phi;
            g[1] = p.beta();
        }
        if (m > 0) {
            int first = 1 + t;
            f[first][first + m - 1] = 1; // the new first season is the oldest one, updated
            for (int i = 1; i < m; i++) {
                f[first + i][first + i - 1] = 1;
            }
            w[first + m - 1] = 1;
            g[first] = p.gamma();
        }
        return new EtsLinearForm(f, g, w);
    }

    /** The discount matrix D = F − g w′ [2]. */
    double[][] discount() {
        int size = g.length;
        double[][] d = new double[size][size];
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < size; j++) {
                d[i][j] = f[i][j] - g[i] * w[j];
            }
        }
        return d;
    }
}
