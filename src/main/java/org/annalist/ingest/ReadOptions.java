package org.annalist.ingest;

import java.util.Objects;
import java.util.Optional;

/**
 * How to read a file where the data alone cannot say: day/month order, decimal mark, and whether to
 * aggregate fine data (daily) to a coarser calendar.
 *
 * @param decimalMark the decimal mark, or empty to infer it from the numbers
 * @param aggregation the calendar to aggregate to, or empty to keep the file's own
 */
public record ReadOptions(DateOrder dateOrder, Optional<DecimalMark> decimalMark, Optional<Aggregation> aggregation) {

    public ReadOptions {
        Objects.requireNonNull(dateOrder, "dateOrder");
        Objects.requireNonNull(decimalMark, "decimalMark");
        Objects.requireNonNull(aggregation, "aggregation");
    }

    /** Infer everything, aggregate nothing. */
    public static ReadOptions defaults() {
        return new ReadOptions(DateOrder.AUTO, Optional.empty(), Optional.empty());
    }

    public ReadOptions withDateOrder(DateOrder order) {
        return new ReadOptions(order, decimalMark, aggregation);
    }

    public ReadOptions withDecimalMark(DecimalMark mark) {
        return new ReadOptions(dateOrder, Optional.of(mark), aggregation);
    }

    public ReadOptions withAggregation(Aggregation to) {
        return new ReadOptions(dateOrder, decimalMark, Optional.of(to));
    }
}
