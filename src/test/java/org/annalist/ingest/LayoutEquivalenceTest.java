package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import java.util.stream.Stream;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The AirPassengers data (Box, Jenkins &amp; Reinsel 1976, Series G) written in every supported
 * layout, delimiter, encoding, period and number format must read as the same series.
 */
class LayoutEquivalenceTest {

    private static final List<String[]> ROWS = Files.referenceRows("AirPassengers.csv");

    private static LocalDate month(String period) {
        return LocalDate.parse(period + "-01");
    }

    private static String lines(String header, String delimiter, String newline,
                                Function<LocalDate, String> period, Function<Integer, String> value) {
        StringBuilder text = new StringBuilder(header).append(newline);
        for (String[] row : ROWS) {
            text.append(period.apply(month(row[0]))).append(delimiter).append(value.apply(Integer.parseInt(row[1])))
                    .append(newline);
        }
        return text.toString();
    }

    private static String pattern(String pattern, LocalDate d) {
        return d.format(DateTimeFormatter.ofPattern(pattern, Locale.ENGLISH));
    }

    /** name, file text, factor by which the written values exceed the published ones. */
    static Stream<Arguments> layouts() {
        List<Arguments> cases = new ArrayList<>();
        cases.add(Arguments.of("YYYY-MM, comma", lines("period,value", ",", "\n", d -> pattern("yyyy-MM", d), String::valueOf), 1.0));
        cases.add(Arguments.of("YYYY/MM, tab, CRLF", lines("Month\tPassengers", "\t", "\r\n", d -> pattern("yyyy/MM", d), String::valueOf), 1.0));
        cases.add(Arguments.of("MM/YYYY, semicolon, quoted", lines("\"Monat\";\"Fluggäste\"", ";", "\n",
                d -> "\"" + pattern("MM/yyyy", d) + "\"", v -> "\"" + v + "\""), 1.0));
        cases.add(Arguments.of("Mon YYYY, decimal comma", lines("Zeit;Wert", ";", "\n", d -> pattern("MMM yyyy", d),
                v -> String.format(Locale.ROOT, "%d,%d", v / 10, v % 10)), 0.1));
        cases.add(Arguments.of("Month YYYY, space thousands", lines("period,value", ",", "\n", d -> pattern("MMMM yyyy", d),
                v -> v + " 000"), 1000.0));
        cases.add(Arguments.of("YYYYMmm, point thousands, decimal comma", lines("period;value", ";", "\n",
                d -> pattern("yyyy'M'MM", d), v -> v + ".000,5"), 1000.0));
        cases.add(Arguments.of("YYYY-MM-DD month starts", lines("date,value", ",", "\n", d -> pattern("yyyy-MM-dd", d), String::valueOf), 1.0));
        cases.add(Arguments.of("DD/MM/YYYY inferred from spacing", lines("date,value", ",", "\n", d -> pattern("dd/MM/yyyy", d), String::valueOf), 1.0));
        cases.add(Arguments.of("month-end dates DD.MM.YYYY", lines("Datum;Wert", ";", "\n",
                d -> pattern("dd.MM.yyyy", d.withDayOfMonth(d.lengthOfMonth())), String::valueOf), 1.0));
        cases.add(Arguments.of("trailing flags and a percent sign", lines("period,value", ",", "\n", d -> pattern("yyyy-MM", d),
                v -> v + "%e"), 1.0));
        cases.add(Arguments.of("BOM, title and note lines", "\uFEFFAirline passengers, thousands\n\n"
                + lines("period,value", ",", "\n", d -> pattern("yyyy-MM", d), String::valueOf)
                + "Source: Box and Jenkins\n", 1.0));
        cases.add(Arguments.of("rows in reverse order", reversed(), 1.0));
        cases.add(Arguments.of("long layout with another series", longLayout(), 1.0));
        cases.add(Arguments.of("a row per year, a column per month, and a totals column", yearByMonthGrid(), 1.0));
        cases.add(Arguments.of("periods across the header, a row per series", periodsAcross(), 1.0));
        cases.add(Arguments.of("a row per month, a column per year", monthByYearGrid(), 1.0));
        return cases.stream();
    }

    private static String reversed() {
        List<String> rows = new ArrayList<>();
        for (String[] row : ROWS) {
            rows.add(0, row[0] + "," + row[1]);
        }
        return "period,value\n" + String.join("\n", rows) + "\n";
    }

    private static String yearByMonthGrid() {
        StringBuilder text = new StringBuilder("Year;Jan;Feb;Mar;Apr;May;Jun;Jul;Aug;Sep;Oct;Nov;Dec;Total\n");
        for (int year = 0; year < 12; year++) {
            text.append(1949 + year);
            int total = 0;
            for (int m = 0; m < 12; m++) {
                int v = Integer.parseInt(ROWS.get(12 * year + m)[1]);
                total += v;
                text.append(';').append(v);
            }
            text.append(';').append(total).append('\n');
        }
        return text.toString();
    }

