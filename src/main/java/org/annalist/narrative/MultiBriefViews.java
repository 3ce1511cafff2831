package org.annalist.narrative;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.annalist.findings.FigurePlan;
import org.annalist.findings.Findings;
import org.annalist.findings.OutlookFinding;
import org.annalist.findings.IndicatorsFinding;
import org.annalist.findings.PartsCheck;
import org.annalist.series.Series;

/** Builds the {@link MultiBriefView} from each series' findings. */
public final class MultiBriefViews {

    /** How the comparison table can be ordered: as the spec lists the series, or by a figure. */
    public enum SortBy { ORDER, NAME, LATEST, CHANGE, YEAR_TO_DATE }

    private MultiBriefViews() {
    }

    public static MultiBriefView of(List<Series> series, List<Findings> findings, SourceFacts source,
                                    Masthead masthead, Optional<PartsCheck> check, SortBy sortBy) {
        List<BriefView> sections = new ArrayList<>();
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < series.size(); i++) {
            sections.add(BriefViews.of(series.get(i), findings.get(i), FigurePlan.of(series.get(i), findings.get(i)),
                    source, masthead));
            order.add(i);
        }
        Comparator<Integer> byFigure = switch (sortBy) {
            case ORDER -> Comparator.comparingInt(i -> i);
            case NAME -> Comparator.comparing(i -> series.get(i).name().toLowerCase(java.util.Locale.ROOT));
            case LATEST -> Comparator.comparingDouble(i -> -orLowest(latest(findings.get(i))));
            case CHANGE -> Comparator.comparingDouble(i -> -orLowest(yearOnYear(findings.get(i))));
            case YEAR_TO_DATE -> Comparator.comparingDouble(i -> -orLowest(yearToDate(findings.get(i))));
        };
        order.sort(byFigure);
        List<MultiBriefView.ComparisonRow> rows = new ArrayList<>();
        List<String> unclearChanges = new ArrayList<>();
        for (int i : order) {
            BriefView v = sections.get(i);
            Formats f = Formats.forValues(series.get(i).values(), masthead.language());
            Findings fi = findings.get(i);
            // the figure and rounding of the series' own outlook section, with its change on the current year
            String printed = OutlookViews.nextYearPrinted(fi.outlook(), f);
            String nextYear = printed.isEmpty() ? "\u2013"
                    : fi.outlook().nextYearTotal() == null ? printed + " (average)" : printed;
            OutlookFinding.YearChange change = printed.isEmpty() ? null : fi.outlook().nextYearChange();
            boolean given = change != null && change.pct() != null && fi.outlook().currentYear() != null;
            // the mark right after the figure it qualifies: printed bare in the table, a "−1.0 %" whose
            // 80 % interval holds no change would be read as a fall the outlook does not claim
            boolean unclear = given && change.holdsNoChange();
            String nextYearChange = !given ? ""
                    : f.signedPercent(change.pct()) + (unclear ? MultiBriefView.UNCLEAR_MARK : "") + " on "
                    + change.againstYear() + (fi.outlook().currentYear().forecastPeriods() > 0 ? " (est.)" : "");
            if (unclear) {
                unclearChanges.add(series.get(i).name() + " " + f.signedPercent(change.pctLo80()) + " to "
                        + f.signedPercent(change.pctHi80()));
            }
            rows.add(new MultiBriefView.ComparisonRow(series.get(i).name(), series.get(i).unit(),
                    v.lead().value().isEmpty() ? "\u2013" : v.lead().value(),
                    change(series.get(i), fi, f, false), change(series.get(i), fi, f, true),
                    new ClaimWords(fi.claims(), f, series.get(i).unit(), MeasureWords.measureOf(fi)).trendCell(),
                    v.season().present() ? v.season().peak() : "none claimed",
                    String.valueOf(v.breaks().size()), String.valueOf(v.outliers().size()), nextYear, nextYearChange));
        }
        Formats first = Formats.forValues(series.get(0).values(), masthead.language());
        MultiBriefView.Consistency consistency = check.map(c -> PartsWords.consistency(c, formatsOf(c.total(), series, masthead)))
                .orElse(new MultiBriefView.Consistency(false, true, "", "", "", "", first.percent(PartsCheck.TOLERANCE_PCT),
                        false, true, "", "", "", "", ""));
        Series lead = series.get(0);
        String names = String.join(", ", series.stream().map(Series::name).toList());
        MultiBriefView.Header header = new MultiBriefView.Header(masthead.title().isEmpty() ? names : masthead.title(),
                masthead.organisation(), first.period(lead.start()) + " to " + first.period(lead.end()),
                first.period(lead.end()), first.timestamp(masthead.generatedAt()), names, masthead.logoUri().orElse(""));
        BriefView.Document document = new BriefView.Document(masthead.language().toLanguageTag(),
                masthead.paper().css(), masthead.organisation().isEmpty() ? "Annalist" : masthead.organisation(),
                "time series, " + header.seriesList());
        List<String> notes = DataNotes.notes(source);
        BriefView.Provenance provenance = sections.get(0).provenance();
        List<String> provisional = new ArrayList<>();
        for (int i = 0; i < series.size(); i++) {
            if (sections.get(i).lead().provisional()) {
                provisional.add(series.get(i).name());
            }
        }
        return new MultiBriefView(document, header, rows, sortBy == SortBy.ORDER,
                sortBy.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' '),
                consistency, sections, notes, provenance,
                provisional.size() == series.size(),
                provisional.isEmpty() || provisional.size() == series.size() ? "" : Terms.listed(provisional),
                MultiOutlookWords.methods(series, findings),
                check.map(c -> MultiOutlookWords.partsForecasts(c, series, findings, formatsOf(c.total(), series, masthead)))
                        .orElse(""), unclearNote(unclearChanges));
    }

    /**
     * The table's note on the changes marked {@link MultiBriefView#UNCLEAR_MARK}: each with its
     * 80 % interval; empty when none is marked.
     */
    static String unclearNote(List<String> marked) {
        if (marked.isEmpty()) {
            return "";
        }
        String mark = MultiBriefView.UNCLEAR_MARK;
        return marked.size() == 1
                ? "The change on the current year marked " + mark + " has an 80\u00A0% interval that includes no change (" + marked.get(0)
                        + "), so it is neither a clear rise nor a clear fall."
                : "The changes on the current year marked " + mark + " have 80\u00A0% intervals that include no change (" + Terms.listed(marked)
                        + "), so none of them is a clear rise or a clear fall.";
    }

    /** The latest change on a year earlier, or the year to date's, in %, points or units as the measure has it. */
    private static String change(Series s, Findings fi, Formats f, boolean toDate) {
        IndicatorsFinding i = fi.indicators();
        MeasureWords measure = MeasureWords.of(s, fi, f);
        if (i == null || (toDate ? i.yearToDate() == null : i.samePeriodLastYear() == null)) {
            return "\u2013";
        }
        return toDate ? measure.signedChange(i.yearToDate().change(), i.yearToDate().changePct())
                : measure.signedChange(i.samePeriodLastYear().change(), i.samePeriodLastYear().changePct());
    }

    /** The formats of the total's values, so that the sums of the parts are written in the same precision. */
    private static Formats formatsOf(String name, List<Series> series, Masthead masthead) {
        Series total = series.stream().filter(s -> s.name().equals(name)).findFirst().orElse(series.get(0));
        return Formats.forValues(total.values(), masthead.language());
    }

    private static double orLowest(Double v) {
        return v == null || v.isNaN() ? Double.NEGATIVE_INFINITY : v;
    }

    private static Double latest(Findings f) {
        return f.indicators() == null ? null : f.indicators().value();
    }

    private static Double yearOnYear(Findings f) {
        IndicatorsFinding i = f.indicators();
        return i == null || i.samePeriodLastYear() == null ? null : i.samePeriodLastYear().changePct();
    }

    private static Double yearToDate(Findings f) {
        IndicatorsFinding i = f.indicators();
        return i == null || i.yearToDate() == null ? null : i.yearToDate().changePct();
    }
}
