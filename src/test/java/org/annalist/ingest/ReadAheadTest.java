package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowable;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import org.annalist.ingest.CsvRows.Row;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * A large file's text is split into rows on a thread of its own ({@link CsvStream#streamAhead}):
 * the rows, the problems and the failures reach the reader exactly as when one thread reads, and the
 * reading thread has ended whenever the call returns or throws.
 */
class ReadAheadTest {

    /** Plain lines among quoted records over several lines, every kind of line break, many batches. */
    private static String mixedText(int rows) {
        StringBuilder text = new StringBuilder("month;v;remark\r\n");
        for (int i = 0; i < rows; i++) {
            String month = String.format("%04d-%02d", 1900 + i / 12, i % 12 + 1);
            switch (i % 5) {
                case 0 -> text.append(month).append(";").append(i).append(";\"a\r\nb\"\r\n");
                case 1 -> text.append(month).append(";").append(i).append(";plain\r");
                case 2 -> text.append(month).append(";\"").append(i).append("\";\"say \"\"hi\"\"\"\n");
                default -> text.append(month).append(" ; ").append(i).append(" ;\n");
            }
        }
        return text.toString();
    }

    private static List<String> rowsOneThread(String text) {
        List<String> rows = new ArrayList<>();
        CsvStream.stream(new StringReader(text), ';', new ProblemLog("in.csv"), row -> rows.add(describe(row)));
        return rows;
    }

    private static List<String> rowsAhead(String text) {
        List<String> rows = new ArrayList<>();
        CsvStream.streamAhead(new StringReader(text), ';', new ProblemLog("in.csv"), row -> rows.add(describe(row)));
        return rows;
    }

    private static String describe(Row row) {
        return row.line() + ":" + row.cells();
    }

    private static boolean aReadingThreadIsAlive() {
        return Thread.getAllStackTraces().keySet().stream()
                .anyMatch(t -> t.getName().equals("annalist-csv-read-ahead") && t.isAlive());
    }

    @Test
    void readingAheadGivesTheSinkTheSameRowsWithTheSameLinesInTheSameOrder() {
        String text = mixedText(25_000);
        List<String> ahead = rowsAhead(text);
        assertThat(ahead).hasSize(25_001).isEqualTo(rowsOneThread(text));
        // mixedText's first row: line 2 (after the header), its quoted cell over two lines kept whole
        assertThat(ahead.get(1)).isEqualTo("2:[1900-01, 0, a\r\nb]");
        assertThat(aReadingThreadIsAlive()).isFalse();
    }

    @Test
    void aProblemThatEndsTheTextIsLoggedAfterTheProblemsOfTheRowsBeforeIt() {
        String text = mixedText(10_000) + "2999-01;\"1\n";
        List<List<DataProblem>> reported = new ArrayList<>();
        for (boolean ahead : new boolean[] {false, true}) {
            ProblemLog log = new ProblemLog("in.csv");
            Consumer<Row> sink = row -> {
                if (row.line() % 1000 == 0) {
                    log.error(row.line(), 1, "a row the sink objects to");
                }
            };
            DataProblemException e = catchThrowableOfType(DataProblemException.class, () -> {
                if (ahead) {
                    CsvStream.streamAhead(new StringReader(text), ';', log, sink);
                } else {
                    CsvStream.stream(new StringReader(text), ';', log, sink);
                }
            });
            reported.add(e.problems());
        }
        assertThat(reported.get(1)).isEqualTo(reported.get(0));
        assertThat(reported.get(1).get(reported.get(1).size() - 1).message()).startsWith("a quoted cell is never closed");
        assertThat(aReadingThreadIsAlive()).isFalse();
    }

