package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * The reader goes through a file once, holding no row: what only the whole file can tell (the decimal
 * mark, the encoding, notes below the data) is still told right, wherever in the file it shows.
 */
class StreamingReaderTest {

    private static String months(int count, String value) {
        StringBuilder text = new StringBuilder("month,v\n");
        for (int i = 0; i < count; i++) {
            text.append(String.format("%04d-%02d,%s%n", 1900 + i / 12, i % 12 + 1, value));
        }
        return text.toString();
    }

    @Test
    void aDecimalCommaProvedFarDownRereadsTheAmbiguousNumbersAbove() {
        String text = months(20_000, "\"1.234\"") + "3566-09,\"2,5\"\n";
        Series s = Files.read("in.csv", text).series().get(0);
        assertThat(s.value(0)).isEqualTo(1234.0);
        assertThat(s.value(s.size() - 1)).isEqualTo(2.5);
    }

    @Test
    void aDecimalPointProvedFarDownKeepsTheAmbiguousNumbersAsFractions() {
        String text = months(20_000, "1.234") + "3566-09,2.5\n";
        Series s = Files.read("in.csv", text).series().get(0);
        assertThat(s.value(0)).isEqualTo(1.234);
    }

    @Test
    void aByteThatIsNotUtf8FarDownMakesTheWholeFileWindows1252() {
        String text = months(30_000, "1") + "note: Nächte\n";
        ReadResult read = new SeriesFileReader(ReadOptions.defaults())
                .read("in.csv", text.getBytes(Charset.forName("windows-1252")));
        assertThat(read.charset()).isEqualTo("windows-1252");
        assertThat(read.warnings()).extracting(DataProblem::message)
                .contains("line set aside as a note below the data: 'note: Nächte'");
    }

    @Test
    void aProblemFoundBeforeABadByteIsReportedAsTheWholeFileReads() throws java.io.IOException {
        java.io.ByteArrayOutputStream bytes = new java.io.ByteArrayOutputStream();
        bytes.write("Zeitpunkt \u00e4,name\n".getBytes(StandardCharsets.UTF_8));   // valid UTF-8 up to the last line
        bytes.write("2024-01,abc\n".repeat(20_000).getBytes(StandardCharsets.UTF_8));
        bytes.write(new byte[] {'n', 'o', 't', 'e', ' ', (byte) 0xE9, '\n'});
        DataProblemException e = catchThrowableOfType(DataProblemException.class,
                () -> new SeriesFileReader(ReadOptions.defaults()).read("in.csv", bytes.toByteArray()));
        // Read as Windows-1252 (the file is not UTF-8 as a whole), the header's two bytes are two letters.
        assertThat(e.problems()).singleElement().extracting(DataProblem::message).asString()
                .contains("beside the 'Zeitpunkt \u00c3\u00a4' column");
    }

    @Test
    void quotedCellsOverSeveralLinesAmongPlainLinesKeepEveryLineNumber() {
        String text = "month;v;remark\r\n2024-01;1;\"a\r\nb\"\r\n2024-02;2;plain\r2024-03;\"3\";\"say \"\"hi\"\"\"\n2024-04;y;\n";
        DataProblemException e = catchThrowableOfType(DataProblemException.class,
                () -> Files.read("in.csv", text));
        assertThat(e.problems()).extracting(DataProblem::toString)
                .containsExactly("in.csv:6:2: 'y' is not a number; expected a number (or a missing-value marker such as "
                        + "NA, -, .. or :) in column 'v'");
    }

    @Test
    void anUnclosedQuoteFarDownIsReportedAtTheLineAfterTheLastRecord() {
        String text = months(5, "1") + "1900-06,\"2\n1900-07,3\n";
        assertThat(catchThrowableOfType(DataProblemException.class, () -> Files.read("in.csv", text)).problems().get(0)
                .toString()).startsWith("in.csv:7: a quoted cell is never closed");
    }

    @Test
    void aRunOfLinesWithoutAPeriodFollowedByDataIsDataWithBadPeriods() {
        String text = months(3, "1") + "Total,3\n" + "1900-04,1\n";
        DataProblemException e = catchThrowableOfType(DataProblemException.class, () -> Files.read("in.csv", text));
        assertThat(e.problems().get(0).toString()).startsWith("in.csv:5:1: 'Total' is not a date or period");
    }

    @Test
    void thousandsOfRowsReadIntoOneSeriesWithoutLosingARow() {
        ReadResult read = Files.read("in.csv", months(90_000, "7"));
        assertThat(read.rowsRead()).isEqualTo(90_000);
        assertThat(read.series().get(0).size()).isEqualTo(90_000);
        assertThat(read.sha256()).isEqualTo(java.util.HexFormat.of().formatHex(sha256(months(90_000, "7"))));
    }

    @Test
    void withoutTheDigestTheSameSeriesAreReadAndNoDigestCanBeStated() {
        String text = months(6_000, "7") + "2400-01,\"2,5\"\n";
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        ReadResult digested = new SeriesFileReader(ReadOptions.defaults()).read("in.csv", bytes);
        ReadResult plain = new SeriesFileReader(ReadOptions.defaults()).withoutDigest().read("in.csv", bytes);

        assertThat(plain.series()).isEqualTo(digested.series());
        assertThat(plain.rowsRead()).isEqualTo(digested.rowsRead());
        assertThat(plain.decimalMark()).isEqualTo(digested.decimalMark());
        assertThat(digested.digested()).isTrue();
        assertThat(digested.sha256()).isEqualTo(java.util.HexFormat.of().formatHex(sha256(text)));
        assertThat(plain.digested()).isFalse();
        // a brief must not state a digest nobody computed
        assertThatThrownBy(plain::sha256).isInstanceOf(IllegalStateException.class).hasMessageContaining("in.csv");
    }

    private static byte[] sha256(String text) {
        try {
            return java.security.MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8));
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
