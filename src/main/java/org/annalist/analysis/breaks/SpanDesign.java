package org.annalist.analysis.breaks;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;

/**
 * The regression design of a break's two regimes {@code from..start−1} and {@code start..to}, the
 * columns {@code 1, t, D, t·D} with {@code t} centred at the break instant τ = start − ½ (which keeps
 * the design well conditioned and makes a line's intercept its value at τ) and {@code D = 1} from the
 * break on. Missing values ({@code NaN}) are left out. {@link BreakShape} and {@link StepOrBend} fit
 * subsets of its columns by least squares.
 *
 * @param rows   one row of the four columns per observed value
 * @param values the observed values, in the rows' order
 * @param before how many observed values lie before the break
 * @param after  how many lie from it on
 */
record SpanDesign(List<double[]> rows, List<Double> values, int before, int after) {

    /** Column of the intercept, of the slope, of the step D and of the change of slope t·D. */
    static final int INTERCEPT = 0;
    static final int SLOPE = 1;
    static final int STEP = 2;
    static final int SLOPE_CHANGE = 3;

    static SpanDesign of(double[] y, int from, int start, int to) {
        double tau = start - 0.5;
        List<double[]> rows = new ArrayList<>();
        List<Double> values = new ArrayList<>();
        int before = 0;
        int after = 0;
        for (int i = from; i <= to; i++) {
            if (!Double.isNaN(y[i])) {
                double t = i - tau;
                double d = i >= start ? 1 : 0;
                rows.add(new double[] {1, t, d, t * d});
                values.add(y[i]);
                before += i < start ? 1 : 0;
                after += i >= start ? 1 : 0;
            }
        }
        return new SpanDesign(rows, values, before, after);
    }

    int size() {
        return rows.size();
    }

    /**
     * The residual sum of squares of the least-squares fit on {@code columns}; its coefficients, in
     * the columns' order, into {@code beta} when that is not null.
     */
    double rss(int[] columns, double[] beta) {
        int n = rows.size();
        int k = columns.length;
        RealMatrix x = new Array2DRowRealMatrix(n, k);
        RealVector v = new ArrayRealVector(n);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < k; j++) {
                x.setEntry(i, j, rows.get(i)[columns[j]]);
            }
            v.setEntry(i, values.get(i));
        }
        RealVector b = new QRDecomposition(x, 1e-12).getSolver().solve(v);
        if (beta != null) {
            for (int j = 0; j < k; j++) {
                beta[j] = b.getEntry(j);
            }
        }
        RealVector residuals = v.subtract(x.operate(b));
        return residuals.dotProduct(residuals);
    }

    /**
     * The design and values after the Prais–Winsten transform with lag-1 autocorrelation
     * {@code rho} (see {@link StepOrBend}'s reference [5]): the first row scaled by √(1 − ρ²), each
     * later one less ρ times the one before; consecutive observed values count as adjacent.
     */
    SpanDesign whitened(double rho) {
        List<double[]> whitenedRows = new ArrayList<>();
        List<Double> whitenedValues = new ArrayList<>();
        double first = Math.sqrt(1 - rho * rho);
        for (int i = 0; i < rows.size(); i++) {
            double[] row = new double[4];
            for (int j = 0; j < 4; j++) {
                row[j] = i == 0 ? first * rows.get(0)[j] : rows.get(i)[j] - rho * rows.get(i - 1)[j];
            }
            whitenedRows.add(row);
            whitenedValues.add(i == 0 ? first * values.get(0) : values.get(i) - rho * values.get(i - 1));
        }
        return new SpanDesign(whitenedRows, whitenedValues, before, after);
    }
}
