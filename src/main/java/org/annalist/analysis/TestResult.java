package org.annalist.analysis;

import java.util.Objects;

/**
 * The outcome of a hypothesis test, as a sentence of the brief cites it.
 *
 * @param method    the test as actually run, e.g. {@code Mann-Kendall (Hamed-Rao corrected)}
 * @param statistic the test statistic (z, H, F, …)
 * @param pValue    two-sided unless the test is one-sided by nature
 * @param n         observations the test used
 */
public record TestResult(String method, double statistic, double pValue, int n) {

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
