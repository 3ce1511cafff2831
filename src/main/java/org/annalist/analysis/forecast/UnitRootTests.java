package org.annalist.analysis.forecast;

import org.annalist.analysis.decompose.Stl;

/**
 * How many differences an automatic ARIMA takes, as the forecast package 8.20 decides by default
 * [1, §3.2; 4]: d by repeated KPSS tests of level stationarity [2] at the 5 % level (R's
 * {@code ndiffs(test = "kpss")}: difference while the statistic exceeds the 5 % critical value 0.463,
 * at most twice), and D by the seasonal strength of an STL decomposition [3] (R's
 * {@code nsdiffs(test = "seas")}, the default of {@code auto.arima}'s {@code seasonal.test}: one
 * seasonal difference when max(0, min(1, 1 − Var(R)/Var(S + R))) &gt; 0.64, from
 * {@code forecast:::seas.heuristic}, which decomposes by {@code mstl}, that is one STL with seasonal
 * window 11, non-robust).
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J. &amp; Khandakar, Y. (2008). Automatic time series forecasting: the forecast
 * package for R. <i>Journal of Statistical Software</i> 27(3), 1–22. DOI 10.18637/jss.v027.i03.</li>
 * <li>Kwiatkowski, D., Phillips, P. C. B., Schmidt, P. &amp; Shin, Y. (1992). Testing the null
 * hypothesis of stationarity against the alternative of a unit root. <i>Journal of Econometrics</i>
 * 54(1–3), 159–178. DOI 10.1016/0304-4076(92)90104-Y.</li>
 * <li>Wang, X., Smith, K. A. &amp; Hyndman, R. J. (2006). Characteristic-based clustering for time
 * series data. <i>Data Mining and Knowledge Discovery</i> 13(3), 335–364.
 * DOI 10.1007/s10618-005-0039-x.</li>
 * <li>forecast 8.20 for R: {@code ndiffs}, {@code nsdiffs}, {@code seas.heuristic}, {@code mstl}, and
 * urca's {@code ur.kpss} (read from the installed package).</li>
 * </ol>
 */
public final class UnitRootTests {

    /** KPSS 5 % critical value for the level-stationary case [2, Table 1]. */
    static final double KPSS_CRITICAL_5 = 0.463;
    /** Seasonal strength above which one seasonal difference is taken ([4] {@code nsdiffs}). */
    static final double SEASONAL_STRENGTH_THRESHOLD = 0.64;
    /** The seasonal window of [4] {@code mstl} for the first seasonal period: 7 + 4·1. */
    private static final int MSTL_SEASONAL_WINDOW = 11;
    /** R's {@code all.equal} tolerance, which [4] {@code is.constant} uses. */
    private static final double CONSTANT_TOLERANCE = 1.5e-8;
    /** At most this many first differences ([4] {@code ndiffs(max.d = 2)}). */
    static final int MAX_D = 2;

    private UnitRootTests() {
    }

    /**
     * The KPSS level statistic [2, eq. 14] with the Newey–West long-run variance over
     * ⌊3√n/13⌋ lags and Bartlett weights, as [4] {@code ndiffs} calls {@code ur.kpss}.
     */
    public static double kpss(double[] x) {
        int n = x.length;
        double mean = 0;
        for (double v : x) {
            mean += v;
        }
        mean /= n;
        double[] e = new double[n];
        double s = 0;
        double numerator = 0;
        double s2 = 0;
        for (int t = 0; t < n; t++) {
            e[t] = x[t] - mean;
            s += e[t];
            numerator += s * s;
            s2 += e[t] * e[t];
        }
        numerator /= (double) n * n;
        s2 /= n;
        int lags = (int) (3 * Math.sqrt(n) / 13);
        double denominator = s2;
        for (int l = 1; l <= lags; l++) {
            double c = 0;
            for (int t = l; t < n; t++) {
                c += e[t] * e[t - l];
            }
            denominator += 2.0 / n * (1 - l / (lags + 1.0)) * c;
        }
        return numerator / denominator;
    }

    /** d: difference while the KPSS statistic exceeds {@value #KPSS_CRITICAL_5}, at most {@value #MAX_D} times. */
    public static int ndiffs(double[] x) {
        if (isConstant(x)) {
            return 0;
        }
        int d = 0;
        double[] w = x;
        boolean differ = w.length > 1 && kpss(w) > KPSS_CRITICAL_5;
        while (differ && d < MAX_D) {
            d++;
            w = difference(w, 1);
            if (isConstant(w)) {
                return d;
            }
            differ = w.length > 1 && kpss(w) > KPSS_CRITICAL_5;
        }
        return d;
    }

    /**
     * The seasonal strength [3] of {@code x} with period m by STL (window 11, non-robust); NaN when the
     * series has no more than two full periods.
     */
    public static double seasonalStrength(double[] x, int period) {
        if (period < 2 || x.length <= 2 * period) {
            return Double.NaN;
        }
        Stl.Result stl = Stl.withPeriod(period).withSeasonalWindow(MSTL_SEASONAL_WINDOW).with(Stl.Robustness.OFF).fit(x);
        double[] seasonal = stl.seasonal();
        double[] remainder = stl.remainder();
        double[] sum = new double[x.length];
        for (int t = 0; t < x.length; t++) {
            sum[t] = seasonal[t] + remainder[t];
        }
        return Math.max(0, Math.min(1, 1 - variance(remainder) / variance(sum)));
    }

    /** D: one seasonal difference when the seasonal strength exceeds {@value #SEASONAL_STRENGTH_THRESHOLD}. */
    public static int nsdiffs(double[] x, int period) {
        if (period < 2 || isConstant(x) || period >= x.length) {
            return 0;
        }
        double strength = seasonalStrength(x, period);
        return strength > SEASONAL_STRENGTH_THRESHOLD ? 1 : 0; // NaN (too short): R's error handler gives 0
    }

    /** [4] {@code is.constant}: the mean absolute deviation from the first value at most 1.5·10⁻⁸, relative to the mean absolute value. */
    static boolean isConstant(double[] x) {
        if (x.length == 0) {
            return true;
        }
        double diff = 0;
        double size = 0;
        for (double v : x) {
            diff += Math.abs(v - x[0]);
            size += Math.abs(v);
        }
        diff /= x.length;
        size /= x.length;
        if (size > CONSTANT_TOLERANCE) {
            diff /= size;
        }
        return diff <= CONSTANT_TOLERANCE;
    }

    static double[] difference(double[] x, int lag) {
        double[] w = new double[Math.max(0, x.length - lag)];
        for (int t = 0; t < w.length; t++) {
            w[t] = x[t + lag] - x[t];
        }
        return w;
    }

    private static double variance(double[] x) {
        double mean = 0;
        for (double v : x) {
            mean += v;
        }
        mean /= x.length;
        double ss = 0;
        for (double v : x) {
            ss += (v - mean) * (v - mean);
        }
        return ss / (x.length - 1);
    }
}
