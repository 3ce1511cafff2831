package org.annalist.analysis.indicators;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Set;
import org.annalist.analysis.Reference;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.series.ValueFlag;
import org.junit.jupiter.api.Test;

class LatestIndicatorsTest {

    private static Series air() {
        return Series.builder("AirPassengers", Frequency.MONTHLY).append(Period.month(1949, 1),
                Reference.dataset("AirPassengers.csv")).snapshot();
    }

    @Test
    void airPassengersDecember1960() {
        // From the data itself (Box & Jenkins Series G): Dec 1960 = 432, Dec 1959 = 405, Dec 1958 = 337;
        // 1960 total 5,714 against 5,140 in 1959; December ranks first of the 12 Decembers.
        LatestIndicators.Result r = LatestIndicators.at(air(), 143, LatestIndicators.Measure.FLOW, null);
        assertThat(r.lastYear().orElseThrow().value()).isEqualTo(405);
        assertThat(r.lastYear().orElseThrow().changePct()).isCloseTo(100 * (432.0 / 405 - 1), within(1e-12));   // +6.67 %
        assertThat(r.twoYearsAgo().orElseThrow().value()).isEqualTo(337);
        assertThat(r.yearToDate().orElseThrow().from()).isEqualTo(Period.month(1960, 1));
        assertThat(r.yearToDate().orElseThrow().total()).isEqualTo(5714);
        assertThat(r.yearToDate().orElseThrow().previousTotal()).isEqualTo(5140);
        assertThat(r.rollingYear().orElseThrow().total()).isEqualTo(5714);
        assertThat(r.rank()).isEqualTo(new LatestIndicators.Rank(1, 12));
        assertThat(r.extreme()).isEmpty();   // July and August 1960 were higher
    }

    @Test
    void ratesAreAveragedNotSummed() {
        // occupancy in %: 60, 70, 80 then 66, 72, 84 a year later (invented)
        Series s = Series.builder("occupancy", Frequency.QUARTERLY).unit("%")
                .append(Period.quarter(2024, 1), 60, 70, 80, 90, 66, 72, 84).snapshot();
        LatestIndicators.Result r = LatestIndicators.at(s, 6, LatestIndicators.Measure.LEVEL, null);
        assertThat(r.yearToDate().orElseThrow().total()).isCloseTo(74, within(1e-12));             // (66 + 72 + 84) / 3
        assertThat(r.yearToDate().orElseThrow().previousTotal()).isCloseTo(70, within(1e-12));     // (60 + 70 + 80) / 3
        assertThat(r.yearToDate().orElseThrow().change()).isCloseTo(4, within(1e-12));             // percentage points
        assertThat(r.lastYear().orElseThrow().change()).isCloseTo(4, within(1e-12));
        assertThat(r.rollingYear()).as("four quarters need four earlier ones to compare with").isEmpty();
    }

    @Test
    void aMissingValueStopsTheSpanComparisonAndFlagsCarryThrough() {
        Series s = Series.builder("nights", Frequency.MONTHLY)
                .put(Period.month(2025, 1), 10).put(Period.month(2025, 2), 12).put(Period.month(2025, 3), 14)
                .put(Period.month(2026, 1), 11).put(Period.month(2026, 3), 15, Set.of(ValueFlag.PROVISIONAL))
                .snapshot();
        LatestIndicators.Result r = LatestIndicators.at(s, 14, LatestIndicators.Measure.FLOW, null);
        assertThat(r.yearToDate()).isEmpty();                 // February 2026 is missing
        assertThat(r.lastYear().orElseThrow().changePct()).isCloseTo(100 * (15.0 / 14 - 1), within(1e-12));
        assertThat(r.flags()).contains(ValueFlag.PROVISIONAL);
        assertThat(r.extreme()).contains(LatestIndicators.Extreme.HIGHEST);
    }

    @Test
    void aLeapFebruaryIsNoticed() {
        Series s = Series.builder("nights", Frequency.MONTHLY).append(Period.month(2023, 1), new double[14]).snapshot();
        assertThat(LatestIndicators.at(s, 13, LatestIndicators.Measure.FLOW, null).longerFebruary()).isEqualTo(1);
        assertThat(LatestIndicators.at(s, 12, LatestIndicators.Measure.FLOW, null).longerFebruary()).isZero();
    }

    @Test
    void aRatioOverASpanIsTheRatioOfTheSums() {
        // Invented: nights 100, 300 and arrivals 50, 100 in Jan-Feb 2026 (ALOS 2.0 and 3.0); a year
        // earlier nights 90, 200 and arrivals 45, 80. Year-to-date ALOS = 400 / 150 = 2.667 (not the
        // mean 2.5), a year earlier 290 / 125 = 2.32.
        Series nights = Series.builder("nights", Frequency.MONTHLY).put(Period.month(2025, 1), 90)
                .put(Period.month(2025, 2), 200).put(Period.month(2026, 1), 100).put(Period.month(2026, 2), 300).snapshot();
        Series arrivals = Series.builder("arrivals", Frequency.MONTHLY).put(Period.month(2025, 1), 45)
                .put(Period.month(2025, 2), 80).put(Period.month(2026, 1), 50).put(Period.month(2026, 2), 100).snapshot();
        Series alos = Series.builder("ALOS", Frequency.MONTHLY).put(Period.month(2025, 1), 2.0)
                .put(Period.month(2025, 2), 2.5).put(Period.month(2026, 1), 2.0).put(Period.month(2026, 2), 3.0).snapshot();
        LatestIndicators.Result r = LatestIndicators.at(alos, alos.size() - 1, LatestIndicators.Measure.RATIO, null,
                new LatestIndicators.Parts(nights, arrivals, 1));
        assertThat(r.yearToDate().orElseThrow().total()).isCloseTo(400.0 / 150, within(1e-12));
        assertThat(r.yearToDate().orElseThrow().previousTotal()).isCloseTo(290.0 / 125, within(1e-12));
    }
}
