package org.annalist.narrative;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.findings.CalendarFinding;
import org.annalist.findings.Analyst;
import org.annalist.findings.Claim;
import org.annalist.findings.DecisionRules;
import org.annalist.findings.Findings;
import org.annalist.findings.OutlookCaveat;
import org.annalist.findings.OutlookFinding;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * What the outlook page must add so that it does not seem to contradict the rest of the brief:
 * why next year's change differs from the trend the first page states, and that the forecasts do
 * not move Easter's effect with its date. Every reason is read from the findings' evidence; none is
 * given that the evidence does not show.
 */
final class OutlookCautions {

    private OutlookCautions() {
    }

    /**
     * Why next year's change (in %) differs materially from the stated trend's pace, or empty when
     * it does not: material when the two go opposite ways (next year not "about the same"), or
     * their paces differ by {@link DecisionRules#OUTLOOK_TREND_GAP_POINTS} points or more. The
     * trend's pace is its Sen slope over the mean of the latest year's values, so that both are
     * % a year of a level a reader has just seen (the whole period's trend keeps the % of its average
     * level that its own page gives). That the methods start from the latest level, not the trend
     * line, is said apart: it holds for every series, so it explains no particular gap. The reasons
     * on this series, each only when its evidence points the way of the difference: the last
     * twelve months' change; the year next year is set against having run on the other side of the
     * trend's pace (a base effect: its year to date); the outlook fitted on all values, the years
     * before the latest break included; a bridged fall or rise whose movement back lifts (or lowers)
     * the trend; and the change's own 80 % interval holding the trend's pace. A change whose own
     * 80 % interval holds zero "points" down or up; it is not called a fall or a rise.
     */
    static String againstTrend(Series series, Findings findings, Formats f) {
        return againstTrend(series, findings, f, true);
    }

    /**
     * As {@link #againstTrend(Series, Findings, Formats)}; without {@code allReasons}, for the
     * multi-series brief's short sections, one reason: the change's interval holding the trend's
     * pace where it does, else the first other reason the evidence shows, else that the methods start
     * from the latest level.
     */
    static String againstTrend(Series series, Findings findings, Formats f, boolean allReasons) {
        OutlookFinding o = findings.outlook();
        Optional<Claim> stated = findings.claims().pageTrend().filter(Claim::directional);
        if (o == null || o.nextYearChange() == null || o.nextYearChange().pct() == null || stated.isEmpty()) {
            return "";
        }
        Claim trend = stated.get();
        boolean sinceBreak = trend.quantity() == Claim.Quantity.TREND_SINCE_BREAK;
        Double slope = sinceBreak ? findings.trend().latestRegime().map(r -> r.slopePerYear()).orElse(null)
                : findings.trend().slopePerYear();
        double level = Analyst.latestYearMean(series);
        if (slope == null || !(level > 0)) {
            return "";
        }
        // the trend's pace as its page gives it: the whole period's as % of its average level, the
        // latest regime's as that regime's one rate (the breaks section gives it too)
        Double regimePct = sinceBreak ? findings.trend().latestRegime().map(r -> r.changePctPerYear()).orElse(null) : null;
        Double pagePct = sinceBreak ? regimePct : findings.trend().changePctPerYear();
        double pace = pagePct != null ? pagePct : 100 * slope / level;
        String basis = !sinceBreak && pagePct != null ? " a year of its average level"
                : regimePct != null ? SectionViews.regimeRateBasis(findings) : " a year of the latest year's average level";
        OutlookFinding.YearChange change = o.nextYearChange();
        double next = change.pct();
        boolean opposite = Math.signum(pace) != Math.signum(next) && !change.aboutTheSame();
        if (!opposite && Math.abs(pace - next) < DecisionRules.OUTLOOK_TREND_GAP_POINTS) {
            return "";
        }
        String span = sinceBreak ? "the trend since " + f.period(trend.from()) : "the trend over the whole period";
        String pacePct = "about " + f.signedPercent(pace) + basis;
        // a change whose own 80 % interval holds zero is not called a fall or a rise outright
        boolean unsure = change.pctLo80() != null && change.pctLo80() <= 0 && 0 <= change.pctHi80();
        String verb = unsure ? " points " + (next < 0 ? "down" : "up") : " is a " + (next < 0 ? "fall" : "rise");
        String direction = verb + (unsure ? " (its 80\u00A0% interval also holds no change)" : "");
        String gap = opposite ? direction + ", while " + span + " "
                + (pace > 0 ? "rises" : "falls") + " by " + pacePct
                : (Math.abs(next) < Math.abs(pace) ? " is slower than " : " is faster than ") + span + ", " + pacePct;
        double side = Math.signum(next - pace);   // which way the outlook lies from the trend's pace
        // how the method works is no reason by itself (recent periods may pull either way): said apart
        String method = " The outlook does not extend the trend line: its methods start from the latest level and"
                + " give the most recent periods the most weight.";
        List<String> reasons = new ArrayList<>();
        findings.claims().find(Claim.Quantity.ROLLING_YEAR).flatMap(Claim::relativePct)
                .filter(r -> Math.signum(r - pace) == side)
                .ifPresent(r -> reasons.add((series.frequency().periodsPerYear() == 12 ? "the last twelve months were "
                        : "the latest year was ") + f.percent(Math.abs(r)) + (r < 0 ? " below" : " above")
                        + (series.frequency().periodsPerYear() == 12 ? " the twelve before" : " the year before")));
        // a base effect: the year next year is set against ran on the other side of the trend's pace
        int baseYear = change.againstYear();
        findings.claims().find(Claim.Quantity.YEAR_TO_DATE)
                .filter(c -> c.to().year() == baseYear).flatMap(Claim::relativePct)
                .filter(y -> Math.signum(y - pace) == -side)
                .ifPresent(y -> reasons.add(baseYear + " itself ran " + (y > pace ? "high" : "low") + ": its "
                        + (series.frequency().periodsPerYear() == 12 ? "months" : "periods") + " so far were "
                        + f.signedPercent(y) + " on a year earlier, " + (y > pace ? "above" : "below")
                        + " the trend's pace, and next year is set against that " + (y > pace ? "higher" : "lower")
                        + " base"));
        Double wholeSlope = findings.trend().slopePerYear();
        if (sinceBreak && wholeSlope != null && Math.signum(wholeSlope - slope) == side
                && o.caveats().stream().anyMatch(c -> c instanceof OutlookCaveat.BreakTooRecent
                || c instanceof OutlookCaveat.HistoryKept)) {
            reasons.add("the outlook is fitted on all values from " + f.period(o.fittedFrom()) + ", the years before the change in "
                    + f.period(trend.from()) + " included, over which the trend's rate was " + (side < 0 ? "lower" : "higher"));
        }
        for (OutlookCaveat c : o.caveats()) {
            if (c instanceof OutlookCaveat.ShockBridged b && trend.from().compareTo(b.to()) <= 0
                    && (b.rise() ? side > 0 : side < 0)) {
                reasons.add("the " + (b.rise() ? "rise" : "fall") + " from " + f.period(b.from()) + " to "
                        + f.period(b.to()) + " was bridged before forecasting, so the movement back from it, which "
                        + (b.rise() ? "lowers" : "lifts") + " the trend, is not carried forward");
            }
        }
        String withinUncertainty = null;
        if (change.pctLo80() != null && change.pctLo80() <= pace && pace <= change.pctHi80()) {
            withinUncertainty = "the difference lies within the outlook's uncertainty (the 80\u00A0% interval of the"
                    + " change, " + f.signedPercent(change.pctLo80()) + " to " + f.signedPercent(change.pctHi80())
                    + ", holds the trend's pace)";
            reasons.add(withinUncertainty);
        }
        if (!allReasons) {
            // the short sections give one reason: the uncertainty when it holds the trend's pace, else the
            // first the evidence shows; how the method works only when the evidence shows none
            String against = opposite ? verb + " against "
                    : Math.abs(next) < Math.abs(pace) ? " is slower than " : " is faster than ";
            String why = withinUncertainty != null ? withinUncertainty
                    : reasons.isEmpty() ? "the outlook does not extend the trend line but starts from the latest level"
                    : reasons.get(0);
            return "Next year's " + f.signedPercent(next) + against + span + " (" + f.signedPercent(pace)
                    + (pagePct != null ? basis : " a year of the latest year's level") + "): " + why + ".";
        }
        String opening = "Next year's " + f.signedPercent(next) + gap + "." + method;
        if (reasons.isEmpty()) {
            return opening;
        }
        String last = reasons.remove(reasons.size() - 1);
        return opening + " On this series, " + String.join("; ", reasons) + (reasons.isEmpty() ? "" : "; and ")
                + last + ".";
    }

