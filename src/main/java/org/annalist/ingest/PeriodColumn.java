package org.annalist.ingest;

import java.time.DayOfWeek;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.LongConsumer;
import org.annalist.series.Frequency;
import org.annalist.series.Period;

/**
 * Settles the period column as a whole: one frequency for the file, the day/month order of
 * {@code a/b/yyyy} dates, and the frequency of dated rows (daily, business-daily, weekly, monthly,
 * quarterly or annual, from the spacing of the dates).
 *
 * <p>The cells arrive one at a time as the file is read ({@link #key}): each becomes a {@code long}
 * key (what the cell says, before the column as a whole decides), kept by the caller in primitive
 * arrays. Only what the messages need is kept here: the first cells of each kind, with their text.
 * Once the file is read, {@link #settle} decides, and {@link Settled#periodIndex} turns each key into
 * the index of its period.
 */
final class PeriodColumn {

    /** A key for a cell that states no usable period. */
    static final long NONE = Long.MIN_VALUE;

    /** A cell of the period column where it stands in the file. */
    record Cell(int line, int column, String text) {
    }

    /** Share of the span's periods that must carry a date for a day/month reading to count as regular. */
    private static final double REGULAR_COVERAGE = 0.5;
    /** Cells kept with their text per kind of message: the problem log shows no more errors than this. */
    private static final int KEPT = 50;
    private static final int DAY = 1;
    private static final int AMBIGUOUS = 2;
    private static final int FIXED = 3;   // + the frequency's ordinal
    private static final String DATED = "dated";

    /** Some cells with their text, and how many there were in all. */
    private static final class Examples {
        final List<Cell> first = new ArrayList<>();
        final Frequency frequency;   // null for dated cells
        long count;

        Examples(Frequency frequency) {
            this.frequency = frequency;
        }

        void add(int line, int column, String text) {
            if (first.size() < KEPT) {
                first.add(new Cell(line, column, text));
            }
            count++;
        }
    }

    private final ProblemLog log;
    private final Map<String, Examples> byKind = new LinkedHashMap<>();
    private final LinkedHashSet<String> formats = new LinkedHashSet<>();
    private final Map<DateOrder, Examples> impossible = new EnumMap<>(DateOrder.class);
    private Cell firstCell;
    private long ambiguous;

    PeriodColumn(ProblemLog log) {
        this.log = log;
        impossible.put(DateOrder.DAY_FIRST, new Examples(null));
        impossible.put(DateOrder.MONTH_FIRST, new Examples(null));
    }

    /**
     * The key of one cell of the column, in the order of the file, given as {@link PeriodCells#parse}
     * read it; {@link #NONE} (and an error) when it states no period.
     */
    long key(int line, int column, String text, Optional<PeriodCells.Parsed> parsed) {
        if (firstCell == null) {
            firstCell = new Cell(line, column, text);
        }
        if (parsed.isEmpty()) {
            log.error(line, column, PeriodCells.describeFailure(text)
                    + "; expected a date or period such as 2024-03, 2024-Q1 or 2024-03-01");
            return NONE;
        }
        PeriodCells.Parsed p = parsed.get();
        formats.add(p.format());
        Examples kind = byKind.get(kindOf(p));
        if (kind == null) {
            kind = new Examples(p instanceof PeriodCells.Fixed f ? f.period().frequency() : null);
            byKind.put(kindOf(p), kind);
        }
        kind.add(line, column, text);
        if (p instanceof PeriodCells.Day d) {
            return pack(DAY, d.date().toEpochDay());
        }
        if (p instanceof PeriodCells.AmbiguousDay a) {
            ambiguous++;
            for (DateOrder order : impossible.keySet()) {
                if (a.as(order).isEmpty()) {
                    impossible.get(order).add(line, column, text);
                }
            }
            return pack(AMBIGUOUS, (a.first() & 0xFF) | ((long) (a.second() & 0xFF) << 8) | ((long) a.year() << 16));
        }
        PeriodCells.Fixed f = (PeriodCells.Fixed) p;
        return pack(FIXED + f.period().frequency().ordinal(), f.period().index());
    }

    /** The key of a period stated as such (a month of a year-by-month table). */
    static long keyOf(Period period) {
        return pack(FIXED + period.frequency().ordinal(), period.index());
    }

