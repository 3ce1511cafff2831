package org.annalist.ingest;

import java.time.DayOfWeek;
import java.time.LocalDate;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.annalist.series.Frequency;
import org.annalist.series.Period;

/**
 * Settles the period column as a whole: one frequency for the file, the day/month order of
 * {@code a/b/yyyy} dates, and the frequency of dated rows (daily, business-daily, weekly, monthly,
 * quarterly or annual, from the spacing of the dates).
 */
final class PeriodColumn {

    /** A cell of the period column where it stands in the file. */
    record Cell(int line, int column, String text) {
    }

    /**
     * @param periods   the period of each cell, in the order given (null where the cell was unusable, which
     *                  the log reports as an error)
     * @param format    the format as written, e.g. {@code YYYY-MM}
     * @param dateOrder how {@code a/b/yyyy} dates were read, or null when there were none
     */
    record Resolved(List<Period> periods, Frequency frequency, String format, DateOrder dateOrder) {
    }

    /** Share of the span's periods that must carry a date for a day/month reading to count as regular. */
    private static final double REGULAR_COVERAGE = 0.5;

    private PeriodColumn() {
    }

    static Resolved resolve(List<Cell> cells, DateOrder requestedOrder, ProblemLog log) {
        CompactLists.ParsedList parsed = new CompactLists.ParsedList(cells.size());
        for (int i = 0; i < cells.size(); i++) {
            Cell cell = cells.get(i);
            Optional<PeriodCells.Parsed> p = PeriodCells.parse(cell.text());
            if (p.isEmpty()) {
                log.error(cell.line(), cell.column(), PeriodCells.describeFailure(cell.text())
                        + "; expected a date or period such as 2024-03, 2024-Q1 or 2024-03-01");
            }
            parsed.set(i, p.orElse(null));
        }
        String format = parsed.stream().filter(p -> p != null).map(PeriodCells.Parsed::format).distinct()
                .collect(Collectors.joining(", "));
        dropMixedKinds(cells, parsed, log);
        if (parsed.stream().allMatch(p -> p == null)) {
            log.throwIfErrors();
        }
        boolean dated = parsed.stream().anyMatch(p -> p != null && !(p instanceof PeriodCells.Fixed));
        if (!dated) {
            PeriodCells.Fixed firstFixed = (PeriodCells.Fixed) parsed.stream().filter(p -> p != null).findFirst().orElseThrow();
            Frequency frequency = firstFixed.period().frequency();
            CompactLists.PeriodList periods = new CompactLists.PeriodList(frequency, cells.size());
            for (int i = 0; i < cells.size(); i++) {
                PeriodCells.Parsed p = parsed.get(i);
                periods.set(i, p == null ? null : ((PeriodCells.Fixed) p).period());
            }
            return new Resolved(periods, frequency, format, null);
        }
        DateOrder order = parsed.stream().anyMatch(p -> p instanceof PeriodCells.AmbiguousDay)
                ? settleOrder(cells, parsed, requestedOrder, log) : null;
        CompactLists.DateList dates = new CompactLists.DateList(cells.size());
        for (int i = 0; i < cells.size(); i++) {
            PeriodCells.Parsed p = parsed.get(i);
            Optional<LocalDate> date = p == null ? Optional.empty()
                    : p instanceof PeriodCells.AmbiguousDay a ? a.as(order) : Optional.of(((PeriodCells.Day) p).date());
            if (p != null && date.isEmpty()) {
                log.error(cells.get(i).line(), cells.get(i).column(), "'" + cells.get(i).text()
                        + "' is not a date when read " + describe(order) + "; expected the same day/month order in every row");
            }
            dates.set(i, date.orElse(null));
        }
        long[] distinct = dates.distinctSorted();
        Frequency frequency = frequencyOfDays(distinct).orElseThrow(() -> log.fatal(cells.get(0).line(), cells.get(0).column(),
                spacingMessage(distinct.length)));
        CompactLists.PeriodList periods = new CompactLists.PeriodList(frequency, cells.size());
        for (int i = 0; i < cells.size(); i++) {
            LocalDate d = dates.get(i);
            periods.set(i, d == null ? null : Period.containing(frequency, d));
        }
        String settledFormat = order == null ? format
                : format.replace("NN/NN", order == DateOrder.MONTH_FIRST ? "MM/DD" : "DD/MM")
                        .replace("NN-NN", order == DateOrder.MONTH_FIRST ? "MM-DD" : "DD-MM");
        return new Resolved(periods, frequency, settledFormat, order);
    }

    /**
     * The frequency that the spacing of the dates shows: the median gap between consecutive dates
     * picks the calendar, and dates that never fall on a weekend over at least two weeks make the
     * calendar business-daily.
     */
    static Optional<Frequency> frequencyOfDates(TreeSet<LocalDate> dates) {
        return frequencyOfDays(dates.stream().mapToLong(LocalDate::toEpochDay).toArray());
    }

    /** As {@link #frequencyOfDates}, for distinct epoch days in increasing order. */
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

