package org.annalist.analysis.forecast;

import java.util.function.ToDoubleFunction;

/**
 * Minimises a smooth function inside a box by BFGS [1, Algorithm 6.1] on unbounded variables u with
 * x = lo + (hi − lo)·σ(u), σ the logistic function, forward-difference gradients (or an exact gradient
 * where the caller has one) and a backtracking
 * Armijo line search [1, Algorithm 3.1]. The transform keeps every trial point strictly inside the
 * box, so the objective never sees a parameter outside its bounds.
 *
 * <p>Written for the ETS likelihood: its derivative-free alternatives in Commons Math (BOBYQA) spend
 * most of their time in their own linear algebra, not in the ~10 µs objective.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Nocedal, J. &amp; Wright, S. J. (2006). <i>Numerical Optimization</i>, 2nd ed. Springer.
 * DOI 10.1007/978-0-387-40065-5.</li>
 * </ol>
 */
final class BoundedQuasiNewton {

    /** @param value the objective at {@code point}; {@code evaluations} how many times it was called */
    record Minimum(double[] point, double value, int evaluations) {

        Minimum {
            point = point.clone();
        }

        @Override
        public double[] point() {
            return point.clone();
        }
    }

    /** An exact gradient of the objective at a point of the box; false where it is not finite. */
    interface Gradient {
        boolean at(double[] x, double[] g);
    }

    private final double[] lower;
    private final double[] upper;
    private final ToDoubleFunction<double[]> objective;
    /** Null for forward differences. */
    private final Gradient exact;
    private int evaluations;

    BoundedQuasiNewton(double[] lower, double[] upper, ToDoubleFunction<double[]> objective) {
        this(lower, upper, objective, null);
    }

    /** With an exact gradient in place of forward differences (one call instead of one evaluation per variable). */
    BoundedQuasiNewton(double[] lower, double[] upper, ToDoubleFunction<double[]> objective, Gradient exact) {
        this.lower = lower.clone();
        this.upper = upper.clone();
        this.objective = objective;
        this.exact = exact;
    }

    /**
     * @param start          strictly inside the box
     * @param relativeChange stop when an iteration improves the value by less than this, relative
     * @param maxIterations  upper bound on BFGS iterations
     */
    Minimum minimise(double[] start, double relativeChange, int maxIterations) {
        int n = start.length;
        double[] u = new double[n];
        for (int i = 0; i < n; i++) {
            double p = (start[i] - lower[i]) / (upper[i] - lower[i]);
            p = Math.min(Math.max(p, 1e-6), 1 - 1e-6);
            u[i] = Math.log(p / (1 - p));
        }
        double value = valueAt(u);
        double[] gradient = gradientAt(u, value);
        double[][] inverseHessian = identity(n);
        for (int iteration = 0; iteration < maxIterations; iteration++) {
            double[] direction = new double[n];
            double slope = 0;
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    direction[i] -= inverseHessian[i][j] * gradient[j];
                }
                slope += direction[i] * gradient[i];
            }
            if (slope >= 0) { // the curvature estimate lost positive definiteness: restart on the gradient
                inverseHessian = identity(n);
                slope = 0;
                for (int i = 0; i < n; i++) {
                    direction[i] = -gradient[i];
                    slope -= gradient[i] * gradient[i];
                }
                if (slope == 0) {
                    break;
                }
            }
            double step = 1;
            double[] trial = new double[n];
            double trialValue = Double.NaN;
            boolean accepted = false;
            for (int halving = 0; halving < 40; halving++) {
                for (int i = 0; i < n; i++) {
                    trial[i] = u[i] + step * direction[i];
                }
                trialValue = valueAt(trial);
                if (trialValue <= value + 1e-4 * step * slope) { // [1] Algorithm 3.1: sufficient decrease
                    accepted = true;
                    break;
                }
                step *= 0.5;
            }
            if (!accepted) {
                break;
            }
            double[] trialGradient = gradientAt(trial, trialValue);
            double[] s = new double[n];
            double[] yDiff = new double[n];
            double sy = 0;
            for (int i = 0; i < n; i++) {
                s[i] = trial[i] - u[i];
                yDiff[i] = trialGradient[i] - gradient[i];
                sy += s[i] * yDiff[i];
            }
            if (sy > 1e-12) {
                if (iteration == 0) { // [1] eq. 6.20: Shanno–Phua scaling of the first curvature estimate
                    double yy = 0;
                    for (double d : yDiff) {
                        yy += d * d;
                    }
                    inverseHessian = identity(n);
                    for (int i = 0; i < n; i++) {
                        inverseHessian[i][i] = sy / yy;
                    }
                }
                updateInverseHessian(inverseHessian, s, yDiff, sy);
            }
            double improvement = value - trialValue;
            u = trial;
            value = trialValue;
            gradient = trialGradient;
            if (improvement < relativeChange * (Math.abs(value) + relativeChange)) {
                break;
            }
        }
        return new Minimum(toBox(u), value, evaluations);
    }

    /** H ← (I − ρ s yᵀ) H (I − ρ y sᵀ) + ρ s sᵀ, ρ = 1/(yᵀs) ([1] eq. 6.17). */
    private static void updateInverseHessian(double[][] h, double[] s, double[] y, double sy) {
        int n = s.length;
        double rho = 1 / sy;
        double[] hy = new double[n];
        double yhy = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                hy[i] += h[i][j] * y[j];
            }
            yhy += y[i] * hy[i];
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                h[i][j] += -rho * (hy[i] * s[j] + s[i] * hy[j]) + (rho * rho * yhy + rho) * s[i] * s[j]; // [1] eq. 6.17
            }
        }
    }

    /**
     * Forward differences with steps of 10⁻⁷ (about the square root of the double precision, as
     * [1] §8.1 recommends): half the cost of central differences, and on the
     * reference series the same optima.
     */
    private double[] gradientAt(double[] u, double valueAtU) {
        double[] g = new double[u.length];
        if (exact != null) {
            // where the value is not finite, differences are not finite either: both leave a zero gradient
            if (Double.isFinite(valueAtU) && exact.at(toBox(u), g)) {
                for (int i = 0; i < u.length; i++) { // the chain rule through x = lo + (hi − lo)·σ(u)
                    double sigma = 1 / (1 + Math.exp(-u[i]));
                    g[i] *= (upper[i] - lower[i]) * sigma * (1 - sigma);
                }
            } else {
                java.util.Arrays.fill(g, 0);
            }
            return g;
        }
        double[] probe = u.clone();
        for (int i = 0; i < u.length; i++) {
            double h = 1e-7 * Math.max(1, Math.abs(u[i]));
            probe[i] = u[i] + h;
            g[i] = (valueAt(probe) - valueAtU) / h;
            probe[i] = u[i];
            if (!Double.isFinite(g[i])) {
                g[i] = 0; // at the edge of the finite region: leave this coordinate to the other directions
            }
        }
        return g;
    }

    private double valueAt(double[] u) {
        evaluations++;
        double v = objective.applyAsDouble(toBox(u));
        return Double.isNaN(v) ? Double.POSITIVE_INFINITY : v;
    }

    private double[] toBox(double[] u) {
        double[] x = new double[u.length];
        for (int i = 0; i < u.length; i++) {
            x[i] = lower[i] + (upper[i] - lower[i]) / (1 + Math.exp(-u[i]));
        }
        return x;
    }

    private static double[][] identity(int n) {
        double[][] m = new double[n][n];
        for (int i = 0; i < n; i++) {
            m[i][i] = 1;
        }
        return m;
    }
}
