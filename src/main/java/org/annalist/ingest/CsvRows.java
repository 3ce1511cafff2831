package org.annalist.ingest;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.util.AbstractList;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/** Splits text into rows of trimmed cells, each row with the line it starts on; finds the delimiter. */
final class CsvRows {

    /**
     * One record of the file. {@code line} is 1-based, as an editor shows it; {@code sourceColumns}
     * gives each cell's 1-based column in the file when the table was rearranged (null: in order).
     */
    record Row(int line, List<String> cells, int[] sourceColumns) {

        Row {
            cells = cells instanceof Table.Cells || cells instanceof Fields ? cells : List.copyOf(cells);
            sourceColumns = sourceColumns == null ? null : sourceColumns.clone();
        }

        Row(int line, List<String> cells) {
            this(line, cells, null);
        }

        @Override
        public int[] sourceColumns() {
            return sourceColumns == null ? null : sourceColumns.clone();
        }

        String cell(int column) {
            return column < cells.size() ? cells.get(column) : "";
        }

        /** The 1-based column in the file of the cell at {@code index}. */
        int column(int index) {
            return sourceColumns == null || index >= sourceColumns.length ? index + 1 : sourceColumns[index];
        }

        boolean isBlank() {
            if (cells instanceof Table.Cells view) {
                return view.blank();
            }
            for (int c = 0; c < cells.size(); c++) {
                if (!cells.get(c).isEmpty()) {
                    return false;
                }
            }
            return true;
        }

        int nonEmptyCount() {
            return (int) cells.stream().filter(c -> !c.isEmpty()).count();
        }
    }

    /** The cells of a row just read, in an array no one else holds (so a row need not copy them). */
    static final class Fields extends AbstractList<String> implements java.util.RandomAccess {
        private final String[] cells;

        /** @param cells an array the caller lets go of */
        Fields(String[] cells) {
            this.cells = cells;
        }

        @Override
        public String get(int index) {
            return cells[index];
        }

        @Override
        public int size() {
            return cells.length;
        }
    }

    /**
     * Rows held compactly (the first rows of a file, or a whole table that must be rearranged): the
     * text of every cell in one buffer, and where each cell and row starts, rather than a string and a
     * list per row. {@link #get} makes the {@link Row} of a record when asked.
     */
    static final class Table extends AbstractList<Row> {
        private final StringBuilder text;
        private int[] cellStarts;
        private int cellCount;
        private int[] rowFirstCells;
        private int[] rowLines;
        private int rowCount;
        private int[][] rowSourceColumns;   // made for the first rearranged row

        Table() {
            text = new StringBuilder(1024);
            cellStarts = new int[64];
            rowFirstCells = new int[16];
            rowLines = new int[16];
        }

        void append(Row row) {
            if (rowCount + 1 >= rowFirstCells.length) {
                rowFirstCells = Arrays.copyOf(rowFirstCells, grown(rowFirstCells.length));
                rowLines = Arrays.copyOf(rowLines, grown(rowLines.length));
                rowSourceColumns = rowSourceColumns == null ? null : Arrays.copyOf(rowSourceColumns, rowLines.length);
            }
            if (row.sourceColumns != null) {
                if (rowSourceColumns == null) {
                    rowSourceColumns = new int[rowLines.length][];
                }
                rowSourceColumns[rowCount] = row.sourceColumns;
            }
            rowFirstCells[rowCount] = cellCount;
            rowLines[rowCount] = row.line();
            rowCount++;
            for (String value : row.cells()) {
                if (cellCount + 1 >= cellStarts.length) {
                    cellStarts = Arrays.copyOf(cellStarts, grown(cellStarts.length));
                }
                cellStarts[cellCount++] = text.length();
                text.append(value);
            }
            rowFirstCells[rowCount] = cellCount;
            cellStarts[cellCount] = text.length();
        }

        /** The characters of the cells held. */
        long characters() {
            return text.length();
        }

        private static int grown(int length) {
            return (int) Math.min(Integer.MAX_VALUE - 16, length + (long) length / 2 + 16);
        }

