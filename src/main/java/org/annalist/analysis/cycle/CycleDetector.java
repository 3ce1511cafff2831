package org.annalist.analysis.cycle;

import java.util.ArrayList;
import java.util.List;
import org.annalist.analysis.season.Periodogram;

/**
 * Rises and falls longer than a year that recur: a cycle, as opposed to a seasonal pattern.
 * Evidence only; whether it is worth a statement is decided by the caller.
 *
 * <p>Works on one value per year (annual data, or the yearly means of a seasonally adjusted
 * series), so a seasonal pattern can never be taken for a cycle. Steps:
 * <ol>
 * <li>the periodogram of the linearly detrended values ({@link Periodogram}); candidate periods
 *     lie between the shortest cycle (default {@value #DEFAULT_SHORTEST_CYCLE_YEARS} years) and n
 *     divided by the cycles the data must hold (default {@value #DEFAULT_CYCLES_IN_DATA});</li>
 * <li>the highest candidate ordinate is tested against a red-noise background: an AR(1) spectrum
 *     {@code S(f) ∝ (1 − r²)/(1 − 2r cos 2πf + r²)} [1] with r the lag-1 autocorrelation of the
 *     detrended values (clipped to ±0.95, our rule), scaled to the periodogram's mean (our rule);
 *     under it each ordinate is S(f)·χ²₂/2 (the usual large-sample distribution of a periodogram
 *     ordinate [4]), so the chance that the largest of M candidates reaches I is
 *     {@code 1 − (1 − e^{−I/S})^M}, the ordinates taken as independent. Testing the largest
 *     ordinate rather than a chosen one is Fisher's idea [2]; his g divides it by the sum of the
 *     ordinates under white noise, where this test divides it by the fitted background;</li>
 * <li>the peaks: local maxima at least half a period apart; their gaps give the length, and the
 *     gaps' coefficient of variation how regular the cycle is (our rules).</li>
 * </ol>
 *
 * <p>References:
 * <ol>
 * <li>D. L. Gilman, F. J. Fuglister and J. M. Mitchell (1963), "On the Power Spectrum of 'Red
 *     Noise'", <i>Journal of the Atmospheric Sciences</i> 20, 182–184.
 *     doi:10.1175/1520-0469(1963)020&lt;0182:OTPSON&gt;2.0.CO;2</li>
 * <li>R. A. Fisher (1929), "Tests of Significance in Harmonic Analysis", <i>Proceedings of the
 *     Royal Society of London, Series A</i> 125(796), 54–59. doi:10.1098/rspa.1929.0151</li>
 * <li>R. J. Hyndman and G. Athanasopoulos (2021), <i>Forecasting: Principles and Practice</i>,
 *     3rd ed., OTexts, Melbourne; https://otexts.com/fpp3/ (no DOI).</li>
 * <li>P. Bloomfield (2000), <i>Fourier Analysis of Time Series: An Introduction</i>, 2nd ed.,
 *     Wiley, New York. doi:10.1002/0471722235 (DOI from memory)</li>
 * </ol>
 */
public final class CycleDetector {

    /** Whether the search could measure anything. */
    public enum Status {
        /** Fewer yearly values than the search needs. */
        TOO_FEW_YEARS,
        /** No periodogram period between the shortest cycle and the longest the data can hold. */
        NO_CANDIDATE_PERIOD,
        MEASURED
    }

    /**
     * @param years          yearly values searched
     * @param spectralPeriod the period of the periodogram peak, in years (NaN unless measured)
     * @param pValue         chance of so high a peak under red noise (NaN unless measured)
     * @param peaks          0-based positions of the peaks in the yearly values
     * @param gaps           years between successive peaks
     * @param length         mean gap in years (the spectral period when fewer than two gaps)
     * @param gapVariation   coefficient of variation of the gaps (NaN with fewer than two gaps)
     */
    public record Result(Status status, int years, double spectralPeriod, double pValue, List<Integer> peaks,
                         List<Integer> gaps, double length, double gapVariation) {

        public Result {
            peaks = List.copyOf(peaks);
            gaps = List.copyOf(gaps);
        }
    }

    /** Yearly values needed to look for a cycle at all (our rule). */
    public static final int DEFAULT_MINIMUM_YEARS = 12;
    /** A cycle is longer than two years ([3] §2.3: cycles last "at least 2 years"). */
    public static final double DEFAULT_SHORTEST_CYCLE_YEARS = 2.0;
    /** At least two complete cycles in the data (our rule of thumb; no published source). */
    public static final double DEFAULT_CYCLES_IN_DATA = 2.0;

    private final int minimumYears;
    private final double shortestCycleYears;
    private final double cyclesInData;

    private CycleDetector(int minimumYears, double shortestCycleYears, double cyclesInData) {
        this.minimumYears = minimumYears;
        this.shortestCycleYears = shortestCycleYears;
        this.cyclesInData = cyclesInData;
    }

