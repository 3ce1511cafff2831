package org.annalist.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.annalist.brief.BriefPipeline;
import org.annalist.brief.Job;
import org.annalist.brief.SelectionProblem;
import org.annalist.brief.SeriesChoice;
import org.annalist.brief.SeriesFiles;
import org.annalist.brief.Reports;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code annalist analyze FILE}: the findings, as notes or as JSON. */
@Command(name = "analyze", aliases = "analyse", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Analyse the series in FILE and print the findings with their evidence.")
final class AnalyzeCommand implements Callable<Integer> {

    enum Format { text, json }

    @Spec
    CommandSpec spec;

    @Option(names = "--series", paramLabel = "NAME", description = "Only this series. Default: every series in FILE.")
    String series;

    @Option(names = "--format", paramLabel = "FORMAT", description = "text or json. Default: text.")
    Format format = Format.text;

    @Mixin
    AnalysisOptions analysis;

    @Option(names = "--period", paramLabel = "PERIOD",
            description = "Analyse up to this period (2025-04, 2025-Q2, 2025). Default: the last in the data.")
    String period;

    @Mixin
    InputMixin input;

    @Mixin
    DebugOption debug;

    /** The options as the pipeline's job: without {@code --series}, every series and every ratio they offer. */
    Job job() {
        return new Job(input.input(), new SeriesChoice(series == null ? List.of() : List.of(series),
                SeriesChoice.WhenUnnamed.EVERY_SERIES_AND_RATIOS, Optional.ofNullable(period), Map.of()),
                analysis.choices(), Optional.empty());
    }

    @Override
    public Integer call() {
        // the text is made series by series as each is analysed, so that a file of thousands of
        // series holds their notes rather than their findings
        BriefPipeline.Rendered<?> rendered;
        try {
            // no brief, so no file digest to state: the files are read without computing it
            BriefPipeline pipeline = new BriefPipeline(SeriesFiles.withoutDigests());
            rendered = format == Format.json ? pipeline.rendered(job(), findings -> findings)
                    : pipeline.rendered(job(), Reports::notes);
        } catch (SelectionProblem problem) {
            throw SelectionWords.forAnalyze(problem);
        }
        rendered.warnings().forEach(w -> spec.commandLine().getErr().println("warning: " + w));
        PrintWriter out = spec.commandLine().getOut();
        List<?> outputs = rendered.outputs();
        if (format == Format.json) {
            out.print(Reports.json(outputs.size() == 1 ? outputs.get(0) : outputs));
        } else {
            out.print(String.join(System.lineSeparator(), outputs.stream().map(String.class::cast).toList()));
        }
        out.flush();
        return ExitCodes.DONE;
    }
}
