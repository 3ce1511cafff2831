package org.annalist.ingest;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;
import org.annalist.ingest.CsvRows.Row;

/**
 * Follows the rows below the header as they are read: gives on the data rows, sets aside the notes
 * below the data (with a warning), and checks each data row's width against the header's.
 *
 * <p>A row whose period cell states no period is held back until the next row that does: if one
 * comes, the rows held were data rows with a mistyped period (reported as such); if the file ends
 * first, those from the first row that reads as a note (an empty period cell, or one starting with a
 * letter) are notes. At most {@link #HELD_LIMIT} rows are held: a longer run of rows without a period
 * is data if it starts with a data row, and notes otherwise, in which case a data row after it is a
 * problem.
 */
final class BodyRows {

    /** What is done with each data row; the period cell as parsed, or empty when it states no period. */
    interface Data {
        void row(Row row, Optional<PeriodCells.Parsed> period);
    }

    static final int HELD_LIMIT = 10_000;

    private final Optional<Row> header;
    private final int periodColumn;
    private final ProblemLog log;
    private final Data data;
    private final List<Row> held = new ArrayList<>();
    private int notesFrom;
    private Row reference;
    private int widest;
    private int expected;
    private final List<Integer> shortLines = new ArrayList<>();
    private int shortCount;
    private int firstShortFields;
    private int count;

    BodyRows(Optional<Row> header, int periodColumn, ProblemLog log, Data data) {
        this.header = header;
        this.periodColumn = periodColumn;
        this.log = log;
        this.data = data;
        header.ifPresent(this::reference);
    }

    /** The next row below the header (blank rows left out). */
    void row(Row row) {
        Optional<PeriodCells.Parsed> period = PeriodCells.parse(row.cell(periodColumn));
        if (notesFrom > 0) {
            if (period.isPresent()) {
                log.error(row.line(), 0, "a data row below more than " + HELD_LIMIT + " " + log.lineWord()
                        + "s without a period (from " + log.where(notesFrom) + "), which were set aside as notes; expected the notes below all the data");
            } else {
                note(row);
            }
            return;
        }
        if (period.isEmpty()) {
            held.add(row);
            if (held.size() > HELD_LIMIT) {
                if (TableShape.isNote(held.get(0), periodColumn)) {
                    notesFrom = held.get(0).line();
                    held.forEach(this::note);
                } else {
                    held.forEach(r -> give(r, Optional.empty()));
                }
                held.clear();
            }
            return;
        }
        held.forEach(r -> give(r, Optional.empty()));
        held.clear();
        give(row, period);
    }

    /** The file has ended: the rows held are data up to the first note, and notes from there. */
    void end() {
        int r = 0;
        while (r < held.size() && !TableShape.isNote(held.get(r), periodColumn)) {
            give(held.get(r++), Optional.empty());
        }
        held.subList(r, held.size()).forEach(this::note);
        held.clear();
        if (shortCount > 0) {
            String against = header.isPresent() ? "the header has " : "the first data row has ";
            String lines = shortLines.stream().map(String::valueOf).collect(Collectors.joining(", "));
            String more = shortCount > shortLines.size() ? " and " + (shortCount - shortLines.size()) + " more "
                    + log.lineWord() + "s" : "";
            log.warn(shortLines.get(0), 0, (shortCount == 1 ? "this row has " + firstShortFields + " fields but "
                    : "rows with fewer fields than expected (" + log.lineWord() + "s " + lines + more + "): ") + against + expected
                    + "; the missing fields were read as missing values");
        }
    }

    /** The data rows given on. */
    int count() {
        return count;
    }

    private void note(Row row) {
        log.warn(row.line(), 0, log.lineWord() + " set aside as a note below the data: '" + TableShape.preview(row) + "'");
    }

    private void reference(Row row) {
        reference = row;
        widest = row.cells().size();
        expected = TableShape.effectiveWidth(row);
    }

    /**
     * A data row with more fields than the header is refused (a value with an unquoted comma, such as
     * {@code 1,234}, splits in two and would shift every cell after it); a row with fewer fields reads
     * the fields missing at its end as missing values, said in one warning naming the lines. Without a
     * header, the first data row sets the width.
     */
    private void give(Row row, Optional<PeriodCells.Parsed> period) {
        if (reference == null) {
            reference(row);
        }
        int fields = row.cells().size();
        if (fields > widest && TableShape.effectiveWidth(row) > widest) {
            log.error(row.line(), row.column(widest), "this row has " + TableShape.effectiveWidth(row) + " fields but "
                    + (header.isPresent() ? "the header has " : "the first data row has ") + widest + "; expected at most "
                    + widest + " (quote a cell that holds the delimiter, such as \"1,234\")");
        } else if (fields < expected) {
            if (shortCount == 0) {
                firstShortFields = fields;
            }
            if (shortLines.size() < 5) {
                shortLines.add(row.line());
            }
            shortCount++;
        }
        count++;
        data.row(row, period);
    }
}
