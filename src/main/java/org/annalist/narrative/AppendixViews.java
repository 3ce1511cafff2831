package org.annalist.narrative;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.findings.CalendarFinding;
import org.annalist.findings.DecisionRules;
import org.annalist.findings.Findings;
import org.annalist.findings.OutlookFinding;
import org.annalist.findings.Transform;
import org.annalist.series.Frequency;

/** The methods appendix: each method with its source and the settings this brief used. */
final class AppendixViews {

    private AppendixViews() {
    }

    static List<BriefView.MethodRow> methods(Findings findings, Formats f) {
        List<BriefView.MethodRow> rows = new ArrayList<>();
        rows.add(new BriefView.MethodRow("Additive or multiplicative",
                "elasticity of the yearly seasonal swing to the yearly level; Hyndman & Athanasopoulos (2021), "
                        + "Forecasting: Principles and Practice, 3rd ed., section 3.2",
                findings.form().form().code() + ": " + Terms.formReason(findings.form().reason())
                        + (findings.form().elasticity() == null ? "" : " (elasticity " + f.fixed(findings.form().elasticity(), 2)
                        + ", level ratio " + f.fixed(findings.form().levelRatio(), 2) + ")")));
        findings.decomposition().ifPresent(d -> rows.add(new BriefView.MethodRow("Seasonal-trend decomposition",
                "STL: Cleveland, Cleveland, McRae & Terpenning (1990), Journal of Official Statistics 6, 3\u201373",
                Terms.decomposition(d.method()))));
        if (findings.smoothing() != null) {
            rows.add(new BriefView.MethodRow("Trend-cycle line", "centred moving average; Hyndman & Athanasopoulos (2021), "
                    + "section 3.3", Terms.movingAverage(findings.smoothing().method())));
        }
        if (findings.trend().assessed()) {
            rows.add(new BriefView.MethodRow("Trend test", "Mann (1945), Kendall (1975); variance corrected for "
                    + "serial correlation after Hamed & Rao (1998); Sen (1968) slope with the interval of Gilbert (1987)",
                    Terms.trendTest(findings.trend().test())));
        }
        if (findings.seasonality().test() != null) {
            rows.add(new BriefView.MethodRow("Seasonal pattern", "Kruskal & Wallis (1952) test of the detrended values "
                    + "by season; strength after Wang, Smith & Hyndman (2006)", "period " + findings.seasonality().period()
                    + "; profile from the last three complete years"));
        }
        rows.add(new BriefView.MethodRow("Cycles", "periodogram against an AR(1) red-noise background (Gilman, "
                + "Fuglister & Mitchell 1963), confirmed by the peaks", "yearly values"
                + (findings.seasonality().present() ? " (means of the seasonally adjusted series)" : "")));
        rows.add(new BriefView.MethodRow("Structural breaks", "Bai & Perron (1998, 2003); dates' intervals after "
                + "Bai (1997); PELT: Killick, Fearnhead & Eckley (2012)", Typography.printed(Terms.breakMethod(findings.breakMethod()))));
        rows.add(new BriefView.MethodRow("Outliers", "modified z-score of the decomposition remainder (Iglewicz & "
                + "Hoaglin 1993), robust scale (MAD)", outlierSettings(findings, f)));
        calendarRow(findings, f).ifPresent(rows::add);
        easterRow(findings).ifPresent(rows::add);
        rows.add(new BriefView.MethodRow("Irregular fluctuation", "share of the variation around the long-run "
                + "straight line carried by the remainder", irregularSettings(findings, f)));
        if (findings.outlook() != null) {
            OutlookFinding o = findings.outlook();
            boolean shortSeries = o.chosenBecause().basis() == OutlookFinding.Choice.Basis.SHORT_SERIES;
            rows.add(new BriefView.MethodRow("Outlook", shortSeries ? "the naive forecast with drift, or the seasonal"
                    + " naive one, with Student-t intervals (Hyndman & Athanasopoulos 2021, §5.2 and §5.5), for a"
                    + " series too short for the usual methods" : "equal-weight combination (Makridakis & Hibon 2000; "
                    + "Makridakis, Spiliotis & Assimakopoulos 2020) of exponential smoothing state-space models chosen "
                    + "by AICc (Hyndman, Koehler, Snyder & Grose 2002; Hyndman et al. 2008), automatic ARIMA by the "
                    + "stepwise search of Hyndman & Khandakar (2008) and Theta (Assimakopoulos & Nikolopoulos 2000; on the "
                    + "logarithms of seasonally adjusted values), "
                    + "checked against each method alone and the seasonal naive rule in a rolling-origin back-test "
                    + "(Tashman 2000) by MASE (Hyndman & Koehler 2006)",
                    Terms.forecastModel(o.model()) + ", fitted from " + o.fittedFrom() + ", " + o.horizon()
                    + " periods ahead; " + Terms.choice(o.chosenBecause())
                    + "; intervals analytic or from 2,000 simulated paths"
                    + (o.intervalsWidened() ? ", widened where narrower than the back-test's errors (empirical"
                    + " intervals, Williams & Goodman 1971)" : "")
                    + (o.intervalsNarrowed() ? (o.intervalsWidened() ? "; " : ", ") + "narrowed"
                    + " where wider than 100 or more of the back-test's errors support (the 95\u00A0% intervals"
                    + " by the same factor as the 80\u00A0% ones unless the largest errors asked for more)" : "")
                    + "; year totals and their intervals from the simulated paths"));
        }
        return rows;
    }

