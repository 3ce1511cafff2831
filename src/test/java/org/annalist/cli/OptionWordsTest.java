package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import org.junit.jupiter.api.Test;

/**
 * The words of the choices reach picocli through converters to the domain's own types: any case,
 * {@code auto} for "decide from the data", and a word not known refused with the message users
 * have always been given.
 */
class OptionWordsTest {

    private static final String NILE = "src/test/resources/reference/Nile.csv";
    private static final String AIR = "src/test/resources/reference/AirPassengers.csv";

    @Test
    void aWordNotKnownIsAUsageErrorThatListsTheWords() {
        String[][] cases = {
            {"--form", "cubic", "expected one of [auto, additive, multiplicative] (case-insensitive) but was 'cubic'"},
            {"--form", " additive", "expected one of [auto, additive, multiplicative] (case-insensitive) but was ' additive'"},
            {"--measure", "ratio", "expected one of [auto, flow, level, rate, interval] (case-insensitive) but was 'ratio'"},
            {"--decimal-mark", "dot", "expected one of [auto, point, comma] (case-insensitive) but was 'dot'"},
            {"--aggregate", "fortnight", "expected one of [week, month, quarter, year] (case-insensitive) but was 'fortnight'"},
            {"--date-order", "sideways", "'sideways' is not a date order; expected auto, day-first or month-first"},
        };
        for (String[] c : cases) {
            Run run = Run.of("analyze", c[0], c[1], NILE);
            assertThat(run.exitCode()).as(c[0]).isEqualTo(ExitCodes.BAD_INPUT);
            assertThat(run.err()).as(c[0]).isEqualTo("annalist: Invalid value for option '" + c[0] + "': " + c[2]
                    + System.lineSeparator() + "Try 'annalist analyze --help'." + System.lineSeparator());
        }
        Run paper = Run.of("brief", "--paper", "a3", NILE);
        assertThat(paper.err()).startsWith("annalist: Invalid value for option '--paper': expected one of [a4, letter] "
                + "(case-insensitive) but was 'a3'");
    }

    @Test
    void wordsAreReadInAnyCaseAndAutoLeavesItToTheData() throws IOException {
        ObjectMapper json = new ObjectMapper();
        Run forced = Run.of("analyze", "--form", "ADDITIVE", "--horizon", "0", "--format", "json", AIR);
        assertThat(json.readTree(forced.out()).get("transform").asText()).isEqualTo("none");
        Run auto = Run.of("analyze", "--form", "Auto", "--horizon", "0", "--format", "json", AIR);
        assertThat(json.readTree(auto.out()).get("transform").asText()).isEqualTo("log");
        Run level = Run.of("analyze", "--measure", "LEVEL", "--horizon", "0", "--format", "json", AIR);
        assertThat(json.readTree(level.out()).get("indicators").get("measure").asText()).isEqualTo("level");
        Run interval = Run.of("analyze", "--measure", "Interval", "--horizon", "0", "--format", "json", AIR);
        JsonNode asInterval = json.readTree(interval.out());
        assertThat(asInterval.get("indicators").get("measure").asText()).isEqualTo("interval");
        assertThat(asInterval.get("transform").asText()).isEqualTo("none");   // no logs of an interval scale
        Run rate = Run.of("analyze", "--measure", "RATE", "--horizon", "0", "--format", "json", AIR);
        assertThat(json.readTree(rate.out()).get("series").get("measure").asText()).isEqualTo("rate");
        Run quarters = Run.of("analyze", "--aggregate", "Quarter", "--aggregate-by", "mean", "--horizon", "0",
                "--format", "json", AIR);
        assertThat(json.readTree(quarters.out()).get("series").get("frequency").asText()).isEqualTo("quarterly");
        // a date order as the README writes it, with an underscore, or in capitals and spaces
        for (String order : new String[] {"day-first", "day_first", " MONTH-FIRST ", "auto"}) {
            assertThat(Run.of("check", "--date-order", order, NILE).exitCode()).as(order).isZero();
        }
        assertThat(Run.of("check", "--decimal-mark", "Comma", NILE).exitCode()).isZero();
    }
}
