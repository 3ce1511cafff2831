package org.annalist.analysis.breaks;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The test of a step against a continuous bend at the same date, on both scales. Data invented;
 * check values derived with numpy 2.4.6 and scipy 1.17.1 ({@code numpy.linalg.lstsq} on the
 * designs {@code [1, t, tD]} and {@code [1, t, tD, D]} with t centred at the break, then
 * {@code scipy.stats.f.sf(F, 1, n − 4)}), on the values as printed here.
 */
class StepOrBendTest {

    /** A climb of about 2 a month for a year, then about flat; the new regime starts at index 12. */
    private static final double[] CLIMB_THEN_FLAT = {
        100.8, 100.9, 104.4, 107.3, 107.4, 109.1, 113.0, 113.8, 116.5, 116.8, 120.7, 121.7,
        124.1, 126.1, 125.0, 125.8, 124.2, 126.2, 125.3, 126.5, 124.7, 126.3, 127.3, 125.5};

    @Test
    void theNestedFTestAndTheBentLineAgreeWithLeastSquaresDoneElsewhere() {
        StepOrBend r = StepOrBend.of(CLIMB_THEN_FLAT, 0, 12, 23, false);
        // numpy/scipy on the values: F = 7.1566 in units (p = 0.014546), 3.6795 in logs (p = 0.069476)
        assertThat(r.pWorking()).isCloseTo(0.014545912545663724, within(1e-9));
        assertThat(r.pOther()).isCloseTo(0.06947568624538206, within(1e-9));
        // the bent line in units: 123.849 at the break, slope 2.0952 before and 2.0952 − 1.8469 after
        assertThat(r.levelAtBreak()).isCloseTo(123.84889277, within(1e-6));
        assertThat(r.slopeBefore()).isCloseTo(2.0951657, within(1e-6));
        assertThat(r.slopeAfter()).isCloseTo(2.0951657 - 1.84685315, within(1e-6));
        assertThat(r.at(-2)).isCloseTo(123.84889277 - 2 * 2.0951657, within(1e-6));
    }

    @Test
    void aStepRejectedOnOneScaleOnlyIsNotSupported() {
        // units reject the bend at 5 %, logs do not: the intersection–union test needs both
        StepOrBend r = StepOrBend.of(CLIMB_THEN_FLAT, 0, 12, 23, false);
        assertThat(r.stepSupported(0.05)).isFalse();
        assertThat(r.stepSupported(0.10)).isTrue();
    }

    @Test
    void theSameDataGivenAsLogsSwapTheTwoScales() {
        double[] logs = new double[CLIMB_THEN_FLAT.length];
        for (int i = 0; i < logs.length; i++) {
            logs[i] = Math.log(CLIMB_THEN_FLAT[i]);
        }
        StepOrBend r = StepOrBend.of(logs, 0, 12, 23, true);
        assertThat(r.pWorking()).isCloseTo(0.06947568624538206, within(1e-9));
        assertThat(r.pOther()).isCloseTo(0.014545912545663724, within(1e-9));
    }

    @Test
    void aRecoveryStraightInUnitsThatLevelsOffIsABendInLogsToo() {
        // worked in logs, a straight climb in units is concave: a line over it overshoots its end,
        // and the logs lean to a step; the units do not, so no step is claimed
        Random random = new Random(7);
        double[] logs = new double[60];
        for (int t = 0; t < logs.length; t++) {
            double level = t < 24 ? 35 + (90 - 35) * (t + 0.5) / 24.0 : 90;   // reaches 90 at the break instant
            logs[t] = Math.log(level) + 0.01 * random.nextGaussian();
        }
        StepOrBend r = StepOrBend.of(logs, 0, 24, 59, true);
        assertThat(r.pWorking()).isLessThan(r.pOther());
        assertThat(r.pOther()).isGreaterThan(0.05);
        assertThat(r.stepSupported(0.05)).isFalse();
        assertThat(Math.exp(r.levelAtBreak())).isCloseTo(90, within(2.0));
    }

    @Test
    void aGenuineStepIsSupportedOnBothScales() {
        Random random = new Random(11);
        double[] logs = new double[60];
        for (int t = 0; t < logs.length; t++) {
            logs[t] = Math.log(100 * (1 + 0.002 * t) * (t >= 30 ? 0.9 : 1)) + 0.03 * random.nextGaussian();
        }
        StepOrBend r = StepOrBend.of(logs, 0, 30, 59, true);
        assertThat(r.pWorking()).isLessThan(0.05);
        assertThat(r.pOther()).isLessThan(0.05);
        assertThat(r.stepSupported(0.05)).isTrue();
    }

    @Test
    void unitsWithAValueBelowZeroHaveNoOtherScaleAndMissingValuesAreLeftOut() {
        double[] y = CLIMB_THEN_FLAT.clone();
        y[3] = Double.NaN;
        y[0] = -1;
        StepOrBend r = StepOrBend.of(y, 0, 12, 23, false);
        assertThat(r.pOther()).isNaN();
        assertThat(r.pWorking()).isBetween(0.0, 1.0);
        // with no other scale the working scale's test decides alone
        assertThat(r.stepSupported(0.05)).isEqualTo(r.pWorking() < 0.05);
    }

    @Test
    void tooFewValuesOnASideAdmitNoTestAndLeaveTheStepStanding() {
        StepOrBend r = StepOrBend.of(new double[] {1, 2, 3, 4, 9}, 0, 4, 4, false);
        assertThat(r.pWorking()).isNaN();
        assertThat(r.stepSupported(0.05)).isTrue();
    }
}
