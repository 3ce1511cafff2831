package org.annalist.analysis.breaks;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.annalist.analysis.TestResult;

/**
 * The evidence about confirmed breaks, from the fits of their regimes: levels before and after,
 * the interval for the date [3], the break's own sup-F test [4], and the episodes of collapse and
 * recovery. Levels are given in the series' units: on logs the fitted levels are taken back with
 * {@code exp}. Numbers in brackets refer to the references of {@link BreakSearch}.
 */
final class Regimes {

    private final double[] y;
    private final BaiPerron.Model model;
    private final int h;
    private final boolean log;
    private final double alpha;

    /** @param alpha significance level of the test of a step against a bend ({@link StepOrBend}) */
    Regimes(double[] y, BaiPerron.Model model, int h, boolean log, double alpha) {
        this.y = y;
        this.model = model;
        this.h = h;
        this.log = log;
        this.alpha = alpha;
    }

    /**
     * The confirmed breaks, the new regimes starting at {@code starts}. Each break's gap is tested
     * against a continuous bend at its date over its two regimes ({@link StepOrBend}); when any is
     * a bend, the regimes' lines come from one segmented line joined at the bends
     * ({@link JoinedLines}), else each regime has its own line. Either way a regime between two
     * breaks gives the "after" of the one and the "before" of the next from its one line.
     */
    List<BreakSearch.Break> describeAll(int[] starts, double minimumChangePct) {
        int m = starts.length;
        List<Optional<StepOrBend>> tests = new ArrayList<>(m);
        boolean[] bent = new boolean[m];
        boolean anyBent = false;
        for (int j = 0; j < m; j++) {
            int from = j == 0 ? 0 : starts[j - 1];
            int to = j + 1 < m ? starts[j + 1] - 1 : y.length - 1;
            Optional<StepOrBend> test = stepTest(y, model, h, log, from, starts[j], to);
            tests.add(test);
            bent[j] = test.isPresent() && !test.get().stepSupported(alpha);
            anyBent |= bent[j];
        }
        Optional<JoinedLines> joined = anyBent ? Optional.of(JoinedLines.fit(y, starts, bent)) : Optional.empty();
        List<BreakSearch.Break> breaks = new ArrayList<>(m);
        for (int j = 0; j < m; j++) {
            int from = j == 0 ? 0 : starts[j - 1];
            int to = j + 1 < m ? starts[j + 1] - 1 : y.length - 1;
            int start = starts[j];
            double tau = start - 0.5;
            int regime = j;
            double[] old = joined.map(lines -> lines.at(regime, tau)).orElseGet(() -> atBreak(from, start - 1, start));
            double[] fresh = joined.map(lines -> lines.at(regime + 1, tau)).orElseGet(() -> atBreak(start, to, start));
            breaks.add(describe(from, start, to, minimumChangePct, old, fresh, bent[j], tests.get(j)));
        }
        return breaks;
    }

    /**
     * The break with the new regime {@code start..to} after the old regime {@code from..start−1}.
     * Both regimes' fitted lines ({@code old}, {@code fresh}: value at the break instant τ = start − ½
     * and slope per period) are read at τ, between the old regime's last period and the new
     * regime's first: the levels before and after are the two lines there, so the step is the gap
     * between them at one date. A bend has one level there, and no step.
     */
    private BreakSearch.Break describe(int from, int start, int to, double minimumChangePct, double[] old,
                                       double[] fresh, boolean bent, Optional<StepOrBend> stepOrBend) {
        double before = old[0];
        double after = bent ? before : fresh[0];   // one joined line: the same level, not two roundings of it
        double sdBefore = residualSd(from, start - 1);
        double sdAfter = residualSd(start, to);
        // [3] Δ, σ₁, σ₂ and the room for the date: back to the old regime's start, on to the new regime's end
        BreakDateInterval.Offsets ci = BreakDateInterval.of(after - before, sdBefore, sdAfter, start - from - 1,
                to - start);
        Optional<TestResult> local = Confirmation.localTest(y, model, h, from, start, to);
        double levelBefore = units(before);
        double levelAfter = units(after);
        double changePct = bent ? 0 : 100 * (levelAfter - levelBefore) / Math.abs(levelBefore);
        // slopes in the series' units per period at the break: on logs d e^{a+bt}/dt = b e^{a+bt}
        double slopeBefore = log ? old[1] * levelBefore : old[1];
        double slopeAfter = log ? fresh[1] * levelAfter : fresh[1];
        double endLevel = BreakSearch.lineAt(after, fresh[1], to - start, log);
        // No regime may be shorter than h, so a break found as close to an end of the series as
        // that allows may really lie closer still, where the search could not place it: the
        // interval then reaches that end rather than claim a precision the search did not have.
        // a step is dated by Bai's interval [3]; a bend without a step worth reporting by the LR set [6]
        int[] dated = model == BaiPerron.Model.LEVEL || Math.abs(changePct) >= minimumChangePct
                ? new int[] {start + ci.lower(), start + ci.upper()} : profileInterval(from, start, to);
        int earliest = from == 0 && start - from <= h ? 1 : dated[0];
        int latest = to == y.length - 1 && to - start + 1 <= h ? to : dated[1];
        // Provisional: the new regime runs to the series' end and is too short to date the break,
        // i.e. its 95 % interval reaches the latest period (always so when it is no longer than h).
        boolean provisional = to == y.length - 1 && latest >= to;
        Optional<BreakShape> shape = model == BaiPerron.Model.LEVEL ? Optional.empty()
                : Optional.of(BreakShape.of(y, from, start, to));
        return new BreakSearch.Break(start, earliest, latest, levelBefore, levelAfter, changePct, local, provisional,
                slopeBefore, slopeAfter, divergencePct(old[1], fresh[1], before), shape, to, endLevel, stepOrBend);
    }

