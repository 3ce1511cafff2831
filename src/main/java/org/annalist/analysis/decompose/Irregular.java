package org.annalist.analysis.decompose;

import org.annalist.analysis.DecisionRules;

/**
 * How much of a series' movement is irregular fluctuation: the share of the variation around the
 * long-run (least-squares) line that the remainder of the decomposition carries,
 * {@code Var(R) / Var(y − line)} over the periods where the remainder exists. What is not
 * irregular is trend-cycle wander and the seasonal pattern.
 */
public final class Irregular {

    public enum Size { SMALL, MODERATE, LARGE }

    public record Result(double share, Size size) {
    }

    private Irregular() {
    }

    /** @throws IllegalArgumentException when fewer than three periods have a remainder */
    public static Result of(double[] y, double[] remainder) {
        int n = y.length;
        int count = 0;
        double tMean = 0;
        double yMean = 0;
        for (int t = 0; t < n; t++) {
            if (!Double.isNaN(remainder[t]) && !Double.isNaN(y[t])) {
                count++;
                tMean += t;
                yMean += y[t];
            }
        }
        if (count < 3) {
            throw new IllegalArgumentException("the irregular share needs at least 3 remainders, got " + count);
        }
        tMean /= count;
        yMean /= count;
        double stt = 0;
        double sty = 0;
        double rMean = 0;
        for (int t = 0; t < n; t++) {
            if (!Double.isNaN(remainder[t]) && !Double.isNaN(y[t])) {
                stt += (t - tMean) * (t - tMean);
                sty += (t - tMean) * (y[t] - yMean);
                rMean += remainder[t] / count;
            }
        }
        double slope = stt == 0 ? 0 : sty / stt;
        double varAround = 0;
        double varR = 0;
        for (int t = 0; t < n; t++) {
            if (!Double.isNaN(remainder[t]) && !Double.isNaN(y[t])) {
                double d = y[t] - yMean - slope * (t - tMean);
                varAround += d * d;
                varR += (remainder[t] - rMean) * (remainder[t] - rMean);
            }
        }
        double share = varAround == 0 ? 0 : Math.min(1, varR / varAround);
        Size size = share < DecisionRules.SMALL_IRREGULAR_SHARE ? Size.SMALL
                : share <= DecisionRules.LARGE_IRREGULAR_SHARE ? Size.MODERATE : Size.LARGE;
        return new Result(share, size);
    }
}
