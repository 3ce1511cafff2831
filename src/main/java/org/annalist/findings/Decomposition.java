package org.annalist.findings;

/**
 * The components of the series in its own units, one value per period, for charts and tables:
 * observed = trend-cycle + seasonal + irregular (additive), or trend-cycle × seasonal factor ×
 * irregular factor (multiplicative, where {@code seasonal} holds the factors). Arrays are copied in
 * and out.
 *
 * @param method how the decomposition was made
 */
public record Decomposition(Method method, double[] trendCycle, double[] seasonal, double[] irregular,
                            double[] adjusted, boolean multiplicative) {

    /**
     * Robust STL with the settings it used.
     *
     * @param onLogs whether it decomposed the logarithms (a multiplicative series)
     */
    public record Method(int seasonalWindow, int trendWindow, int innerLoops, int outerLoops, boolean onLogs) {
    }

    public Decomposition {
        trendCycle = trendCycle.clone();
        seasonal = seasonal.clone();
        irregular = irregular.clone();
        adjusted = adjusted.clone();
    }

    @Override
    public double[] trendCycle() {
        return trendCycle.clone();
    }

    @Override
    public double[] seasonal() {
        return seasonal.clone();
    }

    @Override
    public double[] irregular() {
        return irregular.clone();
    }

    @Override
    public double[] adjusted() {
        return adjusted.clone();
    }
}
