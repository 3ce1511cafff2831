package org.annalist.narrative;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.annalist.findings.Findings;
import org.annalist.findings.OutlookFinding;
import org.annalist.findings.PartsCheck;
import org.annalist.series.Series;

/**
 * The words of a multi-series brief about its series' outlooks taken together: which method each
 * outlook used and why (from each series' findings, never a fixed list), and whether the parts'
 * next-year estimates add up to the total's. Each outlook is made for its series apart, so parts
 * that add up in the recorded values need not add up in their forecasts; the brief says by how much
 * when they do not.
 */
final class MultiOutlookWords {

    private static final String NONE = "none";

    private MultiOutlookWords() {
    }

    /**
     * The outlooks' methods, series that share a method and a reason named together, in the words of
     * {@link OutlookMethodWords}: {@code for Total, Domestic and Brevania the average of three methods:
     * exponential smoothing, an ARIMA model and the Theta method, as no single method did clearly
     * better than the average in the back-test; none for Long-haul}; {@code none} when no series has
     * an outlook.
     */
    static String methods(List<Series> series, List<Findings> findings) {
        Map<String, List<String>> seriesByMethod = new LinkedHashMap<>();
        for (int i = 0; i < series.size(); i++) {
            OutlookFinding o = findings.get(i).outlook();
            String method = o == null ? NONE : OutlookMethodWords.method(o.model(), false) + ", as "
                    + OutlookMethodWords.reason(o.chosenBecause().basis());
            seriesByMethod.computeIfAbsent(method, k -> new ArrayList<>()).add(series.get(i).name());
        }
        if (seriesByMethod.keySet().equals(Set.of(NONE))) {
            return NONE;
        }
        List<String> groups = new ArrayList<>();
        seriesByMethod.forEach((method, names) -> groups.add(method.equals(NONE) ? NONE + " for " + Terms.listed(names)
                : "for " + Terms.listed(names) + " " + method));
        return String.join("; ", groups);
    }

    /**
     * Whether the parts' next-year estimates add up to the total's, within the tolerance of the
     * recorded values' check ({@link PartsCheck#TOLERANCE_PCT}): a sentence that follows the check's,
     * or empty when it cannot be said (a series without a yearly total for the same year).
     *
     * @param f the formats of the total's values
     */
    static String partsForecasts(PartsCheck check, List<Series> series, List<Findings> findings, Formats f) {
        Optional<OutlookFinding> total = outlookOf(check.total(), series, findings);
        if (total.isEmpty()) {
            return "";
        }
        double sum = 0;
        for (String part : check.parts()) {
            Optional<OutlookFinding> o = outlookOf(part, series, findings);
            if (o.isEmpty() || o.get().nextYear() != total.get().nextYear()) {
                return "";
            }
            sum += o.get().nextYearTotal().mean();
        }
        double expected = total.get().nextYearTotal().mean();
        double gapPct = 100 * (sum / expected - 1);
        String estimates = "Their next-year estimates for " + total.get().nextYear();
        if (Math.abs(gapPct) <= PartsCheck.TOLERANCE_PCT) {
            return estimates + " add up to " + check.total() + "'s within " + f.percent(PartsCheck.TOLERANCE_PCT) + ".";
        }
        // the total's figure as its own section prints it; the parts' sum is the one to leave unquoted
        String own = OutlookViews.nextYearPrinted(total.get(), f);
        return estimates + " do not add up within " + f.percent(PartsCheck.TOLERANCE_PCT) + ": together about "
                + f.significant(sum) + ", which is " + f.percent(Math.abs(gapPct)) + (gapPct < 0 ? " below " : " above ")
                + check.total() + "'s " + own + ". For the total, quote " + check.total() + "'s own estimate (" + own
                + "): it is forecast from " + check.total() + "'s own history, whereas each part is forecast apart and"
                + " their sum is no forecast of the total.";
    }

    /** The outlook of the named series when it has a next-year total, else empty. */
    private static Optional<OutlookFinding> outlookOf(String name, List<Series> series, List<Findings> findings) {
        for (int i = 0; i < series.size(); i++) {
            if (series.get(i).name().equals(name)) {
                OutlookFinding o = findings.get(i).outlook();
                return o == null || o.nextYearTotal() == null ? Optional.empty() : Optional.of(o);
            }
        }
        return Optional.empty();
    }
}
