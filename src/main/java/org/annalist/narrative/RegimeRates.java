package org.annalist.narrative;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.findings.BreakFinding;
import org.annalist.findings.DecisionRules;
import org.annalist.findings.Findings;
import org.annalist.findings.Measure;
import org.annalist.findings.Transform;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * The one way the brief words the slope of a regime, the fitted line between two structural
 * changes (or from the series' start, or to its end): as a rate a year where the regime lasted at
 * least {@link DecisionRules#MIN_REGIME_YEARS_FOR_RATE} years, else by the levels at its two ends
 * and its length ({@code a rise from 23,360 to 64,016 over 21 months}), because a rate a year read
 * off a shorter span, such as a recovery's, states a pace the series never kept for a year. Used
 * by the breaks section and its table ({@link BreakViews}), the episode's old path and the outlook's
 * reasons ({@link OutlookCautions}); {@link AnalystNotes} applies the same rule.
 */
final class RegimeRates {

    /**
     * One regime's fitted line.
     *
     * @param from         its first period
     * @param periods      how many periods it holds
     * @param startLevel   the line where the regime starts (at the break before it; at the first period
     *                     for the regime before the first break)
     * @param endLevel     the line where it ends (at the next break; at the latest period for the last)
     * @param slopePerYear the line's slope in the series' units a year, read at {@code rateLevel}
     * @param rateLevel    the level the slope is read at (a log line's rate is the slope over it)
     */
    record Regime(Period from, long periods, double startLevel, double endLevel, double slopePerYear,
                  double rateLevel) {
    }

    private final Series series;
    private final Formats f;
    private final boolean inPercent;
    private final Measure measure;
    private final List<Regime> regimes;

    RegimeRates(Series series, Findings findings, Formats f) {
        this.series = series;
        this.f = f;
        this.inPercent = findings.transform() == Transform.LOG;
        this.measure = MeasureWords.measureOf(findings);
        this.regimes = regimes(findings.breaks(), series.frequency(), inPercent);
    }

    /**
     * The regimes the breaks divide the series into: the first before the first break, then the one
     * after each break; empty without breaks.
     */
    static List<Regime> regimes(List<BreakFinding> breaks, Frequency frequency, boolean log) {
        List<Regime> all = new ArrayList<>();
        if (breaks.isEmpty()) {
            return all;
        }
        BreakFinding first = breaks.get(0);
        long head = first.index();
        // the first line read back from the break instant (half a period before the break's first
        // period) to the series' first period, as the line runs: a curve on logs, straight in units
        double years = (head - 0.5) / frequency.periodsPerYear();
        double start = log ? first.levelBefore() * Math.exp(-years * first.slopeBefore() / first.levelBefore())
                : first.levelBefore() - years * first.slopeBefore();
        all.add(new Regime(first.period().plus(-head), head, start, first.levelBefore(), first.slopeBefore(), first.levelBefore()));
        for (int j = 0; j < breaks.size(); j++) {
            BreakFinding b = breaks.get(j);
            BreakFinding next = j + 1 < breaks.size() ? breaks.get(j + 1) : null;
            long periods = next == null ? b.period().until(b.regimeEnd()) + 1 : b.period().until(next.period());
            all.add(new Regime(b.period(), periods, b.levelAfter(), next == null ? b.endLevel() : next.levelBefore(),
                    b.slopeAfter(), b.levelAfter()));
        }
        return all;
    }

    /** The regime before break {@code j} of the findings' list. */
    Regime before(int j) {
        return regimes.get(j);
    }

    /** The regime after break {@code j} of the findings' list. */
    Regime after(int j) {
        return regimes.get(j + 1);
    }

    /** Whether the regime lasted long enough for its slope to be given as a rate a year. */
    boolean annualised(Regime r) {
        return lastsForARate(r.periods(), series.frequency());
    }

    /** {@link DecisionRules#MIN_REGIME_YEARS_FOR_RATE} years or more of periods. */
    static boolean lastsForARate(long periods, Frequency frequency) {
        return periods >= DecisionRules.MIN_REGIME_YEARS_FOR_RATE * frequency.periodsPerYear() - 1e-9;
    }

    /**
     * The regime's rate as a number: on logs % a year, exp(slope / level) − 1 (the log slope being
     * the slope over the level); else the slope in units a year. Empty where a log rate has no
     * positive level to be read at.
     */
    Optional<Double> rate(Regime r) {
        if (inPercent) {
            return r.rateLevel() > 0 ? Optional.of(100 * Math.expm1(r.slopePerYear() / r.rateLevel())) : Optional.empty();
        }
        return Optional.of(r.slopePerYear());
    }

    /** A rate ({@link #rate}) with its unit and time: {@code +1.3 % a year}, {@code +885 nights a year in each month's total}. */
    String printedRate(double rate) {
        return number(rate) + " " + time();
    }

    /**
     * The regime in words: its rate a year ({@link #printedRate}) where it lasted long enough, else
     * {@code a rise from 23,360 to 64,016 over 21 months}.
     */
    String described(Regime r) {
        Optional<Double> rate = rate(r);
        if (annualised(r) && rate.isPresent()) {
            return printedRate(rate.get());
        }
        return movement(r) + " over " + Terms.periods(r.periods(), series.frequency());
    }

    /** A regime already described in full, named again: {@code the 21-month rise}. */
    String named(Regime r) {
        if (annualised(r) && rate(r).isPresent()) {
            return described(r);
        }
        return "the " + Terms.periodsAsAdjective(r.periods(), series.frequency()) + " " + kind(r);
    }

    /**
     * A change of slope at a break, from the regime before to the one after: {@code from +1.3 % to
     * +1.8 % a year} when both are rates, else each in its own words ({@code from +1.3 % a year to a
     * rise from 23,360 to 64,016 over 21 months}). The regime before is named again when it was
     * described at the break before ({@code from the 21-month rise to +1.8 % a year}).
     */
    String change(int j) {
        Regime before = before(j);
        Regime after = after(j);
        Optional<Double> rateBefore = rate(before);
        Optional<Double> rateAfter = rate(after);
        if (annualised(before) && annualised(after) && rateBefore.isPresent() && rateAfter.isPresent()) {
            return "from " + number(rateBefore.get()) + " to " + number(rateAfter.get()) + " " + time();
        }
        return "from " + (j > 0 ? named(before) : described(before)) + " to " + described(after);
    }

    /** {@code a rise from 23,360 to 64,016}, {@code a fall from …}, or {@code a level line at about …}. */
    private String movement(Regime r) {
        String from = f.value(r.startLevel());
        String to = f.value(r.endLevel());
        return from.equals(to) ? "a level line at about " + from : "a " + kind(r) + " from " + from + " to " + to;
    }

    /** What the line did, as its two ends print: {@code rise}, {@code fall} or {@code level line}. */
    private String kind(Regime r) {
        return f.value(r.startLevel()).equals(f.value(r.endLevel())) ? "level line"
                : r.endLevel() > r.startLevel() ? "rise" : "fall";
    }

    private String number(double rate) {
        return inPercent ? f.signedPercent(rate) : f.signedSignificant(rate) + MeasureWords.differenceUnit(measure, series.unit());
    }

    private String time() {
        return inPercent ? "a year" : MeasureWords.slopeTime(measure, series.frequency());
    }
}
