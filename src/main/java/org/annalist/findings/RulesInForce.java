package org.annalist.findings;

import java.util.List;
import java.util.Locale;
import org.annalist.analysis.anomaly.RemainderOutliers;

/** The decision thresholds of {@link DecisionRules} in words, for the brief's methods appendix. */
public final class RulesInForce {

    /** One threshold: what it decides and its value. */
    public record Rule(String decides, String value) {
    }

    private RulesInForce() {
    }

    public static List<Rule> all() {
        return List.of(
                new Rule("Significance level of every test behind a statement", fmt(DecisionRules.ALPHA)),
                new Rule("Logarithms (multiplicative form) when the seasonal swing grows with the level",
                        "elasticity \u2265 " + fmt(DecisionRules.MULTIPLICATIVE_ELASTICITY) + " and yearly level ratio \u2265 "
                                + fmt(DecisionRules.MIN_LEVEL_RATIO_FOR_FORM)),
                new Rule("Seasonal statements need at least", DecisionRules.MIN_YEARS_FOR_SEASON + " full years"),
                new Rule("A seasonal pattern is claimed when", "Kruskal-Wallis p < " + fmt(DecisionRules.ALPHA)
                        + ", strength \u2265 " + fmt(DecisionRules.MIN_SEASONAL_STRENGTH) + ", swing \u2265 "
                        + fmt(DecisionRules.MIN_SEASONAL_SWING_PCT) + " % of the level"),
                new Rule("Seasonal strength called strong", "\u2265 " + fmt(DecisionRules.STRONG_SEASONAL_STRENGTH)),
                new Rule("A cycle lasts", "more than " + fmt(DecisionRules.MIN_CYCLE_YEARS) + " years, with at least "
                        + fmt(DecisionRules.MIN_CYCLES_IN_DATA) + " cycles in the data and "
                        + DecisionRules.MIN_YEARS_FOR_CYCLE + " years of data"),
                new Rule("A cycle is regular when the gaps between its peaks vary by", "at most "
                        + fmt(100 * DecisionRules.MAX_REGULAR_GAP_CV) + " % (coefficient of variation)"),
                new Rule("A structural break must move the level by", "at least "
                        + fmt(DecisionRules.MIN_BREAK_CHANGE_PCT) + " %"),
                new Rule("Shortest regime between breaks", "one seasonal period; "
                        + DecisionRules.MIN_REGIME_YEARS_ANNUAL + " years for annual data"),
                new Rule("Breaks searched with PELT instead of Bai-Perron above", DecisionRules.PELT_ABOVE + " periods"),
                new Rule("A collapse", "a break of " + fmt(DecisionRules.COLLAPSE_PCT) + " % or more"),
                new Rule("An outlier", "robust score \u2265 " + fmt(DecisionRules.OUTLIER_SCORE) + "; runs of "
                        + RemainderOutliers.SHIFT_RUN + " or more are shifts; " + RemainderOutliers.STRETCH_FLAGS
                        + " or more within two seasonal cycles an unusual stretch"),
                new Rule("Irregular fluctuation called small / large", "share below "
                        + fmt(100 * DecisionRules.SMALL_IRREGULAR_SHARE) + " % / above "
                        + fmt(100 * DecisionRules.LARGE_IRREGULAR_SHARE) + " %"));
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.format(Locale.ROOT, "%s", v);
    }
}
