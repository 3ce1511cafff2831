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
            cells = cells instanceof Table.Cells ? cells : List.copyOf(cells);
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
            return cells.stream().allMatch(String::isEmpty);
        }

        int nonEmptyCount() {
            return (int) cells.stream().filter(c -> !c.isEmpty()).count();
        }
    }

    /**
     * The rows of a file held compactly: the trimmed text of every cell in one buffer, and where each
     * cell and row starts, so that a file of millions of rows costs about its own size in memory rather
     * than a string and a list per row. {@link #get} makes the {@link Row} of a record when asked.
     */
    static final class Table extends AbstractList<Row> {
        private final StringBuilder text;
        private int[] cellStarts;
        private int cellCount;
        private int[] rowFirstCells;
        private int[] rowLines;
        private int rowCount;

        /**
         * Sized once from what the reader expects (growing a big buffer by doubling would hold two
         * copies at a time): {@code characters} of text in {@code rows} rows of {@code cellsPerRow}.
         */
        private Table(int characters, int rows, int cellsPerRow) {
            text = new StringBuilder(Math.max(16, characters));
            cellStarts = new int[(int) Math.min(Integer.MAX_VALUE - 16, Math.max(16L, (long) rows * cellsPerRow + 2))];
            rowFirstCells = new int[Math.max(16, rows + 2)];
            rowLines = new int[Math.max(16, rows + 2)];
        }

        private void add(int line, CSVRecord record) {
            if (rowCount + 1 >= rowFirstCells.length) {
                rowFirstCells = Arrays.copyOf(rowFirstCells, grown(rowFirstCells.length));
                rowLines = Arrays.copyOf(rowLines, grown(rowLines.length));
            }
            rowFirstCells[rowCount] = cellCount;
            rowLines[rowCount] = line;
            rowCount++;
            for (String value : record) {
                if (cellCount + 1 >= cellStarts.length) {
                    cellStarts = Arrays.copyOf(cellStarts, grown(cellStarts.length));
                }
                cellStarts[cellCount++] = text.length();
                appendClean(text, value);
            }
            rowFirstCells[rowCount] = cellCount;
            cellStarts[cellCount] = text.length();
        }

        private static int grown(int length) {
            return (int) Math.min(Integer.MAX_VALUE - 16, length + (long) length / 2 + 16);
        }

        @Override
        public Row get(int index) {
            if (index < 0 || index >= rowCount) {
                throw new IndexOutOfBoundsException(index);
            }
            return new Row(rowLines[index], new Cells(rowFirstCells[index], rowFirstCells[index + 1]));
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

        /** The line of the last row, or 0 when there is none. */
        private int lastLine() {
            return rowCount == 0 ? 0 : rowLines[rowCount - 1];
        }
    }

    /** Tab and semicolon first: when they split every line alike they are the delimiter, while a comma may be a decimal mark. */
    private static final char[] CANDIDATES = {'\t', ';', '|', ','};
    private static final int SAMPLE_LINES = 60;
    private static final double CONSISTENT_SHARE = 0.8;

    private CsvRows() {
    }

    /** The delimiter that splits the first lines of the text into the same number (two or more) of cells. */
    static char detectDelimiter(Reader text) {
        return detectDelimiter(firstNonBlankLines(text, SAMPLE_LINES));
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

    static List<Row> parse(String text, char delimiter, ProblemLog log) {
        return parse(new StringReader(text), delimiter, log, new Expected(text.length(), 16, 2));
    }

    /**
     * What a file is expected to hold, to size the table once: its length in characters (at most),
     * its number of lines, and the cells of its first line.
     */
    record Expected(int characters, int lines, int cellsPerLine) {

        /** From the bytes of a file: their number, their line feeds, the delimiters on the first line. */
        static Expected of(byte[] bytes, int offset, char delimiter) {
            int lines = 1;
            int firstLineCells = 1;
            boolean firstLine = true;
            for (int i = offset; i < bytes.length; i++) {
                byte b = bytes[i];
                if (b == '\n') {
                    lines++;
                    firstLine = false;
                } else if (firstLine && b == delimiter) {
                    firstLineCells++;
                }
            }
            return new Expected(bytes.length - offset, lines, firstLineCells);
        }
    }

    /** Reads the records of {@code text} as they come, without holding the text as a whole. */
    static Table parse(Reader text, char delimiter, ProblemLog log, Expected expected) {
        Table rows = new Table(expected.characters(), expected.lines(), expected.cellsPerLine());
        LineCountingReader counted = new LineCountingReader(text);
        try (CSVParser parser = CSVParser.parse(counted, format(delimiter))) {
            for (CSVRecord record : parser) {
                rows.add(counted.lineOf(record.getCharacterPosition()), record);
            }
        } catch (IOException | UncheckedIOException | IllegalStateException malformed) {
            int line = rows.isEmpty() ? 1 : rows.lastLine() + 1;
            throw log.fatal(line, 0, "a quoted cell is never closed (" + rootMessage(malformed)
                    + "); expected a closing double quote before the end of the file");
        }
        return rows;
    }

    private static CSVFormat format(char delimiter) {
        return CSVFormat.DEFAULT.builder()
                .setDelimiter(delimiter)
                .setQuote('"')
                .setIgnoreEmptyLines(false)
                .setIgnoreSurroundingSpaces(true)
                .get();
    }

    /** Appends the cell without the ordinary and no-break spaces that spreadsheet exports leave around cells. */
    private static void appendClean(StringBuilder to, String value) {
        int start = 0;
        int end = value.length();
        while (start < end && isSpace(value.charAt(start))) {
            start++;
        }
        while (end > start && isSpace(value.charAt(end - 1))) {
            end--;
        }
        to.append(value, start, end);
    }

    private static boolean isSpace(char c) {
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
    private static final class LineCountingReader extends Reader {
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

    private static String rootMessage(Throwable e) {
        Throwable root = e;
        while (root.getCause() != null) {
            root = root.getCause();
        }
        return root.getMessage() == null ? root.getClass().getSimpleName() : root.getMessage();
    }
}
