package org.annalist.analysis.breaks;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import java.util.Random;
import org.annalist.analysis.Reference;
import org.annalist.analysis.TestResult;
import org.annalist.series.Frequency;
import org.junit.jupiter.api.Test;

/**
 * The whole search: on the Nile against R 4.2.2, strucchange 1.5-3 (nile_breakpoints.json:
 * {@code bp <- breakpoints(Nile ~ 1)} with h = 0.15, i.e. 15 observations; {@code coef(bp, breaks = 1)};
 * {@code confint(bp)}; {@code sctest(Fstats(Nile ~ 1))}), and on invented step series whose
 * expected values are derived here from the definitions.
 */
class BreakSearchTest {

    private static final double[] NILE = Reference.dataset("Nile.csv");

    @Test
    void theMinimumRegimeIsOneSeasonalCycleOrEightYears() {
        BreakSearch defaults = BreakSearch.withDefaults();
        assertThat(defaults.minimumRegime(Frequency.ANNUAL)).isEqualTo(8);
        assertThat(defaults.minimumRegime(Frequency.QUARTERLY)).isEqualTo(4);
        assertThat(defaults.minimumRegime(Frequency.MONTHLY)).isEqualTo(12);
        assertThat(defaults.minimumRegime(Frequency.WEEKLY)).isEqualTo(52);
        assertThat(defaults.minimumRegime(Frequency.DAILY)).isEqualTo(7);
    }

    @Test
    void nileWithStrucchangesMinimumRegimeGivesItsBreakLevelsAndStatistic() {
        BreakSearch.Result r = BreakSearch.withDefaults().withMinimumRegime(15)
                .search(NILE, Frequency.ANNUAL, BreakSearch.Scale.UNITS);
        assertThat(r.method()).isEqualTo(BreakSearch.Method.BAI_PERRON);
        // the level model has the lower BIC, so the search agrees with breakpoints(Nile ~ 1)
        assertThat(r.model()).contains(BaiPerron.Model.LEVEL);
        assertThat(r.minimumRegime()).isEqualTo(15);
        assertThat(r.breaks()).hasSize(1);
        BreakSearch.Break b = r.breaks().get(0);
        // breakpoints: 28 (last of the old regime, 1-based) = 28 (first of the new, 0-based): 1899
        assertThat(b.start()).isEqualTo(28);
        assertThat(r.latestRegimeStart()).isEqualTo(28);
        // coef(bp, breaks = 1): the two segment means
        assertThat(b.levelBefore()).isCloseTo(1097.75, within(1e-9));
        assertThat(b.levelAfter()).isCloseTo(849.972222222222, within(1e-9));
        assertThat(b.changePct()).isCloseTo(100 * (849.972222222222 - 1097.75) / 1097.75, within(1e-9));
        // sctest(Fstats(Nile ~ 1)): sup F = 75.9297694274854; our Monte Carlo p is at its floor, 1/500
        TestResult test = b.test().orElseThrow();
        assertThat(test.statistic()).isCloseTo(75.9297694274854, within(1e-8));
        assertThat(test.pValue()).isEqualTo(1.0 / (SupF.REPLICATIONS + 1));
        assertThat(test.n()).isEqualTo(100);
        // confint(bp): last years of the old regime 1895 .. 1902, i.e. first indices 25 .. 32 (±1 year)
        assertThat(b.earliest()).isBetween(25 - 1, 25 + 1);
        assertThat(b.latest()).isBetween(32 - 1, 32 + 1);
        assertThat(b.provisional()).isFalse();
        assertThat(r.episodes()).isEmpty();
    }

