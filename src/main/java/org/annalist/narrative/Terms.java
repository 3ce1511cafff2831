package org.annalist.narrative;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.annalist.findings.BreakKind;
import org.annalist.findings.BreakMethod;
import org.annalist.findings.Caveat;
import org.annalist.findings.CycleFinding;
import org.annalist.findings.Decomposition;
import org.annalist.findings.DecisionRules;
import org.annalist.findings.Direction;
import org.annalist.findings.FormChoice;
import org.annalist.findings.OutlookCaveat;
import org.annalist.findings.OutlookFinding;
import org.annalist.findings.OutlookMethod;
import org.annalist.findings.SeasonalityFinding;
import org.annalist.findings.Smoothing;
import org.annalist.findings.TestName;
import org.annalist.findings.TrendFinding;
import org.annalist.series.Frequency;
import org.annalist.series.ValueFlag;

/**
 * The words for typed facts that the brief, the plain-text notes and the findings JSON share: the
 * names of tests, the reasons for a choice, the reasons a statement is withheld. One place, so that
 * every reader of a fact words it alike.
 */
final class Terms {

    private Terms() {
    }

    static String test(TestName test) {
        return switch (test) {
            case MANN_KENDALL -> "Mann-Kendall";
            case MANN_KENDALL_HAMED_RAO -> "Mann-Kendall (Hamed-Rao corrected)";
            case MANN_KENDALL_AR1 -> "Mann-Kendall (variance corrected for AR(1) serial correlation)";
            case SEASONAL_KENDALL -> "seasonal Kendall";
            case KRUSKAL_WALLIS -> "Kruskal-Wallis";
            case SUP_F_MONTE_CARLO -> "sup-F (Monte Carlo p, AR(1) noise)";
        };
    }

    /** {@code increasing}, {@code decreasing} or {@code no clear trend}. */
    static String direction(Direction direction) {
        return switch (direction) {
            case INCREASING -> "increasing";
            case DECREASING -> "decreasing";
            case NONE -> "no clear trend";
        };
    }

    /** The trend test as run, with what it ran on. */
    static String trendTest(TrendFinding.Test test) {
        return test(test.name()) + " on " + trendBasis(test);
    }

    /** What the trend test ran on: {@code seasonally adjusted values}, {@code observed values}, …. */
    static String trendBasis(TrendFinding.Test test) {
        return (test.seasonallyAdjusted() ? "seasonally adjusted values" : "observed values")
                + (test.block() > 1 ? ", averaged over blocks of " + test.block() + " periods" : "");
    }

    /** Why no trend is stated. */
    static String trendNotAssessed() {
        return "fewer than " + DecisionRules.MIN_VALUES_FOR_TREND + " values";
    }

    /** Why the series was taken as additive or multiplicative. */
    static String formReason(FormChoice.Reason reason) {
        return switch (reason) {
            case SWING_GROWS_WITH_LEVEL -> "the seasonal swing grows with the level";
            case SWING_INDEPENDENT_OF_LEVEL -> "the seasonal swing does not grow with the level";
            case LEVEL_TOO_STABLE -> "the level varies too little to tell; the simpler additive form is kept";
            case NOT_ALL_POSITIVE -> "the series has zero or negative values, which rule out logarithms";
            case TOO_SHORT -> "too few complete years to tell; the simpler additive form is kept";
            case NOT_SEASONAL -> "annual data have no seasonal swing to judge";
            case FORCED -> "set by the user";
            case INTERVAL_SCALE -> "the values lie on a scale whose zero is arbitrary (a temperature), so ratios and "
                    + "logarithms of them mean nothing";
            case RATE_IN_POINTS -> "a rate is compared in points, not in %, so its seasonal pattern is measured in "
                    + "points too";
        };
    }

