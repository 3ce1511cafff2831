package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * How the measure is read from a series' name and unit. The expected kinds follow common practice
 * in official statistics (no source): counts of nights, arrivals and revenue are flows; prices,
 * capacity, indices and averages are levels; occupancy and shares in % are rates; temperatures in
 * °C or °F are on an interval scale.
 */
class MeasureKindTest {

    private static Measure kind(String name, String unit) {
        return MeasureKind.infer(name, unit, 80);
    }

    @Test
    void namesAreSplitIntoWordsAtUnderscoresHyphensCapitalsAndDigits() {
        assertThat(MeasureKind.words("occupancy_rate")).containsExactly("occupancy", "rate");
        assertThat(MeasureKind.words("BedOccupancy")).containsExactly("bed", "occupancy");
        assertThat(MeasureKind.words("petrol-price")).containsExactly("petrol", "price");
        assertThat(MeasureKind.words("CPIIndex2020")).containsExactly("cpi", "index", "2020");
        assertThat(MeasureKind.words("temp2m")).containsExactly("temp", "2", "m");
        assertThat(MeasureKind.words("°F")).containsExactly("°f");
    }

    @Test
    void countsAreFlowsTheDefault() {
        for (String name : List.of("Guest nights", "guest_nights", "Arrivals", "ArrivalsBrevania", "Revenue",
                "room_nights_sold", "Total", "nottem", "AirPassengers", "visitors2024")) {
            assertThat(kind(name, "")).as(name).isEqualTo(Measure.FLOW);
        }
        assertThat(kind("Nights", "nights")).isEqualTo(Measure.FLOW);
        assertThat(kind("Revenue", "EUR")).isEqualTo(Measure.FLOW);
    }

    @Test
    void snakeAndCamelCaseRatesAreRatesNotFlows() {
        for (String name : List.of("occupancy_rate", "BedOccupancy", "OccupancyRate", "bed-occupancy",
                "unemployment_rate", "MarketShare", "share_of_foreign_guests", "Room occupancy", "occupancy pct")) {
            assertThat(kind(name, "")).as(name).isEqualTo(Measure.RATE);
        }
    }

    @Test
    void aUnitInPercentMakesARateWhateverTheName() {
        for (String unit : List.of("%", "percent", "per cent", "Pct", " % ")) {
            assertThat(kind("Beds", unit)).as(unit).isEqualTo(Measure.RATE);
        }
    }

    /** DecisionRules.RATE_MAX_VALUE: a share in % cannot exceed 100, so a larger "rate" is per 1,000 or more. */
    @Test
    void aNamedRateAbove100IsALevelNotAShare() {
        assertThat(MeasureKind.infer("crime_rate", "", 4250)).isEqualTo(Measure.LEVEL);
        assertThat(MeasureKind.infer("crime_rate", "", 99.5)).isEqualTo(Measure.RATE);
        assertThat(MeasureKind.infer("BirthRate", "per 1,000", 12)).isEqualTo(Measure.LEVEL);
    }

    @Test
    void pricesAveragesIndicesAndStocksAreLevels() {
        for (String name : List.of("PetrolPrice", "petrol_price", "Average room rate", "ExchangeRate", "exchange-rate",
                "mean_length_of_stay", "Average length of stay", "ALOS", "HICP index", "CPIIndex", "BedCapacity",
                "bed_capacity", "HousingStock", "Nights per arrival", "population", "RoomRate", "ADR")) {
            assertThat(kind(name, "")).as(name).isEqualTo(Measure.LEVEL);
        }
        assertThat(kind("Room rate", "EUR")).isEqualTo(Measure.LEVEL);
    }

    @Test
    void temperaturesAreOnAnIntervalScale() {
        for (String[] c : new String[][] {{"nottem", "°F"}, {"Temperature", ""}, {"mean_temp", ""},
                {"AirTemp2m", ""}, {"Water", "°C"}, {"Sea", "degrees Celsius"}, {"Highs", "Fahrenheit"},
                {"MaxTemperatureC", ""}, {"Air", "℃"}, {"Air", "degC"}}) {
            assertThat(kind(c[0], c[1])).as(c[0] + " " + c[1]).isEqualTo(Measure.INTERVAL);
        }
    }

    @Test
    void aRateWordDoesNotTurnATemperatureIntoARate() {
        assertThat(kind("temperature_rate_of_change", "°C")).isEqualTo(Measure.INTERVAL);
    }
}