    /**
     * What the outlier search did around this series' breaks, read from its findings: none is reported
     * in the periods next to a break's first period ({@link DecisionRules#OUTLIER_QUIET_BEFORE_BREAK},
     * {@link DecisionRules#OUTLIER_QUIET_FROM_BREAK}), but one farther off may still lie within a
     * break's 95 % interval and is then named, as the breaks section names it.
     */
    static String outlierSettings(Findings findings, Formats f) {
        String settings = "outliers kept out of the break search";
        if (findings.breaks().isEmpty()) {
            return settings;
        }
        settings += "; none reported in the " + Terms.number(DecisionRules.OUTLIER_QUIET_BEFORE_BREAK) + " periods before a"
                + " structural change's first period or the " + Terms.number(DecisionRules.OUTLIER_QUIET_FROM_BREAK)
                + " from it on";
        List<String> within = findings.outliers().stream()
                .filter(o -> findings.breaks().stream().anyMatch(b -> b.ci95().get(0).compareTo(o.period()) <= 0
                        && o.period().compareTo(b.ci95().get(1)) <= 0))
                .map(o -> f.period(o.period())).toList();
        if (!within.isEmpty()) {
            settings += "; " + Terms.listed(within) + (within.size() == 1 ? ", within a" : ", within")
                    + " structural change's 95\u00A0% interval, " + (within.size() == 1 ? "is" : "are") + " reported as well";
        }
        return settings;
    }

