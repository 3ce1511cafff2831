package org.annalist.analysis.breaks;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;

/**
 * What a break in a segmented line changed, as evidence for the words: the span of its two regimes
 * is fitted three ways, each a linear regression with the break instant τ between the old regime's
 * last period and the new regime's first,
 * <ul>
 * <li>a step in level: one common slope, the level jumps at τ — {@code y = a + b t + c D};</li>
 * <li>a change in slope: one continuous line that bends at τ — {@code y = a + b t + d (t − τ) D};</li>
 * <li>both: two separate lines — {@code y = a + b t + c D + d (t − τ) D};</li>
 * </ul>
 * with {@code D = 1} from the break on, and each fit is scored by Schwarz's BIC [1]
 * {@code n ln(RSS/n) + k ln n}. The two restricted fits have the same number of parameters, so
 * between them BIC picks the smaller residual sum of squares; the unrestricted fit pays for its
 * extra parameter. Which description is chosen, and by what margin, is a decision of the findings.
 * Missing values ({@code NaN}) are left out.
 *
 * <p>References:
 * <ol>
 * <li>G. Schwarz (1978), "Estimating the Dimension of a Model", <i>Annals of Statistics</i> 6(2),
 *     461–464. doi:10.1214/aos/1176344136 (DOI from memory)</li>
 * </ol>
 *
 * @param bicStep  BIC of the step-in-level description (3 parameters)
 * @param bicSlope BIC of the change-in-slope description (3 parameters)
 * @param bicBoth  BIC of the two separate lines (4 parameters)
 */
public record BreakShape(double bicStep, double bicSlope, double bicBoth) {

    /**
     * The three fits over {@code from..to} with the new regime starting at {@code start}; all NaN
     * when a side has fewer than two observed values (no line can be fitted there). With two
     * distinct times on each side the designs have full rank.
     */
    static BreakShape of(double[] y, int from, int start, int to) {
        double tau = start - 0.5;
        List<double[]> rows = new ArrayList<>();
        List<Double> values = new ArrayList<>();
        int before = 0;
        int after = 0;
        for (int i = from; i <= to; i++) {
            if (!Double.isNaN(y[i])) {
                double t = i - tau;   // centred at the break: keeps the design well conditioned
                double d = i >= start ? 1 : 0;
                rows.add(new double[] {1, t, d, t * d});
                values.add(y[i]);
                before += i < start ? 1 : 0;
                after += i >= start ? 1 : 0;
            }
        }
        if (before < 2 || after < 2) {
            // a line needs two observed values on each side; else no description can be compared
            return new BreakShape(Double.NaN, Double.NaN, Double.NaN);
        }
        return new BreakShape(bic(rows, values, new int[] {0, 1, 2}), bic(rows, values, new int[] {0, 1, 3}),
                bic(rows, values, new int[] {0, 1, 2, 3}));
    }

    private static double bic(List<double[]> rows, List<Double> values, int[] columns) {
        int n = rows.size();
        int k = columns.length;
        if (n <= k) {
            return Double.NaN;
        }
        RealMatrix x = new Array2DRowRealMatrix(n, k);
        RealVector v = new ArrayRealVector(n);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < k; j++) {
                x.setEntry(i, j, rows.get(i)[columns[j]]);
            }
            v.setEntry(i, values.get(i));
        }
        RealVector beta = new QRDecomposition(x, 1e-12).getSolver().solve(v);
        RealVector residuals = v.subtract(x.operate(beta));
        // [1] BIC; a perfect fit has no finite score, so its RSS is floored at a negligible value
        return n * Math.log(Math.max(residuals.dotProduct(residuals), 1e-300) / n) + k * Math.log(n);
    }
}
