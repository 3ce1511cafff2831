package org.annalist.ingest;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.util.Iterator;
import java.util.function.Consumer;
import org.annalist.ingest.CsvRows.Row;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * Reads the records of a text as they come, giving each to a sink as a {@link Row} of trimmed cells
 * with the line it starts on; nothing is held beyond a buffer.
 *
 * <p>A line without a double quote is split at the delimiter here, as Commons CSV would split it
 * (its cells trimmed of surrounding spaces); a record with a quote, which may run over several lines,
 * is handed to Commons CSV whole, so that quoting follows its rules exactly. Line breaks are
 * {@code \n}, {@code \r\n} or a lone {@code \r}, as an editor counts them.
 */
final class CsvStream {

    /** Longest line (or quoted record) read, in characters: far beyond a row of any table of series. */
    static final int LINE_LIMIT = 16 << 20;

    private enum State { CELL_START, PLAIN, QUOTED, QUOTE_SEEN, AFTER_QUOTE }

    private final Reader in;
    private final char delimiter;
    private final ProblemLog log;
    private final Consumer<Row> sink;
    private char[] buffer = new char[1 << 16];
    private int position;
    private int limit;
    private boolean ended;
    private int line = 1;
    private int lastLine;

    private CsvStream(Reader in, char delimiter, ProblemLog log, Consumer<Row> sink) {
        this.in = in;
        this.delimiter = delimiter;
        this.log = log;
        this.sink = sink;
    }

    static void stream(Reader text, char delimiter, ProblemLog log, Consumer<Row> sink) {
        try {
            new CsvStream(text, delimiter, log, sink).run();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private void run() throws IOException {
        while (true) {
            int end = lineEnd();
            if (end < 0) {
                return;
            }
            boolean quoted = false;
            for (int i = position; i < end && !quoted; i++) {
                quoted = buffer[i] == '"';
            }
            if (quoted) {
                if (!quotedRecord()) {
                    return;
                }
                continue;
            }
            emit(line, split(position, end));
            position = end;
            skipLineBreak();
            line++;
        }
    }

    /** The end of the line at {@code position} (its line break, or the end of the text), with all of it in the buffer; -1 at the end. */
    private int lineEnd() throws IOException {
        int scanned = position;
        while (true) {
            for (int i = scanned; i < limit; i++) {
                char c = buffer[i];
                if (c == '\n' || c == '\r') {
                    return i;
                }
            }
            if (ended) {
                return position < limit ? limit : -1;
            }
            scanned = limit - position;
            fill();
            scanned += position;
            if (limit - position > LINE_LIMIT) {
                throw log.fatal(line, 0, "the line is longer than " + LINE_LIMIT + " characters; expected the rows of a table");
            }
        }
    }

    /** Reads more text, keeping what is not yet consumed at the start of the buffer (grown when full). */
    private void fill() throws IOException {
        if (position > 0) {
            System.arraycopy(buffer, position, buffer, 0, limit - position);
            limit -= position;
            position = 0;
        }
        if (limit == buffer.length) {
            buffer = java.util.Arrays.copyOf(buffer, buffer.length * 2);
        }
        int n = in.read(buffer, limit, buffer.length - limit);
        if (n < 0) {
            ended = true;
        } else {
            limit += n;
        }
    }

    /** At a line break ({@code \r}, {@code \n} or {@code \r\n}): goes past it. */
    private void skipLineBreak() throws IOException {
        if (position >= limit) {
            return;
        }
        char c = buffer[position++];
        if (c == '\r') {
            if (position == limit && !ended) {
                fill();
            }
            if (position < limit && buffer[position] == '\n') {
                position++;
            }
        }
    }

    private String[] split(int from, int to) {
        int count = 1;
        for (int i = from; i < to; i++) {
            if (buffer[i] == delimiter) {
                count++;
            }
        }
        String[] cells = new String[count];
        int start = from;
        int cell = 0;
        for (int i = from; i <= to; i++) {
            if (i == to || buffer[i] == delimiter) {
                int a = start;
                int b = i;
                while (a < b && CsvRows.isSpace(buffer[a])) {
                    a++;
                }
                while (b > a && CsvRows.isSpace(buffer[b - 1])) {
                    b--;
                }
                cells[cell++] = new String(buffer, a, b - a);
                start = i + 1;
            }
        }
        return cells;
    }

    private void emit(int at, String[] cells) {
        lastLine = at;
        sink.accept(new Row(at, new CsvRows.Fields(cells)));
    }

    /**
     * The record at {@code position}, which holds a quote: its text (over as many lines as its quoted
     * cells run) read by Commons CSV. False when the record ran too long and the rest of the text was
     * read by Commons CSV as it comes.
     */
    private boolean quotedRecord() throws IOException {
        StringBuilder record = new StringBuilder();
        int firstLine = line;
        State state = State.CELL_START;
        while (true) {
            if (position == limit) {
                if (ended) {
                    break;
                }
                fill();
                continue;
            }
            char c = buffer[position++];
            record.append(c);
            boolean lineBreak = c == '\n' || c == '\r';
            if (lineBreak && state != State.QUOTED) {
                if (c == '\r') {
                    if (position == limit && !ended) {
                        fill();
                    }
                    if (position < limit && buffer[position] == '\n') {
                        record.append(buffer[position++]);
                    }
                }
                break;
            }
            state = next(state, c);
            if (record.length() > LINE_LIMIT) {
                String rest = new String(buffer, position, limit - position);
                position = limit;
                commons(new PrefixedText(record + rest, in), firstLine);
                return false;
            }
        }
        commons(new StringReader(record.toString()), firstLine);
        line = firstLine + lineBreaks(record);
        return true;
    }

    /** What Commons CSV's lexer is in after {@code c}, as far as where a record ends goes. */
    private State next(State state, char c) {
        return switch (state) {
            case CELL_START -> c == delimiter ? State.CELL_START : c == '"' ? State.QUOTED
                    : Character.isWhitespace(c) ? State.CELL_START : State.PLAIN;
            case PLAIN, AFTER_QUOTE -> c == delimiter ? State.CELL_START : state;
            case QUOTED -> c == '"' ? State.QUOTE_SEEN : State.QUOTED;
            case QUOTE_SEEN -> c == '"' ? State.QUOTED : c == delimiter ? State.CELL_START : State.AFTER_QUOTE;
        };
    }

    private static int lineBreaks(CharSequence text) {
        int breaks = 0;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n' || (c == '\r' && (i + 1 == text.length() || text.charAt(i + 1) != '\n'))) {
                breaks++;
            }
        }
        return breaks;
    }

