package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;

/**
 * The trend-cycle line drawn through the series.
 *
 * @param method     the moving average
 * @param window     periods averaged
 * @param trendCycle one value per period of the series, {@code NaN} where there is no full window
 */
public record Smoothing(CentredAverage method, int window, @JsonIgnore double[] trendCycle) {

    /** A centred moving average over {@code window} periods; an even window is averaged twice (2×m). */
    public record CentredAverage(int window) {

        public boolean twice() {
            return window % 2 == 0;
        }
    }

    public Smoothing {
        trendCycle = trendCycle.clone();
    }

    @Override
    public double[] trendCycle() {
        return trendCycle.clone();
    }
}
