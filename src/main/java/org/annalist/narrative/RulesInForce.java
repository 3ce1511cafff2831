package org.annalist.narrative;

import java.util.List;
import org.annalist.findings.DecisionRules;

/** The decision thresholds of {@link DecisionRules} in words, for the brief's methods appendix. */
final class RulesInForce {

    /** One threshold: what it decides and its value. */
    public record Rule(String decides, String value) {
    }

    private RulesInForce() {
    }

    static List<Rule> all() {
        return List.of(
                new Rule("Significance level of every test behind a statement", Terms.number(DecisionRules.ALPHA)),
                new Rule("Logarithms (multiplicative form) when the seasonal swing grows with the level",
                        "elasticity \u2265 " + Terms.number(DecisionRules.MULTIPLICATIVE_ELASTICITY) + " and yearly level ratio \u2265 "
                                + Terms.number(DecisionRules.MIN_LEVEL_RATIO_FOR_FORM)),
                new Rule("Seasonal statements need at least", DecisionRules.MIN_YEARS_FOR_SEASON + " full years"),
                new Rule("A seasonal pattern is claimed when", "Kruskal-Wallis p < " + Terms.number(DecisionRules.ALPHA)
                        + ", strength \u2265 " + Terms.number(DecisionRules.MIN_SEASONAL_STRENGTH) + ", swing \u2265 "
                        + Terms.number(DecisionRules.MIN_SEASONAL_SWING_PCT) + " % of the level"),
                new Rule("Seasonal strength called strong", "\u2265 " + Terms.number(DecisionRules.STRONG_SEASONAL_STRENGTH)),
                new Rule("A cycle lasts", "more than " + Terms.number(DecisionRules.MIN_CYCLE_YEARS) + " years, with at least "
                        + Terms.number(DecisionRules.MIN_CYCLES_IN_DATA) + " cycles in the data and "
                        + DecisionRules.MIN_YEARS_FOR_CYCLE + " years of data"),
                new Rule("A cycle is regular when the gaps between its peaks vary by", "at most "
                        + Terms.number(100 * DecisionRules.MAX_REGULAR_GAP_CV) + " % (coefficient of variation)"),
                new Rule("A structural break must move the level by", "at least "
                        + Terms.number(DecisionRules.MIN_BREAK_CHANGE_PCT) + " %"),
                new Rule("Shortest regime between breaks", "one seasonal period; "
                        + DecisionRules.MIN_REGIME_YEARS_ANNUAL + " years for annual data"),
                new Rule("Breaks searched with PELT instead of Bai-Perron above", DecisionRules.PELT_ABOVE + " periods"),
                new Rule("A collapse", "a break of " + Terms.number(DecisionRules.COLLAPSE_PCT) + " % or more"),
                new Rule("An outlier", "robust score \u2265 " + Terms.number(DecisionRules.OUTLIER_SCORE) + "; runs of "
                        + DecisionRules.OUTLIER_SHIFT_RUN + " or more are shifts; " + DecisionRules.OUTLIER_STRETCH_FLAGS
                        + " or more within two seasonal cycles an unusual stretch"),
                new Rule("Next year called about the same as this year when", "the 80 % interval of the change"
                        + " contains zero and lies within \u00B1" + Terms.number(DecisionRules.OUTLOOK_SAME_PCT) + " %"),
                new Rule("Irregular fluctuation called small / large", "share below "
                        + Terms.number(100 * DecisionRules.SMALL_IRREGULAR_SHARE) + " % / above "
                        + Terms.number(100 * DecisionRules.LARGE_IRREGULAR_SHARE) + " %"));
    }
}
