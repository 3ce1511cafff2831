package org.annalist.analysis.breaks;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;

/**
 * One segmented line over the whole series, fitted at once by least squares: a line in each
 * regime, free to jump at a break that is a step, and joined (continuous) at a break that is a
 * bend, as in segmented or joinpoint regression [1]. The design has an intercept and a slope, and
 * for each break {@code k}, starting at {@code s_k} with instant τ_k = s_k − ½, the slope change
 * {@code (t − τ_k) [t ≥ s_k]} and, for a step only, the jump {@code [t ≥ s_k]}. When every break is
 * a step this is the same as fitting each regime's own line; a bend joins its two regimes, so both
 * of their lines change, and every statement about either regime reads them from this one fit.
 * Missing values ({@code NaN}) are left out.
 *
 * <p>[1] V. M. R. Muggeo (2003), "Estimating regression models with unknown break-points",
 * <i>Statistics in Medicine</i> 22(19), 3055–3071. doi:10.1002/sim.1545 (DOI from memory).
 */
final class JoinedLines {

    /** Each regime's line: value at index {@code i} is {@code intercepts[r] + slopes[r] i}. */
    private final double[] intercepts;
    private final double[] slopes;
    private final int[] starts;

    private JoinedLines(double[] intercepts, double[] slopes, int[] starts) {
        this.intercepts = intercepts;
        this.slopes = slopes;
        this.starts = starts;
    }

    /**
     * @param starts first index of each new regime, increasing
     * @param bent   for each break, whether it is a bend (no jump)
     */
    static JoinedLines fit(double[] y, int[] starts, boolean[] bent) {
        List<double[]> rows = new ArrayList<>();
        List<Double> values = new ArrayList<>();
        int columns = 2;
        for (boolean b : bent) {
            columns += b ? 1 : 2;
        }
        for (int i = 0; i < y.length; i++) {
            if (Double.isNaN(y[i])) {
                continue;
            }
            double[] row = new double[columns];
            row[0] = 1;
            row[1] = i;
            int c = 2;
            for (int k = 0; k < starts.length; k++) {
                double d = i >= starts[k] ? 1 : 0;
                row[c++] = (i - (starts[k] - 0.5)) * d;
                if (!bent[k]) {
                    row[c++] = d;
                }
            }
            rows.add(row);
            values.add(y[i]);
        }
        RealMatrix x = new Array2DRowRealMatrix(rows.size(), columns);
        RealVector v = new ArrayRealVector(rows.size());
        for (int r = 0; r < rows.size(); r++) {
            x.setRow(r, rows.get(r));
            v.setEntry(r, values.get(r));
        }
        RealVector beta = new QRDecomposition(x, 1e-12).getSolver().solve(v);
        double[] intercepts = new double[starts.length + 1];
        double[] slopes = new double[starts.length + 1];
        intercepts[0] = beta.getEntry(0);
        slopes[0] = beta.getEntry(1);
        int c = 2;
        for (int k = 0; k < starts.length; k++) {
            double slopeChange = beta.getEntry(c++);
            double jump = bent[k] ? 0 : beta.getEntry(c++);
            slopes[k + 1] = slopes[k] + slopeChange;
            intercepts[k + 1] = intercepts[k] + jump - slopeChange * (starts[k] - 0.5);
        }
        return new JoinedLines(intercepts, slopes, starts.clone());
    }

    /** Regime {@code r}'s line (0 before the first break) at {@code position}: {value, slope per period}. */
    double[] at(int r, double position) {
        return new double[] {intercepts[r] + slopes[r] * position, slopes[r]};
    }

    /** Number of breaks. */
    int breaks() {
        return starts.length;
    }
}
