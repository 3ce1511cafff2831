package org.annalist.narrative;

import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;
import org.annalist.findings.BreakFinding;
import org.annalist.findings.CalendarFinding;
import org.annalist.findings.Claim;
import org.annalist.findings.Claims;
import org.annalist.findings.Caveat;
import org.annalist.findings.Transform;
import org.annalist.findings.CalendarNote;
import org.annalist.findings.IndicatorsFinding;
import org.annalist.findings.Measure;
import org.annalist.findings.CycleFinding;
import org.annalist.findings.FormChoice;
import org.annalist.findings.Episode;
import org.annalist.findings.Findings;
import org.annalist.findings.OutlookFinding;
import org.annalist.findings.OutlierFinding;
import org.annalist.findings.SeasonalityFinding;
import org.annalist.findings.SeriesFacts;
import org.annalist.findings.TrendFinding;
import org.annalist.series.Frequency;
import org.annalist.series.Period;

/** The text form of {@code analyze}: one line per finding with its evidence, as an analyst's notes. */
public final class AnalystNotes {

    private AnalystNotes() {
    }

    public static String of(Findings f) {
        StringBuilder out = new StringBuilder();
        SeriesFacts s = f.series();
        line(out, "series", "'%s'%s, %s, %s to %s, %d periods, %d missing%s", s.name(),
                s.unit() == null ? "" : " (" + s.unit() + ")", s.frequency(), s.start(), s.end(), s.observations(),
                s.missing(), s.measure() == null ? "" : "; treated as " + s.measure().code() + switch (s.measure()) {
                    case FLOW -> " (summed over spans)";
                    case LEVEL -> " (averaged over spans)";
                    case RATIO -> " (ratio of the parts' sums over spans)";
                    case RATE -> " (averaged over spans; changes in points, not %)";
                    case INTERVAL -> " (averaged over spans; zero arbitrary: changes in units, no % and no totals)";
                });
        claims(out, f);
        FormChoice form = f.form();
        line(out, "form", "%s%s: %s%s", form.form().code(), f.transform() == Transform.LOG ? " (worked in logs)" : "",
                Terms.formReason(form.reason()), form.elasticity() == null ? ""
                        : String.format(Locale.ROOT, " (elasticity of swing to level %.2f over %d years, level ratio %.2f)",
                        form.elasticity(), form.cycles(), form.levelRatio()));
        line(out, "trend", "%s", trend(f.trend(), slopeTime(f)));
        f.trend().latestRegime().ifPresent(latest -> line(out, "since break",
                "%s since %s: Sen slope %s %s (95%% CI %s to %s), %s", Terms.direction(latest.direction()),
                latest.since().label(), num(latest.slopePerYear()), slopeTime(f), num(latest.lower95()), num(latest.upper95()),
                p(latest.pValue())));
        line(out, "seasonality", "%s", seasonality(f.seasonality(), MeasureWords.measureOf(f).relativeChanges()));
        line(out, "cycle", "%s", cycle(f.cycle()));
        if (f.breaks().isEmpty()) {
            line(out, "breaks", "none (%s)", Terms.breakMethod(f.breakMethod()));
        }
        Frequency frequency = Frequency.fromLabel(f.series().frequency());
        List<RegimeRates.Regime> regimes = RegimeRates.regimes(f.breaks(), frequency, f.transform() == Transform.LOG);
        for (int j = 0; j < f.breaks().size(); j++) {
            BreakFinding b = f.breaks().get(j);
            String interval = b.ci95().get(0).equals(b.ci95().get(1)) ? b.ci95().get(0) + " only"
                    : b.ci95().get(0) + " to " + b.ci95().get(1);
            line(out, "break", "%s (95%% interval %s): %s; fitted lines at the break %s → %s (%s), slope %s"
                            + "; sup-F %.1f, %s%s", b.period(), interval, Terms.breakKind(b.kind()),
                    num(b.levelBefore()), num(b.levelAfter()), change(f, b.levelAfter() - b.levelBefore(), b.changePct()),
                    slopes(f, regimes.get(j), regimes.get(j + 1)), b.statistic(), p(b.pValue()),
                    b.provisional() ? "; provisional" : "");
        }
        if (f.breaks().size() > 1) {
            BreakFinding first = f.breaks().get(0);
            BreakFinding last = f.breaks().get(f.breaks().size() - 1);
            line(out, "breaks overall", "fitted level %s just before %s → %s in %s (%s, ratio of the levels)",
                    num(first.levelBefore()), first.period(), num(last.endLevel()), last.regimeEnd(),
                    change(f, last.endLevel() - first.levelBefore(), 100 * (last.endLevel() / first.levelBefore() - 1)));
        }
        for (Episode e : f.episodes()) {
            line(out, "episode", "%s %.1f %% from %s (%s → %s by %s), then moved back %s (%.0f %% of the step) by %s",
                    e.rise() ? "rose" : "fell", Math.abs(e.stepPct()), e.start(), num(e.before()), num(e.extremeLevel()),
                    e.extreme(), Terms.shareOfTheWay(e.returnedShare()), 100 * e.returnedShare(), e.asOf());
        }
        if (!f.breaks().isEmpty()) {
            line(out, "break method", "%s", Terms.breakMethod(f.breakMethod()));
        }
        if (f.outliers().isEmpty()) {
            line(out, "outliers", "none");
        }
        for (OutlierFinding o : f.outliers()) {
            line(out, "outlier", "%s: %s against %s expected (%s), score %.1f%s", o.period(), num(o.observed()),
                    num(o.expected()), change(f, o.observed() - o.expected(), o.deviationPct()), o.score(),
                    o.calendar() == null ? "" : "; " + CalendarSentences.outlier(o.period(), o.calendar()));
        }
        IndicatorsFinding i = f.indicators();
        if (i != null) {
            line(out, "latest", "%s: %s (%s)%s%s%s", i.period(), num(i.value()), i.measure().code(),
                    i.samePeriodLastYear() == null ? "" : String.format(Locale.ROOT, "; a year earlier %s, %s",
                            num(i.samePeriodLastYear().value()),
                            change(f, i.samePeriodLastYear().change(), i.samePeriodLastYear().changePct())),
                    i.yearToDate() == null ? "" : String.format(Locale.ROOT, "; year to date %s",
                            change(f, i.yearToDate().change(), i.yearToDate().changePct())),
                    i.rollingYear() == null ? "" : String.format(Locale.ROOT, "; rolling year %s",
                            change(f, i.rollingYear().change(), i.rollingYear().changePct())));
            line(out, "latest rank", "%d of %d in the same period of each year%s%s%s%s", i.rank().position(), i.rank().of(),
                    i.rank().tiedWith().isEmpty() ? "" : " (equal with " + labels(i.rank().tiedWith()) + ")",
                    i.record() == null ? "" : "; record " + i.record().code(),
                    i.equalRecord() == null ? "" : "; equal record " + i.equalRecord().extreme().code() + " with "
                            + labels(i.equalRecord().with()),
                    i.seasonallyAdjustedChangePct() == null ? "" : "; seasonally adjusted " + pct(i.seasonallyAdjustedChangePct())
                            + " on the period before", i.flagged().isEmpty() ? "" : "; flagged " + String.join(", ", i.flagged()));
        }
        if (f.calendar() != null) {
            for (CalendarFinding.Effect e : f.calendar().effects()) {
                line(out, "calendar", "%s: %+.2f %% per unit, %s%s", e.name(), e.effectPct(), p(e.pValue()),
                        e.kept() ? " (kept)" : " (not significant)");
            }
            for (CalendarNote note : f.calendar().notes()) {
                line(out, "calendar note", "%s", CalendarSentences.of(note));
            }
        }
        line(out, "irregular", "%s", f.irregular().share() == null ? "not measured"
                : String.format(Locale.ROOT, "%s (share %.2f of the variation around the long-run trend%s)",
                f.irregular().size().code(), f.irregular().share(), f.irregular().leftOutNearBreaks() == 0 ? ""
                        : "; " + f.irregular().leftOutNearBreaks() + " periods within " + f.irregular().reach()
                        + " of a break left out, where the trend is still following it"));
        OutlookFinding o = f.outlook();
        if (o == null) {
            line(out, "outlook", "none");
        } else {
            OutlookFinding.Point first = o.forecasts().get(0);
            line(out, "outlook", "%s (%s), fitted from %s, %d periods ahead; %s: %s (80%% %s to %s)",
                    Terms.forecastModel(o.model()), Terms.choice(o.chosenBecause()), o.fittedFrom(), o.horizon(), first.period(), num(first.mean()), num(first.lo80()),
                    num(first.hi80()));
            if (o.nextYearTotal() != null) {
                line(out, "next year", "%d total %s (80%% %s to %s)", o.nextYear(), num(o.nextYearTotal().mean()),
                        num(o.nextYearTotal().lo80()), num(o.nextYearTotal().hi80()));
            }
            if (o.nextYearAverage() != null) {
                line(out, "next year", "%d average %s (80%% %s to %s)", o.nextYear(), num(o.nextYearAverage().mean()),
                        num(o.nextYearAverage().lo80()), num(o.nextYearAverage().hi80()));
            }
            OutlookFinding.CurrentYear c = o.currentYear();
            if (c != null) {
                line(out, "current year", "%d %s %s (80%% %s to %s): %d periods observed (%s), %d forecast", c.year(),
                        c.total() ? "total" : "average", num(c.estimate().mean()), num(c.estimate().lo80()),
                        num(c.estimate().hi80()), c.observedPeriods(), num(c.observed()), c.forecastPeriods());
            }
            OutlookFinding.YearChange change = o.nextYearChange();
            if (change != null) {
                line(out, "next year change", change.pct() == null ? "%d on %d: %s (80%% %s to %s)"
                                : "%d on %d: %s %% (80%% %s to %s)", change.year(), change.againstYear(),
                        change.pct() == null ? num(change.difference()) : num(change.pct()),
                        change.pct() == null ? num(change.differenceLo80()) : num(change.pctLo80()),
                        change.pct() == null ? num(change.differenceHi80()) : num(change.pctHi80()));
            }
            if (o.backtestFrom() != null) {
                line(out, "back-test span", "%s to %s%s", o.backtestFrom(), o.backtestTo(),
                        o.intervalsWidened() && o.intervalsNarrowed() ? "; intervals widened or narrowed to its errors"
                                : o.intervalsWidened() ? "; intervals widened to its errors"
                                : o.intervalsNarrowed() ? "; intervals narrowed to its errors" : "");
            }
            for (OutlookFinding.Score score : o.backtest()) {
                line(out, "back-test", "%s: MASE %.2f, sMAPE %.1f %%", score.method().code(), score.mase(),
                        score.smape());
            }
        }
        line(out, "smoothing", "%s", f.smoothing() == null ? "none (series shorter than one window)"
                : Terms.movingAverage(f.smoothing().method()));
        f.decomposition().ifPresent(d -> line(out, "decomposition", "%s", Terms.decomposition(d.method())));
        for (Caveat note : f.notes()) {
            line(out, "note", "%s", Terms.caveat(note));
        }
        return out.toString();
    }

