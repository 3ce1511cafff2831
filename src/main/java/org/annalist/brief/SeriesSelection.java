package org.annalist.brief;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.findings.RatioParts;
import org.annalist.narrative.SeriesNames;
import org.annalist.narrative.SourceFacts;
import org.annalist.series.PeriodLength;
import org.annalist.ingest.ReadResult;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * The selection step, the same for every command and every spec: which series of a file a job
 * analyses, and the series as the analysis should see it. A name is looked up among the file's
 * series (exactly, then ignoring case) and then among the ratios derived from them; a series of the
 * file gets the unit the job sets for it, then per-day figures when asked, and is then cut at the
 * latest period. A derived ratio is only cut: its spans are ratios of its parts' sums, which
 * per-day figures or another unit would not change.
 */
public final class SeriesSelection {

    /**
     * A series ready for the analysis.
     *
     * @param asked  the name the job gave for it (the series' own name when it named none)
     * @param series the series, prepared and cut
     * @param parts  for a derived ratio, the series its spans are computed from
     * @param cut    where the series was cut short of the file's end at the job's latest period, if it was
     */
    public record Selected(String asked, Series series, Optional<RatioParts> parts, Optional<SourceFacts.Cut> cut) {

        /** The series is a ratio derived from two of the file's series. */
        public boolean derived() {
            return parts.isPresent();
        }

        /** The latest period, as output names write it. */
        String latestPeriod() {
            return series.end().toString();
        }
    }

    /** One series to select: a name the job gave, or a series of the file taken without a name. */
    sealed interface Wanted permits ByName, Taken {
    }

    /** A name the job gave. */
    record ByName(String name) implements Wanted {
    }

    /** A series (of the file, or derived from it) the job takes because it named none. */
    record Taken(Series series, Optional<RatioParts> parts) implements Wanted {
    }

    private SeriesSelection() {
    }

    /**
     * The series a job wants from a file, in order: the names it gives, or, when it gives none,
     * what its {@link SeriesChoice.WhenUnnamed} rule takes.
     *
     * @throws SelectionProblem with {@link SelectionProblem.SeveralSeries} when the job wants the
     *                          file's only series and the file holds several
     */
    static List<Wanted> wanted(SeriesChoice choice, SeriesFiles.ReadFile file) {
        if (!choice.names().isEmpty()) {
            return choice.names().stream().<Wanted>map(ByName::new).toList();
        }
        ReadResult read = file.read();
        List<Wanted> wanted = new ArrayList<>();
        switch (choice.whenUnnamed()) {
            case THE_ONLY_SERIES -> {
                if (read.series().size() > 1) {
                    throw new SelectionProblem(new SelectionProblem.SeveralSeries(read, file.derived()));
                }
                wanted.add(new Taken(read.series().get(0), Optional.empty()));
            }
            case EVERY_SERIES -> read.series().forEach(s -> wanted.add(new Taken(s, Optional.empty())));
            case EVERY_SERIES_AND_RATIOS -> {
                read.series().forEach(s -> wanted.add(new Taken(s, Optional.empty())));
                file.derived().forEach(d -> wanted.add(new Taken(d.series(), Optional.of(d.parts()))));
            }
        }
        return wanted;
    }

    /**
     * Every series a job wants, selected; the first that cannot be stops the selection.
     *
     * @param ratiosByName whether a name may be that of a derived ratio (not in a combined brief,
     *                     whose comparisons are of the file's own series)
     * @throws SelectionProblem naming what is wrong
     */
    static List<Selected> all(Job job, SeriesFiles.ReadFile file, boolean ratiosByName) {
        return wanted(job.series(), file).stream().map(w -> select(job, file, w, ratiosByName)).toList();
    }

    /**
     * One series a job wants, selected and prepared.
     *
     * @throws SelectionProblem when the name is not in the file, per-day figures do not apply, or
     *                          the series does not span the latest period
     */
    static Selected select(Job job, SeriesFiles.ReadFile file, Wanted wanted, boolean ratiosByName) {
        ReadResult read = file.read();
        if (wanted instanceof Taken taken) {
            return taken.parts().isPresent() ? ratio(job, read, taken.series().name(), taken.series(), taken.parts().get())
                    : ofFile(job, read, taken.series().name(), taken.series());
        }
        String name = ((ByName) wanted).name();
        Optional<Series> found = read.find(name);
        if (found.isPresent()) {
            return ofFile(job, read, name, found.get());
        }
        Optional<DerivedSeries.Derived> ratio = !ratiosByName ? Optional.empty() : file.derived().stream()
                .filter(d -> d.series().name().equalsIgnoreCase(name)).findFirst();
        if (ratio.isEmpty()) {
            throw new SelectionProblem(new SelectionProblem.NoSuchSeries(read, name));
        }
        return ratio(job, read, name, ratio.get().series(), ratio.get().parts());
    }

    private static Selected ofFile(Job job, ReadResult read, String asked, Series series) {
        SeriesChoice choice = job.series();
        Series prepared = series;
        Optional<String> unit = read.keys().lookUp(choice.units(), series.name());
        if (unit.isPresent()) {
            prepared = prepared.renamed(series.name(), unit.get());
        }
        if (job.analysis().perDay()) {
            try {
                prepared = PeriodLength.perAveragePeriod(prepared,
                        SeriesNames.perAveragePeriod(prepared.unit(), prepared.frequency()));
            } catch (IllegalArgumentException e) {
                throw new SelectionProblem(new SelectionProblem.NotPerDay(prepared, e.getMessage()));
            }
        }
        Series cut = cut(prepared, choice, read, asked, false);
        return new Selected(asked, cut, Optional.empty(), leftOut(prepared, cut));
    }

    private static Selected ratio(Job job, ReadResult read, String asked, Series ratio, RatioParts parts) {
        Series cut = cut(ratio, job.series(), read, asked, true);
        return new Selected(asked, cut, Optional.of(parts), leftOut(ratio, cut));
    }

    /** What cutting {@code whole} to {@code cut} left out: its later periods with a value; empty when none. */
    private static Optional<SourceFacts.Cut> leftOut(Series whole, Series cut) {
        int later = 0;
        Period last = null;
        for (int i = cut.size(); i < whole.size(); i++) {
            if (!whole.isMissing(i)) {
                later++;
                last = whole.period(i);
            }
        }
        return later == 0 ? Optional.empty() : Optional.of(new SourceFacts.Cut(cut.end(), later, last));
    }

    /** The series up to the latest period the job names, when it names one. */
    private static Series cut(Series series, SeriesChoice choice, ReadResult read, String asked, boolean derived) {
        if (choice.latestPeriod().isEmpty()) {
            return series;
        }
        String label = choice.latestPeriod().get();
        Optional<Period> at = series.periodLabelled(label);
        if (at.isEmpty()) {
            throw new SelectionProblem(new SelectionProblem.NoSuchPeriod(read, asked, series, label, derived));
        }
        return series.upTo(at.get());
    }
}
