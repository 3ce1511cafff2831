package org.annalist.findings;

import java.util.List;
import java.util.Optional;
import java.util.Random;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * Invented seasonal monthly series with a planted collapse, recovery and step, for the tests of a
 * step against a bend and for {@link BendOrStepLab}: 16 years from January 2010, rising 1.5 % a
 * year, a summer-peaking season (±40 %), multiplicative Gaussian noise, seeded.
 */
final class PlantedBends {

    static final Period START = Period.month(2010, 1);
    static final int LENGTH = 192;
    /** First month of the collapse (January 2020). */
    static final int COLLAPSE = 120;
    /** Months at the low before the recovery starts. */
    static final int AT_LOW = 3;
    /** Months of the straight-line recovery in the series' units. */
    static final int RECOVERY = 18;
    /** First month after the recovery: where the path bends to flat. */
    static final int BEND = COLLAPSE + AT_LOW + RECOVERY;

    private PlantedBends() {
    }

    /**
     * The collapse to 35 %, three months at the low, a recovery in a straight line (in units) to
     * 90 % of the earlier level over {@value #RECOVERY} months, then flat at 90 % (no step); and,
     * when {@code stepPct} is not 0, a genuine step of that size at {@link #BEND}.
     */
    static Series collapseAndRecovery(long seed, double noise, double stepPct) {
        return series(seed, noise, t -> {
            if (t < COLLAPSE) {
                return 1;
            }
            int since = t - COLLAPSE;
            if (since < AT_LOW) {
                return 0.35;
            }
            if (since < AT_LOW + RECOVERY) {
                return 0.35 + (0.9 - 0.35) * (since - AT_LOW + 1) / RECOVERY;
            }
            return 0.9 * (1 + stepPct / 100);
        });
    }

    /** A genuine step of {@code stepPct} at {@code at}, nothing else. */
    static Series step(long seed, double noise, double stepPct, int at) {
        return series(seed, noise, t -> t >= at ? 1 + stepPct / 100 : 1);
    }

    /**
     * The analysis worked in logs, as the seasonal swing is made multiplicative: on 16 years with a
     * collapse the form test may pick additive, and in that form a robust decomposition can take
     * the three months at the low for one-offs; which form is chosen is not what these tests pin.
     * No outlook: it is the costliest part and no break statement depends on it.
     */
    static Analyst analyst() {
        return new Analyst(Optional.of(Form.MULTIPLICATIVE), Optional.empty(), List.of(), Optional.of(0));
    }

    /** The break dated within {@code slack} months of {@code index}, if any. */
    static Optional<BreakFinding> near(Findings f, int index, int slack) {
        return f.breaks().stream().filter(b -> Math.abs(b.index() - index) <= slack).findFirst();
    }

    /**
     * Steps claimed after the collapse's own break (which the collapse makes, and which is not what
     * these series test) other than within {@code slack} months of {@code index}.
     */
    static long stepsAway(Findings f, int index, int slack) {
        return f.breaks().stream()
                .filter(b -> b.index() > COLLAPSE + slack && Math.abs(b.index() - index) > slack)
                .filter(b -> b.kind().step()).count();
    }

    private static Series series(long seed, double noise, java.util.function.IntToDoubleFunction effect) {
        Random random = new Random(seed);
        double[] x = new double[LENGTH];
        for (int t = 0; t < x.length; t++) {
            double level = 10_000 * Math.pow(1.015, t / 12.0);
            double season = 1 + 0.4 * Math.sin(2 * Math.PI * (t - 3) / 12);
            x[t] = level * season * Math.exp(noise * random.nextGaussian()) * effect.applyAsDouble(t);
        }
        return Series.builder("planted", Frequency.MONTHLY).append(START, x).snapshot();
    }
}
