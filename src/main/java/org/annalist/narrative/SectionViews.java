package org.annalist.narrative;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.findings.BreakFinding;
import org.annalist.findings.CycleFinding;
import org.annalist.findings.FigurePlan;
import org.annalist.findings.FormChoice;
import org.annalist.findings.Findings;
import org.annalist.findings.IndicatorsFinding;
import org.annalist.findings.CalendarFinding;
import org.annalist.findings.OutlierFinding;
import org.annalist.findings.Decomposition;
import org.annalist.findings.DecisionRules;
import org.annalist.findings.Direction;
import org.annalist.findings.IrregularFinding;
import org.annalist.findings.SeasonVerdict;
import org.annalist.findings.Side;
import org.annalist.findings.SeasonalityFinding;
import org.annalist.findings.Transform;
import org.annalist.findings.TrendFinding;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/** The views of the brief's sections "what the series is doing", formatted from the findings. */
final class SectionViews {

    /** Monte Carlo p-values cannot go below 1 / (replications + 1). */
    static final double BREAK_P_FLOOR = 0.002;

    private final Series series;
    private final Findings findings;
    private final FigurePlan plan;
    private final Formats f;
    private final MeasureWords measure;

    SectionViews(Series series, Findings findings, FigurePlan plan, Formats f) {
        this.series = series;
        this.findings = findings;
        this.plan = plan;
        this.f = f;
        this.measure = MeasureWords.of(series, findings, f);
    }

    BriefView.TrendView trend() {
        TrendFinding t = findings.trend();
        if (!t.assessed()) {
            return new BriefView.TrendView(false, false, false, "", "", "", "", "", "", "", "", "",
                    Terms.trendNotAssessed(), null, null, measure.differenceUnit(), slopeTime(), "");
        }
        BriefView.SinceBreak since = t.latestRegime().map(r -> new BriefView.SinceBreak(f.period(r.since()),
                r.direction() == Direction.INCREASING, r.direction() == Direction.DECREASING,
                f.signedSignificant(r.slopePerYear()), f.significant(r.lower95()), f.significant(r.upper95()),
                f.pValue(r.pValue()), r.changePctPerYear() == null || !measure.percent() ? ""
                : f.signedPercent(r.changePctPerYear()) + regimeRateBasis(findings), yearTotal(r.slopePerYear())))
                .orElse(null);
        String kendall = t.seasonalKendall().map(k -> Terms.test(k.test()) + " z = " + f.fixed(k.statistic(), 2) + ", "
                + f.pValue(k.pValue())).orElse(null);
        return new BriefView.TrendView(true, t.direction() == Direction.INCREASING, t.direction() == Direction.DECREASING,
                Terms.trendTest(t.test()), f.fixed(t.statistic(), 2), f.pValue(t.pValue()),
                f.signedSignificant(t.slopePerYear()), f.significant(Math.abs(t.slopePerYear())),
                f.significant(t.slopeCi95().get(0)),
                f.significant(t.slopeCi95().get(1)),
                t.changePctPerYear() == null || !measure.percent() ? "" : f.signedFixed(t.changePctPerYear(), 1) + "\u00A0%",
                Terms.trendBasis(t.test()), null, since, kendall, measure.differenceUnit(), slopeTime(),
                yearTotal(t.slopePerYear()));
    }

    /** A flow's slope as the year's total's change ({@link MeasureWords#yearTotal}); empty for other measures. */
    private String yearTotal(double slopePerYear) {
        return MeasureWords.yearTotal(slopePerYear, measure.measure(), series.frequency(), measure.differenceUnit(), f);
    }

    /**
     * What the latest regime's rate in % is of, said after it: a compound rate a year for a series
     * worked in logs, else a share of the latest year's level
     * ({@link TrendFinding.LatestRegime#changePctPerYear()}).
     */
    static String regimeRateBasis(Findings findings) {
        return findings.transform() == Transform.LOG ? " a year" : " a year of the latest year's average level";
    }

    /** What a slope in the series' units is counted over: {@code a year}, or {@code a year in each month's total} for a flow. */
    private String slopeTime() {
        return MeasureWords.slopeTime(measure.measure(), series.frequency());
    }

