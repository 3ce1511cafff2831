package org.annalist.analysis.trend;

import java.util.Arrays;

/**
 * Kendall's S of a sequence against time, and its variance under no trend with the ties
 * correction: {@code S = Σ_{i<j} sgn(x_j − x_i)} [1],
 * {@code Var(S) = [n(n−1)(2n+5) − Σ_p t_p(t_p−1)(2t_p+5)] / 18} over the tie groups p of sizes
 * t_p ([2]; [3] eq. 16.4), and the continuity-corrected z of [3].
 *
 * <p>References:
 * <ol>
 * <li>H. B. Mann (1945), "Nonparametric Tests Against Trend", <i>Econometrica</i> 13(3), 245–259.
 *     doi:10.2307/1907187</li>
 * <li>M. G. Kendall (1975), <i>Rank Correlation Methods</i>, 4th ed., Charles Griffin, London.</li>
 * <li>R. O. Gilbert (1987), <i>Statistical Methods for Environmental Pollution Monitoring</i>,
 *     Van Nostrand Reinhold, New York, ch. 16.</li>
 * </ol>
 */
record KendallScore(int n, long s, double variance, int tieGroups) {

    /** The score of the non-missing values of {@code x}, in order. */
    static KendallScore of(double[] x) {
        double[] v = Arrays.stream(x).filter(d -> !Double.isNaN(d)).toArray();
        int n = v.length;
        long s = 0;
        for (int i = 0; i < n - 1; i++) {
            for (int j = i + 1; j < n; j++) {
                // [1] S = Σ_{i<j} sgn(x_j − x_i)
                s += Long.signum(Double.compare(v[j], v[i]));
            }
        }
        double[] sorted = v.clone();
        Arrays.sort(sorted);
        double tieTerm = 0;
        int groups = 0;
        for (int i = 0; i < n; ) {
            int j = i;
            while (j + 1 < n && sorted[j + 1] == sorted[i]) {
                j++;
            }
            int t = j - i + 1;
            if (t > 1) {
                // [2] the tie group's term t_p(t_p − 1)(2t_p + 5)
                tieTerm += t * (t - 1.0) * (2.0 * t + 5);
                groups++;
            }
            i = j + 1;
        }
        // [3] eq. 16.4: Var(S) with the ties correction
        double variance = (n * (n - 1.0) * (2.0 * n + 5) - tieTerm) / 18.0;
        return new KendallScore(n, s, variance, groups);
    }

    /**
     * Continuity-corrected z: (S − 1)/√Var if S &gt; 0, (S + 1)/√Var if S &lt; 0, else 0 ([3] ch. 16);
     * also 0 when the variance is not positive (our rule: no spread, no evidence).
     */
    static double z(long s, double variance) {
        if (s == 0 || variance <= 0) {
            return 0;
        }
        // [3] the continuity correction moves S one step towards zero
        return (s > 0 ? s - 1 : s + 1) / Math.sqrt(variance);
    }
}
