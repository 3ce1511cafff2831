package org.annalist.analysis.breaks;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.annalist.analysis.TestResult;

/**
 * Which proposed breaks the data carry: a break holds when it moves the fitted level by at least
 * the minimum change — by the gap between the two lines at the break, or by how far the change of
 * slope carries them apart over the shortest regime a break allows — and passes its own sup-F test [4] over the span of its two regimes. Serial
 * correlation makes BIC propose too many breaks [2]; these checks remove those the data do not
 * carry. Numbers in brackets refer to the references of {@link BreakSearch}.
 */
final class Confirmation {

    private final double[] y;
    private final BaiPerron.Model model;
    private final int h;
    private final boolean log;
    private final double minimumChangePct;
    private final double alpha;

    Confirmation(double[] y, BaiPerron.Model model, int h, boolean log, double minimumChangePct, double alpha) {
        this.y = y;
        this.model = model;
        this.h = h;
        this.log = log;
        this.minimumChangePct = minimumChangePct;
        this.alpha = alpha;
    }

    /**
     * Bai–Perron's partitions from BIC's number of breaks down: the first in which every break
     * holds, or none.
     */
    int[] backward(BaiPerron.Result fit) {
        for (int m = fit.chosen().breaks(); m >= 1; m--) {
            int[] starts = fit.byBreaks().get(m).starts();
            boolean all = true;
            for (int j = 0; j < starts.length && all; j++) {
                int from = j == 0 ? 0 : starts[j - 1];
                int to = j + 1 < starts.length ? starts[j + 1] - 1 : y.length - 1;
                all = change(from, starts[j], to) >= minimumChangePct
                        && localVerdict(from, starts[j], to) == SupF.Verdict.REJECTS;
            }
            if (all) {
                return starts;
            }
        }
        return new int[0];
    }

    /**
     * PELT's breaks: while some break does not hold, the weakest of those (smallest change) is
     * removed and the rest are checked again.
     */
    int[] pruned(int[] proposed) {
        List<Integer> starts = new ArrayList<>();
        for (int s : proposed) {
            starts.add(s);
        }
        while (!starts.isEmpty()) {
            int weakest = -1;
            double weakestChange = Double.POSITIVE_INFINITY;
            for (int j = 0; j < starts.size(); j++) {
                int from = j == 0 ? 0 : starts.get(j - 1);
                int to = j + 1 < starts.size() ? starts.get(j + 1) - 1 : y.length - 1;
                double change = change(from, starts.get(j), to);
                boolean holds = change >= minimumChangePct
                        && localVerdict(from, starts.get(j), to) == SupF.Verdict.REJECTS;
                if (!holds && change < weakestChange) {
                    weakest = j;
                    weakestChange = change;
                }
            }
            if (weakest < 0) {
                break;
            }
            starts.remove(weakest);
        }
        return starts.stream().mapToInt(Integer::intValue).toArray();
    }

    /**
     * How much a break changes, in %: the larger of its step and of how far its change of slope
     * carries the lines apart, with its step tested against a bend once ({@link StepOrBend}).
     */
    private double change(int from, int start, int to) {
        Optional<StepOrBend> bend = Regimes.stepTest(y, model, h, log, from, start, to)
                .filter(test -> !test.stepSupported(alpha));
        return Math.max(Math.abs(changePct(from, start, to, bend)), Math.abs(divergencePct(from, start, to, bend)));
    }

    /**
     * The gap between the two regimes' fitted lines at the break instant {@code start − ½} (regimes
     * {@code from..start−1} and {@code start..to}), in % of the level before; on logs,
     * {@code 100 (e^{after − before} − 1)}. 0 when that gap is no step the data carry ({@code bend}
     * present): the break is then a bend, as {@link Regimes#describeAll} reports it.
     */
    private double changePct(int from, int start, int to, Optional<StepOrBend> bend) {
        if (bend.isPresent()) {
            return 0;
        }
        double before = atBreak(from, start - 1, start);
        double after = atBreak(start, to, start);
        return log ? 100 * (Math.exp(after - before) - 1) : 100 * (after - before) / Math.abs(before);
    }

    /**
     * How far the change of slope carries the lines apart over the minimum regime, in % (0 for
     * levels, and between regimes too short for a slope to count: {@link Regimes#slopesCount}); the
     * bent line's slopes where the break is a bend.
     */
    private double divergencePct(int from, int start, int to, Optional<StepOrBend> bend) {
        if (!Regimes.slopesCount(h, from, start, to)) {
            return 0;
        }
        Regimes regimes = new Regimes(y, model, h, log, alpha);
        if (bend.isPresent()) {
            StepOrBend line = bend.get();
            return regimes.divergencePct(line.slopeBefore(), line.slopeAfter(), line.levelAtBreak());
        }
        double slopeOld = BaiPerron.regimeFit(y, model, from, start - 1, start)[1];
        double slopeNew = BaiPerron.regimeFit(y, model, start, to, start)[1];
        return regimes.divergencePct(slopeOld, slopeNew, atBreak(from, start - 1, start));
    }

    private double atBreak(int a, int b, int start) {
        double[] fit = BaiPerron.regimeFit(y, model, a, b, start);
        return fit[0] - 0.5 * fit[1];
    }

    private SupF.Verdict localVerdict(int from, int start, int to) {
        int local = localMinimum(model, h, from, start, to);
        return SupF.decide(Arrays.copyOfRange(y, from, to + 1), model, local, alpha);   // [4] over from..to
    }

    /** The break's own sup-F test over {@code from..to}, with the full number of replications. */
    static Optional<TestResult> localTest(double[] y, BaiPerron.Model model, int h, int from, int start, int to) {
        return SupF.test(Arrays.copyOfRange(y, from, to + 1), model, localMinimum(model, h, from, start, to))
                .map(SupF.Result::test);
    }

    /**
     * The minimum regime of the local test: h, or the shorter of the two regimes when that is
     * less, but never below what a fit needs (2 values for a level, 3 for a line).
     */
    private static int localMinimum(BaiPerron.Model model, int h, int from, int start, int to) {
        return Math.max(model == BaiPerron.Model.LEVEL ? 2 : 3, Math.min(h, Math.min(start - from, to - start + 1)));
    }
}
