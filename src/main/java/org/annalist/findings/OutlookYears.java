package org.annalist.findings;

import org.annalist.analysis.forecast.Outlook;
import org.annalist.analysis.forecast.YearSums;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * The outlook's years: the last observed calendar year as its observed periods plus the forecasts
 * of the rest — its total for a flow, its mean otherwise, with an interval from the forecast part
 * alone ({@link YearSums}) — and the next year against that estimate, not against an older complete
 * year: a reader who knows ten months of this year wants next year set against this one.
 */
final class OutlookYears {

    /** The current year's estimate and the next year's change against it; either may be null. */
    record Years(OutlookFinding.CurrentYear current, OutlookFinding.YearChange change) {
    }

    private OutlookYears() {
    }

    /**
     * @param last the index of the last observed value
     * @param h    the forecast's horizon
     */
    static Years of(Series series, int last, Outlook.Forecast f, int h, Measure measure) {
        Period lastPeriod = series.period(last);
        int year = lastPeriod.year();
        int rest = OutlookAnalysis.restOfYear(lastPeriod);
        int first = last;
        while (first > 0 && series.period(first - 1).year() == year) {
            first--;
        }
        if (rest > h || series.period(first).plus(-1).year() == year) {
            return new Years(null, null); // the horizon does not finish the year, or the series begins inside it
        }
        double observedSum = 0;
        for (int i = first; i <= last; i++) {
            if (series.isMissing(i)) {
                return new Years(null, null); // a gap in the observed part: its sum would not be observed
            }
            observedSum += series.value(i);
        }
        int observedCount = last - first + 1;
        boolean total = measure.summed();
        YearSums.Year current = new YearSums.Year(observedSum, 0, rest, total ? 1 : observedCount + rest);
        YearSums.Estimate estimate = YearSums.of(f, current);
        OutlookFinding.CurrentYear currentYear = new OutlookFinding.CurrentYear(year, total, series.period(first),
                lastPeriod, observedCount, total ? observedSum : observedSum / observedCount, rest,
                new OutlookFinding.Span(estimate.mean(), estimate.lo80(), estimate.hi80()));
        int nextCount = OutlookAnalysis.periodsIn(lastPeriod.plus(rest + 1));
        if (rest + nextCount > h) {
            return new Years(currentYear, null);
        }
        YearSums.Year next = new YearSums.Year(0, rest, rest + nextCount, total ? 1 : nextCount);
        YearSums.Change change = YearSums.change(f, current, next);
        YearSums.Estimate pct = change.relative();
        // a rate changes in points and a temperature in degrees: neither in %
        boolean withPct = measure.relativeChanges() && !Double.isNaN(pct.mean());
        boolean same = withPct && pct.lo80() <= 0 && pct.hi80() >= 0
                && 100 * Math.max(-pct.lo80(), pct.hi80()) <= DecisionRules.OUTLOOK_SAME_PCT;
        YearSums.Estimate d = change.difference();
        return new Years(currentYear, new OutlookFinding.YearChange(year + 1, year,
                withPct ? 100 * pct.mean() : null, withPct ? 100 * pct.lo80() : null,
                withPct ? 100 * pct.hi80() : null, d.mean(), d.lo80(), d.hi80(), same));
    }

}
