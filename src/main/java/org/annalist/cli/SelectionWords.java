package org.annalist.cli;

import org.annalist.brief.SelectionProblem;
import org.annalist.ingest.DataProblem;
import org.annalist.ingest.DataProblemException;

/**
 * A selection problem in the command line's terms: its options by name ({@code --series},
 * {@code --per-day}). {@code analyze} and {@code brief} have always worded a missing period
 * differently (a brief adds how periods are written), and still do.
 */
final class SelectionWords {

    private SelectionWords() {
    }

    /** As {@code analyze} reports it. */
    static RuntimeException forAnalyze(SelectionProblem problem) {
        if (problem.reason() instanceof SelectionProblem.NoSuchPeriod missing) {
            return new UserInputException(missing.read().file() + ": series '" + missing.series().name()
                    + "' has no period " + missing.period() + "; expected a period from " + missing.series().start()
                    + " to " + missing.series().end());
        }
        return common(problem);
    }

    /** As {@code brief} and {@code demo} report it. */
    static RuntimeException forBrief(SelectionProblem problem) {
        if (problem.reason() instanceof SelectionProblem.NoSuchPeriod missing) {
            return new DataProblemException(missing.atTheFile());
        }
        return common(problem);
    }

    private static RuntimeException common(SelectionProblem problem) {
        SelectionProblem.Reason reason = problem.reason();
        if (reason instanceof SelectionProblem.NoSuchSeries none) {
            return new DataProblemException(new DataProblem(none.read().file(), 0, 0, "no series named '" + none.name()
                    + "'; expected one of " + none.read().names()));
        }
        if (reason instanceof SelectionProblem.SeveralSeries several) {
            String derived = several.derived().isEmpty() ? "" : ", or a derived " + String.join(", ",
                    several.derived().stream().map(d -> "'" + d.series().name() + "'").toList());
            return new DataProblemException(new DataProblem(several.read().file(), 0, 0, "holds "
                    + several.read().series().size() + " series; expected --series with one of "
                    + several.read().names() + derived));
        }
        if (reason instanceof SelectionProblem.NotPerDay notPerDay) {
            return new UserInputException("--per-day: " + notPerDay.why());
        }
        return problem;
    }
}
