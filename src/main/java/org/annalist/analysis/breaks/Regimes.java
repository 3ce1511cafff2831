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

    Regimes(double[] y, BaiPerron.Model model, int h, boolean log) {
        this.y = y;
        this.model = model;
        this.h = h;
        this.log = log;
    }

    /** The break with the new regime {@code start..to} after the old regime {@code from..start−1}. */
    BreakSearch.Break describe(int from, int start, int to) {
        double before = BaiPerron.regimeFit(y, model, from, start - 1, start - 1)[0];
        double after = BaiPerron.regimeFit(y, model, start, to, start)[0];
        double sdBefore = residualSd(from, start - 1);
        double sdAfter = residualSd(start, to);
        // [3] Δ, σ₁, σ₂ and the room for the date: back to the old regime's start, on to the new regime's end
        BreakDateInterval.Offsets ci = BreakDateInterval.of(after - before, sdBefore, sdAfter, start - from - 1,
                to - start);
        Optional<TestResult> local = Confirmation.localTest(y, model, h, from, start, to);
        double levelBefore = log ? Math.exp(before) : before;
        double levelAfter = log ? Math.exp(after) : after;
        double changePct = 100 * (levelAfter - levelBefore) / Math.abs(levelBefore);
        boolean provisional = to == y.length - 1 && to - start + 1 < 2 * h;   // the latest regime, still short
        // No regime may be shorter than h, so a break found as close to an end of the series as
        // that allows may really lie closer still, where the search could not place it: the
        // interval then reaches that end rather than claim a precision the search did not have.
        int earliest = from == 0 && start - from <= h ? 1 : start + ci.lower();
        int latest = to == y.length - 1 && to - start + 1 <= h ? to : start + ci.upper();
        return new BreakSearch.Break(start, earliest, latest, levelBefore, levelAfter, changePct, local, provisional);
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
     * A collapse (a break with a change of {@code collapsePct} % or less) followed by a recovery:
     * the next break raises the level again, or the collapsed regime itself rises (a
     * level-and-slope regime that ends higher than it began). The low point is the lower end of the
     * collapsed regime's fitted line; the share regained compares the level after the recovery (or
     * at the latest period) with it. A rise of less than {@code minimumChangePct} % above the low
     * point is no recovery: the break alone describes a lasting fall.
     */
    List<BreakSearch.Episode> episodes(List<BreakSearch.Break> breaks, double collapsePct, double minimumChangePct) {
        List<BreakSearch.Episode> episodes = new ArrayList<>();
        for (int j = 0; j < breaks.size(); j++) {
            BreakSearch.Break fall = breaks.get(j);
            if (fall.changePct() > collapsePct) {
                continue;
            }
            boolean followed = j + 1 < breaks.size();
            int end = followed ? breaks.get(j + 1).start() - 1 : y.length - 1;
            double atStart = BaiPerron.regimeFit(y, model, fall.start(), end, fall.start())[0];
            double atEnd = BaiPerron.regimeFit(y, model, fall.start(), end, end)[0];
            double recovered = followed ? breaks.get(j + 1).levelAfter() : log ? Math.exp(atEnd) : atEnd;
            int lowIndex = atEnd < atStart ? end : fall.start();
            double low = log ? Math.exp(Math.min(atStart, atEnd)) : Math.min(atStart, atEnd);
            if (recovered <= low * (1 + minimumChangePct / 100)) {
                continue;   // no recovery to speak of: a lasting fall, which the break itself describes
            }
            double fallSize = fall.levelBefore() - low;
            double regained = fallSize <= 0 ? 1
                    : Math.min(BreakSearch.MAX_REGAINED_SHARE, (recovered - low) / fallSize);
            episodes.add(new BreakSearch.Episode(fall.start(),
                    followed ? OptionalInt.of(breaks.get(j + 1).start()) : OptionalInt.empty(), lowIndex, low,
                    regained));
        }
        return episodes;
    }
}
