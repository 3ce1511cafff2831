package org.annalist.analysis.calendar;

import java.util.Arrays;
import java.util.Optional;
import org.annalist.analysis.OrderStatistics;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;

/**
 * Huber's M-estimate of a linear regression [1] by iteratively reweighted least squares [2]: the
 * robust start of {@link CalendarEffects#robust}. Weights w = min(1, k / |r/s|) with k = 1.345 and
 * the scale s = 1.4826 · MAD of the residuals, re-estimated at every step; at most 50 steps, stopping
 * when no coefficient moves by more than 1e-10 of its size plus the scale.
 *
 * <p>References:
 * <ol>
 * <li>P. J. Huber (1964), "Robust Estimation of a Location Parameter", <i>The Annals of
 *     Mathematical Statistics</i> 35(1), 73–101. doi:10.1214/aoms/1177703732</li>
 * <li>P. W. Holland and R. E. Welsch (1977), "Robust regression using iteratively reweighted
 *     least-squares", <i>Communications in Statistics – Theory and Methods</i> 6(9), 813–827.
 *     doi:10.1080/03610927708827533 (k = 1.345 for 95 % efficiency at the normal, from memory)</li>
 * </ol>
 */
final class HuberRegression {

    /** Huber's tuning constant: 95 % efficiency at the normal ([2], from memory). */
    private static final double HUBER_K = 1.345;
    private static final int MAX_IRLS_STEPS = 50;

    private HuberRegression() {
    }

    static double dot(double[] a, double[] b) {
        double s = 0;
        for (int j = 0; j < a.length; j++) {
            s += a[j] * b[j];
        }
        return s;
    }

    /** Weighted least squares β = (X′WX)⁻¹ X′Wy; empty when the regressors cannot be told apart. */
    private static Optional<double[]> weighted(double[][] x, double[] y, double[] w) {
        int k = x[0].length;
        double[][] xtx = new double[k][k];
        double[] xty = new double[k];
        for (int r = 0; r < y.length; r++) {
            for (int a = 0; a < k; a++) {
                xty[a] += w[r] * x[r][a] * y[r];
                for (int b = 0; b < k; b++) {
                    xtx[a][b] += w[r] * x[r][a] * x[r][b];
                }
            }
        }
        DecompositionSolver solver = new LUDecomposition(new Array2DRowRealMatrix(xtx, false)).getSolver();
        return solver.isNonSingular() ? Optional.of(solver.solve(new ArrayRealVector(xty))
                .toArray()) : Optional.empty();
    }

    /** [1], [2]: Huber's M-estimate by iteratively reweighted least squares, from least squares. */
    static Optional<double[]> fit(double[][] x, double[] y) {
        double[] w = new double[y.length];
        Arrays.fill(w, 1);
        Optional<double[]> start = weighted(x, y, w);
        if (start.isEmpty()) {
            return start;
        }
        double[] beta = start.get();
        double[] residual = new double[y.length];
        for (int step = 0; step < MAX_IRLS_STEPS; step++) {
            for (int r = 0; r < y.length; r++) {
                residual[r] = y[r] - dot(x[r], beta);
            }
            double median = OrderStatistics.median(residual);   // which leaves residual as it is
            double[] deviation = new double[residual.length];
            for (int r = 0; r < residual.length; r++) {
                deviation[r] = Math.abs(residual[r] - median);
            }
            double scale = 1.4826 * OrderStatistics.median(deviation);
            if (scale == 0) {
                break;   // a perfect fit for most values: least squares is as good as it gets
            }
            for (int r = 0; r < w.length; r++) {
                // [1] Huber's ψ as a weight: 1 inside k·s, k·s/|r| beyond
                double u = Math.abs(residual[r]) / scale;
                w[r] = u <= HUBER_K ? 1 : HUBER_K / u;
            }
            Optional<double[]> next = weighted(x, y, w);
            if (next.isEmpty()) {
                return next;
            }
            double moved = 0;
            for (int j = 0; j < beta.length; j++) {
                moved = Math.max(moved, Math.abs(next.get()[j] - beta[j]) / (1e-12 + Math.abs(beta[j]) + scale));
            }
            beta = next.get();
            if (moved < 1e-10) {
                break;
            }
        }
        return Optional.of(beta);
    }
}