    /** The year that {@code key} falls in, or empty when it states none. */
    static java.util.OptionalInt yearOf(long key) {
        if (key == NONE) {
            return java.util.OptionalInt.empty();
        }
        long v = value(key);
        return switch (tag(key)) {
            case DAY -> java.util.OptionalInt.of(LocalDate.ofEpochDay(v).getYear());
            case AMBIGUOUS -> java.util.OptionalInt.of((int) (v >> 16));
            default -> java.util.OptionalInt.of(new Period(Frequency.values()[tag(key) - FIXED], v).year());
        };
    }

    /** The index of the period of a key made by {@link #keyOf}. */
    static long indexOf(long key) {
        return key == NONE ? NONE : value(key);
    }

    private static long pack(int tag, long value) {
        return ((long) tag << 56) | (value & 0x00FF_FFFF_FFFF_FFFFL);
    }

    private static int tag(long key) {
        return (int) (key >>> 56);
    }

    private static long value(long key) {
        return (key << 8) >> 8;
    }

    /** The epoch day of a dated key in {@code order}, or {@link #NONE} when the date is impossible that way. */
    private static long epochDay(long key, DateOrder order) {
        return tag(key) == DAY ? value(key) : date(key, order).map(LocalDate::toEpochDay).orElse(NONE);
    }

    private static Optional<LocalDate> date(long key, DateOrder order) {
        long v = value(key);
        if (tag(key) == DAY) {
            return Optional.of(LocalDate.ofEpochDay(v));
        }
        return new PeriodCells.AmbiguousDay((int) (v & 0xFF), (int) ((v >>> 8) & 0xFF), (int) (v >> 16), "").as(order);
    }

    /** Every key read, for the decisions that look at the column as a whole. */
    interface Keys {
        void forEach(LongConsumer each);
    }

    /**
     * What the column as a whole says.
     *
     * @param format    the format as written, e.g. {@code YYYY-MM}
     * @param dateOrder how {@code a/b/yyyy} dates were read, or null when there were none
     */
    record Settled(Frequency frequency, String format, DateOrder dateOrder, int keptTag) {

        /** The index of the period of {@code key}, or {@link #NONE} when the cell was set aside (an error says why). */
        long periodIndex(long key) {
            if (key == NONE) {
                return NONE;
            }
            int tag = tag(key);
            if (keptTag >= FIXED) {
                return tag == keptTag ? value(key) : NONE;
            }
            if (tag != DAY && tag != AMBIGUOUS) {
                return NONE;
            }
            long day = epochDay(key, dateOrder);
            if (day == NONE) {
                return NONE;
            }
            return frequency == Frequency.DAILY ? day : Period.containing(frequency, LocalDate.ofEpochDay(day)).index();
        }
    }

    /**
     * Decides the column, reporting what does not fit: cells of another frequency than most, dates
     * impossible in the day/month order, dates too unevenly spaced to have a frequency.
     */
    Settled settle(DateOrder requestedOrder, Keys keys) {
        String format = String.join(", ", formats);
        String majority = dropMixedKinds();
        if (majority == null) {
            log.throwIfErrors();
            throw log.fatal(0, 0, "no period in the column; expected a date or period such as 2024-03");
        }
        if (!majority.equals(DATED)) {
            Frequency frequency = byKind.get(majority).frequency;
            return new Settled(frequency, format, null, FIXED + frequency.ordinal());
        }
        DateOrder order = ambiguous > 0 ? settleOrder(requestedOrder, keys) : DateOrder.DAY_FIRST;
        if (ambiguous > 0) {
            Examples bad = impossible.get(order);
            for (Cell cell : bad.first) {
                log.error(cell.line(), cell.column(), "'" + cell.text() + "' is not a date when read " + describe(order)
                        + "; expected the same day/month order in every row");
            }
            log.moreErrors(bad.count - bad.first.size());
        }
        long[] distinct = distinctDays(keys, order);
        Frequency frequency = frequencyOfDays(distinct).orElseThrow(() -> log.fatal(firstCell.line(), firstCell.column(),
                spacingMessage(distinct.length)));
        String settledFormat = ambiguous == 0 ? format
                : format.replace("NN/NN", order == DateOrder.MONTH_FIRST ? "MM/DD" : "DD/MM")
                        .replace("NN-NN", order == DateOrder.MONTH_FIRST ? "MM-DD" : "DD-MM");
        return new Settled(frequency, settledFormat, ambiguous > 0 ? order : null, DAY);
    }

