package org.annalist.analysis.breaks;

import java.util.Arrays;
import org.apache.commons.math3.distribution.FDistribution;

/**
 * Whether the gap between two regimes' fitted lines at a break is a step the data carry, or what a
 * continuous bend at the same date leaves over: the span {@code from..to} of the two regimes, the
 * new one starting at {@code start}, is fitted as two separate lines
 * {@code y = a + b t + c D + d (t − τ) D} and as one line that bends at the break instant τ (the
 * joinpoint, or continuous segmented, regression [1, 2]) {@code y = a + b t + d (t − τ) D}, with
 * {@code D = 1} from the break on; the nested F-test [3]
 * {@code F = (RSS_bend − RSS_lines) / (RSS_lines / (n − 4))} on 1 and n − 4 degrees of freedom asks
 * whether the step {@code c} is needed. The residuals of a seasonally adjusted series are serially
 * correlated, which makes a plain F-test reject too often; so the test is run on both designs after
 * the Prais–Winsten transform [5] with the lag-1 autocorrelation of the separate lines' residuals
 * (feasible generalised least squares). The bent line itself is the ordinary least-squares fit.
 *
 * <p>Why on two scales: a straight line is straight on one scale only. A recovery that climbs
 * steadily in the series' units is a concave curve in logs; a straight line fitted to it in logs
 * overshoots at its end, and the test then "finds" a step down where the path merely levels off
 * (the same holds the other way for growth at a steady rate fitted in units). A step, a jump at one
 * date, stays a jump on any increasing scale. So the test is run on the working scale and on the
 * other one (units for logs; logs for units, when every value is positive), and the step counts as
 * supported only when both reject the continuous bend: an intersection–union test [4], whose
 * level is the larger of its two tests' levels, so the brief's significance level holds for the
 * claim "a step" whichever of the two scales makes the segments straight.
 *
 * <p>Missing values ({@code NaN}) are left out. Fewer than two observed values on a side, or no
 * residual degrees of freedom, admit no test: the p-value is NaN and the step is not put in doubt
 * (the search's own rules then decide, as before this test existed).
 *
 * <p>References:
 * <ol>
 * <li>V. M. R. Muggeo (2003), "Estimating regression models with unknown break-points",
 *     <i>Statistics in Medicine</i> 22(19), 3055–3071. doi:10.1002/sim.1545 (DOI from memory): the
 *     segmented (continuous, bent) line.</li>
 * <li>H.-J. Kim, M. P. Fay, E. J. Feuer and D. N. Midthune (2000), "Permutation tests for
 *     joinpoint regression with applications to cancer rates", <i>Statistics in Medicine</i> 19(3),
 *     335–351 (from memory): joinpoint regression, continuous at each joinpoint.</li>
 * <li>G. C. Chow (1960), "Tests of Equality Between Sets of Coefficients in Two Linear
 *     Regressions", <i>Econometrica</i> 28(3), 591–605. doi:10.2307/1910133 (DOI from memory): the
 *     F-test of a linear restriction of nested least-squares fits.</li>
 * <li>R. L. Berger (1982), "Multiparameter Hypothesis Testing and Acceptance Sampling",
 *     <i>Technometrics</i> 24(4), 295–300. doi:10.1080/00401706.1982.10487790 (DOI from memory):
 *     the intersection–union test.</li>
 * <li>S. J. Prais and C. B. Winsten (1954), "Trend Estimators and Serial Correlation", Cowles
 *     Commission Discussion Paper No. 383 (from memory): regression with AR(1) errors by
 *     transforming the data, the first observation kept.</li>
 * </ol>
 *
 * @param pWorking     p-value of the step on the working scale (the values given); NaN when not testable
 * @param pOther       p-value of the step on the other scale; NaN when not testable or when that
 *                     scale does not exist (units with a value ≤ 0)
 * @param levelAtBreak the bent line at τ, on the working scale
 * @param slopeBefore  the bent line's slope before τ, working scale per period
 * @param slopeAfter   the bent line's slope after τ, working scale per period
 */
