package org.annalist.analysis.breaks;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Optimal partition of a series into regimes of constant level (or of straight lines), by dynamic
 * programming over segment residual sums of squares [1, 2]: for every number of breaks m up to the
 * maximum, the break dates that minimise the total RSS with every regime at least {@code h}
 * observations long; m chosen by BIC as in R's strucchange [3], with
 * {@code log L = −n/2 (log RSS + 1 − log n + log 2π)} and {@code df = (k + 1)(m + 1)} (k coefficients
 * per regime, plus the break date or the variance).
 *
 * <p>Breaks are given as the <b>first index of each new regime</b> (0-based); strucchange reports
 * the last index of the old one, i.e. one less. Missing values ({@code NaN}) are left out of every
 * segment's fit; n in the BIC counts the observed values.
 *
 * <p>References:
 * <ol>
 * <li>J. Bai and P. Perron (1998), "Estimating and Testing Linear Models with Multiple Structural
 *     Changes", <i>Econometrica</i> 66(1), 47–78. doi:10.2307/2998540</li>
 * <li>J. Bai and P. Perron (2003), "Computation and Analysis of Multiple Structural Change Models",
 *     <i>Journal of Applied Econometrics</i> 18(1), 1–22. doi:10.1002/jae.659</li>
 * <li>A. Zeileis, C. Kleiber, W. Krämer and K. Hornik (2003), "Testing and Dating of Structural
 *     Changes in Practice", <i>Computational Statistics &amp; Data Analysis</i> 44(1–2), 109–123.
 *     doi:10.1016/S0167-9473(03)00030-6 (the {@code breakpoints} function of strucchange)</li>
 * </ol>
 */
public final class BaiPerron {

    /** What changes at a break: the level only (y ~ 1), or level and slope (y ~ 1 + t). */
    public enum Model {
        LEVEL, LEVEL_AND_SLOPE;

        /** Coefficients a regime of this model has: a level, or a level and a slope. */
        int coefficients() {
            return this == LEVEL ? 1 : 2;
        }
    }

    /**
     * The best partition with a given number of breaks. The array is copied in and out, so a
     * segmentation cannot be changed after it is made.
     *
     * @param starts first index of each new regime, ascending
     */
    public record Segmentation(int breaks, int[] starts, double rss, double bic) {

        public Segmentation {
            starts = starts.clone();
        }

        /** A copy of the first index of each new regime. */
        @Override
        public int[] starts() {
            return starts.clone();
        }

        @Override
        public boolean equals(Object other) {
            return other instanceof Segmentation s && breaks == s.breaks && Arrays.equals(starts, s.starts)
                    && Double.compare(rss, s.rss) == 0 && Double.compare(bic, s.bic) == 0;
        }

        @Override
        public int hashCode() {
            return 31 * (31 * (31 * breaks + Arrays.hashCode(starts)) + Double.hashCode(rss)) + Double.hashCode(bic);
        }

        @Override
        public String toString() {
            return "Segmentation[breaks=" + breaks + ", starts=" + Arrays.toString(starts) + ", rss=" + rss
                    + ", bic=" + bic + "]";
        }
    }

    /** @param byBreaks index m holds the best partition with m breaks */
    public record Result(Model model, int minimumRegime, List<Segmentation> byBreaks, Segmentation chosen, int observed) {
    }

    /**
     * Six breaks (seven regimes) are more than a brief can tell well, and serial correlation makes
     * BIC propose too many anyway; the cap also bounds the O(M n²) work (our rule).
     */
    public static final int DEFAULT_MAX_BREAKS = 6;

    private final Model model;
    private final int minimumRegime;
    private final int maxBreaks;

    private BaiPerron(Model model, int minimumRegime, int maxBreaks) {
        this.model = model;
        this.minimumRegime = minimumRegime;
        this.maxBreaks = maxBreaks;
    }

