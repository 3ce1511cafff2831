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
                        + Terms.number(DecisionRules.MIN_SEASONAL_SWING_PCT) + "\u00A0% of the level"),
                new Rule("Seasonal strength called strong", "\u2265 " + Terms.number(DecisionRules.STRONG_SEASONAL_STRENGTH)),
                new Rule("A cycle lasts", "more than " + Terms.number(DecisionRules.MIN_CYCLE_YEARS) + " years, with at least "
                        + Terms.number(DecisionRules.MIN_CYCLES_IN_DATA) + " cycles in the data and "
                        + DecisionRules.MIN_YEARS_FOR_CYCLE + " years of data"),
                new Rule("A cycle is regular when the gaps between its peaks vary by", "at most "
                        + Terms.number(100 * DecisionRules.MAX_REGULAR_GAP_CV) + "\u00A0% (coefficient of variation)"),
                new Rule("A structural break must move the level by", "at least "
                        + Terms.number(DecisionRules.MIN_BREAK_CHANGE_PCT) + "\u00A0%, by a step at the break or by a change"
                        + " of slope within the shortest regime"),
                new Rule("A break is called a step, a change of slope, or both", "each part only when it moves the level "
                        + Terms.number(DecisionRules.MIN_BREAK_CHANGE_PCT) + "\u00A0%; when both do, the simpler by BIC unless"
                        + " two separate lines lower BIC by " + Terms.number(DecisionRules.BREAK_KIND_BIC_MARGIN) + " more"),
                new Rule("A break is provisional when", "the regime after it runs to the latest period and is too short"
                        + " to date it: its 95\u00A0% interval reaches the latest period"),
                new Rule("Shortest regime between breaks / its slope given a year from", "one seasonal period; "
                        + DecisionRules.MIN_REGIME_YEARS_ANNUAL + " years for annual data / "
                        + DecisionRules.MIN_REGIME_YEARS_FOR_RATE + " years (else the fitted levels at its ends)"),
                new Rule("Breaks searched with PELT instead of Bai-Perron above", DecisionRules.PELT_ABOVE + " periods"),
                new Rule("A step and a movement back read as one episode", "a step of "
                        + Terms.number(Math.abs(DecisionRules.COLLAPSE_PCT)) + "\u00A0% or more either way, then a move back"
                        + " of at least " + Terms.number(DecisionRules.MIN_BREAK_CHANGE_PCT) + "\u00A0% beyond where the old line's slope"
                        + " would have carried it"),
                new Rule("An outlier", "robust score \u2265 " + Terms.number(DecisionRules.OUTLIER_SCORE) + "; runs of "
                        + DecisionRules.OUTLIER_SHIFT_RUN + " or more are shifts; " + DecisionRules.OUTLIER_STRETCH_FLAGS
                        + " or more within two seasonal cycles an unusual stretch"),
                new Rule("The outlook uses one method, not the average / only the values since the latest break, when", "its back-test error is at least " + Terms.number(DecisionRules.OUTLOOK_METHOD_ADVANTAGE_PCT)
                        + "\u00A0% lower over the whole test and lower in both its halves, in a test of at least "
                        + Terms.number(DecisionRules.OUTLOOK_MIN_CHOICE_FORECASTS) + " forecasts / at least "
                        + Terms.number(DecisionRules.OUTLOOK_REGIME_ADVANTAGE_PCT)
                        + "\u00A0% lower"),
                new Rule("Outlook intervals widened / narrowed with", "at least "
                        + Terms.number(DecisionRules.OUTLOOK_WIDENING_ERRORS) + " / "
                        + Terms.number(DecisionRules.OUTLOOK_NARROWING_ERRORS)
                        + " back-test errors (the 95\u00A0% interval with the 80\u00A0% one, unless the largest errors ask for more)"),
                new Rule("Next year called about the same / set against the trend when",
                        "the 80\u00A0% interval of the change contains zero and lies within \u00B1"
                        + Terms.number(DecisionRules.OUTLOOK_SAME_PCT) + "\u00A0% / opposite to it or "
                        + Terms.number(DecisionRules.OUTLOOK_TREND_GAP_POINTS)
                        + (DecisionRules.OUTLOOK_TREND_GAP_POINTS == 1 ? " point" : " points") + " a year apart as printed"),
                new Rule("Irregular fluctuation called small / large", "share below "
                        + Terms.number(100 * DecisionRules.SMALL_IRREGULAR_SHARE) + "\u00A0% / above "
                        + Terms.number(100 * DecisionRules.LARGE_IRREGULAR_SHARE) + "\u00A0%"),
                new Rule("The first page leads with", "a break of " + Terms.number(DecisionRules.HEADLINE_STEP_PCT)
                        + "\u00A0% or more within " + DecisionRules.RECENT_BREAK_YEARS + " years; else a latest change of "
                        + Terms.number(DecisionRules.MATERIAL_CHANGE_PCT) + "\u00A0% or more; else the trend"),
                new Rule("A trend is qualified / not stated on page 1 when", "the latest period, year to date or rolling"
                        + " year went the other way by " + Terms.number(DecisionRules.MATERIAL_CHANGE_PCT)
                        + "\u00A0% / the last two both by " + Terms.number(DecisionRules.CONTRADICTING_CHANGE_PCT)
                        + "\u00A0%; its start said as \u201Cabout\u201D when its break's 95\u00A0% interval spans "
                        + Terms.number(DecisionRules.VAGUE_START_YEARS) + " year or more"),
                new Rule("A rate, share or occupancy without a unit is read in points when its values stay within",
                        "0 to " + Terms.number(DecisionRules.RATE_MAX_VALUE)));
    }
}
