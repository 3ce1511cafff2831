package org.annalist.narrative;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.findings.BreakFinding;
import org.annalist.findings.CalendarFinding;
import org.annalist.findings.Analyst;
import org.annalist.findings.Claim;
import org.annalist.findings.DecisionRules;
import org.annalist.findings.EasterAhead;
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
     * 80 % interval holds zero is "no clear fall" (or rise), by {@link OutlookViews#clearness}, the rule
     * the multi-series brief's table marks such changes by.
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
        // the gap a reader sees: the two paces as printed, to one decimal
        double printedGap = Math.abs(Math.round(10 * pace) - Math.round(10 * next)) / 10.0;
        if (!opposite && printedGap < DecisionRules.OUTLOOK_TREND_GAP_POINTS) {
            return "";
        }
        String span = sinceBreak ? "the trend since " + f.period(trend.from()) : "the trend over the whole period";
        String pacePct = "about " + f.signedPercent(pace) + basis;
        // whether it is a clear fall or rise, by the rule the board's table marks its changes with too
        String direction = " " + OutlookViews.clearness(change, f, true);
        String gap = opposite ? direction + ", while " + span + " "
                + (pace > 0 ? "rises" : "falls") + " by " + pacePct
                : (Math.abs(next) < Math.abs(pace) ? " is slower than " : " is faster than ") + span + ", " + pacePct;
        double side = Math.signum(next - pace);   // which way the outlook lies from the trend's pace
        // how the method works is no reason by itself (recent periods may pull either way): said apart
        String method = " The outlook does not extend the trend line: its methods start from the latest level and"
                + " give the most recent periods the most weight.";
        // methods without a term for growth pull next year towards no change, away from a trend either way
        Optional<String> flat = pace != 0 && side == -Math.signum(pace) ? withoutGrowth(o.model()) : Optional.empty();
        method += flat.map(t -> " " + Character.toUpperCase(t.charAt(0)) + t.substring(1) + ".").orElse("");
        List<String> reasons = new ArrayList<>();
        // what the methods did, for the one sentence of a smaller gap: damped, without growth, fitted on earlier years
        List<String> fromMethods = new ArrayList<>();
        // a damped trend slows the growth it carries forward, whatever the trend: a reason for a slower outlook only
        (pace != 0 && side == -Math.signum(pace) ? dampedTrend(o.model()) : Optional.<String>empty()).ifPresent(d -> {
            reasons.add(d);
            fromMethods.add(d);
        });
        flat.ifPresent(fromMethods::add);
        findings.claims().find(Claim.Quantity.ROLLING_YEAR).flatMap(Claim::relativePct)
                .filter(r -> Math.signum(r - pace) == side)
                // a change the same way as the trend but smaller explains a slower outlook by being small: "only"
                .ifPresent(r -> reasons.add((series.frequency().periodsPerYear() == 12 ? "the last twelve months were "
                        : "the latest year was ") + (Math.signum(r) == Math.signum(pace) && Math.abs(r) < Math.abs(pace)
                        ? "only " : "") + f.percent(Math.abs(r)) + (r < 0 ? " below" : " above")
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
        if (sinceBreak && o.caveats().stream().anyMatch(c -> c instanceof OutlookCaveat.BreakTooRecent
                || c instanceof OutlookCaveat.HistoryKept)) {
            earlierRegimes(series, findings, trend.from(), side, f).map(rates -> "the outlook is fitted on all values from "
                    + f.period(o.fittedFrom()) + ", the years before the change in " + f.period(trend.from())
                    + " included, over which the fitted line rose " + (side < 0 ? "less" : "more") + " steeply (" + rates + ")")
                    .ifPresent(r -> {
                        reasons.add(r);
                        fromMethods.add(r);
                    });
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
        if (allReasons && !opposite && printedGap < DecisionRules.OUTLOOK_TREND_FULL_ACCOUNT_POINTS) {
            // a smaller gap in one sentence: first whether it is within the outlook's uncertainty, as the
            // board's short form says it, then what the methods did where the evidence shows it
            String why = withinUncertainty != null
                    ? withinUncertainty + (fromMethods.isEmpty() ? "" : ", and " + fromMethods.get(0))
                    : !fromMethods.isEmpty() ? fromMethods.get(0)
                    : "the outlook does not extend the trend line but starts from the latest level";
            return "Next year's " + f.signedPercent(next) + gap + ": " + why + ".";
        }
        if (!allReasons) {
            // the short sections give one reason: the uncertainty when it holds the trend's pace, else the
            // first the evidence shows; how the method works only when the evidence shows none
            String against = opposite ? " " + OutlookViews.clearness(change, f, false) + " and runs against "
                    : Math.abs(next) < Math.abs(pace) ? " is slower than " : " is faster than ";
            String why = withinUncertainty != null ? withinUncertainty : flat.isPresent() ? flat.get()
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
     * That the outlook's methods, or some of those it averages, have no term that carries growth
     * forward ({@link OutlookFinding.Model#trended()}: an ETS model without trend, an ARIMA model
     * without drift), so that their forecasts hold the latest level with its season whatever the
     * trend: {@code two of the three methods averaged, exponential smoothing (ETS(M,N,M)) and an
     * ARIMA model (ARIMA(3,0,3)(0,1,1)[12]), have no term for growth (no trend, no drift) and carry
     * the latest level forward with its season; only the Theta method carries a trend, with a third
     * of the weight}. Empty when every method has one.
     */
    static Optional<String> withoutGrowth(OutlookFinding.Model model) {
        if (model.members().isEmpty()) {
            return model.trended() ? Optional.empty() : Optional.of("the method used, "
                    + OutlookMethodWords.method(model, true) + ", has no term for growth (" + missing(List.of(model))
                    + ") and carries the latest level forward with its season");
        }
        List<OutlookFinding.Model> flat = model.members().stream().filter(m -> !m.trended()).toList();
        List<OutlookFinding.Model> trended = model.members().stream().filter(OutlookFinding.Model::trended).toList();
        if (flat.isEmpty()) {
            return Optional.empty();
        }
        int n = model.members().size();
        String names = Terms.listed(flat.stream().map(m -> OutlookMethodWords.method(m, true)).toList());
        if (flat.size() == n) {
            return Optional.of((n == 2 ? "neither of the two methods averaged, " : "none of the " + counted(n)
                    + " methods averaged, ") + names + ", has a term for growth (" + missing(flat)
                    + "): each carries the latest level forward with its season");
        }
        String weight = trended.size() * 3 == n ? "a third" : trended.size() * 2 == n ? "half"
                : trended.size() * 3 == 2 * n ? "two thirds" : trended.size() + " parts in " + n;
        return Optional.of(counted(flat.size()) + " of the " + counted(n) + " methods averaged, " + names
                + (flat.size() == 1 ? ", has" : ", have") + " no term for growth (" + missing(flat) + ") and "
                + (flat.size() == 1 ? "carries" : "carry") + " the latest level forward with its season; only "
                + Terms.listed(trended.stream().map(m -> OutlookMethodWords.method(m, false)).toList())
                + (trended.size() == 1 ? " carries" : " carry") + " a trend, with " + weight + " of the weight");
    }

    /**
     * That the exponential smoothing model the outlook uses, alone or in its average, damps its trend
     * ({@code Ad} in its notation; Gardner & McKenzie 1985, Management Science 31, 1237–1246: the
     * trend multiplied by φ < 1 at each step ahead), so that its growth fades over the forecast: {@code exponential smoothing
     * (ETS(M,Ad,M)) damps its trend, so the growth it carries forward fades over the forecast}.
     * Empty without a damped model.
     */
    static Optional<String> dampedTrend(OutlookFinding.Model model) {
        List<OutlookFinding.Model> models = model.members().isEmpty() ? List.of(model) : model.members();
        return models.stream().filter(m -> m.method() == org.annalist.findings.OutlookMethod.ETS
                        && m.label().filter(l -> l.contains(",Ad,")).isPresent()).findFirst()
                .map(m -> OutlookMethodWords.method(m, true) + (model.members().isEmpty() ? "" : ", one of the methods averaged,")
                        + " damps its trend, so the growth it carries forward fades over the forecast");
    }

    /** A count of methods in words (a combination has two or three). */
    private static String counted(int n) {
        return n >= 1 && n <= 3 ? List.of("one", "two", "three").get(n - 1) : String.valueOf(n);
    }

    /** What the models lack: {@code no trend}, {@code no drift}, {@code no trend, no drift}. */
    private static String missing(List<OutlookFinding.Model> models) {
        return String.join(", ", models.stream().map(m -> switch (m.method()) {
            case ETS -> "no trend";
            case ARIMA -> "no drift";
            case SEASONAL_NAIVE -> "each period as a year before";
            case NAIVE -> "each period as the latest";
            default -> "no drift";
        }).distinct().toList());
    }

    /**
     * The rates of the fitted lines the outlook's earlier years ran along, set against the latest
     * regime's, as the structural changes table prints them ({@code +1.3 % a year before January
     * 2021, against +0.7 % a year since October 2022}), when every earlier regime the outlook was
     * fitted on lies on the side that explains the gap ({@code side}: −1 for an outlook below the
     * trend's pace, which earlier lower rates would pull down); empty otherwise, so that the reason is
     * given only where the table the reader sees bears it out. A regime wholly inside a bridged fall
     * or rise (replaced before forecasting) or before the outlook's first value is left out; regimes
     * fitted as levels have no rate to compare, and nothing is said.
     */
    static Optional<String> earlierRegimes(Series series, Findings findings, Period latestStart, double side, Formats f) {
        OutlookFinding o = findings.outlook();
        List<BreakFinding> breaks = findings.breaks().stream().filter(b -> b.period().compareTo(latestStart) <= 0).toList();
        if (breaks.isEmpty() || side == 0 || !breaks.get(breaks.size() - 1).period().equals(latestStart)) {
            return Optional.empty();
        }
        RegimeRates regimes = new RegimeRates(series, findings, f);
        int latestIndex = breaks.size() - 1;
        RegimeRates.Regime latest = regimes.after(latestIndex);
        Optional<Double> latestRate = regimes.rate(latest);
        if (latestRate.isEmpty()) {
            return Optional.empty();
        }
        String latestPrinted = regimes.described(latest);
        List<String> earlier = new ArrayList<>();
        for (int j = 0; j < breaks.size(); j++) {
            BreakFinding end = breaks.get(j);
            RegimeRates.Regime regime = regimes.before(j);
            Period to = end.period().plus(-1);
            if (to.compareTo(o.fittedFrom()) < 0 || bridged(o, regime.from(), to)) {
                continue;
            }
            Optional<Double> r = regimes.rate(regime);
            if (r.isEmpty()) {
                return Optional.empty();
            }
            String printed = regimes.described(regime);
            if (printed.equals(latestPrinted) || Math.signum(r.get() - latestRate.get()) != side) {
                return Optional.empty();
            }
            earlier.add(printed + (j == 0 ? " before " + f.period(end.period())
                    : " from " + f.period(regime.from()) + " to " + f.period(to)));
        }
        if (earlier.isEmpty() || breaks.stream().allMatch(b -> b.slopeBefore() == 0 && b.slopeAfter() == 0)) {
            return Optional.empty();
        }
        return Optional.of(Terms.listed(earlier) + ", against " + latestPrinted + " since " + f.period(latestStart));
    }

    /** Whether a fall or rise bridged before forecasting covers the whole span {@code from}–{@code to}. */
    private static boolean bridged(OutlookFinding o, Period from, Period to) {
        return o.caveats().stream().anyMatch(c -> c instanceof OutlookCaveat.ShockBridged b
                && b.from().compareTo(from) <= 0 && to.compareTo(b.to()) <= 0);
    }

    /**
     * That the forecasts move Easter's effect with its date, when the calendar analysis kept an
     * Easter effect and the outlook reaches March or April; empty otherwise. The methods forecast
     * the values as observed, so March and April come out with the average share of the days before
     * Easter they had in the years fitted; the outlook then moves them by the estimated effect for
     * each forecast year's Easter ({@link EasterAhead}), and says by how much.
     *
     * @param percent changes are given in % (else the effect's size is left out: a rate's is in points)
     */
    static String easter(Series series, Findings findings, Formats f, boolean percent) {
        List<EasterAhead> ahead = findings.outlook() == null ? List.of() : findings.outlook().easterMoves();
        if (ahead.isEmpty()) {
            return "";
        }
        CalendarFinding.Effect e = findings.calendar().effects().stream()
                .filter(x -> x.name().equals(CalendarFinding.EASTER) && x.kept()).findFirst().orElseThrow();
        // the effect's size in % only where changes are given in % (a rate's would be in points)
        String size = percent ? ": a month that holds all the days before Easter is about " + f.percent(Math.abs(e.effectPct()))
                + (e.effectPct() < 0 ? " lower" : " higher") + " (" + f.pValue(e.pValue()) + ")"
                : " (" + f.pValue(e.pValue()) + ")";
        StringBuilder text = new StringBuilder("The calendar analysis found an Easter effect" + size + ". The forecasts"
                + " move it with Easter's date, which is known ahead: the methods alone would give " + (ahead.get(0).months()
                ? "March and April" : "the first two quarters") + " the share of the days before Easter they had on average"
                + " in the years fitted.");
        for (EasterAhead a : ahead) {
            text.append(' ').append(easterYear(a, f, percent));
        }
        return text.toString();
    }

    /**
     * {@code Easter 2027 falls on 28 March, with all 8 days before it in March, against 36 % of them
     * on average in 2011 to 2026: by the estimated effect, the forecast for March 2027 is set about
     * 6.2 % higher and that for April 2027 about 5.8 % lower.} A move under {@link
     * DecisionRules#CALENDAR_NAMED_PCT} is said to be small.
     */
    static String easterYear(EasterAhead a, Formats f, boolean percent) {
        String earlier = a.months() ? "March" : "the first quarter";
        String held = a.daysEarlier() == a.window() ? "all " + a.window() + " days before it in " + earlier
                : a.daysEarlier() == 0 ? "none of the " + a.window() + " days before it in " + earlier
                : a.daysEarlier() + " of the " + a.window() + " days before it in " + earlier;
        String years = a.fromYear() == a.toYear() ? String.valueOf(a.fromYear()) : a.fromYear() + " to " + a.toYear();
        String dated = "Easter " + a.year() + " falls on " + CalendarSentences.DAY_AND_MONTH.format(a.sunday()) + ", with "
                + held + ", against " + f.fixed(100 * a.averageShare(), 0) + "\u00A0% of them on average in " + years;
        if (a.moves().isEmpty()) {
            return dated + ".";
        }
        if (a.moves().stream().allMatch(m -> Math.abs(m.pct()) < DecisionRules.CALENDAR_NAMED_PCT)) {
            return dated + ": by the estimated effect, " + (a.moves().size() == 1 ? "the forecast for " : "the forecasts for ")
                    + Terms.listed(a.moves().stream().map(m -> f.period(m.period())).toList())
                    + (a.moves().size() == 1 ? " moves" : " each move") + " by less than "
                    + f.percent(DecisionRules.CALENDAR_NAMED_PCT) + ".";
        }
        List<String> moves = new ArrayList<>();
        for (EasterAhead.Move m : a.moves()) {
            String by = (percent ? " about " + f.percent(Math.abs(m.pct())) : "") + (m.pct() > 0 ? " higher" : " lower");
            moves.add(moves.isEmpty() ? "the forecast for " + f.period(m.period()) + " is set" + by
                    : "that for " + f.period(m.period()) + by);
        }
        return dated + ": by the estimated effect, " + Terms.listed(moves) + ".";
    }
}
