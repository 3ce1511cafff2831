package org.annalist.analysis;

import java.util.Objects;

/**
 * The outcome of a hypothesis test, as a sentence of the brief cites it.
 *
 * <p>Each {@link Method} names the test as it was run; the class that runs it lists the
 * publications behind it ({@code trend.MannKendall},
 * {@code trend.SeasonalKendall},
 * {@code season.KruskalWallis}, {@code breaks.SupF}).
 * {@link #reject} compares the p-value strictly with the level: a p-value equal to {@code alpha}
 * does not reject (our convention).
 *
 * @param method    the test as actually run, e.g. {@link Method#MANN_KENDALL_HAMED_RAO}
 * @param statistic the test statistic (z, H, F, …)
 * @param pValue    two-sided unless the test is one-sided by nature
 * @param n         observations the test used
 */
public record TestResult(Method method, double statistic, double pValue, int n) {

    /** The tests the analysis runs, each as actually run (with its variance correction or null distribution). */
    public enum Method {
        /** Mann–Kendall with the ties-corrected variance (Mann 1945; Kendall 1975). */
        MANN_KENDALL,
        /** Mann–Kendall, variance corrected for the significant rank autocorrelations (Hamed &amp; Rao 1998). */
        MANN_KENDALL_HAMED_RAO,
        /**
         * Mann–Kendall, variance corrected for AR(1) serial correlation of the ranks: the Hamed &amp;
         * Rao (1998) variance formula with ρ(k) = ρ₁^k (our variant; see
         * {@code trend.MannKendall}).
         */
        MANN_KENDALL_AR1,
        /** The seasonal Kendall test (Hirsch, Slack &amp; Smith 1982). */
        SEASONAL_KENDALL,
        /** The Kruskal–Wallis test of equal distributions across the seasons (Kruskal &amp; Wallis 1952). */
        KRUSKAL_WALLIS,
        /** The sup-F test of a structural break (Andrews 1993), Monte Carlo p-value under AR(1) noise. */
        SUP_F_MONTE_CARLO
    }

    public TestResult {
        Objects.requireNonNull(method, "method");
        if (!(pValue >= 0 && pValue <= 1)) {
            throw new IllegalArgumentException("p-value must lie in [0, 1], was " + pValue);
        }
    }

    /** True when the null hypothesis is rejected at level {@code alpha}. */
    public boolean reject(double alpha) {
        return pValue < alpha;
    }
}
