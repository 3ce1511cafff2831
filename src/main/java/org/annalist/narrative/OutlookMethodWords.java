package org.annalist.narrative;

import org.annalist.findings.DecisionRules;
import org.annalist.findings.OutlookFinding;

/**
 * The one source of the words for an outlook's method and the reason it was used. The one-series
 * brief's outlook page, the multi-series brief and the appendix (with the findings JSON) all take
 * them from here, so that a board brief and the single briefs it summarises cannot name a method,
 * or the reason for it, differently.
 */
final class OutlookMethodWords {

    private OutlookMethodWords() {
    }

    /**
     * The method as a reader can follow it: {@code the average of three methods: exponential
     * smoothing (ETS(M,A,M)), an ARIMA model (…) and the Theta method (on seasonally adjusted
     * values)}; without {@code withModels}, how each method was fitted (its model's notation, Theta's
     * seasonal adjustment) is left out.
     */
    static String method(OutlookFinding.Model model, boolean withModels) {
        return switch (model.method()) {
            case COMBINATION -> "the average of " + (model.members().size() == 3 ? "three" : "two") + " methods: "
                    + Terms.listed(model.members().stream().map(m -> method(m, withModels)).toList());
            case ETS -> "exponential smoothing" + (withModels ? " (" + model.label().orElseThrow() + ")" : "");
            case ARIMA -> "an ARIMA model" + (withModels ? " (" + model.label().orElseThrow() + ")" : "");
            case THETA -> model.seasonallyAdjusted() && withModels ? "the Theta method (on seasonally adjusted values)"
                    : "the Theta method";
            case SEASONAL_NAIVE -> "the seasonal naive rule (each period as the same period a year before)";
            case NAIVE -> "the naive rule (every period as the latest value)";
            case NAIVE_WITH_DRIFT -> "the naive rule with drift (the latest value plus the average change per"
                    + " period so far)";
        };
    }

    /** What a single method must have done to replace the average, after its subject. */
    static final String DID_BETTER = "did clearly better than the average in the back-test";

    /**
     * What "clearly" means, in plain words, from {@link DecisionRules#OUTLOOK_METHOD_ADVANTAGE_PCT}
     * and {@code Outlook.choose}: the method's mean error over the whole back-test at most that far
     * below the average's, and below it in the earlier and in the later half of the test as well.
     */
    static String clearlyRule() {
        return "clearly: its errors over the whole test " + Terms.number(DecisionRules.OUTLOOK_METHOD_ADVANTAGE_PCT)
                + "\u00A0% or more below the average's, and below them in both the earlier and the later half of the test";
    }

    /** Why the method was used, as a clause: {@code no single method did clearly better than the average in the back-test}. */
    static String reason(OutlookFinding.Choice.Basis basis) {
        return switch (basis) {
            case COMBINATION_NOT_BEATEN -> "no single method " + DID_BETTER;
            case SINGLE_CLEARLY_BETTER -> "it " + DID_BETTER;
            case COMBINATION_TOO_FEW_TESTED -> "the back-test made too few forecasts to prefer one method";
            case COMBINATION_WITHOUT_BACKTEST -> "the series is too short to test the methods on its own past";
            case SHORT_SERIES -> "the series is too short for the usual methods";
        };
    }
}