    /**
     * The headline and every claim of the first page with what the consistency pass decided: the
     * same claims, in the same words for sizes, as the brief's lead and key figures.
     */
    private static void claims(StringBuilder out, Findings f) {
        Claims claims = f.claims();
        IndicatorsFinding i = f.indicators();
        double[] shown = i == null ? new double[0] : i.samePeriodLastYear() == null ? new double[] {i.value()}
                : new double[] {i.value(), i.samePeriodLastYear().value()};
        ClaimWords words = new ClaimWords(claims, Formats.forValues(shown, Locale.ENGLISH), f.series().unit(),
                MeasureWords.measureOf(f));
        line(out, "headline", "%s", f.recent().isEmpty() ? "none: the series is empty"
                : words.headline(f.recent().get(f.recent().size() - 1).period()));
        for (Claim c : claims.statements()) {
            String decided = c.withheld().map(w -> "; withheld (" + w.reason().code() + ": " + w.by().code() + ")")
                    .orElse(c.qualifications().isEmpty() ? "" : "; qualified (" + c.qualifications().stream()
                            .map(q -> q.reason().code() + ": " + q.by().code()).collect(Collectors.joining(", ")) + ")");
            line(out, "claim", "%s %s: %s, %s%s%s", c.quantity().code(),
                    c.from().equals(c.to()) ? c.from() : c.from() + " to " + c.to(), c.direction().code(),
                    words.signedSize(c), c.pValue().map(pv -> ", " + p(pv)).orElse(""), decided);
        }
    }