    /**
     * That the forecasts do not move Easter's effect with its date, when the calendar analysis kept
     * an Easter effect and the outlook reaches March or April; empty otherwise. The forecasts are
     * made on the values as observed, Easter's effect in them, and no calendar effect is put back
     * afterwards: March and April keep the share they had in the years fitted.
     *
     * @param percent changes are given in % (else the effect's size is left out: a rate's is in points)
     */
    static String easter(Findings findings, Formats f, boolean percent) {
        CalendarFinding calendar = findings.calendar();
        OutlookFinding o = findings.outlook();
        if (calendar == null || o == null) {
            return "";
        }
        Optional<CalendarFinding.Effect> easter = calendar.effects().stream()
                .filter(e -> e.name().equals(CalendarFinding.EASTER) && e.kept()).findFirst();
        List<Integer> years = o.forecasts().stream().map(OutlookFinding.Point::period)
                .filter(OutlookCautions::touchesMarchOrApril).map(Period::year).distinct().toList();
        if (easter.isEmpty() || years.isEmpty()) {
            return "";
        }
        CalendarFinding.Effect e = easter.get();
        // the effect's size in % only where changes are given in % (a rate's would be in points)
        String size = percent ? ": a month that holds all the days before Easter is about " + f.percent(Math.abs(e.effectPct()))
                + (e.effectPct() < 0 ? " lower" : " higher") + " (" + f.pValue(e.pValue()) + ")"
                : " (" + f.pValue(e.pValue()) + ")";
        return "The calendar analysis found an Easter effect" + size + ". The forecasts do not move it with"
                + " Easter's date: they give March and April the share they had in past years, wherever Easter falls in "
                + Terms.listed(years.stream().map(String::valueOf).toList()) + ", so those two months may split"
                + " differently; their sum is less affected.";
    }

    private static boolean touchesMarchOrApril(Period p) {
        return p.startDate().getMonthValue() <= 4 && p.endDate().getMonthValue() >= 3
                && p.startDate().getYear() == p.endDate().getYear();
    }
}
