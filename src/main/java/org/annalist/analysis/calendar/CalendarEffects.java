package org.annalist.analysis.calendar;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
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
 * <p>Note on the lag: in [2], 4 (n/100)^{2/9} is the preliminary lag of the automatic procedure,
 * from which the bandwidth is then estimated (from memory); here, as is common practice, it is the
 * lag itself. Weekday regressors for Friday and Saturday only are our rule (nights in tourism); a
 * regressor that does not vary within the calendar months is dropped (our rule).
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
 * </ol>
 */
public final class CalendarEffects {

    public static final String EASTER = "easter";
    public static final String WEEKEND = "friday_saturday_nights";

    /**
     * @param coefficient change of the irregular per unit of the regressor: per whole Easter
     *                    window, per extra Friday or Saturday
     */
    public record Effect(String name, double coefficient, double standardError, double pValue) {
    }

    /** @param lags Newey–West lags used */
    public record Result(List<Effect> effects, int n, int lags, int easterWindow) {

        public Result {
            effects = List.copyOf(effects);
        }

        public Optional<Effect> effect(String name) {
            return effects.stream().filter(e -> e.name().equals(name)).findFirst();
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
        int period = start.frequency().seasonalPeriod();
        int columns = 2 + holidays.size();
        double[][] raw = new double[n][columns];
        for (int t = 0; t < n; t++) {
            Period p = start.plus(t);
            raw[t][0] = CalendarRegressors.easterShare(p, easterWindow);
            raw[t][1] = CalendarRegressors.weekendNights(p);
            for (int h = 0; h < holidays.size(); h++) {
                raw[t][2 + h] = holidays.get(h).share(p);
            }
        }
        String[] all = new String[columns];
        all[0] = EASTER;
        all[1] = WEEKEND;
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
            if (ss > 1e-12) {
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
        if (!applies(start.frequency())) {
            throw new IllegalArgumentException("calendar effects are estimated for monthly or quarterly data, not "
                    + start.frequency());
        }
        List<String> names = new ArrayList<>();
        double[][] all = regressors(start, irregular.length, easterWindow, holidays, names);
        List<Integer> rows = new ArrayList<>();
        for (int t = 0; t < irregular.length; t++) {
            if (!Double.isNaN(irregular[t])) {
                rows.add(t);
            }
        }
        int n = rows.size();
        int k = names.size() + 1;
        if (n < 3 * k + 10) {
            return Optional.empty();   // too few values for the regressors (our rule)
        }
        double[][] x = new double[n][k];
        double[] y = new double[n];
        for (int r = 0; r < n; r++) {
            int t = rows.get(r);
            x[r][0] = 1;
            System.arraycopy(all[t], 0, x[r], 1, k - 1);
            y[r] = irregular[t];
        }
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
        return Optional.of(new Result(effects, n, lags, easterWindow));
    }
}
