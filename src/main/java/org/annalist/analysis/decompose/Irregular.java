package org.annalist.analysis.decompose;

import java.util.Optional;

/**
 * How much of a series' movement is irregular fluctuation: the share of the variation around the
 * long-run (least-squares) line that the remainder of the decomposition carries,
 * {@code Var(R) / Var(y − line)} over the periods where the remainder exists. What is not
 * irregular is trend-cycle wander and the seasonal pattern.
 *
 * <p>Around a structural change the share leaves out the periods whose trend estimate straddles
 * it: a local smoother (STL's trend loess, Cleveland et al. 1990, or a centred moving average)
 * fitted over a window that holds periods on both sides of a step follows the step only
 * gradually, and the remainder there is that lag, not irregular movement. With a window of
 * {@code w} periods, half-width {@code h = (w − 1) / 2}, the trend at t draws on t − h … t + h, so a
 * break starting at period b reaches the trend at b − h … b + h − 1.
 *
 * <p>The share is our measure (no published source). It is capped at 1, and at least three
 * periods with a remainder are asked for (both our rules). Where leaving out the periods near
 * breaks would keep fewer than two windows' worth, every period is counted and none is said to
 * be left out (our rule: the share of a few periods between breaks says little).
 */
public final class Irregular {

    /**
     * @param share        Var(R) / Var(y − line), at most 1
     * @param leftOut      periods left out because the trend there straddles a break
     * @param reach        h: how many periods on each side of a break the trend straddles it
     */
    public record Result(double share, int leftOut, int reach) {
    }

    private Irregular() {
    }

    /** Every period counted (no breaks). @return empty when fewer than three periods have a remainder */
    public static Optional<Result> of(double[] y, double[] remainder) {
        return of(y, remainder, new int[0], 0);
    }

    /**
     * @param breakStarts the first period of each new regime
     * @param window      the trend smoother's span in periods (STL's trend window, or the moving average's)
     * @return empty when fewer than three periods have a remainder
     */
    public static Optional<Result> of(double[] y, double[] remainder, int[] breakStarts, int window) {
        int reach = Math.max(0, (window - 1) / 2);
        boolean[] nearBreak = new boolean[y.length];
        int leftOut = 0;
        for (int b : breakStarts) {
            for (int t = Math.max(0, b - reach); t < Math.min(y.length, b + reach); t++) {
                if (!nearBreak[t] && measurable(y, remainder, t)) {
                    leftOut++;
                }
                nearBreak[t] = true;
            }
        }
        int measurable = 0;
        for (int t = 0; t < y.length; t++) {
            if (measurable(y, remainder, t)) {
                measurable++;
            }
        }
        if (leftOut > 0 && measurable - leftOut < 2 * window) {
            return share(y, remainder, new boolean[y.length]).map(s -> new Result(s, 0, reach));
        }
        int left = leftOut;
        return share(y, remainder, nearBreak).map(s -> new Result(s, left, reach));
    }

    private static boolean measurable(double[] y, double[] remainder, int t) {
        return !Double.isNaN(remainder[t]) && !Double.isNaN(y[t]);
    }

    private static Optional<Double> share(double[] y, double[] remainder, boolean[] leftOut) {
        int n = y.length;
        int count = 0;
        double tMean = 0;
        double yMean = 0;
        for (int t = 0; t < n; t++) {
            if (!leftOut[t] && measurable(y, remainder, t)) {
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
            if (!leftOut[t] && measurable(y, remainder, t)) {
                stt += (t - tMean) * (t - tMean);
                sty += (t - tMean) * (y[t] - yMean);
                rMean += remainder[t] / count;
            }
        }
        double slope = stt == 0 ? 0 : sty / stt;
        double varAround = 0;
        double varR = 0;
        for (int t = 0; t < n; t++) {
            if (!leftOut[t] && measurable(y, remainder, t)) {
                double d = y[t] - yMean - slope * (t - tMean);
                varAround += d * d;
                varR += (remainder[t] - rMean) * (remainder[t] - rMean);
            }
        }
        return Optional.of(varAround == 0 ? 0 : Math.min(1, varR / varAround));
    }
}
