package org.annalist.narrative;

import java.util.ArrayList;
import java.util.List;
import org.annalist.findings.Measure;
import org.annalist.findings.Findings;
import org.annalist.findings.OutlookCaveat;
import org.annalist.findings.OutlookFinding;
import org.annalist.findings.OutlookMethod;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * The outlook page's view: every forecast period rounded to three significant digits (forecasts are
 * not known to five), the current year as observed plus forecast, the next year against it, and the
 * back-test in words. Nothing refers to a file: a reader of the printed brief has only the page.
 */
final class OutlookViews {

    /** Rows of the forecast table in the ordinary style; a longer table is set compact. */
    static final int TABLE_ROWS = 12;

    private OutlookViews() {
    }

    /** @param measure how next year is compared with the last complete one: in %, points or units */
    static BriefView.OutlookView of(Series series, Findings findings, Formats f, MeasureWords measure) {
        OutlookFinding o = findings.outlook();
        if (o == null) {
            return BriefView.OutlookView.ABSENT;
        }
        Period last = lastObserved(series);
        List<BriefView.ForecastRow> rows = new ArrayList<>();
        int month = 0;
        for (OutlookFinding.Point p : o.forecasts()) {
            Period at = last.plus(p.index() + 1);
            if (month < o.months().size() && within(at, o.months().get(month).month())) {
                OutlookFinding.Month m = o.months().get(month);
                if (at.startDate().equals(firstDayIn(m.month(), last, o.forecasts()))) {
                    // daily data: a whole month forecast is one row, its total or daily mean
                    rows.add(new BriefView.ForecastRow(f.shortPeriod(m.month()) + (m.total() ? ", total"
                            : ", daily mean"), f.significant(m.mean()), f.significant(m.lo80()) + " to "
                            + f.significant(m.hi80()), f.significant(m.lo95()) + " to " + f.significant(m.hi95())));
                }
                if (!within(last.plus(p.index() + 2), m.month())) {
                    month++;
                }
                continue;
            }
            rows.add(new BriefView.ForecastRow(f.shortPeriod(at), f.significant(p.mean()),
                    f.significant(p.lo80()) + " to " + f.significant(p.hi80()),
                    f.significant(p.lo95()) + " to " + f.significant(p.hi95())));
        }
        List<BriefView.ScoreRow> scores = new ArrayList<>();
        for (OutlookFinding.Score s : o.backtest()) {
            String name = s.method() == OutlookMethod.COMBINATION ? "average of the methods" : s.method().code();
            scores.add(new BriefView.ScoreRow(name, f.fixed(s.mase(), 2), f.fixed(s.smape(), 1),
                    s.method() == o.method()));
        }
        OutlookFinding.Span year = o.nextYearTotal() != null ? o.nextYearTotal() : o.nextYearAverage();
        boolean total = o.nextYearTotal() != null;
        double yearStep = year == null ? Double.NaN : yearStep(year.mean(), o.currentYear(), o.nextYearChange(), f);
        String unit = series.unit().isBlank() ? "" : "\u00A0" + series.unit();
        String methodName = OutlookMethodWords.method(o.model(), true);
        String noBacktest = o.caveats().stream().filter(c -> c instanceof OutlookCaveat.NoBacktest)
                .map(c -> Terms.outlookCaveat(c, f)).findFirst().orElse("");
        List<String> caveats = new ArrayList<>(o.caveats().stream().filter(c -> !(c instanceof OutlookCaveat.NoBacktest))
                .map(c -> Terms.outlookCaveat(c, f)).toList());
        String easter = OutlookCautions.easter(series, findings, f, measure.percent());
        if (!easter.isEmpty()) {
            caveats.add(easter);
        }
        String range = o.backtestFrom() == null ? "" : f.period(o.backtestFrom()) + " to " + f.period(o.backtestTo());
        return new BriefView.OutlookView(true, methodName, why(o, f, range), f.period(o.fittedFrom()),
                f.count(o.horizon()), rows.get(0).period(), f.shortPeriod(last.plus(o.horizon())), rows,
                rows.size() > TABLE_ROWS, year != null, total, String.valueOf(o.nextYear()),
                year == null ? "" : rounded(year.mean(), yearStep, f), year == null ? "" : f.significant(year.lo80()),
                year == null ? "" : f.significant(year.hi80()),
                year == null ? "" : comparison(o.nextYearChange(), o.currentYear(), series, f),
                currentYear(o.currentYear(), unit, f, yearStep),
                // a % error of a value on an interval scale depends on where its zero was put
                o.typicalErrorPct() == null || measure.measure() == Measure.INTERVAL ? "" : f.fixed(Math.max(o.typicalErrorPct(), 0.1),
                        o.typicalErrorPct() < 10 ? 1 : 0) + "\u00A0%",
                o.typicalYearErrorPct() == null ? "" : f.fixed(Math.max(o.typicalYearErrorPct(), 0.1),
                        o.typicalYearErrorPct() < 10 ? 1 : 0) + "\u00A0%",
                o.typicalYearErrorPct() != null && o.typicalErrorPct() != null
                        && o.typicalYearErrorPct() < o.typicalErrorPct(),
                f.count(o.backtestPeriods()), range, o.intervalsWidened(), o.intervalsNarrowed(), noBacktest, scores, caveats,
                OutlookCautions.againstTrend(series, findings, f), OutlookCautions.againstTrend(series, findings, f, false));
    }