    /** Why no cycle is claimed, as the clause after "No cycle longer than a year stands out:". */
    static String cycleReason(CycleFinding c) {
        return switch (c.reason()) {
            case CLAIMED -> "";
            case TOO_FEW_COMPLETE_YEARS -> "too few complete years";
            case TOO_FEW_YEARS -> "the data cover " + c.years() + " years, and at least "
                    + DecisionRules.MIN_YEARS_FOR_CYCLE + " are needed";
            case NO_CANDIDATE_PERIOD -> "no period between " + DecisionRules.MIN_CYCLE_YEARS + " years and half the span";
            case NOT_BEYOND_RED_NOISE -> "its strongest period, " + Math.round(c.spectralPeriod() * 10) / 10.0
                    + " years, is no stronger than random persistent wander would give";
            case TOO_FEW_PEAKS -> "fewer than three peaks confirm it";
        };
    }

    /** A note on what limits the findings. */
    static String caveat(Caveat caveat) {
        if (caveat instanceof Caveat.NotDecomposed) {
            return "No decomposition: some season positions have fewer than two observed values.";
        }
        if (caveat instanceof Caveat.TooShortForSeason) {
            return "No seasonal statement: the series is shorter than " + DecisionRules.MIN_YEARS_FOR_SEASON
                    + " full years.";
        }
        if (caveat instanceof Caveat.TooShortForTrend) {
            return "No trend statement: fewer than " + DecisionRules.MIN_VALUES_FOR_TREND + " values.";
        }
        if (caveat instanceof Caveat.UnusualStretch s) {
            return "From " + s.from().label() + " to " + s.to().label() + " several values lie far from what trend"
                    + " and season predict (the pattern may have been changing); they are not reported as one-off"
                    + " outliers.";
        }
        if (caveat instanceof Caveat.BreaksNotSearchedInDailyData) {
            return "Structural changes are not searched in daily data, whose yearly pattern is not yet taken out; "
                    + "aggregate to weeks or months (--aggregate) to look for them.";
        }
        if (caveat instanceof Caveat.CalendarBeforeGregorian g) {
            return "No calendar effects are estimated (Easter, weekdays, holidays): the series starts before "
                    + g.firstYear() + ", the first full year of the Gregorian calendar, and its dates may be in the"
                    + " Julian calendar, whose Easter and weekdays differ.";
        }
        Caveat.ProvisionalBreak b = (Caveat.ProvisionalBreak) caveat;
        return "The break in " + b.start().label() + " is provisional: the data since are too few to date it (its"
                + " 95 % interval reaches the latest period), and it may not hold.";
    }

    /**
     * How much of a step has been undone, as a reader would say it: the nearest of a tenth, a
     * fifth, a quarter, a third, half, two thirds, three quarters, nearly all the way; to about its
     * level before the step from 95 % to 105 %; above (below) it beyond that. A plain comparison of
     * levels: where the level was moving before the step, the brief compares with the old path
     * carried forward too ({@code BreakViews}).
     */
    static String shareOfTheWay(double share) {
        if (share > 1.05) {
            return "past its level before the step";
        }
        if (share >= 0.95) {
            return "to about its level before the step";
        }
        double[] at = {0.1, 0.2, 0.25, 1.0 / 3, 0.5, 2.0 / 3, 0.75, 0.9};
        String[] words = {"about a tenth of the way", "about a fifth of the way", "about a quarter of the way",
                "about a third of the way", "about half way", "about two thirds of the way",
                "about three quarters of the way", "nearly all the way"};
        int best = 0;
        for (int i = 1; i < at.length; i++) {
            if (Math.abs(share - at[i]) < Math.abs(share - at[best])) {
                best = i;
            }
        }
        return words[best];
    }

    /** A number of periods of the frequency: {@code 21 months}, {@code 1 quarter}, {@code 400 days}. */
    static String periods(long n, Frequency frequency) {
        return n + " " + periodName(frequency, n != 1);
    }

    /** The same before a noun: {@code 21-month}, {@code 5-quarter}. */
    static String periodsAsAdjective(long n, Frequency frequency) {
        return n + "-" + periodName(frequency, false);
    }

    /** The name of one period of the frequency, or of several: {@code month}, {@code months}. */
    static String periodName(Frequency frequency, boolean plural) {
        String one = switch (frequency) {
            case MONTHLY -> "month";
            case QUARTERLY -> "quarter";
            case ANNUAL -> "year";
            case WEEKLY -> "week";
            case HALF_YEARLY -> "half-year";
            case DAILY, BUSINESS_DAILY -> "day";
        };
        return plural ? one + "s" : one;
    }