        @Override
        public Row get(int index) {
            if (index < 0 || index >= rowCount) {
                throw new IndexOutOfBoundsException(index);
            }
            return new Row(rowLines[index], new Cells(rowFirstCells[index], rowFirstCells[index + 1]),
                    rowSourceColumns == null ? null : rowSourceColumns[index]);
        }

        /** The cells of one row, each made into a string only when asked for. */
        final class Cells extends AbstractList<String> {
            private final int first;
            private final int end;

            private Cells(int first, int end) {
                this.first = first;
                this.end = end;
            }

            @Override
            public String get(int index) {
                Objects.checkIndex(index, end - first);
                return text.substring(cellStarts[first + index], cellStarts[first + index + 1]);
            }

            @Override
            public int size() {
                return end - first;
            }

            boolean blank() {
                return cellStarts[first] == cellStarts[end];
            }
        }

        @Override
        public int size() {
            return rowCount;
        }
    }

    /** Tab and semicolon first: when they split every line alike they are the delimiter, while a comma may be a decimal mark. */
    private static final char[] CANDIDATES = {'\t', ';', '|', ','};
    private static final int SAMPLE_LINES = 60;
    private static final double CONSISTENT_SHARE = 0.8;

    private CsvRows() {
    }

    /** The delimiter that splits the first lines into the same number (two or more) of cells. */
    static char detectDelimiter(String text) {
        String sample = firstNonBlankLines(new StringReader(text), SAMPLE_LINES);
        char best = ',';
        double bestShare = -1;
        for (char candidate : CANDIDATES) {
            List<Integer> widths = new ArrayList<>();
            try (CSVParser parser = CSVParser.parse(sample, format(candidate))) {
                for (CSVRecord record : parser) {
                    widths.add(record.size());
                }
            } catch (IOException | UncheckedIOException | IllegalStateException malformed) {
                continue;
            }
            Map<Integer, Integer> counts = new HashMap<>();
            widths.forEach(w -> counts.merge(w, 1, Integer::sum));
            int modalWidth = counts.entrySet().stream().max(Map.Entry.comparingByValue()).map(Map.Entry::getKey).orElse(1);
            double share = widths.isEmpty() ? 0 : counts.get(modalWidth) / (double) widths.size();
            if (modalWidth >= 2 && share >= CONSISTENT_SHARE) {
                return candidate;
            }
            if (modalWidth >= 2 && share > bestShare) {
                best = candidate;
                bestShare = share;
            }
        }
        return best;
    }

    /** What a file's first lines were read for: a sample to find the delimiter by, and the whole text, as if unread. */
    record Head(String sample, int sampleLines, Reader whole) {
    }

    /** Largest head read to find the delimiter by, in characters. */
    private static final int HEAD_CHARACTERS = 4 << 20;

