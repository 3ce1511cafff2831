package org.annalist.analysis.forecast;

/**
 * Minimises a function by the simplex method of Nelder and Mead [1] with reflection 1, contraction
 * 0.5 and expansion 2, in the variant of Nash [2, Algorithm 19] that R's {@code optim} uses (and, in
 * its own copy, the forecast package's {@code ets} [3]): the first simplex steps every variable in
 * turn by a tenth of the largest absolute start value, so that variables of very different sizes
 * (smoothing parameters and states in a series' own units) share one step; non-finite values count
 * as a very large one; the search stops when the simplex's values differ by less than a relative
 * tolerance of the start's value, when a shrink no longer makes the simplex smaller, or after a
 * number of evaluations.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Nelder, J. A. &amp; Mead, R. (1965). A simplex method for function minimization. <i>The Computer
 * Journal</i> 7(4), 308–313. DOI 10.1093/comjnl/7.4.308.</li>
 * <li>Nash, J. C. (1990). <i>Compact Numerical Methods for Computers: Linear Algebra and Function
 * Minimisation</i>, 2nd ed. Adam Hilger. DOI 10.1201/9781315139784.</li>
 * <li>Hyndman, R. J. &amp; Khandakar, Y. (2008). Automatic time series forecasting: the forecast
 * package for R. <i>Journal of Statistical Software</i> 27(3), 1–22. DOI 10.18637/jss.v027.i03.</li>
 * </ol>
 */
final class NelderMead {

    /** What a non-finite value counts as, so that the simplex moves away from it. */
    private static final double BIG = 1e35;
    private static final double REFLECTION = 1;
    private static final double CONTRACTION = 0.5;
    private static final double EXPANSION = 2;

    private NelderMead() {
    }

    /** The function to minimise. */
    interface Objective {
        /**
         * @param cutoff where the value is at or above this, any value at or above it serves: the
         *               search treats them all alike, so that costly checks can be skipped there
         */
        double at(double[] x, double cutoff);
    }

    /**
     * @param relativeTolerance stop when the highest and lowest vertex values differ by less than this
     *                          times |f(start)| (+ the tolerance itself)
     * @return the best vertex found; its value is +∞ when the function is not finite at {@code start}
     */
    static BoundedQuasiNewton.Minimum minimise(Objective f, double[] start, double relativeTolerance,
                                               int maxEvaluations) {
        int n = start.length;
        double first = f.at(start.clone(), Double.POSITIVE_INFINITY);
        if (!Double.isFinite(first)) {
            return new BoundedQuasiNewton.Minimum(start, Double.POSITIVE_INFINITY, 1);
        }
        int evaluations = 1;
        double convergence = relativeTolerance * (Math.abs(first) + relativeTolerance);
        double[][] vertex = new double[n + 1][];
        double[] value = new double[n + 1];
        vertex[0] = start.clone();
        value[0] = first;
        double step = 0;
        for (double v : start) {
            step = Math.max(step, 0.1 * Math.abs(v));
        }
        step = step == 0 ? 0.1 : step;
        double size = 0;
        for (int j = 1; j <= n; j++) {
            vertex[j] = start.clone();
            double trial = step;
            while (vertex[j][j - 1] == start[j - 1]) { // a step lost to rounding on a large variable
                vertex[j][j - 1] = start[j - 1] + trial;
                trial *= 10;
            }
            size += trial;
            value[j] = evaluate(f, vertex[j], Double.POSITIVE_INFINITY);
            evaluations++;
        }
        double oldSize = size;
        int low = 0;
        double[] centroid = new double[n];
        double[] trial = new double[n];
        while (evaluations <= maxEvaluations) {
            int high = low;
            for (int j = 0; j <= n; j++) {
                if (value[j] < value[low]) {
                    low = j;
                }
                if (value[j] > value[high]) {
                    high = j;
                }
            }
            if (value[high] <= value[low] + convergence) {
                break;
            }
            for (int i = 0; i < n; i++) {
                double sum = 0;
                for (int j = 0; j <= n; j++) {
                    sum += j == high ? 0 : vertex[j][i];
                }
                centroid[i] = sum / n;
                trial[i] = (1 + REFLECTION) * centroid[i] - REFLECTION * vertex[high][i];
            }
            double reflected = evaluate(f, trial, value[high]);
            evaluations++;
            double highest = value[high];
            if (reflected < value[low]) {
                double[] expanded = new double[n];
                for (int i = 0; i < n; i++) {
                    expanded[i] = EXPANSION * trial[i] + (1 - EXPANSION) * centroid[i];
                }
                double e = evaluate(f, expanded, reflected);
                evaluations++;
                vertex[high] = e < reflected ? expanded : trial.clone();
                value[high] = Math.min(e, reflected);
                continue;
            }
            if (reflected < value[high]) {
                vertex[high] = trial.clone();
                value[high] = reflected;
            }
            double[] contracted = new double[n];
            for (int i = 0; i < n; i++) {
                contracted[i] = (1 - CONTRACTION) * vertex[high][i] + CONTRACTION * centroid[i];
            }
            double c = evaluate(f, contracted, value[high]);
            evaluations++;
            if (c < value[high]) {
                vertex[high] = contracted;
                value[high] = c;
            } else if (reflected >= highest) {
                size = 0;
                for (int j = 0; j <= n; j++) {
                    if (j != low) {
                        for (int i = 0; i < n; i++) {
                            vertex[j][i] = CONTRACTION * (vertex[j][i] - vertex[low][i]) + vertex[low][i];
                            size += Math.abs(vertex[j][i] - vertex[low][i]);
                        }
                        value[j] = evaluate(f, vertex[j], Double.POSITIVE_INFINITY);
                        evaluations++;
                    }
                }
                if (size >= oldSize) {
                    break; // the shrink no longer makes the simplex smaller
                }
                oldSize = size;
            }
        }
        return new BoundedQuasiNewton.Minimum(vertex[low], value[low], evaluations);
    }

    private static double evaluate(Objective f, double[] x, double cutoff) {
        double v = f.at(x.clone(), cutoff);
        return Double.isFinite(v) ? v : BIG;
    }
}
