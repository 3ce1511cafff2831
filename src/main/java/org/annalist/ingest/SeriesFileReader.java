package org.annalist.ingest;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;
import org.annalist.series.Series;

/**
 * Reads the series in a delimited text file as real exports come (a workbook, known by its content, goes
 * to {@link Workbooks} and from there through the same rows): any of the delimiters, encodings,
 * number and period formats of {@link CsvRows}, {@link NumberCells} and {@link PeriodCells}, in a
 * wide layout (a column per series) or a long one ({@code period, series, value}).
 *
 * <p>Reading goes: bytes → text → rows → table shape → periods → numbers → series (→ aggregation),
 * in one pass over the file that holds no copy of its bytes or text: the delimiter is found from
 * the first lines, the layout from the first rows ({@link TableShape}), and each row after that goes
 * straight into the primitive arrays of its series ({@link RowReader}). Memory follows the values
 * kept. Every problem found on the way is collected with its file, line and column; if there is any,
 * {@link DataProblemException} carries them all.
 */
public final class SeriesFileReader {

    /**
     * From this size on, a delimited file's text is split into rows on a thread of its own while
     * this one reads the rows ({@link CsvStream#streamAhead}); below it, the second thread would
     * cost more than it saves (our rule: a brief's usual file is a few hundred KB at most).
     */
    static final long READ_AHEAD_FROM_BYTES = 4L << 20;

    private final ReadOptions options;
    private final boolean digest;

    /** A reader that computes each file's SHA-256 as it reads it, for a brief's provenance. */
    public SeriesFileReader(ReadOptions options) {
        this(options, true);
    }

    private SeriesFileReader(ReadOptions options, boolean digest) {
        this.options = options;
        this.digest = digest;
    }

    /**
     * This reader without the SHA-256 of a delimited text file, for commands that state no
     * provenance ({@code analyze}, {@code check}): its result's digest is
     * {@link ReadResult#NOT_DIGESTED}. A workbook, read whole anyway, still has its digest.
     */
    public SeriesFileReader withoutDigest() {
        return new SeriesFileReader(options, false);
    }

    /**
     * @throws DataProblemException when the file cannot be read or holds no usable series
     */
    public ReadResult read(Path file) {
        return read(file, file.toString());
    }

    /**
     * Reads {@code file}, named {@code shownAs} in messages and in the result (a file kept elsewhere
     * than the user had it, under the user's name).
     *
     * @throws DataProblemException when the file cannot be read or holds no usable series
     */
    public ReadResult read(Path file, String shownAs) {
        Optional<ReadResult> workbook = Workbooks.read(file, shownAs, options);   // a workbook is known by its content
        if (workbook.isPresent()) {
            return workbook.get();
        }
        long size;
        try {
            size = Files.size(file);
        } catch (IOException unknown) {
            size = 0;   // the opening says why
        }
        return read(shownAs, () -> InputFiles.openBounded(file, options.maxInputBytes(), "a CSV file"), size);
    }

    /** Reads {@code bytes} as the contents of a file called {@code fileName} (used in messages). */
    public ReadResult read(String fileName, byte[] bytes) {
        Optional<ReadResult> workbook = Workbooks.read(fileName, bytes, options);
        if (workbook.isPresent()) {
            return workbook.get();
        }
        return read(fileName, () -> new ByteArrayInputStream(bytes), bytes.length);
    }

    /** Reads as UTF-8 (or as a byte-order mark says) and, when the bytes turn out not to be UTF-8, again as Windows-1252. */
    private ReadResult read(String fileName, Supplier<InputStream> bytes, long size) {
        try {
            return read(fileName, bytes, size, false);
        } catch (TextDecoding.NotUtf8 notUtf8) {
            return read(fileName, bytes, size, true);
        }
    }

    private ReadResult read(String fileName, Supplier<InputStream> bytes, long size, boolean windows1252) {
        ProblemLog log = new ProblemLog(fileName);
        try (InputStream in = bytes.get(); TextDecoding.Text text = TextDecoding.open(in, windows1252, log, digest)) {
            try {
                return read(log, text, size);
            } catch (DataProblemException problem) {
                text.checkRest();
                throw problem;
            }
        } catch (IOException | UncheckedIOException e) {
            IOException cause = e instanceof UncheckedIOException u ? u.getCause() : (IOException) e;
            throw new DataProblemException(new DataProblem(fileName, 0, 0, "cannot be read (" + InputFiles.reason(cause) + ")"));
        }
    }

    private ReadResult read(ProblemLog log, TextDecoding.Text text, long size) throws IOException {
        CsvRows.Head head = CsvRows.head(text.reader());
        Optional<ReadResult> published = PublishedFiles.read(head, text, log, options, baseName(log.file()));
        if (published.isPresent()) {
            return published.get();   // SDMX-CSV, the bulk tab layout or JSON-stat, recognised by content
        }
        char delimiter = CsvRows.detectDelimiter(head.sample());
        long expectedRows = head.sampleLines() == 0 ? 16
                : (long) (size / Math.max(1.0, head.sample().length() / (double) head.sampleLines()) * 1.02) + 16;
        RowReader rows = new RowReader(options, log, baseName(log.file()), expectedRows);
        if (size >= READ_AHEAD_FROM_BYTES && !text.logsWhileRead() && Runtime.getRuntime().availableProcessors() > 1) {
            CsvStream.streamAhead(head.whole(), delimiter, log, rows::row);
        } else {
            CsvStream.stream(head.whole(), delimiter, log, rows::row);
        }
        RowReader.Read read = rows.end();
        List<Series> series = Aggregator.aggregateAll(read.series(), options.aggregation(), log);
        log.throwIfErrors();
        return new ReadResult(log.file(), text.sha256(), text.charsetName(), delimiter, read.rowsRead(), read.layout(),
                read.periodFormat(), read.dateOrder(), read.decimalMark(), options.aggregation(), series, log.warnings());
    }

    private static String baseName(String fileName) {
        String base = Path.of(fileName).getFileName().toString();
        int dot = base.lastIndexOf('.');
        return dot > 0 ? base.substring(0, dot) : base;
    }
}
