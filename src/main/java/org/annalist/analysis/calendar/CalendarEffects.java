package org.annalist.analysis.calendar;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.analysis.anomaly.RemainderOutliers;
import org.annalist.series.Frequency;
import org.annalist.series.Holiday;
import org.annalist.series.Period;

/**
 * Calendar effects estimated on the irregular component (logs for a multiplicative series, so a
 * coefficient is a relative effect): least squares on the Easter share [3] and the number of
 * Friday and Saturday nights, each centred on its mean for that calendar month over the data's
 * years (so that none of them takes over the seasonal pattern; our rule), with Newey–West
 * standard errors that allow for autocorrelation ([1]; Bartlett weights, lag ⌊4 (n/100)^{2/9}⌋
 * after [2]), scaled by n/(n − k) (the usual degrees-of-freedom adjustment, common practice), and
 * two-sided normal p-values; whether an effect counts is the caller's decision.
 *
 * <p>{@link #robust} keeps one-offs from pulling the estimates: a Huber M-estimate by iteratively
 * reweighted least squares ([4], [5]; tuning constant 1.345, scale 1.4826 · MAD of the residuals
 * re-estimated at every step) gives residuals that a one-off cannot hide in; values whose residual
 * has a modified z-score ([6]) at or beyond the caller's cut are set aside, and least squares with
 * the Newey–West errors above is fitted on the rest: the "reweighted least squares" of [7] (a
 * robust start, hard rejection, then least squares), with a Huber start in place of [7]'s least
 * median of squares (our choice: it is cheap and the design has few, bounded regressors).
 *
 * <p>Note on the lag: in [2], 4 (n/100)^{2/9} is the preliminary lag of the automatic procedure,
 * from which the bandwidth is then estimated (from memory); here, as is common practice, it is the
 * lag itself. Weekday regressors for Friday and Saturday only are our rule (nights in tourism); a
 * regressor that does not vary within the calendar months is dropped (our rule). For counts of
 * day visits and series of other kinds the weekday regressor is the number of Saturdays and Sundays
 * ({@link Weekdays#WEEKEND_DAYS}); within a calendar month (February aside) it is the X-13 one-
 * coefficient trading-day contrast (weekdays − 5/2 · weekend days) up to a factor, because the
 * weekdays are the month's length less its weekend days (from memory of the X-13 documentation).
 *
 * <p>A user's own moving holidays ({@link Holiday}) enter the same way as Easter: the share of
 * the year's holiday days in the period, centred per calendar month.
 *
 * <p>The length of the month is not estimated: only February varies, in one year of four, too
 * rarely for a robust standard error; a leap-year February is noted instead (29/28, +3.6 % more
 * days), see the indicators.
 *
 * <p>The parts: {@link CentredRegressors} (the regressors, centred), {@link NeweyWestLeastSquares}
 * (the fit and its standard errors), {@link HuberRegression} (the robust start); here the
 * procedure that joins them and the results.
 *
 * <p>Monthly and quarterly data only: weekly and daily data carry the weekday in their seasonal
 * pattern, and annual data have no calendar to speak of.
 *
 * <p>References:
 * <ol>
 * <li>W. K. Newey and K. D. West (1987), "A Simple, Positive Semi-Definite, Heteroskedasticity and
 *     Autocorrelation Consistent Covariance Matrix", <i>Econometrica</i> 55(3), 703–708.
 *     doi:10.2307/1913610</li>
 * <li>W. K. Newey and K. D. West (1994), "Automatic Lag Selection in Covariance Matrix
 *     Estimation", <i>Review of Economic Studies</i> 61(4), 631–653. doi:10.2307/2297912</li>
 * <li>W. R. Bell and S. C. Hillmer (1983), "Modeling Time Series With Calendar Variation",
 *     <i>Journal of the American Statistical Association</i> 78(383), 526–534.
 *     doi:10.1080/01621459.1983.10478005 (see {@link CalendarRegressors})</li>
 * <li>P. J. Huber (1964), "Robust Estimation of a Location Parameter", <i>The Annals of
 *     Mathematical Statistics</i> 35(1), 73–101. doi:10.1214/aoms/1177703732</li>
 * <li>P. W. Holland and R. E. Welsch (1977), "Robust regression using iteratively reweighted
 *     least-squares", <i>Communications in Statistics – Theory and Methods</i> 6(9), 813–827.
 *     doi:10.1080/03610927708827533 (the constant 1.345, 95 % efficiency at the normal, from memory)</li>
 * <li>B. Iglewicz and D. C. Hoaglin (1993), <i>How to Detect and Handle Outliers</i>, ASQC Quality
 *     Press (no DOI); see {@link RemainderOutliers#scores}.</li>
 * <li>P. J. Rousseeuw and A. M. Leroy (1987), <i>Robust Regression and Outlier Detection</i>, Wiley,
 *     New York, ch. 1 (reweighted least squares). doi:10.1002/0471725382</li>
 * </ol>
 */