    /**
     * The slopes of the regimes either side of a break, in units a year ({@code 885.1 → 1167.6 a year
     * in each month's total}); a regime too short for a rate a year ({@link RegimeRates#lastsForARate})
     * by its length and the fitted levels at its ends ({@code over 21 months 23359.7 to 64016.3}).
     */
    private static String slopes(Findings f, RegimeRates.Regime before, RegimeRates.Regime after) {
        Frequency frequency = Frequency.fromLabel(f.series().frequency());
        boolean rateBefore = RegimeRates.lastsForARate(before.periods(), frequency);
        boolean rateAfter = RegimeRates.lastsForARate(after.periods(), frequency);
        if (rateBefore && rateAfter) {
            return num(before.slopePerYear()) + " → " + num(after.slopePerYear()) + " " + slopeTime(f);
        }
        return slope(f, before, rateBefore, frequency) + " → " + slope(f, after, rateAfter, frequency);
    }

    private static String slope(Findings f, RegimeRates.Regime r, boolean rate, Frequency frequency) {
        return rate ? num(r.slopePerYear()) + " " + slopeTime(f)
                : "over " + Terms.periods(r.periods(), frequency) + " " + num(r.startLevel()) + " to " + num(r.endLevel());
    }

    /** What the slopes in units are counted over: {@code a year}, or {@code a month each year} for a flow. */
    private static String slopeTime(Findings f) {
        return MeasureWords.slopeTime(MeasureWords.measureOf(f), Frequency.fromLabel(f.series().frequency()));
    }