    /** Reports the rows whose frequency differs from most rows' and sets them aside (null). */
    private static void dropMixedKinds(List<Cell> cells, List<PeriodCells.Parsed> parsed, ProblemLog log) {
        Map<String, Integer> byKind = new java.util.LinkedHashMap<>();
        for (PeriodCells.Parsed p : parsed) {
            if (p != null) {
                byKind.merge(kindOf(p), 1, Integer::sum);
            }
        }
        if (byKind.size() <= 1) {
            return;
        }
        String majority = byKind.entrySet().stream().max(Map.Entry.comparingByValue()).orElseThrow().getKey();
        for (String kind : byKind.keySet()) {
            if (kind.equals(majority)) {
                continue;
            }
            for (int i = 0; i < parsed.size(); i++) {
                PeriodCells.Parsed p = parsed.get(i);
                if (p != null && kindOf(p).equals(kind)) {
                    parsed.set(i, null);
                    log.error(cells.get(i).line(), cells.get(i).column(), "mixed frequencies: '" + cells.get(i).text()
                            + "' is " + article(kind) + " period while most rows are " + majority
                            + "; expected one frequency per file");
                }
            }
        }
    }

    private static String kindOf(PeriodCells.Parsed p) {
        return p instanceof PeriodCells.Fixed f ? f.period().frequency().label() : "dated";
    }

    private static DateOrder settleOrder(List<Cell> cells, List<PeriodCells.Parsed> parsed, DateOrder requested,
                                         ProblemLog log) {
        if (requested != DateOrder.AUTO) {
            return requested;
        }
        Map<DateOrder, Integer> firstImpossible = new EnumMap<>(DateOrder.class);
        for (DateOrder order : List.of(DateOrder.DAY_FIRST, DateOrder.MONTH_FIRST)) {
            for (int i = 0; i < parsed.size(); i++) {
                if (parsed.get(i) instanceof PeriodCells.AmbiguousDay a && a.as(order).isEmpty()) {
                    firstImpossible.put(order, i);
                    break;
                }
            }
        }
        boolean dayFirstFits = !firstImpossible.containsKey(DateOrder.DAY_FIRST);
        boolean monthFirstFits = !firstImpossible.containsKey(DateOrder.MONTH_FIRST);
        if (dayFirstFits != monthFirstFits) {
            DateOrder chosen = dayFirstFits ? DateOrder.DAY_FIRST : DateOrder.MONTH_FIRST;
            Cell proof = cells.get(firstImpossible.get(chosen == DateOrder.DAY_FIRST ? DateOrder.MONTH_FIRST : DateOrder.DAY_FIRST));
            log.warn(proof.line(), proof.column(), "dates read " + describe(chosen) + ", because '" + proof.text()
                    + "' is no date the other way round");
            return chosen;
        }
        if (!dayFirstFits) {
            Cell bad = cells.get(firstImpossible.get(DateOrder.DAY_FIRST));
            Cell other = cells.get(firstImpossible.get(DateOrder.MONTH_FIRST));
            throw log.fatal(bad.line(), bad.column(), "'" + bad.text() + "' needs month first but '" + other.text()
                    + "' (line " + other.line() + ") needs day first; expected one day/month order in the file");
        }
        boolean dayFirstRegular = regular(parsed, DateOrder.DAY_FIRST);
        boolean monthFirstRegular = regular(parsed, DateOrder.MONTH_FIRST);
        if (dayFirstRegular != monthFirstRegular) {
            DateOrder chosen = dayFirstRegular ? DateOrder.DAY_FIRST : DateOrder.MONTH_FIRST;
            log.warn(cells.get(0).line(), cells.get(0).column(), "dates read " + describe(chosen)
                    + ", because only that reading gives evenly spaced dates; set --date-order if that is wrong");
            return chosen;
        }
        throw log.fatal(cells.get(0).line(), cells.get(0).column(), "cannot tell whether '" + cells.get(0).text()
                + "' is day/month/year or month/day/year: every date reads both ways; "
                + "expected --date-order day-first or --date-order month-first");
    }

    /** True when reading the dates in {@code order} gives a calendar without large holes. */
    private static boolean regular(List<PeriodCells.Parsed> parsed, DateOrder order) {
        long[] days = new long[parsed.size()];
        int n = 0;
        for (PeriodCells.Parsed p : parsed) {
            if (p == null) {
                continue;
            }
            days[n++] = (p instanceof PeriodCells.AmbiguousDay a ? a.as(order).orElseThrow() : ((PeriodCells.Day) p).date())
                    .toEpochDay();
        }
        long[] distinct = CompactLists.distinctSorted(Arrays.copyOf(days, n));
        Optional<Frequency> frequency = frequencyOfDays(distinct);
        if (frequency.isEmpty()) {
            return false;
        }
        Period first = Period.containing(frequency.get(), LocalDate.ofEpochDay(distinct[0]));
        Period last = Period.containing(frequency.get(), LocalDate.ofEpochDay(distinct[distinct.length - 1]));
        long[] periods = Arrays.stream(distinct).map(d -> Period.containing(frequency.get(), LocalDate.ofEpochDay(d)).index())
                .toArray();
        long distinctPeriods = CompactLists.distinctSorted(periods).length;
        return distinctPeriods == distinct.length && distinctPeriods >= REGULAR_COVERAGE * (first.until(last) + 1);
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