    /** Why this method: the reason the combination is the default, and what the back-test showed. */
    static String why(OutlookFinding o, Formats f, String range) {
        String tested = "Each method was tested by forecasting each of the last " + f.count(o.backtestPeriods())
                + " periods (" + range + ") from the data before it";
        String averages = "Averages of several methods have forecast more accurately, on average, than any one"
                + " method chosen in advance in large forecasting competitions";
        OutlookFinding.Choice.Basis basis = o.chosenBecause().basis();
        String reason = OutlookMethodWords.reason(basis);
        String margin = " (" + OutlookMethodWords.clearlyRule() + closest(o.chosenBecause(), f) + ")";
        return switch (basis) {
            case COMBINATION_NOT_BEATEN -> averages + ". " + tested + "; " + reason + margin + ", so the average is used.";
            case COMBINATION_TOO_FEW_TESTED -> averages + ". " + tested + "; " + reason + ", so the average is used.";
            case SINGLE_CLEARLY_BETTER -> tested + "; this one " + OutlookMethodWords.DID_BETTER + margin
                    + ", so it is used instead of the average.";
            case COMBINATION_WITHOUT_BACKTEST -> averages + "; " + reason + ".";
            case SHORT_SERIES -> Character.toUpperCase(reason.charAt(0)) + reason.substring(1) + ", so the forecast only carries its latest values"
                    + " forward; its intervals are wide because so few values show how much it varies.";
        };
    }

    /**
     * The closest single method against the average, in the back-test's scaled errors:
     * {@code ; the closest, Theta, scored 0.57 against the average's 0.73, 22 % below}; empty
     * without those scores.
     */
    static String closest(OutlookFinding.Choice c, Formats f) {
        if (c.bestSingle().isEmpty() || !(c.combinationMase() > 0) || Double.isNaN(c.bestSingleMase())) {
            return "";
        }
        double below = 100 * (1 - c.bestSingleMase() / c.combinationMase());
        String name = c.bestSingle().get().code();
        int digits = scoreDigits(c.bestSingleMase(), c.combinationMase(), below, f);
        return "; the best single method, " + name + ", scored " + f.fixed(c.bestSingleMase(), digits)
                + " against the average's " + f.fixed(c.combinationMase(), digits)
                + (below > 0 ? ", " + f.fixed(below, 0) + "\u00A0% below"
                : below < 0 ? ", " + f.fixed(-below, 0) + "\u00A0% above" : "");
    }

    /**
     * Two decimals for the scores, or three where the percentage a reader recomputes from two-decimal
     * scores would not print as the stated one (0.54 against 0.57 gives 5 %, not the 6 % of 0.536
     * against 0.571).
     */
    private static int scoreDigits(double single, double combination, double below, Formats f) {
        for (int digits = 2; digits < 4; digits++) {
            double scale = Math.pow(10, digits);
            double printedSingle = Math.round(single * scale) / scale;
            double printedCombination = Math.round(combination * scale) / scale;
            if (printedCombination > 0 && f.fixed(Math.abs(100 * (1 - printedSingle / printedCombination)), 0)
                    .equals(f.fixed(Math.abs(below), 0))) {
                return digits;
            }
        }
        return 3;
    }

