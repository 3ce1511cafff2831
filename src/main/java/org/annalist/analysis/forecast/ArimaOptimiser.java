package org.annalist.analysis.forecast;

import java.util.Optional;
import java.util.function.ToDoubleFunction;

/**
 * The variable-metric (BFGS) minimiser that R's {@code optim(method = "BFGS")} runs, Nash's
 * Algorithm 21 [1, §15], with R's defaults: central-difference gradients with steps of 10⁻³ on the
 * scaled variables x / parscale, step reduction 0.2, acceptance constant 10⁻⁴, relative tolerance
 * √ε, at most 100 iterations, and the curvature reset rules of R's {@code vmmin} [2]. Written so that
 * an ARIMA fit stops where R's {@code arima} stops, not only near the same optimum; the numerical
 * Hessian is R's {@code optimhess} [2].
 *
 * <h2>References</h2>
 * <ol>
 * <li>Nash, J. C. (1990). <i>Compact Numerical Methods for Computers</i>, 2nd ed. Adam Hilger.</li>
 * <li>R Core Team, {@code src/appl/optim.c} and {@code src/library/stats/src/optim.c} (R 4.2).</li>
 * </ol>
 */
final class ArimaOptimiser {

    /** R's defaults for {@code optim}: ndeps, maxit, reltol (√ε), stepredn, acctol, reltest. */
    private static final double STEP = 1e-3;
    static final int MAX_ITERATIONS = 100;
    private static final double RELTOL = Math.sqrt(Math.ulp(1.0));
    private static final double STEP_REDUCTION = 0.2;
    private static final double ACCEPTANCE = 1e-4;
    private static final double RELTEST = 10.0;

    /** @param converged false when the iteration limit stopped the search (R's code 1) */
    record Result(double[] par, double value, boolean converged) {
        Result {
            par = par.clone();
        }

        @Override
        public double[] par() {
            return par.clone();
        }
    }

    /** An exact gradient of the objective at the unscaled parameters; false where it is not finite. */
    interface Gradient {
        boolean at(double[] par, double[] g);
    }

    private final ToDoubleFunction<double[]> objective;
    private final double[] parscale;
    private final double[] point;
    /** Null for R's central differences. */
    private final Gradient exact;

    /** @param objective of the unscaled parameters; may return NaN or infinity where undefined */
    ArimaOptimiser(ToDoubleFunction<double[]> objective, double[] parscale) {
        this(objective, parscale, null);
    }

    /**
     * With an exact gradient in place of R's central differences: the same search, ending within the
     * same relative tolerance of the same optimum (not at R's last iterate), for about 3 objective
     * evaluations per gradient instead of 2 per parameter.
     */
    ArimaOptimiser(ToDoubleFunction<double[]> objective, double[] parscale, Gradient exact) {
        this.objective = objective;
        this.parscale = parscale.clone();
        this.point = new double[parscale.length];
        this.exact = exact;
    }

    private double valueAtScaled(double[] scaled) {
        for (int i = 0; i < scaled.length; i++) {
            point[i] = scaled[i] * parscale[i];
        }
        return objective.applyAsDouble(point);
    }

    /** Central differences (or the exact gradient) on the scaled variables; false when one is not finite (R stops with an error). */
    private boolean gradient(double[] scaled, double[] g) {
        return gradient(scaled, g, exact != null);
    }

    private boolean gradient(double[] scaled, double[] g, boolean useExact) {
        if (useExact) { // chain rule to the scaled variables: ∂f/∂b_i = parscale_i ∂f/∂x_i
            for (int i = 0; i < scaled.length; i++) {
                point[i] = scaled[i] * parscale[i];
            }
            if (!exact.at(point, g)) {
                return false;
            }
            for (int i = 0; i < g.length; i++) {
                g[i] *= parscale[i];
            }
            return true;
        }
        for (int i = 0; i < scaled.length; i++) {
            double keep = scaled[i];
            scaled[i] = keep + STEP;
            double up = valueAtScaled(scaled);
            scaled[i] = keep - STEP;
            double down = valueAtScaled(scaled);
            scaled[i] = keep;
            g[i] = (up - down) / (2 * STEP);
            if (!Double.isFinite(g[i])) {
                return false;
            }
        }
        return true;
    }

