package org.annalist.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.annalist.brief.AnalysisChoices;
import org.annalist.brief.Batch;
import org.annalist.brief.BatchPlan;
import org.annalist.brief.BriefOutput;
import org.annalist.brief.BriefPipeline;
import org.annalist.brief.Job;
import org.annalist.brief.SelectionProblem;
import org.annalist.brief.SeriesChoice;
import org.annalist.brief.SeriesFiles;
import org.annalist.brief.SpecReader;
import org.annalist.ingest.Aggregation;
import org.annalist.ingest.ReadOptions;
import org.annalist.series.Frequency;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code annalist demo}: the briefs of the invented Quennelmark scenario, from {@code demo-data/} into {@code out/}. */
@Command(name = "demo", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Make the demo briefs from the invented data in demo-data/ and write them to out/.")
final class DemoCommand implements Callable<Integer> {

    private static final String ORGANISATION = "Quennelmark Visitor Board (invented demo)";

    /** The demo's brief spec, in the data folder. */
    static final String ROUTINE_SPEC = "monthly-briefs.yaml";

    /** One demo brief: which file and series, how to read it, its title and output name. */
    private record DemoBrief(String file, String series, ReadOptions options, String title, String output,
                             Optional<String> period) {

        DemoBrief(String file, String series, ReadOptions options, String title, String output) {
            this(file, series, options, title, output, Optional.empty());
        }
    }

    private static final List<DemoBrief> BRIEFS = List.of(
            new DemoBrief("quennelmark-guest-nights.csv", "Total", ReadOptions.defaults(),
                    "Guest nights in Quennelmark", "guest-nights-total.pdf"),
            new DemoBrief("quennelmark-guest-nights.csv", "Domestic", ReadOptions.defaults(),
                    "Guest nights from the home market", "guest-nights-domestic.pdf"),
            new DemoBrief("quennelmark-guest-nights.csv", "Brevania", ReadOptions.defaults(),
                    "Guest nights from Brevania", "guest-nights-brevania.pdf"),
            new DemoBrief("quennelmark-guest-nights.csv", "Long-haul", ReadOptions.defaults(),
                    "Guest nights from long-haul markets", "guest-nights-long-haul.pdf"),
            new DemoBrief("quennelmark-arrivals.csv", "Total", ReadOptions.defaults(),
                    "Guest arrivals in Quennelmark", "arrivals-total.pdf"),
            new DemoBrief("glassworks-daily-visitors.csv", "Visitors",
                    ReadOptions.defaults().withAggregation(new Aggregation(Frequency.MONTHLY, Aggregation.Method.SUM)),
                    "Glassworks Museum visitors by month", "glassworks-visitors-monthly.pdf"),
            // Easter moved from 31 March 2024 to 20 April 2025: the April brief explains the swing
            new DemoBrief("quennelmark-guest-nights.csv", "Total", ReadOptions.defaults(),
                    "Guest nights in Quennelmark, April 2025", "guest-nights-total-2025-04.pdf", Optional.of("2025-04")));

    @Spec
    CommandSpec spec;

    @Option(names = "--data", paramLabel = "DIR",
            description = "Folder of the demo data. Default: demo-data, here or else in the installed tool's folder.")
    Path data;

    @Option(names = "--out", paramLabel = "DIR", description = "Folder for the briefs. Default: out.")
    Path out = Path.of("out");

    @Mixin
    BriefOptions briefOptions;

    @Mixin
    DebugOption debug;

    /** A demo brief as the pipeline's job: the analysis decides everything from the data. */
    private Job job(DemoBrief demo, Instant now) {
        BriefOutput.MastheadChoices masthead = new BriefOutput.MastheadChoices(demo.title(), ORGANISATION,
                Optional.empty(), briefOptions.paper, Locale.ENGLISH, Optional.empty(), Optional.of(now));
        return new Job(new Job.Input(data.resolve(demo.file()), demo.options()),
                SeriesChoice.one(Optional.of(demo.series()), demo.period()), AnalysisChoices.fromTheData(),
                Optional.of(BriefOutput.pdf(out.resolve(demo.output()), masthead)));
    }

    /**
     * The demo data of the repository's top folder when run there, else the copy the distribution
     * carries beside {@code bin/} (its launcher passes that folder as {@code annalist.home}).
     */
    static Path defaultData(Path here, Optional<String> installedHome) {
        if (Files.isDirectory(here) || installedHome.isEmpty()) {
            return here;
        }
        Path installed = Path.of(installedHome.get(), "demo-data");
        return Files.isDirectory(installed) ? installed : here;
    }

    @Override
    public Integer call() {
        if (data == null) {
            data = defaultData(Path.of("demo-data"), Optional.ofNullable(System.getProperty("annalist.home")));
        }
        if (!Files.isDirectory(data)) {
            throw new UserInputException(data + ": no such folder; expected the demo-data folder of the Annalist "
                    + "repository (run from its top folder, or pass --data DIR)");
        }
        PrintWriter console = spec.commandLine().getOut();
        // the demo's briefs and its routine spec read the same files: read each once
        BriefPipeline pipeline = new BriefPipeline(new SeriesFiles());
        Instant now = briefOptions.generatedAt();
        for (DemoBrief demo : BRIEFS) {
            try {
                for (BriefPipeline.Made brief : pipeline.briefs(job(demo, now))) {
                    console.println("wrote " + brief.file());
                }
            } catch (SelectionProblem problem) {
                throw SelectionWords.forBrief(problem);
            }
        }
        // the monthly routine: the board's multi-series brief and two market briefs, from a spec
        Path routine = data.resolve(ROUTINE_SPEC);
        if (Files.isRegularFile(routine)) {
            List<Batch.Outcome> outcomes = Batch.run(BatchPlan.of(SpecReader.read(routine).withOutputFolder(out),
                    pipeline), Runtime.getRuntime().availableProcessors(), o -> { });
            for (Batch.Outcome o : outcomes) {
                if (!o.done()) {
                    throw new IllegalStateException("the demo brief " + o.label() + " failed: " + o.failure().orElse(""));
                }
                console.println("wrote " + Path.of("").toAbsolutePath().relativize(o.file().get()));
            }
        }
        return ExitCodes.DONE;
    }
}
