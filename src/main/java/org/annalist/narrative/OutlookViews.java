package org.annalist.narrative;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.annalist.findings.Measure;
import org.annalist.findings.OutlookFinding;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * The outlook page's view: the next periods rounded to three significant digits (forecasts are not
 * known to five), the next year against the last complete one, and the back-test in words.
 */
final class OutlookViews {

    /** Rows of the forecast table: a year of months; more belong in the findings JSON. */
    static final int TABLE_ROWS = 12;

    private OutlookViews() {
    }

    /** @param measure how next year is compared with the last complete one: in %, points or units */
    static BriefView.OutlookView of(Series series, OutlookFinding o, Formats f, MeasureWords measure) {
        if (o == null) {
            return BriefView.OutlookView.ABSENT;
        }
        Period last = lastObserved(series);
        List<BriefView.ForecastRow> rows = new ArrayList<>();
        for (OutlookFinding.Point p : o.forecasts().subList(0, Math.min(TABLE_ROWS, o.forecasts().size()))) {
            rows.add(new BriefView.ForecastRow(f.shortPeriod(last.plus(p.index() + 1)), f.significant(p.mean()),
                    f.significant(p.lo80()) + " to " + f.significant(p.hi80()),
                    f.significant(p.lo95()) + " to " + f.significant(p.hi95())));
        }
        List<BriefView.ScoreRow> scores = new ArrayList<>();
        for (int i = 0; i < o.backtest().size(); i++) {
            OutlookFinding.Score s = o.backtest().get(i);
            scores.add(new BriefView.ScoreRow(s.method().code(), f.fixed(s.mase(), 2), f.fixed(s.smape(), 1), i == 0));
        }
        OutlookFinding.Span year = o.nextYearTotal() != null ? o.nextYearTotal() : o.nextYearAverage();
        boolean total = o.nextYearTotal() != null;
        String previousYear = "";
        String previousValue = "";
        String change = "";
        if (year != null) {
            // the latest calendar year observed in full: the current one is usually still running
            int comparedYear = o.nextYear() - 1;
            Double previous = completeYear(series, comparedYear, total);
            if (previous == null) {
                comparedYear--;
                previous = completeYear(series, comparedYear, total);
            }
            if (previous != null) {
                previousYear = String.valueOf(comparedYear);
                previousValue = f.significant(previous);
                double pct = 100 * (year.mean() / previous - 1);
                double difference = year.mean() - previous;
                change = measure.percent() && previous <= 0 ? "" : measure.rounded(difference, pct) ? "unchanged"
                        : measure.signedChange(difference, pct);
            }
        }
        OutlookFinding.Model model = o.model();
        String methodName = switch (o.method()) {
            case ETS -> "exponential smoothing, " + model.ets().orElseThrow();
            case COMBINATION -> "the average of three methods (" + model.ets().orElseThrow() + ", Theta and "
                    + model.naive().code() + ")";
            case SEASONAL_NAIVE -> "the seasonal naive rule (each period as the same period a year before)";
            case NAIVE -> "the naive rule (every period as the latest value)";
            case THETA -> model.seasonallyAdjusted() ? "the Theta method, on seasonally adjusted values"
                    : "the Theta method";
        };
        return new BriefView.OutlookView(true, methodName, Terms.choice(o.chosenBecause()), f.period(o.fittedFrom()),
                f.count(o.horizon()), rows.get(0).period(), f.shortPeriod(last.plus(o.horizon())), rows,
                o.horizon() > TABLE_ROWS, year != null, total, String.valueOf(o.nextYear()),
                year == null ? "" : f.significant(year.mean()), year == null ? "" : f.significant(year.lo80()),
                year == null ? "" : f.significant(year.hi80()), previousYear, previousValue, change,
                // a % error of a value on an interval scale depends on where its zero was put
                o.typicalErrorPct() == null || measure.measure() == Measure.INTERVAL ? "" : f.fixed(Math.max(o.typicalErrorPct(), 0.1),
                        o.typicalErrorPct() < 10 ? 1 : 0) + "\u00A0%",
                f.count(o.backtestPeriods()), scores, o.caveats().stream().map(c -> Terms.outlookCaveat(c, f)).toList());
    }

    /** The sum (flow) or mean (level) of a calendar year with every period observed, or null. */
    private static Double completeYear(Series series, int year, boolean sum) {
        Period p = Period.containing(series.frequency(), LocalDate.of(year, 1, 1));
        if (p.year() != year) {
            p = p.plus(1); // an ISO week holding 1 January may belong to the year before
        }
        double total = 0;
        int count = 0;
        for (; p.year() == year; p = p.plus(1)) {
            int i = series.indexOf(p);
            if (i < 0 || series.isMissing(i)) {
                return null;
            }
            total += series.value(i);
            count++;
        }
        return count == 0 ? null : sum ? total : total / count;
    }

    private static Period lastObserved(Series series) {
        int last = series.size() - 1;
        while (last > 0 && series.isMissing(last)) {
            last--;
        }
        return series.period(last);
    }
}
