package org.annalist.brief;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

class DerivedSeriesTest {

    private static Series s(String name, String unit, double... values) {
        return Series.builder(name, Frequency.MONTHLY).unit(unit).append(Period.month(2025, 1), values).snapshot();
    }

    @Test
    void nightsAndArrivalsOfTheSameMarketGiveItsAverageLengthOfStay() {
        List<DerivedSeries.Derived> d = DerivedSeries.of(List.of(s("Domestic nights", "", 250, 300),
                s("Domestic arrivals", "", 100, 120), s("Abroad nights", "", 90, 60)));
        assertThat(d).hasSize(1);
        Series alos = d.get(0).series();
        assertThat(alos.name()).isEqualTo("Domestic average length of stay");
        assertThat(alos.unit()).isEqualTo("nights per arrival");
        assertThat(alos.value(0)).isCloseTo(2.5, within(1e-12));
        assertThat(alos.value(1)).isCloseTo(2.5, within(1e-12));
    }

    @Test
    void unitsCanSayWhichPartASeriesIs() {
        List<DerivedSeries.Derived> d = DerivedSeries.of(List.of(s("Total", "nights", 80, 90),
                s("Total", "bed-places", 100, 100)));
        assertThat(d).singleElement().satisfies(x -> {
            assertThat(x.series().name()).isEqualTo("Total occupancy");
            assertThat(x.series().unit()).isEqualTo("%");
            assertThat(x.series().value(1)).isCloseTo(90.0, within(1e-12));
        });
    }
}
