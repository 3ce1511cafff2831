package org.annalist.analysis.forecast;

import java.util.Optional;
import org.apache.commons.math3.distribution.TDistribution;

/**
 * The forecast of a series too short for the usual methods (fewer than {@value Outlook#MIN_VALUES}
 * values): the naive forecast with drift, ŷ_{n+h} = y_n + h·c with c = (y_n − y_1)/(n − 1), whose
 * h-step standard deviation is σ√(h(1 + h/(n − 1))) [1, §5.5, Table 5.2], σ² the variance of the
 * first differences about c; for seasonal data with at least two seasonal differences, the seasonal
 * naive forecast, σ√(k + 1) with k = ⌊(h − 1)/m⌋ and σ² the mean squared seasonal difference
 * [1, §5.5]. With so few values σ itself is uncertain, so the limits take Student's t quantiles on
 * the differences' degrees of freedom instead of the normal ones (common practice, no source): the
 * intervals are wide, as they should be. The sample paths are the point forecasts plus the step's
 * standard deviation, at the 95 % limit's scale, times the running mean of the common shocks, so
 * that neighbouring steps err together as a random walk does.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J. &amp; Athanasopoulos, G. (2021). <i>Forecasting: Principles and Practice</i>,
 * 3rd ed. OTexts, Melbourne (an online textbook; no DOI).</li>
 * </ol>
 */
final class ShortSeries {

    private ShortSeries() {
    }

    /** @return empty when there are too few values to estimate the spread (or it is zero) */
    static Optional<Outlook.Forecast> forecast(double[] y, int period, int horizon, Outlook.Bounds bounds) {
        int n = y.length;
        boolean seasonal = period > 1;
        int differences = seasonal ? n - period : n - 1;
        int freedom = seasonal ? differences : differences - 1; // the drift is estimated, the seasonal naive has nothing
        if (freedom < 1) {
            return Optional.empty();
        }
        double drift = seasonal ? 0 : (y[n - 1] - y[0]) / (n - 1);
        int lag = seasonal ? period : 1;
        double squares = 0;
        for (int t = lag; t < n; t++) {
            double d = y[t] - y[t - lag] - drift;
            squares += d * d;
        }
        double sigma = Math.sqrt(squares / freedom);
        if (!(sigma > 0)) {
            return Optional.empty();
        }
        TDistribution t = new TDistribution(null, freedom);
        double t80 = t.inverseCumulativeProbability(0.90);
        double t95 = t.inverseCumulativeProbability(0.975);
        double[] mean = new double[horizon];
        double[] sd = new double[horizon];
        for (int k = 0; k < horizon; k++) {
            int h = k + 1;
            if (seasonal) {
                mean[k] = y[n - period + (k % period)];
                sd[k] = sigma * Math.sqrt(k / period + 1); // [1] §5.5, Table 5.2
            } else {
                mean[k] = y[n - 1] + h * drift;
                sd[k] = sigma * Math.sqrt(h * (1 + h / (double) (n - 1))); // [1] §5.5, Table 5.2
            }
        }
        double[][] shocks = Shocks.forHorizon(horizon);
        double z95 = 1.959963984540054;
        double[][] paths = new double[shocks.length][horizon];
        for (int p = 0; p < shocks.length; p++) {
            double running = 0;
            for (int k = 0; k < horizon; k++) {
                running += shocks[p][k];
                paths[p][k] = mean[k] + sd[k] * (t95 / z95) * running / Math.sqrt(k + 1);
            }
        }
        double[] lo80 = new double[horizon];
        double[] hi80 = new double[horizon];
        double[] lo95 = new double[horizon];
        double[] hi95 = new double[horizon];
        for (int k = 0; k < horizon; k++) {
            lo80[k] = mean[k] - t80 * sd[k];
            hi80[k] = mean[k] + t80 * sd[k];
            lo95[k] = mean[k] - t95 * sd[k];
            hi95[k] = mean[k] + t95 * sd[k];
        }
        Outlook.Method method = seasonal ? Outlook.Method.SEASONAL_NAIVE : Outlook.Method.NAIVE_WITH_DRIFT;
        return Optional.of(Intervals.clipped(Outlook.Model.single(method, Optional.empty(), false, !seasonal), mean, lo80, hi80,
                lo95, hi95, paths, bounds));
    }
}
