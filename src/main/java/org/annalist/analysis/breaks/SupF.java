package org.annalist.analysis.breaks;

import java.util.Objects;
import java.util.Optional;
import org.annalist.analysis.SeededNormals;
import org.annalist.analysis.TestResult;

/**
 * The sup-F test of "no break" against "one break at an unknown date" [1]: the largest Chow
 * statistic {@code F(τ) = [(RSS₀ − RSS₁(τ)) / k] / [RSS₁(τ) / (n − 2k)]} over the dates that leave both
 * regimes at least h long.
 *
 * <p>p-value by a parametric Monte Carlo test: the same statistic, with the same n, missing
 * positions, model and h, on {@value #REPLICATIONS} series of Gaussian AR(1) noise (seeded, so the
 * p-value is reproducible); p = (1 + #{F* ≥ F}) / (1 + replications), so the smallest reportable p
 * is 0.002. As a bootstrap should, the null's nuisance parameter is estimated under the null: the
 * AR(1) coefficient is the lag-1 autocorrelation of the residuals of the no-break fit (clipped to
 * [0, 0.95]). A smooth curve that a straight line or a constant cannot follow then meets a null of
 * equally persistent wander, against which a sup-F of its size is common; a real break is a jump
 * far beyond what such wander produces and keeps its significance. With independent noise
 * (coefficient 0) this is the exact finite-sample version of the asymptotic tables [1, 2], which
 * ignore serial correlation; the AR(1) null is our choice, after the warning of [3] that serial
 * correlation inflates the number of breaks.
 *
 * <p>Edge behaviour: missing values ({@code NaN}) are left out of every fit, and the null's noise is
 * missing at the same positions. When no date leaves both regimes h long (fewer than 2h values),
 * there is nothing to test: {@link #test} gives an empty {@code Optional} and {@link #decide}
 * {@link Verdict#NOT_TESTABLE}.
 *
 * <p>References:
 * <ol>
 * <li>D. W. K. Andrews (1993), "Tests for Parameter Instability and Structural Change with Unknown
 *     Change Point", <i>Econometrica</i> 61(4), 821–856. doi:10.2307/2951764 (DOI from memory)</li>
 * <li>B. E. Hansen (1997), "Approximate Asymptotic P Values for Structural-Change Tests",
 *     <i>Journal of Business &amp; Economic Statistics</i> 15(1), 60–67.
 *     doi:10.1080/07350015.1997.10524687 (DOI from memory)</li>
 * <li>J. Bai and P. Perron (2003), "Computation and Analysis of Multiple Structural Change Models",
 *     <i>Journal of Applied Econometrics</i> 18(1), 1–22. doi:10.1002/jae.659</li>
 * <li>A. C. Davison and D. V. Hinkley (1997), <i>Bootstrap Methods and their Application</i>,
 *     Cambridge University Press. doi:10.1017/CBO9780511802843 (DOI from memory)</li>
 * </ol>
 */
public final class SupF {

    public static final int REPLICATIONS = 499;
    private static final long SEED = 19930701L;

    /**
     * @param breakStart the first index of the new regime at the sup
     * @param ar1        the autocorrelation of the null's noise
     */
    public record Result(TestResult test, int breakStart, double ar1) {
    }

    /** What the decision version of the test concluded at the given level. */
    public enum Verdict {
        /** p &lt; alpha: a break. */
        REJECTS,
        /** p ≥ alpha. */
        DOES_NOT_REJECT,
        /** No date leaves both regimes h long: there is nothing to test. */
        NOT_TESTABLE
    }

    private SupF() {
    }

    /**
     * The test with {@value #REPLICATIONS} replications.
     *
     * @return empty when no date leaves both regimes {@code h} long
     * @throws IllegalArgumentException when {@code h} is below 1
     */
    public static Optional<Result> test(double[] y, BaiPerron.Model model, int h) {
        checkArguments(y, model, h);
        return test(y, model, h, REPLICATIONS, 1);
    }

    /**
     * Whether the sup-F test rejects at {@code alpha}, with {@value #DECISION_REPLICATIONS}
     * replications that stop as soon as the answer is no: cheap enough to run for every candidate
     * break (the p-values reported come from {@link #test(double[], BaiPerron.Model, int)}).
     *
     * @throws IllegalArgumentException when {@code h} is below 1 or {@code alpha} is not in (0, 1)
     */
    public static Verdict decide(double[] y, BaiPerron.Model model, int h, double alpha) {
        checkArguments(y, model, h);
        if (!(alpha > 0 && alpha < 1)) {
            throw new IllegalArgumentException("the significance level must lie in (0, 1), was " + alpha);
        }
        return test(y, model, h, DECISION_REPLICATIONS, alpha)
                .map(r -> r.test().reject(alpha) ? Verdict.REJECTS : Verdict.DOES_NOT_REJECT)
                .orElse(Verdict.NOT_TESTABLE);
    }

