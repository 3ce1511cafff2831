package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import java.util.Random;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * The outlook as a printed reader needs it (issue 14, item 6), on planted series (invented numbers):
 * the current year as observed plus forecast, next year against that estimate, the back-test's span,
 * and why there is no back-test when there is none.
 */
class OutlookOnPaperTest {

    /** Monthly nights from January 2012, seasonal, 3 % noise, the level cut by {@code drop} from {@code breakAt}. */
    private static Series nights(int n, int breakAt, double drop, long seed) {
        Random random = new Random(seed);
        double[] x = new double[n];
        for (int t = 0; t < n; t++) {
            double level = t >= breakAt ? 1000 * (1 - drop) : 1000;
            x[t] = Math.round(level * (1 + 0.3 * Math.sin(2 * Math.PI * t / 12)) * (1 + 0.03 * random.nextGaussian()));
        }
        return Series.builder("nights", Frequency.MONTHLY).unit("nights").append(Period.month(2012, 1), x).snapshot();
    }

    /** 70 months from January 2012: the data end in October 2017, ten months of 2017 are known. */
    @Test
    void aSeriesCutInOctoberGetsACurrentYearOfObservedPlusForecast() {
        Series s = nights(70, 1000, 0, 21);
        OutlookFinding o = new Analyst().analyse(s).outlook();
        OutlookFinding.CurrentYear c = o.currentYear();
        assertThat(c.year()).isEqualTo(2017);
        assertThat(c.total()).isTrue();
        assertThat(c.observedFrom()).isEqualTo(Period.month(2017, 1));
        assertThat(c.observedTo()).isEqualTo(Period.month(2017, 10));
        assertThat(c.observedPeriods()).isEqualTo(10);
        assertThat(c.forecastPeriods()).isEqualTo(2);
        double observed = Arrays.stream(s.values(), 60, 70).sum();
        assertThat(c.observed()).isEqualTo(observed);
        OutlookFinding.Point nov = o.forecasts().get(0);
        OutlookFinding.Point dec = o.forecasts().get(1);
        assertThat(nov.period()).isEqualTo(Period.month(2017, 11));
        assertThat(c.estimate().mean()).isCloseTo(observed + nov.mean() + dec.mean(), within(1e-6));
        // the interval reflects the forecast part only: it lies around the estimate and is no wider
        // than the two months' 80 % intervals laid end to end (the interval of a sum is not the sum)
        assertThat(c.estimate().lo80()).isLessThan(c.estimate().mean()).isGreaterThan(observed);
        assertThat(c.estimate().hi80()).isGreaterThan(c.estimate().mean());
        assertThat(c.estimate().hi80() - c.estimate().lo80())
                .isLessThanOrEqualTo(nov.hi80() - nov.lo80() + dec.hi80() - dec.lo80());
    }

    @Test
    void nextYearIsComparedWithTheCurrentYearsEstimateNotTheYearBefore() {
        OutlookFinding o = new Analyst().analyse(nights(70, 1000, 0, 21)).outlook();
        OutlookFinding.YearChange change = o.nextYearChange();
        assertThat(change.year()).isEqualTo(2018);
        assertThat(change.againstYear()).isEqualTo(2017);
        double expected = 100 * (o.nextYearTotal().mean() / o.currentYear().estimate().mean() - 1);
        assertThat(change.pct()).isCloseTo(expected, within(1e-9));
        assertThat(change.pctLo80()).isLessThan(change.pct());
        assertThat(change.pctHi80()).isGreaterThan(change.pct());
        assertThat(change.difference()).isCloseTo(o.nextYearTotal().mean() - o.currentYear().estimate().mean(),
                within(1e-6));
        // the rule for "about the same" (DecisionRules.OUTLOOK_SAME_PCT)
        boolean narrowAroundZero = change.pctLo80() <= 0 && change.pctHi80() >= 0
                && Math.max(-change.pctLo80(), change.pctHi80()) <= DecisionRules.OUTLOOK_SAME_PCT;
        assertThat(change.aboutTheSame()).isEqualTo(narrowAroundZero);
    }

    /** The default horizon reaches December of next year, and every period is a forecast point. */
    @Test
    void theForecastsRunToDecemberOfNextYear() {
        OutlookFinding o = new Analyst().analyse(nights(70, 1000, 0, 21)).outlook();
        assertThat(o.forecasts()).hasSize(14);
        assertThat(o.forecasts().get(13).period()).isEqualTo(Period.month(2018, 12));
        assertThat(OutlookAnalysis.defaultHorizon(Period.isoWeek(2026, 40)))
                .as("weekly: weeks 41–53 of 2026 (an ISO year that begins on a Thursday has 53 weeks) and the 52 of 2027")
                .isEqualTo(13 + 52);
        assertThat(OutlookAnalysis.defaultHorizon(Period.quarter(2026, 3))).isEqualTo(1 + 12);
    }

