package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Half-yearly series (SDMX frequency S, periods {@code 2024-S1} and {@code 2024-S2}; tables' {@code 2024-H1},
 * {@code H2 2024}; dates on 1 January and 1 July) read, check, analyse with a season of two halves, compare the
 * latest half with the same half a year earlier, and are worded "the first half of 2024" in the brief.
 */
class HalfYearsTest {

    @TempDir
    Path folder;

    /** Invented: 16 years of guest nights, the first half about 30 % above the second, growing 2 % a half-year. */
    private static String planted(String header, java.util.function.BiFunction<Integer, Integer, String> period) {
        StringBuilder csv = new StringBuilder(header).append('\n');
        for (int year = 2009; year <= 2024; year++) {
            for (int half = 1; half <= 2; half++) {
                int step = (year - 2009) * 2 + half - 1;
                double value = 1000 * Math.pow(1.02, step) * (half == 1 ? 1.15 : 0.85) * (1 + 0.01 * Math.sin(step * 1.7));
                csv.append(period.apply(year, half)).append(String.format(Locale.ROOT, ",%.1f%n", value));
            }
        }
        return csv.toString();
    }

    @Test
    void aHalfYearIsAPeriodOfItsOwnCalendar() {
        Period h2 = Period.half(2024, 2);
        assertThat(h2.label()).isEqualTo("2024-S2");   // SDMX's reporting period (the findings JSON's label)
        assertThat(h2.startDate()).isEqualTo(java.time.LocalDate.of(2024, 7, 1));
        assertThat(h2.endDate()).isEqualTo(java.time.LocalDate.of(2024, 12, 31));
        assertThat(h2.plus(1)).isEqualTo(Period.half(2025, 1));
        assertThat(h2.seasonalPosition()).isEqualTo(2);
        assertThat(Period.containing(Frequency.HALF_YEARLY, java.time.LocalDate.of(2024, 6, 30))).isEqualTo(Period.half(2024, 1));
        assertThat(Frequency.HALF_YEARLY.seasonalPeriod()).isEqualTo(2);
        assertThat(Frequency.MONTHLY.nestsIn(Frequency.HALF_YEARLY)).isTrue();
        assertThat(Frequency.fromLabel("half-yearly")).isEqualTo(Frequency.HALF_YEARLY);
    }

    @Test
    void sdmxTablesAndDatesReadAsHalfYears() throws IOException {
        Path sdmx = Files.writeString(folder.resolve("sdmx.csv"), planted("DATAFLOW,FREQ,MARKET,TIME_PERIOD,OBS_VALUE",
                (y, h) -> "QM:NIGHTS(1.0),S,DOM," + y + "-S" + h));
        Path table = Files.writeString(folder.resolve("table.csv"), planted("period,nights", (y, h) -> y + "-H" + h));
        Path words = Files.writeString(folder.resolve("words.csv"), planted("period,nights", (y, h) -> "H" + h + " " + y));
        Path dates = Files.writeString(folder.resolve("dates.csv"), planted("date,nights", (y, h) -> y + (h == 1 ? "-01-01" : "-07-01")));
        for (Path file : new Path[] {sdmx, table, words, dates}) {
            Run check = Run.of("check", file.toString());
            assertThat(check.exitCode()).as(check.err()).isZero();
            assertThat(check.out()).as(file.toString()).contains("half-yearly, 2009-S1 to 2024-S2, 32 periods, 0 missing");
        }
    }

    @Test
    void theAnalysisHasTwoSeasonsAndComparesTheSameHalfAYearEarlier() throws IOException {
        Path file = Files.writeString(folder.resolve("nights.csv"), planted("period,nights", (y, h) -> y + "-S" + h));
        Run run = Run.of("analyze", "--format", "json", file.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode json = new ObjectMapper().readTree(run.out());
        assertThat(json.at("/series/frequency").asText()).isEqualTo("half-yearly");
        assertThat(json.at("/seasonality/present").asBoolean()).isTrue();
        assertThat(json.at("/seasonality/period").asInt()).isEqualTo(2);
        assertThat(json.at("/seasonality/peak/position").asInt()).isEqualTo(1);   // planted: the first half is higher
        assertThat(json.at("/indicators/period").asText()).isEqualTo("2024-S2");
        assertThat(json.at("/indicators/same_period_last_year/period").asText()).isEqualTo("2023-S2");
        // planted growth: 2 % a half-year, 4.04 % on the same half a year earlier (the wiggle moves it a little)
        assertThat(json.at("/indicators/same_period_last_year/change_pct").asDouble()).isBetween(2.0, 6.0);
        assertThat(json.at("/trend/direction").asText()).isEqualTo("increasing");
    }

    @Test
    void theBriefSpeaksOfTheFirstAndSecondHalf() throws IOException {
        Path file = Files.writeString(folder.resolve("nights.csv"), planted("period,nights", (y, h) -> y + "-S" + h));
        Path pdf = folder.resolve("nights.pdf");
        Run run = Run.of("brief", file.toString(), "-o", pdf.toString(), "--generated-at", "2026-11-20T08:00:00Z");
        assertThat(run.exitCode()).as(run.err()).isZero();
        String text = PdfFacts.of(pdf).text().replaceAll("\\s+", " ");
        assertThat(text).contains("the first half of 2009 to the second half of 2024")
                .contains("In the second half of 2024").contains("the second half of 2023")
                .contains("peaks in the first half").contains("lowest in the second half")
                .doesNotContain("2024-S2");
    }
}
