package org.annalist.narrative;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.findings.BreakFinding;
import org.annalist.findings.BreakKind;
import org.annalist.findings.DecisionRules;
import org.annalist.findings.Episode;
import org.annalist.findings.Findings;
import org.annalist.findings.Transform;
import org.annalist.findings.TrendFinding;
import org.annalist.series.Period;
import org.annalist.series.Series;

/** The views of the brief's structural changes: the breaks as fitted and the episodes of a step and a return. */
final class BreakViews {

    private final Series series;
    private final Findings findings;
    private final Formats f;
    private final MeasureWords measure;
    private final RegimeRates regimes;

    BreakViews(Series series, Findings findings, Formats f) {
        this.series = series;
        this.findings = findings;
        this.f = f;
        this.measure = MeasureWords.of(series, findings, f);
        this.regimes = new RegimeRates(series, findings, f);
    }

    List<BriefView.BreakRow> breaks() {
        List<BriefView.BreakRow> rows = new ArrayList<>();
        List<BreakFinding> all = findings.breaks();
        BreakFinding first = all.isEmpty() ? null : all.get(0);
        for (int j = 0; j < all.size(); j++) {
            BreakFinding b = all.get(j);
            BreakFinding previous = j == 0 ? null : all.get(j - 1);
            // the regime between two breaks is one line: its level moved when its two ends differ visibly,
            // said here unless the break before already told that movement in levels (a short regime)
            boolean toldBefore = previous != null && previous.kind().slope() && !regimes.annualised(regimes.before(j));
            boolean drifted = previous != null && !toldBefore
                    && Math.abs(b.levelBefore() - previous.levelAfter()) > 0.0005 * Math.abs(previous.levelAfter());
            boolean overall = j == all.size() - 1 && j > 0;
            Optional<TrendFinding.LatestRegime> latest = j == all.size() - 1 ? latestRegimeFrom(b) : Optional.empty();
            rows.add(new BriefView.BreakRow(f.period(b.period()), f.period(b.ci95().get(0)),
                    f.period(b.ci95().get(1)), b.ci95().get(0).equals(b.ci95().get(1)),
                    f.value(b.levelBefore()), f.value(b.levelAfter()), size(b.levelBefore(), b.levelAfter()),
                    b.changePct() > 0, f.fixed(b.statistic(), 1), f.pValue(b.pValue(), SectionViews.BREAK_P_FLOOR),
                    b.provisional(), b.kind().step(), b.kind().slope(), regimes.change(j), drifted,
                    previous == null ? "" : f.value(previous.levelAfter()),
                    overall ? size(first.levelBefore(), b.endLevel()) : "", b.endLevel() > first.levelBefore(),
                    f.value(first.levelBefore()), f.period(first.period()), f.value(b.endLevel()),
                    f.period(b.regimeEnd()), bendWithGap(b), joined(b),
                    latest.isPresent() && b.kind().slope() && regimes.annualised(regimes.after(j))));
        }
        return rows;
    }

    /**
     * The trend finding's latest regime when it is the one {@code last} opens and gave the break its
     * slope after ({@code findings.BreakAnalysis.withLatestRate}): its rate is the regime's one rate.
     */
    private Optional<TrendFinding.LatestRegime> latestRegimeFrom(BreakFinding last) {
        return findings.trend().latestRegime().filter(r -> r.since().equals(last.period())
                && (findings.transform() != Transform.LOG || r.changePctPerYear() != null));
    }

    /**
     * Whether the two fitted levels at the break print as one: the lines join (a bend, no step), so
     * the brief gives one level at the break, never "64,016 just before, 64,016 just after", which
     * reads as a step that moved nothing.
     */
    private boolean joined(BreakFinding b) {
        return f.value(b.levelBefore()).equals(f.value(b.levelAfter()));
    }

    /**
     * Whether a break described as a change of slope still shows a gap between its two fitted lines
     * as large as a reported step ({@link DecisionRules#MIN_BREAK_CHANGE_PCT}). The gap is there because
     * a bend without it fits worse ({@code analysis.breaks.StepOrBend}'s F-test; else the search joins
     * the lines), yet the two separate lines did not lower BIC by {@link DecisionRules#BREAK_KIND_BIC_MARGIN}
     * against the bend, so the break is called a change of slope; the levels printed beside the words
     * jump, so the words name the gap and say both.
     */
    static boolean bendWithGap(BreakFinding b) {
        return b.kind() == BreakKind.SLOPE && Math.abs(b.changePct()) >= DecisionRules.MIN_BREAK_CHANGE_PCT;
    }

    /** The size of a move from one fitted level to another, without sign: in %, points or units as the measure has it. */
    private String size(double from, double to) {
        return measure.size(to - from, from > 0 ? 100 * (to / from - 1) : null);
    }