    /** {@code Brevania}, {@code Total and Brevania}, {@code Domestic, Brevania and Long-haul}. */
    static String listed(List<String> names) {
        if (names.size() == 1) {
            return names.get(0);
        }
        return String.join(", ", names.subList(0, names.size() - 1)) + " and " + names.get(names.size() - 1);
    }

    /** The outlook's model in notation: {@code ETS(M,A,M)}, {@code Theta, seasonally adjusted}, {@code average of …}. */
    static String forecastModel(OutlookFinding.Model m) {
        return switch (m.method()) {
            case ETS, ARIMA -> m.label().orElseThrow();
            case THETA -> m.seasonallyAdjusted() ? "Theta, seasonally adjusted" : "Theta";
            case SEASONAL_NAIVE, NAIVE -> m.method().code();
            case NAIVE_WITH_DRIFT -> "naive with drift";
            case COMBINATION -> "average of " + listed(m.members().stream().map(Terms::forecastModel).toList());
        };
    }

    /**
     * How the outlook's method was chosen, in one clause with its figures: the reason in the words
     * of {@link OutlookMethodWords#reason}, then the back-test it rests on.
     */
    static String choice(OutlookFinding.Choice c) {
        String scores = c.backtested() ? String.format(Locale.ROOT, "; MASE: combination %.2f, best single method %s %.2f",
                c.combinationMase(), c.bestSingle().map(OutlookMethod::code).orElse(""), c.bestSingleMase()) : "";
        String test = c.backtested() ? String.format(Locale.ROOT, " (rolling-origin back-test over the last %d periods%s)",
                c.origins(), scores) : "";
        return OutlookMethodWords.reason(c.basis()) + test;
    }

    /** What limits the outlook, with its periods in words. */
    static String outlookCaveat(OutlookCaveat caveat, Formats f) {
        if (caveat instanceof OutlookCaveat.FittedSinceBreak b) {
            return "The outlook is fitted on the values since the structural change in " + f.period(b.start())
                    + " only: so fitted, its forecasts of the last periods missed by at least "
                    + DecisionRules.OUTLOOK_REGIME_ADVANTAGE_PCT + "\u00A0% less than when fitted on all values.";
        }
        if (caveat instanceof OutlookCaveat.HistoryKept b) {
            return "The outlook is fitted on all values, the years before the structural change in "
                    + f.period(b.start()) + " included: fitting on the values since then alone did not cut the errors"
                    + " of its forecasts of the last periods by the " + DecisionRules.OUTLOOK_REGIME_ADVANTAGE_PCT
                    + "\u00A0% needed to prefer it.";
        }
        if (caveat instanceof OutlookCaveat.ShockBridged b) {
            // what was bridged, not a verdict on recovery: a step may have followed the climb back
            // nor does the bridge's end say when the climb back ended: the trend section dates that by its own rule
            return "For the " + (b.rise() ? "rise" : "fall") + " of " + f.period(b.from()) + ", the values from "
                    + f.period(b.from()) + " to " + f.period(b.to()) + " were replaced by a line between the levels"
                    + " before and after, with the usual seasonal pattern, before forecasting: the forecasts do not"
                    + " expect it to recur.";
        }
        if (caveat instanceof OutlookCaveat.BreakTooRecent b) {
            String periods = MeasureWords.perPeriod(b.start().frequency()).substring(2) + "s";
            if (b.periodsSince() >= b.periodsNeeded()) {
                return "The outlook uses all values, the years before the structural change in " + f.period(b.start())
                        + " included: without a back-test, fitting on the values since then alone could not be"
                        + " checked.";
            }
            return "The latest structural change, in " + f.period(b.start()) + ", is too recent to fit the outlook on the"
                    + " new level alone: trying that needs at least " + b.periodsNeeded() + " " + periods + " since the"
                    + " change, to fit on them and test the forecasts on the same recent " + periods + " as forecasts from"
                    + " all values, and there are " + b.periodsSince() + ". The outlook uses all values, so it may lag"
                    + " behind the new level.";
        }
        if (caveat instanceof OutlookCaveat.NoBacktest n) {
            return switch (n.reason()) {
                case SERIES_TOO_SHORT ->
                        "The series is too short to test the forecasts on its own past, so their accuracy is unknown.";
                case NO_SCALE -> "The forecasts could not be scored on the series' own past (the values before the"
                        + " test span give no error to compare with), so their accuracy is unknown.";
            };
        }
        int gaps = ((OutlookCaveat.GapsFilled) caveat).count();
        return gaps + (gaps == 1 ? " missing value was" : " missing values were")
                + " filled with what trend and season predict before forecasting.";
    }

