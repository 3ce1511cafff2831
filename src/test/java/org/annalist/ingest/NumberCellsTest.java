package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Optional;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.annalist.series.ValueFlag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class NumberCellsTest {

    private static double read(String cell, DecimalMark mark) {
        Optional<NumberCells.Cell> c = NumberCells.parse(cell, mark, new StringBuilder());
        assertThat(c).as(cell).isPresent();
        return c.get().value();
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "12,345|POINT|12345", "1,234,567.5|POINT|1234567.5", "12.345|COMMA|12345", "1.234.567,5|COMMA|1234567.5",
        "12 345|POINT|12345", "12\u00A0345,5|COMMA|12345.5", "1'234.5|POINT|1234.5", "-3.5|POINT|-3.5",
        "\u22123,5|COMMA|-3.5", "+7|POINT|7", "0,125|COMMA|0.125", "85.3%|POINT|85.3",
        "\u20AC1,234.50|POINT|1234.5", "12,50 \u20AC|COMMA|12.5", "$-3|POINT|-3", "\u00A3 99|POINT|99"})
    void groupedAndDecimalForms(String cell, DecimalMark mark, double expected) {
        assertThat(read(cell, mark)).isEqualTo(expected);
    }

    @Test
    void trailingFlagsAreKeptAsFlags() {
        NumberCells.Cell c = NumberCells.parse("123p", DecimalMark.POINT, new StringBuilder()).orElseThrow();
        assertThat(c.value()).isEqualTo(123);
        assertThat(c.flags()).containsExactly(ValueFlag.PROVISIONAL);
        NumberCells.Cell both = NumberCells.parse("45 ep", DecimalMark.POINT, new StringBuilder()).orElseThrow();
        assertThat(both.flags()).containsExactlyInAnyOrder(ValueFlag.ESTIMATED, ValueFlag.PROVISIONAL);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"''", "NA", "n/a", "-", "..", ":", ": c", "x", "\u2026", "NaN"})
    void missingMarkers(String cell) {
        assertThat(read(cell, DecimalMark.POINT)).isNaN();
        assertThat(NumberCells.isMissingMarker(cell)).isTrue();
    }

    @Test
    void confidentialMissingKeepsItsFlag() {
        assertThat(NumberCells.parse(": c", DecimalMark.POINT, new StringBuilder()).orElseThrow().flags())
                .containsExactly(ValueFlag.CONFIDENTIAL);
    }

    @Test
    void badGroupingIsRefusedWithAReason() {
        StringBuilder why = new StringBuilder();
        assertThat(NumberCells.parse("12,34,5", DecimalMark.POINT, why)).isEmpty();
        assertThat(why.toString()).contains("groups of three");
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"12.5|POINT", "12,5|COMMA", "1,234.5|POINT", "1.234,5|COMMA",
        "1,234,567|POINT", "0.123|POINT", "1,234|NONE", "1.234|NONE", "1234|NONE"})
    void theDigitsProveTheDecimalMarkOnlyWhenUnambiguous(String cell, NumberCells.Evidence expected) {
        assertThat(NumberCells.evidence(cell)).isEqualTo(expected);
    }

    /**
     * The shortcut for cells of digits with one point ({@code 751.0}, {@code -0.125}, {@code 00.123})
     * decides as the number pattern does, on every such cell: a minus or none, 1 to 5 digits
     * (leading zeros included), the point, 1 to 5 digits (synthetic cells).
     */
    @Property
    void onePointCellsProveTheMarkAsThePatternSays(@ForAll boolean minus, @ForAll @IntRange(min = 1, max = 5) int before,
                                                   @ForAll @IntRange(min = 1, max = 5) int after,
                                                   @ForAll @IntRange(min = 0, max = 99_999) int digits,
                                                   @ForAll @IntRange(min = 0, max = 99_999) int fraction) {
        String integerPart = String.format("%05d", digits).substring(5 - before);
        String fractionPart = String.format("%05d", fraction).substring(5 - after);
        String cell = (minus ? "-" : "") + integerPart + "." + fractionPart;
        assertThat(NumberCells.evidence(cell)).as(cell).isEqualTo(NumberCells.patternEvidence(cell));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"-0.123|POINT", "-1.234|NONE", "00.123|NONE", "1234.567|POINT", "751.0|POINT"})
    void aMinusOrLeadingZeroChangesNothingButTheDigitsBeforeThePoint(String cell, NumberCells.Evidence expected) {
        assertThat(NumberCells.evidence(cell)).isEqualTo(expected);
        assertThat(NumberCells.patternEvidence(cell)).isEqualTo(expected);
    }
}
