package org.annalist.findings;

/**
 * The components of the series in its own units, one value per period, for charts and tables:
 * observed = trend-cycle + seasonal + irregular (additive), or trend-cycle × seasonal factor ×
 * irregular factor (multiplicative, where {@code seasonal} holds the factors).
 *
 * @param method e.g. {@code STL (robust, seasonal window 13)}; null components when not decomposed
 */
public record Decomposition(String method, double[] trendCycle, double[] seasonal, double[] irregular,
                            double[] adjusted, boolean multiplicative) {
}
