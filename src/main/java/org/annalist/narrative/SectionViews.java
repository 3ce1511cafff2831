package org.annalist.narrative;

import java.util.ArrayList;
import java.util.List;
import org.annalist.findings.BreakFinding;
import org.annalist.findings.CycleFinding;
import org.annalist.findings.Episode;
import org.annalist.findings.FigurePlan;
import org.annalist.findings.Findings;
import org.annalist.findings.IndicatorsFinding;
import org.annalist.findings.CalendarFinding;
import org.annalist.findings.OutlierFinding;
import org.annalist.findings.Decomposition;
import org.annalist.findings.DecisionRules;
import org.annalist.findings.Direction;
import org.annalist.findings.IrregularFinding;
import org.annalist.findings.Measure;
import org.annalist.findings.SeasonVerdict;
import org.annalist.findings.Side;
import org.annalist.findings.SeasonalityFinding;
import org.annalist.findings.TrendFinding;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/** The views of the brief's sections "what the series is doing", formatted from the findings. */
final class SectionViews {

    /** Monte Carlo p-values cannot go below 1 / (replications + 1). */
    private static final double BREAK_P_FLOOR = 0.002;

    private final Series series;
    private final Findings findings;
    private final FigurePlan plan;
    private final Formats f;

    SectionViews(Series series, Findings findings, FigurePlan plan, Formats f) {
        this.series = series;
        this.findings = findings;
        this.plan = plan;
        this.f = f;
    }

    BriefView.TrendView trend() {
        TrendFinding t = findings.trend();
        if (!t.assessed()) {
            return new BriefView.TrendView(false, false, false, "", "", "", "", "", "", "", "", "",
                    Terms.trendNotAssessed(), null, null);
        }
        BriefView.SinceBreak since = t.latestRegime().map(r -> new BriefView.SinceBreak(f.period(r.since()),
                r.direction() == Direction.INCREASING, r.direction() == Direction.DECREASING,
                f.signedSignificant(r.slopePerYear()), f.significant(r.lower95()), f.significant(r.upper95()),
                f.pValue(r.pValue()))).orElse(null);
        String kendall = t.seasonalKendall().map(k -> Terms.test(k.test()) + " z = " + f.fixed(k.statistic(), 2) + ", "
                + f.pValue(k.pValue())).orElse(null);
        return new BriefView.TrendView(true, t.direction() == Direction.INCREASING, t.direction() == Direction.DECREASING,
                Terms.trendTest(t.test()), f.fixed(t.statistic(), 2), f.pValue(t.pValue()),
                f.signedSignificant(t.slopePerYear()), f.significant(Math.abs(t.slopePerYear())),
                f.significant(t.slopeCi95().get(0)),
                f.significant(t.slopeCi95().get(1)),
                t.changePctPerYear() == null ? "" : f.signedFixed(t.changePctPerYear(), 1) + "\u00A0%", Terms.trendBasis(t.test()), null,
                since, kendall);
    }

    BriefView.SeasonView season() {
        SeasonalityFinding s = findings.seasonality();
        SeasonVerdict verdict = s.verdict();
        String formReason = Terms.formReason(findings.form().reason());
        String years = String.valueOf(DecisionRules.MIN_YEARS_FOR_SEASON);
        if (verdict == SeasonVerdict.NOT_APPLICABLE || verdict == SeasonVerdict.TOO_SHORT) {
            return new BriefView.SeasonView(false, false, verdict == SeasonVerdict.TOO_SHORT,
                    verdict == SeasonVerdict.NOT_APPLICABLE, s.period() == null ? "" : String.valueOf(s.period()), "", "",
                    "", "", "", "", "", "", "", "", "", s.multiplicative(), false, formReason, years);
        }
        boolean multiplicative = s.multiplicative();
        SeasonalityFinding.ProfilePoint peak = extreme(s, true);
        SeasonalityFinding.ProfilePoint trough = extreme(s, false);
        return new BriefView.SeasonView(verdict == SeasonVerdict.PRESENT, verdict == SeasonVerdict.NEGLIGIBLE, false,
                false, String.valueOf(s.period()), f.fixed(s.strength(), 2), Terms.seasonalStrength(s.strength()),
                Terms.test(s.test()), f.fixed(s.statistic(), 1), f.pValue(s.pValue()), f.seasonName(series.frequency(), peak.position()),
                index(peak.index(), multiplicative), f.seasonName(series.frequency(), trough.position()), index(trough.index(), multiplicative),
                multiplicative ? f.fixed(s.swing(), 0) : f.significant(s.swing()),
                multiplicative ? "%" : series.unit(), multiplicative, s.changed(), formReason, years);
    }