    BriefView.SeasonView season() {
        SeasonalityFinding s = findings.seasonality();
        SeasonVerdict verdict = s.verdict();
        String formReason = Terms.formReason(findings.form().reason());
        String years = String.valueOf(DecisionRules.MIN_YEARS_FOR_SEASON);
        if (verdict == SeasonVerdict.NOT_APPLICABLE || verdict == SeasonVerdict.TOO_SHORT) {
            return new BriefView.SeasonView(false, false, verdict == SeasonVerdict.TOO_SHORT,
                    verdict == SeasonVerdict.NOT_APPLICABLE, s.period() == null ? "" : String.valueOf(s.period()), "", "",
                    "", "", "", "", "", "", "", "", "", s.multiplicative(), false, formReason, years, formFromMeasure());
        }
        boolean multiplicative = s.multiplicative();
        SeasonalityFinding.ProfilePoint peak = extreme(s, true);
        SeasonalityFinding.ProfilePoint trough = extreme(s, false);
        String[] peakWords = peakWords(s, peak, multiplicative);
        return new BriefView.SeasonView(verdict == SeasonVerdict.PRESENT, verdict == SeasonVerdict.NEGLIGIBLE, false,
                false, String.valueOf(s.period()), f.fixed(s.strength(), 2), Terms.seasonalStrength(s.strength()),
                Terms.test(s.test()), f.fixed(s.statistic(), 1), f.pValue(s.pValue()), peakWords[0],
                peakWords[1], printedEqual(s, trough, multiplicative), index(trough.index(), multiplicative),
                multiplicative ? f.fixed(s.swing(), 0) : f.significant(s.swing()),
                multiplicative ? "%" : series.unit(), multiplicative, s.changed(), formReason, years, formFromMeasure());
    }

