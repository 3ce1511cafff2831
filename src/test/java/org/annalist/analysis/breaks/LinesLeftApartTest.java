package org.annalist.analysis.breaks;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Random;
import org.annalist.series.Frequency;
import org.junit.jupiter.api.Test;

/**
 * What the methods appendix says of the search ("a gap at a break only if a bend fits worse"):
 * the regimes' lines stay apart at a break exactly where the test of the step against a bend
 * ({@link StepOrBend}) rejects the bend at the brief's level, and are joined where it does not. The
 * series is invented: seasonally adjusted monthly values with a genuine step and a bend.
 */
class LinesLeftApartTest {

    private static final double ALPHA = 0.05;

    /**
     * 15 years from 2,000 rising 10 a month; from index 60 a step up of 400 on the same slope; from
     * index 120 the slope bends to 30 a month without a step; noise 15 (seed 3).
     */
    private static double[] stepThenBend() {
        Random random = new Random(3);
        double[] y = new double[180];
        for (int t = 0; t < y.length; t++) {
            double line = 2_000 + 10 * t + (t >= 60 ? 400 : 0) + (t >= 120 ? 20 * (t - 119.5) : 0);
            y[t] = line + 15 * random.nextGaussian();
        }
        return y;
    }

    @Test
    void theLinesStayApartAtABreakOnlyWhereTheStepTestRejectsTheBend() {
        List<BreakSearch.Break> breaks = BreakSearch.withDefaults().search(stepThenBend(), Frequency.MONTHLY,
                BreakSearch.Scale.UNITS).breaks();
        int apart = 0;
        int joined = 0;
        for (BreakSearch.Break b : breaks) {
            assertThat(b.stepOrBend()).as("break at %d, tested against a bend", b.start()).isPresent();
            boolean gap = b.levelBefore() != b.levelAfter();
            assertThat(gap).as("break at %d: gap left %s, step test p = %s / %s", b.start(), gap,
                    b.stepOrBend().get().pWorking(), b.stepOrBend().get().pOther())
                    .isEqualTo(b.stepOrBend().get().stepSupported(ALPHA));
            apart += gap ? 1 : 0;
            joined += gap ? 0 : 1;
        }
        // the planted truth: the step at 60 keeps its gap, the bend at 120 is joined
        assertThat(apart).as("breaks whose lines stay apart").isPositive();
        assertThat(joined).as("breaks joined as a bend").isPositive();
    }
}