    /** @param minimumRegime h, the fewest observations a regime may have */
    public static BaiPerron withMinimumRegime(int minimumRegime) {
        if (minimumRegime < 2) {
            throw new IllegalArgumentException("a regime needs at least 2 observations, was " + minimumRegime);
        }
        return new BaiPerron(Model.LEVEL, minimumRegime, DEFAULT_MAX_BREAKS);
    }

    public BaiPerron with(Model m) {
        return new BaiPerron(m, minimumRegime, maxBreaks);
    }

    public BaiPerron withMaxBreaks(int m) {
        return new BaiPerron(model, minimumRegime, m);
    }

    /**
     * @throws IllegalArgumentException when the series is shorter than one regime, or the minimum
     *                                  regime does not exceed the coefficients per regime
     */
    public Result fit(double[] y) {
        int n = y.length;
        int h = minimumRegime;
        SegmentCost cost = new SegmentCost(y, model);
        checkMinimumRegime(cost.parameters());
        Programme programme = new Programme(n, h, maxBreaksFor(n));
        double[] ending = new double[n];   // ending[s] = RSS of s..j, for the current end j
        for (int j = h - 1; j < n; j++) {
            if (programme.reads(j)) {
                // no break: the segment 0..j; after m ≥ 1 breaks the last regime starts at m·h or later
                cost.rssEndingAt(j, 0, 0, ending);
                cost.rssEndingAt(j, h, j - h + 1, ending);
                programme.end(j, ending);
            }
        }
        return programme.result(model, cost);
    }

    /** The fits of the two models to one series. */
    public record BothModels(Result level, Result levelAndSlope) {
    }

    /**
     * {@code withMinimumRegime(levelMinimumRegime).fit(y)} and
     * {@code withMinimumRegime(slopeMinimumRegime).with(LEVEL_AND_SLOPE).fit(y)}, value for value,
     * each with at most {@link #DEFAULT_MAX_BREAKS} breaks. When the two minimum regimes are equal,
     * one pass over the segments gives both models' costs: a line's cost starts from the mean's.
     *
     * @throws IllegalArgumentException as {@link #fit} does, the level model's reasons first
     */
    public static BothModels fitBothModels(double[] y, int levelMinimumRegime, int slopeMinimumRegime) {
        BaiPerron level = withMinimumRegime(levelMinimumRegime);
        BaiPerron line = withMinimumRegime(slopeMinimumRegime).with(Model.LEVEL_AND_SLOPE);
        int n = y.length;
        int h = levelMinimumRegime;
        if (h != slopeMinimumRegime || h <= 2 || n < h) {
            return new BothModels(level.fit(y), line.fit(y));   // and any exception in fit's order
        }
        SegmentCost cost = new SegmentCost(y, Model.LEVEL_AND_SLOPE);
        Programme forLevel = new Programme(n, h, level.maxBreaksFor(n));
        Programme forLine = new Programme(n, h, line.maxBreaksFor(n));
        double[] levelEnding = new double[n];
        double[] lineEnding = new double[n];
        for (int j = h - 1; j < n; j++) {
            if (forLevel.reads(j)) {
                cost.rssEndingAt(j, 0, 0, lineEnding, levelEnding);
                cost.rssEndingAt(j, h, j - h + 1, lineEnding, levelEnding);
                forLevel.end(j, levelEnding);
                forLine.end(j, lineEnding);
            }
        }
        return new BothModels(forLevel.result(Model.LEVEL, cost), forLine.result(Model.LEVEL_AND_SLOPE, cost));
    }

    private void checkMinimumRegime(int coefficients) {
        if (minimumRegime <= coefficients) {
            throw new IllegalArgumentException("the minimum regime must exceed the " + coefficients
                    + " coefficients per regime");
        }
    }

    /** strucchange: at most ceil(n / h) − 2 breaks. */
    private int maxBreaksFor(int n) {
        return Math.min(maxBreaks, Math.max(0, (int) Math.ceil(n / (double) minimumRegime) - 2));
    }

