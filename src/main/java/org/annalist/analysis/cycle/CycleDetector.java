package org.annalist.analysis.cycle;

import java.util.ArrayList;
import java.util.List;
import org.annalist.analysis.DecisionRules;
import org.annalist.analysis.season.Periodogram;

/**
 * Rises and falls longer than a year that recur: a cycle, as opposed to a seasonal pattern.
 *
 * <p>Works on one value per year (annual data, or the yearly means of a seasonally adjusted
 * series), so a seasonal pattern can never be taken for a cycle. Steps:
 * <ol>
 * <li>the periodogram of the linearly detrended values ({@link Periodogram}); candidate periods
 *     lie between {@link DecisionRules#MIN_CYCLE_YEARS} years and n / {@link DecisionRules#MIN_CYCLES_IN_DATA};</li>
 * <li>the highest candidate ordinate is tested against a red-noise background: an AR(1) spectrum
 *     {@code S(f) ∝ (1 − r²)/(1 − 2r cos 2πf + r²)} with r the lag-1 autocorrelation of the
 *     detrended values, scaled to the periodogram's mean; under it each ordinate is
 *     S(f)·χ²₂/2, so the chance that the largest of M candidates reaches I is
 *     {@code 1 − (1 − e^{−I/S})^M} (Gilman, Fuglister &amp; Mitchell 1963, <i>J. Atmos. Sci.</i> 20,
 *     182–184, for the red-noise spectrum; the maximum over M ordinates, Fisher's idea, from memory);</li>
 * <li>the peaks themselves confirm it: local maxima at least half a period apart; their gaps give
 *     the length; the cycle is regular when the gaps' coefficient of variation is at most
 *     {@link DecisionRules#MAX_REGULAR_GAP_CV}.</li>
 * </ol>
 */
public final class CycleDetector {

    /**
     * @param spectralPeriod the period of the periodogram peak, in years
     * @param pValue         chance of so high a peak under red noise
     * @param peaks          0-based positions of the peaks in the yearly values
     * @param gaps           years between successive peaks
     * @param length         mean gap in years (the spectral period when fewer than two gaps)
     */
    public record Result(boolean present, String reason, double spectralPeriod, double pValue, List<Integer> peaks,
                         List<Integer> gaps, double length, boolean regular) {

        public Result {
            peaks = List.copyOf(peaks);
            gaps = List.copyOf(gaps);
        }
    }

    private CycleDetector() {
    }

    /** @param yearly one value per year, no missing values */
    public static Result detect(double[] yearly) {
        int n = yearly.length;
        if (n < DecisionRules.MIN_YEARS_FOR_CYCLE) {
            return absent("the data cover " + n + " years, and at least " + DecisionRules.MIN_YEARS_FOR_CYCLE
                    + " are needed");
        }
        Periodogram.Result spectrum = Periodogram.of(yearly, 1);
        double[] power = spectrum.power();
        double meanPower = 0;
        for (double p : power) {
            meanPower += p / power.length;
        }
        double r = Math.max(-0.95, Math.min(0.95, spectrum.residualLag1()));
        double[] background = new double[power.length];
        double meanBackground = 0;
        for (int k = 0; k < power.length; k++) {
            double f = spectrum.frequency()[k];
            background[k] = (1 - r * r) / (1 - 2 * r * Math.cos(2 * Math.PI * f) + r * r);
            meanBackground += background[k] / power.length;
        }
        int best = -1;
        int candidates = 0;
        double bestRatio = 0;
        for (int k = 0; k < power.length; k++) {
            double period = spectrum.period(k);
            if (period < DecisionRules.MIN_CYCLE_YEARS || period > n / DecisionRules.MIN_CYCLES_IN_DATA) {
                continue;
            }
            candidates++;
            double ratio = power[k] / (background[k] * meanPower / meanBackground);
            if (ratio > bestRatio) {
                bestRatio = ratio;
                best = k;
            }
        }
        if (best < 0) {
            return absent("no period between " + DecisionRules.MIN_CYCLE_YEARS + " years and half the span");
        }
        double pValue = 1 - Math.pow(1 - Math.exp(-bestRatio), candidates);
        double spectralPeriod = spectrum.period(best);
        List<Integer> peaks = peaks(detrend(yearly), spectralPeriod);
        List<Integer> gaps = new ArrayList<>();
        for (int i = 1; i < peaks.size(); i++) {
            gaps.add(peaks.get(i) - peaks.get(i - 1));
        }
        double length = gaps.size() >= 2 ? gaps.stream().mapToInt(Integer::intValue).average().orElseThrow() : spectralPeriod;
        boolean regular = isRegular(gaps);
        if (pValue >= DecisionRules.ALPHA) {
            return new Result(false, "its strongest period, " + Math.round(spectralPeriod * 10) / 10.0
                    + " years, is no stronger than random persistent wander would give", spectralPeriod, pValue, peaks,
                    gaps, length, regular);
        }
        if (peaks.size() < 3) {
            return new Result(false, "fewer than three peaks confirm it", spectralPeriod, pValue, peaks, gaps, length,
                    regular);
        }
        return new Result(true, "", spectralPeriod, pValue, peaks, gaps, length, regular);
    }

    /** Gaps are regular when there are at least two and their coefficient of variation is small. */
    public static boolean isRegular(List<Integer> gaps) {
        if (gaps.size() < 2) {
            return false;
        }
        double mean = gaps.stream().mapToInt(Integer::intValue).average().orElseThrow();
        double ss = 0;
        for (int g : gaps) {
            ss += (g - mean) * (g - mean);
        }
        double sd = Math.sqrt(ss / (gaps.size() - 1));
        return sd / mean <= DecisionRules.MAX_REGULAR_GAP_CV;
    }

    private static Result absent(String reason) {
        return new Result(false, reason, Double.NaN, Double.NaN, List.of(), List.of(), Double.NaN, false);
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