    /** Enough for a 5 % decision (Davison &amp; Hinkley [4], §4.2.5, ask for 99 or more). */
    public static final int DECISION_REPLICATIONS = 199;

    private static void checkArguments(double[] y, BaiPerron.Model model, int h) {
        Objects.requireNonNull(y, "y");
        Objects.requireNonNull(model, "model");
        if (h < 1) {
            throw new IllegalArgumentException("a regime needs at least 1 observation, was " + h);
        }
    }

    /**
     * @param stopBeyond stop as soon as p can no longer fall below this level, and report p = 1
     *                   (1: never stop)
     */
    private static Optional<Result> test(double[] y, BaiPerron.Model model, int h, int replications,
                                         double stopBeyond) {
        double[] observed = statistic(new SegmentCost(y, model), y.length, h);
        int start = (int) observed[1];
        if (start < 0) {
            return Optional.empty();
        }
        double phi = Math.max(0, Math.min(0.95, residualLag1(y, model)));
        SeededNormals random = new SeededNormals(SEED);
        double[] noise = new double[y.length];
        SegmentCost cost = new SegmentCost(noise, model);
        double innovationSd = Math.sqrt(1 - phi * phi);
        int exceed = 0;
        int limit = (int) Math.ceil(stopBeyond * (replications + 1)) - 1;   // more exceedances: p > stopBeyond
        int run = 0;
        for (int r = 0; r < replications; r++) {
            double e = random.next();
            for (int i = 0; i < y.length; i++) {
                e = i == 0 ? e : phi * e + innovationSd * random.next();   // AR(1) noise, unit variance
                noise[i] = Double.isNaN(y[i]) ? Double.NaN : e;
            }
            cost.load(noise);
            if (statistic(cost, y.length, h)[0] >= observed[0]) {
                exceed++;
            }
            run++;
            if (exceed > limit) {
                break;
            }
        }
        double p = run < replications ? 1 : (1.0 + exceed) / (1.0 + replications);
        int n = 0;
        for (double v : y) {
            n += Double.isNaN(v) ? 0 : 1;
        }
        return Optional.of(new Result(new TestResult(TestResult.Method.SUP_F_MONTE_CARLO, observed[0], p, n), start,
                phi));
    }

    /** Lag-1 autocorrelation of the residuals of the no-break fit. */
    static double residualLag1(double[] y, BaiPerron.Model model) {
        int n = y.length;
        double[] fit = BaiPerron.regimeFit(y, model, 0, n - 1, 0);
        double num = 0;
        double den = 0;
        for (int i = 0; i < n; i++) {
            if (Double.isNaN(y[i])) {
                continue;
            }
            double r = y[i] - (fit[0] + fit[1] * i);
            den += r * r;
            if (i + 1 < n && !Double.isNaN(y[i + 1])) {
                num += r * (y[i + 1] - (fit[0] + fit[1] * (i + 1)));
            }
        }
        return den == 0 ? 0 : num / den;
    }

    /** The Chow statistic of a break with the new regime from {@code start}. */
    public static double chow(double[] y, BaiPerron.Model model, int start) {
        SegmentCost cost = new SegmentCost(y, model);
        int n = y.length;
        int k = cost.parameters();
        double rss0 = cost.rss(0, n - 1);
        double rss1 = cost.rss(0, start - 1) + cost.rss(start, n - 1);
        return ((rss0 - rss1) / k) / (rss1 / (cost.observed(0, n - 1) - 2 * k));
    }

    /**
     * {sup F, first index of the new regime at the sup}; the index is −1 when no date leaves both
     * regimes h long (or no date gives a number).
     */
    static double[] statistic(SegmentCost cost, int n, int h) {
        int k = cost.parameters();
        double observed = cost.observed(0, n - 1);
        double rss0 = cost.rss(0, n - 1);
        double sup = Double.NEGATIVE_INFINITY;
        int at = -1;
        for (int start = h; start <= n - h; start++) {
            double rss1 = cost.rss(0, start - 1) + cost.rss(start, n - 1);
            // [1] the Chow statistic F(τ), maximised over the admissible dates
            double f = rss1 <= 0 ? Double.POSITIVE_INFINITY : ((rss0 - rss1) / k) / (rss1 / (observed - 2 * k));
            if (f > sup) {
                sup = f;
                at = start;
            }
        }
        return new double[] {sup, at};
    }
}
