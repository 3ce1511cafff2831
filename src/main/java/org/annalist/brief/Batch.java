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
import org.annalist.findings.Measure;
import org.annalist.findings.Analyst;
import org.annalist.findings.DerivedSeries;
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
     * @param derived  the series is a ratio of two of the file's series (average length of stay)
     */
    public record Job(String label, BriefSpec.Entry entry, ReadResult read, List<Series> series, Path output,
                      Optional<String> failure, boolean derived) {

        Job(String label, BriefSpec.Entry entry, ReadResult read, List<Series> series, Path output,
            Optional<String> failure) {
            this(label, entry, read, series, output, failure, false);
        }

        public Job {
            series = series == null ? List.of() : List.copyOf(series);
        }
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
        return run(plan(spec), threads, finished);
    }

    /** The briefs a spec makes, planned: one per series, or one per combined brief. */
    public record Plan(List<Job> jobs) {
        public Plan {
            jobs = List.copyOf(jobs);
        }

        public int size() {
            return jobs.size();
        }
    }

    public static List<Outcome> run(Plan plan, int threads, Consumer<Outcome> finished) {
        List<Job> jobs = plan.jobs();
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

    public static Plan plan(BriefSpec spec) {
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
            List<Series> prepared = new ArrayList<>();
            for (String name : names) {
                String label = where + " " + name;
                Optional<Series> found = read.find(name);
                Optional<DerivedSeries.Derived> ratio = found.isPresent() || entry.combined() ? Optional.empty()
                        : DerivedSeries.of(read.series()).stream()
                        .filter(d -> d.series().name().equalsIgnoreCase(name)).findFirst();
                if (ratio.isPresent()) {
                    Series r = ratio.get().series();
                    jobs.add(claim(new Job(label, entry, read, List.of(r), entry.outputFor(r.name(),
                            entry.period().orElse(r.end().toString())), Optional.empty(), true), outputs));
                    continue;
                }
                if (found.isEmpty()) {
                    jobs.add(new Job(entry.combined() ? where : label, entry, read, null, null, Optional.of(
                            "no series named '" + name + "' in " + entry.data().getFileName() + "; expected one of "
                            + read.names())));
                    if (entry.combined()) {
                        prepared = null; // a combined brief needs every one of its series
                        break;
                    }
                    continue;
                }
                Series series = found.get();
                if (entry.units().containsKey(series.name())) {
                    series = series.renamed(series.name(), entry.units().get(series.name()));
                }
                if (entry.period().isPresent()) {
                    Optional<org.annalist.series.Period> at = series.periodLabelled(entry.period().get());
                    if (at.isEmpty()) {
                        jobs.add(new Job(label, entry, read, null, null, Optional.of("series '" + name
                                + "' has no period " + entry.period().get())));
                        if (entry.combined()) {
                            prepared = null;
                            break;
                        }
                        continue;
                    }
                    series = series.upTo(at.get());
                }
                if (entry.combined()) {
                    prepared.add(series);
                } else {
                    jobs.add(claim(new Job(label, entry, read, List.of(series),
                            entry.outputFor(series.name(), series.end().toString()), Optional.empty()), outputs));
                }
            }
            if (entry.combined() && prepared != null) {
                String name = entry.title().isEmpty() ? "combined" : entry.title();
                jobs.add(claim(new Job(where + " " + String.join(" + ", prepared.stream().map(Series::name).toList()),
                        entry, read, prepared, entry.outputFor(name, prepared.get(0).end().toString()), Optional.empty()),
                        outputs));
            }
        }
        return new Plan(jobs);
    }

    /** The job, or the job failed when an earlier one writes the same file. */
    private static Job claim(Job job, Map<Path, String> outputs) {
        String earlier = outputs.putIfAbsent(job.output(), job.label());
        return earlier == null ? job : new Job(job.label(), job.entry(), job.read(), job.series(), job.output(),
                Optional.of("writes " + job.output() + ", as " + earlier + " does; put {series} or {period} in 'output'"),
                job.derived());
    }

    private static Outcome make(Job job) {
        if (job.failure().isPresent()) {
            return new Outcome(job.label(), Optional.empty(), job.failure());
        }
        BriefSpec.Entry e = job.entry();
        Series first = job.series().get(0);
        BriefPipeline pipeline = new BriefPipeline(analyst(e, first), s -> s);
        String title = e.title().isEmpty() || e.combined() ? e.title() : e.series().size() > 1
                ? e.title() + ": " + first.name() : e.title();
        BriefRequest request = new BriefRequest(e.data(), ReadOptions.defaults(), Optional.of(first.name()),
                job.output(), title, e.organisation(), e.templates(),
                e.generatedAt().orElseGet(() -> GenerationTime.resolve(Optional.empty(), System.getenv(),
                        java.time.Instant.now())), e.paper(), e.period(), e.logo(),
                java.util.Locale.forLanguageTag(e.language()));
        try {
            if (e.combined()) {
                BriefPipeline.MultiBrief multi = pipeline.makeMulti(request, job.read(), job.series(),
                        s -> analyst(e, s).analyse(s), e.total(), e.sortBy());
                SideOutputs.write(multi, job.series(), e.sideOutputs());
                return new Outcome(job.label(), Optional.of(multi.file()), Optional.empty());
            }
            // a ratio series goes the pipeline's own way: it reads, cuts and analyses the ratio of sums
            BriefPipeline.Brief brief = job.derived() ? pipeline.make(request) : pipeline.make(request, job.read(), first);
            SideOutputs.write(brief, first, e.sideOutputs());
            return new Outcome(job.label(), Optional.of(brief.file()), Optional.empty());
        } catch (DataProblemException ex) {
            return new Outcome(job.label(), Optional.empty(), Optional.of(reasons(ex)));
        } catch (RuntimeException ex) {
            // isolate the failure: the other briefs go on; the summary names what went wrong
            return new Outcome(job.label(), Optional.empty(), Optional.of(ex.getMessage() == null
                    ? ex.getClass().getSimpleName() : ex.getMessage()));
        }
    }

    /** The analysis with the spec's choices for this series: its measure kind and the outlook's horizon. */
    private static Analyst analyst(BriefSpec.Entry e, Series series) {
        Optional<Measure> measure = Optional.ofNullable(e.measures().get(series.name()))
                .map(m -> m.equals("flow") ? Measure.FLOW : Measure.LEVEL);
        return new Analyst(Optional.empty(), measure, List.of(), e.horizon());
    }

    private static String reasons(DataProblemException e) {
        return String.join("; ", e.problems().stream().map(DataProblem::toString).toList());
    }
}