    /** The records of {@code text}, which starts on line {@code firstLine}, read by Commons CSV. */
    private void commons(Reader text, int firstLine) throws IOException {
        CsvRows.LineCountingReader counted = new CsvRows.LineCountingReader(text);
        try (CSVParser parser = CSVParser.parse(counted, CsvRows.format(delimiter))) {
            Iterator<CSVRecord> records = parser.iterator();
            while (true) {
                CSVRecord record;
                try {
                    if (!records.hasNext()) {
                        break;
                    }
                    record = records.next();
                } catch (UncheckedIOException | IllegalStateException malformed) {
                    throw log.fatal(lastLine + 1, 0, "a quoted cell is never closed (" + inFile(CsvRows.rootMessage(malformed),
                            firstLine) + "); expected a closing double quote before the end of the file");
                }
                String[] cells = new String[record.size()];
                for (int i = 0; i < cells.length; i++) {
                    cells[i] = CsvRows.clean(record.get(i));
                }
                emit(firstLine - 1 + counted.lineOf(record.getCharacterPosition()), cells);
            }
        }
    }

    private static final java.util.regex.Pattern LINE_IN_MESSAGE =
            java.util.regex.Pattern.compile("(startline |line: )(\\d+)(, position: \\d+)?");

    /** Commons CSV's message about a record read on its own, with the lines of the file (its character position left out). */
    private static String inFile(String message, int firstLine) {
        return LINE_IN_MESSAGE.matcher(message).replaceAll(m -> m.group(1) + (Integer.parseInt(m.group(2)) + firstLine - 1));
    }

    /** A string, then the rest of a reader. */
    private static final class PrefixedText extends Reader {
        private final StringReader first;
        private final Reader rest;
        private boolean firstDone;

        PrefixedText(String first, Reader rest) {
            this.first = new StringReader(first);
            this.rest = rest;
        }

        @Override
        public int read(char[] into, int offset, int length) throws IOException {
            if (!firstDone) {
                int n = first.read(into, offset, length);
                if (n > 0) {
                    return n;
                }
                firstDone = true;
            }
            return rest.read(into, offset, length);
        }

        @Override
        public void close() {
            // the rest is closed by whoever opened it
        }
    }
}
