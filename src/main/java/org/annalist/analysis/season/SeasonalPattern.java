package org.annalist.analysis.season;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.analysis.TestResult;
import org.annalist.analysis.decompose.Stl;
import org.annalist.series.Period;

/**
 * How strong is the seasonal pattern and what does it look like? Evidence only; whether it is
 * worth a statement is decided by the caller.
 *
 * <p>All from an STL fit on the working scale (logs for a multiplicative series):
 * <ul>
 * <li>a Kruskal–Wallis test of the detrended values (observed − trend) grouped by season position [2];</li>
 * <li>the seasonal strength F_S = max(0, 1 − Var(R)/Var(S + R)) [1], in the STL form of [3], §4.3;</li>
 * <li>the seasonal profile: the mean seasonal component of each position over the last
 *     {@value #PROFILE_YEARS} complete years, centred; as % above or below the yearly average for a
 *     multiplicative series, in series units for an additive one; its peak, trough and swing;</li>
 * <li>the profile of the first {@value #PROFILE_YEARS} complete years against the last, for a
 *     pattern that changed;</li>
 * <li>the period confirmed from the data: the autocorrelation of the detrended values at the
 *     seasonal lag (positive, beyond 2/√n and a local peak). 2/√n rounds the approximate 95 %
 *     bound 1.96/√n for the autocorrelations of white noise (common practice; see [3] §2.9);
 *     asking for a local peak as well is our rule.</li>
 * </ul>
 *
 * <p>References:
 * <ol>
 * <li>X. Wang, K. A. Smith and R. J. Hyndman (2006), "Characteristic-Based Clustering for Time
 *     Series Data", <i>Data Mining and Knowledge Discovery</i> 13(3), 335–364.
 *     doi:10.1007/s10618-005-0039-x</li>
 * <li>W. H. Kruskal and W. A. Wallis (1952), "Use of Ranks in One-Criterion Variance Analysis",
 *     <i>Journal of the American Statistical Association</i> 47(260), 583–621.
 *     doi:10.1080/01621459.1952.10483441</li>
 * <li>R. J. Hyndman and G. Athanasopoulos (2021), <i>Forecasting: Principles and Practice</i>,
 *     3rd ed., OTexts, Melbourne; https://otexts.com/fpp3/ (no DOI).</li>
 * </ol>
 */
public final class SeasonalPattern {

    /** A season position with its index (% or units). */
    public record Index(int position, String label, double value) {
    }

    /** What the data say about the seasonal period. */
    public record PeriodCheck(int period, double autocorrelation, boolean confirmed) {
    }

    /**
     * @param swing           peak minus trough of the profile (percentage points or units)
     * @param swingPctOfLevel the swing as % of the level
     * @param fullYears       complete years in the data: the early and late profiles overlap when
     *                        fewer than twice {@value #PROFILE_YEARS}
     * @param earlyProfile    the profile of the first complete years
     * @param earlyPeak       the highest position of the early profile
     * @param largestShift    largest change of a position's index between the two profiles
     */
    public record Result(int period, boolean multiplicative, double strength, TestResult test,
                         List<Index> profile, Index peak, Index trough, double swing, double swingPctOfLevel,
                         int fullYears, List<Index> earlyProfile, Index earlyPeak, double largestShift,
                         PeriodCheck periodCheck) {

        public Result {
            profile = List.copyOf(profile);
            earlyProfile = List.copyOf(earlyProfile);
        }
    }

    /** Complete years a profile averages over (our rule: enough to steady each position's mean). */
    public static final int PROFILE_YEARS = 3;

    private SeasonalPattern() {
    }

