package org.annalist.analysis.decompose;

import java.util.Arrays;
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
        Workspace work = new Workspace(n, period);
        for (int k = 0; ; k++) {
            innerLoop(values, p, userw, rw, seasonal, trend, work);
            if (k + 1 > no) {
                break;
            }
            double[] fit = new double[n];
            for (int i = 0; i < n; i++) {
                fit[i] = trend[i] + seasonal[i];
            }
            robustnessWeights(values, observedWeight, fit, rw);
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

    /** Arrays the inner loop reuses ([1] Fortran {@code work(n + 2 n_p, 5)}). */
    private static final class Workspace {
        final double[] w1;
        final double[] w2;
        final double[] w3;
        final double[] w4;
        final double[] w5;

        Workspace(int n, int period) {
            int size = n + 2 * period;
            w1 = new double[size];
            w2 = new double[size];
            w3 = new double[size];
            w4 = new double[size];
            w5 = new double[size];
        }
    }

    /** [1] {@code stlstp}: the inner loop, run {@code ni} times. */
    private static void innerLoop(double[] y, Parameters p, boolean userw, double[] rw, double[] season,
                                  double[] trend, Workspace w) {
        int n = y.length;
        int np = p.period();
        for (int pass = 0; pass < p.inner(); pass++) {
            for (int i = 0; i < n; i++) {
                w.w1[i] = y[i] - trend[i];                                   // step 1: detrend
            }
            cycleSubseries(w.w1, n, np, p.seasonalWindow(), p.seasonalDegree(), p.seasonalJump(), userw, rw,
                    w.w2, w.w3, w.w4, w.w5);                                 // step 2: C, length n + 2 n_p
            lowPassMovingAverages(w.w2, n + 2 * np, np, w.w3, w.w1);        // step 3: L = loess(MA(MA(MA(C))))
            Loess.smooth(w.w3, n, p.lowPassWindow(), p.lowPassDegree(), p.lowPassJump(), false, null, w.w1, 0, w.w5);
            for (int i = 0; i < n; i++) {
                season[i] = w.w2[np + i] - w.w1[i];                          // step 4: S = C − L
            }
            for (int i = 0; i < n; i++) {
                w.w1[i] = y[i] - season[i];                                  // step 5: deseasonalise
            }
            Loess.smooth(w.w1, n, p.trendWindow(), p.trendDegree(), p.trendJump(), userw, rw, trend, 0, w.w3);
        }
    }

    /**
     * [1] {@code stlss}: loess-smooths each cycle-subseries (all Januaries, …) and extends it by one
     * value at each end, giving {@code n + 2 n_p} values in {@code season}.
     */
    private static void cycleSubseries(double[] y, int n, int np, int ns, int degree, int jump, boolean userw,
                                       double[] rw, double[] season, double[] sub, double[] subSmooth,
                                       double[] subWeights) {
        double[] residual = new double[n / np + 3];   // loess neighbourhood weights of one subseries
        for (int j = 0; j < np; j++) {
            int k = (n - j - 1) / np + 1;                                    // length of this subseries
            for (int i = 0; i < k; i++) {
                sub[i] = y[i * np + j];
                if (userw) {
                    subWeights[i] = rw[i * np + j];
                }
            }
            Loess.smooth(sub, k, ns, degree, jump, userw, subWeights, subSmooth, 1, residual);
            int nright = Math.min(ns, k);
            if (!Loess.estimate(sub, k, ns, degree, 0, subSmooth, 0, 1, nright, residual, userw, subWeights)) {
                subSmooth[0] = subSmooth[1];
            }
            int nleft = Math.max(1, k - ns + 1);
            if (!Loess.estimate(sub, k, ns, degree, k + 1, subSmooth, k + 1, nleft, k, residual, userw, subWeights)) {
                subSmooth[k + 1] = subSmooth[k];
            }
            for (int m = 0; m < k + 2; m++) {
                season[m * np + j] = subSmooth[m];
            }
        }
    }

    /** [1] {@code stlfts}: moving averages of length n_p, n_p and 3; {@code n} values in, n − 2 n_p out. */
    private static void lowPassMovingAverages(double[] x, int n, int np, double[] out, double[] work) {
        movingAverage(x, n, np, out);
        movingAverage(out, n - np + 1, np, work);
        movingAverage(work, n - 2 * np + 2, 3, out);
    }

    /** [1] {@code stlma}: running mean of length {@code len} over {@code n} values (n − len + 1 out). */
    private static void movingAverage(double[] x, int n, int len, double[] ave) {
        int newn = n - len + 1;
        double v = 0;
        for (int i = 0; i < len; i++) {
            v += x[i];
        }
        ave[0] = v / len;
        for (int j = 1, k = len - 1, m = -1; j < newn; j++) {
            k++;
            m++;
            v = v - x[m] + x[k];
            ave[j] = v / len;
        }
    }

    /**
     * [1] {@code stlrwt}: bisquare weights B(|R| / h), h = 6 × median |R| over the observed values
     * (the median of an even count as the mean of the two middle values, located by {@link PartialSort});
     * 1 below 0.001 h, 0 above 0.999 h.
     */
    private static void robustnessWeights(double[] y, double[] observed, double[] fit, double[] rw) {
        int n = y.length;
        double[] residuals = new double[n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            if (observed[i] > 0) {
                residuals[m++] = Math.abs(y[i] - fit[i]);
            }
        }
        double[] sorted = Arrays.copyOf(residuals, m);
        int mid1 = m / 2 + 1;                                               // 1-based, as in [1]
        int mid2 = m - mid1 + 1;
        PartialSort.psort(sorted, m, new int[] {mid1, mid2});
        // [1] h = 6 × median |R|: 3 × the sum of the two middle values
        double h = 3.0 * (sorted[mid1 - 1] + sorted[mid2 - 1]);
        double c9 = SINGLE_0_999 * h;
        double c1 = SINGLE_0_001 * h;
        for (int i = 0; i < n; i++) {
            if (observed[i] == 0) {
                rw[i] = 0;
                continue;
            }
            double r = Math.abs(y[i] - fit[i]);
            if (r <= c1) {
                rw[i] = 1;
            } else if (r <= c9) {
                // [1] the bisquare weight B(u) = (1 − u²)²
                double u = r / h;
                rw[i] = (1 - u * u) * (1 - u * u);
            } else {
                rw[i] = 0;
            }
        }
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
