package org.annalist.analysis.forecast;

import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Forecast accuracy on a hold-out: MASE, the mean absolute error scaled by the in-sample mean
 * absolute error of the seasonal naive forecast [1] (its scaling for seasonal data), and sMAPE, the
 * mean of 200 |y − f| / (|y| + |f|) as R's forecast package computes it [2].
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J. &amp; Koehler, A. B. (2006). Another look at measures of forecast accuracy.
 * <i>International Journal of Forecasting</i> 22(4), 679–688. DOI 10.1016/j.ijforecast.2006.03.001.</li>
 * <li>Hyndman, R. J. &amp; Khandakar, Y. (2008). Automatic time series forecasting: the forecast
 * package for R. <i>Journal of Statistical Software</i> 27(3), 1–22. DOI 10.18637/jss.v027.i03.</li>
 * </ol>
 */
public final class Accuracy {

    /** @param mase scaled error (below 1: better than the seasonal naive forecast in sample); smape in % */
    public record Result(double mase, double smape, int n) {
    }

    private Accuracy() {
    }

    /**
     * @param training the values the forecast was made from
     * @param period   the seasonal period of the scaling naive forecast (1 for non-seasonal data)
     * @return empty when the training values give no seasonal naive error to scale by (none, or all zero)
     * @throws IllegalArgumentException when actual and forecast values do not pair up, or there are none
     */
    public static Optional<Result> of(double[] training, double[] actual, double[] forecast, int period) {
        checkPairs(actual, forecast);
        OptionalDouble scale = naiveScale(training, period);
        return scale.isPresent() ? Optional.of(scaled(actual, forecast, scale.getAsDouble())) : Optional.empty();
    }

    /**
     * The in-sample mean absolute error of the seasonal naive forecast, the MASE's denominator [1]
     * (pairs with a missing value left out).
     *
     * @return empty when no pair is observed or every error is zero: nothing to scale by
     */
    static OptionalDouble naiveScale(double[] training, int period) {
        double scale = 0;
        int terms = 0;
        for (int t = period; t < training.length; t++) {
            if (!Double.isNaN(training[t]) && !Double.isNaN(training[t - period])) {
                scale += Math.abs(training[t] - training[t - period]);
                terms++;
            }
        }
        if (terms == 0 || scale == 0) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(scale / terms);
    }

    /** MASE and sMAPE with the given scale ({@link #naiveScale}). */
    static Result scaled(double[] actual, double[] forecast, double scale) {
        checkPairs(actual, forecast);
        double absolute = 0;
        double smape = 0;
        for (int h = 0; h < actual.length; h++) {
            double e = Math.abs(actual[h] - forecast[h]);
            absolute += e;
            smape += 200 * e / (Math.abs(actual[h]) + Math.abs(forecast[h])); // [2]
        }
        return new Result(absolute / actual.length / scale, smape / actual.length, actual.length); // [1] MASE
    }

    private static void checkPairs(double[] actual, double[] forecast) {
        if (actual.length != forecast.length || actual.length == 0) {
            throw new IllegalArgumentException("actual and forecast values must pair up, got " + actual.length + " and "
                    + forecast.length);
        }
    }
}
