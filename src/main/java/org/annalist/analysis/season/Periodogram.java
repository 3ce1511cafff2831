package org.annalist.analysis.season;

/**
 * The raw periodogram of a linearly detrended series at its Fourier frequencies, as R's
 * {@code spec.pgram(x, taper = 0, detrend = TRUE, fast = FALSE)}: the series less its
 * least-squares line, then {@code I(f_k) = |Σ_t x_t e^{−2πik(t−1)/N}|² / (N · frequency)} for
 * k = 1 … ⌊N/2⌋, with f_k = k · frequency / N cycles per unit of time (per year when
 * {@code frequency} is the number of periods in a year). Bloomfield (2000), <i>Fourier Analysis of
 * Time Series</i>, 2nd ed., ch. 4.
 */
public final class Periodogram {

    /**
     * @param frequency cycles per time unit of each ordinate
     * @param power     the periodogram ordinates
     * @param residualLag1 lag-1 autocorrelation of the detrended series (for a red-noise background)
     */
    public record Result(double[] frequency, double[] power, double residualLag1) {

        /** Period (time units per cycle) of ordinate {@code k}, 0-based. */
        public double period(int k) {
            return 1 / frequency[k];
        }
    }

    private Periodogram() {
    }

    /** @throws IllegalArgumentException with missing values or fewer than 4 values */
    public static Result of(double[] x, double frequency) {
        int n = x.length;
        if (n < 4) {
            throw new IllegalArgumentException("a periodogram needs at least 4 values, got " + n);
        }
        double[] detrended = detrend(x);
        int m = n / 2;
        double[] f = new double[m];
        double[] power = new double[m];
        for (int k = 1; k <= m; k++) {
            double re = 0;
            double im = 0;
            for (int t = 0; t < n; t++) {
                double angle = 2 * Math.PI * k * t / n;
                re += detrended[t] * Math.cos(angle);
                im -= detrended[t] * Math.sin(angle);
            }
            f[k - 1] = k * frequency / n;
            power[k - 1] = (re * re + im * im) / (n * frequency);
        }
        return new Result(f, power, Autocorrelation.of(detrended, 1)[1]);
    }

    /** x less its least-squares line in t = 1..n. */
    static double[] detrend(double[] x) {
        int n = x.length;
        double tMean = (n + 1) / 2.0;
        double xMean = 0;
        for (double v : x) {
            if (Double.isNaN(v)) {
                throw new IllegalArgumentException("a periodogram needs a series without missing values");
            }
            xMean += v / n;
        }
        double sxt = 0;
        double stt = 0;
        for (int t = 0; t < n; t++) {
            double dt = t + 1 - tMean;
            sxt += dt * (x[t] - xMean);
            stt += dt * dt;
        }
        double slope = sxt / stt;
        double[] detrended = new double[n];
        for (int t = 0; t < n; t++) {
            detrended[t] = x[t] - xMean - slope * (t + 1 - tMean);
        }
        return detrended;
    }
}
