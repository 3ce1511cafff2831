package org.annalist.analysis.decompose;

import java.util.Optional;

/**
 * STL, the seasonal-trend decomposition by loess: {@code y = seasonal + trend + remainder}.
 *
 * <p>A faithful port of the reference Fortran of Cleveland et al. [1] (routines {@code stl},
 * {@code stlstp}, {@code stlss}, {@code stlfts}, {@code stless}, {@code stlest}, {@code stlrwt}),
 * as R's {@code stats::stl} runs it [2]: inner loop of cycle-subseries smoothing, low-pass
 * filtering (moving averages of length n_p, n_p, 3, then loess) and trend smoothing; outer loop of
 * bisquare robustness weights with h = 6 × median |R|; loess of degree 0 or 1 with tricube
 * neighbourhood weights, evaluated every {@code jump}-th point and interpolated linearly in between.
 *
 * <p>Missing values ({@code NaN}) are handled as the paper [1] describes: they take weight zero
 * in every loess fit, so the seasonal and trend components are estimated there from their
 * neighbours, while the remainder stays missing. (R's {@code stl} refuses missing values; with
 * none, the two agree.)
 *
 * <p>Defaults follow R [2]: trend window {@code nextodd(ceil(1.5 n_p / (1 − 1.5 / n_s)))} (the
 * paper's choice [1]), low-pass window {@code nextodd(n_p)}, degrees 0 (seasonal), 1 (trend,
 * low-pass), jumps {@code ceil(window / 10)}; robust: 1 inner and 15 outer iterations, else 2 and
 * 0. A periodic seasonal ({@link #periodic()}) smooths with a window of 10n + 1 and degree 0, then
 * replaces each cycle position by its mean, as R does. The seasonal window of
 * {@link #withPeriod} is our choice (see there).
 *
 * <p>References:
 * <ol>
 * <li>R. B. Cleveland, W. S. Cleveland, J. E. McRae and I. Terpenning (1990), "STL: A
 *     Seasonal-Trend Decomposition Procedure Based on Loess", <i>Journal of Official
 *     Statistics</i> 6(1), 3–73 (no DOI).</li>
 * <li>R Core Team, {@code src/library/stats/R/stl.R} and {@code src/library/stats/src/stl.f}
 *     (R 4.2).</li>
 * </ol>
 */
public final class Stl {

    /** Whether the outer loop computes robustness weights. */
    public enum Robustness { OFF, ON }

    /**
     * The settings a fit actually used, as the methods appendix states them.
     *
     * @param seasonalWindow 10n + 1 for a periodic seasonal
     */
    public record Parameters(int period, int seasonalWindow, int seasonalDegree, int trendWindow, int trendDegree,
                             int lowPassWindow, int lowPassDegree, int seasonalJump, int trendJump, int lowPassJump,
                             int inner, int outer, boolean periodic) {
    }

    /** Why a series cannot be decomposed. */
    public enum Obstacle {
        /** No more than two full periods (R's {@code stl} asks for more). */
        TOO_SHORT,
        /** A position of the period with fewer than two observed values. */
        SPARSE_POSITION
    }

    /**
     * The components, each a fresh copy on access.
     *
     * @param weights final robustness weights (1 for a non-robust fit, 0 at missing values)
     */
    public record Result(double[] seasonal, double[] trend, double[] remainder, double[] weights,
                         Parameters parameters) {

        public Result {
            seasonal = seasonal.clone();
            trend = trend.clone();
            remainder = remainder.clone();
            weights = weights.clone();
        }

        @Override
        public double[] seasonal() {
            return seasonal.clone();
        }

        @Override
        public double[] trend() {
            return trend.clone();
        }

        @Override
        public double[] remainder() {
            return remainder.clone();
        }

        @Override
        public double[] weights() {
            return weights.clone();
        }

        /** Seasonally adjusted values: observed minus seasonal ({@code NaN} where observed is missing). */
        public double[] adjusted() {
            double[] adjusted = new double[trend.length];
            for (int i = 0; i < adjusted.length; i++) {
                adjusted[i] = trend[i] + remainder[i];
            }
            return adjusted;
        }
    }

    /**
     * The reference code writes these thresholds as single-precision literals ({@code .999},
     * {@code .001}) inside double arithmetic; their float values are kept so that borderline
     * residuals fall on the same side as in R.
     */
    static final double SINGLE_0_999 = 0.999f;
    static final double SINGLE_0_001 = 0.001f;

    private final int period;
    private final Integer seasonalWindow;   // null: periodic
    private final Integer trendWindow;      // null: R's default
    private final Robustness robustness;
    private final Integer inner;
    private final Integer outer;

    private Stl(int period, Integer seasonalWindow, Integer trendWindow, Robustness robustness, Integer inner,
                Integer outer) {
        this.period = period;
        this.seasonalWindow = seasonalWindow;
        this.trendWindow = trendWindow;
        this.robustness = robustness;
        this.inner = inner;
        this.outer = outer;
    }

    /**
     * STL for {@code period} observations per cycle with a seasonal window of 13 (about a decade of
     * Januaries weighs in each January's value; odd and ≥ 7, as the paper asks [1]), robust. The
     * value 13 is our choice: R's {@code stl} has no default seasonal window.
     */
    public static Stl withPeriod(int period) {
        if (period < 2) {
            throw new IllegalArgumentException("STL needs a seasonal period of at least 2, was " + period);
        }
        return new Stl(period, 13, null, Robustness.ON, null, null);
    }

