package org.annalist.ingest;

import java.time.DayOfWeek;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.series.SeriesBuilder;
import org.annalist.series.ValueFlag;

/**
 * Aggregates a series to a coarser calendar that its periods nest in (days to weeks, months,
 * quarters or years; months to quarters or years; quarters to years).
 *
 * <p>A total or mean over part of a period would mislead, so: a coarse period at either end that
 * the data cover only in part is left out, and one inside the span with a missing fine value is
 * itself missing. Both are reported as warnings. Flags of the fine values carry over to the
 * coarse value they enter.
 */
final class Aggregator {

    private Aggregator() {
    }

    /** Every series aggregated to {@code to}, or the series as they are when no aggregation was asked for. */
    static List<Series> aggregateAll(List<Series> series, java.util.Optional<Aggregation> to, ProblemLog log) {
        return to.isEmpty() ? series : series.stream().map(s -> aggregate(s, to.get(), log)).toList();
    }

    static Series aggregate(Series series, Aggregation to, ProblemLog log) {
        Frequency from = series.frequency();
        if (from == to.target()) {
            return series;
        }
        if (!from.nestsIn(to.target())) {
            throw log.fatal(0, 0, "cannot aggregate " + from + " data to " + to.target() + " (a "
                    + (from == Frequency.WEEKLY ? "week can straddle two months" : from + " period does not fit inside a "
                    + to.target() + " one") + "); expected a coarser calendar that the periods nest in");
        }
        SeriesBuilder builder = Series.builder(series.name(), to.target()).unit(series.unit());
        Period first = Period.containing(to.target(), series.start().startDate());
        Period last = Period.containing(to.target(), series.end().startDate());
        List<String> incomplete = new ArrayList<>();
        List<String> withGaps = new ArrayList<>();
        for (Period coarse = first; coarse.compareTo(last) <= 0; coarse = coarse.plus(1)) {
            List<Period> parts = finePeriods(from, coarse);
            double total = 0;
            int present = 0;
            int inSpan = 0;
            EnumSet<ValueFlag> flags = EnumSet.noneOf(ValueFlag.class);
            for (Period part : parts) {
                int i = series.indexOf(part);
                if (i < 0) {
                    continue;
                }
                inSpan++;
                if (!series.isMissing(i)) {
                    total += series.value(i);
                    present++;
                    flags.addAll(series.flags(i));
                }
            }
            if (inSpan < parts.size()) {
                incomplete.add(coarse.label());
                continue;
            }
            if (present < parts.size()) {
                withGaps.add(coarse.label());
                builder.put(coarse, Double.NaN, Set.of());
                continue;
            }
            builder.put(coarse, to.method() == Aggregation.Method.SUM ? total : total / present, Set.copyOf(flags));
        }
        if (!incomplete.isEmpty()) {
            log.warn(0, 0, "series '" + series.name() + "': left out " + String.join(", ", incomplete)
                    + ", which the data cover only in part");
        }
        if (!withGaps.isEmpty()) {
            log.warn(0, 0, "series '" + series.name() + "': " + String.join(", ", withGaps)
                    + " set to missing, since some of its " + from + " values are missing");
        }
        if (builder.isEmpty()) {
            throw log.fatal(0, 0, "series '" + series.name() + "' does not cover one whole " + to.target()
                    + " period; expected data for at least one complete period to aggregate");
        }
        return builder.snapshot();
    }

    /** The periods of {@code fine} frequency that make up {@code coarse}. */
    private static List<Period> finePeriods(Frequency fine, Period coarse) {
        List<Period> parts = new ArrayList<>();
        if (fine == Frequency.DAILY || fine == Frequency.BUSINESS_DAILY) {
            for (LocalDate d = coarse.startDate(); !d.isAfter(coarse.endDate()); d = d.plusDays(1)) {
                boolean weekend = d.getDayOfWeek() == DayOfWeek.SATURDAY || d.getDayOfWeek() == DayOfWeek.SUNDAY;
                if (fine == Frequency.DAILY || !weekend) {
                    parts.add(Period.containing(fine, d));
                }
            }
            return parts;
        }
        Period part = Period.containing(fine, coarse.startDate());
        while (!part.startDate().isAfter(coarse.endDate())) {
            parts.add(part);
            part = part.plus(1);
        }
        return parts;
    }
}
