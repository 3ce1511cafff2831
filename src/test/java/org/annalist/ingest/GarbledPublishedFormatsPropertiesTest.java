package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Garbled SDMX-CSV, bulk tab and JSON-stat files (characters deleted, inserted or replaced) are read
 * or refused with the reader's own data-problem error naming the file, never anything else.
 */
class GarbledPublishedFormatsPropertiesTest {

    private static final List<String> VALID = List.of(
            "STRUCTURE[;],STRUCTURE_ID,ACTION,FREQ,MARKET: Market,TIME_PERIOD,OBS_VALUE,OBS_STATUS\n"
                    + "dataflow,QM:N(1.0),I,M,DOM: Domestic,2024-01,12,A\ndataflow,QM:N(1.0),D,M,DOM: Domestic,2024-02,-,\n"
                    + "dataflow,QM:N(1.0),I,M,LH: Long-haul,2024-M02,13.5,P\n",
            "DATAFLOW;MARKET;TIME_PERIOD;OBS_VALUE;CONF_STATUS\nQM:N(1.0);DOM;2024-Q1;1,5;C\nQM:N(1.0);DOM;2024-Q2;2;F\n",
            "freq,market\\TIME_PERIOD\t2024M01 \t2024M02 \nM,DOM\t12 p\t: c\nM,LH\t3\t4 e\n",
            "{\"version\":\"2.0\",\"class\":\"dataset\",\"id\":[\"m\",\"time\"],\"size\":[2,2],\"dimension\":{\"m\":{\"category\":"
                    + "{\"index\":{\"A\":0,\"B\":1},\"label\":{\"A\":\"Aa\"}}},\"time\":{\"category\":{\"index\":[\"2024-01\","
                    + "\"2024-02\"]}}},\"value\":{\"0\":1,\"1\":2,\"3\":4},\"status\":[\"p\",null,\"e\",\"\"]}");

    @Property(tries = 600)
    void garbledPortalFilesAreReadOrRefusedWithADataProblem(@ForAll("files") int which,
                                                          @ForAll("edits") List<GarbledInputPropertiesTest.Edit> edits) {
        StringBuilder text = new StringBuilder(VALID.get(which));
        edits.forEach(e -> e.apply(text));
        try {
            ReadResult read = new SeriesFileReader(ReadOptions.defaults()).read("fuzz.csv",
                    text.toString().getBytes(StandardCharsets.UTF_8));
            assertThat(read.series()).isNotEmpty();
        } catch (DataProblemException refused) {
            assertThat(refused.problems()).isNotEmpty().allSatisfy(p -> assertThat(p.file()).isEqualTo("fuzz.csv"));
        }
    }

    @Provide
    Arbitrary<Integer> files() {
        return Arbitraries.integers().between(0, VALID.size() - 1);
    }

    @Provide
    Arbitrary<List<GarbledInputPropertiesTest.Edit>> edits() {
        Arbitrary<Character> chars = Arbitraries.of(';', ',', '"', '\n', ':', '.', '-', '\\', '\t', '{', '}', '[', ']',
                'Q', 'M', 'S', 'p', 'x', '0', '9', ' ', 'D');
        return net.jqwik.api.Combinators.combine(Arbitraries.integers().between(0, 2), Arbitraries.integers().between(0, 10_000),
                chars).as(GarbledInputPropertiesTest.Edit::new).list().ofMinSize(1).ofMaxSize(8);
    }
}
