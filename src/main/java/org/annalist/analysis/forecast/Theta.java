package org.annalist.analysis.forecast;

import java.util.Arrays;
import org.annalist.analysis.decompose.ClassicalDecomposition;
import org.annalist.analysis.season.Autocorrelation;

/**
 * The Theta method (Assimakopoulos &amp; Nikolopoulos 2000, <i>International Journal of
 * Forecasting</i> 16, 521–530) in the form Hyndman &amp; Billah (2003, <i>IJF</i> 19, 287–290,
 * §3) showed it to be: simple exponential smoothing with a drift of half the slope of the
 * least-squares line, ŷ_{n+h} = ℓ_n + (b/2)((h − 1) + (1 − (1 − α)ⁿ)/α).
 *
 * <p>Seasonal data are first divided by classical multiplicative seasonal indices when the lag-m
 * autocorrelation is significant at 90 %, |r_m| &gt; 1.645 √((1 + 2 Σ_{k&lt;m} r_k²)/n), and the
 * forecasts multiplied back — the procedure of the M3 competition entry as common practice. The
 * smoothing is an ETS(A,N,N) fit, whose class-1 variances σ²(1 + (h − 1)α²) give the intervals,
 * scaled by the seasonal index.
 */
public final class Theta {

    /**
     * @param seasonalIndex by position t mod m (all 1 when the data were not deseasonalised)
     * @param smoothing     the ETS(A,N,N) fit on the (deseasonalised) values
     * @param drift         b/2, half the least-squares slope per period
     */
    public record Fit(double[] seasonalIndex, EtsModel.Fit smoothing, double drift, int n) {

        public double[] forecast(int h) {
            double[] level = smoothing.forecast(h);
            double[] f = new double[h];
            for (int i = 0; i < h; i++) {
                f[i] = (level[i] + driftTerm(i + 1)) * index(i);
            }
            return f;
        }

        public EtsModel.Prediction predict(int h) {
            EtsModel.Prediction ses = smoothing.predict(h);
            double[] variance = new double[h];
            for (int i = 0; i < h; i++) {
                variance[i] = ses.variance()[i] * index(i) * index(i);
            }
            return new EtsModel.Prediction(forecast(h), variance);
        }

        /** Sample paths: those of the smoothing, plus the drift, times the seasonal index. */
        public double[][] paths(double[][] shocks) {
            double[][] paths = smoothing.paths(shocks);
            for (double[] path : paths) {
                for (int i = 0; i < path.length; i++) {
                    path[i] = (path[i] + driftTerm(i + 1)) * index(i);
                }
            }
            return paths;
        }

        public boolean deseasonalised() {
            return Arrays.stream(seasonalIndex).anyMatch(v -> v != 1);
        }

        private double driftTerm(int h) {
            double alpha = smoothing.parameters().alpha();
            return drift * ((h - 1) + (1 - Math.pow(1 - alpha, n)) / alpha);
        }

        private double index(int step) {
            return seasonalIndex[(n + step) % seasonalIndex.length];
        }
    }

    private static final double SEASONAL_TEST_QUANTILE = 1.645;

    private Theta() {
    }

    /** @return null when the simple smoothing cannot be fitted (fewer than four values) */
    public static Fit fit(double[] y, int period) {
        int n = y.length;
        if (n < 4) {
            return null;
        }
        double[] index = new double[Math.max(1, period)];
        Arrays.fill(index, 1);
        double[] adjusted = y;
        if (isSeasonal(y, period)) {
            ClassicalDecomposition.Result d = ClassicalDecomposition.of(y, period, ClassicalDecomposition.Type.MULTIPLICATIVE);
            index = d.figure().clone();
            adjusted = new double[n];
            for (int t = 0; t < n; t++) {
                adjusted[t] = y[t] / index[t % period];
            }
        }
        EtsModel.Fit ses = new EtsModel(EtsModel.Error.ADDITIVE, EtsModel.Trend.NONE, false, EtsModel.Season.NONE, 1)
                .fit(adjusted);
        if (ses == null) {
            return null;
        }
        return new Fit(index, ses, StartLine.through(adjusted, n).slope() / 2, n);
    }

    /** Positive data, more than two seasons, and a significant lag-m autocorrelation (as R's thetaf, from memory). */
    static boolean isSeasonal(double[] y, int period) {
        if (period < 2 || y.length <= 2 * period) {
            return false;
        }
        for (double v : y) {
            if (!(v > 0)) {
                return false;
            }
        }
        double[] r = Autocorrelation.of(y, period);
        double sum = 0;
        for (int k = 1; k < period; k++) {
            sum += r[k] * r[k];
        }
        return Math.abs(r[period]) > SEASONAL_TEST_QUANTILE * Math.sqrt((1 + 2 * sum) / y.length);
    }
}
