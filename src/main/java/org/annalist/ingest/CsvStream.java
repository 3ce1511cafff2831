package org.annalist.ingest;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.TimeUnit;
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
 *
 * <p>A large text is read {@linkplain #streamAhead ahead on a thread of its own}: the decoding and
 * splitting of its lines run there while the caller's thread gives the rows to the sink, so that a
 * file of thousands of series is read on two cores. The sink sees the same rows in the same order,
 * and the problems found are logged on the caller's thread in the same order, as when one thread
 * reads.
 */
final class CsvStream {

    /** Longest line (or quoted record) read, in characters: far beyond a row of any table of series. */
    static final int LINE_LIMIT = 16 << 20;

    private enum State { CELL_START, PLAIN, QUOTED, QUOTE_SEEN, AFTER_QUOTE }

    private final Reader in;
    private final char delimiter;
    private final Consumer<Row> sink;
    private char[] buffer = new char[1 << 16];
    private int position;
    private int limit;
    private boolean ended;
    private int line = 1;
    private int lastLine;

    /** Rows handed from the reading thread to the caller's at a time ({@link #streamAhead}). */
    private static final int ROWS_PER_BATCH = 1024;
    /** Batches read ahead at most: the rows in flight stay a few MB whatever the file's size. */
    private static final int BATCHES_AHEAD = 4;

    private CsvStream(Reader in, char delimiter, Consumer<Row> sink) {
        this.in = in;
        this.delimiter = delimiter;
        this.sink = sink;
    }

    /** Gives every record of {@code text} to {@code sink}, on this thread. */
    static void stream(Reader text, char delimiter, ProblemLog log, Consumer<Row> sink) {
        try {
            new CsvStream(text, delimiter, sink).run();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (Unreadable unreadable) {
            throw unreadable.logIn(log);
        }
    }

    /**
     * As {@link #stream}, with the text read and split on a thread of its own, at most
     * {@value #BATCHES_AHEAD} batches of {@value #ROWS_PER_BATCH} rows ahead of {@code sink}, which
     * runs on this thread. Whatever stops the reading (a fatal problem of the text, a failure of the
     * reader such as {@link TextDecoding.NotUtf8}) reaches this thread after the rows before it, as it
     * would have reached {@link #stream}'s caller; whatever stops the sink stops the reading thread,
     * which has ended when this returns or throws, so that the caller may read on from {@code text}.
     * {@code text} must not write to the log as it is read (the reading thread never touches it).
     */
    static void streamAhead(Reader text, char delimiter, ProblemLog log, Consumer<Row> sink) {
        BlockingQueue<Object> batches = new ArrayBlockingQueue<>(BATCHES_AHEAD);
        ReadingAhead reading = new ReadingAhead(text, delimiter, batches);
        Thread thread = new Thread(reading, "annalist-csv-read-ahead");
        thread.setDaemon(true);
        thread.start();
        boolean finished = false;
        boolean interrupted = false;
        try {
            while (true) {
                Object next;
                try {
                    next = batches.take();
                } catch (InterruptedException interruption) {
                    // a read on one thread goes on when interrupted, and so does this one; the
                    // interruption is kept for the caller below
                    interrupted = true;
                    continue;
                }
                if (next instanceof List<?> rows) {
                    for (Object row : rows) {
                        sink.accept((Row) row);
                    }
                } else if (next == ReadingAhead.END) {
                    finished = true;
                    return;
                } else {
                    finished = true;
                    Throwable stop = (Throwable) next;
                    if (stop instanceof Unreadable unreadable) {
                        throw unreadable.logIn(log);
                    }
                    if (stop instanceof IOException io) {
                        throw new UncheckedIOException(io);
                    }
                    if (stop instanceof RuntimeException runtime) {
                        throw runtime;
                    }
                    throw (Error) stop;
                }
            }
        } finally {
            // the reading thread has handed its last item and is returning, or must be stopped;
            // either way it has ended before the caller reads on from the text
            if (!finished) {
                reading.cancelled = true;
            }
            while (thread.isAlive()) {
                batches.clear();   // a reading thread waiting for room sees the cancellation
                try {
                    thread.join(10);
                } catch (InterruptedException interruption) {
                    interrupted = true;
                }
            }
            if (interrupted) {
                Thread.currentThread().interrupt();
            }
        }
    }

    /** The reading thread of {@link #streamAhead}: batches of rows, then {@link #END} or what stopped it. */
    private static final class ReadingAhead implements Runnable {
        static final Object END = new Object();

        private final Reader text;
        private final char delimiter;
        private final BlockingQueue<Object> batches;
        volatile boolean cancelled;
        private List<Row> batch = new ArrayList<>(ROWS_PER_BATCH);

        ReadingAhead(Reader text, char delimiter, BlockingQueue<Object> batches) {
            this.text = text;
            this.delimiter = delimiter;
            this.batches = batches;
        }

        @Override
        public void run() {
            Object last;
            try {
                new CsvStream(text, delimiter, this::add).run();
                hand(batch);
                last = END;
            } catch (Cancelled cancelled) {
                return;
            } catch (Throwable stop) {   // handed to the caller's thread, which throws it there
                last = stop;
            }
            try {
                if (!batch.isEmpty()) {
                    hand(batch);
                }
                hand(last);
            } catch (Cancelled cancelled) {
                // the caller stopped first
            }
        }

        private void add(Row row) {
            batch.add(row);
            if (batch.size() == ROWS_PER_BATCH) {
                hand(batch);
            }
        }

        /** Puts {@code item} in the queue, waiting for room; a batch handed is replaced by a new one. */
        private void hand(Object item) {
            if (item == batch && batch.isEmpty()) {
                return;
            }
            try {
                // cancelled is read before every offer: the caller that stopped empties the queue
                // as it waits, so an offer after the cancellation would find room and read on
                do {
                    if (cancelled) {
                        throw new Cancelled();
                    }
                } while (!batches.offer(item, 10, TimeUnit.MILLISECONDS));
            } catch (InterruptedException interrupted) {
                throw new Cancelled();
            }
            if (item == batch) {
                batch = new ArrayList<>(ROWS_PER_BATCH);
            }
        }
    }

    /** The caller of {@link #streamAhead} stopped taking rows. */
    private static final class Cancelled extends RuntimeException {
        Cancelled() {
            super(null, null, false, false);
        }
    }

    /**
     * A problem of the text that ends its reading, found by the splitting; logged by the thread that
     * owns the log ({@link #logIn}), after the rows before it have gone to the sink.
     */
    private static final class Unreadable extends RuntimeException {
        private final int line;
        private final String problem;

        Unreadable(int line, String problem) {
            super(problem, null, false, false);
            this.line = line;
            this.problem = problem;
        }

        DataProblemException logIn(ProblemLog log) {
            return log.fatal(line, 0, problem);
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
                throw new Unreadable(line, "the line is longer than " + LINE_LIMIT + " characters; expected the rows of a table");
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
                    throw new Unreadable(lastLine + 1, "a quoted cell is never closed (" + inFile(CsvRows.rootMessage(malformed),
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