public final class CalendarEffects {

    public static final String EASTER = "easter";
    public static final String WEEKEND = "friday_saturday_nights";
    public static final String WEEKEND_DAYS = "weekend_days";

    /** Which days of the week the weekday regressor counts. */
    public enum Weekdays {
        /** Fridays and Saturdays: the nights of a weekend stay. */
        FRIDAY_SATURDAY_NIGHTS,
        /** Saturdays and Sundays: the days of the weekend. */
        WEEKEND_DAYS;

        /** The effect's name in a {@link Result}. */
        public String effectName() {
            return this == FRIDAY_SATURDAY_NIGHTS ? WEEKEND : CalendarEffects.WEEKEND_DAYS;
        }

        int count(Period period) {
            return this == FRIDAY_SATURDAY_NIGHTS ? CalendarRegressors.weekendNights(period)
                    : CalendarRegressors.weekendDays(period);
        }
    }


    /**
     * @param coefficient change of the irregular per unit of the regressor: per whole Easter
     *                    window, per extra Friday or Saturday
     */
    public record Effect(String name, double coefficient, double standardError, double pValue) {
    }

    /**
     * @param lags       Newey–West lags used
     * @param screened   positions set aside before the final fit (none for {@link #estimate})
     * @param regressors the centred regressors of every position, one column per effect in the
     *                   order of {@code effects}
     */
    public record Result(List<Effect> effects, int n, int lags, int easterWindow, List<Integer> screened,
                         double[][] regressors) {

        public Result {
            effects = List.copyOf(effects);
            screened = List.copyOf(screened);
            regressors = copy(regressors);
        }

        @Override
        public double[][] regressors() {
            return copy(regressors);
        }

        public Optional<Effect> effect(String name) {
            return effects.stream().filter(e -> e.name().equals(name)).findFirst();
        }

        /**
         * What the named effect puts into position {@code t}, on the working scale: its coefficient
         * times the centred regressor (0 for an effect not estimated).
         */
        public double part(String name, int t) {
            for (int j = 0; j < effects.size(); j++) {
                if (effects.get(j).name().equals(name)) {
                    return effects.get(j).coefficient() * regressors[t][j];
                }
            }
            return 0;
        }

        /** The named effect's centred regressor at position {@code t} (NaN for an effect not estimated). */
        public double regressor(String name, int t) {
            for (int j = 0; j < effects.size(); j++) {
                if (effects.get(j).name().equals(name)) {
                    return regressors[t][j];
                }
            }
            return Double.NaN;
        }

        private static double[][] copy(double[][] x) {
            double[][] c = new double[x.length][];
            for (int i = 0; i < x.length; i++) {
                c[i] = x[i].clone();
            }
            return c;
        }
    }

    private CalendarEffects() {
    }

    public static boolean applies(Frequency frequency) {
        return frequency == Frequency.MONTHLY || frequency == Frequency.QUARTERLY;
    }