    /** The distinct dates of the keys in {@code order}, as epoch days in increasing order. */
    private static long[] distinctDays(Keys keys, DateOrder order) {
        long[][] days = {new long[1024]};
        int[] n = {0};
        keys.forEach(key -> {
            if (key == NONE || (tag(key) != DAY && tag(key) != AMBIGUOUS)) {
                return;
            }
            long day = epochDay(key, order);
            if (day != NONE) {
                if (n[0] == days[0].length) {
                    days[0] = Arrays.copyOf(days[0], days[0].length * 2);
                }
                days[0][n[0]++] = day;
            }
        });
        return distinctSorted(Arrays.copyOf(days[0], n[0]));
    }

    /** The distinct values in increasing order. */
    static long[] distinctSorted(long[] values) {
        long[] sorted = values.clone();
        Arrays.sort(sorted);
        int distinct = 0;
        for (int i = 0; i < sorted.length; i++) {
            if (i == 0 || sorted[i] != sorted[i - 1]) {
                sorted[distinct++] = sorted[i];
            }
        }
        return Arrays.copyOf(sorted, distinct);
    }

    /**
     * The frequency that the spacing of the dates shows: the median gap between consecutive dates
     * picks the calendar, and dates that never fall on a weekend over at least two weeks make the
     * calendar business-daily. {@code days}: distinct epoch days in increasing order.
     */
    private static Optional<Frequency> frequencyOfDays(long[] days) {
        if (days.length < 2) {
            return Optional.empty();
        }
        long[] gaps = new long[days.length - 1];
        for (int g = 0; g < gaps.length; g++) {
            gaps[g] = days[g + 1] - days[g];
        }
        Arrays.sort(gaps);
        long median = gaps[gaps.length / 2];
        if (median >= 360) {
            return Optional.of(Frequency.ANNUAL);
        } else if (median >= 178 && median <= 186) {
            return Optional.of(Frequency.HALF_YEARLY);
        } else if (median >= 85 && median <= 95) {
            return Optional.of(Frequency.QUARTERLY);
        } else if (median >= 27 && median <= 32) {
            return Optional.of(Frequency.MONTHLY);
        } else if (median == 7) {
            return Optional.of(Frequency.WEEKLY);
        } else if (median <= 3) {
            boolean weekendSeen = Arrays.stream(days).mapToObj(LocalDate::ofEpochDay).anyMatch(d -> d.getDayOfWeek()
                    == DayOfWeek.SATURDAY || d.getDayOfWeek() == DayOfWeek.SUNDAY);
            long spanDays = days[days.length - 1] - days[0] + 1;
            return Optional.of(!weekendSeen && spanDays >= 14 ? Frequency.BUSINESS_DAILY : Frequency.DAILY);
        }
        return Optional.empty();
    }

    /** Reports the cells whose frequency differs from most cells'; the kind most cells have, or null when none parsed. */
    private String dropMixedKinds() {
        if (byKind.isEmpty()) {
            return null;
        }
        String majority = byKind.entrySet().stream().max(Map.Entry.comparingByValue(
                (a, b) -> Long.compare(a.count, b.count))).orElseThrow().getKey();
        for (Map.Entry<String, Examples> kind : byKind.entrySet()) {
            if (kind.getKey().equals(majority)) {
                continue;
            }
            for (Cell cell : kind.getValue().first) {
                log.error(cell.line(), cell.column(), "mixed frequencies: '" + cell.text() + "' is "
                        + article(kind.getKey()) + " period while most rows are " + majority + "; expected one frequency per file");
            }
            log.moreErrors(kind.getValue().count - kind.getValue().first.size());
        }
        return majority;
    }

    private static String kindOf(PeriodCells.Parsed p) {
        return p instanceof PeriodCells.Fixed f ? f.period().frequency().label() : DATED;
    }