    BriefView.CycleView cycle() {
        CycleFinding c = findings.cycle();
        return new BriefView.CycleView(c.present(), c.length() == null ? "" : f.fixed(c.length(), 1), c.regular(),
                c.peaks().stream().map(f::period).toList(), c.spectralPeriod() == null ? "" : f.fixed(c.spectralPeriod(), 1),
                c.pValue() == null ? "" : f.pValue(c.pValue()), Terms.cycleReason(c));
    }

    List<BriefView.OutlierRow> outliers() {
        List<BriefView.OutlierRow> rows = new ArrayList<>();
        boolean calendarAllowed = findings.calendar() != null
                && findings.calendar().effects().stream().anyMatch(CalendarFinding.Effect::kept);
        for (OutlierFinding o : findings.outliers()) {
            rows.add(new BriefView.OutlierRow(f.period(series.period(o.index())), f.value(o.observed()),
                    f.value(o.expected()), f.signedPercent(o.deviationPct()), f.fixed(Math.abs(o.score()), 1),
                    o.direction() == Side.ABOVE, o.calendar() == null ? ""
                    : CalendarSentences.outlier(series.period(o.index()), o.calendar()), calendarAllowed));
        }
        return rows;
    }

    List<BriefView.BreakRow> breaks() {
        List<BriefView.BreakRow> rows = new ArrayList<>();
        for (BreakFinding b : findings.breaks()) {
            rows.add(new BriefView.BreakRow(f.period(b.period()), f.period(b.ci95().get(0)),
                    f.period(b.ci95().get(1)), f.value(b.levelBefore()), f.value(b.levelAfter()),
                    f.signedPercent(b.changePct()), b.changePct() > 0, f.fixed(b.statistic(), 1),
                    f.pValue(b.pValue(), BREAK_P_FLOOR), b.provisional()));
        }
        return rows;
    }

    List<BriefView.EpisodeView> episodes() {
        List<BriefView.EpisodeView> views = new ArrayList<>();
        for (Episode e : findings.episodes()) {
            views.add(new BriefView.EpisodeView(f.period(e.start()), e.recovery().map(f::period).orElse(null),
                    f.period(e.lowPoint()), f.value(e.lowValue()),
                    f.fixed(Math.min(100, 100 * e.regainedShare()), 0) + "\u00A0%"));
        }
        return views;
    }

    BriefView.IrregularView irregular() {
        IrregularFinding irregular = findings.irregular();
        return irregular.share() == null ? new BriefView.IrregularView(null, "", false)
                : new BriefView.IrregularView(irregular.size().code(), f.fixed(100 * irregular.share(), 0) + "\u00A0%",
                irregular.size() == IrregularFinding.Size.LARGE);
    }

    BriefView.Charts charts() {
        double[] trend = findings.decomposition().map(Decomposition::trendCycle)
                .orElse(findings.smoothing() != null ? findings.smoothing().trendCycle() : series.values());
        int first = firstFinite(trend);
        int last = lastFinite(trend);
        return new BriefView.Charts(chart(FigurePlan.Chart.OVERVIEW), chart(FigurePlan.Chart.PROFILE),
                chart(FigurePlan.Chart.YEARS), chart(FigurePlan.Chart.IRREGULAR),
                String.valueOf(series.period(first).year()), String.valueOf(series.period(last).year()),
                f.significant(trend[first]), f.significant(trend[last]), trend[last] > trend[first],
                BriefViews.dropYears(series, findings.breaks()),
                findings.smoothing() == null ? "" : Terms.movingAverage(findings.smoothing().method()),
                findings.smoothing() == null ? 0 : findings.smoothing().window());
    }

    private BriefView.ChartView chart(FigurePlan.Chart chart) {
        return new BriefView.ChartView(chart.id(), plan.shows(chart));
    }

    BriefView.ThisPeriod thisPeriod() {
        IndicatorsFinding i = findings.indicators();
        if (i == null) {
            return new BriefView.ThisPeriod(false, false, "", "", "", "", "", "", "", false, false, "", List.of(), false);
        }
        boolean level = i.measure() != Measure.FLOW;
        IndicatorsFinding.Span ytd = i.yearToDate();
        IndicatorsFinding.Span rolling = i.rollingYear();
        Period period = i.period();
        String rank = "";
        if (i.rank().of() >= 3 && series.frequency() != Frequency.ANNUAL) {
            String position = i.rank().position() == 1 ? "the highest" : i.rank().position() == i.rank().of() ? "the lowest"
                    : "the " + ordinal(i.rank().position()) + " highest";
            rank = position + " " + seasonName(period) + " of the " + i.rank().of() + " in the data";
        }
        return new BriefView.ThisPeriod(true, level,
                ytd == null ? "" : f.period(ytd.from()), ytd == null ? "" : f.period(ytd.to()),
                ytd == null ? "" : change(ytd, level), ytd == null ? "" : f.value(ytd.total()),
                rolling == null ? "" : change(rolling, level), rolling == null ? "" : f.value(rolling.total()), rank,
                i.record() == IndicatorsFinding.Extreme.HIGH, i.record() == IndicatorsFinding.Extreme.LOW,
                i.seasonallyAdjustedChangePct() == null || !BriefViews.positive(series) ? ""
                        : f.signedPercent(i.seasonallyAdjustedChangePct()),
                findings.calendar() == null ? List.of()
                        : findings.calendar().notes().stream().map(CalendarSentences::of).toList(), !i.flagged().isEmpty());
    }