    /**
     * @param irregular the irregular component on the working scale, NaN where missing
     * @param start     the period of {@code irregular[0]}
     * @return empty with fewer than 3k + 10 values for k regressors and the intercept
     * @throws IllegalArgumentException for a frequency other than monthly or quarterly
     */
    public static Optional<Result> estimate(double[] irregular, Period start, int easterWindow) {
        return estimate(irregular, start, easterWindow, List.of());
    }

    /** As {@link #estimate(double[], Period, int)}, with the user's own moving holidays as further regressors. */
    public static Optional<Result> estimate(double[] irregular, Period start, int easterWindow,
                                            List<Holiday> holidays) {
        return estimate(irregular, start, easterWindow, holidays, Weekdays.FRIDAY_SATURDAY_NIGHTS);
    }

    /** As {@link #estimate(double[], Period, int, List)}, counting the given days of the week. */
    public static Optional<Result> estimate(double[] irregular, Period start, int easterWindow,
                                            List<Holiday> holidays, Weekdays weekdays) {
        NeweyWestLeastSquares.Design d = NeweyWestLeastSquares.design(irregular,
                CentredRegressors.of(start, irregular.length, easterWindow, true, holidays, weekdays), easterWindow);
        return d == null ? Optional.empty() : NeweyWestLeastSquares.fit(d, List.of());
    }

    /**
     * The estimates with one-offs kept out (see the class comment): a Huber start ([4], [5]), the
     * values whose residual from it has a modified z-score ([6]) of at least {@code screenScore}
     * set aside, and least squares with Newey–West errors on the rest ([7]).
     *
     * @param screenScore the cut of the modified z-score (the caller's rule)
     * @return empty as {@link #estimate} is, or when too few values are left after the screen
     */
    public static Optional<Result> robust(double[] irregular, Period start, int easterWindow, List<Holiday> holidays,
                                          Weekdays weekdays, double screenScore) {
        return robust(irregular, start, easterWindow, true, holidays, weekdays, screenScore);
    }

    /**
     * As {@link #robust(double[], Period, int, List, Weekdays, double)}; with {@code easter} false the
     * Easter effect is not estimated (the caller decided the data cannot tell it).
     */
    public static Optional<Result> robust(double[] irregular, Period start, int easterWindow, boolean easter,
                                          List<Holiday> holidays, Weekdays weekdays, double screenScore) {
        // the regressors depend on the calendar alone: made once for both designs below
        CentredRegressors calendar = CentredRegressors.of(start, irregular.length, easterWindow, easter, holidays,
                weekdays);
        NeweyWestLeastSquares.Design d = NeweyWestLeastSquares.design(irregular, calendar, easterWindow);
        if (d == null) {
            return Optional.empty();
        }
        Optional<double[]> huber = HuberRegression.fit(d.x(), d.y());
        if (huber.isEmpty()) {
            return Optional.empty();
        }
        double[] beta = huber.get();
        double[] residual = new double[irregular.length];
        java.util.Arrays.fill(residual, Double.NaN);
        for (int r = 0; r < d.y().length; r++) {
            residual[d.rows().get(r)] = d.y()[r] - HuberRegression.dot(d.x()[r], beta);
        }
        double[] z = RemainderOutliers.scores(residual);
        List<Integer> screened = new ArrayList<>();
        for (int t = 0; t < z.length; t++) {
            // [7] hard rejection of the values the robust start leaves far out
            if (!Double.isNaN(z[t]) && Math.abs(z[t]) >= screenScore) {
                screened.add(t);
            }
        }
        if (screened.isEmpty()) {
            return NeweyWestLeastSquares.fit(d, List.of());
        }
        double[] kept = irregular.clone();
        for (int t : screened) {
            kept[t] = Double.NaN;
        }
        NeweyWestLeastSquares.Design rest = NeweyWestLeastSquares.design(kept, calendar, easterWindow);
        return rest == null ? Optional.empty() : NeweyWestLeastSquares.fit(rest, screened);
    }
}