    /** A year observed in full: the estimate is the observed total, with no interval. */
    @Test
    void aYearObservedInFullIsItsOwnEstimate() {
        Series s = nights(72, 1000, 0, 22);
        OutlookFinding o = new Analyst().analyse(s).outlook();
        OutlookFinding.CurrentYear c = o.currentYear();
        assertThat(c.forecastPeriods()).isZero();
        double observed = Arrays.stream(s.values(), 60, 72).sum();
        assertThat(c.estimate()).isEqualTo(new OutlookFinding.Span(observed, observed, observed));
        assertThat(o.nextYearChange().againstYear()).isEqualTo(2017);
    }

    /** 72 months to December 2017, two seasonal cycles of origins: the back-test forecast 2016 and 2017. */
    @Test
    void theBacktestNamesItsSpan() {
        OutlookFinding o = new Analyst().analyse(nights(72, 1000, 0, 8)).outlook();
        assertThat(o.backtestFrom()).isEqualTo(Period.month(2016, 1));
        assertThat(o.backtestTo()).isEqualTo(Period.month(2017, 12));
    }

    /**
     * 12.5 years with a break 30 months before the end: the regime alone is too short for a
     * back-test of its own (two years of origins after two years of training), so all values are
     * kept, the series is back-tested as a whole, and the caveat names the break.
     */
    @Test
    void aBreakThirtyMonthsBeforeTheEndKeepsTheHistoryAndSaysSo() {
        OutlookFinding o = new Analyst().analyse(nights(150, 120, 0.4, 5)).outlook();
        assertThat(o.backtest()).isNotEmpty();
        assertThat(o.fittedFrom()).isEqualTo(Period.month(2012, 1));
        assertThat(o.caveats()).hasAtLeastOneElementOfType(OutlookCaveat.BreakTooRecent.class);
    }

    /**
     * Daily visitors (invented) to 30 June 2025: the printed table cannot hold 196 days, so each
     * whole month forecast is one row; a month's total is the sum of its days' forecasts.
     */
    @Test
    void dailyForecastsArePrintedAsWholeMonths() {
        Random random = new Random(41);
        java.time.LocalDate start = java.time.LocalDate.of(2024, 4, 1);
        int n = (int) java.time.temporal.ChronoUnit.DAYS.between(start, java.time.LocalDate.of(2025, 7, 1));
        double[] x = new double[n];
        for (int t = 0; t < n; t++) {
            java.time.LocalDate d = start.plusDays(t);
            x[t] = Math.round(100 + (d.getDayOfWeek().getValue() >= 6 ? 25 : 0) + 5 * random.nextGaussian());
        }
        Series s = Series.builder("visitors", Frequency.DAILY).unit("visitors").append(Period.day(start), x).snapshot();
        OutlookFinding o = new Analyst().analyse(s).outlook();
        assertThat(o.months()).extracting(OutlookFinding.Month::month).startsWith(Period.month(2025, 7))
                .contains(Period.month(2025, 12));
        OutlookFinding.Month july = o.months().get(0);
        double days = o.forecasts().subList(0, 31).stream().mapToDouble(OutlookFinding.Point::mean).sum();
        assertThat(july.total()).isTrue();
        assertThat(july.mean()).isCloseTo(days, within(1e-6 * days));
        assertThat(july.lo80()).isLessThan(july.mean());
        assertThat(july.hi80()).isGreaterThan(july.mean());
    }

    /** Values less noisy for most of the series and noisier in the back-test span: the intervals are widened. */
    @Test
    void intervalsNarrowerThanTheBacktestErrorsAreWidenedAndFlagged() {
        OutlookFinding o = new Analyst().analyse(seasonalWithNoise(0.01, 0.10)).outlook();
        assertThat(o.backtest()).isNotEmpty();
        assertThat(o.intervalsWidened()).isTrue();
    }

    /**
     * The mirror image: noisy for most of the series and quiet in the back-test span, so the model's
     * 80 % intervals are wider than the back-test's errors (24 origins, a few hundred errors): they
     * are narrowed and flagged, and the 95 % intervals still contain them.
     */
    @Test
    void intervalsWiderThanManyBacktestErrorsAreNarrowedAndFlagged() {
        OutlookFinding o = new Analyst().analyse(seasonalWithNoise(0.10, 0.01)).outlook();
        assertThat(o.backtest()).isNotEmpty();
        assertThat(o.intervalsNarrowed()).isTrue();
        for (OutlookFinding.Point p : o.forecasts()) {
            assertThat(p.lo95()).isLessThanOrEqualTo(p.lo80());
            assertThat(p.hi95()).isGreaterThanOrEqualTo(p.hi80());
        }
    }

    /** Ten years of a seasonal monthly series with relative noise {@code early}, then {@code late} in its last two years. */
    private static Series seasonalWithNoise(double early, double late) {
        Random random = new Random(31);
        double[] x = new double[120];
        for (int t = 0; t < x.length; t++) {
            double noise = t >= 96 ? late : early;
            x[t] = 1000 * (1 + 0.3 * Math.sin(2 * Math.PI * t / 12)) * (1 + noise * random.nextGaussian());
        }
        return Series.builder("nights", Frequency.MONTHLY).unit("nights").append(Period.month(2012, 1), x).snapshot();
    }
}