    /**
     * The calendar effects as {@code CalendarEffects.robust} and {@code CalendarAnalysis} estimate
     * them: on the remainder of the decomposition, each regressor centred on its mean for its
     * calendar month, a Huber start that sets one-offs aside, then least squares with Newey–West
     * errors; an effect counts at {@link DecisionRules#ALPHA}. Every effect estimated is listed with
     * its size and p-value, kept or not, so that "expected from trend, season and calendar" can be
     * traced; no row where none was estimated.
     */
    static Optional<BriefView.MethodRow> calendarRow(Findings findings, Formats f) {
        CalendarFinding c = findings.calendar();
        if (c == null || c.effects().isEmpty()) {
            return Optional.empty();
        }
        List<String> effects = new ArrayList<>();
        boolean log = findings.transform() == Transform.LOG;
        String unit = MeasureWords.differenceUnit(MeasureWords.measureOf(findings),
                findings.series().unit() == null ? "" : findings.series().unit());
        Frequency frequency = Frequency.fromLabel(findings.series().frequency());
        for (CalendarFinding.Effect e : c.effects()) {
            String per = e.name().equals(CalendarFinding.EASTER) ? " for a period holding all "
                    + org.annalist.findings.EasterAhead.WINDOW + " days before Easter Sunday"
                    : e.name().equals(CalendarFinding.WEEKEND_NIGHTS) ? " per extra Friday or Saturday night"
                    : e.name().equals(CalendarFinding.WEEKEND_DAYS) ? " per extra Saturday or Sunday" : " for all its days";
            // estimated in units (not on logs), an effect is so many units in every period: given so, with
            // its % of the average period, the base of that % (the latest change's % has another)
            String size = log ? f.signedPercent(e.effectPct()) + per
                    : f.signedSignificant(e.coefficient()) + unit + per + (Double.isFinite(e.effectPct()) ? ", "
                    + f.percent(Math.abs(e.effectPct())) + " of an average " + Terms.periodName(frequency, false) : "");
            effects.add(CalendarSentences.effectName(e.name()) + " " + size + " ("
                    + f.pValue(e.pValue()) + (e.kept() ? ", allowed for" : ", not significant, not allowed for") + ")");
        }
        String screened = c.screenedOut().isEmpty() ? "" : "; " + Terms.number(c.screenedOut().size())
                + (c.screenedOut().size() == 1 ? " period" : " periods")
                + " left out of the fit as unusual (robust weighting" + (findings.outliers().isEmpty() ? ")"
                        // the one-offs the brief reports are found apart; said only where it reports some
                        : "; not the one-offs reported above)");
        return Optional.of(new BriefView.MethodRow("Calendar effects", "least squares on the decomposition remainder, "
                + "each regressor centred on its calendar month's mean; Easter as the share of the days before Easter "
                + "Sunday in each period (Bell & Hillmer 1983); one-offs set aside after a Huber start (Huber 1964; "
                + "Rousseeuw & Leroy 1987); Newey\u2013West standard errors (Newey & West 1987, 1994)",
                String.join("; ", effects) + screened + "; an effect is allowed for when p < "
                        + f.fixed(DecisionRules.ALPHA, 2) + ": in what is expected from trend, season and calendar,"
                        + " before one-offs and structural breaks are looked for"));
    }

    /**
     * The irregular share as {@code Irregular.of} measures it: the variance of the remainder (the
     * values less the decomposition's trend and seasonal, or less the centred moving average without
     * one; on the logarithms for a multiplicative series) over the variance of the values around
     * their least-squares line, with the cut-offs that name it.
     */
    static String irregularSettings(Findings findings, Formats f) {
        if (findings.irregular() == null || findings.irregular().share() == null) {
            return "not measured: too few periods";
        }
        String remainder = findings.decomposition().isPresent() ? "the values less the decomposition's trend and seasonal"
                : "the values less their centred moving average";
        String scale = findings.transform() == Transform.LOG ? ", on the logarithms" : "";
        return "variance of the remainder (" + remainder + scale + ") over the variance of the values around their"
                + " least-squares line: " + f.fixed(100 * findings.irregular().share(), 0) + "\u00A0%"
                + leftOutSaid(findings) + "; small below "
                + f.fixed(100 * DecisionRules.SMALL_IRREGULAR_SHARE, 0) + "\u00A0%, large above "
                + f.fixed(100 * DecisionRules.LARGE_IRREGULAR_SHARE, 0) + "\u00A0%";
    }

    private static String leftOutSaid(Findings findings) {
        String leftOut = SectionViews.leftOutNearBreaks(findings.irregular(), findings.breaks().size(),
                Frequency.fromLabel(findings.series().frequency()));
        return leftOut.isEmpty() ? "" : ", leaving out " + leftOut;
    }

    /**
     * That the data cannot yet tell Easter's effect, so it was not estimated
     * ({@link DecisionRules#MIN_EASTER_YEARS_EACH_MONTH}); no row where it was, or where no calendar
     * effect is estimated at all.
     */
    private static Optional<BriefView.MethodRow> easterRow(Findings findings) {
        CalendarFinding c = findings.calendar();
        if (c == null || c.easterEvidence() == null || c.easterEvidence().tested()) {
            return Optional.empty();
        }
        CalendarFinding.EasterEvidence e = c.easterEvidence();
        return Optional.of(new BriefView.MethodRow("Easter effect", "share of the days before Easter in each period"
                + " (Bell & Hillmer 1983)", "not estimated: the data cannot yet tell it, as " + CalendarSentences.easterYears(e)
                + "; at least " + CalendarSentences.count(e.needed()) + " of each are needed"));
    }

    static List<BriefView.Fact> thresholds() {
        return RulesInForce.all().stream().map(r -> new BriefView.Fact(r.decides(), r.value())).toList();
    }
}
