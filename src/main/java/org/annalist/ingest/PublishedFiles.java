package org.annalist.ingest;

import java.io.IOException;
import java.util.List;
import java.util.Optional;
import org.annalist.series.Series;

/**
 * Reads a file whose first lines show one of the {@link PublishedFormat}s into the same
 * {@link ReadResult} as a CSV file: its series (aggregated as asked), their keys and the data set's
 * description, and the facts of the file that {@code check} and the brief's appendix state.
 */
final class PublishedFiles {

    private PublishedFiles() {
    }

    /** The file read, when its first lines show a published format; empty otherwise (a plain table). */
    static Optional<ReadResult> read(CsvRows.Head head, TextDecoding.Text text, ProblemLog log, ReadOptions options,
                                     String baseName) throws IOException {
        Optional<PublishedFormat> recognised = PublishedFormat.recognise(head.sample());
        if (recognised.isEmpty()) {
            return Optional.empty();
        }
        PublishedFormat format = recognised.get();
        KeyedSeries.Assembled assembled;
        int rows;
        char delimiter;
        switch (format) {
            case JSON_STAT -> {
                JsonStatReader reader = new JsonStatReader(baseName, log);
                assembled = reader.read(head.whole());
                rows = reader.rowsRead();
                delimiter = '\0';
            }
            case BULK_TSV -> {
                BulkTsvReader reader = new BulkTsvReader(baseName, log);
                delimiter = '\t';
                CsvStream.stream(head.whole(), delimiter, log, reader::row);
                assembled = reader.end();
                rows = reader.rowsRead();
            }
            default -> {
                delimiter = CsvRows.detectDelimiter(head.sample());
                SdmxCsvReader reader = new SdmxCsvReader(format, delimiter, baseName, log);
                CsvStream.stream(head.whole(), delimiter, log, reader::row);
                assembled = reader.end();
                rows = reader.rowsRead();
            }
        }
        log.throwIfErrors();
        List<Series> series = assembled.series();
        if (series.isEmpty()) {
            throw log.fatal(0, 0, "no series with a value; expected at least one observation with a number");
        }
        series = Aggregator.aggregateAll(series, options.aggregation(), log);
        log.throwIfErrors();
        return Optional.of(new ReadResult(log.file(), text.sha256(), text.charsetName(), delimiter, rows, format.layout(),
                assembled.periodFormat(), java.util.Optional.empty(), java.util.Optional.empty(), options.aggregation(), series,
                log.warnings(), assembled.keys()));
    }
}
