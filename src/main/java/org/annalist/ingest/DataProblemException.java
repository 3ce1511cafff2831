package org.annalist.ingest;

import java.util.List;
import java.util.stream.Collectors;

/**
 * The input cannot be used as it stands. Carries every problem found in the file, not only the
 * first, so that the user can mend them in one pass.
 */
public final class DataProblemException extends RuntimeException {

    private static final long serialVersionUID = 1L;
    private final transient List<DataProblem> problems;

    public DataProblemException(List<DataProblem> problems) {
        super(problems.stream().map(DataProblem::toString).collect(Collectors.joining("\n")));
        if (problems.isEmpty()) {
            throw new IllegalArgumentException("at least one problem is required");
        }
        this.problems = List.copyOf(problems);
    }

    public DataProblemException(DataProblem problem) {
        this(List.of(problem));
    }

    public List<DataProblem> problems() {
        return problems;
    }
}
