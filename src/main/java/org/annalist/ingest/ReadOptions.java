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
 * @param sheet the sheet of a workbook to read, by name or 1-based number, or empty to find the one with a series
 */
public record ReadOptions(DateOrder dateOrder, Optional<DecimalMark> decimalMark, Optional<Aggregation> aggregation,
                          long maxInputBytes, Optional<String> sheet) {

    public ReadOptions {
        Objects.requireNonNull(dateOrder, "dateOrder");
        Objects.requireNonNull(decimalMark, "decimalMark");
        Objects.requireNonNull(aggregation, "aggregation");
        if (maxInputBytes <= 0) {
            throw new IllegalArgumentException("maxInputBytes must be positive, was " + maxInputBytes);
        }
        Objects.requireNonNull(sheet, "sheet");
    }

    public ReadOptions(DateOrder dateOrder, Optional<DecimalMark> decimalMark, Optional<Aggregation> aggregation,
                       long maxInputBytes) {
        this(dateOrder, decimalMark, aggregation, maxInputBytes, Optional.empty());
    }

    /** Infer everything, aggregate nothing, read files up to the default size. */
    public static ReadOptions defaults() {
        return new ReadOptions(DateOrder.AUTO, Optional.empty(), Optional.empty(), InputFiles.DEFAULT_MAX_BYTES);
    }

    public ReadOptions withDateOrder(DateOrder order) {
        return new ReadOptions(order, decimalMark, aggregation, maxInputBytes, sheet);
    }

    public ReadOptions withDecimalMark(DecimalMark mark) {
        return new ReadOptions(dateOrder, Optional.of(mark), aggregation, maxInputBytes, sheet);
    }

    public ReadOptions withAggregation(Aggregation to) {
        return new ReadOptions(dateOrder, decimalMark, Optional.of(to), maxInputBytes, sheet);
    }

    public ReadOptions withMaxInputBytes(long bytes) {
        return new ReadOptions(dateOrder, decimalMark, aggregation, bytes, sheet);
    }

    /** Reads the sheet of a workbook named {@code nameOrNumber} (a 1-based number when no sheet has that name). */
    public ReadOptions withSheet(String nameOrNumber) {
        return new ReadOptions(dateOrder, decimalMark, aggregation, maxInputBytes, Optional.of(nameOrNumber));
    }

    // equals and hashCode written out as the record would make them (the same comparison, the same
    // hash): a record's own are linked through method handles on their first call, some 10-25 ms of
    // a cold brief's start-up each (README, "Start-up and memory")
    @Override
    public boolean equals(Object other) {
        return other instanceof ReadOptions that && dateOrder == that.dateOrder && decimalMark.equals(that.decimalMark)
                && aggregation.equals(that.aggregation) && maxInputBytes == that.maxInputBytes && sheet.equals(that.sheet);
    }

    @Override
    public int hashCode() {
        int hash = (31 * dateOrder.hashCode() + decimalMark.hashCode()) * 31 + aggregation.hashCode();
        return (31 * hash + Long.hashCode(maxInputBytes)) * 31 + sheet.hashCode();
    }
}
