package org.annalist.findings;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.annalist.series.Frequency;
import org.annalist.series.Period;

/**
 * Hand-made findings of a monthly series of nights, holding only what the claims are built from
 * (the latest period, its year-on-year, year-to-date and rolling-year changes, the trends and the
 * breaks); every number is invented for the test.
 */
public final class ClaimsFixture {

    private final Period end;
    private final int observations;
    private IndicatorsFinding.Comparison lastYear;
    private IndicatorsFinding.Span ytd;
    private IndicatorsFinding.Span rolling;
    private TrendFinding trend = TrendFinding.notAssessed();
    private final List<BreakFinding> breaks = new ArrayList<>();

    private ClaimsFixture(Period end, int observations) {
        this.end = end;
        this.observations = observations;
    }

    /** A monthly series of {@code observations} periods ending in {@code end}. */
    public static ClaimsFixture monthly(Period end, int observations) {
        return new ClaimsFixture(end, observations);
    }

    /** The latest period against a year earlier, in %, from a level of 100,000 a year earlier. */
    public ClaimsFixture latest(double pct) {
        lastYear = new IndicatorsFinding.Comparison(end.plus(-12), 100_000, 1000 * pct, pct);
        return this;
    }

    public ClaimsFixture yearToDate(double pct) {
        ytd = new IndicatorsFinding.Span(Period.month(end.year(), 1), end, 1_000_000 * (1 + pct / 100), 1_000_000,
                10_000 * pct, pct);
        return this;
    }

    public ClaimsFixture rollingYear(double pct) {
        rolling = new IndicatorsFinding.Span(end.plus(-11), end, 1_200_000 * (1 + pct / 100), 1_200_000, 12_000 * pct,
                pct);
        return this;
    }

    /** The whole period's trend; {@code pctPerYear} of the mean level. */
    public ClaimsFixture wholeTrend(Direction direction, double pctPerYear, double p) {
        trend = new TrendFinding(direction, new TrendFinding.Test(TestName.MANN_KENDALL_AR1, true, 1), 3.0, p,
                1000 * pctPerYear, List.of(900 * pctPerYear, 1100 * pctPerYear), pctPerYear, Optional.empty(),
                observations, trend.latestRegime());
        return this;
    }

    /** The trend since {@code since}, in nights per year. */
    public ClaimsFixture sinceBreak(Period since, Direction direction, double slopePerYear, double p) {
        trend = new TrendFinding(trend.direction(), trend.test(), trend.statistic(), trend.pValue(), trend.slopePerYear(),
                trend.slopeCi95(), trend.changePctPerYear(), Optional.empty(), trend.n(),
                Optional.of(new TrendFinding.LatestRegime(since, direction, slopePerYear, slopePerYear - 500,
                        slopePerYear + 500, p, (int) since.until(end) + 1, null)));
        return this;
    }

    /** A break at {@code at} moving the level by {@code pct}. */
    public ClaimsFixture step(Period at, double pct) {
        int index = (int) (observations - 1 - at.until(end));
        breaks.add(new BreakFinding(at, List.of(at.plus(-1), at.plus(1)), 100_000, 100_000 * (1 + pct / 100), pct, 40,
                0.002, false, index, BreakKind.LEVEL, 0, 0, end, 100_000 * (1 + pct / 100)));
        return this;
    }

    /**
     * A change of slope at {@code at} whose date's 95 % interval runs from {@code earliest} to
     * {@code latest}, the lines joined there (no step).
     */
    public ClaimsFixture bend(Period at, Period earliest, Period latest) {
        int index = (int) (observations - 1 - at.until(end));
        breaks.add(new BreakFinding(at, List.of(earliest, latest), 100_000, 100_000, 0, 30, 0.004, false, index,
                BreakKind.SLOPE, 100, 700, end, 110_000));
        return this;
    }

    public Findings findings() {
        Period start = end.plus(1L - observations);
        SeriesFacts facts = new SeriesFacts("Total", "nights", Frequency.MONTHLY.label(), start.label(), end.label(),
                observations, 0, Measure.FLOW);
        IndicatorsFinding indicators = lastYear == null ? null : new IndicatorsFinding(end,
                lastYear.value() + lastYear.change(), List.of(), Measure.FLOW, lastYear, null, ytd, rolling, null,
                new IndicatorsFinding.Rank(1, observations / 12), null);
        RecentPeriod recent = new RecentPeriod(end, lastYear == null ? null : lastYear.value() + lastYear.change(),
                end.plus(-12), lastYear == null ? null : lastYear.value(), lastYear == null ? null : lastYear.change(),
                lastYear == null ? null : lastYear.changePct(), Set.of(), Set.of());
        return new Findings(facts, Transform.NONE, trend, null, null, List.of(), breaks, null, null, indicators, null,
                null, List.of(recent), List.of(), null, Optional.empty(), List.of(), null);
    }
}