    private DateOrder settleOrder(DateOrder requested, Keys keys) {
        if (requested != DateOrder.AUTO) {
            return requested;
        }
        boolean dayFirstFits = impossible.get(DateOrder.DAY_FIRST).count == 0;
        boolean monthFirstFits = impossible.get(DateOrder.MONTH_FIRST).count == 0;
        if (dayFirstFits != monthFirstFits) {
            DateOrder chosen = dayFirstFits ? DateOrder.DAY_FIRST : DateOrder.MONTH_FIRST;
            Cell proof = impossible.get(chosen == DateOrder.DAY_FIRST ? DateOrder.MONTH_FIRST : DateOrder.DAY_FIRST).first.get(0);
            log.warn(proof.line(), proof.column(), "dates read " + describe(chosen) + ", because '" + proof.text()
                    + "' is no date the other way round");
            return chosen;
        }
        if (!dayFirstFits) {
            Cell bad = impossible.get(DateOrder.DAY_FIRST).first.get(0);
            Cell other = impossible.get(DateOrder.MONTH_FIRST).first.get(0);
            throw log.fatal(bad.line(), bad.column(), "'" + bad.text() + "' needs month first but '" + other.text()
                    + "' (" + log.where(other.line(), other.column()) + ") needs day first; expected one day/month order in the file");
        }
        boolean dayFirstRegular = regular(keys, DateOrder.DAY_FIRST);
        boolean monthFirstRegular = regular(keys, DateOrder.MONTH_FIRST);
        if (dayFirstRegular != monthFirstRegular) {
            DateOrder chosen = dayFirstRegular ? DateOrder.DAY_FIRST : DateOrder.MONTH_FIRST;
            log.warn(firstCell.line(), firstCell.column(), "dates read " + describe(chosen)
                    + ", because only that reading gives evenly spaced dates; set --date-order if that is wrong");
            return chosen;
        }
        throw log.fatal(firstCell.line(), firstCell.column(), "cannot tell whether '" + firstCell.text()
                + "' is day/month/year or month/day/year: every date reads both ways; "
                + "expected --date-order day-first or --date-order month-first");
    }

    /** True when reading the dates in {@code order} gives a calendar without large holes. */
    private static boolean regular(Keys keys, DateOrder order) {
        long[] distinct = distinctDays(keys, order);
        Optional<Frequency> frequency = frequencyOfDays(distinct);
        if (frequency.isEmpty()) {
            return false;
        }
        Period first = Period.containing(frequency.get(), LocalDate.ofEpochDay(distinct[0]));
        Period last = Period.containing(frequency.get(), LocalDate.ofEpochDay(distinct[distinct.length - 1]));
        long[] periods = Arrays.stream(distinct).map(d -> Period.containing(frequency.get(), LocalDate.ofEpochDay(d)).index())
                .toArray();
        long distinctPeriods = distinctSorted(periods).length;
        return distinctPeriods == distinct.length && distinctPeriods >= REGULAR_COVERAGE * (first.until(last) + 1);
    }

    /**
     * The frequency of a few cells (the first rows of a file), or empty when they do not settle one;
     * nothing is reported.
     */
    static Optional<Frequency> frequencyOf(List<Cell> cells, DateOrder order) {
        ProblemLog quiet = new ProblemLog("");
        PeriodColumn column = new PeriodColumn(quiet);
        long[] keys = new long[cells.size()];
        for (int i = 0; i < keys.length; i++) {
            keys[i] = column.key(cells.get(i).line(), cells.get(i).column(), cells.get(i).text(),
                    PeriodCells.parse(cells.get(i).text()));
        }
        try {
            return Optional.of(column.settle(order, each -> Arrays.stream(keys).forEach(each)).frequency());
        } catch (DataProblemException unsettled) {
            return Optional.empty();
        }
    }

    private static String describe(DateOrder order) {
        return order == DateOrder.MONTH_FIRST ? "month first (MM/DD/YYYY)" : "day first (DD/MM/YYYY)";
    }

    private static String article(String kind) {
        return kind.startsWith("a") ? "an " + kind : "a " + kind;
    }

    private static String spacingMessage(int distinctDates) {
        if (distinctDates < 2) {
            return "only one distinct date; expected at least two dates to tell the frequency";
        }
        return "the dates are unevenly spaced; expected daily, weekly, monthly, quarterly or annual dates";
    }
}
