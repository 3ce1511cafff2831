package org.annalist.analysis.decompose;

import org.annalist.analysis.DecisionRules;

/**
 * Whether a series is additive (the seasonal swing keeps its size) or multiplicative (the swing
 * grows with the level, so the decomposition is done on logs).
 *
 * <p>Rule: with a value of zero or below, additive (logs do not exist). Otherwise, over every
 * complete cycle of the centred moving average, the level L is the mean of the moving average and
 * the swing W the standard deviation of the values around it; the elasticity b is the
 * least-squares slope of log W on log L. Multiplicative when b ≥
 * {@value DecisionRules#MULTIPLICATIVE_ELASTICITY} and the level varies by a factor of at least
 * {@value DecisionRules#MIN_LEVEL_RATIO_FOR_FORM}; with a level that varies less, both forms fit
 * alike and the simpler additive one is kept. The evidence is returned with the choice.
 */
public final class ModelForm {

    public enum Form { ADDITIVE, MULTIPLICATIVE }

    public enum Reason {
        SWING_GROWS_WITH_LEVEL, SWING_INDEPENDENT_OF_LEVEL, LEVEL_TOO_STABLE, NOT_ALL_POSITIVE, TOO_SHORT, NOT_SEASONAL,
        FORCED
    }

    /**
     * @param elasticity b (NaN when not computed)
     * @param levelRatio largest over smallest yearly level (NaN when not computed)
     * @param cycles     complete cycles the evidence used
     */
    public record Choice(Form form, Reason reason, double elasticity, double levelRatio, int cycles) {

        public boolean multiplicative() {
            return form == Form.MULTIPLICATIVE;
        }
    }

    private static final int MIN_CYCLES = 3;

    private ModelForm() {
    }

    public static Choice forced(Form form) {
        return new Choice(form, Reason.FORCED, Double.NaN, Double.NaN, 0);
    }

    public static Choice choose(double[] x, int period) {
        for (double v : x) {
            if (!Double.isNaN(v) && v <= 0) {
                return new Choice(Form.ADDITIVE, Reason.NOT_ALL_POSITIVE, Double.NaN, Double.NaN, 0);
            }
        }
        if (period < 2) {
            return new Choice(Form.ADDITIVE, Reason.NOT_SEASONAL, Double.NaN, Double.NaN, 0);
        }
        if (x.length < (MIN_CYCLES + 1) * period + 1) {
            return new Choice(Form.ADDITIVE, Reason.TOO_SHORT, Double.NaN, Double.NaN, 0);
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
            return new Choice(Form.ADDITIVE, Reason.TOO_SHORT, Double.NaN, Double.NaN, used);
        }
        double b = slope(logLevel, logSwing, used);
        double ratio = maxLevel / minLevel;
        if (ratio < DecisionRules.MIN_LEVEL_RATIO_FOR_FORM) {
            return new Choice(Form.ADDITIVE, Reason.LEVEL_TOO_STABLE, b, ratio, used);
        }
        return b >= DecisionRules.MULTIPLICATIVE_ELASTICITY
                ? new Choice(Form.MULTIPLICATIVE, Reason.SWING_GROWS_WITH_LEVEL, b, ratio, used)
                : new Choice(Form.ADDITIVE, Reason.SWING_INDEPENDENT_OF_LEVEL, b, ratio, used);
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
