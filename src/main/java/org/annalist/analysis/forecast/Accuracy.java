package org.annalist.analysis.forecast;

/**
 * Forecast accuracy on a hold-out: MASE, the mean absolute error scaled by the in-sample mean
 * absolute error of the seasonal naive forecast (Hyndman &amp; Koehler 2006, <i>International
 * Journal of Forecasting</i> 22, 679–688, eq. for seasonal data), and sMAPE, the mean of
 * 200 |y − f| / (|y| + |f|) (as R's forecast package computes it).
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
     */
    public static Result of(double[] training, double[] actual, double[] forecast, int period) {
        if (actual.length != forecast.length || actual.length == 0) {
            throw new IllegalArgumentException("actual and forecast values must pair up, got " + actual.length + " and "
                    + forecast.length);
        }
        double scale = 0;
        int terms = 0;
        for (int t = period; t < training.length; t++) {
            if (!Double.isNaN(training[t]) && !Double.isNaN(training[t - period])) {
                scale += Math.abs(training[t] - training[t - period]);
                terms++;
            }
        }
        if (terms == 0 || scale == 0) {
            throw new IllegalArgumentException("the training values give no seasonal naive error to scale by");
        }
        scale /= terms;
        double absolute = 0;
        double smape = 0;
        for (int h = 0; h < actual.length; h++) {
            double e = Math.abs(actual[h] - forecast[h]);
            absolute += e;
            smape += 200 * e / (Math.abs(actual[h]) + Math.abs(forecast[h]));
        }
        return new Result(absolute / actual.length / scale, smape / actual.length, actual.length);
    }
}