    /**
     * Whether next year's change (in %) is a clear fall or rise, said after "Next year's −1.0 %": the
     * one rule both briefs follow, so that a change the multi-series brief's table marks as neither
     * ({@link MultiBriefViews#unclearNote}) is never called a fall in a series' own brief. Clear only
     * when the change's 80 % interval excludes no change ({@link OutlookFinding.YearChange#holdsNoChange()}):
     * {@code is no clear fall (its 80 % interval, −4.2 % to +2.2 %, includes no change)}.
     *
     * @param withInterval give the interval's ends (else the interval is named only, where the
     *                     sentence before has just given them)
     */
    static String clearness(OutlookFinding.YearChange c, Formats f, boolean withInterval) {
        String way = c.pct() < 0 ? "fall" : "rise";
        if (c.pctLo80() == null || c.pctHi80() == null) {
            return "is a " + way + " by its central estimate";   // no interval to tell how clear
        }
        String interval = withInterval ? "its 80\u00A0% interval, " + f.signedPercent(c.pctLo80()) + " to "
                + f.signedPercent(c.pctHi80()) + "," : "its 80\u00A0% interval";
        return c.holdsNoChange() ? "is no clear " + way + " (" + interval + " includes no change)"
                : "is a clear " + way + " (" + interval + " lies wholly " + (c.pct() < 0 ? "below" : "above")
                + " no change)";
    }

    /**
     * The clause after next year's value: its change on the current year's estimate with the
     * change's own 80 % interval — "about the same" only under {@link
     * org.annalist.findings.DecisionRules#OUTLOOK_SAME_PCT}, never a bare verb that could contradict
     * a trend stated on page 1; "too uncertain to call a rise" (or fall) where that interval holds no
     * change but is too wide to call the years about the same, so that a wider uncertainty never reads
     * firmer than a narrow one.
     */
    static String comparison(OutlookFinding.YearChange c, OutlookFinding.CurrentYear current, Series series,
                             Formats f) {
        if (c == null || current == null) {
            return "";
        }
        String against = current.forecastPeriods() > 0 ? "the estimate for " + c.againstYear()
                : String.valueOf(c.againstYear());
        String change;
        String low;
        String high;
        if (c.pct() != null) {
            change = f.signedPercent(c.pct());
            low = f.signedPercent(c.pctLo80());
            high = f.signedPercent(c.pctHi80());
        } else {
            String points = series.unit().contains("%") ? "\u00A0percentage points"
                    : series.unit().isBlank() ? "" : "\u00A0" + series.unit();
            change = f.signedSignificant(c.difference()) + points;
            low = f.signedSignificant(c.differenceLo80());
            high = f.signedSignificant(c.differenceHi80()) + points;
        }
        if (c.aboutTheSame()) {
            return ", about the same as " + against + " (" + change + "; 80\u00A0% interval of the change " + low
                    + " to " + high + ")";
        }
        // a change whose interval holds no change is not a rise or a fall, however large its central
        // estimate (the rule of clearness above): said beside the number a board may quote
        double central = c.pct() != null ? c.pct() : c.difference();
        boolean unclear = c.pct() != null ? c.holdsNoChange() : c.differenceLo80() <= 0 && 0 <= c.differenceHi80();
        boolean printsAsZero = c.pct() != null && Math.abs(c.pct()) < 0.05;   // "0.0 %" is neither
        String caution = unclear && !printsAsZero ? ", too uncertain to call a " + (central < 0 ? "fall" : "rise") : "";
        return ", " + change + " on " + against + " (80\u00A0% interval of the change " + low + " to " + high + ")"
                + caution;
    }

    /**
     * The rounding step of next year's value and of the current year's estimate it is set against:
     * the estimate's own step ({@link #step}), no coarser than three significant digits of next
     * year's value, and made finer (down to a thousandth of that) until the change a reader
     * recomputes from the two printed figures prints as the stated change. Without a printed
     * estimate to set it against (a current year observed in full, or none), three significant
     * digits, as the table.
     */
    static double yearStep(double next, OutlookFinding.CurrentYear current, OutlookFinding.YearChange change,
                           Formats f) {
        double threeDigits = step(next, Double.NaN);
        if (current == null || current.forecastPeriods() == 0 || change == null || change.pct() == null) {
            return threeDigits;
        }
        OutlookFinding.Span e = current.estimate();
        double step = Math.min(threeDigits, step(e.mean(), e.hi80() - e.lo80()));
        String stated = f.signedPercent(change.pct());
        for (double finest = step / 1000; step > finest; step /= 10) {
            double base = Math.round(e.mean() / step) * step;
            double recomputed = 100 * (Math.round(next / step) * step / base - 1);
            if (base > 0 && f.signedPercent(recomputed).equals(stated)) {
                break;
            }
        }
        return step;
    }