    /** What a break changed: {@code step in level}, {@code change of slope}, {@code step and change of slope}. */
    static String breakKind(BreakKind kind) {
        return switch (kind) {
            case LEVEL -> "step in level";
            case SLOPE -> "change of slope";
            case BOTH -> "step and change of slope";
        };
    }

    /** How the breaks were searched, for the methods appendix. */
    static String breakMethod(BreakMethod m) {
        String checked = "its own sup-F test (AR(1) Monte Carlo null, " + number(100 * DecisionRules.ALPHA) + " %)";
        return switch (m.search()) {
            case NOT_SEARCHED_IN_DAILY_DATA -> "not searched in daily data (the yearly pattern is not removed)";
            case NOT_SEARCHED_TOO_SHORT -> "not searched: fewer than two regimes of " + m.minimumRegime() + " periods";
            case PELT -> "PELT, changes in level, penalty 3 log n on the robust noise scale, minimum regime "
                    + m.minimumRegime() + ", then every break checked by " + checked;
            case BAI_PERRON -> "Bai-Perron, changes in " + (m.levelAndSlope() ? "level and slope" : "level")
                    + ", number of breaks by BIC, then reduced until every break passes " + checked
                    + ", minimum regime " + m.minimumRegime()
                    // StepOrBend: an F-test at the brief's level, in the values and in their logs; what the
                    // break is then called is BIC's choice (BreakAnalysis.kind), said in the decision rules
                    + (m.levelAndSlope() ? "; a gap at a break only if a bend fits worse (F-test)" : "");
        };
    }

    /** A threshold as the appendix writes it: {@code 5}, {@code 0.25}. */
    static String number(double v) {
        String digits = v == Math.rint(v) ? String.valueOf((long) Math.abs(v)) : String.format(Locale.ROOT, "%s", Math.abs(v));
        return v < 0 ? "\u2212" + digits : digits;
    }

    /** The decomposition as made: {@code STL on logarithms, seasonal window 13, …}. */
    static String decomposition(Decomposition.Method m) {
        return String.format(Locale.ROOT, "STL%s, seasonal window %d, trend window %d, robust (%d inner, %d outer)",
                m.onLogs() ? " on logarithms" : "", m.seasonalWindow(), m.trendWindow(), m.innerLoops(), m.outerLoops());
    }

    /** {@code 2×12 centred moving average}, {@code 5-term centred moving average}. */
    static String movingAverage(Smoothing.CentredAverage average) {
        return (average.twice() ? "2\u00D7" + average.window() : average.window() + "-term") + " centred moving average";
    }

    /** A value's flags and those of the value a year before, as a table's note. */
    static String flags(Set<ValueFlag> flags, Set<ValueFlag> yearEarlier) {
        List<String> words = new ArrayList<>();
        flags.forEach(f -> words.add(f.description()));
        yearEarlier.forEach(f -> words.add(f.description() + " (year before)"));
        return String.join("; ", words);
    }

    /** {@code strong}, {@code moderate} or {@code weak} for a seasonal strength. */
    static String seasonalStrength(double strength) {
        return switch (SeasonalityFinding.Strength.of(strength)) {
            case STRONG -> "strong";
            case MODERATE -> "moderate";
            case WEAK -> "weak";
        };
    }
}
