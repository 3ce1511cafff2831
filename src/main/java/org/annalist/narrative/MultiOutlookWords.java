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
        // the rule behind "clearly", once, wherever a choice said it
        boolean clearly = findings.stream().map(Findings::outlook).anyMatch(o -> o != null
                && (o.chosenBecause().basis() == OutlookFinding.Choice.Basis.COMBINATION_NOT_BEATEN
                || o.chosenBecause().basis() == OutlookFinding.Choice.Basis.SINGLE_CLEARLY_BETTER));
        return String.join("; ", groups) + (clearly ? " (" + OutlookMethodWords.clearlyRule() + ")" : "");
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
        String growth = growth(check, series, findings, f);
        if (Math.abs(gapPct) <= PartsCheck.TOLERANCE_PCT) {
            return estimates + " add up to " + check.total() + "'s within " + f.percent(PartsCheck.TOLERANCE_PCT) + "."
                    + growth;
        }
        // the total's figure as its own section prints it; the parts' sum is the one to leave unquoted
        String own = OutlookViews.nextYearPrinted(total.get(), f);
        return estimates + " do not add up to " + check.total() + "'s within " + f.percent(PartsCheck.TOLERANCE_PCT)
                + ": together about "
                + f.significant(sum) + ", which is " + f.percent(Math.abs(gapPct)) + (gapPct < 0 ? " below " : " above ")
                + check.total() + "'s " + own + "." + growth + " For the total, quote " + check.total() + "'s own estimate ("
                + own + "): it is forecast from " + check.total() + "'s own history, whereas each part is forecast apart and"
                + " their sum is no forecast of the total.";
    }

    /**
     * The parts' growth taken together against the total's, when both can be given and differ in
     * print: the sum of the parts' next-year estimates against the sum of their current-year
     * estimates, beside the total's own change on its current-year estimate (the figure its section
     * and the table print); and how far, month by month, the parts' forecasts of the next year sum
     * below or above the total's. A reader who adds up the parts' changes otherwise finds a growth
     * the total's outlook does not state, with nothing to say why: the outlooks are separate models.
     * Empty when a series has no current-year estimate for the same year, or the two changes print alike.
     */
    static String growth(PartsCheck check, List<Series> series, List<Findings> findings, Formats f) {
        Optional<OutlookFinding> total = outlookOf(check.total(), series, findings);
        if (total.isEmpty() || total.get().nextYearChange() == null || total.get().nextYearChange().pct() == null
                || total.get().currentYear() == null) {
            return "";
        }
        int year = total.get().nextYear();
        double next = 0;
        double current = 0;
        List<OutlookFinding> parts = new ArrayList<>();
        for (String part : check.parts()) {
            Optional<OutlookFinding> o = outlookOf(part, series, findings);
            if (o.isEmpty() || o.get().nextYear() != year || o.get().currentYear() == null
                    || o.get().currentYear().year() != total.get().currentYear().year()) {
                return "";
            }
            next += o.get().nextYearTotal().mean();
            current += o.get().currentYear().estimate().mean();
            parts.add(o.get());
        }
        if (!(current > 0)) {
            return "";
        }
        String partsChange = f.signedPercent(100 * (next / current - 1));
        String totalChange = f.signedPercent(total.get().nextYearChange().pct());
        if (partsChange.equals(totalChange)) {
            return "";
        }
        String against = total.get().currentYear().forecastPeriods() > 0 ? "their estimates for " : "";
        return " Taken together they change by " + partsChange + " on " + against + total.get().currentYear().year()
                + ", whereas " + check.total() + "'s own outlook gives " + totalChange + " on "
                + (against.isEmpty() ? "" : "its estimate for ") + total.get().currentYear().year() + ": the total and each part are"
                + " forecast by separate models, each fitted to its own history, so the growth of the parts need not"
                + " match the total's" + monthlyGaps(total.get(), parts, year, f) + ".";
    }

    /**
     * How far the parts' forecasts of each period of {@code year} sum from the total's, as a range in
     * %: {@code ; in each month of 2027 their forecasts sum to 1.0 % to 2.6 % below Total's}; empty
     * when a period is missing from a forecast or the gaps lie on both sides of zero in print.
     */
    private static String monthlyGaps(OutlookFinding total, List<OutlookFinding> parts, int year, Formats f) {
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        int periods = 0;
        String each = "period";
        for (OutlookFinding.Point p : total.forecasts()) {
            if (p.period().year() != year) {
                continue;
            }
            each = switch (p.period().frequency()) {
                case MONTHLY -> "month";
                case QUARTERLY -> "quarter";
                case WEEKLY -> "week";
                default -> "period";
            };
            double sum = 0;
            for (OutlookFinding part : parts) {
                Optional<OutlookFinding.Point> same = part.forecasts().stream()
                        .filter(q -> q.period().equals(p.period())).findFirst();
                if (same.isEmpty()) {
                    return "";
                }
                sum += same.get().mean();
            }
            if (!(p.mean() > 0)) {
                return "";
            }
            double gap = 100 * (sum / p.mean() - 1);
            low = Math.min(low, gap);
            high = Math.max(high, gap);
            periods++;
        }
        if (periods < 2 || (low < 0 && high > 0)) {
            return "";
        }
        boolean below = high <= 0;
        double near = below ? -high : low;
        double far = below ? -low : high;
        String range = f.percent(near).equals(f.percent(far)) ? "about " + f.percent(far)
                : f.fixed(near, 1) + " to " + f.percent(far);
        return "; in each " + each + " of " + year + " their forecasts sum to " + range + (below ? " below " : " above ")
                + "the total's";
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