    /** The current year as observed plus forecast, in a sentence; empty when it is observed in full or unknown. */
    static String currentYear(OutlookFinding.CurrentYear c, String unit, Formats f) {
        return currentYear(c, unit, f, Double.NaN);
    }

    /**
     * … with its estimate rounded to {@code meanStep} where that is finer than its own step (the
     * other figures keep theirs); NaN for its own step.
     */
    static String currentYear(OutlookFinding.CurrentYear c, String unit, Formats f, double meanStep) {
        if (c == null || c.forecastPeriods() == 0) {
            return "";
        }
        String observed = c.observedPeriods() == 1 ? "in " + f.period(c.observedFrom())
                : "from " + f.period(c.observedFrom()) + " to " + f.period(c.observedTo());
        Period firstForecast = c.observedTo().plus(1);
        Period lastForecast = c.observedTo().plus(c.forecastPeriods());
        String rest = c.forecastPeriods() == 1 ? f.period(firstForecast)
                : f.period(firstForecast) + " to " + f.period(lastForecast);
        OutlookFinding.Span e = c.estimate();
        double step = step(e.mean(), e.hi80() - e.lo80());
        double estimateStep = meanStep > 0 ? Math.min(meanStep, step) : step;
        String what = c.total() ? "The total for " : "The average for ";
        // the observed part is known exactly: printed as the latest-period pages print the year so far
        String part = c.total() ? f.value(c.observed()) + unit + " observed " + observed
                : "an average of " + f.value(c.observed()) + unit + " observed " + observed;
        return what + c.year() + " is estimated at " + rounded(e.mean(), estimateStep, f) + unit + ": " + part
                + ", and forecasts for " + rest + " (80\u00A0% interval " + rounded(e.lo80(), step, f) + " to "
                + rounded(e.hi80(), step, f) + unit + ", from the forecast part alone).";
    }

    /**
     * The rounding step for a value known to within an interval {@code width}: a power of ten at
     * most a quarter of the width, so that the interval's ends differ in print; never coarser than
     * three significant digits (common practice, no source).
     */
    static double step(double value, double width) {
        double threeDigits = Math.pow(10, Math.floor(Math.log10(Math.abs(value))) - 2);
        if (!(width > 0) || value == 0) {
            return threeDigits;
        }
        return Math.min(threeDigits, Math.pow(10, Math.floor(Math.log10(width / 4))));
    }

    /**
     * Next year's central estimate as the outlook page prints it (rounded to {@link #yearStep}), so
     * that a combined brief's table and notes quote the very figure of the series' section; empty
     * without a next-year figure.
     */
    static String nextYearPrinted(OutlookFinding o, Formats f) {
        OutlookFinding.Span year = o == null ? null : o.nextYearTotal() != null ? o.nextYearTotal() : o.nextYearAverage();
        return year == null ? "" : rounded(year.mean(), yearStep(year.mean(), o.currentYear(), o.nextYearChange(), f), f);
    }

    private static String rounded(double v, double step, Formats f) {
        if (!(step > 0) || Double.isInfinite(step)) {
            return f.significant(v);   // a value of zero has no digits to round to
        }
        double r = Math.round(v / step) * step;
        return step >= 1 ? f.count(Math.round(r)) : f.fixed(r, (int) Math.ceil(-Math.log10(step) - 1e-9));
    }

    /** Whether a (daily) period falls in a calendar month. */
    private static boolean within(Period day, Period month) {
        return day.startDate().getYear() == month.startDate().getYear()
                && day.startDate().getMonth() == month.startDate().getMonth();
    }

    /** The first forecast day in {@code month}. */
    private static java.time.LocalDate firstDayIn(Period month, Period last, List<OutlookFinding.Point> points) {
        for (OutlookFinding.Point p : points) {
            Period at = last.plus(p.index() + 1);
            if (within(at, month)) {
                return at.startDate();
            }
        }
        return month.startDate();
    }

    private static Period lastObserved(Series series) {
        int last = series.size() - 1;
        while (last > 0 && series.isMissing(last)) {
            last--;
        }
        return series.period(last);
    }
}
