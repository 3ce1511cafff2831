package org.annalist.analysis.decompose;

import java.util.Optional;

/**
 * How much of a series' movement is irregular fluctuation: the share of the variation around the
 * long-run (least-squares) line that the remainder of the decomposition carries,
 * {@code Var(R) / Var(y − line)} over the periods where the remainder exists. What is not
 * irregular is trend-cycle wander and the seasonal pattern.
 *
 * <p>The share is our measure (no published source). It is capped at 1, and at least three
 * periods with a remainder are asked for (both our rules).
 */
public final class Irregular {

    /** @param share Var(R) / Var(y − line), at most 1 */
    public record Result(double share) {
    }

    private Irregular() {
    }

    /** @return empty when fewer than three periods have a remainder */
    public static Optional<Result> of(double[] y, double[] remainder) {
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
            return Optional.empty();
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
        return Optional.of(new Result(share));
    }
}
