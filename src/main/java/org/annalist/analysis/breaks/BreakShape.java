package org.annalist.analysis.breaks;

/**
 * What a break in a segmented line changed, as evidence for the words: the span of its two regimes
 * is fitted three ways, each a linear regression with the break instant τ between the old regime's
 * last period and the new regime's first,
 * <ul>
 * <li>a step in level: one common slope, the level jumps at τ — {@code y = a + b t + c D};</li>
 * <li>a change in slope: one continuous line that bends at τ — {@code y = a + b t + d (t − τ) D};</li>
 * <li>both: two separate lines — {@code y = a + b t + c D + d (t − τ) D};</li>
 * </ul>
 * with {@code D = 1} from the break on, and each fit is scored by Schwarz's BIC [1]
 * {@code n ln(RSS/n) + k ln n}. The two restricted fits have the same number of parameters, so
 * between them BIC picks the smaller residual sum of squares; the unrestricted fit pays for its
 * extra parameter. Which description is chosen, and by what margin, is a decision of the findings.
 * Missing values ({@code NaN}) are left out.
 *
 * <p>References:
 * <ol>
 * <li>G. Schwarz (1978), "Estimating the Dimension of a Model", <i>Annals of Statistics</i> 6(2),
 *     461–464. doi:10.1214/aos/1176344136 (DOI from memory)</li>
 * </ol>
 *
 * @param bicStep  BIC of the step-in-level description (3 parameters)
 * @param bicSlope BIC of the change-in-slope description (3 parameters)
 * @param bicBoth  BIC of the two separate lines (4 parameters)
 */
public record BreakShape(double bicStep, double bicSlope, double bicBoth) {

    /**
     * The three fits over {@code from..to} with the new regime starting at {@code start}; all NaN
     * when a side has fewer than two observed values (no line can be fitted there). With two
     * distinct times on each side the designs have full rank.
     */
    static BreakShape of(double[] y, int from, int start, int to) {
        SpanDesign design = SpanDesign.of(y, from, start, to);
        if (design.before() < 2 || design.after() < 2) {
            // a line needs two observed values on each side; else no description can be compared
            return new BreakShape(Double.NaN, Double.NaN, Double.NaN);
        }
        return new BreakShape(bic(design, new int[] {SpanDesign.INTERCEPT, SpanDesign.SLOPE, SpanDesign.STEP}),
                bic(design, new int[] {SpanDesign.INTERCEPT, SpanDesign.SLOPE, SpanDesign.SLOPE_CHANGE}),
                bic(design, new int[] {SpanDesign.INTERCEPT, SpanDesign.SLOPE, SpanDesign.STEP, SpanDesign.SLOPE_CHANGE}));
    }

    private static double bic(SpanDesign design, int[] columns) {
        int n = design.size();
        int k = columns.length;
        if (n <= k) {
            return Double.NaN;
        }
        // [1] BIC; a perfect fit has no finite score, so its RSS is floored at a negligible value
        return n * Math.log(Math.max(design.rss(columns, null), 1e-300) / n) + k * Math.log(n);
    }
}
