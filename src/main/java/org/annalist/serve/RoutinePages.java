package org.annalist.serve;

import java.io.IOException;
import java.nio.file.FileVisitOption;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.stream.Stream;
import org.annalist.brief.Batch;
import org.annalist.brief.BatchPlan;
import org.annalist.brief.BriefPipeline;
import org.annalist.brief.BriefSpec;
import org.annalist.brief.OutputName;
import org.annalist.brief.SpecProblem;
import org.annalist.brief.SpecReader;

/**
 * The monthly routine: a brief spec picked from the served folder (the only folder this page
 * lists, and the only one whose names it accepts), its briefs listed, run as {@code batch} runs it
 * into the session's own folder, with the outcomes as they come and the reasons of the failures.
 */
final class RoutinePages {

    /** How deep under the served folder specs are looked for, and how many are listed. */
    private static final int DEPTH = 3;
    private static final int MAX_SPECS = 200;

    /** One brief of a spec as the page lists it. */
    public record EntryView(int line, String data, String series, String title, String output, boolean combined) {
    }

    /** One outcome as the page lists it. */
    public record OutcomeView(String label, boolean done, String file, String reason) {
    }

    private final Routes routes;
    private final Settings settings;
    private final ExecutorService routines;

    RoutinePages(Routes routes, Settings settings, ExecutorService routines) {
        this.routes = routes;
        this.settings = settings;
        this.routines = routines;
    }

    /** The brief specs of the served folder, by their names relative to it; links are not followed. */
    List<String> specNames() {
        Path root = settings.folder();
        List<String> names = new ArrayList<>();
        try (Stream<Path> files = Files.walk(root, DEPTH, new FileVisitOption[0])) {
            files.filter(p -> Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS))
                    .map(p -> root.relativize(p).toString().replace('\\', '/'))
                    .filter(n -> n.toLowerCase(Locale.ROOT).matches(".*\\.ya?ml"))
                    .filter(n -> SafePaths.file(root, n).isPresent())
                    .sorted().limit(MAX_SPECS).forEach(names::add);
        } catch (IOException | java.io.UncheckedIOException e) {
            // a folder that cannot be walked lists what was found before it
        }
        return names;
    }

    /** A spec named by the browser, when it is one this page listed. */
    private Optional<Path> spec(String name) {
        return specNames().contains(name) ? SafePaths.file(settings.folder(), name) : Optional.empty();
    }

    void specs(Exchange ex, Session session) {
        routes.page(ex, 200, "routine.ftlh", session, Map.of("folder", settings.folder().toString(),
                "specs", specNames(), "runs", session.runs().stream().map(r -> Map.of("id", r.id(), "spec", r.spec(),
                        "over", r.isOver())).toList()));
    }

    void spec(Exchange ex, Session session, String name) {
        Optional<Path> file = spec(name);
        if (file.isEmpty()) {
            routes.refuse(ex, Routes.Refusal.NOT_FOUND, session);
            return;
        }
        String problem = "";
        List<EntryView> entries = new ArrayList<>();
        try {
            BriefSpec spec = SpecReader.read(file.get());
            for (BriefSpec.Entry entry : spec.briefs()) {
                var job = entry.job();
                // the file name only: a run writes into the session's folder, wherever the spec points
                String output = job.brief().map(b -> b.file() instanceof OutputName.Pattern pattern
                        ? pattern.pattern().substring(pattern.pattern().replace('\\', '/').lastIndexOf('/') + 1)
                        : b.file() instanceof OutputName.AsGiven given ? given.path().getFileName().toString() : "")
                        .orElse("");
                entries.add(new EntryView(entry.line(), job.input().file().getFileName().toString(),
                        String.join(", ", job.series().names()),
                        job.brief().map(b -> b.masthead().title()).orElse(""), output,
                        job.brief().map(b -> b.combined().isPresent()).orElse(false)));
            }
        } catch (SpecProblem e) {
            problem = e.getMessage().replace(file.get().toString(), name);
        }
        routes.page(ex, problem.isEmpty() ? 200 : 422, "spec.ftlh", session, Map.of("name", name, "entries", entries,
                "problem", problem));
    }

    /** Starts the spec's briefs in the background, into a folder of the session's; the page follows them. */
    void run(Exchange ex, Session session, String name) throws IOException {
        Optional<Path> file = spec(name);
        if (file.isEmpty()) {
            routes.refuse(ex, Routes.Refusal.NOT_FOUND, session);
            return;
        }
        String id = session.nextId('r');
        Path folder = session.newFolder(id);
        RoutineRun run = new RoutineRun(id, name, folder, 0);
        session.add(run);
        int threads = Math.max(1, Runtime.getRuntime().availableProcessors() - 1);
        routines.submit(() -> {
            try {
                BriefSpec spec = SpecReader.read(file.get()).withOutputFolder(folder);
                BatchPlan plan = BatchPlan.of(spec, new BriefPipeline());
                run.planned(plan.size());
                run.over(Batch.run(plan, threads, run::finished));
            } catch (SpecProblem e) {
                run.failed(e.getMessage().replace(file.get().toString(), name));
            } catch (RuntimeException | Error e) {
                run.failed(String.valueOf(e.getMessage()));
            }
        });
        ex.redirect("/run/" + id);
    }

    void progress(Exchange ex, Session session, RoutineRun run) {
        List<OutcomeView> outcomes = new ArrayList<>();
        for (Batch.Outcome o : run.outcomes()) {
            outcomes.add(new OutcomeView(o.label(), o.done(), o.file().map(f -> f.getFileName().toString()).orElse(""),
                    o.failure().orElse("")));
        }
        long failed = outcomes.stream().filter(o -> !o.done()).count();
        routes.page(ex, 200, "run.ftlh", session, Map.of("run", Map.of("id", run.id(), "spec", run.spec(),
                "over", run.isOver(), "done", run.done(), "total", run.total(), "problem", run.problem().orElse(""),
                "failed", failed), "outcomes", outcomes, "written", run.written()));
    }

    void download(Exchange ex, RoutineRun run, String name) throws IOException {
        Optional<Path> file = run.isOver() && run.written().contains(name) ? SafePaths.file(run.folder(), name)
                : Optional.empty();
        if (file.isEmpty()) {
            routes.refuse(ex, Routes.Refusal.NOT_FOUND, null);
            return;
        }
        ex.download(FilePages.contentType(name), name, Files.readAllBytes(file.get()));
    }

}