    @Test
    void configurationIsImmutable() {
        BreakSearch defaults = BreakSearch.withDefaults();
        BreakSearch fixed = defaults.withMinimumRegime(15);
        assertThat(defaults.minimumRegime(Frequency.ANNUAL)).isEqualTo(8);
        assertThat(fixed.minimumRegime(Frequency.ANNUAL)).isEqualTo(15);
        assertThat(fixed.minimumRegime(Frequency.MONTHLY)).isEqualTo(15);
        assertThat(fixed.withAnnualMinimumRegime(10).minimumRegime(Frequency.ANNUAL)).isEqualTo(10);
        assertThat(fixed.withAnnualMinimumRegime(10).minimumRegime(Frequency.MONTHLY)).isEqualTo(12);
        // a threshold no break can meet leaves the Nile without breaks; the defaults still find one
        assertThat(defaults.withMinimumChangePct(30).search(NILE, Frequency.ANNUAL, BreakSearch.Scale.UNITS).breaks())
                .isEmpty();
        assertThat(defaults.search(NILE, Frequency.ANNUAL, BreakSearch.Scale.UNITS).breaks()).hasSize(1);
    }

    @Test
    void badSettingsAreRefused() {
        BreakSearch s = BreakSearch.withDefaults();
        assertThatThrownBy(() -> s.withAlpha(0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> s.withAlpha(1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> s.withAlpha(Double.NaN)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> s.withMinimumChangePct(-1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> s.withPeltAbove(-1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> s.withCollapsePct(5)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> s.withMinimumRegime(1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> s.withAnnualMinimumRegime(1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> s.search(null, Frequency.ANNUAL, BreakSearch.Scale.UNITS))
                .isInstanceOf(NullPointerException.class);
    }

    @Test
    void beyondPeltAboveTheSearchIsPeltAndFindsTheSameNileBreak() {
        BreakSearch.Result r = BreakSearch.withDefaults().withPeltAbove(50)
                .search(NILE, Frequency.ANNUAL, BreakSearch.Scale.UNITS);
        assertThat(r.method()).isEqualTo(BreakSearch.Method.PELT);
        assertThat(r.model()).contains(BaiPerron.Model.LEVEL);
        assertThat(r.minimumRegime()).isEqualTo(8);
        assertThat(r.breaks()).extracting(BreakSearch.Break::start).containsExactly(28);
    }

    @Test
    void logsAreSearchedAndTheLevelsComeBackInTheSeriesUnits() {
        double[] logs = Arrays.stream(NILE).map(Math::log).toArray();
        BreakSearch.Result r = BreakSearch.withDefaults().withMinimumRegime(15)
                .search(logs, Frequency.ANNUAL, BreakSearch.Scale.LOGS);
        assertThat(r.breaks()).hasSize(1);
        BreakSearch.Break b = r.breaks().get(0);
        assertThat(b.start()).isEqualTo(28);
        // the level of a regime fitted in logs is the geometric mean of its values
        double before = geometricMean(0, 27);
        double after = geometricMean(28, 99);
        assertThat(b.levelBefore()).isCloseTo(before, within(before * 1e-12));
        assertThat(b.levelAfter()).isCloseTo(after, within(after * 1e-12));
        assertThat(b.changePct()).isCloseTo(100 * (after - before) / before, within(1e-9));
    }

    @Test
    void missingValuesAreLeftOut() {
        double[] gappy = NILE.clone();
        gappy[5] = Double.NaN;
        gappy[60] = Double.NaN;
        gappy[90] = Double.NaN;
        BreakSearch.Result r = BreakSearch.withDefaults().search(gappy, Frequency.ANNUAL, BreakSearch.Scale.UNITS);
        assertThat(r.breaks()).extracting(BreakSearch.Break::start).containsExactly(28);
        BreakSearch.Break b = r.breaks().get(0);
        assertThat(b.levelBefore()).isCloseTo(mean(gappy, 0, 27), within(1e-9));
        assertThat(b.levelAfter()).isCloseTo(mean(gappy, 28, 99), within(1e-9));
        assertThat(b.test().orElseThrow().n()).isEqualTo(97);
    }

    @Test
    void dailyDataAndShortSeriesAreNotSearchedAndTheResultSaysWhy() {
        BreakSearch s = BreakSearch.withDefaults();
        BreakSearch.Result daily = s.search(new double[800], Frequency.DAILY, BreakSearch.Scale.UNITS);
        assertThat(daily.method()).isEqualTo(BreakSearch.Method.NOT_SEARCHED_DAILY);
        assertThat(daily.model()).isEmpty();
        assertThat(daily.breaks()).isEmpty();
        assertThat(s.search(new double[800], Frequency.BUSINESS_DAILY, BreakSearch.Scale.UNITS).method())
                .isEqualTo(BreakSearch.Method.NOT_SEARCHED_DAILY);
        BreakSearch.Result shortSeries = s.search(new double[23], Frequency.MONTHLY, BreakSearch.Scale.UNITS);
        assertThat(shortSeries.method()).isEqualTo(BreakSearch.Method.NOT_SEARCHED_SHORT);
        assertThat(shortSeries.minimumRegime()).isEqualTo(12);
        assertThat(shortSeries.model()).isEmpty();
        assertThat(shortSeries.breaks()).isEmpty();
        assertThat(shortSeries.episodes()).isEmpty();
        assertThat(shortSeries.latestRegimeStart()).isZero();
    }

    @Test
    void aFallAndAPartialReturnAreOneEpisode() {
        // 100 → 50 from index 60, → 90 from index 100: 40 of the 50 lost regained
        Random random = new Random(11);
        double[] y = new double[144];
        for (int t = 0; t < y.length; t++) {
            y[t] = (t >= 100 ? 90 : t >= 60 ? 50 : 100) + 2 * random.nextGaussian();
        }
        BreakSearch.Result r = BreakSearch.withDefaults().search(y, Frequency.MONTHLY, BreakSearch.Scale.UNITS);
        assertThat(r.breaks()).extracting(BreakSearch.Break::start).containsExactly(60, 100);
        assertThat(r.latestRegimeStart()).isEqualTo(100);
        assertThat(r.episodes()).hasSize(1);
        BreakSearch.Episode e = r.episodes().get(0);
        assertThat(e.start()).isEqualTo(60);
        assertThat(e.rise()).isFalse();
        assertThat(e.returnStart()).hasValue(100);
        assertThat(e.asOf()).isEqualTo(143);
        assertThat(e.extreme()).isEqualTo(60);   // a flat stepped regime: its first period
        double before = mean(y, 0, 59);
        double low = mean(y, 60, 99);
        double after = mean(y, 100, 143);
        assertThat(e.before()).isCloseTo(before, within(1e-9));
        assertThat(e.extremeLevel()).isCloseTo(low, within(1e-9));
        assertThat(e.returnedShare()).isCloseTo((after - low) / (before - low), within(1e-9));
        // a fall of 50 % is no collapse when only 60 % or more counts as one
        assertThat(BreakSearch.withDefaults().withCollapsePct(-60).search(y, Frequency.MONTHLY,
                BreakSearch.Scale.UNITS).episodes()).isEmpty();
        assertThatThrownBy(() -> r.breaks().add(r.breaks().get(0))).isInstanceOf(UnsupportedOperationException.class);
    }

    @Test
    void aLastingFallIsABreakButNoEpisode() {
        Random random = new Random(12);
        double[] y = new double[144];
        for (int t = 0; t < y.length; t++) {
            y[t] = (t >= 60 ? 50 : 100) + 2 * random.nextGaussian();
        }
        BreakSearch.Result r = BreakSearch.withDefaults().search(y, Frequency.MONTHLY, BreakSearch.Scale.UNITS);
        assertThat(r.breaks()).extracting(BreakSearch.Break::start).containsExactly(60);
        assertThat(r.breaks().get(0).changePct()).isLessThan(BreakSearch.DEFAULT_COLLAPSE_PCT);
        assertThat(r.episodes()).isEmpty();
    }

    private static double geometricMean(int from, int to) {
        double sum = 0;
        for (int i = from; i <= to; i++) {
            sum += Math.log(NILE[i]);
        }
        return Math.exp(sum / (to - from + 1));
    }

    private static double mean(double[] y, int from, int to) {
        double sum = 0;
        int n = 0;
        for (int i = from; i <= to; i++) {
            if (!Double.isNaN(y[i])) {
                sum += y[i];
                n++;
            }
        }
        return sum / n;
    }
}