    public Stl withSeasonalWindow(int window) {
        if (window < 3) {
            throw new IllegalArgumentException("seasonal window must be at least 3, was " + window);
        }
        return new Stl(period, window, trendWindow, robustness, inner, outer);
    }

    /** A seasonal pattern that is the same every cycle (R's {@code s.window = "periodic"}). */
    public Stl periodic() {
        return new Stl(period, null, trendWindow, robustness, inner, outer);
    }

    public Stl withTrendWindow(int window) {
        return new Stl(period, seasonalWindow, window, robustness, inner, outer);
    }

    public Stl with(Robustness r) {
        return new Stl(period, seasonalWindow, trendWindow, r, inner, outer);
    }

    /** Overrides the loop counts that {@link Robustness} implies. */
    public Stl withIterations(int innerLoops, int outerLoops) {
        return new Stl(period, seasonalWindow, trendWindow, robustness, innerLoops, outerLoops);
    }

    /** Why {@link #fit} would refuse {@code y}; empty when it can decompose it. */
    public Optional<Obstacle> obstacle(double[] y) {
        if (y.length <= 2 * period) {
            return Optional.of(Obstacle.TOO_SHORT);
        }
        for (int j = 0; j < period; j++) {
            int observed = 0;
            for (int t = j; t < y.length; t += period) {
                observed += Double.isNaN(y[t]) ? 0 : 1;
            }
            if (observed < 2) {
                return Optional.of(Obstacle.SPARSE_POSITION);
            }
        }
        return Optional.empty();
    }

    /**
     * @throws IllegalArgumentException if the series has no more than two full periods (as R's
     *                                  {@code stl}), or fewer than two observed values per cycle
     *                                  position: ask {@link #obstacle} first
     */
    public Result fit(double[] y) {
        int n = y.length;
        if (n <= 2 * period) {
            throw new IllegalArgumentException("STL needs more than two full periods: " + (2 * period + 1)
                    + " observations or more for period " + period + ", got " + n);
        }
        boolean periodic = seasonalWindow == null;
        // [2] stl.R: a periodic seasonal is smoothed with window 10 n + 1 (degree 0)
        int ns = periodic ? 10 * n + 1 : seasonalWindow;
        int sDegree = 0;
        // [1], [2]: n_t = nextodd(ceil(1.5 n_p / (1 − 1.5 / n_s))), n_l = nextodd(n_p)
        int nt = trendWindow != null ? trendWindow : nextOdd((int) Math.ceil(1.5 * period / (1 - 1.5 / ns)));
        int nl = nextOdd(period);
        // [2] stl.R: robust 1 inner and 15 outer passes, else 2 and 0
        int ni = inner != null ? inner : robustness == Robustness.ON ? 1 : 2;
        int no = outer != null ? outer : robustness == Robustness.ON ? 15 : 0;
        Parameters p = new Parameters(period, ns, sDegree, nt, 1, nl, 1, jump(ns), jump(nt), jump(nl), ni, no, periodic);

        double[] observedWeight = new double[n];
        double[] values = new double[n];
        boolean anyMissing = false;
        for (int i = 0; i < n; i++) {
            boolean missing = Double.isNaN(y[i]);
            anyMissing |= missing;
            observedWeight[i] = missing ? 0 : 1;
            values[i] = missing ? 0 : y[i];
        }
        for (int j = 0; j < period; j++) {
            int seen = 0;
            for (int i = j; i < n; i += period) {
                seen += (int) observedWeight[i];
            }
            if (seen < 2) {
                throw new IllegalArgumentException("STL needs two observed values at every position of the period; "
                        + "position " + (j + 1) + " of " + period + " has " + seen);
            }
        }
        double[] seasonal = new double[n];
        double[] trend = new double[n];
        double[] rw = observedWeight.clone();
        boolean userw = anyMissing;
        StlPasses.Workspace work = new StlPasses.Workspace(n, period);
        for (int k = 0; ; k++) {
            StlPasses.innerLoop(values, p, userw, rw, seasonal, trend, work);
            if (k + 1 > no) {
                break;
            }
            double[] fit = new double[n];
            for (int i = 0; i < n; i++) {
                fit[i] = trend[i] + seasonal[i];
            }
            StlPasses.robustnessWeights(values, observedWeight, fit, rw);
            userw = true;
        }
        if (no <= 0) {
            rw = observedWeight.clone();
        }
        if (periodic) {
            averageByCyclePosition(seasonal);
        }
        double[] remainder = new double[n];
        for (int i = 0; i < n; i++) {
            remainder[i] = Double.isNaN(y[i]) ? Double.NaN : y[i] - seasonal[i] - trend[i];
        }
        return new Result(seasonal, trend, remainder, rw, p);
    }

    /** Smallest odd integer ≥ x. */
    static int nextOdd(int x) {
        return x % 2 == 0 ? x + 1 : x;
    }

    /** [2] the jump of a loess window, ceil(window / 10). */
    private static int jump(int window) {
        return (int) Math.ceil(window / 10.0);
    }

    /** R's periodic seasonal: each cycle position takes the mean of its values ([2] {@code stl.R}). */
    private void averageByCyclePosition(double[] seasonal) {
        for (int j = 0; j < period; j++) {
            double sum = 0;
            int count = 0;
            for (int i = j; i < seasonal.length; i += period) {
                sum += seasonal[i];
                count++;
            }
            for (int i = j; i < seasonal.length; i += period) {
                seasonal[i] = sum / count;
            }
        }
    }
}
