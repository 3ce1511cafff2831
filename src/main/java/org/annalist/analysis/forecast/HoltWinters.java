package org.annalist.analysis.forecast;

import java.util.Arrays;
import org.annalist.analysis.decompose.ClassicalDecomposition;
import org.apache.commons.math3.analysis.MultivariateFunction;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.SimpleBounds;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.BOBYQAOptimizer;

/**
 * Holt–Winters exponential smoothing with additive or multiplicative seasonality [1], as R's
 * {@code stats::HoltWinters} computes it: start values from a classical decomposition of the first
 * two seasons (the level and trend from a straight line through its moving average, the seasonal
 * figure as the start of each season), the recursions of R's {@code C_HoltWinters} from the second
 * season on, the sum of squared one-step errors as the criterion, and α, β, γ chosen to minimise it
 * within [0, 1] by BOBYQA [2].
 *
 * <p>Missing values are not handled: the caller fills or refuses them.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Winters, P. R. (1960). Forecasting sales by exponentially weighted moving averages.
 * <i>Management Science</i> 6(3), 324–342. DOI 10.1287/mnsc.6.3.324.</li>
 * <li>Powell, M. J. D. (2009). The BOBYQA algorithm for bound constrained optimization without
 * derivatives. Report DAMTP 2009/NA06, University of Cambridge (a technical report; no DOI).</li>
 * </ol>
 */
public final class HoltWinters {

    public enum Seasonality { ADDITIVE, MULTIPLICATIVE }

    /**
     * @param level    the level at the end (R's coefficient a)
     * @param trend    the trend at the end (b)
     * @param seasonal the last period's seasonal effects (s1 … s_m)
     * @param fitted   one-step forecasts from the second season on (NaN before)
     */
    public record Fit(double alpha, double beta, double gamma, double sse, double level, double trend, double[] seasonal,
                      double[] fitted, Seasonality seasonality) {

        public Fit {
            seasonal = seasonal.clone();
            fitted = fitted.clone();
        }

        @Override
        public double[] seasonal() {
            return seasonal.clone();
        }

        @Override
        public double[] fitted() {
            return fitted.clone();
        }

        /** Point forecasts 1 … h periods ahead: (a + h b) + s_h, or (a + h b) · s_h. */
        public double[] forecast(int h) {
            int m = seasonal.length;
            double[] f = new double[h];
            for (int k = 1; k <= h; k++) {
                double base = level + k * trend;
                double s = seasonal[(k - 1) % m];
                f[k - 1] = seasonality == Seasonality.ADDITIVE ? base + s : base * s; // [1]
            }
            return f;
        }
    }

    private final int period;
    private final Seasonality seasonality;

    private HoltWinters(int period, Seasonality seasonality) {
        this.period = period;
        this.seasonality = seasonality;
    }

    public static HoltWinters of(int period, Seasonality seasonality) {
        if (period < 2) {
            throw new IllegalArgumentException("Holt-Winters needs a seasonal period of at least 2, was " + period);
        }
        return new HoltWinters(period, seasonality);
    }

    /**
     * The filter with given smoothing parameters (R's {@code C_HoltWinters}).
     *
     * @throws IllegalArgumentException with no more than two seasons of values, or with a missing value
     */
    public Fit filter(double[] x, double alpha, double beta, double gamma) {
        check(x);
        double[] fitted = new double[x.length];
        double[] last = new double[period + 2];
        double sse = recursions(x, startValues(x), alpha, beta, gamma, fitted, last);
        return new Fit(alpha, beta, gamma, sse, last[0], last[1], Arrays.copyOfRange(last, 2, period + 2), fitted,
                seasonality);
    }

