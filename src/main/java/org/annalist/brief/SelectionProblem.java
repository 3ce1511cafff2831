package org.annalist.brief;

import java.util.List;
import java.util.Objects;
import org.annalist.ingest.DataProblem;
import org.annalist.ingest.ReadResult;
import org.annalist.series.Series;

/**
 * A job's series cannot be selected from its file: what is wrong, as facts. The selection step is
 * shared, but each front end words the problem in its own terms — the command line names its
 * options ({@code --series}), a spec its keys and the brief's line — so the words are left to them
 * ({@code cli}'s messages, {@link BatchPlan} for specs).
 */
public final class SelectionProblem extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** What went wrong. */
    public sealed interface Reason permits SeveralSeries, NoSuchSeries, NoSuchPeriod, NotPerDay {

        /** A plain wording, for a front end that has none of its own. */
        String plainly();
    }

    /**
     * The job names no series and the file holds several.
     *
     * @param derived the ratios the file offers besides
     */
    public record SeveralSeries(ReadResult read, List<DerivedSeries.Derived> derived) implements Reason {
        @Override
        public String plainly() {
            return read.file() + ": holds " + read.series().size() + " series; expected one of " + read.names();
        }
    }

    /** No series (nor derived ratio) of the file has the name asked for. */
    public record NoSuchSeries(ReadResult read, String name) implements Reason {
        @Override
        public String plainly() {
            return read.file() + ": no series named '" + name + "'; expected one of " + read.names();
        }
    }

    /**
     * The series does not span the latest period asked for.
     *
     * @param asked   the name as the job wrote it
     * @param series  the series found under that name, as prepared before the cut
     * @param derived the series is a ratio derived from the file's series
     */
    public record NoSuchPeriod(ReadResult read, String asked, Series series, String period, boolean derived)
            implements Reason {

        /** The problem as a brief reports it: at the file, with the period written as expected. */
        public DataProblem atTheFile() {
            return new DataProblem(read.file(), 0, 0, "series '" + series.name() + "' has no period " + period
                    + "; expected a period from " + series.start() + " to " + series.end() + ", written as "
                    + series.start());
        }

        @Override
        public String plainly() {
            return read.file() + ": series '" + series.name() + "' has no period " + period
                    + "; expected a period from " + series.start() + " to " + series.end();
        }
    }

    /**
     * Per-day figures were asked for a series whose periods all have the same length.
     *
     * @param why the analysis' own explanation
     */
    public record NotPerDay(Series series, String why) implements Reason {
        @Override
        public String plainly() {
            return "series '" + series.name() + "': " + why;
        }
    }

    private final transient Reason reason;

    public SelectionProblem(Reason reason) {
        super(Objects.requireNonNull(reason, "reason").plainly());
        this.reason = reason;
    }

    public Reason reason() {
        return reason;
    }
}
