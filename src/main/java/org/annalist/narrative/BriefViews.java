package org.annalist.narrative;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.findings.BreakFinding;
import org.annalist.findings.Claim;
import org.annalist.findings.Claims;
import org.annalist.findings.DecisionRules;
import org.annalist.findings.Direction;
import org.annalist.findings.FigurePlan;
import org.annalist.findings.Findings;
import org.annalist.findings.RecentPeriod;
import org.annalist.findings.SeriesFacts;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.series.ValueFlag;

/** Builds the {@link BriefView} of one series from its findings. */
public final class BriefViews {

    private BriefViews() {
    }

    /** @param plan the charts the brief shows */
    public static BriefView of(Series series, Findings findings, FigurePlan plan, SourceFacts source,
                               Masthead masthead) {
        Formats f = Formats.forValues(series.values(), masthead.language());
        MeasureWords measure = MeasureWords.of(series, findings, f);
        SectionViews sections = new SectionViews(series, findings, plan, f);
        BreakViews breaks = new BreakViews(series, findings, f);
        String title = masthead.title().isEmpty() ? series.name() : masthead.title();
        String author = masthead.organisation().isEmpty() ? "Annalist" : masthead.organisation();
        BriefView.Document document = new BriefView.Document(masthead.language().toLanguageTag(), masthead.paper().css(),
                author, "time series, " + series.name());
        BriefView.Header header = new BriefView.Header(title, masthead.organisation(), series.name(), series.unit(),
                f.period(series.start()) + " to " + f.period(series.end()), f.period(series.end()),
                f.timestamp(masthead.generatedAt()), BriefView.Calendar.of(series.frequency()), unitPerPeriod(series),
                masthead.logoUri().orElse(""), measure.statement(), measure.percent());
        BriefView.Lead lead = lead(series, findings, f, measure);
        BriefView.Provenance provenance = new BriefView.Provenance(source.file(), source.sha256(),
                f.count(source.rowsRead()), DataNotes.reading(source.reading()), masthead.software(), f.timestamp(masthead.generatedAt()),
                source.cut().map(c -> DataNotes.cut(c, series.frequency(), f)).orElse(""));
        List<String> notes = DataNotes.notes(source);
        findings.notes().forEach(note -> notes.add(Terms.caveat(note)));
        BriefView.ThisPeriod thisPeriod = sections.thisPeriod();
        return new BriefView(document, header, lead, thisPeriod, sections.keyFigures(lead, thisPeriod), sections.charts(),
                sections.trend(),
                sections.season(), sections.cycle(), sections.outliers(), breaks.breaks(), breaks.episodes(),
                sections.irregular(), findings.recent().stream().map(r -> row(r, f)).toList(),
                OutlookViews.of(series, findings, f, measure), facts(series, findings, f),
                notes, AppendixViews.methods(findings, f), AppendixViews.thresholds(), provenance);
    }

    private static BriefView.Lead lead(Series series, Findings findings, Formats f, MeasureWords measure) {
        Claims claims = findings.claims();
        ClaimWords words = new ClaimWords(claims, f, series.unit(), measure.measure());
        String step = words.stepSentence();
        String trend = words.trendSentence();
        boolean trendFirst = words.trendFirst();
        if (findings.recent().isEmpty()) {
            return new BriefView.Lead(false, f.atPeriod(series.end()), f.period(series.end()), "", "", "", false, false,
                    false, "", step, trend, trendFirst, "", false, "");
        }
        RecentPeriod last = findings.recent().get(findings.recent().size() - 1);
        int firstRevisable = firstOfRevisableEnd(series);
        boolean provisional = firstRevisable < series.size();
        // more than the latest value may be revised: the caveat says from when, so that it agrees with the table
        String provisionalSince = firstRevisable < series.size() - 1 ? f.period(series.period(firstRevisable)) : "";
        Optional<Claim> latest = claims.pageLatest();
        if (last.value() == null || latest.isEmpty()) {
            return new BriefView.Lead(false, f.atPeriod(last.period()), f.period(last.period()), f.value(last.value()),
                    "", "", false, false, provisional, provisionalSince, step, trend, trendFirst, "", false, "");
        }
        // the sign and size are the claim's, which the key figures and the findings JSON carry too
        Claim change = latest.get();
        String yearEarlier = last.period().frequency() == Frequency.DAILY
                || last.period().frequency() == Frequency.BUSINESS_DAILY
                ? "the same weekday a year before (" + f.period(last.yearEarlierPeriod()) + ")"
                : f.period(last.yearEarlierPeriod());
        // a single period the calendar distorts beyond its sign does not lead alone (CalendarLead)
        CalendarLead calendarLead = CalendarLead.of(findings);
        String calendar = change.quantity() == Claim.Quantity.LATEST_CALENDAR_ADJUSTED
                ? claims.find(Claim.Quantity.LATEST_VS_YEAR_EARLIER).map(raw -> " once the calendar's effect is taken out ("
                        + words.signedSize(raw) + " as counted)").orElse("") : "";
        return new BriefView.Lead(true, f.atPeriod(last.period()), f.period(last.period()), f.value(last.value()),
                yearEarlier, words.size(change), change.direction() == Direction.INCREASING,
                change.direction() == Direction.DECREASING, provisional, provisionalSince, step, trend, trendFirst, calendar,
                change.unit() != Claim.SizeUnit.PERCENT, calendarLead.withholdsSinglePeriod()
                        ? calendarLead.sentence(words, claims, f.period(last.period()), yearEarlier) : "");
    }

