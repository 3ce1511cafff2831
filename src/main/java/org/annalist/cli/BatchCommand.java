package org.annalist.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.annalist.brief.Batch;
import org.annalist.brief.BatchPlan;
import org.annalist.brief.BriefPipeline;
import org.annalist.brief.BriefSpec;
import org.annalist.brief.FolderSpec;
import org.annalist.brief.SpecReader;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code annalist batch SPEC.yaml|FOLDER}: every brief of a spec (or of a folder's data files),
 * with a progress bar on an interactive terminal and a plain line per brief otherwise, on a pool sized to the cores; a line per
 * brief as it finishes, then a summary. Exit 0 when all were made, {@value ExitCodes#SOME_FAILED}
 * when some failed (the others are written), {@value ExitCodes#BAD_INPUT} when the spec itself is wrong.
 */
@Command(name = "batch", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Make every brief a spec file describes, in parallel; one bad brief does not stop the others.")
final class BatchCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "SPEC|FOLDER", description = "The brief spec (YAML; see the README for "
            + "its keys), or a folder: one brief per series of every data file in it (CSV, SDMX-CSV, JSON-stat, "
            + "workbooks; other files skipped with a note), into FOLDER/briefs/.")
    Path specFile;

    @Option(names = "--jobs", paramLabel = "N", description = "Briefs made at once. Default: the number of cores.")
    int jobs = Runtime.getRuntime().availableProcessors();

    @Option(names = "--out", paramLabel = "DIR",
            description = "Write every brief into DIR, under its output pattern's file name, instead of where the spec says.")
    Path outFolder;

    @Mixin
    DebugOption debug;

    @Override
    public Integer call() {
        if (jobs < 1) {
            throw new UserInputException("--jobs: expected 1 or more, got " + jobs);
        }
        List<String> skipped = List.of();
        BriefSpec briefs;
        if (java.nio.file.Files.isDirectory(specFile)) {
            FolderSpec.Listing listing = FolderSpec.list(specFile);
            briefs = listing.spec();
            skipped = listing.skipped();
        } else {
            briefs = SpecReader.read(specFile);
        }
        if (outFolder != null) {
            if (java.nio.file.Files.exists(outFolder) && !java.nio.file.Files.isDirectory(outFolder)) {
                // else every brief would fail on it, one by one
                throw new UserInputException("--out " + outFolder + ": is a file; expected a folder to write the briefs into");
            }
            briefs = briefs.withOutputFolder(outFolder);
        }
        PrintWriter out = spec.commandLine().getOut();
        for (String note : skipped) {
            out.println("skipped " + note);
        }
        BatchPlan plan = BatchPlan.of(briefs, new BriefPipeline());
        List<Batch.Outcome> outcomes;
        if (System.console() != null) {
            // an interactive terminal: a bar that redraws in place; the summary below names every brief
            try (ProgressBar bar = new ProgressBarBuilder().setTaskName("Briefs").setInitialMax(plan.size())
                    .setStyle(ProgressBarStyle.ASCII).continuousUpdate().build()) {
                outcomes = Batch.run(plan, jobs, o -> bar.step());
            }
        } else {
            outcomes = Batch.run(plan, jobs, o -> {
                synchronized (out) {
                    out.println((o.done() ? "done    " : "failed  ") + o.label());
                    out.flush();
                }
            });
        }
        long failed = outcomes.stream().filter(o -> !o.done()).count();
        out.println();
        out.printf(Locale.ROOT, "%d of %d briefs made%s%n", outcomes.size() - failed, outcomes.size(),
                failed == 0 ? "" : ", " + failed + " failed:");
        for (Batch.Outcome o : outcomes) {
            out.println((o.done() ? "  done    " : "  FAILED  ") + o.label() + "  "
                    + (o.done() ? o.file().get() : o.failure().orElse("")));
        }
        for (String note : skipped) {
            out.println("  skipped " + note);
        }
        out.flush();
        return failed == 0 ? ExitCodes.DONE : ExitCodes.SOME_FAILED;
    }
}
