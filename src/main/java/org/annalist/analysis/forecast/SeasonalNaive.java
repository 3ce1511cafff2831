package org.annalist.analysis.forecast;

/**
 * The seasonal naive forecast: every future period repeats the same period of the last observed
 * cycle (Hyndman &amp; Athanasopoulos 2021, §5.2) — the benchmark every other forecast must beat.
 */
public final class SeasonalNaive {

    private SeasonalNaive() {
    }

    public static double[] forecast(double[] x, int period, int h) {
        if (x.length < period) {
            throw new IllegalArgumentException("a seasonal naive forecast needs one full period of " + period
                    + " values, got " + x.length);
        }
        double[] f = new double[h];
        for (int k = 0; k < h; k++) {
            f[k] = x[x.length - period + (k % period)];
        }
        return f;
    }
}