public record StepOrBend(double pWorking, double pOther, double levelAtBreak, double slopeBefore, double slopeAfter) {

    /**
     * The two tests and the bent line over {@code from..to}, the new regime starting at {@code start}.
     *
     * @param log whether the values are natural logs of the series (the other scale is then units)
     */
    public static StepOrBend of(double[] y, int from, int start, int to, boolean log) {
        double[] other = new double[to - from + 1];
        boolean otherExists = true;
        for (int i = from; i <= to; i++) {
            double v = y[i];
            if (log) {
                other[i - from] = Math.exp(v);
            } else {
                otherExists &= Double.isNaN(v) || v > 0;
                other[i - from] = Math.log(v);
            }
        }
        double[] working = Arrays.copyOfRange(y, from, to + 1);
        Fit fit = Fit.of(working, start - from);
        double pOther = otherExists ? Fit.of(other, start - from).pStep() : Double.NaN;
        return new StepOrBend(fit.pStep(), pOther, fit.bend[0], fit.bend[1], fit.bend[1] + fit.bend[2]);
    }

    /**
     * Whether the step is supported at {@code alpha}: both scales' tests reject the bend (a scale
     * that does not exist or admits no test puts nothing in doubt).
     */
    public boolean stepSupported(double alpha) {
        return !(pWorking >= alpha) && !(pOther >= alpha);
    }

    /** The bent line at {@code periods} after τ (negative before), on the working scale. */
    public double at(double periods) {
        return levelAtBreak + (periods < 0 ? slopeBefore : slopeAfter) * periods;
    }

    /** Both least-squares fits of one scale: the bent line's coefficients and the step's p-value. */
    private record Fit(double[] bend, double pStep) {

        private static final int[] BENT = {SpanDesign.INTERCEPT, SpanDesign.SLOPE, SpanDesign.SLOPE_CHANGE};
        private static final int[] LINES = {SpanDesign.INTERCEPT, SpanDesign.SLOPE, SpanDesign.STEP,
            SpanDesign.SLOPE_CHANGE};

        static Fit of(double[] v, int start) {
            SpanDesign design = SpanDesign.of(v, 0, start, v.length - 1);
            if (design.before() < 2 || design.after() < 2) {
                return new Fit(new double[] {Double.NaN, Double.NaN, Double.NaN}, Double.NaN);
            }
            double[] bent = new double[3];
            design.rss(BENT, bent);
            SpanDesign whitened = design.whitened(lagOneAutocorrelation(design));   // [5]
            double rssBend = whitened.rss(BENT, null);
            double rssLines = whitened.rss(LINES, null);
            int df = design.size() - 4;
            if (df < 1) {
                return new Fit(bent, Double.NaN);
            }
            if (rssLines <= 0) {
                return new Fit(bent, rssBend > 0 ? 0 : 1);   // exact lines: any gap left by the bend is certain
            }
            double f = Math.max(0, (rssBend - rssLines) / (rssLines / df));   // [3]
            return new Fit(bent, 1 - new FDistribution(null, 1, df).cumulativeProbability(f));
        }

        /**
         * The lag-1 autocorrelation of the two separate lines' residuals, clipped to [0, 0.95] as the
         * sup-F test's null clips it ({@link SupF}); consecutive observed values count as adjacent.
         */
        private static double lagOneAutocorrelation(SpanDesign design) {
            double[] beta = new double[4];
            design.rss(LINES, beta);
            double lagged = 0;
            double squares = 0;
            double previous = Double.NaN;
            for (int i = 0; i < design.size(); i++) {
                double[] row = design.rows().get(i);
                double fitted = 0;
                for (int j = 0; j < LINES.length; j++) {
                    fitted += beta[j] * row[LINES[j]];
                }
                double e = design.values().get(i) - fitted;
                squares += e * e;
                if (i > 0) {
                    lagged += e * previous;
                }
                previous = e;
            }
            return squares > 0 ? Math.max(0, Math.min(0.95, lagged / squares)) : 0;
        }
    }
}
