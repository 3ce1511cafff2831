package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * Units of portal files: SDMX's UNIT_MULT applied to the values (SDMX Glossary 2.1, "Unit multiplier":
 * value times 10^UNIT_MULT, "UNIT_MULT=6 indicates that observations are in millions"; code list
 * CL_UNIT_MULT: 3 thousands, 6 millions; checked), and JSON-stat 2.0's {@code category.unit} (full
 * specification, json-stat.org/full, "unit" with decimals, label, symbol, position: the properties checked,
 * their place under a metric dimension's category from memory) naming the series' unit.
 */
class PublishedUnitsTest {

    @Test
    void unitMultIsAppliedExactlyAndSaidInAWarning() {
        String text = """
                DATAFLOW,FREQ,MARKET,TIME_PERIOD,OBS_VALUE,UNIT_MULT
                QM:NIGHTS(1.0),M,DOM,2024-01,1.2,3
                QM:NIGHTS(1.0),M,DOM,2024-02,1.35,3
                QM:NIGHTS(1.0),M,BRE,2024-01,0.25,6
                QM:NIGHTS(1.0),M,BRE,2024-02,0.5,6: Millions
                QM:NIGHTS(1.0),M,LH,2024-01,80,
                QM:NIGHTS(1.0),M,LH,2024-02,81,0
                """;
        ReadResult read = Files.read("mult.csv", text);
        assertThat(read.find("M.DOM").orElseThrow().values()).containsExactly(1200, 1350);
        assertThat(read.find("M.BRE").orElseThrow().values()).containsExactly(250_000, 500_000);
        assertThat(read.find("M.LH").orElseThrow().values()).containsExactly(80, 81);
        assertThat(read.warnings()).extracting(DataProblem::toString).contains(
                "mult.csv:2: values multiplied by 10^3 (thousands), as their UNIT_MULT 3 says (first on this line)",
                "mult.csv:4: values multiplied by 10^6 (millions), as their UNIT_MULT 6 says (first on this line)");
    }

    @Test
    void aUnitMultThatIsNoPowerOfTenIsRefusedAtItsCell() {
        String text = """
                DATAFLOW,MARKET,TIME_PERIOD,OBS_VALUE,UNIT_MULT
                QM:NIGHTS(1.0),DOM,2024-01,1.2,3
                QM:NIGHTS(1.0),DOM,2024-02,1.3,k
                QM:NIGHTS(1.0),DOM,2024-03,1.4,99
                """;
        assertThatThrownBy(() -> Files.read("mult.csv", text)).isInstanceOf(DataProblemException.class)
                .hasMessageContaining("mult.csv:3:5: UNIT_MULT 'k' is not a power of ten")
                .hasMessageContaining("mult.csv:4:5: UNIT_MULT '99' is not a power of ten");
    }

    @Test
    void jsonStatUnitsNameEachSeriesUnitByLabelOrSymbol() {
        // JSON-stat 2.0, section "unit" (child of "category", for a dimension with role "metric")
        String json = """
                {"version":"2.0","class":"dataset","id":["metric","time"],"size":[2,2],
                 "role":{"time":["time"],"metric":["metric"]},
                 "value":[1200,1310,55.5,61.0],
                 "dimension":{
                   "metric":{"category":{"index":["NIGHTS","OCC"],
                     "label":{"NIGHTS":"Guest nights","OCC":"Bed occupancy"},
                     "unit":{"NIGHTS":{"decimals":0,"label":"nights"},"OCC":{"decimals":1,"symbol":"%","position":"end"}}}},
                   "time":{"category":{"index":["2024-01","2024-02"]}}}}
                """;
        ReadResult read = Files.read("units.json", json);
        Series nights = read.find("NIGHTS").orElseThrow();
        Series occupancy = read.find("OCC").orElseThrow();
        assertThat(nights.unit()).isEqualTo("nights");
        assertThat(occupancy.unit()).isEqualTo("%");
        assertThat(occupancy.values()).containsExactly(55.5, 61.0);
    }

    @Test
    void aJsonStatWithoutUnitsLeavesTheUnitEmpty() {
        String json = """
                {"version":"2.0","class":"dataset","id":["time"],"size":[2],"value":[1,2],
                 "dimension":{"time":{"category":{"index":["2024-01","2024-02"]}}}}
                """;
        assertThat(Files.read("plain.json", json).series().get(0).unit()).isEmpty();
    }
}
