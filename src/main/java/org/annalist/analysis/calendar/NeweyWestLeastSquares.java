package org.annalist.analysis.calendar;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * Ordinary least squares of the irregular on the centred calendar regressors and an intercept,
 * with Newey–West standard errors that allow for autocorrelation ([1] of {@link CalendarEffects};
 * Bartlett weights, lag ⌊4 (n/100)^{2/9}⌋ after [2], see the note on the lag there), scaled by
 * n/(n − k), and two-sided normal p-values. References as in {@link CalendarEffects}.
 */
final class NeweyWestLeastSquares {

    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1);

    private NeweyWestLeastSquares() {
    }

    /** The rows with a value, the design with an intercept column first, and every position's centred regressors. */
    record Design(List<Integer> rows, double[][] x, double[] y, List<String> names, double[][] all,
                  int easterWindow) {
    }

    /**
     * The design over the positions with a value.
     *
     * @return null with fewer than 3k + 10 values for k regressors and the intercept (our rule)
     */
    static Design design(double[] irregular, CentredRegressors calendar, int easterWindow) {
        List<String> names = calendar.names();
        double[][] all = calendar.all();
        List<Integer> rows = new ArrayList<>();
        for (int t = 0; t < irregular.length; t++) {
            if (!Double.isNaN(irregular[t])) {
                rows.add(t);
            }
        }
        int n = rows.size();
        int k = names.size() + 1;
        if (n < 3 * k + 10) {
            return null;   // too few values for the regressors (our rule)
        }
        double[][] x = new double[n][k];
        double[] y = new double[n];
        for (int r = 0; r < n; r++) {
            int t = rows.get(r);
            x[r][0] = 1;
            System.arraycopy(all[t], 0, x[r], 1, k - 1);
            y[r] = irregular[t];
        }
        return new Design(rows, x, y, names, all, easterWindow);
    }

    /**
     * Least squares on the design with Newey–West standard errors ([1], [2] of {@link CalendarEffects}).
     *
     * @param screened the positions set aside before this fit, carried into the result
     * @return empty when the regressors cannot be told apart
     */
    static Optional<CalendarEffects.Result> fit(Design d, List<Integer> screened) {
        int n = d.y.length;
        int k = d.names.size() + 1;
        double[][] x = d.x;
        double[] y = d.y;
        List<String> names = d.names;
        RealMatrix design = new Array2DRowRealMatrix(x, false);
        // ordinary least squares: β = (X′X)⁻¹ X′y
        DecompositionSolver solver = new LUDecomposition(design.transpose().multiply(design)).getSolver();
        if (!solver.isNonSingular()) {
            return Optional.empty();   // regressors that move together (two holidays on the same days) cannot be told apart
        }
        RealMatrix xtxInverse = solver.getInverse();
        double[] beta = xtxInverse.operate(design.transpose().operate(y));
        double[] e = new double[n];
        for (int r = 0; r < n; r++) {
            double fit = 0;
            for (int j = 0; j < k; j++) {
                fit += x[r][j] * beta[j];
            }
            e[r] = y[r] - fit;
        }
        // [2] the lag ⌊4 (n/100)^{2/9}⌋ (see the note on the lag in CalendarEffects)
        int lags = (int) Math.floor(4 * Math.pow(n / 100.0, 2.0 / 9.0));
        double[][] s = new double[k][k];
        for (int lag = 0; lag <= lags; lag++) {
            // [1] Bartlett weight w_j = 1 − j/(L + 1) in
            // S = Σ_t e_t² x_t x′_t + Σ_{j≥1} w_j Σ_t e_t e_{t−j} (x_t x′_{t−j} + x_{t−j} x′_t)
            double w = lag == 0 ? 1 : 1 - lag / (lags + 1.0);
            for (int r = lag; r < n; r++) {
                double ee = e[r] * e[r - lag];
                for (int a = 0; a < k; a++) {
                    for (int b = 0; b < k; b++) {
                        double term = x[r][a] * x[r - lag][b];
                        s[a][b] += w * ee * (lag == 0 ? term : term + x[r - lag][a] * x[r][b]);
                    }
                }
            }
        }
        // [1] the sandwich (X′X)⁻¹ S (X′X)⁻¹, times n/(n − k) (the degrees-of-freedom adjustment)
        RealMatrix covariance = xtxInverse.multiply(new Array2DRowRealMatrix(s, false)).multiply(xtxInverse)
                .scalarMultiply(n / (double) (n - k));
        List<CalendarEffects.Effect> effects = new ArrayList<>();
        for (int j = 1; j < k; j++) {
            double se = Math.sqrt(Math.max(0, covariance.getEntry(j, j)));
            // two-sided p from the normal approximation of β/se; p = 1 when se is 0 (our rule)
            double p = se == 0 ? 1 : 2 * STANDARD_NORMAL.cumulativeProbability(-Math.abs(beta[j] / se));
            effects.add(new CalendarEffects.Effect(names.get(j - 1), beta[j], se, p));
        }
        return Optional.of(new CalendarEffects.Result(effects, n, lags, d.easterWindow, screened, d.all));
    }
}
