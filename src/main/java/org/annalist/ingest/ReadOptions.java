package org.annalist.ingest;

import java.util.Objects;
import java.util.Optional;

/**
 * How to read a file where the data alone cannot say: day/month order, decimal mark, and whether to
 * aggregate fine data (daily) to a coarser calendar.
 *
 * @param decimalMark the decimal mark, or empty to infer it from the numbers
 * @param aggregation the calendar to aggregate to, or empty to keep the file's own
 * @param maxInputBytes the largest file read, in bytes ({@link InputFiles#DEFAULT_MAX_BYTES} unless set)
 */
public record ReadOptions(DateOrder dateOrder, Optional<DecimalMark> decimalMark, Optional<Aggregation> aggregation,
                          long maxInputBytes) {

    public ReadOptions {
        Objects.requireNonNull(dateOrder, "dateOrder");
        Objects.requireNonNull(decimalMark, "decimalMark");
        Objects.requireNonNull(aggregation, "aggregation");
        if (maxInputBytes <= 0) {
            throw new IllegalArgumentException("maxInputBytes must be positive, was " + maxInputBytes);
        }
    }

    /** Infer everything, aggregate nothing, read files up to the default size. */
    public static ReadOptions defaults() {
        return new ReadOptions(DateOrder.AUTO, Optional.empty(), Optional.empty(), InputFiles.DEFAULT_MAX_BYTES);
    }

    public ReadOptions withDateOrder(DateOrder order) {
        return new ReadOptions(order, decimalMark, aggregation, maxInputBytes);
    }

    public ReadOptions withDecimalMark(DecimalMark mark) {
        return new ReadOptions(dateOrder, Optional.of(mark), aggregation, maxInputBytes);
    }

    public ReadOptions withAggregation(Aggregation to) {
        return new ReadOptions(dateOrder, decimalMark, Optional.of(to), maxInputBytes);
    }

    public ReadOptions withMaxInputBytes(long bytes) {
        return new ReadOptions(dateOrder, decimalMark, aggregation, bytes);
    }
}
