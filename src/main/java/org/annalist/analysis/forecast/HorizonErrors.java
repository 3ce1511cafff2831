package org.annalist.analysis.forecast;

import java.util.Arrays;

/**
 * A method's back-test errors by horizon: at each step ahead k = 1 … cycle, the 80 % quantile of
 * the absolute errors |y − f| and of the relative errors |y − f| / f — what an honest 80 % interval
 * half-width at that horizon would have had to be to cover eight in ten of the forecasts made on
 * the series' own past (the empirical prediction intervals of Williams &amp; Goodman [1]). The
 * quantiles are predictive ({@link Intervals#predictive}, rank (n + 1)·p): from a dozen errors the
 * plain sample quantile is exceeded by the next error more often than two times in ten.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Williams, W. H. &amp; Goodman, M. L. (1971). A simple method for the construction of empirical
 * confidence limits for economic forecasts. <i>Journal of the American Statistical Association</i>
 * 66(336), 752–754 (from memory). See also Hyndman, R. J. &amp; Athanasopoulos, G. (2021),
 * <i>Forecasting: Principles and Practice</i>, 3rd ed., §5.5 (from memory).</li>
 * </ol>
 *
 * @param absolute80 per horizon (index 0 = one step ahead), the 80 % quantile of |y − f|
 * @param relative80 per horizon, the 80 % quantile of |y − f| / f; NaN at a horizon where a
 *                   forecast was not positive (a relative error has no meaning there)
 * @param counts     back-test forecasts per horizon
 * @param cycleSums  the errors of whole cycles ahead (a year's total for monthly data) from the
 *                   origins that had a whole cycle after them
 * @param pairs      every back-test forecast with its absolute error and horizon, for the pooled
 *                   check of each interval's coverage ({@link Widening})
 */
public record HorizonErrors(double[] absolute80, double[] relative80, int[] counts, CycleSums cycleSums,
                            Pairs pairs) {

    /**
     * The back-test's forecasts one by one.
     *
     * @param absolute |y − f| of each
     * @param forecast f of each
     * @param horizon  its 0-based step ahead
     */
    public record Pairs(double[] absolute, double[] forecast, int[] horizon) {

        static final Pairs NONE = new Pairs(new double[0], new double[0], new int[0]);

        public Pairs {
            absolute = absolute.clone();
            forecast = forecast.clone();
            horizon = horizon.clone();
        }

        @Override
        public double[] absolute() {
            return absolute.clone();
        }

        @Override
        public double[] forecast() {
            return forecast.clone();
        }

        @Override
        public int[] horizon() {
            return horizon.clone();
        }

        public int size() {
            return absolute.length;
        }
    }

    /** Errors without their pairs (the pooled coverage check is then skipped). */
    public HorizonErrors(double[] absolute80, double[] relative80, int[] counts, CycleSums cycleSums) {
        this(absolute80, relative80, counts, cycleSums, Pairs.NONE);
    }

    /**
     * The errors of the sum of the forecasts one to {@code cycle} steps ahead against the sum of the
     * outcomes: errors that persist from month to month do not cancel in a year's total, so a
     * year's interval is checked against these, not only the months'.
     *
     * @param absolute80     the 80 % quantile of |Σy − Σf|
     * @param relative80     the 80 % quantile of |Σy − Σf| / Σf (NaN when a sum was not positive)
     * @param relativeMedian the median of |Σy − Σf| / Σf (NaN likewise)
     * @param count          sums scored (0: none, the quantiles NaN)
     */
    public record CycleSums(double absolute80, double relative80, double relativeMedian, int count) {

        /** Sums the back-test must have scored before they say anything (our rule). */
        public static final int ENOUGH = 5;

        /** Whether enough sums were scored to check a year's interval against them. */
        public boolean enough() {
            return count >= ENOUGH;
        }
    }

    /** Coverage of the quantile: the central 80 % interval's half-width. */
    static final double COVERAGE = 0.80;

    public HorizonErrors {
        absolute80 = absolute80.clone();
        relative80 = relative80.clone();
        counts = counts.clone();
    }

    @Override
    public double[] absolute80() {
        return absolute80.clone();
    }

    @Override
    public double[] relative80() {
        return relative80.clone();
    }

    @Override
    public int[] counts() {
        return counts.clone();
    }

    /** Horizons scored. */
    public int horizons() {
        return counts.length;
    }

    /**
     * @param horizon 0-based steps ahead of each pair
     * @param cycle   the longest horizon scored
     */
    static HorizonErrors of(double[] actual, double[] forecast, int[] horizon, int cycle, int[] cycleStarts) {
        double[] absolute = new double[cycle];
        double[] relative = new double[cycle];
        int[] counts = new int[cycle];
        for (int k = 0; k < cycle; k++) {
            double[] abs = new double[actual.length];
            double[] rel = new double[actual.length];
            int n = 0;
            boolean positive = true;
            for (int i = 0; i < actual.length; i++) {
                if (horizon[i] != k) {
                    continue;
                }
                abs[n] = Math.abs(actual[i] - forecast[i]);
                positive &= forecast[i] > 0;
                rel[n] = positive ? abs[n] / forecast[i] : Double.NaN;
                n++;
            }
            counts[k] = n;
            absolute[k] = n == 0 ? Double.NaN : Intervals.predictive(Arrays.copyOf(abs, n), COVERAGE);
            relative[k] = n == 0 || !positive ? Double.NaN : Intervals.predictive(Arrays.copyOf(rel, n), COVERAGE);
        }
        double[] errors = new double[actual.length];
        for (int i = 0; i < actual.length; i++) {
            errors[i] = Math.abs(actual[i] - forecast[i]);
        }
        return new HorizonErrors(absolute, relative, counts, cycleSums(actual, forecast, cycle, cycleStarts),
                new Pairs(errors, forecast, horizon));
    }

    /** @param starts the first pair of each origin with a whole cycle ahead */
    private static CycleSums cycleSums(double[] actual, double[] forecast, int cycle, int[] starts) {
        if (starts.length == 0) {
            return new CycleSums(Double.NaN, Double.NaN, Double.NaN, 0);
        }
        double[] abs = new double[starts.length];
        double[] rel = new double[starts.length];
        boolean positive = true;
        for (int i = 0; i < starts.length; i++) {
            double y = 0;
            double f = 0;
            for (int k = 0; k < cycle; k++) {
                y += actual[starts[i] + k];
                f += forecast[starts[i] + k];
            }
            abs[i] = Math.abs(y - f);
            positive &= f > 0;
            rel[i] = abs[i] / f;
        }
        double[] q = positive ? new double[] {Intervals.quantiles(rel, 0.5)[0], Intervals.predictive(rel, COVERAGE)}
                : new double[] {Double.NaN, Double.NaN};
        return new CycleSums(Intervals.predictive(abs, COVERAGE), q[1], q[0], starts.length);
    }
}