    private static String trend(TrendFinding t, String slopeTime) {
        if (!t.assessed()) {
            return "not assessed: " + Terms.trendNotAssessed();
        }
        String words = Terms.direction(t.direction());
        String kendall = t.seasonalKendall().map(k -> String.format(Locale.ROOT, "; %s z = %.2f, %s",
                Terms.test(k.test()), k.statistic(), p(k.pValue()))).orElse("");
        String ofLevel = t.changePctPerYear() == null ? ""
                : String.format(Locale.ROOT, ", %+.2f %% of the mean level per year", t.changePctPerYear());
        return String.format(Locale.ROOT, "%s — %s: z = %.2f, %s, n = %d; Sen slope %s %s (95%% CI %s to %s)%s%s",
                words, Terms.trendTest(t.test()), t.statistic(), p(t.pValue()), t.n(), num(t.slopePerYear()), slopeTime,
                num(t.slopeCi95().get(0)),
                num(t.slopeCi95().get(1)), ofLevel, kendall);
    }

    private static String seasonality(SeasonalityFinding s, boolean relative) {
        if (s.period() == null) {
            return "not applicable (annual data)";
        }
        if (s.test() == null) {
            return "not assessed: the series is too short (period " + s.period() + ")";
        }
        String unit = s.multiplicative() ? "%" : "";
        String profile = s.profile().stream()
                .map(p -> String.format(Locale.ROOT, "%s %+.1f%s", p.label(), p.index(), unit))
                .collect(Collectors.joining(", "));
        String verdict = switch (s.verdict()) {
            case PRESENT -> String.format(Locale.ROOT, "period %d, peak %s, trough %s", s.period(), s.peak().label(),
                    s.trough().label());
            case NEGLIGIBLE -> "no meaningful seasonal pattern (detectable but small)";
            default -> "no seasonal pattern";
        };
        String swing = s.multiplicative()
                ? String.format(Locale.ROOT, "%.1f percentage points", s.swing())
                : relative ? String.format(Locale.ROOT, "%.4g (%.1f %% of the level)", s.swing(), s.swingPctOfLevel())
                : String.format(Locale.ROOT, "%.4g", s.swing());   // a share of an arbitrary zero means nothing
        return String.format(Locale.ROOT, "%s — strength %.2f, %s H = %.1f, %s; swing %s%s; "
                        + "lag-%d autocorrelation %.2f%s; profile: %s", verdict, s.strength(), Terms.test(s.test()), s.statistic(),
                p(s.pValue()), swing, s.present() && s.changed() ? "; the pattern changed over the years" : "",
                s.period(), s.autocorrelationAtPeriod(), s.periodConfirmed() ? " (confirms the period)" : "", profile);
    }

