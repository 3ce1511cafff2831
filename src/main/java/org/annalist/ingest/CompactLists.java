package org.annalist.ingest;

import java.time.LocalDate;
import java.util.AbstractList;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.annalist.series.Frequency;
import org.annalist.series.Period;

/**
 * Lists of what every row of a big file gives (the parsed period cell, its date, its period) kept in
 * primitive arrays: a file of millions of rows costs a few bytes per row, not an object per row.
 * Each list may hold null (a row whose cell was unusable); objects are made when asked for.
 */
final class CompactLists {

    private static final long NONE = Long.MIN_VALUE;

    private CompactLists() {
    }

    /** Parsed period cells; {@link #set} to null drops a row. */
    static final class ParsedList extends AbstractList<PeriodCells.Parsed> {
        private static final byte EMPTY = 0;
        private static final byte DAY = 1;
        private static final byte AMBIGUOUS = 2;
        private static final byte FIXED = 3;   // + the frequency's ordinal

        private final byte[] kinds;
        private final long[] values;
        private final int[] formatIds;
        private final List<String> formats = new ArrayList<>();
        private final Map<String, Integer> formatIdOf = new HashMap<>();

        ParsedList(int size) {
            kinds = new byte[size];
            values = new long[size];
            formatIds = new int[size];
        }

        @Override
        public PeriodCells.Parsed get(int index) {
            Objects.checkIndex(index, kinds.length);
            String format = formats.isEmpty() ? "" : formats.get(formatIds[index]);
            long v = values[index];
            return switch (kinds[index]) {
                case EMPTY -> null;
                case DAY -> new PeriodCells.Day(LocalDate.ofEpochDay(v), format);
                case AMBIGUOUS -> new PeriodCells.AmbiguousDay((int) (v & 0xFF), (int) ((v >>> 8) & 0xFF), (int) (v >> 16), format);
                default -> new PeriodCells.Fixed(new Period(Frequency.values()[kinds[index] - FIXED], v), format);
            };
        }

        @Override
        public PeriodCells.Parsed set(int index, PeriodCells.Parsed parsed) {
            PeriodCells.Parsed before = get(index);
            if (parsed == null) {
                kinds[index] = EMPTY;
                return before;
            }
            formatIds[index] = formatIdOf.computeIfAbsent(parsed.format(), f -> {
                formats.add(f);
                return formats.size() - 1;
            });
            if (parsed instanceof PeriodCells.Day d) {
                kinds[index] = DAY;
                values[index] = d.date().toEpochDay();
            } else if (parsed instanceof PeriodCells.AmbiguousDay a) {
                kinds[index] = AMBIGUOUS;
                values[index] = (a.first() & 0xFF) | ((long) (a.second() & 0xFF) << 8) | ((long) a.year() << 16);
            } else {
                PeriodCells.Fixed f = (PeriodCells.Fixed) parsed;
                kinds[index] = (byte) (FIXED + f.period().frequency().ordinal());
                values[index] = f.period().index();
            }
            return before;
        }

        @Override
        public int size() {
            return kinds.length;
        }
    }

    /** Dates as epoch days. */
    static final class DateList extends AbstractList<LocalDate> {
        private final long[] days;

        DateList(int size) {
            days = new long[size];
            Arrays.fill(days, NONE);
        }

        @Override
        public LocalDate get(int index) {
            long day = days[Objects.checkIndex(index, days.length)];
            return day == NONE ? null : LocalDate.ofEpochDay(day);
        }

        @Override
        public LocalDate set(int index, LocalDate date) {
            LocalDate before = get(index);
            days[index] = date == null ? NONE : date.toEpochDay();
            return before;
        }

        @Override
        public int size() {
            return days.length;
        }

        /** The distinct dates in order, as epoch days. */
        long[] distinctSorted() {
            return CompactLists.distinctSorted(days);
        }
    }

    /** Periods of one frequency as their indexes. */
    static final class PeriodList extends AbstractList<Period> {
        private final Frequency frequency;
        private final long[] indexes;

        PeriodList(Frequency frequency, int size) {
            this.frequency = frequency;
            indexes = new long[size];
            Arrays.fill(indexes, NONE);
        }

        @Override
        public Period get(int index) {
            long i = indexes[Objects.checkIndex(index, indexes.length)];
            return i == NONE ? null : new Period(frequency, i);
        }

        @Override
        public Period set(int index, Period period) {
            Period before = get(index);
            indexes[index] = period == null ? NONE : period.index();
            return before;
        }

        @Override
        public int size() {
            return indexes.length;
        }

        /** The earliest and the latest period, or empty when every row is null. */
        java.util.Optional<Period[]> range() {
            long low = Long.MAX_VALUE;
            long high = Long.MIN_VALUE;
            for (long i : indexes) {
                if (i != NONE) {
                    low = Math.min(low, i);
                    high = Math.max(high, i);
                }
            }
            return low > high ? java.util.Optional.empty()
                    : java.util.Optional.of(new Period[] {new Period(frequency, low), new Period(frequency, high)});
        }
    }

    /** The distinct values other than the empty marker, in increasing order. */
    static long[] distinctSorted(long[] values) {
        int kept = 0;
        for (long v : values) {
            kept += v == NONE ? 0 : 1;
        }
        long[] sorted = new long[kept];
        kept = 0;
        for (long v : values) {
            if (v != NONE) {
                sorted[kept++] = v;
            }
        }
        Arrays.sort(sorted);
        int distinct = 0;
        for (int i = 0; i < sorted.length; i++) {
            if (i == 0 || sorted[i] != sorted[i - 1]) {
                sorted[distinct++] = sorted[i];
            }
        }
        return Arrays.copyOf(sorted, distinct);
    }
}