    /** The index where the run of provisional or estimated values that ends the series starts; the size when there is none. */
    private static int firstOfRevisableEnd(Series series) {
        int i = series.size();
        while (i > 0 && (series.flags(i - 1).contains(ValueFlag.PROVISIONAL) || series.flags(i - 1).contains(ValueFlag.ESTIMATED))) {
            i--;
        }
        return i;
    }

    private static List<BriefView.Fact> facts(Series series, Findings findings, Formats f) {
        SeriesFacts facts = findings.series();
        List<BriefView.Fact> summary = new ArrayList<>();
        summary.add(new BriefView.Fact("Series", series.name() + (series.unit().isEmpty() ? "" : " (" + series.unit() + ")")));
        summary.add(new BriefView.Fact("Frequency", facts.frequency()));
        summary.add(new BriefView.Fact("Period covered", f.period(series.start()) + " to " + f.period(series.end())));
        summary.add(new BriefView.Fact("Periods", f.count(facts.observations())));
        summary.add(new BriefView.Fact("Missing", facts.missing() == 0 ? "none"
                : f.count(facts.missing()) + " (" + listPeriods(series.missingPeriods(), f) + ")"));
        for (ValueFlag flag : ValueFlag.values()) {
            List<Period> flagged = series.periodsFlagged(flag);
            if (!flagged.isEmpty()) {
                summary.add(new BriefView.Fact(capitalise(flag.description()), listPeriods(flagged, f)));
            }
        }
        return summary;
    }

    private static BriefView.Row row(RecentPeriod r, Formats f) {
        return new BriefView.Row(f.shortPeriod(r.period()), f.value(r.value()), f.value(r.yearEarlier()),
                f.signedValue(r.change()), f.signedPercent(r.changePct()), Terms.flags(r.flags(), r.yearEarlierFlags()),
                missing(r.value()) || missing(r.yearEarlier()) || missing(r.change()), missing(r.changePct()));
    }

    /** Whether a figure is printed as a dash. */
    private static boolean missing(Double v) {
        return v == null || v.isNaN();
    }

    /** True when every value is above zero, so that changes can be read as percentages. */
    static boolean positive(Series series) {
        for (int i = 0; i < series.size(); i++) {
            if (!series.isMissing(i) && series.value(i) <= 0) {
                return false;
            }
        }
        return true;
    }

    /** {@code nights a month}: the unit and the period it is counted over. */
    private static String unitPerPeriod(Series series) {
        if (series.unit().isEmpty()) {
            return "";
        }
        return series.unit() + " " + MeasureWords.perPeriod(series.frequency());
    }

    static String listPeriods(List<Period> periods, Formats f) {
        List<String> words = periods.stream().limit(6).map(f::period).toList();
        String list = String.join(", ", words);
        return periods.size() > 6 ? list + " and " + (periods.size() - 6) + " more" : list;
    }

    static String capitalise(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    /** Breaks whose step lowered the level by {@link DecisionRules#COLLAPSE_PCT} or more, by year. */
    static List<String> dropYears(Series series, List<BreakFinding> breaks) {
        return breaks.stream().filter(b -> b.kind().step() && b.changePct() <= DecisionRules.COLLAPSE_PCT).map(b -> String.valueOf(series.period(b.index()).year()))
                .distinct().toList();
    }
}
