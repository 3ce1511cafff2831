package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The findings JSON follows the design brief's schema key for key. */
class AnalyzeCommandTest {

    private static List<String> keys(JsonNode node) {
        List<String> keys = new ArrayList<>();
        node.fieldNames().forEachRemaining(keys::add);
        return keys;
    }

    @Test
    void jsonHasExactlyTheContractsFields() throws IOException {
        Run run = Run.of("analyze", "--format", "json", "src/test/resources/reference/AirPassengers.csv");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode f = new ObjectMapper().readTree(run.out());
        assertThat(keys(f)).containsExactly("schema", "series", "transform", "trend", "seasonality", "cycle", "outliers",
                "breaks", "irregular", "smoothing", "indicators", "calendar", "outlook", "claims");
        assertThat(f.get("schema").asText()).isEqualTo("annalist.findings/1");
        assertThat(keys(f.get("claims"))).containsExactly("headline", "statements");
        assertThat(keys(f.get("claims").get("statements").get(0))).containsExactly("quantity", "from", "to", "direction",
                "size", "unit", "relative_pct", "p_value", "strength", "status", "qualifications", "withheld");
        assertThat(keys(f.get("series"))).containsExactly("name", "unit", "frequency", "start", "end", "observations",
                "missing", "measure");
        assertThat(f.get("series").get("measure").asText()).isEqualTo("flow");
        assertThat(keys(f.get("trend"))).containsExactly("direction", "test", "statistic", "p_value", "slope_per_year",
                "slope_ci95", "change_pct_per_year");
        assertThat(keys(f.get("seasonality"))).containsExactly("present", "period", "strength", "test", "p_value",
                "form", "peak", "trough", "profile");   // profile added by issue 14: the indices page 1 quotes
        assertThat(keys(f.get("seasonality").get("peak"))).containsExactly("position", "label");
        assertThat(keys(f.get("cycle"))).containsExactly("present", "length", "length_unit", "peaks", "gaps", "regular");
        assertThat(keys(f.get("irregular"))).containsExactly("share", "label");
        assertThat(keys(f.get("smoothing"))).containsExactly("method", "window");
        assertThat(f.get("transform").asText()).isEqualTo("log");
        assertThat(f.get("trend").get("direction").asText()).isEqualTo("increasing");
        assertThat(f.get("trend").get("slope_ci95").size()).isEqualTo(2);
        assertThat(f.get("seasonality").get("period").asInt()).isEqualTo(12);
        assertThat(f.get("outliers").isArray()).isTrue();
        JsonNode i = f.get("indicators");
        assertThat(keys(i)).contains("period", "value", "flagged", "measure", "same_period_last_year", "year_to_date",
                "rolling_year", "seasonally_adjusted_change_pct", "adjusted_for_calendar", "rank");
        // AirPassengers, from the data: December 1960 = 432 against 405 a year earlier (+6.67 %)
        assertThat(i.get("period").asText()).isEqualTo("1960-12");
        assertThat(i.get("same_period_last_year").get("change_pct").asDouble()).isCloseTo(100 * (432.0 / 405 - 1),
                org.assertj.core.api.Assertions.within(1e-9));
        assertThat(keys(i.get("year_to_date"))).contains("from", "to", "total", "previous_total", "change_pct");
        assertThat(keys(i.get("rank"))).containsExactly("position", "of", "tied_with");
        JsonNode c = f.get("calendar");
        assertThat(keys(c)).containsExactly("easter", "effects", "notes", "weekdays", "screened_out", "latest_change",
                "easter_evidence");
        assertThat(keys(c.get("easter_evidence"))).containsExactly("mostly_earlier", "mostly_later", "needed", "tested",
                "months");
        assertThat(c.get("easter").get(0).get("date").asText()).isEqualTo("1949-04-17");   // Easter 1949 (Meeus)
        JsonNode o = f.get("outlook");
        assertThat(keys(o)).containsExactly("method", "model", "horizon", "fitted_from", "forecasts", "next_year_total",
                "next_year_average", "backtest", "chosen_because", "typical_error_pct", "current_year",
                "next_year_change", "intervals_widened", "intervals_narrowed",
                "backtest_from", "backtest_to", "typical_year_error_pct", "months");
        // 1960 is observed in full: it is its own estimate, and 1961 is set against it
        assertThat(o.get("current_year").get("year").asInt()).isEqualTo(1960);
        assertThat(o.get("current_year").get("forecast_periods").asInt()).isZero();
        assertThat(o.get("next_year_change").get("against_year").asInt()).isEqualTo(1960);
        assertThat(o.get("backtest_to").asText()).isEqualTo("1960-12");
        // the data end in December 1960: the rest of that year is empty, so 12 periods ahead, all of 1961
        assertThat(o.get("horizon").asInt()).isEqualTo(12);
        // fitted on the latest regime: it spans more than two years after the last break
        JsonNode breaks = f.get("breaks");
        // all values, or the latest regime alone when the back-test showed it clearly better
        assertThat(o.get("fitted_from").asText()).isIn("1949-01", breaks.isEmpty() ? "1949-01"
                : breaks.get(breaks.size() - 1).get("period").asText());
        assertThat(o.get("forecasts").size()).isEqualTo(12);
        assertThat(keys(o.get("forecasts").get(0))).containsExactly("period", "mean", "lo80", "hi80", "lo95", "hi95");
        assertThat(o.get("forecasts").get(0).get("period").asText()).isEqualTo("1961-01");
        assertThat(keys(o.get("next_year_total"))).containsExactly("mean", "lo80", "hi80");
        assertThat(o.get("next_year_average").isNull()).isTrue();
        // the average, ETS, ARIMA, Theta and the seasonal naive rule, over the last two seasonal cycles
        assertThat(o.get("backtest").size()).isEqualTo(5);
        assertThat(o.get("backtest").get(0).get("method").asText()).isEqualTo("combination");
        assertThat(o.get("chosen_because").asText()).contains("back-test over the last 24 periods");

        Run demo = Run.of("analyze", "--format", "json", "--series", "Total", "demo-data/quennelmark-guest-nights.csv");
        JsonNode backtest = new ObjectMapper().readTree(demo.out()).get("outlook").get("backtest");
        assertThat(backtest.size()).isEqualTo(5);   // the average, ETS, ARIMA, Theta, seasonal naive
        assertThat(keys(backtest.get(0))).containsExactly("method", "mase", "smape");
    }

