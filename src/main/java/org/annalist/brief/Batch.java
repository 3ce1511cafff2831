package org.annalist.brief;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Consumer;
import org.annalist.analysis.indicators.LatestIndicators;
import org.annalist.findings.Analyst;
import org.annalist.ingest.DataProblem;
import org.annalist.ingest.DataProblemException;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.ReadResult;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.series.Series;

/**
 * Runs the briefs of a spec: first a plan, serially (each data file read once, each series and
 * output decided, outputs written twice refused), then the briefs on a bounded pool. A brief that
 * fails — a bad file, a missing series, a broken template — is reported with its reason and does
 * not stop the others. The outcomes come back in the spec's order whatever the pool's order was,
 * and each brief's bytes depend only on its inputs, so a parallel run writes what a serial one does.
 */
public final class Batch {

    /**
     * One brief of the batch, planned.
     *
     * @param label    {@code spec.yaml:3 Total}: where it comes from, for the summary
     * @param failure  why it cannot be made, when the plan already knows
     */
    record Job(String label, BriefSpec.Entry entry, ReadResult read, Series series, Path output,
               Optional<String> failure) {
    }

    /** @param file the brief written; empty when it failed, with the reason in {@code failure} */
    public record Outcome(String label, Optional<Path> file, Optional<String> failure) {
        public boolean done() {
            return file.isPresent();
        }
    }

    private Batch() {
    }

    /**
     * @param threads  the pool's size (1 runs serially)
     * @param finished told of each outcome as it comes (from the pool's threads)
     */
    public static List<Outcome> run(BriefSpec spec, int threads, Consumer<Outcome> finished) {
        List<Job> jobs = plan(spec);
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, Math.min(threads, jobs.size())));
        try {
            List<Future<Outcome>> futures = new ArrayList<>();
            for (Job job : jobs) {
                futures.add(pool.submit(() -> {
                    Outcome outcome = make(job);
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

    static List<Job> plan(BriefSpec spec) {
        List<Job> jobs = new ArrayList<>();
        Map<Path, ReadResult> reads = new HashMap<>();
        Map<Path, String> outputs = new HashMap<>();
        String specName = spec.file().getFileName().toString();
        for (BriefSpec.Entry entry : spec.briefs()) {
            String where = entry.line() > 0 ? specName + ":" + entry.line() : entry.data().getFileName().toString();
            ReadResult read;
            try {
                read = reads.computeIfAbsent(entry.data(), p -> new SeriesFileReader(ReadOptions.defaults()).read(p));
            } catch (DataProblemException e) {
                jobs.add(new Job(where + " " + entry.data().getFileName(), entry, null, null, null,
                        Optional.of(reasons(e))));
                continue;
            }
            List<String> names = !entry.series().isEmpty() ? entry.series()
                    : read.series().size() == 1 || entry.everySeries()
                    ? read.series().stream().map(Series::name).toList() : List.of();
            if (names.isEmpty()) {
                jobs.add(new Job(where, entry, read, null, null, Optional.of(entry.data().getFileName()
                        + " holds several series (" + read.names() + "); name the ones to brief under 'series'")));
            }
            for (String name : names) {
                String label = where + " " + name;
                Optional<Series> found = read.find(name);
                if (found.isEmpty()) {
                    jobs.add(new Job(label, entry, read, null, null, Optional.of("no series named '" + name + "' in "
                            + entry.data().getFileName() + "; expected one of " + read.names())));
                    continue;
                }
                Series series = found.get();
                if (entry.units().containsKey(series.name())) {
                    series = series.renamed(series.name(), entry.units().get(series.name()));
                }
                Optional<String> cutFailure = Optional.empty();
                String latest;
                if (entry.period().isPresent()) {
                    latest = entry.period().get();
                    Optional<org.annalist.series.Period> at = series.periodLabelled(latest);
                    if (at.isPresent()) {
                        series = series.upTo(at.get());
                    } else {
                        cutFailure = Optional.of("series '" + name + "' has no period " + latest);
                    }
                } else {
                    latest = series.end().toString();
                }
                Path output = entry.outputFor(series.name(), latest);
                String earlier = outputs.putIfAbsent(output, label);
                if (earlier != null && cutFailure.isEmpty()) {
                    cutFailure = Optional.of("writes " + output + ", as " + earlier + " does; put {series} or {period} "
                            + "in 'output'");
                }
                jobs.add(new Job(label, entry, read, series, output, cutFailure));
            }
        }
        return jobs;
    }

    private static Outcome make(Job job) {
        if (job.failure().isPresent()) {
            return new Outcome(job.label(), Optional.empty(), job.failure());
        }
        BriefSpec.Entry e = job.entry();
        Optional<LatestIndicators.Measure> measure = Optional.ofNullable(e.measures().get(job.series().name()))
                .map(m -> m.equals("flow") ? LatestIndicators.Measure.FLOW : LatestIndicators.Measure.LEVEL);
        BriefPipeline pipeline = new BriefPipeline(new Analyst(Optional.empty(), measure, List.of(), e.horizon()),
                s -> s);
        String title = e.title().isEmpty() ? "" : e.series().size() > 1 ? e.title() + ": " + job.series().name()
                : e.title();
        BriefRequest request = new BriefRequest(e.data(), ReadOptions.defaults(), Optional.of(job.series().name()),
                job.output(), title, e.organisation(), e.templates(),
                e.generatedAt().orElseGet(() -> GenerationTime.resolve(Optional.empty(), System.getenv(),
                        java.time.Instant.now())), e.paper(), e.period());
        try {
            BriefPipeline.Brief brief = pipeline.make(request, job.read(), job.series());
            SideOutputs.write(brief, job.series(), e.sideOutputs());
            return new Outcome(job.label(), Optional.of(brief.file()), Optional.empty());
        } catch (DataProblemException ex) {
            return new Outcome(job.label(), Optional.empty(), Optional.of(reasons(ex)));
        } catch (RuntimeException ex) {
            // isolate the failure: the other briefs go on; the summary names what went wrong
            return new Outcome(job.label(), Optional.empty(), Optional.of(ex.getMessage() == null
                    ? ex.getClass().getSimpleName() : ex.getMessage()));
        }
    }

    private static String reasons(DataProblemException e) {
        return String.join("; ", e.problems().stream().map(DataProblem::toString).toList());
    }
}