    /** The additive form follows from something other than a swing seen not to grow (the measure, a level too stable to tell). */
    private boolean formFromMeasure() {
        // only a swing seen not to grow with the level says "keeps its size"; every other reason is given as it is
        return findings.form().reason() != FormChoice.Reason.SWING_INDEPENDENT_OF_LEVEL;
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
                    f.value(o.expected()), measure.signedChange(o.observed() - o.expected(), o.deviationPct()),
                    f.fixed(Math.abs(o.score()), 1),
                    o.direction() == Side.ABOVE, o.calendar() == null ? ""
                    : CalendarSentences.outlier(series.period(o.index()), o.calendar()), calendarAllowed,
                    breakAround(o.period()).map(b -> f.period(b.period())).orElse("")));
        }
        return rows;
    }

    /** The structural change whose 95 % interval holds {@code period}, if any (the latest such). */
    private Optional<BreakFinding> breakAround(Period period) {
        return findings.breaks().stream()
                .filter(b -> b.ci95().get(0).compareTo(period) <= 0 && period.compareTo(b.ci95().get(1)) <= 0)
                .reduce((first, second) -> second);
    }

    BriefView.IrregularView irregular() {
        IrregularFinding irregular = findings.irregular();
        return irregular.share() == null ? new BriefView.IrregularView(null, "", false, "")
                : new BriefView.IrregularView(irregular.size().code(), roughShare(irregular.share()),
                irregular.size() == IrregularFinding.Size.LARGE, leftOutNearBreaks(irregular, findings.breaks().size(), series.frequency()));
    }

    /**
     * The periods the irregular share leaves out around structural changes, said after "leaving
     * out": {@code the 41 months around its structural changes (10 on each side), where the trend
     * is still following the new level}; {@code up to 10 on each side, each month counted once} where
     * windows overlap or the series' ends cut them, so that the count is not read as a slip; empty
     * when none.
     */
    static String leftOutNearBreaks(IrregularFinding irregular, int breaks, Frequency frequency) {
        int n = irregular.leftOutNearBreaks();
        if (n == 0) {
            return "";
        }
        String around = n == breaks * 2 * irregular.reach() ? irregular.reach() + " on each side"
                : "up to " + irregular.reach() + " on each side, each " + Terms.periodName(frequency, false)
                + " counted once";
        return (n == 1 ? "the one " : "the " + n + " ") + Terms.periodName(frequency, n != 1) + " around its structural "
                + "change" + (breaks > 1 ? "s" : "") + " (" + around + "), where the trend is still"
                + " following the new level";
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
                findings.smoothing() == null ? 0 : findings.smoothing().window(),
                ChartWords.leadBeforeSuddenChange(series, findings), ChartWords.gapsInLines(series, findings, f),
                ChartWords.overviewMarks(series, findings, f));
    }

    private BriefView.ChartView chart(FigurePlan.Chart chart) {
        return new BriefView.ChartView(chart.id(), plan.shows(chart));
    }

    BriefView.ThisPeriod thisPeriod() {
        IndicatorsFinding i = findings.indicators();
        if (i == null) {
            return new BriefView.ThisPeriod(false, false, "", "", "", "", "", "", "", false, false, "", false, List.of(), false);
        }
        boolean level = !i.measure().summed();
        IndicatorsFinding.Span ytd = i.yearToDate();
        IndicatorsFinding.Span rolling = i.rollingYear();
        Period period = i.period();
        String rank = "";
        if (i.rank().of() >= 3 && series.frequency() != Frequency.ANNUAL) {
            // a value another year's same period equals shares its rank, and is said to: "the equal highest"
            IndicatorsFinding.Rank r = i.rank();
            String the = r.tiedWith().isEmpty() ? "the " : "the equal ";
            String position = r.position() == 1 ? the + "highest" : r.lowest() ? the + "lowest"
                    : the + ordinal(r.position()) + " highest";
            rank = position + " " + seasonName(period) + " of the " + r.of() + " in the data"
                    + (r.tiedWith().isEmpty() ? "" : ", with " + periods(r.tiedWith()));
            IndicatorsFinding.EqualRecord tie = i.equalRecord();
            if (tie != null) {
                rank += ", and equal to the " + (tie.extreme() == IndicatorsFinding.Extreme.HIGH ? "highest" : "lowest")
                        + " value of the whole series, that of " + periods(tie.with());
            }
        }
        return new BriefView.ThisPeriod(true, level,
                ytd == null ? "" : f.period(ytd.from()), ytd == null ? "" : f.period(ytd.to()),
                ytd == null ? "" : change(ytd), ytd == null ? "" : f.value(ytd.total()),
                rolling == null ? "" : change(rolling), rolling == null ? "" : f.value(rolling.total()), rank,
                i.record() == IndicatorsFinding.Extreme.HIGH, i.record() == IndicatorsFinding.Extreme.LOW,
                i.seasonallyAdjustedChangePct() == null || !BriefViews.positive(series) || oneOffAtTheEnd() ? ""
                        : f.signedPercent(i.seasonallyAdjustedChangePct()), i.adjustedForCalendar(),
                findings.calendar() == null ? List.of()
                        : findings.calendar().notes().stream().map(CalendarSentences::of).map(Typography::printed).toList(), !i.flagged().isEmpty());
    }

    /**
     * Whether the latest period or the one before it is a one-off: the seasonally adjusted change
     * between them would then measure the one-off, not the level, so it is not stated.
     */
    private boolean oneOffAtTheEnd() {
        Period last = series.end();
        return findings.outliers().stream().anyMatch(o -> o.period().equals(last) || o.period().equals(last.plus(-1)));
    }

    /** A change as a brief states it: in %, percentage points or the series' units, by {@link MeasureWords}. */
    private String change(IndicatorsFinding.Span s) {
        return measure.percent() && s.changePct() == null ? "" : measure.signedChange(s.change(), s.changePct());
    }

    /** Periods in words, listed: {@code October 2019 and October 2022}; beyond three, the first two and how many more. */
    private String periods(List<Period> periods) {
        List<String> words = periods.stream().map(f::period).toList();
        return words.size() <= 3 ? Terms.listed(words)
                : String.join(", ", words.subList(0, 2)) + " and " + (words.size() - 2) + " more";
    }

    private static String ordinal(int n) {
        String suffix = n % 100 >= 11 && n % 100 <= 13 ? "th" : n % 10 == 1 ? "st" : n % 10 == 2 ? "nd" : n % 10 == 3 ? "rd" : "th";
        return n + suffix;
    }

    /** "October", "Q3", "Monday": the season a period's rank compares it within. */
    private String seasonName(Period p) {
        return p.frequency() == Frequency.MONTHLY || p.frequency() == Frequency.HALF_YEARLY
                ? f.seasonName(p.frequency(), p.seasonalPosition())
                : p.frequency() == Frequency.QUARTERLY ? p.seasonLabel() : "week " + p.seasonalPosition();
    }

    List<BriefView.KeyFigure> keyFigures(BriefView.Lead lead, BriefView.ThisPeriod period) {
        List<BriefView.KeyFigure> figures = new ArrayList<>();
        ClaimWords words = new ClaimWords(findings.claims(), f, series.unit(), measure.measure());
        figures.add(new BriefView.KeyFigure(lead.period(), lead.value().isEmpty() ? "\u2013" : lead.value(),
                !lead.comparable() ? "no comparison with a year earlier"
                        : lead.calendarLead().isEmpty() ? words.latestNote()
                        : CalendarLead.of(findings).tileNote(words, findings.claims())));
        if (period.available() && !period.ytdChange().isEmpty()) {
            IndicatorsFinding.Span ytd = findings.indicators().yearToDate();
            figures.add(new BriefView.KeyFigure("Year to date", measure.percent() ? period.ytdChange()
                    : measure.signedShort(ytd.change()),
                    period.ytdFrom() + " to " + period.ytdTo() + " against a year earlier"));
        } else {
            BriefView.SeasonView s = season();
            figures.add(new BriefView.KeyFigure("Seasonal peak", s.present() ? s.peak() : "none claimed",
                    s.present() ? s.peakIndex() + " against the yearly average; low in " + s.trough()
                            : s.notApplicable() ? "annual data" : "no meaningful seasonal pattern"));
        }
        // the latest regime's slope, named with its span; the whole period's stays in the trend section
        String[] trend = words.trendTile();
        figures.add(new BriefView.KeyFigure("Trend", trend[0], trend[1]));
        int breaks = findings.breaks().size();
        int outliers = findings.outliers().size();
        String unusual = breaks == 0 && outliers == 0 ? "none"
                : (breaks == 0 ? "no" : String.valueOf(breaks)) + " " + (breaks == 1 ? "break" : "breaks") + ", "
                        + (outliers == 0 ? "no" : String.valueOf(outliers)) + " " + (outliers == 1 ? "one\u2011off" : "one\u2011offs");   // a non-breaking hyphen: a narrow tile must not split the word
        figures.add(new BriefView.KeyFigure("Unusual periods", unusual,
                breaks == 0 ? "no structural change found" : "latest break " + f.period(series.period(
                findings.breaks().get(breaks - 1).index()))));
        return figures;
    }

    private String index(double value, boolean multiplicative) {
        return multiplicative ? f.signedFixed(value, 0) + "\u00A0%" : f.signedSignificant(value)
                + measure.differenceUnit();
    }

    /** "about 12 %"; a share that rounds to 0 or 100 % is "under 1 %" or "over 99 %", never "about 0 %". */
    private String roughShare(double share) {
        double pct = 100 * share;
        return pct < 0.5 ? "under 1\u00A0%" : pct >= 99.5 ? "over 99\u00A0%" : "about " + f.fixed(pct, 0) + "\u00A0%";
    }

    /**
     * The extreme's season, with every other season whose index prints the same ("July and August"):
     * naming one of two seasons the reader sees as equal would single it out on a difference the
     * brief does not show.
     */
    private String printedEqual(SeasonalityFinding s, SeasonalityFinding.ProfilePoint extreme, boolean multiplicative) {
        String printed = index(extreme.index(), multiplicative);
        return Terms.listed(s.profile().stream().filter(p -> index(p.index(), multiplicative).equals(printed))
                .map(p -> (series.frequency() == Frequency.HALF_YEARLY ? "the " : "")   // "peaks in the first half"
                        + f.seasonName(series.frequency(), p.position())).toList());
    }

    /**
     * The peak's season(s) and index(es): one season only where it was above the runner-up in most
     * years ({@link PeakEvidence}); else both, in calendar order, "July–August" with "+4,810 and +5,140".
     */
    private String[] peakWords(SeasonalityFinding s, SeasonalityFinding.ProfilePoint peak, boolean multiplicative) {
        String named = printedEqual(s, peak, multiplicative);
        Optional<PeakEvidence> evidence = PeakEvidence.of(series, s.profile());
        if (evidence.isEmpty() || evidence.get().singlePeak() || !named.equals(seasonName(peak))) {
            return new String[] {named, index(peak.index(), multiplicative)};
        }
        SeasonalityFinding.ProfilePoint other = evidence.get().runnerUp();
        int n = s.profile().size();
        boolean otherFirst = (other.position() % n) + 1 == peak.position()
                || (other.position() < peak.position() && (peak.position() % n) + 1 != other.position());
        SeasonalityFinding.ProfilePoint a = otherFirst ? other : peak;
        SeasonalityFinding.ProfilePoint b = otherFirst ? peak : other;
        boolean adjacent = (a.position() % n) + 1 == b.position();
        return new String[] {seasonName(a) + (adjacent ? "\u2013" : " and ") + seasonName(b),
                index(a.index(), multiplicative) + " and " + index(b.index(), multiplicative)};
    }

    private String seasonName(SeasonalityFinding.ProfilePoint p) {
        return f.seasonName(series.frequency(), p.position());
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
