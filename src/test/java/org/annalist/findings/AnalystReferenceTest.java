package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * What the analysis must say about the public reference datasets (R's datasets package; sources
 * in src/test/resources/reference/README.md). Expected statements are the well-known facts of
 * these series: AirPassengers' multiplicative growth and summer peak (Box &amp; Jenkins), co2's
 * rising annual cycle (Keeling), Nottingham's July maximum, UK gas' quarterly pattern, the Nile's
 * drop near 1898 (Cobb 1978) and the ~11-year sunspot cycle (Schwabe; from memory).
 */
class AnalystReferenceTest {

    static Findings analyse(String dataset) throws IOException {
        try (InputStream in = AnalystReferenceTest.class.getResourceAsStream("/reference/" + dataset + ".csv")) {
            Series s = new SeriesFileReader(ReadOptions.defaults()).read(dataset + ".csv", in.readAllBytes()).series().get(0);
            return new Analyst().analyse(s);
        }
    }

    @Test
    void airPassengers() throws IOException {
        Findings f = analyse("AirPassengers");
        assertThat(f.trend().direction()).isEqualTo(Direction.INCREASING);
        assertThat(f.seasonality().present()).isTrue();
        assertThat(f.seasonality().period()).isEqualTo(12);
        assertThat(f.seasonality().form()).isEqualTo(Form.MULTIPLICATIVE);
        assertThat(f.transform()).isEqualTo(Transform.LOG);
        assertThat(f.seasonality().peak().label()).isIn("Jul", "Aug");
        assertThat(f.cycle().present()).isFalse();
    }

    @Test
    void co2() throws IOException {
        Findings f = analyse("co2");
        assertThat(f.trend().direction()).isEqualTo(Direction.INCREASING);
        assertThat(f.seasonality().present()).isTrue();
        assertThat(f.seasonality().period()).isEqualTo(12);
        assertThat(f.cycle().present()).isFalse();
    }

    @Test
    void nottem() throws IOException {
        Findings f = analyse("nottem");
        assertThat(f.seasonality().present()).isTrue();
        assertThat(f.seasonality().peak().label()).isEqualTo("Jul");
    }

    @Test
    void ukGas() throws IOException {
        Findings f = analyse("UKgas");
        assertThat(f.series().frequency()).isEqualTo("quarterly");
        assertThat(f.seasonality().period()).isEqualTo(4);
        assertThat(f.seasonality().present()).isTrue();
        assertThat(f.trend().direction()).isEqualTo(Direction.INCREASING);
    }

    @Test
    void nile() throws IOException {
        Findings f = analyse("Nile");
        assertThat(f.trend().direction()).isIn(Direction.DECREASING, Direction.NONE);
        assertThat(f.seasonality().present()).isFalse();
        assertThat(f.cycle().present()).isFalse();
    }

    @Test
    void sunspots() throws IOException {
        Findings f = analyse("sunspot.year");
        assertThat(f.cycle().present()).isTrue();
        assertThat(f.cycle().length()).isBetween(10.0, 12.0);
        assertThat(f.cycle().lengthUnit()).isEqualTo("years");
        assertThat(f.seasonality().present()).isFalse();
    }
}