    public static CycleDetector withDefaults() {
        return new CycleDetector(DEFAULT_MINIMUM_YEARS, DEFAULT_SHORTEST_CYCLE_YEARS, DEFAULT_CYCLES_IN_DATA);
    }

    public CycleDetector withMinimumYears(int years) {
        return new CycleDetector(years, shortestCycleYears, cyclesInData);
    }

    public CycleDetector withShortestCycleYears(double years) {
        return new CycleDetector(minimumYears, years, cyclesInData);
    }

    /** How many whole cycles the data must hold: the longest candidate period is n / cycles. */
    public CycleDetector withCyclesInData(double cycles) {
        return new CycleDetector(minimumYears, shortestCycleYears, cycles);
    }

    /** @param yearly one value per year, no missing values */
    public Result detect(double[] yearly) {
        int n = yearly.length;
        if (n < minimumYears) {
            return unmeasured(Status.TOO_FEW_YEARS, n);
        }
        Periodogram.Result spectrum = Periodogram.of(yearly, 1);
        double[] power = spectrum.power();
        double[] frequency = spectrum.frequency();
        double meanPower = 0;
        for (double p : power) {
            meanPower += p / power.length;
        }
        // the lag-1 autocorrelation, clipped to ±0.95 so that the background stays finite (our rule)
        double r = Math.max(-0.95, Math.min(0.95, spectrum.residualLag1()));
        double[] background = new double[power.length];
        double meanBackground = 0;
        for (int k = 0; k < power.length; k++) {
            double f = frequency[k];
            background[k] = (1 - r * r) / (1 - 2 * r * Math.cos(2 * Math.PI * f) + r * r);   // [1]
            meanBackground += background[k] / power.length;
        }
        int best = -1;
        int candidates = 0;
        double bestRatio = 0;
        for (int k = 0; k < power.length; k++) {
            double period = spectrum.period(k);
            if (period < shortestCycleYears || period > n / cyclesInData) {
                continue;
            }
            candidates++;
            // I/S with the background scaled to the periodogram's mean (our rule)
            double ratio = power[k] / (background[k] * meanPower / meanBackground);
            if (ratio > bestRatio) {
                bestRatio = ratio;
                best = k;
            }
        }
        if (best < 0) {
            return unmeasured(Status.NO_CANDIDATE_PERIOD, n);
        }
        // [4] I/S ~ χ²₂/2 = Exp(1) under red noise; [2] the largest of M: 1 − (1 − e^{−I/S})^M
        double pValue = 1 - Math.pow(1 - Math.exp(-bestRatio), candidates);
        double spectralPeriod = spectrum.period(best);
        List<Integer> peaks = peaks(detrend(yearly), spectralPeriod);
        List<Integer> gaps = new ArrayList<>();
        for (int i = 1; i < peaks.size(); i++) {
            gaps.add(peaks.get(i) - peaks.get(i - 1));
        }
        double length = gaps.size() >= 2 ? gaps.stream().mapToInt(Integer::intValue).average().orElseThrow() : spectralPeriod;
        return new Result(Status.MEASURED, n, spectralPeriod, pValue, peaks, gaps, length, variation(gaps));
    }

    /** The gaps' coefficient of variation (sample standard deviation over mean); NaN with fewer than two. */
    public static double variation(List<Integer> gaps) {
        if (gaps.size() < 2) {
            return Double.NaN;
        }
        double mean = gaps.stream().mapToInt(Integer::intValue).average().orElseThrow();
        double ss = 0;
        for (int g : gaps) {
            ss += (g - mean) * (g - mean);
        }
        double sd = Math.sqrt(ss / (gaps.size() - 1));
        return sd / mean;
    }

    private static Result unmeasured(Status status, int years) {
        return new Result(status, years, Double.NaN, Double.NaN, List.of(), List.of(), Double.NaN, Double.NaN);
    }

    /** Positions that hold the highest value within half a period on either side (the first of equals). */
    static List<Integer> peaks(double[] x, double period) {
        int half = Math.max(1, (int) Math.floor(period / 2));
        List<Integer> peaks = new ArrayList<>();
        for (int t = 0; t < x.length; t++) {
            boolean highest = true;
            for (int s = Math.max(0, t - half); s <= Math.min(x.length - 1, t + half) && highest; s++) {
                highest = s == t || x[s] < x[t] || (x[s] == x[t] && s > t);
            }
            if (highest) {
                peaks.add(t);
            }
        }
        return peaks;
    }

    private static double[] detrend(double[] x) {
        int n = x.length;
        double tMean = (n - 1) / 2.0;
        double xMean = 0;
        for (double v : x) {
            xMean += v / n;
        }
        double sxt = 0;
        double stt = 0;
        for (int t = 0; t < n; t++) {
            sxt += (t - tMean) * (x[t] - xMean);
            stt += (t - tMean) * (t - tMean);
        }
        double b = sxt / stt;
        double[] d = new double[n];
        for (int t = 0; t < n; t++) {
            d[t] = x[t] - xMean - b * (t - tMean);
        }
        return d;
    }
}