    /**
     * [2] {@code vmmin}.
     *
     * @return empty where R's {@code optim} stops with an error (a non-finite start or gradient)
     */
    Optional<Result> minimise(double[] start, int maxIterations) {
        int n = start.length;
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = start[i] / parscale[i];
        }
        double f = valueAtScaled(b);
        if (maxIterations <= 0) {
            return Double.isFinite(f) || n == 0 ? Optional.of(new Result(start, f, true)) : Optional.empty();
        }
        if (!Double.isFinite(f)) {
            return Optional.empty();
        }
        if (n == 0) {
            return Optional.of(new Result(start, f, true));
        }
        double fmin = f;
        double[] g = new double[n];
        if (!gradient(b, g)) {
            return Optional.empty();
        }
        int iter = 1;
        int gradcount = 1;
        int ilast = gradcount;
        double[] t = new double[n];
        double[] x = new double[n];
        double[] c = new double[n];
        double[][] bm = new double[n][n];
        int count;
        boolean converged = true;
        do {
            if (ilast == gradcount) {
                for (int i = 0; i < n; i++) {
                    for (int j = 0; j < i; j++) {
                        bm[i][j] = 0;
                    }
                    bm[i][i] = 1;
                }
            }
            for (int i = 0; i < n; i++) {
                x[i] = b[i];
                c[i] = g[i];
            }
            double gradproj = 0;
            for (int i = 0; i < n; i++) {
                double s = 0;
                for (int j = 0; j <= i; j++) {
                    s -= bm[i][j] * g[j];
                }
                for (int j = i + 1; j < n; j++) {
                    s -= bm[j][i] * g[j];
                }
                t[i] = s;
                gradproj += s * g[i];
            }
            if (gradproj < 0) { // downhill
                double steplength = 1;
                boolean accpoint = false;
                do {
                    count = 0;
                    for (int i = 0; i < n; i++) {
                        b[i] = x[i] + steplength * t[i];
                        if (RELTEST + x[i] == RELTEST + b[i]) {
                            count++;
                        }
                    }
                    if (count < n) {
                        f = valueAtScaled(b);
                        accpoint = Double.isFinite(f) && f <= fmin + gradproj * steplength * ACCEPTANCE;
                        if (!accpoint) {
                            steplength *= STEP_REDUCTION;
                        }
                    }
                } while (!(count == n || accpoint));
                boolean enough = Math.abs(f - fmin) > RELTOL * (Math.abs(fmin) + RELTOL);
                if (!enough) {
                    count = n;
                    fmin = f;
                }
                if (count < n) { // making progress
                    fmin = f;
                    if (!gradient(b, g)) {
                        return Optional.empty();
                    }
                    gradcount++;
                    iter++;
                    double d1 = 0;
                    for (int i = 0; i < n; i++) {
                        t[i] = steplength * t[i];
                        c[i] = g[i] - c[i];
                        d1 += t[i] * c[i];
                    }
                    if (d1 > 0) {
                        double d2 = 0;
                        for (int i = 0; i < n; i++) {
                            double s = 0;
                            for (int j = 0; j <= i; j++) {
                                s += bm[i][j] * c[j];
                            }
                            for (int j = i + 1; j < n; j++) {
                                s += bm[j][i] * c[j];
                            }
                            x[i] = s;
                            d2 += s * c[i];
                        }
                        d2 = 1 + d2 / d1;
                        for (int i = 0; i < n; i++) {
                            for (int j = 0; j <= i; j++) {
                                bm[i][j] += (d2 * t[i] * t[j] - x[i] * t[j] - t[i] * x[j]) / d1;
                            }
                        }
                    } else {
                        ilast = gradcount;
                    }
                } else if (ilast < gradcount) { // no progress: restart from the gradient
                    count = 0;
                    ilast = gradcount;
                }
            } else { // uphill: reset unless just reset
                count = 0;
                if (ilast == gradcount) {
                    count = n;
                } else {
                    ilast = gradcount;
                }
            }
            if (iter >= maxIterations) {
                converged = false;
                break;
            }
            if (gradcount - ilast > 2 * n) {
                ilast = gradcount; // periodic restart
            }
        } while (count != n || ilast != gradcount);
        double[] par = new double[n];
        for (int i = 0; i < n; i++) {
            par[i] = b[i] * parscale[i];
        }
        return Optional.of(new Result(par, fmin, converged));
    }

    /**
     * [2] {@code optimhess}: differences of the numerical gradient with steps of 10⁻³ on the scaled
     * variables, symmetrised, on the unscaled variables; empty when a gradient is not finite.
     */
    Optional<double[][]> hessian(double[] par) {
        int n = par.length;
        double[] scaled = new double[n];
        for (int i = 0; i < n; i++) {
            scaled[i] = par[i] / parscale[i];
        }
        double[][] h = new double[n][n];
        double[] g1 = new double[n];
        double[] g2 = new double[n];
        for (int i = 0; i < n; i++) {
            double keep = scaled[i];
            double eps = STEP / parscale[i]; // [2] optimhess: ndeps / parscale on the scaled variable
            scaled[i] = keep + eps;
            // R's differences here even with an exact gradient: whether a model's variances are valid
            // (the forecast package's check) should not depend on which gradient the search used
            boolean ok = gradient(scaled, g1, false);
            scaled[i] = keep - eps;
            ok &= gradient(scaled, g2, false);
            scaled[i] = keep;
            if (!ok) {
                return Optional.empty();
            }
            for (int j = 0; j < n; j++) {
                h[i][j] = (g1[j] - g2[j]) / (2 * eps * parscale[i] * parscale[j]);
            }
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < i; j++) {
                double mean = 0.5 * (h[i][j] + h[j][i]);
                h[i][j] = mean;
                h[j][i] = mean;
            }
        }
        return Optional.of(h);
    }
}