    @Test
    void aSinkThatStopsEndsTheReadingThreadWithoutReadingOnBeforeTheCallThrows() {
        String text = mixedText(200_000);
        IllegalStateException stop = new IllegalStateException("enough");
        int[] seen = {0};
        int[] charsRead = {0};
        Reader counting = new Reader() {
            private final StringReader in = new StringReader(text);

            @Override
            public int read(char[] into, int offset, int length) throws IOException {
                int n = in.read(into, offset, length);
                charsRead[0] += Math.max(0, n);
                return n;
            }

            @Override
            public void close() {
                in.close();
            }
        };
        Throwable thrown = catchThrowable(() -> CsvStream.streamAhead(counting, ';', new ProblemLog("in.csv"), row -> {
            if (++seen[0] == 5_000) {
                throw stop;
            }
        }));
        assertThat(thrown).isSameAs(stop);
        assertThat(aReadingThreadIsAlive()).isFalse();
        // 5,000 rows taken, at most a few batches ahead and a buffer of text: far from the 200,000
        assertThat(charsRead[0]).isLessThan(text.length() / 10);
    }

    @Test
    void anInterruptedCallerReadsOnAsOneThreadWouldAndKeepsTheInterruption() {
        String text = mixedText(20_000);
        List<String> rows = new ArrayList<>();
        Thread.currentThread().interrupt();
        try {
            CsvStream.streamAhead(new StringReader(text), ';', new ProblemLog("in.csv"), row -> rows.add(describe(row)));
            assertThat(Thread.currentThread().isInterrupted()).isTrue();
        } finally {
            Thread.interrupted();
        }
        assertThat(rows).isEqualTo(rowsOneThread(text));
        assertThat(aReadingThreadIsAlive()).isFalse();
    }

    @Test
    void aReaderThatFailsReachesTheCallerAfterTheRowsItGaveAsOnOneThread() {
        String text = mixedText(30_000);
        List<String> rows = new ArrayList<>();
        Throwable thrown = catchThrowable(() -> CsvStream.streamAhead(failingAfter(text, 400_000), ';',
                new ProblemLog("in.csv"), row -> rows.add(describe(row))));
        List<String> oneThread = new ArrayList<>();
        Throwable thrownOneThread = catchThrowable(() -> CsvStream.stream(failingAfter(text, 400_000), ';',
                new ProblemLog("in.csv"), row -> oneThread.add(describe(row))));
        assertThat(thrown).isInstanceOf(UncheckedIOException.class).hasMessageContaining("disk gone");
        assertThat(thrownOneThread).isInstanceOf(UncheckedIOException.class).hasMessageContaining("disk gone");
        assertThat(rows).isNotEmpty().isEqualTo(oneThread);
    }

    @Test
    void aFileLargerThanTheReadAheadThresholdReadsEveryValue() {
        StringBuilder text = new StringBuilder("month,series,value\n");
        int series = 900;
        int months = 240;
        for (int s = 0; s < series; s++) {
            for (int t = 0; t < months; t++) {
                text.append(String.format("%04d-%02d,s%03d,%d.5%n", 2005 + t / 12, t % 12 + 1, s, s * 1000 + t));
            }
        }
        byte[] bytes = text.toString().getBytes(StandardCharsets.UTF_8);
        assertThat((long) bytes.length).isGreaterThanOrEqualTo(SeriesFileReader.READ_AHEAD_FROM_BYTES);
        ReadResult read = new SeriesFileReader(ReadOptions.defaults()).read("long.csv", bytes);
        assertThat(read.series()).hasSize(series);
        Series last = read.series().get(series - 1);
        assertThat(last.size()).isEqualTo(months);
        // the generator above writes s·1000 + t and ".5": series 899, months 0 and 239
        assertThat(last.value(0)).isEqualTo(899_000.5);
        assertThat(last.value(months - 1)).isEqualTo(899_239.5);
        assertThat(aReadingThreadIsAlive()).isFalse();
    }

    /** A reader of {@code text} that fails once {@code limit} characters have been read. */
    private static Reader failingAfter(String text, int limit) {
        return new Reader() {
            private final StringReader in = new StringReader(text);
            private int read;

            @Override
            public int read(char[] into, int offset, int length) throws IOException {
                if (read >= limit) {
                    throw new IOException("disk gone");
                }
                int n = in.read(into, offset, Math.min(length, limit - read));
                read += Math.max(0, n);
                return n;
            }

            @Override
            public void close() {
                in.close();
            }
        };
    }
}