    /**
     * The 95 % confidence set for the date of a break between two fitted lines, by inverting the
     * likelihood-ratio test [6]: every first period {@code k} of the new regime in {@code from..to}
     * whose two-line residual sum of squares lies within χ²₁(0.95) σ̂² of the smallest, σ̂² the
     * residual variance at the smallest; the set's hull around {@code start}. Bai's (1997) interval
     * [3] assumes a change in level: for a change of slope alone its Δ is about zero and the
     * interval would span both regimes, however clear the bend. Independent errors are assumed, so
     * with serial correlation the set is too narrow rather than too wide.
     */
    private int[] profileInterval(int from, int start, int to) {
        SegmentCost cost = new SegmentCost(y, model);
        int first = from + 3;       // a line needs 3 values on each side to leave a residual
        int last = to - 2;
        if (first > start || last < start) {
            return new int[] {start, start};
        }
        double[] rss = new double[last - first + 1];
        double smallest = Double.POSITIVE_INFINITY;
        for (int k = first; k <= last; k++) {
            rss[k - first] = cost.rss(from, k - 1) + cost.rss(k, to);
            smallest = Math.min(smallest, rss[k - first]);
        }
        double sigma2 = smallest / Math.max(1, cost.observed(from, to) - 4);
        double limit = smallest + CHI2_1_95 * sigma2;   // [6] LR statistic (RSS(k) − RSS_min)/σ̂² ≤ χ²₁(0.95)
        int lo = start;
        while (lo - 1 >= first && rss[lo - 1 - first] <= limit) {
            lo--;
        }
        int hi = start;
        while (hi + 1 <= last && rss[hi + 1 - first] <= limit) {
            hi++;
        }
        return new int[] {lo, hi};
    }

    /** 95 % point of χ² with one degree of freedom. */
    private static final double CHI2_1_95 = 3.841458820694124;

    /**
     * Whether a change of slope counts between the regimes {@code from..start−1} and
     * {@code start..to}: only when both have at least 1.5 minimum regimes. The adjusted series
     * bends around a step over about STL's trend window, 1.5 seasonal periods and a little more
     * (Cleveland et al. 1990, the default n_t ≥ 1.5 n_p / (1 − 1.5/n_s)), and a line over a regime
     * that short would read that bend as a slope. Nor is a bend then weighed against the step
     * ({@link StepOrBend}): it is no credible description there.
     */
    static boolean slopesCount(int h, int from, int start, int to) {
        return Math.min(start - from, to - start + 1) >= Math.ceil(1.5 * h);
    }

    /**
     * The test of the step against a bend at {@code start} ({@link StepOrBend}) where a bend is a
     * credible description: lines, not levels, over regimes long enough for slopes to count.
     */
    static Optional<StepOrBend> stepTest(double[] y, BaiPerron.Model model, int h, boolean log, int from, int start,
                                         int to) {
        return model == BaiPerron.Model.LEVEL || !slopesCount(h, from, start, to) ? Optional.empty()
                : Optional.of(StepOrBend.of(y, from, start, to, log));
    }

    /** Intercept at the break instant start − ½ and slope per period of the fit over {@code a..b}. */
    private double[] atBreak(int a, int b, int start) {
        double[] fit = BaiPerron.regimeFit(y, model, a, b, start);
        return new double[] {fit[0] - 0.5 * fit[1], fit[1]};
    }

    private double units(double value) {
        return log ? Math.exp(value) : value;
    }

    /**
     * How far the change of slope carries the lines apart over the shortest regime a break allows
     * ({@code h} periods: one seasonal cycle, or the annual minimum), in % of the level at the
     * break. A fixed horizon, not the regime's own length: a long regime would otherwise make any
     * gentle curve (co2's acceleration) a material change of slope. 0 for a level model.
     */
    double divergencePct(double slopeOld, double slopeNew, double levelAtBreak) {
        double span = h * (slopeNew - slopeOld);
        return log ? 100 * (Math.exp(span) - 1) : 100 * span / Math.abs(levelAtBreak);
    }

