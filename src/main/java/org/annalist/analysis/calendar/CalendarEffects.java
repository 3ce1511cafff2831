package org.annalist.analysis.calendar;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.analysis.anomaly.RemainderOutliers;
import org.annalist.series.Frequency;
import org.annalist.series.Holiday;
import org.annalist.series.Period;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;

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

    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1);

    private CalendarEffects() {
    }

    public static boolean applies(Frequency frequency) {
        return frequency == Frequency.MONTHLY || frequency == Frequency.QUARTERLY;
    }

    /** The centred regressors of each period, columns in the order of {@code names}. */
    static double[][] regressors(Period start, int n, int easterWindow, List<String> names) {
        return regressors(start, n, easterWindow, List.of(), names);
    }

    static double[][] regressors(Period start, int n, int easterWindow, List<Holiday> holidays, List<String> names) {
        return regressors(start, n, easterWindow, holidays, Weekdays.FRIDAY_SATURDAY_NIGHTS, names);
    }

    static double[][] regressors(Period start, int n, int easterWindow, List<Holiday> holidays, Weekdays weekdays,
                                 List<String> names) {
        return regressors(start, n, easterWindow, true, holidays, weekdays, names);
    }

    /** As above; without the Easter regressor when {@code easter} is false (the caller's rule). */
    static double[][] regressors(Period start, int n, int easterWindow, boolean easter, List<Holiday> holidays,
                                 Weekdays weekdays, List<String> names) {
        int period = start.frequency().seasonalPeriod();
        int columns = 2 + holidays.size();
        double[][] raw = new double[n][columns];
        for (int t = 0; t < n; t++) {
            Period p = start.plus(t);
            raw[t][0] = CalendarRegressors.easterShare(p, easterWindow);
            raw[t][1] = weekdays.count(p);
            for (int h = 0; h < holidays.size(); h++) {
                raw[t][2 + h] = holidays.get(h).share(p);
            }
        }
        String[] all = new String[columns];
        all[0] = EASTER;
        all[1] = weekdays.effectName();
        for (int h = 0; h < holidays.size(); h++) {
            all[2 + h] = holidays.get(h).name();
        }
        List<Integer> keep = new ArrayList<>();
        double[][] centred = new double[n][columns];
        for (int c = 0; c < columns; c++) {
            double[] sum = new double[period];
            int[] count = new int[period];
            for (int t = 0; t < n; t++) {
                sum[t % period] += raw[t][c];
                count[t % period]++;
            }
            double ss = 0;
            // each regressor less its mean for the calendar month (or quarter) over the data's years
            for (int t = 0; t < n; t++) {
                centred[t][c] = raw[t][c] - sum[t % period] / count[t % period];
                ss += centred[t][c] * centred[t][c];
            }
            // a regressor that does not vary within the calendar months carries nothing (our rule)
            if (ss > 1e-12 && (c != 0 || easter)) {
                keep.add(c);
            }
        }
        double[][] x = new double[n][keep.size()];
        for (int j = 0; j < keep.size(); j++) {
            names.add(all[keep.get(j)]);
            for (int t = 0; t < n; t++) {
                x[t][j] = centred[t][keep.get(j)];
            }
        }
        return x;
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
        Design d = design(irregular, start, easterWindow, holidays, weekdays);
        return d == null ? Optional.empty() : leastSquares(d, List.of());
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
        Regressors calendar = Regressors.of(start, irregular.length, easterWindow, easter, holidays, weekdays);
        Design d = design(irregular, calendar, easterWindow);
        if (d == null) {
            return Optional.empty();
        }
        Optional<double[]> huber = HuberRegression.fit(d.x, d.y);
        if (huber.isEmpty()) {
            return Optional.empty();
        }
        double[] beta = huber.get();
        double[] residual = new double[irregular.length];
        java.util.Arrays.fill(residual, Double.NaN);
        for (int r = 0; r < d.y.length; r++) {
            residual[d.rows.get(r)] = d.y[r] - HuberRegression.dot(d.x[r], beta);
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
            return leastSquares(d, List.of());
        }
        double[] kept = irregular.clone();
        for (int t : screened) {
            kept[t] = Double.NaN;
        }
        Design rest = design(kept, calendar, easterWindow);
        return rest == null ? Optional.empty() : leastSquares(rest, screened);
    }

    /** The rows with a value, the design with an intercept column first, and every position's centred regressors. */
    private record Design(List<Integer> rows, double[][] x, double[] y, List<String> names, double[][] all,
                          int easterWindow) {
    }

    /** Every position's centred regressors with their names ({@link #regressors}). */
    private record Regressors(double[][] all, List<String> names) {

        static Regressors of(Period start, int n, int easterWindow, boolean easter, List<Holiday> holidays,
                             Weekdays weekdays) {
            if (!applies(start.frequency())) {
                throw new IllegalArgumentException("calendar effects are estimated for monthly or quarterly data, not "
                        + start.frequency());
            }
            List<String> names = new ArrayList<>();
            return new Regressors(regressors(start, n, easterWindow, easter, holidays, weekdays, names), names);
        }
    }

    private static Design design(double[] irregular, Period start, int easterWindow, List<Holiday> holidays,
                                 Weekdays weekdays) {
        return design(irregular, Regressors.of(start, irregular.length, easterWindow, true, holidays, weekdays),
                easterWindow);
    }

    private static Design design(double[] irregular, Regressors calendar, int easterWindow) {
        List<String> names = calendar.names();
        double[][] all = calendar.all();
        List<Integer> rows = new ArrayList<>();
        for (int t = 0; t < irregular.length; t++) {
            if (!Double.isNaN(irregular[t])) {
                rows.add(t);
            }
        }
        int n = rows.size();
        int k = names.size() + 1;
        if (n < 3 * k + 10) {
            return null;   // too few values for the regressors (our rule)
        }
        double[][] x = new double[n][k];
        double[] y = new double[n];
        for (int r = 0; r < n; r++) {
            int t = rows.get(r);
            x[r][0] = 1;
            System.arraycopy(all[t], 0, x[r], 1, k - 1);
            y[r] = irregular[t];
        }
        return new Design(rows, x, y, names, all, easterWindow);
    }

    private static Optional<Result> leastSquares(Design d, List<Integer> screened) {
        int n = d.y.length;
        int k = d.names.size() + 1;
        double[][] x = d.x;
        double[] y = d.y;
        List<String> names = d.names;
        RealMatrix design = new Array2DRowRealMatrix(x, false);
        // ordinary least squares: β = (X′X)⁻¹ X′y
        DecompositionSolver solver = new LUDecomposition(design.transpose().multiply(design)).getSolver();
        if (!solver.isNonSingular()) {
            return Optional.empty();   // regressors that move together (two holidays on the same days) cannot be told apart
        }
        RealMatrix xtxInverse = solver.getInverse();
        double[] beta = xtxInverse.operate(design.transpose().operate(y));
        double[] e = new double[n];
        for (int r = 0; r < n; r++) {
            double fit = 0;
            for (int j = 0; j < k; j++) {
                fit += x[r][j] * beta[j];
            }
            e[r] = y[r] - fit;
        }
        // [2] the lag ⌊4 (n/100)^{2/9}⌋ (see the note on the lag above)
        int lags = (int) Math.floor(4 * Math.pow(n / 100.0, 2.0 / 9.0));
        double[][] s = new double[k][k];
        for (int lag = 0; lag <= lags; lag++) {
            // [1] Bartlett weight w_j = 1 − j/(L + 1) in
            // S = Σ_t e_t² x_t x′_t + Σ_{j≥1} w_j Σ_t e_t e_{t−j} (x_t x′_{t−j} + x_{t−j} x′_t)
            double w = lag == 0 ? 1 : 1 - lag / (lags + 1.0);
            for (int r = lag; r < n; r++) {
                double ee = e[r] * e[r - lag];
                for (int a = 0; a < k; a++) {
                    for (int b = 0; b < k; b++) {
                        double term = x[r][a] * x[r - lag][b];
                        s[a][b] += w * ee * (lag == 0 ? term : term + x[r - lag][a] * x[r][b]);
                    }
                }
            }
        }
        // [1] the sandwich (X′X)⁻¹ S (X′X)⁻¹, times n/(n − k) (the degrees-of-freedom adjustment)
        RealMatrix covariance = xtxInverse.multiply(new Array2DRowRealMatrix(s, false)).multiply(xtxInverse)
                .scalarMultiply(n / (double) (n - k));
        List<Effect> effects = new ArrayList<>();
        for (int j = 1; j < k; j++) {
            double se = Math.sqrt(Math.max(0, covariance.getEntry(j, j)));
            // two-sided p from the normal approximation of β/se; p = 1 when se is 0 (our rule)
            double p = se == 0 ? 1 : 2 * STANDARD_NORMAL.cumulativeProbability(-Math.abs(beta[j] / se));
            effects.add(new Effect(names.get(j - 1), beta[j], se, p));
        }
        return Optional.of(new Result(effects, n, lags, d.easterWindow, screened, d.all));
    }
}
