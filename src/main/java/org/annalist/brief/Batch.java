package org.annalist.brief;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Consumer;
import org.annalist.ingest.DataProblemException;

/**
 * Runs the briefs of a spec: first a {@link BatchPlan}, serially (each data file read once, each
 * series and output decided, outputs written twice refused), then the briefs on a bounded pool,
 * each through {@link BriefPipeline#make}. A brief that fails — a bad file, a missing series, a
 * broken template — is reported with its reason and does not stop the others. The outcomes come
 * back in the spec's order whatever the pool's order was, and each brief's bytes depend only on its
 * inputs, so a parallel run writes what a serial one does.
 */
public final class Batch {

    /** @param file the brief written; empty when it failed, with the reason in {@code failure} */
    public record Outcome(String label, Optional<Path> file, Optional<String> failure) {
        public boolean done() {
            return file.isPresent();
        }
    }

    private Batch() {
    }

    /**
     * Plans and makes the briefs of {@code spec}, reading its files afresh.
     *
     * @param threads  the pool's size (1 runs serially)
     * @param finished told of each outcome as it comes (from the pool's threads)
     */
    public static List<Outcome> run(BriefSpec spec, int threads, Consumer<Outcome> finished) {
        return run(BatchPlan.of(spec, new BriefPipeline()), threads, finished);
    }

    /** Makes the briefs of a plan; see {@link #run(BriefSpec, int, Consumer)}. */
    public static List<Outcome> run(BatchPlan plan, int threads, Consumer<Outcome> finished) {
        List<BatchPlan.Planned> briefs = plan.briefs();
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, Math.min(threads, briefs.size())));
        OldGenerationHeadroom headroom = OldGenerationHeadroom.ofThisJvm();
        try {
            List<Future<Outcome>> futures = new ArrayList<>();
            for (BatchPlan.Planned brief : briefs) {
                futures.add(pool.submit(() -> {
                    Outcome outcome = make(plan.pipeline(), brief);
                    headroom.afterBrief();
                    finished.accept(outcome);
                    return outcome;
                }));
            }
            List<Outcome> outcomes = new ArrayList<>();
            for (Future<Outcome> f : futures) {
                outcomes.add(f.get());
            }
            return outcomes;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("the batch was interrupted", e);
        } catch (ExecutionException e) {
            throw new IllegalStateException("a brief failed outside its own error handling", e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    private static Outcome make(BriefPipeline pipeline, BatchPlan.Planned brief) {
        if (brief.failure().isPresent()) {
            return new Outcome(brief.label(), Optional.empty(), brief.failure());
        }
        // resolved outside the brief's own error handling: a SOURCE_DATE_EPOCH that is not a time
        // is the whole run's mistake, not this brief's
        Instant generatedAt = GenerationTime.orDefault(brief.job().requireBrief().masthead().generatedAt());
        try {
            BriefPipeline.Made made = pipeline.make(brief.job(), brief.file(), brief.series(), brief.holidays(),
                    brief.output(), generatedAt);
            return new Outcome(brief.label(), Optional.of(made.file()), Optional.empty());
        } catch (DataProblemException ex) {
            return new Outcome(brief.label(), Optional.empty(), Optional.of(BatchPlan.reasons(ex)));
        } catch (RuntimeException ex) {
            // isolate the failure: the other briefs go on; the summary names what went wrong
            return new Outcome(brief.label(), Optional.empty(), Optional.of(oneLine(ex.getMessage() == null
                    ? ex.getClass().getSimpleName() : ex.getMessage())));
        } catch (Error ex) {
            // this brief's own failure (its stack and heap are released as it unwinds): recorded as
            // such, and the batch carries on to its summary
            return new Outcome(brief.label(), Optional.empty(), Optional.of("internal error: " + oneLine(ex.toString())));
        }
    }

    private static String oneLine(String message) {
        return message.replaceAll("\\s*\\R\\s*", " ");
    }
}
