package org.annalist.brief;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.annalist.series.Holiday;
import org.annalist.ingest.DataProblem;
import org.annalist.ingest.DataProblemException;

/**
 * The briefs of a spec, planned serially before any is made: each file read once (through the
 * pipeline's {@link SeriesFiles}), each series selected and each output decided, an output that
 * two briefs would write refused. A brief that cannot be made is planned as failed with its reason,
 * worded in the spec's terms, and does not stop the others.
 *
 * @param pipeline the pipeline that read the files and makes the briefs
 * @param briefs   in the spec's order
 */
public record BatchPlan(BriefPipeline pipeline, List<Planned> briefs) {

    /**
     * One brief of the batch, planned.
     *
     * @param label   {@code spec.yaml:3 Total}: where it comes from, for the summary
     * @param series  the series of the brief, selected and prepared (several for a combined brief)
     * @param output  where it goes; null when it failed before an output was decided
     * @param failure why it cannot be made, when the plan already knows
     */
    public record Planned(String label, Job job, SeriesFiles.ReadFile file, List<Holiday> holidays,
                          List<SeriesSelection.Selected> series, Path output, Optional<String> failure) {

        public Planned {
            series = List.copyOf(series);
        }

        static Planned failed(String label, Job job, String reason) {
            return new Planned(label, job, null, List.of(), List.of(), null, Optional.of(reason));
        }

        Planned failing(String reason) {
            return new Planned(label, job, file, holidays, series, output, Optional.of(reason));
        }
    }

    public BatchPlan {
        briefs = List.copyOf(briefs);
    }

    public int size() {
        return briefs.size();
    }

    /** Plans the briefs of {@code spec}, reading with {@code pipeline}'s files. */
    public static BatchPlan of(BriefSpec spec, BriefPipeline pipeline) {
        Planner planner = new Planner(spec.file().getFileName().toString(), pipeline);
        for (BriefSpec.Entry entry : spec.briefs()) {
            try {
                planner.plan(entry);
            } catch (RuntimeException | Error e) {
                // one entry's failure of any kind (a file that cannot be read, an internal error)
                // is that entry's: the batch plans and makes the others and reports it in its summary
                String label = entry.line() > 0 ? planner.specName + ":" + entry.line()
                        : entry.job().input().file().getFileName().toString();
                planner.planned.add(Planned.failed(label, entry.job(), e.getMessage() == null || e instanceof Error
                        ? "internal error: " + e : e.getMessage().replaceAll("\\s*\\R\\s*", " ")));
            }
        }
        return new BatchPlan(pipeline, planner.planned);
    }

    /** Plans entry by entry, remembering which outputs are taken. */
    private static final class Planner {
        private final String specName;
        private final BriefPipeline pipeline;
        private final List<Planned> planned = new ArrayList<>();
        private final Map<Path, String> outputs = new HashMap<>();

        Planner(String specName, BriefPipeline pipeline) {
            this.specName = specName;
            this.pipeline = pipeline;
        }

        void plan(BriefSpec.Entry entry) {
            Job job = entry.job();
            Path data = job.input().file();
            String where = entry.line() > 0 ? specName + ":" + entry.line() : data.getFileName().toString();
            List<Holiday> holidays;
            try {
                holidays = pipeline.holidays(job);
            } catch (DataProblemException e) {
                planned.add(Planned.failed(where + " " + job.analysis().holidays().orElseThrow().getFileName(), job,
                        reasons(e)));
                return;
            }
            SeriesFiles.ReadFile file;
            try {
                file = pipeline.files().read(job.input());
            } catch (DataProblemException e) {
                planned.add(Planned.failed(where + " " + data.getFileName(), job, reasons(e)));
                return;
            }
            List<SeriesSelection.Wanted> wanted;
            try {
                wanted = SeriesSelection.wanted(job.series(), file);
            } catch (SelectionProblem p) {
                planned.add(Planned.failed(where, job, words(p, job)));
                return;
            }
            if (job.requireBrief().combined().isPresent()) {
                planCombined(where, job, file, holidays, wanted);
            } else {
                for (SeriesSelection.Wanted w : wanted) {
                    planSingle(where + " " + name(w), job, file, holidays, w);
                }
            }
        }

