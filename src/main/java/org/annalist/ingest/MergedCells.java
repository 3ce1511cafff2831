package org.annalist.ingest;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The merged ranges of a sheet, and the filling of each range with its label: a merged range shows the
 * content of its top-left cell across all its cells, and the others are empty in the file (ECMA-376
 * Part 1 §18.3.1.55, mergeCell; ODF 1.2 Part 1 §9.1.5, covered table cells). A header merged over
 * two columns, or down two rows, names each of them as the reader sees it; so a label (text that is not
 * a number) is copied into the empty cells of its range. A merged number is one value and is not copied.
 */
final class MergedCells {

    /** More ranges than this are not kept (a sheet of merged cells is no table). */
    static final int LIMIT = 100_000;

    private static final Pattern XLSX_MERGE = Pattern.compile(
            "[<:]mergeCell\\s[^>]*?ref=\"([A-Z]{1,3})(\\d{1,7})(?::([A-Z]{1,3})(\\d{1,7}))?\"");

    private static final class Range {
        final int firstRow;
        final int firstColumn;
        final int lastRow;
        final int lastColumn;
        String label;

        Range(int firstRow, int firstColumn, int lastRow, int lastColumn) {
            this.firstRow = firstRow;
            this.firstColumn = firstColumn;
            this.lastRow = lastRow;
            this.lastColumn = lastColumn;
        }
    }

    private final List<Range> waiting = new ArrayList<>();
    private final List<Range> active = new ArrayList<>();
    private int nextWaiting;
    private int reach;
    private boolean sorted = true;

    /** Adds a range (1-based rows, 0-based columns). */
    void add(int firstRow, int firstColumn, int lastRow, int lastColumn) {
        if (waiting.size() >= LIMIT || lastRow < firstRow || lastColumn < firstColumn
                || (lastRow == firstRow && lastColumn == firstColumn)) {
            return;
        }
        Range range = new Range(firstRow, firstColumn, Math.min(lastRow, Workbook.MAX_ROWS),
                Math.min(lastColumn, Workbook.MAX_COLUMNS - 1));
        if (!waiting.isEmpty() && waiting.get(waiting.size() - 1).firstRow > firstRow) {
            sorted = false;
        }
        waiting.add(range);
        reach = Math.max(reach, range.lastRow);
    }

    /** The last row any range covers (0 when there are none). */
    int reach() {
        return reach;
    }

    boolean isEmpty() {
        return waiting.isEmpty();
    }

    /**
     * Fills row {@code number}'s cells from the ranges over it; returns the row's array, grown when a
     * range reaches past it.
     */
    String[] fill(int number, String[] cells) {
        if (!sorted) {
            waiting.subList(nextWaiting, waiting.size()).sort(Comparator.comparingInt(r -> r.firstRow));
            sorted = true;
        }
        while (nextWaiting < waiting.size() && waiting.get(nextWaiting).firstRow <= number) {
            active.add(waiting.get(nextWaiting++));
        }
        active.removeIf(r -> r.lastRow < number);
        String[] row = cells;
        for (Range range : active) {
            if (range.firstRow == number) {
                String topLeft = range.firstColumn < row.length ? row[range.firstColumn] : null;
                range.label = topLeft != null && !topLeft.isEmpty() && !NumberCells.looksNumeric(topLeft) ? topLeft : null;
            }
            if (range.label == null) {
                continue;
            }
            if (row.length <= range.lastColumn) {
                row = java.util.Arrays.copyOf(row, range.lastColumn + 1);
            }
            for (int c = range.firstColumn; c <= range.lastColumn; c++) {
                if (row[c] == null || row[c].isEmpty()) {
                    row[c] = range.label;
                }
            }
        }
        return row;
    }

    /**
     * The merged ranges of an xlsx sheet part. They follow the cells in the part (ECMA-376 Part 1
     * §18.3.1.99, worksheet: mergeCells comes after sheetData), so they are found by a look through the
     * inflated bytes before the cells are parsed, which costs a fraction of parsing them.
     */
    static MergedCells ofXlsx(InputStream part) throws IOException {
        MergedCells merged = new MergedCells();
        byte[] buffer = new byte[1 << 16];
        String carry = "";
        int n;
        while ((n = part.readNBytes(buffer, 0, buffer.length)) > 0) {
            String chunk = carry + new String(buffer, 0, n, StandardCharsets.ISO_8859_1);
            Matcher m = XLSX_MERGE.matcher(chunk);
            int end = 0;
            while (m.find()) {
                int firstColumn = XlsxBook.columnIndex(m.group(1));
                int firstRow = Integer.parseInt(m.group(2));
                int lastColumn = m.group(3) == null ? firstColumn : XlsxBook.columnIndex(m.group(3));
                int lastRow = m.group(4) == null ? firstRow : Integer.parseInt(m.group(4));
                merged.add(firstRow, firstColumn, lastRow, lastColumn);
                end = m.end();
            }
            // An element cut at the chunk's end is found whole with the next chunk.
            carry = chunk.substring(Math.max(end, chunk.length() - 256));
        }
        return merged;
    }
}
