package org.annalist.analysis.season;

/**
 * The raw periodogram of a linearly detrended series at its Fourier frequencies, as R's
 * {@code spec.pgram(x, taper = 0, detrend = TRUE, fast = FALSE)} [2]: the series less its
 * least-squares line, then {@code I(f_k) = |Σ_t x_t e^{−2πik(t−1)/N}|² / (N · frequency)} for
 * k = 1 … ⌊N/2⌋, with f_k = k · frequency / N cycles per unit of time (per year when
 * {@code frequency} is the number of periods in a year). The periodogram itself is that of [1]
 * (cited earlier as ch. 4; the chapter number is not checked); the scaling by the frequency is
 * R's. Fewer than 4 values are refused (our rule).
 *
 * <p>References:
 * <ol>
 * <li>P. Bloomfield (2000), <i>Fourier Analysis of Time Series: An Introduction</i>, 2nd ed.,
 *     Wiley, New York. doi:10.1002/0471722235 (DOI from memory)</li>
 * <li>R Core Team, {@code spec.pgram} in the {@code stats} package,
 *     {@code src/library/stats/R/spectrum.R}.</li>
 * </ol>
 */
public final class Periodogram {

    /**
     * @param frequency cycles per time unit of each ordinate
     * @param power     the periodogram ordinates
     * @param residualLag1 lag-1 autocorrelation of the detrended series (for a red-noise background),
     *                     as {@link Autocorrelation} computes it
     */
    public record Result(double[] frequency, double[] power, double residualLag1) {

        public Result {
            frequency = frequency.clone();
            power = power.clone();
        }

        @Override
        public double[] frequency() {
            return frequency.clone();
        }

        @Override
        public double[] power() {
            return power.clone();
        }

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
        // [2] detrend = TRUE: the least-squares line is removed first
        double[] detrended = detrend(x);
        int m = n / 2;
        double[] f = new double[m];
        double[] power = new double[m];
        for (int k = 1; k <= m; k++) {
            double re = 0;
            double im = 0;
            // [1] the discrete Fourier transform at the Fourier frequency k/N, summed directly (fast = FALSE)
            for (int t = 0; t < n; t++) {
                double angle = 2 * Math.PI * k * t / n;
                re += detrended[t] * Math.cos(angle);
                im -= detrended[t] * Math.sin(angle);
            }
            // [2] f_k = k · frequency / N and I(f_k) = |DFT|² / (N · frequency)
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
