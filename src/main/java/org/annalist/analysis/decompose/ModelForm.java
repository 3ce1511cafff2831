package org.annalist.analysis.decompose;

/**
 * The evidence for an additive (the seasonal swing keeps its size) or a multiplicative series
 * (the swing grows with the level, so the decomposition is done on logs); the caller decides.
 *
 * <p>With a value of zero or below there is nothing to measure: logs do not exist. Otherwise, over
 * every complete cycle of the centred moving average, the level L is the mean of the moving
 * average and the swing W the standard deviation of the values around it; the elasticity b is the
 * least-squares slope of log W on log L (b = 0 additive, b = 1 multiplicative, [1] §3.2), and the
 * level ratio the largest over the smallest yearly level, which says whether the level varied
 * enough for b to mean something. [1] §3.2 describes the two forms; measuring the choice by this
 * slope is our rule, as is leaving out cycles with a missing value or no swing.
 *
 * <p>References:
 * <ol>
 * <li>R. J. Hyndman and G. Athanasopoulos (2021), <i>Forecasting: Principles and Practice</i>,
 *     3rd ed., OTexts, Melbourne; https://otexts.com/fpp3/ (no DOI).</li>
 * </ol>
 */
public final class ModelForm {

    /** What could be measured. */
    public enum Status {
        MEASURED,
        /** A value of zero or below: logs do not exist. */
        NOT_ALL_POSITIVE,
        /** No seasonal period (annual data): no swing to measure. */
        NOT_SEASONAL,
        /** Fewer than {@value #MIN_CYCLES} complete cycles. */
        TOO_SHORT
    }

    /**
     * @param elasticity b (NaN unless measured)
     * @param levelRatio largest over smallest yearly level (NaN unless measured)
     * @param cycles     complete cycles the evidence used
     */
    public record Evidence(Status status, double elasticity, double levelRatio, int cycles) {
    }

    /** Complete cycles the elasticity needs (our rule: a slope through fewer points means little). */
    public static final int MIN_CYCLES = 3;

    private ModelForm() {
    }

    public static Evidence measure(double[] x, int period) {
        for (double v : x) {
            if (!Double.isNaN(v) && v <= 0) {
                return new Evidence(Status.NOT_ALL_POSITIVE, Double.NaN, Double.NaN, 0);
            }
        }
        if (period < 2) {
            return new Evidence(Status.NOT_SEASONAL, Double.NaN, Double.NaN, 0);
        }
        if (x.length < (MIN_CYCLES + 1) * period + 1) {
            return new Evidence(Status.TOO_SHORT, Double.NaN, Double.NaN, 0);
        }
        double[] trend = CentredMovingAverage.of(x, period).trendCycle();
        int cycles = x.length / period;
        double[] logLevel = new double[cycles];
        double[] logSwing = new double[cycles];
        int used = 0;
        double minLevel = Double.POSITIVE_INFINITY;
        double maxLevel = 0;
        for (int c = 0; c < cycles; c++) {
            double levelSum = 0;
            double[] deviations = new double[period];
            boolean complete = true;
            for (int j = 0; j < period; j++) {
                int t = c * period + j;
                double d = x[t] - trend[t];
                if (Double.isNaN(d)) {
                    complete = false;
                    break;
                }
                levelSum += trend[t];
                deviations[j] = d;
            }
            if (!complete) {
                continue;
            }
            double level = levelSum / period;
            double swing = standardDeviation(deviations);
            if (swing <= 0) {
                continue;
            }
            logLevel[used] = Math.log(level);
            logSwing[used] = Math.log(swing);
            minLevel = Math.min(minLevel, level);
            maxLevel = Math.max(maxLevel, level);
            used++;
        }
        if (used < MIN_CYCLES) {
            return new Evidence(Status.TOO_SHORT, Double.NaN, Double.NaN, used);
        }
        // [1] §3.2: a swing of constant size gives b near 0 (additive), one growing with the level b near 1
        return new Evidence(Status.MEASURED, slope(logLevel, logSwing, used), maxLevel / minLevel, used);
    }

    private static double standardDeviation(double[] v) {
        double mean = 0;
        for (double d : v) {
            mean += d / v.length;
        }
        double ss = 0;
        for (double d : v) {
            ss += (d - mean) * (d - mean);
        }
        return Math.sqrt(ss / (v.length - 1));
    }

    private static double slope(double[] x, double[] y, int n) {
        double mx = 0;
        double my = 0;
        for (int i = 0; i < n; i++) {
            mx += x[i] / n;
            my += y[i] / n;
        }
        double sxy = 0;
        double sxx = 0;
        for (int i = 0; i < n; i++) {
            sxy += (x[i] - mx) * (y[i] - my);
            sxx += (x[i] - mx) * (x[i] - mx);
        }
        return sxx == 0 ? 0 : sxy / sxx;
    }
}
