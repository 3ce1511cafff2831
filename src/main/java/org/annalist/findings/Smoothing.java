package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;

/**
 * The trend-cycle line drawn through the series.
 *
 * @param method     e.g. {@code 2×12 centred moving average}
 * @param window     periods averaged
 * @param trendCycle one value per period of the series, {@code NaN} where there is no full window
 */
public record Smoothing(String method, int window, @JsonIgnore double[] trendCycle) {

    public Smoothing {
        trendCycle = trendCycle.clone();
    }

    @Override
    public double[] trendCycle() {
        return trendCycle.clone();
    }
}
