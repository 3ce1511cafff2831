package org.annalist.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.annalist.brief.OutputFiles;
import org.annalist.brief.BriefOutput;
import org.annalist.brief.BriefPipeline;
import org.annalist.brief.Job;
import org.annalist.brief.Logo;
import org.annalist.brief.SelectionProblem;
import org.annalist.brief.SeriesChoice;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code annalist brief FILE}: the PDF brief of one series. */
@Command(name = "brief", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Write the PDF brief of one series in FILE.")
final class BriefCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Option(names = "--series", paramLabel = "NAME", description = "The series to brief, when FILE holds several.")
    String series;

    @Option(names = {"-o", "--output"}, paramLabel = "OUT.pdf",
            description = "Where to write the PDF. Default: FILE's name (and the series') with .pdf, in the current folder.")
    Path output;

    @Option(names = "--title", paramLabel = "TEXT", description = "Title of the brief. Default: the series name.")
    String title = "";

    @Option(names = "--organisation", paramLabel = "TEXT", description = "Organisation named on the brief.")
    String organisation = "";

    @Option(names = "--logo", paramLabel = "FILE", description = "A PNG, JPEG or GIF logo printed in the masthead.")
    Path logo;

    @Option(names = "--templates", paramLabel = "DIR",
            description = "A folder of templates (brief.ftlx, brief.css) that replace the bundled ones.")
    Path templates;

    @Mixin
    InputMixin input;

    @Mixin
    BriefOptions briefOptions;

    @Mixin
    AnalysisOptions analysis;

    @Mixin
    DebugOption debug;

    /**
     * The options as the pipeline's job. The options are checked in the order users have always
     * been told about them: the logo, the time, then the analysis choices.
     */
    Job job() {
        if (output != null) {
            refuseOtherThanPdf(output);
        }
        if (templates != null) {
            refuseOtherThanFolder(templates);
        }
        Path target = output != null ? output : Path.of(defaultName(input.file, series));
        if (logo != null) {
            Logo.problem(logo).ifPresent(problem -> {
                throw new UserInputException("--logo: " + problem);
            });
        }
        BriefOutput.MastheadChoices masthead = new BriefOutput.MastheadChoices(title, organisation,
                Optional.ofNullable(logo), briefOptions.paper, Locale.ENGLISH, Optional.ofNullable(templates),
                Optional.of(briefOptions.generatedAt()));
        return new Job(input.input(), SeriesChoice.one(Optional.ofNullable(series), Optional.ofNullable(briefOptions.period)),
                analysis.choices(), Optional.of(BriefOutput.pdf(target, masthead)));
    }

    @Override
    public Integer call() {
        BriefPipeline.Made brief;
        try {
            brief = new BriefPipeline().briefs(job()).get(0);
        } catch (SelectionProblem problem) {
            throw SelectionWords.forBrief(problem);
        }
        brief.warnings().forEach(w -> spec.commandLine().getErr().println("warning: " + w));
        spec.commandLine().getOut().println("wrote " + brief.file() + " (" + brief.series().get(0).name() + ")");
        return ExitCodes.DONE;
    }

    /** A brief is a PDF: a name for anything else (report.docx, report) is a mistake, said before any work. */
    static void refuseOtherThanPdf(Path output) {
        Path name = output.getFileName();
        if (name == null || !name.toString().toLowerCase(Locale.ROOT).endsWith(".pdf")) {
            throw new UserInputException("-o " + output + ": a brief is a PDF; expected a file name ending in .pdf");
        }
    }

    /** {@code --templates} names a folder that is there, before any work (the renderer would fail late and obscurely). */
    static void refuseOtherThanFolder(Path folder) {
        if (!Files.exists(folder)) {
            throw new UserInputException("--templates " + folder + ": no such folder; expected a folder of templates "
                    + "(brief.ftlx, brief.css)");
        }
        if (!Files.isDirectory(folder)) {
            throw new UserInputException("--templates " + folder + ": is a file; expected a folder of templates "
                    + "(brief.ftlx, brief.css)");
        }
        if (!Files.isReadable(folder)) {
            throw new UserInputException("--templates " + folder + ": cannot be read (permission denied)");
        }
    }

    static String defaultName(Path input, String series) {
        String base = input.getFileName().toString().replaceFirst("\\.[^.]+$", "");
        return OutputFiles.fitted(slug(series == null ? base : base + "-" + series) + ".pdf");
    }

    /** A file-name-safe form: lower case, letters and digits, single dashes. */
    static String slug(String text) {
        String slug = text.toLowerCase(Locale.ROOT).replaceAll("[^\\p{L}\\p{N}]+", "-").replaceAll("(^-|-$)", "");
        return slug.isEmpty() ? "brief" : slug;
    }
}