    /** A change as a brief states it: % for flows, the measure's own units for levels and rates. */
    private String change(IndicatorsFinding.Span s, boolean level) {
        if (level || !BriefViews.positive(series)) {
            return f.signedValue(s.change()) + (series.unit().equals("%") ? " percentage points"
                    : series.unit().isEmpty() ? "" : " " + series.unit());
        }
        return s.changePct() == null ? "" : f.signedPercent(s.changePct());
    }

    private static String ordinal(int n) {
        String suffix = n % 100 >= 11 && n % 100 <= 13 ? "th" : n % 10 == 1 ? "st" : n % 10 == 2 ? "nd" : n % 10 == 3 ? "rd" : "th";
        return n + suffix;
    }

    /** "October", "Q3", "Monday": the season a period's rank compares it within. */
    private String seasonName(Period p) {
        return p.frequency() == Frequency.MONTHLY ? f.seasonName(p.frequency(), p.seasonalPosition())
                : p.frequency() == Frequency.QUARTERLY ? p.seasonLabel() : "week " + p.seasonalPosition();
    }

    List<BriefView.KeyFigure> keyFigures(BriefView.Lead lead, BriefView.ThisPeriod period) {
        List<BriefView.KeyFigure> figures = new ArrayList<>();
        figures.add(new BriefView.KeyFigure(lead.period(), lead.value().isEmpty() ? "\u2013" : lead.value(),
                lead.comparable() ? (lead.down() ? "\u2212" : "+") + lead.changePercent()
                        + " on a year earlier" : "no comparison with a year earlier"));
        if (period.available() && !period.ytdChange().isEmpty()) {
            figures.add(new BriefView.KeyFigure("Year to date", period.ytdChange(),
                    period.ytdFrom() + " to " + period.ytdTo() + " against a year earlier"));
        } else {
            BriefView.SeasonView s = season();
            figures.add(new BriefView.KeyFigure("Seasonal peak", s.present() ? s.peak() : "none claimed",
                    s.present() ? s.peakIndex() + " against the yearly average; low in " + s.trough()
                            : s.notApplicable() ? "annual data" : "no meaningful seasonal pattern"));
        }
        BriefView.TrendView t = trend();
        figures.add(new BriefView.KeyFigure("Trend", !t.assessed() || !t.rising() && !t.falling() ? "no clear trend"
                : (t.percentPerYear().isEmpty() ? t.slopePerYear() : t.percentPerYear()) + " a year", t.assessed() ? "Sen slope " + t.slopePerYear() + " a year, " + t.pValue()
                : "too few values"));
        int breaks = findings.breaks().size();
        int outliers = findings.outliers().size();
        String unusual = breaks == 0 && outliers == 0 ? "none"
                : (breaks == 0 ? "no" : String.valueOf(breaks)) + " " + (breaks == 1 ? "break" : "breaks") + ", "
                        + (outliers == 0 ? "no" : String.valueOf(outliers)) + " " + (outliers == 1 ? "one-off" : "one-offs");
        figures.add(new BriefView.KeyFigure("Unusual periods", unusual,
                breaks == 0 ? "no structural change found" : "latest break " + f.period(series.period(
                findings.breaks().get(breaks - 1).index()))));
        return figures;
    }

    private String index(double value, boolean multiplicative) {
        return multiplicative ? f.signedFixed(value, 0) + "\u00A0%" : f.signedSignificant(value)
                + (series.unit().isEmpty() ? "" : " " + series.unit());
    }

    private static SeasonalityFinding.ProfilePoint extreme(SeasonalityFinding s, boolean highest) {
        SeasonalityFinding.ProfilePoint best = s.profile().get(0);
        for (SeasonalityFinding.ProfilePoint p : s.profile()) {
            if (highest ? p.index() > best.index() : p.index() < best.index()) {
                best = p;
            }
        }
        return best;
    }

    private static int firstFinite(double[] x) {
        for (int i = 0; i < x.length; i++) {
            if (!Double.isNaN(x[i])) {
                return i;
            }
        }
        return 0;
    }

    private static int lastFinite(double[] x) {
        for (int i = x.length - 1; i >= 0; i--) {
            if (!Double.isNaN(x[i])) {
                return i;
            }
        }
        return x.length - 1;
    }
}
