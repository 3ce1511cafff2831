package org.annalist.analysis.breaks;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.annalist.analysis.Reference;
import org.junit.jupiter.api.Test;

/**
 * The Nile's change near 1898 (Cobb 1978) against R 4.2.2, strucchange 1.5-3:
 * {@code breakpoints(Nile ~ 1)} with h = 0.15 (15 observations), {@code confint}, {@code Fstats},
 * {@code sctest} (nile_breakpoints.json, nile_breakpoints_rss_bic.csv, nile_fstats.csv).
 */
class NileBreakTest {

    private static final double[] NILE = Reference.dataset("Nile.csv");

    @Test
    void rssAndBicForZeroToFiveBreaksMatchStrucchange() {
        BaiPerron.Result r = BaiPerron.withMinimumRegime(15).fit(NILE);
        Reference ref = Reference.csv("nile_breakpoints_rss_bic.csv");
        double[] rss = ref.column("RSS");
        double[] bic = ref.column("BIC");
        for (int m = 0; m <= 5; m++) {
            assertThat(r.byBreaks().get(m).rss()).as("RSS, m = %d", m).isCloseTo(rss[m], within(rss[m] * 1e-9));
            assertThat(r.byBreaks().get(m).bic()).as("BIC, m = %d", m).isCloseTo(bic[m], within(1e-8));
        }
        assertThat(r.chosen().breaks()).isEqualTo(1);
    }

    @Test
    void breakPositionsConvertFromLastOfOldToFirstOfNew() {
        // strucchange reports the last observation of the old regime (1-based); we report the first
        // of the new one (0-based), which is the same number. breaks_by_m from nile_breakpoints.json:
        int[][] strucchange = {{28}, {28, 83}, {28, 68, 83}, {28, 45, 68, 83}, {15, 30, 45, 68, 83}};
        BaiPerron.Result r = BaiPerron.withMinimumRegime(15).fit(NILE);
        for (int m = 1; m <= 5; m++) {
            int[] ours = r.byBreaks().get(m).starts();
            for (int j = 0; j < m; j++) {
                int lastOfOld1Based = strucchange[m - 1][j];
                int firstOfNew0Based = lastOfOld1Based;   // (last 1-based) − 1 + 1
                assertThat(ours[j]).isEqualTo(firstOfNew0Based);
            }
        }
        // first period of the new regime: index 28 = 1871 + 28 = 1899
        assertThat(1871 + r.chosen().starts()[0]).isEqualTo(1899);
    }

    @Test
    void segmentMeansMatch() {
        assertThat(BaiPerron.regimeFit(NILE, BaiPerron.Model.LEVEL, 0, 27, 27)[0]).isCloseTo(1097.75, within(1e-6));
        assertThat(BaiPerron.regimeFit(NILE, BaiPerron.Model.LEVEL, 28, 99, 28)[0])
                .isCloseTo(849.972222222222, within(1e-6));
    }

    @Test
    void chowStatisticsAndSupFMatchFstats() {
        Reference f = Reference.csv("nile_fstats.csv");
        double[] lastOfOld = f.column("break_index");
        double[] expected = f.column("F");
        for (int i = 0; i < expected.length; i++) {
            int start = (int) lastOfOld[i];
            assertThat(SupF.chow(NILE, BaiPerron.Model.LEVEL, start)).as("F at %d", start)
                    .isCloseTo(expected[i], within(expected[i] * 1e-9));
        }
        SupF.Result sup = SupF.test(NILE, BaiPerron.Model.LEVEL, 15).orElseThrow();
        assertThat(sup.test().statistic()).isCloseTo(75.9297694274854, within(1e-8));
        assertThat(sup.breakStart()).isEqualTo(28);
        // sctest reports p = 2.2e-16 (its floor); the Monte Carlo p is at its floor, 1/500.
        assertThat(sup.test().pValue()).isEqualTo(1.0 / (SupF.REPLICATIONS + 1));
    }

    @Test
    void supFSaysNotTestableWhenNoDateLeavesTwoRegimes() {
        double[] tooShort = java.util.Arrays.copyOf(NILE, 29);   // two regimes of 15 need 30 values
        assertThat(SupF.test(tooShort, BaiPerron.Model.LEVEL, 15)).isEmpty();
        assertThat(SupF.decide(tooShort, BaiPerron.Model.LEVEL, 15, 0.05)).isEqualTo(SupF.Verdict.NOT_TESTABLE);
        double[] justLongEnough = java.util.Arrays.copyOf(NILE, 30);
        assertThat(SupF.test(justLongEnough, BaiPerron.Model.LEVEL, 15)).isPresent();
        assertThat(SupF.decide(NILE, BaiPerron.Model.LEVEL, 15, 0.05)).isEqualTo(SupF.Verdict.REJECTS);
        assertThatThrownBy(() -> SupF.test(NILE, BaiPerron.Model.LEVEL, 0))
                .isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> SupF.decide(NILE, BaiPerron.Model.LEVEL, 15, 1))
                .isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void segmentationsCopyTheirBreaksInAndOut() {
        BaiPerron.Segmentation s = BaiPerron.withMinimumRegime(15).fit(NILE).chosen();
        s.starts()[0] = 99;
        assertThat(s.starts()).containsExactly(28);
        int[] given = {28};
        BaiPerron.Segmentation made = new BaiPerron.Segmentation(1, given, s.rss(), s.bic());
        given[0] = 99;
        assertThat(made.starts()).containsExactly(28);
        assertThat(made).isEqualTo(s).hasSameHashCodeAs(s);
    }

    @Test
    void intervalMatchesConfintWithinAYear() {
        // confint(bp): 1895 .. 1902 as last years of the old regime, i.e. 1896 .. 1903 as first years of the new.
        double before = BaiPerron.regimeFit(NILE, BaiPerron.Model.LEVEL, 0, 27, 27)[0];
        double after = BaiPerron.regimeFit(NILE, BaiPerron.Model.LEVEL, 28, 99, 28)[0];
        BreakDateInterval.Offsets ci = BreakDateInterval.of(after - before, sd(0, 27, before), sd(28, 99, after), 27, 71);
        int lowerFirstNew = 1899 + ci.lower();
        int upperFirstNew = 1899 + ci.upper();
        assertThat(lowerFirstNew - 1).isBetween(1895 - 1, 1895 + 1);
        assertThat(upperFirstNew - 1).isBetween(1902 - 1, 1902 + 1);
    }

    @Test
    void ourDefaultMinimumRegimeStillFindsExactlyOneBreak() {
        BaiPerron.Result r = BaiPerron.withMinimumRegime(8).fit(NILE);
        assertThat(r.chosen().starts()).containsExactly(28);
    }

    private static double sd(int from, int to, double mean) {
        double ss = 0;
        for (int i = from; i <= to; i++) {
            ss += (NILE[i] - mean) * (NILE[i] - mean);
        }
        return Math.sqrt(ss / (to - from + 1));
    }
}
