package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

/** A number that could not be computed is null in the JSON, and listed by its JSON Pointer, never "NaN". */
class FindingsJsonNotComputedTest {

    record Inner(double share, List<Double> values, double[] path) {
    }

    record Outer(double level, Double change, Inner inner) {
    }

    @Test
    void nanAndInfinityBecomeNullWithTheirPointersListed() {
        Outer outer = new Outer(Double.NaN, 2.5, new Inner(Double.POSITIVE_INFINITY,
                Arrays.asList(1.0, Double.NaN), new double[] {3, Double.NEGATIVE_INFINITY}));
        String json = FindingsJson.write(outer, null);
        assertThat(json).doesNotContain("NaN").doesNotContain("Infinity");
        assertThat(json.replaceAll("\\s+", "")).contains("\"level\":null", "\"change\":2.5", "\"share\":null",
                "\"values\":[1.0,null]", "\"path\":[3.0,null]",
                "\"not_computed\":[\"/level\",\"/inner/share\",\"/inner/values/1\",\"/inner/path/1\"]");

        String list = FindingsJson.write(List.of(new Outer(1, 1.0, new Inner(1, List.of(), new double[0])), outer), null);
        assertThat(list).doesNotContain("NaN");
        assertThat(list.replaceAll("\\s+", "")).contains("\"not_computed\":[\"/level\",\"/inner/share\"");
    }

    @Test
    void findingsWithEveryNumberComputedGainNoField() {
        assertThat(FindingsJson.write(new Outer(1, 2.0, new Inner(3, List.of(4.0), new double[] {5})), null))
                .doesNotContain("not_computed");
    }
}