    /**
     * @param y       the working values (logs when {@code multiplicative}), NaN where missing
     * @param start   the period of {@code y[0]}
     * @param level   the series' mean level in its own units, to judge the size of an additive swing
     * @return empty when the data hold fewer than {@value #PROFILE_YEARS} complete years
     */
    public static Optional<Result> assess(double[] y, Period start, Stl.Result stl, boolean multiplicative,
                                          double level) {
        int period = stl.parameters().period();
        int n = y.length;
        if (n < PROFILE_YEARS * period) {
            return Optional.empty();
        }
        double[] seasonal = stl.seasonal();
        double[] trend = stl.trend();
        double[] remainder = stl.remainder();
        double[] detrended = new double[n];
        int[] position = new int[n];
        int firstPosition = start.seasonalPosition() - 1;
        for (int t = 0; t < n; t++) {
            detrended[t] = y[t] - trend[t];
            position[t] = (firstPosition + t) % period;
        }
        // [2] the detrended values grouped by season position
        TestResult test = KruskalWallis.test(detrended, position, period);
        double strength = strength(seasonal, remainder);   // [1]

        int firstFull = (period - firstPosition) % period;   // index of the first position-1 value
        int fullYears = (n - firstFull) / period;
        if (fullYears < PROFILE_YEARS) {
            return Optional.empty();
        }
        List<Index> late = profile(seasonal, start, firstFull + (fullYears - PROFILE_YEARS) * period, period,
                multiplicative);
        List<Index> early = profile(seasonal, start, firstFull, period, multiplicative);
        Index peak = late.stream().max((a, b) -> Double.compare(a.value(), b.value())).orElseThrow();
        Index trough = late.stream().min((a, b) -> Double.compare(a.value(), b.value())).orElseThrow();
        double swing = peak.value() - trough.value();
        double swingPct = multiplicative ? swing : 100 * swing / Math.abs(level);
        double largestShift = 0;
        for (int j = 0; j < period; j++) {
            largestShift = Math.max(largestShift, Math.abs(late.get(j).value() - early.get(j).value()));
        }
        Index earlyPeak = early.stream().max((a, b) -> Double.compare(a.value(), b.value())).orElseThrow();
        return Optional.of(new Result(period, multiplicative, strength, test, late, peak, trough, swing, swingPct,
                fullYears, early, earlyPeak, largestShift, checkPeriod(detrended, period)));
    }

    /** F_S = max(0, 1 − Var(R) / Var(S + R)) over the observed periods ([1]; [3] §4.3). */
    static double strength(double[] seasonal, double[] remainder) {
        int n = 0;
        double sumR = 0;
        double sumSR = 0;
        for (int t = 0; t < seasonal.length; t++) {
            if (!Double.isNaN(remainder[t])) {
                n++;
                sumR += remainder[t];
                sumSR += seasonal[t] + remainder[t];
            }
        }
        double meanR = sumR / n;
        double meanSR = sumSR / n;
        double varR = 0;
        double varSR = 0;
        for (int t = 0; t < seasonal.length; t++) {
            if (!Double.isNaN(remainder[t])) {
                varR += (remainder[t] - meanR) * (remainder[t] - meanR);
                varSR += (seasonal[t] + remainder[t] - meanSR) * (seasonal[t] + remainder[t] - meanSR);
            }
        }
        // [1]; [3] §4.3: F_S = max(0, 1 − Var(R)/Var(S + R)); 0 when S + R does not vary (our rule)
        return varSR == 0 ? 0 : Math.max(0, 1 - varR / varSR);
    }

    /** Mean seasonal component per position over three complete years from {@code from}, centred. */
    private static List<Index> profile(double[] seasonal, Period start, int from, int period, boolean multiplicative) {
        double[] mean = new double[period];
        for (int year = 0; year < PROFILE_YEARS; year++) {
            for (int j = 0; j < period; j++) {
                mean[j] += seasonal[from + year * period + j] / PROFILE_YEARS;
            }
        }
        // centred so that the positions average to zero: for a multiplicative series the factors
        // exp(mean) are divided by their arithmetic mean, so that the bars read against the yearly
        // average, as the chart says (a geometric centre would lift every bar by a few points)
        double centre = 0;
        for (double m : mean) {
            centre += (multiplicative ? Math.exp(m) : m) / period;
        }
        List<Index> profile = new ArrayList<>(period);
        for (int j = 0; j < period; j++) {
            Period p = start.plus(from + j);
            double value = multiplicative ? 100 * (Math.exp(mean[j]) / centre - 1) : mean[j] - centre;
            profile.add(new Index(p.seasonalPosition(), p.seasonLabel(), value));
        }
        profile.sort((a, b) -> Integer.compare(a.position(), b.position()));
        return profile;
    }

    /** The seasonal lag's autocorrelation is positive, beyond 2/√n, and higher than at the lags beside it. */
    private static PeriodCheck checkPeriod(double[] detrended, int period) {
        double[] acf = Autocorrelation.of(detrended, period + 1);
        // [3] §2.9: the approximate 95 % bound for white noise, 1.96/√n rounded to 2/√n
        double bound = 2 / Math.sqrt(detrended.length);
        boolean confirmed = acf[period] > bound && acf[period] > acf[period - 1] && acf[period] > acf[period + 1];
        return new PeriodCheck(period, acf[period], confirmed);
    }
}
