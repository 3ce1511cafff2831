package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Random;
import java.util.function.IntToDoubleFunction;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/** Known truth, invented: level shifts, collapses and one-offs on a seasonal monthly series. */
class BreaksAndOutliersTest {

    private static final Period START = Period.month(2010, 1);

    /** 12 years of monthly values: level × summer-peaking season × 3 % noise × the given effect. */
    private static Series series(long seed, double growthPerYear, IntToDoubleFunction effect) {
        Random random = new Random(seed);
        double[] x = new double[144];
        for (int t = 0; t < x.length; t++) {
            double level = 10_000 * Math.pow(1 + growthPerYear, t / 12.0);
            double season = 1 + 0.4 * Math.sin(2 * Math.PI * (t - 3) / 12);
            x[t] = level * season * Math.exp(0.03 * random.nextGaussian()) * effect.applyAsDouble(t);
        }
        return Series.builder("synthetic", Frequency.MONTHLY).append(START, x).snapshot();
    }

    private static List<Period> breakPeriods(Findings f) {
        return f.breaks().stream().map(BreakFinding::period).toList();
    }

    private static boolean covers(BreakFinding b, int index) {
        Period truth = START.plus(index);
        return b.ci95().get(0).compareTo(truth) <= 0 && b.ci95().get(1).compareTo(truth) >= 0;
    }

    @Test
    void aBreakInTheLastYearIsProvisionalAndItsIntervalReachesTheSeriesEnd() {
        // the shift comes 8 months before the end; no regime may be shorter than 12 months, so the
        // break can be placed no later than 12 months before the end, and the truth lies after that
        Findings f = new Analyst().withoutOutlook().analyse(series(2, 0.02, t -> t >= 136 ? 1.4 : 1));
        assertThat(f.breaks()).hasSize(1);
        BreakFinding b = f.breaks().get(0);
        assertThat(b.provisional()).isTrue();
        assertThat(b.ci95().get(1)).isEqualTo(START.plus(143));
        assertThat(covers(b, 136)).as("interval %s covers %s", b.ci95(), START.plus(136)).isTrue();
    }

    @Test
    void aSingleLevelShiftIsOneDatedBreak() {
        Findings f = new Analyst().analyse(series(1, 0.02, t -> t >= 70 ? 1.25 : 1));
        assertThat(f.breaks()).hasSize(1);
        BreakFinding b = f.breaks().get(0);
        assertThat(covers(b, 70)).as("interval %s covers %s", b.ci95(), START.plus(70)).isTrue();
        assertThat(b.changePct()).isBetween(18.0, 32.0);
        assertThat(b.pValue()).isLessThan(0.05);
        assertThat(f.outliers()).isEmpty();
    }

    @Test
    void twoShiftsAreTwoBreaks() {
        Findings f = new Analyst().analyse(series(2, 0.02, t -> t >= 100 ? 1.25 * 0.8 : t >= 50 ? 1.25 : 1));
        assertThat(f.breaks()).hasSize(2);
        assertThat(covers(f.breaks().get(0), 50)).isTrue();
        assertThat(covers(f.breaks().get(1), 100)).isTrue();
        assertThat(f.breaks().get(0).changePct()).isPositive();
        assertThat(f.breaks().get(1).changePct()).isNegative();
    }

    @Test
    void aShiftAndAOneOffAreABreakAndAnOutlier() {
        Findings f = new Analyst().analyse(series(3, 0.02, t -> (t >= 70 ? 1.25 : 1) * (t == 30 ? 1.5 : 1)));
        assertThat(f.breaks()).hasSize(1);
        assertThat(covers(f.breaks().get(0), 70)).isTrue();
        assertThat(f.outliers()).extracting(OutlierFinding::period).containsExactly(START.plus(30));
        OutlierFinding o = f.outliers().get(0);
        assertThat(o.direction()).isEqualTo(Side.ABOVE);
        assertThat(o.deviationPct()).isBetween(35.0, 65.0);
    }

    @Test
    void aFallAndAReturnAreTwoBreaksReadAsOneEpisode() {
        Findings f = new Analyst().analyse(series(4, 0.02, t -> t >= 100 ? 0.8 : t >= 80 ? 0.4 : 1));
        assertThat(f.breaks()).hasSize(2);
        assertThat(covers(f.breaks().get(0), 80)).isTrue();
        assertThat(covers(f.breaks().get(1), 100)).isTrue();
        assertThat(f.episodes()).hasSize(1);
        Episode e = f.episodes().get(0);
        assertThat(e.start()).isEqualTo(f.breaks().get(0).period());
        assertThat(e.rise()).isFalse();
        assertThat(e.returnStart()).contains(f.breaks().get(1).period());
        // from 40 % of the old level back to 80 %: two thirds of the fall undone, give or take the noise
        assertThat(e.returnedShare()).isBetween(0.55, 0.8);
    }