    /**
     * α, β, γ minimising the SSE within [0, 1] ([2]; started as R's optim at 0.3, 0.1, 0.1).
     *
     * @throws IllegalArgumentException with no more than two seasons of values, or with a missing value
     */
    public Fit fit(double[] x) {
        check(x);
        double[] start = startValues(x);
        double[] fitted = new double[x.length];
        double[] last = new double[period + 2];
        MultivariateFunction sse = p -> recursions(x, start, p[0], p[1], p[2], fitted, last);
        BOBYQAOptimizer optimizer = new BOBYQAOptimizer(7, 0.1, 1e-10);
        double best = Double.POSITIVE_INFINITY;
        double[] bestPoint = {0.3, 0.1, 0.1};
        // a few starts, since the SSE surface can have more than one valley
        for (double[] guess : new double[][] {{0.3, 0.1, 0.1}, {0.7, 0.05, 0.5}, {0.1, 0.01, 0.9}}) {
            PointValuePair result = optimizer.optimize(new MaxEval(20_000), new ObjectiveFunction(sse), GoalType.MINIMIZE,
                    new InitialGuess(guess), new SimpleBounds(new double[] {0, 0, 0}, new double[] {1, 1, 1}));
            if (result.getValue() < best) {
                best = result.getValue();
                bestPoint = result.getPoint();
            }
        }
        return filter(x, bestPoint[0], bestPoint[1], bestPoint[2]);
    }

    private void check(double[] x) {
        int m = period;
        int n = x.length;
        if (n < 2 * m + 1) {
            throw new IllegalArgumentException("Holt-Winters needs more than two seasons: at least " + (2 * m + 1)
                    + " values, got " + n);
        }
        for (double v : x) {
            if (Double.isNaN(v)) {
                throw new IllegalArgumentException("Holt-Winters needs a series without missing values");
            }
        }
    }

    /**
     * The recursions of R's {@code C_HoltWinters} [1] from {@code start} = {level, trend, s_1 … s_m}:
     * writes the one-step forecasts into {@code fitted} (NaN before the second season) and the
     * final {level, trend, s_1 … s_m} into {@code last}, and returns the sum of squared errors.
     */
    private double recursions(double[] x, double[] start, double alpha, double beta, double gamma, double[] fitted,
                              double[] last) {
        int m = period;
        int n = x.length;
        int startTime = m + 1;                           // R: start.time = f + 1 (1-based)
        int len = n - startTime + 1;
        double[] level = new double[len + 1];
        double[] trend = new double[len + 1];
        double[] season = new double[len + m];
        level[0] = start[0];
        trend[0] = start[1];
        System.arraycopy(start, 2, season, 0, m);
        Arrays.fill(fitted, Double.NaN);
        double sse = 0;
        boolean additive = seasonality == Seasonality.ADDITIVE;
        for (int i = startTime - 1; i < n; i++) {
            int i0 = i - startTime + 2;
            int s0 = i0 + m - 1;
            double stmp = season[s0 - m];
            double xhat = level[i0 - 1] + trend[i0 - 1];
            xhat = additive ? xhat + stmp : xhat * stmp;
            fitted[i] = xhat;
            double res = x[i] - xhat;
            sse += res * res;
            level[i0] = alpha * (additive ? x[i] - stmp : x[i] / stmp) + (1 - alpha) * (level[i0 - 1] + trend[i0 - 1]);
            trend[i0] = beta * (level[i0] - level[i0 - 1]) + (1 - beta) * trend[i0 - 1];
            season[s0] = gamma * (additive ? x[i] - level[i0] : x[i] / level[i0]) + (1 - gamma) * stmp;
        }
        last[0] = level[len];
        last[1] = trend[len];
        System.arraycopy(season, len, last, 2, m);
        return sse;
    }

    /**
     * R's start values: decompose the first two seasons; level and trend are the intercept and
     * slope of a straight line fitted to the defined moving-average values against 1, 2, …; the
     * seasonal start is the decomposition's figure. Returned as {level, trend, s_1 … s_m}.
     */
    double[] startValues(double[] x) {
        int m = period;
        ClassicalDecomposition.Result d = ClassicalDecomposition.of(Arrays.copyOf(x, 2 * m), m,
                seasonality == Seasonality.ADDITIVE ? ClassicalDecomposition.Type.ADDITIVE
                        : ClassicalDecomposition.Type.MULTIPLICATIVE);
        double[] trend = Arrays.stream(d.trend()).filter(v -> !Double.isNaN(v)).toArray();
        StartLine line = StartLine.through(trend, trend.length);
        double[] start = new double[m + 2];
        start[0] = line.intercept();
        start[1] = line.slope();
        System.arraycopy(d.figure(), 0, start, 2, m);
        return start;
    }
}
