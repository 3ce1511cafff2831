package org.annalist.serve;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.brief.Batch;

/**
 * A brief spec being run from the browser, as {@code batch} runs it: the outcomes as they come
 * (done, or failed with the reason {@code batch} gives), into the session's own folder.
 */
final class RoutineRun {

    private final String id;
    private final String spec;
    private final Path folder;
    private int total;
    private final List<Batch.Outcome> finished = new ArrayList<>();
    private List<Batch.Outcome> ordered = List.of();
    private boolean over;
    private Optional<String> problem = Optional.empty();

    RoutineRun(String id, String spec, Path folder, int total) {
        this.id = id;
        this.spec = spec;
        this.folder = folder;
        this.total = total;
    }

    String id() {
        return id;
    }

    String spec() {
        return spec;
    }

    Path folder() {
        return folder;
    }

    synchronized int total() {
        return total;
    }

    /** How many briefs the plan holds, once planned. */
    synchronized void planned(int briefs) {
        total = briefs;
    }

    synchronized void finished(Batch.Outcome outcome) {
        finished.add(outcome);
    }

    /** The run is over: its outcomes in the spec's order. */
    synchronized void over(List<Batch.Outcome> outcomes) {
        ordered = List.copyOf(outcomes);
        over = true;
    }

    /** The run stopped on a problem of its own (not of one brief). */
    synchronized void failed(String reason) {
        problem = Optional.of(reason);
        over = true;
    }

    synchronized boolean isOver() {
        return over;
    }

    synchronized int done() {
        return over && problem.isEmpty() ? ordered.size() : finished.size();
    }

    synchronized Optional<String> problem() {
        return problem;
    }

    /** What has finished: in the spec's order once over, else in the order they came. */
    synchronized List<Batch.Outcome> outcomes() {
        return over && problem.isEmpty() ? ordered : List.copyOf(finished);
    }

    /** The file names a finished run wrote into its folder, the only ones its downloads accept. */
    synchronized List<String> written() {
        List<String> names = new ArrayList<>();
        for (Batch.Outcome o : outcomes()) {
            o.file().ifPresent(f -> {
                Path p = f.toAbsolutePath().normalize();
                if (p.startsWith(folder.toAbsolutePath().normalize())) {
                    names.add(folder.toAbsolutePath().normalize().relativize(p).toString().replace('\\', '/'));
                }
            });
        }
        return names;
    }
}