        private void planSingle(String label, Job job, SeriesFiles.ReadFile file, List<Holiday> holidays,
                                SeriesSelection.Wanted wanted) {
            BriefOutput output = job.requireBrief();
            try {
                SeriesSelection.Selected s = SeriesSelection.select(job, file, wanted, true);
                claim(new Planned(label, job, file, holidays, List.of(s), BriefPipeline.singleOutput(output, s),
                        Optional.empty()));
            } catch (SelectionProblem p) {
                if (p.reason() instanceof SelectionProblem.NoSuchPeriod missing && missing.derived()) {
                    // a ratio's output is decided from the period asked for, and taken even though
                    // the brief fails: a second brief writing the same file is told so
                    claim(new Planned(label, job, file, holidays, List.of(),
                            output.file().resolve(missing.series().name(), missing.period()),
                            Optional.of(words(p, job))));
                } else {
                    planned.add(Planned.failed(label, job, words(p, job)));
                }
            }
        }

        /** A combined brief needs every one of its series: the first that fails fails it. */
        private void planCombined(String where, Job job, SeriesFiles.ReadFile file, List<Holiday> holidays,
                                  List<SeriesSelection.Wanted> wanted) {
            List<SeriesSelection.Selected> all = new ArrayList<>();
            for (SeriesSelection.Wanted w : wanted) {
                try {
                    all.add(SeriesSelection.select(job, file, w, false));
                } catch (SelectionProblem p) {
                    String label = p.reason() instanceof SelectionProblem.NoSuchSeries ? where : where + " " + name(w);
                    planned.add(Planned.failed(label, job, words(p, job)));
                    return;
                }
            }
            String names = String.join(" + ", all.stream().map(s -> s.series().name()).toList());
            claim(new Planned(where + " " + names, job, file, holidays, all,
                    BriefPipeline.combinedOutput(job.requireBrief(), all), Optional.empty()));
        }

        /** Takes the brief's output, or fails the brief when an earlier one writes the same file. */
        private void claim(Planned brief) {
            String earlier = outputs.putIfAbsent(brief.output(), brief.label());
            planned.add(earlier == null ? brief : brief.failing("writes " + brief.output() + ", as " + earlier
                    + " does; put {series} or {period} in 'output'"));
        }
    }

    private static String name(SeriesSelection.Wanted wanted) {
        return wanted instanceof SeriesSelection.ByName byName ? byName.name()
                : ((SeriesSelection.Taken) wanted).series().name();
    }

    /** A selection problem in a spec's terms: its keys, the data file by name. */
    static String words(SelectionProblem problem, Job job) {
        String data = job.input().file().getFileName().toString();
        SelectionProblem.Reason reason = problem.reason();
        if (reason instanceof SelectionProblem.SeveralSeries several) {
            return data + " holds several series (" + several.read().names() + "); name the ones to brief under 'series'";
        }
        if (reason instanceof SelectionProblem.NoSuchSeries none) {
            return "no series named '" + none.name() + "' in " + data + "; expected one of " + none.read().names();
        }
        if (reason instanceof SelectionProblem.NoSuchPeriod missing) {
            // a ratio's period used to be checked only as its brief was made, and is still reported as a brief does
            return missing.derived() ? missing.atTheFile().toString()
                    : "series '" + missing.asked() + "' has no period " + missing.period();
        }
        return "per_day: " + ((SelectionProblem.NotPerDay) reason).why();
    }

    static String reasons(DataProblemException e) {
        return String.join("; ", e.problems().stream().map(DataProblem::toString).toList());
    }
}