    private static String monthByYearGrid() {
        String[] months = {"January", "February", "March", "April", "May", "June", "July", "August", "September",
            "October", "November", "December"};
        StringBuilder text = new StringBuilder("Month");
        for (int year = 1949; year <= 1960; year++) {
            text.append(',').append(year);
        }
        text.append('\n');
        for (int m = 0; m < 12; m++) {
            text.append(months[m]);
            for (int year = 0; year < 12; year++) {
                text.append(',').append(ROWS.get(12 * year + m)[1]);
            }
            text.append('\n');
        }
        return text.toString();
    }

    private static String periodsAcross() {
        StringBuilder header = new StringBuilder("series");
        StringBuilder values = new StringBuilder("AirPassengers");
        for (String[] row : ROWS) {
            header.append('\t').append(row[0]);
            values.append('\t').append(row[1]);
        }
        return header + "\n" + values + "\n";
    }

    private static String longLayout() {
        StringBuilder text = new StringBuilder("period,series,value\n");
        for (String[] row : ROWS) {
            text.append(row[0]).append(",value,").append(row[1]).append('\n');
            text.append(row[0]).append(",Other,").append(Integer.parseInt(row[1]) * 2).append('\n');
        }
        return text.toString();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("layouts")
    void everyLayoutReadsAsTheSameSeries(String layout, String text, double factor) {
        ReadResult read = Files.read("AirPassengers.csv", text);
        Series s = read.series().get(0);
        assertThat(s.frequency()).isEqualTo(Frequency.MONTHLY);
        assertThat(s.start()).isEqualTo(Period.month(1949, 1));
        assertThat(s.end()).isEqualTo(Period.month(1960, 12));
        assertThat(s.size()).isEqualTo(144);
        assertThat(s.missingCount()).isZero();
        double offset = layout.contains("decimal comma") && factor == 1000.0 ? 0.5 : 0;
        for (int i = 0; i < ROWS.size(); i++) {
            double expected = Integer.parseInt(ROWS.get(i)[1]) * factor + offset;
            assertThat(s.value(i)).as("%s at %s", layout, s.period(i)).isCloseTo(expected, org.assertj.core.data.Offset.offset(1e-9));
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("quarterFormats")
    void everyQuarterFormatReadsAlike(String format) {
        StringBuilder text = new StringBuilder("quarter,value\n");
        for (int year = 2020; year <= 2022; year++) {
            for (int q = 1; q <= 4; q++) {
                text.append(format.replace("YYYY", String.valueOf(year)).replace("n", String.valueOf(q)))
                        .append(',').append(year * 10 + q).append('\n');
            }
        }
        Series s = Files.read("q.csv", text.toString()).series().get(0);
        assertThat(s.frequency()).isEqualTo(Frequency.QUARTERLY);
        assertThat(s.start()).isEqualTo(Period.quarter(2020, 1));
        assertThat(s.size()).isEqualTo(12);
        assertThat(s.value(11)).isEqualTo(20224);
    }

    static Stream<String> quarterFormats() {
        return Stream.of("YYYY-Qn", "YYYY Qn", "Qn YYYY", "YYYYQn", "YYYY-qn");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("weekFormats")
    void isoWeeksAcrossAYearWithWeek53(String format) {
        // 2020 has 53 ISO weeks (ISO 8601; 2020 began on a Wednesday and was a leap year).
        String text = "week,value\n" + format.replace("YYYY", "2020").replace("ww", "52") + ",1\n"
                + format.replace("YYYY", "2020").replace("ww", "53") + ",2\n"
                + format.replace("YYYY", "2021").replace("ww", "01") + ",3\n";
        Series s = Files.read("w.csv", text).series().get(0);
        assertThat(s.frequency()).isEqualTo(Frequency.WEEKLY);
        assertThat(s.size()).isEqualTo(3);
        assertThat(s.end().label()).isEqualTo("2021-W01");
    }

    static Stream<String> weekFormats() {
        return Stream.of("YYYY-Www", "YYYYWww");
    }

    @org.junit.jupiter.api.Test
    void windows1252FilesAreReadWithAWarning() {
        byte[] bytes = "Zeit;Nächte\n2024-01;1\n2024-02;2\n".getBytes(java.nio.charset.Charset.forName("windows-1252"));
        ReadResult read = new SeriesFileReader(ReadOptions.defaults()).read("latin.csv", bytes);
        assertThat(read.series().get(0).name()).isEqualTo("Nächte");
        assertThat(read.warnings()).anySatisfy(w -> assertThat(w.message()).contains("Windows-1252"));
    }
}
