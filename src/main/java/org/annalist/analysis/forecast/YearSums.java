package org.annalist.analysis.forecast;

/**
 * A calendar year made of observed periods and forecast ones, and the change from one such year to
 * the next, with central 80 % intervals from the forecast's sample paths: each path gives one
 * possible outcome of the year (the observed part fixed, the forecast part from the path), and the
 * interval is the 10 % and 90 % quantiles of those outcomes. The interval of a sum is not the sum of
 * the intervals (the errors of the months partly cancel, and for multiplicative models they are not
 * normal); simulating the sum from the paths keeps the months' correlation [1, §6.1].
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J., Koehler, A. B., Ord, J. K. &amp; Snyder, R. D. (2008). <i>Forecasting with
 * Exponential Smoothing: The State Space Approach</i>. Springer. DOI 10.1007/978-3-540-71918-2.</li>
 * </ol>
 */
public final class YearSums {

    /** A value with its central 80 % interval. */
    public record Estimate(double mean, double lo80, double hi80) {
    }

    /**
     * One year's value: the observed part plus the forecasts at steps {@code from} … {@code to} − 1,
     * divided by {@code divisor} (1 for a total, the year's number of periods for a mean).
     */
    public record Year(double observedSum, int from, int to, int divisor) {
    }

    /**
     * The change from {@code base} to {@code next}: relative (next / base − 1, as a fraction; NaN
     * when a base outcome is not positive) and as a difference, each with its 80 % interval.
     */
    public record Change(Estimate relative, Estimate difference) {
    }

    private YearSums() {
    }

    /** The year's value: its point is the observed part plus the point forecasts. */
    public static Estimate of(Outlook.Forecast f, Year year) {
        double[][] paths = f.paths();
        double[] outcomes = new double[paths.length];
        for (int p = 0; p < paths.length; p++) {
            outcomes[p] = outcome(paths[p], year);
        }
        double[] q = Intervals.quantiles(outcomes, 0.10, 0.90);
        return new Estimate(outcome(f.mean(), year), q[0], q[1]);
    }

    /** The span's value with its 95 % and 80 % limits: {mean, lo95, lo80, hi80, hi95}. */
    public static double[] withLimits(Outlook.Forecast f, Year span) {
        double[][] paths = f.paths();
        double[] outcomes = new double[paths.length];
        for (int p = 0; p < paths.length; p++) {
            outcomes[p] = outcome(paths[p], span);
        }
        double[] q = Intervals.quantiles(outcomes, 0.025, 0.10, 0.90, 0.975);
        return new double[] {outcome(f.mean(), span), q[0], q[1], q[2], q[3]};
    }

    /** The change from {@code base} to {@code next}, path by path (both years from the same path). */
    public static Change change(Outlook.Forecast f, Year base, Year next) {
        double[][] paths = f.paths();
        double[] ratios = new double[paths.length];
        double[] differences = new double[paths.length];
        boolean positive = true;
        for (int p = 0; p < paths.length; p++) {
            double b = outcome(paths[p], base);
            double n = outcome(paths[p], next);
            positive &= b > 0;
            ratios[p] = n / b - 1;
            differences[p] = n - b;
        }
        double[] mean = f.mean();
        double b = outcome(mean, base);
        double n = outcome(mean, next);
        double[] d = Intervals.quantiles(differences, 0.10, 0.90);
        Estimate relative = new Estimate(Double.NaN, Double.NaN, Double.NaN);
        if (positive && b > 0) {
            double[] r = Intervals.quantiles(ratios, 0.10, 0.90);
            relative = new Estimate(n / b - 1, r[0], r[1]);
        }
        return new Change(relative, new Estimate(n - b, d[0], d[1]));
    }

    private static double outcome(double[] path, Year year) {
        double sum = year.observedSum();
        for (int k = year.from(); k < year.to(); k++) {
            sum += path[k];
        }
        return sum / year.divisor();
    }
}
