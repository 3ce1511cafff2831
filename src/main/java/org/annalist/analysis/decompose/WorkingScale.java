package org.annalist.analysis.decompose;

import java.util.Arrays;
import java.util.Optional;

/**
 * The scale the analysis works on and the way back: a multiplicative series is decomposed in
 * logarithms (seasonal factors become additive terms), and its components are turned back into the
 * series' units by the exponential; an additive series works on its own values. An additive
 * decomposition of the logs is a multiplicative decomposition of the series ([1] §3.2).
 *
 * <p>References:
 * <ol>
 * <li>R. J. Hyndman and G. Athanasopoulos (2021), <i>Forecasting: Principles and Practice</i>,
 *     3rd ed., OTexts, Melbourne; https://otexts.com/fpp3/ (no DOI).</li>
 * </ol>
 */
public final class WorkingScale {

    private WorkingScale() {
    }

    /** Natural logarithms ({@code NaN} stays {@code NaN}). */
    public static double[] logs(double[] x) {
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = Math.log(x[i]);
        }
        return y;
    }

    /** Working values back in the series' units: the exponential when they are logs, else a copy. */
    public static double[] toUnits(double[] y, boolean logs) {
        if (!logs) {
            return y.clone();
        }
        double[] x = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            x[i] = Math.exp(y[i]);
        }
        return x;
    }

    /**
     * What trend-cycle and season predict on the working scale: the fit's trend plus seasonal, or
     * without a decomposition the centred moving average of {@code y} over {@code window} periods
     * (NaN where it has no window, and everywhere when the series is shorter than one).
     */
    public static double[] expected(double[] y, Optional<Stl.Result> fit, int window) {
        double[] expected = new double[y.length];
        if (fit.isPresent()) {
            double[] trend = fit.get().trend();
            double[] seasonal = fit.get().seasonal();
            for (int t = 0; t < y.length; t++) {
                expected[t] = trend[t] + seasonal[t];
            }
            return expected;
        }
        if (y.length < window + 1) {
            Arrays.fill(expected, Double.NaN);
            return expected;
        }
        return CentredMovingAverage.of(y, window).trendCycle();
    }
}
