package org.annalist.analysis.anomaly;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.annalist.analysis.OrderStatistics;

/**
 * Single periods far from what trend and season predict: the robust score
 * {@code z = (R − median R) / (1.4826 · MAD R)} of the decomposition's remainder, the "modified
 * z-score" of [1] (there written 0.6745 (x − x̃)/MAD; 1/1.4826 ≈ 0.6745 ≈ Φ⁻¹(0.75), which makes
 * 1.4826 · MAD a consistent estimate of σ for normal data). The MAD keeps the outliers themselves from
 * inflating the scale. A period is flagged when |z| reaches the threshold the caller gives ([1]
 * recommends 3.5). Outliers are one-offs, so two patterns of flags are left out (our rules): three
 * or more flagged periods in a row with the same sign (a shift of level, which the break analysis
 * describes), and four or more flags within any two seasonal cycles (a stretch the decomposition
 * does not follow, such as a seasonal pattern in transition), which {@link #unusualStretches}
 * reports instead.
 *
 * <p>References:
 * <ol>
 * <li>B. Iglewicz and D. C. Hoaglin (1993), <i>How to Detect and Handle Outliers</i>, The ASQC
 *     Basic References in Quality Control: Statistical Techniques, vol. 16, ASQC Quality Press,
 *     Milwaukee (no DOI).</li>
 * </ol>
 */
public final class RemainderOutliers {

    /** @param index position in the series; score the robust z */
    public record Outlier(int index, double score) {
    }

    /** Same-signed flagged runs this long are a change of level, not one-off periods (our rule). */
    public static final int SHIFT_RUN = 3;
    /** This many flags within two seasonal cycles make a stretch the decomposition does not follow (our rule). */
    public static final int STRETCH_FLAGS = 4;

    private RemainderOutliers() {
    }

    /**
     * The remainder as outliers are scored on: on logs it already is relative; for an additive
     * series of counts (no negative values, a positive expected level) it is taken relative to the
     * expected value, so that the busy season's larger swings are not read as outliers; otherwise
     * as it is (our rule).
     *
     * @param expected what trend and season predict, on the scale of {@code remainder}
     * @param observed the series' values
     */
    public static double[] scaled(double[] remainder, double[] expected, double[] observed, boolean logs) {
        if (logs) {
            return remainder;
        }
        for (int t = 0; t < observed.length; t++) {
            if ((!Double.isNaN(observed[t]) && observed[t] < 0) || (!Double.isNaN(expected[t]) && expected[t] <= 0)) {
                return remainder;
            }
        }
        double[] relative = new double[remainder.length];
        for (int t = 0; t < remainder.length; t++) {
            relative[t] = remainder[t] / expected[t];
        }
        return relative;
    }

    /**
     * Robust scores of the remainder ([1]); NaN where it is missing, and NaN everywhere with fewer
     * than three values (our rule). A MAD of zero gives every score 0 (our rule: no spread, no outlier).
     */
    public static double[] scores(double[] remainder) {
        double[] present = Arrays.stream(remainder).filter(v -> !Double.isNaN(v)).toArray();
        double[] z = new double[remainder.length];
        if (present.length < 3) {
            Arrays.fill(z, Double.NaN);
            return z;
        }
        double median = OrderStatistics.median(present);
        double[] deviations = new double[present.length];
        for (int i = 0; i < present.length; i++) {
            deviations[i] = Math.abs(present[i] - median);
        }
        // [1] the modified z-score: (R − median) / (MAD / 0.6745), written with 1/0.6745 = 1.4826
        double scale = 1.4826 * OrderStatistics.median(deviations);
        for (int t = 0; t < remainder.length; t++) {
            z[t] = Double.isNaN(remainder[t]) ? Double.NaN
                    : scale > 0 ? (remainder[t] - median) / scale : 0;
        }
        return z;
    }

    /** A run of periods with many flags: first and last index. */
    public record Stretch(int from, int to) {
    }

    /** The flagged periods, isolated ones only, in time order. */
    public static List<Outlier> find(double[] remainder, double threshold, int period) {
        List<Outlier> flagged = flagged(remainder, threshold);
        List<Stretch> stretches = stretches(flagged, period);
        return flagged.stream().filter(o -> stretches.stream().noneMatch(s -> o.index() >= s.from() && o.index() <= s.to()))
                .toList();
    }

    /** Stretches of {@link #STRETCH_FLAGS} or more flags within two seasonal cycles. */
    public static List<Stretch> unusualStretches(double[] remainder, double threshold, int period) {
        return stretches(flagged(remainder, threshold), period);
    }

    private static List<Stretch> stretches(List<Outlier> flagged, int period) {
        int window = 2 * Math.max(1, period);
        List<Stretch> stretches = new ArrayList<>();
        int k = STRETCH_FLAGS - 1;
        for (int i = 0; i + k < flagged.size(); i++) {
            if (flagged.get(i + k).index() - flagged.get(i).index() <= window) {
                int j = i + k;
                while (j + 1 < flagged.size() && flagged.get(j + 1).index() - flagged.get(j + 1 - k).index() <= window) {
                    j++;
                }
                stretches.add(new Stretch(flagged.get(i).index(), flagged.get(j).index()));
                i = j;
            }
        }
        return stretches;
    }

    /**
     * Flags that are not part of a same-signed run of {@link #SHIFT_RUN} or more: isolated ones and
     * those of unusual stretches. These are the values to keep out of a break search.
     */
    public static List<Outlier> flagged(double[] remainder, double threshold) {
        double[] z = scores(remainder);
        List<Outlier> found = new ArrayList<>();
        int t = 0;
        while (t < z.length) {
            if (Double.isNaN(z[t]) || Math.abs(z[t]) < threshold) {
                t++;
                continue;
            }
            int end = t;
            while (end + 1 < z.length && !Double.isNaN(z[end + 1]) && Math.abs(z[end + 1]) >= threshold
                    && Math.signum(z[end + 1]) == Math.signum(z[t])) {
                end++;
            }
            if (end - t + 1 < SHIFT_RUN) {
                for (int i = t; i <= end; i++) {
                    found.add(new Outlier(i, z[i]));
                }
            }
            t = end + 1;
        }
        return found;
    }
}