    private static String cycle(CycleFinding c) {
        if (!c.present()) {
            return "none: " + Terms.cycleReason(c);
        }
        return String.format(Locale.ROOT, "%s cycle of about %.1f years (spectral peak %.1f years, red-noise %s); peaks %s; gaps %s",
                c.regular() ? "a regular" : "an irregular", c.length(), c.spectralPeriod(), p(c.pValue()),
                String.join(", ", c.peaks().stream().map(Period::label).toList()), c.gaps().stream().map(String::valueOf).collect(Collectors.joining(", ")));
    }

    private static void line(StringBuilder out, String label, String format, Object... args) {
        out.append(String.format(Locale.ROOT, "%-14s", label + ":"))
                .append(notComputed(typeset(String.format(Locale.ROOT, format, args)))).append(System.lineSeparator());
    }

    /** How Java formats a number that could not be computed (NaN, ±Infinity), where a number stands. */
    private static final java.util.regex.Pattern NOT_A_NUMBER =
            java.util.regex.Pattern.compile("(?<=^|[ (=])[+\u2212-]?(?:NaN|Infinity)(?=$|[ ),;%\u00A0])");

    /** A number that could not be computed reads "n/a" (the JSON has null), never NaN or Infinity. */
    private static String notComputed(String text) {
        if (!text.contains("NaN") && !text.contains("Infinity")) {
            return text;   // nearly every line: the pattern would find nothing
        }
        return NOT_A_NUMBER.matcher(text).replaceAll("n/a");
    }

    /**
     * The notes in the brief's sign convention ({@link Typography#signs}). Spaces stay ordinary: the
     * notes are read in a terminal, where lines do not wrap inside a number.
     */
    static String typeset(String text) {
        return Typography.signs(text);
    }

    /** "p < 0.0001" or "p = 0.0123". */
    static String p(double p) {
        return p < 0.0001 ? "p < 0.0001" : String.format(Locale.ROOT, "p = %.4f", p);
    }

    /**
     * A change as the measure has it: in % for flows, levels and ratios; a signed difference in
     * percentage points (a value in %), points (a rate without a unit) or units (an interval scale).
     */
    private static String change(Findings f, double change, Double changePct) {
        Measure measure = f.series().measure();
        String unit = f.series().unit() == null ? "" : f.series().unit();
        boolean points = MeasureWords.percentUnit(unit) || measure == Measure.RATE;
        if (measure == null || measure.relativeChanges() && !MeasureWords.percentUnit(unit)) {
            return pct(changePct);
        }
        String sized = Math.abs(change) >= 100 ? String.format(Locale.ROOT, "%+.1f", change)
                : String.format(Locale.ROOT, "%+.3g", change);
        return sized + (points ? (MeasureWords.percentUnit(unit) ? " percentage points" : " points")
                : unit.isEmpty() ? "" : " " + unit);
    }

    private static String pct(Double v) {
        return v == null ? "n/a" : String.format(Locale.ROOT, "%+.1f %%", v);
    }

    private static String num(double v) {
        return Math.abs(v) >= 100 ? String.format(Locale.ROOT, "%.1f", v) : String.format(Locale.ROOT, "%.4g", v);
    }

    /** Period labels, comma-separated: {@code 2019-10, 2022-10}. */
    private static String labels(List<Period> periods) {
        return periods.stream().map(Period::label).collect(Collectors.joining(", "));
    }

}