    @Test
    void horizonSetsTheOutlooksLengthAndZeroLeavesItOut() throws IOException {
        Run longer = Run.of("analyze", "--format", "json", "--horizon", "30", "src/test/resources/reference/AirPassengers.csv");
        assertThat(new ObjectMapper().readTree(longer.out()).get("outlook").get("forecasts").size()).isEqualTo(30);
        Run none = Run.of("analyze", "--format", "json", "--horizon", "0", "src/test/resources/reference/AirPassengers.csv");
        assertThat(new ObjectMapper().readTree(none.out()).get("outlook").isNull()).isTrue();
        Run negative = Run.of("analyze", "--horizon", "-3", "src/test/resources/reference/AirPassengers.csv");
        assertThat(negative.exitCode()).isEqualTo(2);
        assertThat(negative.err()).contains("--horizon").doesNotContain("Exception");
    }

    @Test
    void severalSeriesGiveAnArray() throws IOException {
        Run run = Run.of("analyze", "--format", "json", "demo-data/quennelmark-guest-nights.csv");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode all = new ObjectMapper().readTree(run.out());
        assertThat(all.isArray()).isTrue();
        assertThat(all.size()).isEqualTo(4);
        assertThat(all.get(0).get("series").get("name").asText()).isEqualTo("Total");
        assertThat(all.get(0).get("series").get("unit").asText()).isEqualTo("nights");
        Run one = Run.of("analyze", "--format", "json", "--series", "Brevania", "demo-data/quennelmark-guest-nights.csv");
        assertThat(new ObjectMapper().readTree(one.out()).get("series").get("name").asText()).isEqualTo("Brevania");
    }

    @Test
    void textReadsLikeNotesWithEvidence() {
        Run run = Run.of("analyze", "src/test/resources/reference/Nile.csv");
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).contains("trend:", "Mann-Kendall", "Sen slope", "seasonality:  not applicable (annual data)",
                "cycle:        none");
    }

    @Test
    void unknownSeriesIsAUsageError() {
        Run run = Run.of("analyze", "--series", "nope", "src/test/resources/reference/Nile.csv");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("no series named 'nope'");
    }

    @Test
    void theDemoExplainsAnAprilWhenEasterMoved() throws IOException {
        // Demo data (invented): Easter 31 March 2024, 20 April 2025, with a planted Easter effect.
        Run run = Run.of("analyze", "--format", "json", "--series", "Total", "--period", "2025-04",
                "demo-data/quennelmark-guest-nights.csv");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode f = new ObjectMapper().readTree(run.out());
        assertThat(f.get("indicators").get("period").asText()).isEqualTo("2025-04");
        JsonNode easter = f.get("calendar").get("effects").get(0);
        assertThat(easter.get("name").asText()).isEqualTo("easter");
        assertThat(easter.get("kept").asBoolean()).isTrue();
        String notes = f.get("calendar").get("notes").toString();
        assertThat(notes).contains("Easter Sunday was on 20 April 2025, a year earlier on 31 March 2024",
                "allowing for it, April 2025 was about", "March and April together");
        // the change with the later Easter allowed for, typed beside the raw change
        JsonNode latest = f.get("calendar").get("latest_change");
        assertThat(latest.get("change_pct").asDouble()).isCloseTo(100 * (106788.0 / 99228 - 1),
                org.assertj.core.api.Assertions.within(1e-9));   // demo data: April 2025 against April 2024
        assertThat(latest.get("adjusted_change_pct").asDouble()).isLessThan(latest.get("change_pct").asDouble());
        assertThat(latest.get("effects").get(0).get("name").asText()).isEqualTo("easter");
    }

    @Test
    void theFormCanBeForced() throws IOException {
        Run run = Run.of("analyze", "--format", "json", "--form", "additive", "src/test/resources/reference/AirPassengers.csv");
        assertThat(new ObjectMapper().readTree(run.out()).get("transform").asText()).isEqualTo("none");
    }
}
