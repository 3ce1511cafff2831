package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;

import org.annalist.analysis.breaks.BreakSearch;
import org.annalist.analysis.cycle.CycleDetector;
import org.junit.jupiter.api.Test;

/** The analysis methods' documented defaults are the tool's decision rules: one value, one source. */
class DecisionRulesTest {

    @Test
    void theBreakSearchDefaultsAreTheDecisionRules() {
        assertThat(BreakSearch.DEFAULT_ALPHA).isEqualTo(DecisionRules.ALPHA);
        assertThat(BreakSearch.DEFAULT_MINIMUM_CHANGE_PCT).isEqualTo(DecisionRules.MIN_BREAK_CHANGE_PCT);
        assertThat(BreakSearch.DEFAULT_PELT_ABOVE).isEqualTo(DecisionRules.PELT_ABOVE);
        assertThat(BreakSearch.DEFAULT_COLLAPSE_PCT).isEqualTo(DecisionRules.COLLAPSE_PCT);
        assertThat(BreakSearch.DEFAULT_ANNUAL_MINIMUM_REGIME).isEqualTo(DecisionRules.MIN_REGIME_YEARS_ANNUAL);
    }

    @Test
    void theCycleSearchDefaultsAreTheDecisionRules() {
        assertThat(CycleDetector.DEFAULT_MINIMUM_YEARS).isEqualTo(DecisionRules.MIN_YEARS_FOR_CYCLE);
        assertThat(CycleDetector.DEFAULT_SHORTEST_CYCLE_YEARS).isEqualTo(DecisionRules.MIN_CYCLE_YEARS);
        assertThat(CycleDetector.DEFAULT_CYCLES_IN_DATA).isEqualTo(DecisionRules.MIN_CYCLES_IN_DATA);
    }

    @Test
    void theOutlooksMarginsAreTheDecisionRules() {
        assertThat(org.annalist.analysis.forecast.Outlook.METHOD_ADVANTAGE_PCT)
                .isEqualTo(DecisionRules.OUTLOOK_METHOD_ADVANTAGE_PCT);
        assertThat(org.annalist.analysis.forecast.Outlook.MIN_CHOICE_FORECASTS)
                .isEqualTo(DecisionRules.OUTLOOK_MIN_CHOICE_FORECASTS);
        assertThat(org.annalist.analysis.forecast.Outlook.NARROWING_ERRORS)
                .isEqualTo(DecisionRules.OUTLOOK_NARROWING_ERRORS);
        assertThat(org.annalist.analysis.forecast.Outlook.WIDENING_ERRORS)
                .isEqualTo(DecisionRules.OUTLOOK_WIDENING_ERRORS);
        assertThat(org.annalist.analysis.forecast.Outlook.SLOWEST_FAR_GROWTH)
                .isEqualTo(DecisionRules.OUTLOOK_SLOWEST_FAR_GROWTH);
        assertThat(org.annalist.analysis.forecast.Outlook.FASTEST_FAR_GROWTH)
                .isEqualTo(DecisionRules.OUTLOOK_FASTEST_FAR_GROWTH);
        assertThat(org.annalist.analysis.forecast.Outlook.REGIME_ADVANTAGE_PCT)
                .isEqualTo(DecisionRules.OUTLOOK_REGIME_ADVANTAGE_PCT);
    }
}
