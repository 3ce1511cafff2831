package org.annalist.ingest;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
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
            cells = List.copyOf(cells);
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
            return cells.stream().allMatch(String::isEmpty);
        }

        int nonEmptyCount() {
            return (int) cells.stream().filter(c -> !c.isEmpty()).count();
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
        String sample = firstNonBlankLines(text, SAMPLE_LINES);
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
        int[] lineStarts = lineStarts(text);
        List<Row> rows = new ArrayList<>();
        try (CSVParser parser = CSVParser.parse(text, format(delimiter))) {
            for (CSVRecord record : parser) {
                int line = lineOf(lineStarts, record.getCharacterPosition());
                List<String> cells = new ArrayList<>(record.size());
                for (String value : record) {
                    cells.add(clean(value));
                }
                rows.add(new Row(line, List.copyOf(cells)));
            }
        } catch (IOException | UncheckedIOException | IllegalStateException malformed) {
            int line = rows.isEmpty() ? 1 : rows.get(rows.size() - 1).line() + 1;
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

    /** Trims ordinary and no-break spaces, which spreadsheet exports leave around cells. */
    private static String clean(String value) {
        int start = 0;
        int end = value.length();
        while (start < end && isSpace(value.charAt(start))) {
            start++;
        }
        while (end > start && isSpace(value.charAt(end - 1))) {
            end--;
        }
        return value.substring(start, end);
    }

    private static boolean isSpace(char c) {
        return Character.isWhitespace(c) || c == '\u00A0' || c == '\u202F' || c == '\u2007';
    }

    private static String firstNonBlankLines(String text, int count) {
        StringBuilder sample = new StringBuilder();
        int taken = 0;
        for (String line : text.split("\r\n|\n|\r", -1)) {
            if (!line.isBlank()) {
                sample.append(line).append('\n');
                if (++taken == count) {
                    break;
                }
            }
        }
        return sample.toString();
    }

    private static int[] lineStarts(String text) {
        List<Integer> starts = new ArrayList<>();
        starts.add(0);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n' || (c == '\r' && (i + 1 == text.length() || text.charAt(i + 1) != '\n'))) {
                starts.add(i + 1);
            }
        }
        return starts.stream().mapToInt(Integer::intValue).toArray();
    }

    private static int lineOf(int[] lineStarts, long position) {
        int found = Arrays.binarySearch(lineStarts, (int) position);
        return (found >= 0 ? found : -found - 2) + 1;
    }

    private static String rootMessage(Throwable e) {
        Throwable root = e;
        while (root.getCause() != null) {
            root = root.getCause();
        }
        return root.getMessage() == null ? root.getClass().getSimpleName() : root.getMessage();
    }
}