    /**
     * [2] §3: SSR(T_{m,j}) = min over i of SSR(T_{m−1,i}) + SSR(i+1..j), for every number of breaks m
     * up to the maximum and every end j. The minimum for an end j reads the optima with m − 1 breaks
     * only before j, so the ends are taken in order, each with its one row of segment costs (those
     * ending at j): no table of all n²/2 segments is kept.
     */
    private static final class Programme {

        private final int n;
        private final int h;
        private final int maxM;
        private final double[][] best;   // best[m][j]: least RSS of 0..j in m + 1 regimes
        private final int[][] from;      // from[m][j]: the last index of the m-th regime at that optimum

        Programme(int n, int h, int maxM) {
            this.n = n;
            this.h = h;
            this.maxM = maxM;
            best = new double[maxM + 1][n];
            from = new int[maxM + 1][n];
            for (int m = 0; m <= maxM; m++) {
                Arrays.fill(best[m], Double.POSITIVE_INFINITY);
                Arrays.fill(from[m], -1);
            }
        }

        /**
         * Whether any optimum ending at {@code j} is read: at the series' end (for the BIC), and
         * before it only where a last regime of h values can still follow.
         */
        boolean reads(int j) {
            return j <= n - 1 - h || j == n - 1;
        }

        /**
         * The optima ending at {@code j}, once those ending before it are in.
         *
         * @param ending the RSS of {@code s..j} at {@code ending[s]}, for s = 0 and s = h..j − h + 1
         */
        void end(int j, double[] ending) {
            best[0][j] = ending[0];
            int lastEarlierEnd = j - h;   // the last regime is i+1..j with j − i ≥ h
            for (int m = 1; m <= maxM; m++) {
                if (m == maxM && j != n - 1) {
                    continue;   // the most breaks are only read at the series' end
                }
                double[] previous = best[m - 1];
                double bestHere = Double.POSITIVE_INFINITY;
                int bestFrom = -1;
                // the m earlier regimes need m·h values
                for (int i = m * h - 1; i <= lastEarlierEnd; i++) {
                    double candidate = previous[i] + ending[i + 1];
                    if (candidate < bestHere) {   // strict: the earliest of equal minima
                        bestHere = candidate;
                        bestFrom = i;
                    }
                }
                best[m][j] = bestHere;
                from[m][j] = bestFrom;
            }
        }

        /** The best partition for each number of breaks, and the one BIC chooses. */
        Result result(Model model, SegmentCost cost) {
            int k = model.coefficients();
            double observed = cost.observed(0, n - 1);
            List<Segmentation> byBreaks = new ArrayList<>();
            Segmentation chosen = null;
            for (int m = 0; m <= maxM; m++) {
                double rss = best[m][n - 1];
                if (Double.isInfinite(rss)) {
                    break;
                }
                int[] starts = new int[m];
                int j = n - 1;
                for (int b = m; b >= 1; b--) {
                    int i = from[b][j];
                    starts[b - 1] = i + 1;
                    j = i;
                }
                // [3] the BIC of strucchange's summary of breakpoints
                double logLik = -observed / 2 * (Math.log(rss) + 1 - Math.log(observed) + Math.log(2 * Math.PI));
                double bic = -2 * logLik + Math.log(observed) * (k + 1) * (m + 1);
                Segmentation s = new Segmentation(m, starts, rss, bic);
                byBreaks.add(s);
                if (chosen == null || bic < chosen.bic()) {
                    chosen = s;
                }
            }
            if (chosen == null) {
                throw new IllegalArgumentException("the series (" + n + " values) is shorter than one regime of " + h);
            }
            return new Result(model, h, List.copyOf(byBreaks), chosen, (int) observed);
        }
    }

    /** Level of the fitted regime {@code from..to} at {@code position} (start of the next regime, say). */
    public static double[] regimeFit(double[] y, Model model, int from, int to, int position) {
        return new SegmentCost(y, model).fitAt(from, to, position, y);
    }
}