    /**
     * Reads the first {@link #SAMPLE_LINES} non-blank lines of {@code text} (and no further) for the
     * delimiter to be found from; the reader given back reads the text from its start.
     */
    static Head head(Reader text) {
        StringBuilder read = new StringBuilder();
        StringBuilder sample = new StringBuilder();
        StringBuilder line = new StringBuilder();
        int taken = 0;
        boolean afterCarriageReturn = false;
        char[] buffer = new char[8192];
        try {
            int n = 0;
            while (taken < SAMPLE_LINES && read.length() < HEAD_CHARACTERS && (n = text.read(buffer)) >= 0) {
                read.append(buffer, 0, n);
                for (int i = 0; i < n; i++) {
                    char c = buffer[i];
                    boolean lineFeedOfCrLf = c == '\n' && afterCarriageReturn;
                    afterCarriageReturn = c == '\r';
                    if (lineFeedOfCrLf) {
                        continue;
                    }
                    if (c == '\n' || c == '\r') {
                        if (!line.toString().isBlank() && taken < SAMPLE_LINES) {
                            sample.append(line).append('\n');
                            taken++;
                        }
                        line.setLength(0);
                    } else {
                        line.append(c);
                    }
                }
            }
            if (taken < SAMPLE_LINES && !line.toString().isBlank()) {
                sample.append(line).append('\n');   // the last line, or a part of a very long one
                taken++;
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return new Head(sample.toString(), taken, new PrefixedReader(read.toString(), text));
    }

    /** Text given back, then the rest of a reader (which closing this leaves open). */
    private static final class PrefixedReader extends Reader {
        private final String prefix;
        private final Reader rest;
        private int position;

        PrefixedReader(String prefix, Reader rest) {
            this.prefix = prefix;
            this.rest = rest;
        }

        @Override
        public int read(char[] buffer, int offset, int length) throws IOException {
            if (position < prefix.length()) {
                int n = Math.min(length, prefix.length() - position);
                prefix.getChars(position, position + n, buffer, offset);
                position += n;
                return n;
            }
            return rest.read(buffer, offset, length);
        }

        @Override
        public void close() {
            // the rest is closed by whoever opened it (its bytes may still be wanted, for their digest)
        }
    }

    static CSVFormat format(char delimiter) {
        return CSVFormat.DEFAULT.builder()
                .setDelimiter(delimiter)
                .setQuote('"')
                .setIgnoreEmptyLines(false)
                .setIgnoreSurroundingSpaces(true)
                .get();
    }

    /** The cell without the ordinary and no-break spaces that spreadsheet exports leave around cells. */
    static String clean(String value) {
        int start = 0;
        int end = value.length();
        while (start < end && isSpace(value.charAt(start))) {
            start++;
        }
        while (end > start && isSpace(value.charAt(end - 1))) {
            end--;
        }
        return start == 0 && end == value.length() ? value : value.substring(start, end);
    }

    static boolean isSpace(char c) {
        return Character.isWhitespace(c) || c == '\u00A0' || c == '\u202F' || c == '\u2007';
    }

    /** The first {@code count} non-blank lines, read from the start of the text and no further. */
    private static String firstNonBlankLines(Reader text, int count) {
        StringBuilder sample = new StringBuilder();
        int taken = 0;
        try (BufferedReader lines = new BufferedReader(text)) {
            for (String line = lines.readLine(); line != null && taken < count; line = lines.readLine()) {
                if (!line.isBlank()) {
                    sample.append(line).append('\n');
                    taken++;
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return sample.toString();
    }

    /**
     * Passes text through and notes where each line starts, so that a record's character position
     * gives its line; a line break is {@code \n}, {@code \r\n} or a lone {@code \r}. Only the starts
     * not yet asked about are kept (the parser reads ahead by a buffer at most).
     */
    static final class LineCountingReader extends Reader {
        private final Reader in;
        private long position;
        private boolean afterCarriageReturn;
        private long[] starts = new long[64];
        private int head;
        private int tail;
        private int line = 1;

        LineCountingReader(Reader in) {
            this.in = in;
        }

        @Override
        public int read(char[] buffer, int offset, int length) throws IOException {
            int n = in.read(buffer, offset, length);
            for (int i = 0; i < n; i++) {
                char c = buffer[offset + i];
                if (afterCarriageReturn && c != '\n') {
                    push(position);
                }
                if (c == '\n') {
                    push(position + 1);
                }
                afterCarriageReturn = c == '\r';
                position++;
            }
            return n;
        }

        private void push(long start) {
            if (tail == starts.length) {
                if (head > 0) {
                    System.arraycopy(starts, head, starts, 0, tail - head);
                    tail -= head;
                    head = 0;
                } else {
                    starts = Arrays.copyOf(starts, starts.length * 2);
                }
            }
            starts[tail++] = start;
        }

        /** The 1-based line of {@code characterPosition}; positions must be asked in increasing order. */
        int lineOf(long characterPosition) {
            while (head < tail && starts[head] <= characterPosition) {
                head++;
                line++;
            }
            return line;
        }

        @Override
        public void close() throws IOException {
            in.close();
        }
    }

    static String rootMessage(Throwable e) {
        Throwable root = e;
        while (root.getCause() != null) {
            root = root.getCause();
        }
        return root.getMessage() == null ? root.getClass().getSimpleName() : root.getMessage();
    }
}