    /** Root mean square of the residuals of the regime fit over {@code from..to}; 0 with fewer than 2 values. */
    private double residualSd(int from, int to) {
        double[] fit = BaiPerron.regimeFit(y, model, from, to, from);
        double ss = 0;
        int n = 0;
        for (int i = from; i <= to; i++) {
            if (!Double.isNaN(y[i])) {
                double r = y[i] - (fit[0] + fit[1] * (i - from));
                ss += r * r;
                n++;
            }
        }
        return n > 1 ? Math.sqrt(ss / n) : 0;
    }

    /**
     * Large steps followed by a movement back: a break whose step (the gap at the break) is at least
     * {@code |stepPct|} % either way, after which the fitted level moved back the other way by at
     * least {@code minimumChangePct} % of the level it had reached — along the stepped regime's own
     * line, beyond what the old line's slope would have carried it over the same periods, or through
     * the regime after the next break. The furthest point is the end of the
     * stepped regime's line that lies further from the level before the step; the return is
     * measured at the end of the regime that moved back (the next regime when it lies further back,
     * else the stepped regime's end): at the break that ends it, else at the latest period. A gradual decline followed by a step up has no large step to
     * start from and is no episode; a step that is not undone is described by the break alone.
     */
    List<BreakSearch.Episode> episodes(List<BreakSearch.Break> breaks, double stepPct, double minimumChangePct) {
        List<BreakSearch.Episode> episodes = new ArrayList<>();
        double threshold = Math.abs(stepPct);
        for (int j = 0; j < breaks.size(); j++) {
            BreakSearch.Break step = breaks.get(j);
            if (Math.abs(step.changePct()) < threshold) {
                continue;
            }
            boolean rise = step.changePct() > 0;
            double sign = rise ? 1 : -1;
            double closing = closingLevel(breaks, j);
            boolean furtherAtEnd = sign * (closing - step.levelAfter()) > 0;
            int extreme = furtherAtEnd ? step.end() : step.start();
            double extremeLevel = furtherAtEnd ? closing : step.levelAfter();
            int asOf = step.end();
            double returned = closing;
            OptionalInt returnStart = OptionalInt.empty();
            double nextClosing = j + 1 < breaks.size() ? closingLevel(breaks, j + 1) : Double.NaN;
            if (j + 1 < breaks.size() && sign * (nextClosing - returned) < 0) {
                BreakSearch.Break next = breaks.get(j + 1);
                returnStart = OptionalInt.of(next.start());
                asOf = next.end();
                returned = nextClosing;
            }
            double moved = -sign * (returned - extremeLevel);
            if (returnStart.isEmpty()) {
                // Along the stepped line only what goes beyond the old line's own slope is a return:
                // a line that merely carries on the way the old one went (a decline, stepped up, that
                // keeps declining) is none; one that climbs back far faster than the old one rose is.
                // The old slope is carried on both in units and at its rate from the stepped level,
                // whichever goes further, so that neither a line nor a log fit makes a return of it.
                int periods = asOf - step.start() + 1;
                double inUnits = step.slopeBefore() * periods;
                double atRate = step.slopeBefore() / Math.abs(step.levelBefore()) * Math.abs(extremeLevel) * periods;
                moved -= Math.max(0, Math.max(-sign * inUnits, -sign * atRate));
            }
            double back = 100 * moved / Math.abs(extremeLevel);
            if (back < minimumChangePct) {
                continue;   // no real return: a lasting step, which the break itself describes
            }
            double stepSize = step.levelBefore() - extremeLevel;
            double share = Math.min(BreakSearch.MAX_REGAINED_SHARE, (returned - extremeLevel) / stepSize);
            episodes.add(new BreakSearch.Episode(step.start(), rise, step.levelBefore(), extreme, extremeLevel,
                    returnStart, asOf, returned, share));
        }
        // A break is read in one episode only: a step whose return is itself the large step of a
        // later episode (a rise that a fall undid, the fall then undone in turn) is left to the
        // later one, which is the event a reader needs; the breaks themselves describe the rest.
        List<Integer> starts = episodes.stream().map(BreakSearch.Episode::start).toList();
        episodes.removeIf(e -> e.returnStart().isPresent() && starts.contains(e.returnStart().getAsInt()));
        return episodes;
    }

    /**
     * The fitted level a regime closes at, the one the brief prints for its end: where a later break
     * ends it, its line at that break instant (the later break's level before, so that an episode and
     * the break report one figure for one moment, not the line half a period apart); where it runs to
     * the latest period, its line there ({@link BreakSearch.Break#endLevel}).
     */
    private static double closingLevel(List<BreakSearch.Break> breaks, int j) {
        return j + 1 < breaks.size() ? breaks.get(j + 1).levelBefore() : breaks.get(j).endLevel();
    }
}