    @Test
    void pureNoiseAndAPureTrendHaveNoBreak() {
        // Each break passes a 5 % test and must move the level by 3 %: over 20 seeds, expect no
        // more than one series with a false break for noise around a flat level or a 6 % trend.
        int noiseBreaks = 0;
        int trendBreaks = 0;
        for (long seed = 1; seed <= 20; seed++) {
            noiseBreaks += new Analyst().analyse(series(seed, 0, t -> 1)).breaks().isEmpty() ? 0 : 1;
            trendBreaks += new Analyst().analyse(series(seed, 0.06, t -> 1)).breaks().isEmpty() ? 0 : 1;
        }
        assertThat(noiseBreaks).isLessThanOrEqualTo(1);
        assertThat(trendBreaks).isLessThanOrEqualTo(1);
    }

    @Test
    void breaksDoNotDependOnTheUnits() {
        Series s = series(5, 0.02, t -> t >= 60 ? 0.7 : 1);
        double[] scaled = s.values();
        for (int t = 0; t < scaled.length; t++) {
            scaled[t] *= 1000;
        }
        Series thousandfold = Series.builder("x", Frequency.MONTHLY).append(START, scaled).snapshot();
        Findings a = new Analyst().analyse(s);
        Findings b = new Analyst().analyse(thousandfold);
        assertThat(breakPeriods(b)).isEqualTo(breakPeriods(a)).isNotEmpty();
        assertThat(b.breaks().get(0).ci95()).isEqualTo(a.breaks().get(0).ci95());
        assertThat(b.outliers()).extracting(OutlierFinding::period)
                .isEqualTo(a.outliers().stream().map(OutlierFinding::period).toList());
    }

    @Test
    void anAdditiveSeriesBreaksToo() {
        // nottem-like temperatures: additive, no trend; a shift of 5 degrees
        Random random = new Random(6);
        double[] x = new double[144];
        for (int t = 0; t < x.length; t++) {
            x[t] = 50 + 12 * Math.sin(2 * Math.PI * (t - 3) / 12) + random.nextGaussian() + (t >= 90 ? 5 : 0);
        }
        Findings f = new Analyst().analyse(Series.builder("temps", Frequency.MONTHLY).append(START, x).snapshot());
        assertThat(f.transform()).isEqualTo(Transform.NONE);
        assertThat(f.breaks()).hasSize(1);
        assertThat(covers(f.breaks().get(0), 90)).isTrue();
    }

    @Test
    void veryLongSeriesUsePeltAndFindTheShift() {
        // 1,800 weeks (about 35 years): beyond Bai-Perron's range, so PELT searches
        Random random = new Random(7);
        double[] x = new double[1800];
        for (int t = 0; t < x.length; t++) {
            double season = 1 + 0.3 * Math.sin(2 * Math.PI * t / 52);
            x[t] = 300 * season * Math.exp(0.05 * random.nextGaussian()) * (t >= 1000 ? 1.3 : 1);
        }
        Findings f = new Analyst().analyse(Series.builder("weekly", Frequency.WEEKLY)
                .append(Period.isoWeek(1990, 1), x).snapshot());
        assertThat(f.breakMethod()).isEqualTo(new BreakMethod(BreakMethod.Search.PELT, false, 52));
        assertThat(f.breaks()).hasSize(1);
        assertThat(Math.abs(f.breaks().get(0).index() - 1000)).isLessThanOrEqualTo(3);
    }

    @Test
    void dailySeriesSayThatBreaksAreNotSearched() {
        Random random = new Random(8);
        double[] x = new double[800];
        for (int t = 0; t < x.length; t++) {
            x[t] = 300 * (t % 7 >= 5 ? 1.5 : 1) * Math.exp(0.1 * random.nextGaussian());
        }
        Findings f = new Analyst().analyse(Series.builder("daily", Frequency.DAILY)
                .append(Period.day(java.time.LocalDate.of(2020, 1, 1)), x).snapshot());
        assertThat(f.breaks()).isEmpty();
        assertThat(f.notes()).contains(new Caveat.BreaksNotSearchedInDailyData());
        assertThat(f.breakMethod().search()).isEqualTo(BreakMethod.Search.NOT_SEARCHED_IN_DAILY_DATA);
    }

    @Test
    void theMethodsAppendixSaysHowBreaksWereSearched() {
        Findings shifted = new Analyst().withoutOutlook().analyse(series(1, 0.02, t -> t >= 70 ? 1.25 : 1));
        // as the base revision searched this series before the search moved to analysis.breaks
        assertThat(shifted.breakMethod()).isEqualTo(new BreakMethod(BreakMethod.Search.BAI_PERRON, true, 12));
        double[] x = new double[20];
        for (int t = 0; t < x.length; t++) {
            x[t] = 100 + t % 5;
        }
        Findings tooShort = new Analyst().withoutOutlook().analyse(Series.builder("short", Frequency.MONTHLY)
                .append(START, x).snapshot());
        assertThat(tooShort.breaks()).isEmpty();
        assertThat(tooShort.breakMethod()).isEqualTo(new BreakMethod(BreakMethod.Search.NOT_SEARCHED_TOO_SHORT, false, 12));
    }
}
