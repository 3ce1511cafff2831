package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;

import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/** Reads public datasets as published with R (see src/test/resources/reference/README.md). */
class ReferenceDatasetsTest {

    @Test
    void airPassengersIs144MonthlyValuesFrom1949() {
        // Box, Jenkins & Reinsel (1976), Series G: 144 months 1949-01..1960-12, first 112, last 432.
        Series s = Files.read("AirPassengers.csv", Files.resource("/reference/AirPassengers.csv")).series().get(0);
        assertThat(s.frequency()).isEqualTo(Frequency.MONTHLY);
        assertThat(s.start()).isEqualTo(Period.month(1949, 1));
        assertThat(s.end()).isEqualTo(Period.month(1960, 12));
        assertThat(s.size()).isEqualTo(144);
        assertThat(s.missingCount()).isZero();
        assertThat(s.value(0)).isEqualTo(112);
        assertThat(s.value(143)).isEqualTo(432);
        assertThat(s.name()).isEqualTo("AirPassengers");
    }

    @Test
    void nileIs100AnnualFlowsFrom1871() {
        // Durbin & Koopman (2001) / R datasets::Nile: 1871..1970, first 1120, last 740.
        Series s = Files.read("Nile.csv", Files.resource("/reference/Nile.csv")).series().get(0);
        assertThat(s.frequency()).isEqualTo(Frequency.ANNUAL);
        assertThat(s.start()).isEqualTo(Period.year(1871));
        assertThat(s.end()).isEqualTo(Period.year(1970));
        assertThat(s.size()).isEqualTo(100);
        assertThat(s.value(0)).isEqualTo(1120);
        assertThat(s.value(99)).isEqualTo(740);
    }
}