    List<BriefView.EpisodeView> episodes() {
        List<BriefView.EpisodeView> views = new ArrayList<>();
        Period last = series.period(series.size() - 1);
        for (Episode e : findings.episodes()) {
            views.add(new BriefView.EpisodeView(f.period(e.start()), !e.rise(), size(e.before(), e.extremeLevel()),
                    e.extreme().equals(e.start()), f.period(e.extreme()), f.value(e.before()),
                    f.value(e.extremeLevel()), f.value(e.returnedLevel()), f.period(e.asOf()), e.asOf().equals(last),
                    closingBreak(e).map(b -> f.period(b.period())).orElse(""), Terms.shareOfTheWay(e.returnedShare()), f.fixed(100 * e.returnedShare(), 0) + "\u00A0%",
                    stepBack(e), oldPath(e)));
        }
        return views;
    }

    /**
     * The break that ends the regime an episode's return is measured on: the episode's level there is
     * that break's level just before it (the regime's line at the break), and is said so, as the
     * break says it.
     */
    private Optional<BreakFinding> closingBreak(Episode e) {
        return findings.breaks().stream().filter(b -> b.period().equals(e.asOf().plus(1))).findFirst();
    }

    /**
     * The old path carried forward: "risen back to about its level before the fall" compares with
     * a level the old line would have left behind had it gone on moving. Said when, by the period
     * the return is measured at, the old line's slope would have carried the level at least
     * {@link DecisionRules#MIN_BREAK_CHANGE_PCT} away from where it stood before the step: "Had the
     * level gone on as before the fall (+1.3 % a year), it would have reached about 72,600 by
     * October 2026; the fitted level there, 68,700, is 5.4 % below that." (invented figures). On logs the old
     * line grows at its rate, else by its slope in units, as the break's fitted lines do.
     */
    private String oldPath(Episode e) {
        int at = -1;
        for (int j = 0; j < findings.breaks().size(); j++) {
            at = findings.breaks().get(j).period().equals(e.start()) ? j : at;
        }
        // a pace read off less than {@link DecisionRules#MIN_REGIME_YEARS_FOR_RATE} years is not carried for years
        if (at < 0 || findings.breaks().get(at).slopeBefore() == 0 || !regimes.annualised(regimes.before(at))
                || regimes.rate(regimes.before(at)).isEmpty()) {
            return "";
        }
        BreakFinding b = findings.breaks().get(at);
        // from the break instant, half a period before the step's first period, to where the return is
        // measured: the middle of the latest period, or the instant of the break that closed the regime
        Optional<BreakFinding> closing = closingBreak(e);
        double years = (e.start().until(e.asOf()) + (closing.isPresent() ? 1 : 0.5)) / series.frequency().periodsPerYear();
        boolean log = findings.transform() == Transform.LOG;
        double rate = b.slopeBefore() / b.levelBefore();
        double carried = log ? b.levelBefore() * Math.exp(rate * years) : b.levelBefore() + b.slopeBefore() * years;
        if (Math.abs(carried - b.levelBefore()) < DecisionRules.MIN_BREAK_CHANGE_PCT / 100 * Math.abs(b.levelBefore())) {
            return "";
        }
        String pace = regimes.printedRate(regimes.rate(regimes.before(at)).orElseThrow());
        // three significant digits ("about 48,600"), or the series' own precision where a reader's division
        // of the two printed figures would not give the gap (13,100 against 12,452.9: 4.9 %, not 5.1 %)
        String gap = size(carried, e.returnedLevel());
        String carriedSaid = size(Formats.significantValue(carried), e.returnedLevel()).equals(gap)
                ? f.significant(carried) : f.value(carried);
        return "Had the level gone on as before the " + (e.rise() ? "rise" : "fall") + " (" + pace
                + "), it would have reached about " + carriedSaid
                + closing.map(c -> " just before " + f.period(c.period())).orElse(" by " + f.period(e.asOf())) + "; the fitted level"
                + " there, " + f.value(e.returnedLevel()) + ", is " + gap
                + (e.returnedLevel() < carried ? " below" : " above") + " that.";
    }

    /**
     * A step against the return within a year of the period the return is measured at: without it,
     * "had risen back all the way" would stand beside a lower level that followed. Said with the
     * level it left, against the level before the episode: "It did not stay there: in October 2021 the
     * level stepped down by 15.2 %, to about 12.0 % below the level before the fall (fitted level 9,120 just after)."
     * (invented figures). A bend that levels off has no step ({@code BreakKind.SLOPE}) and says nothing here.
     */
    private String stepBack(Episode e) {
        double year = series.frequency().periodsPerYear();
        for (BreakFinding b : findings.breaks()) {
            long after = e.asOf().until(b.period());
            // a step the same way as the return is part of it, not a step back
            boolean withTheReturn = e.rise() ? b.changePct() < 0 : b.changePct() > 0;
            if (!b.kind().step() || after <= 0 || after > year || withTheReturn) {
                continue;
            }
            boolean below = b.levelAfter() < e.before();
            return "It did not stay there: in " + f.period(b.period()) + " the level stepped " + (b.changePct() < 0 ? "down" : "up")
                    + " by " + size(b.levelBefore(), b.levelAfter()) + ", to about "
                    + size(e.before(), b.levelAfter()) + (below ? " below" : " above") + " the level before the "
                    + (e.rise() ? "rise" : "fall") + " (fitted level " + f.value(b.levelAfter()) + " just after).";
        }
        return "";
    }
}
