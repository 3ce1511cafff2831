package org.annalist.analysis.breaks;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Optimal partition of a series into regimes of constant level (or of straight lines), by dynamic
 * programming over segment residual sums of squares (Bai &amp; Perron 1998, <i>Econometrica</i> 66,
 * 47–78; 2003, <i>J. Applied Econometrics</i> 18, 1–22): for every number of breaks m up to the
 * maximum, the break dates that minimise the total RSS with every regime at least {@code h}
 * observations long; m chosen by BIC as in R's strucchange, with
 * {@code log L = −n/2 (log RSS + 1 − log n + log 2π)} and {@code df = (k + 1)(m + 1)} (k coefficients
 * per regime, plus the break date or the variance).
 *
 * <p>Breaks are given as the <b>first index of each new regime</b> (0-based); strucchange reports
 * the last index of the old one, i.e. one less.
 */
public final class BaiPerron {

    /** What changes at a break: the level only (y ~ 1), or level and slope (y ~ 1 + t). */
    public enum Model { LEVEL, LEVEL_AND_SLOPE }

    /**
     * @param starts first index of each new regime, ascending
     */
    public record Segmentation(int breaks, int[] starts, double rss, double bic) {
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

    /** @throws IllegalArgumentException when the series is shorter than two regimes' worth of values */
    public Result fit(double[] y) {
        int n = y.length;
        int h = minimumRegime;
        SegmentCost cost = new SegmentCost(y, model);
        int k = cost.parameters();
        if (h <= k) {
            throw new IllegalArgumentException("the minimum regime must exceed the " + k + " coefficients per regime");
        }
        // strucchange: at most ceil(n / h) − 2 breaks
        int maxM = Math.min(maxBreaks, Math.max(0, (int) Math.ceil(n / (double) h) - 2));
        // The triangular table of segment costs (Bai & Perron 2003, §3), stored by segment end so
        // that the inner loop below reads it in order: byEnd[j][s] = RSS of s..j.
        double[][] byEnd = new double[n][];
        for (int j = 0; j < n; j++) {
            byEnd[j] = new double[Math.max(0, j - h + 2)];
            for (int start = 0; start <= j - h + 1; start++) {
                byEnd[j][start] = cost.rss(start, j);
            }
        }
        double[][] best = new double[maxM + 1][n];
        int[][] from = new int[maxM + 1][n];
        for (int j = 0; j < n; j++) {
            best[0][j] = j >= h - 1 ? byEnd[j][0] : Double.POSITIVE_INFINITY;
        }
        for (int m = 1; m <= maxM; m++) {
            double[] previous = best[m - 1];
            Arrays.fill(best[m], Double.POSITIVE_INFINITY);
            Arrays.fill(from[m], -1);
            // the most breaks are only ever read at the series' end; fewer are also read earlier
            for (int j = m == maxM ? n - 1 : (m + 1) * h - 1; j < n; j++) {
                double[] ending = byEnd[j];
                // the last regime is i+1..j with j − i ≥ h; the m earlier regimes need m·h values
                double bestHere = Double.POSITIVE_INFINITY;
                int bestFrom = -1;
                for (int i = m * h - 1; i <= j - h; i++) {
                    double candidate = previous[i] + ending[i + 1];
                    if (candidate < bestHere) {
                        bestHere = candidate;
                        bestFrom = i;
                    }
                }
                best[m][j] = bestHere;
                from[m][j] = bestFrom;
            }
        }
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

    /** Level of the fitted regime {@code from..to} at {@code position} (start of the next regime, say). */
    public static double[] regimeFit(double[] y, Model model, int from, int to, int position) {
        return new SegmentCost(y, model).fitAt(from, to, position, y);
    }
}
