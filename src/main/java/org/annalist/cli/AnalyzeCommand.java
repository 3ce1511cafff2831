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
import org.annalist.findings.Findings;
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
        List<Findings> findings;
        try {
            BriefPipeline.Analysed analysed = new BriefPipeline().analysed(job());
            findings = analysed.findings();
            analysed.warnings().forEach(w -> spec.commandLine().getErr().println("warning: " + w));
        } catch (SelectionProblem problem) {
            throw SelectionWords.forAnalyze(problem);
        }
        PrintWriter out = spec.commandLine().getOut();
        if (format == Format.json) {
            out.print(Reports.json(findings.size() == 1 ? findings.get(0) : findings));
        } else {
            out.print(Reports.notes(findings));
        }
        out.flush();
        return ExitCodes.DONE;
    }
}
