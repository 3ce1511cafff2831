package org.annalist.narrative;

import java.util.ArrayList;
import java.util.List;
import org.annalist.findings.Findings;
import org.annalist.findings.RecentPeriod;
import org.annalist.findings.SeriesFacts;
import org.annalist.findings.SourceFacts;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.series.ValueFlag;

/** Builds the {@link BriefView} of one series from its findings. */
public final class BriefViews {

    private BriefViews() {
    }

    public static BriefView of(Series series, Findings findings, SourceFacts source, Masthead masthead) {
        Formats f = Formats.forValues(series.values(), masthead.language());
        SeriesFacts facts = findings.series();
        String title = masthead.title().isEmpty() ? series.name() : masthead.title();
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
        String smoothingNote = findings.smoothing() == null
                ? "The series is too short for a trend-cycle line."
                : "The dashed line is a " + findings.smoothing().method() + ": each point is the average of the "
                        + findings.smoothing().window() + " periods around it, which evens out the seasonal pattern. "
                        + "It cannot be computed for the first and last " + (findings.smoothing().window() / 2)
                        + " periods.";
        BriefView.FigureView overview = new BriefView.FigureView("overview",
                findings.smoothing() == null ? "" : findings.smoothing().method());
        List<BriefView.Row> rows = findings.recent().stream().map(r -> row(r, f)).toList();
        BriefView.Provenance provenance = new BriefView.Provenance(source.file(), source.sha256(),
                f.count(source.rowsRead()), source.reading(), masthead.software(), f.timestamp(masthead.generatedAt()));
        return new BriefView(masthead.language().toLanguageTag(), title, masthead.organisation(), series.name(),
                series.unit(), f.period(series.start()) + " to " + f.period(series.end()), f.period(series.end()),
                latest(series, findings, f), summary, overview, smoothingNote, rows, source.notes(), provenance);
    }

    private static BriefView.Latest latest(Series series, Findings findings, Formats f) {
        if (findings.recent().isEmpty()) {
            return null;
        }
        RecentPeriod last = findings.recent().get(findings.recent().size() - 1);
        if (last.value() == null || last.changePct() == null) {
            return null;
        }
        double pct = last.changePct();
        String direction = Math.abs(pct) < 0.05 ? "flat" : pct > 0 ? "up" : "down";
        boolean provisional = series.flags(series.size() - 1).contains(ValueFlag.PROVISIONAL)
                || series.flags(series.size() - 1).contains(ValueFlag.ESTIMATED);
        String yearEarlier = last.period().frequency() == Frequency.DAILY
                || last.period().frequency() == Frequency.BUSINESS_DAILY
                ? "the same weekday a year before (" + f.period(last.yearEarlierPeriod()) + ")"
                : f.period(last.yearEarlierPeriod());
        return new BriefView.Latest(f.atPeriod(last.period()), f.value(last.value()), yearEarlier,
                f.percent(Math.abs(pct)), direction, provisional);
    }

    private static BriefView.Row row(RecentPeriod r, Formats f) {
        return new BriefView.Row(f.shortPeriod(r.period()), f.value(r.value()), f.value(r.yearEarlier()), f.signedValue(r.change()),
                f.signedPercent(r.changePct()), String.join("; ", r.flags()));
    }

    private static String listPeriods(List<Period> periods, Formats f) {
        List<String> words = periods.stream().limit(6).map(f::period).toList();
        String list = String.join(", ", words);
        return periods.size() > 6 ? list + " and " + (periods.size() - 6) + " more" : list;
    }

    private static String capitalise(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
