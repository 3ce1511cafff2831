package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;

/**
 * How the command line answers a person at the keyboard: no command is a usage mistake, a typo is
 * answered with the name meant, {@code analyse} is {@code analyze}, every mistake of theirs exits
 * 2 with a message and before any work, and the help texts print clean.
 */
class CommandLineMannersTest {

    private static final String NILE = "src/test/resources/reference/Nile.csv";
    private static final String STAMP = "2026-11-20T08:00:00Z";

    @TempDir
    Path folder;

    @Test
    void noCommandAtAllPrintsTheUsageAndExitsTwo() {
        Run run = Run.of();
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.out()).isEmpty();
        assertThat(run.err()).startsWith("Usage: annalist").contains("Commands:", "analyze", "brief", "batch");
    }

    @Test
    void aMistypedCommandIsAnsweredWithTheCommandMeant() {
        String[][] cases = {
            {"anlyze", "analyze"}, {"analize", "analyze"}, {"brif", "brief"}, {"chekc", "check"}, {"Batch", "batch"},
            {"demos", "demo"},
        };
        for (String[] c : cases) {
            Run run = Run.of(c[0], NILE);
            assertThat(run.exitCode()).as(c[0]).isEqualTo(ExitCodes.BAD_INPUT);
            assertThat(run.err()).as(c[0]).isEqualTo("annalist: '" + c[0] + "' is not a command; did you mean '" + c[1]
                    + "'?" + System.lineSeparator() + "Try 'annalist --help'." + System.lineSeparator());
        }
        // nothing near: the commands are listed instead of a guess
        Run far = Run.of("frobnicate");
        assertThat(far.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(far.err()).startsWith("annalist: 'frobnicate' is not a command; the commands are check, analyze, brief, "
                + "batch, demo").doesNotContain("did you mean");
        // a data file where the command belongs
        assertThat(Run.of(NILE).err()).contains("'" + NILE + "' is not a command; the commands are");
    }

    @Test
    void aMistypedOptionIsAnsweredWithTheOptionMeant() {
        String[][] cases = {
            {"brief", "--serie", "--series"}, {"brief", "--seires=Nile", "--series"}, {"brief", "--out", "--output"},
            {"brief", "--templtes", "--templates"}, {"analyze", "--fromat", "--format"}, {"check", "--decimal", "--decimal-mark"},
        };
        for (String[] c : cases) {
            Run run = Run.of(c[0], NILE, c[1], "x");
            String typed = c[1].replaceFirst("=.*", "");
            assertThat(run.exitCode()).as(c[1]).isEqualTo(ExitCodes.BAD_INPUT);
            assertThat(run.err()).as(c[1]).isEqualTo("annalist: unknown option '" + typed + "'; did you mean '" + c[2]
                    + "'?" + System.lineSeparator() + "Try 'annalist " + c[0] + " --help'." + System.lineSeparator());
        }
        Run far = Run.of("brief", NILE, "-x");
        assertThat(far.err()).startsWith("annalist: unknown option '-x'" + System.lineSeparator());
        Run top = Run.of("--verison");
        assertThat(top.err()).startsWith("annalist: unknown option '--verison'; did you mean '--version'?");
    }

    @Test
    void theNearestNameIsOneWithinReachOrNone() {
        List<String> names = List.of("--series", "--output", "-o", "--organisation", "--title");
        assertThat(Suggestions.nearest("--sereis", names)).contains("--series");   // two letters swapped: one edit
        assertThat(Suggestions.nearest("--titel", names)).contains("--title");
        assertThat(Suggestions.nearest("--org", names)).contains("--organisation");   // the only name it begins
        assertThat(Suggestions.nearest("--o", names)).isEmpty();   // begins two names, and too short to guess
        assertThat(Suggestions.nearest("-p", names)).as("one letter is near every short option").isEmpty();
        assertThat(Suggestions.nearest("--colour", names)).isEmpty();
        assertThat(Suggestions.distance("analyse", "analyze")).isEqualTo(1);
        assertThat(Suggestions.distance("chekc", "check")).isEqualTo(1);
        assertThat(Suggestions.distance("", "demo")).isEqualTo(4);
    }

    @Test
    void analyseIsAnalyze() {
        Run british = Run.of("analyse", "--horizon", "0", "--format", "json", NILE);
        Run american = Run.of("analyze", "--horizon", "0", "--format", "json", NILE);
        assertThat(british.exitCode()).as(british.err()).isZero();
        assertThat(british.out()).isEqualTo(american.out()).contains("\"schema\"");
        assertThat(Run.of("analyse", "--help").out()).contains("Usage: annalist analyze");
    }

    @Test
    void aBriefIsWrittenOnlyAsAPdf() throws IOException {
        for (String name : new String[] {"report.docx", "report", "report.pdf.txt"}) {
            Path target = folder.resolve(name);
            Run run = Run.of("brief", NILE, "-o", target.toString(), "--generated-at", STAMP);
            assertThat(run.exitCode()).as(name).isEqualTo(ExitCodes.BAD_INPUT);
            assertThat(run.err()).as(name).isEqualTo("annalist: -o " + target + ": a brief is a PDF; expected a file name "
                    + "ending in .pdf" + System.lineSeparator());
            assertThat(target).doesNotExist();
        }
        Run upper = Run.of("brief", NILE, "-o", folder.resolve("NILE.PDF").toString(), "--horizon", "0", "--generated-at", STAMP);
        assertThat(upper.exitCode()).as(upper.err()).isZero();
    }

    @Test
    void aSpecWhoseOutputIsNotAPdfIsRefusedWhereItSaysSo() throws IOException {
        Files.copy(Path.of(NILE), folder.resolve("nile.csv"));
        Path spec = Files.writeString(folder.resolve("briefs.yaml"), """
                briefs:
                  - data: nile.csv
                    output: nile-{period}.docx
                """);
        Run run = Run.of("batch", spec.toString());
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err()).startsWith(spec + ":3:13: output '").contains("nile-{period}.docx': a brief is a PDF; "
                + "expected a name ending in .pdf");
    }

    @Test
    void aTemplatesFolderThatIsNotAFolderIsAMistakeSaidBeforeAnyWork() throws IOException {
        Path missing = folder.resolve("my-templates");
        Run run = Run.of("brief", NILE, "--templates", missing.toString(), "-o", folder.resolve("n.pdf").toString());
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err()).isEqualTo("annalist: --templates " + missing + ": no such folder; expected a folder of "
                + "templates (brief.ftlx, brief.css)" + System.lineSeparator());
        Path file = Files.writeString(folder.resolve("brief.ftlx"), "<html/>");
        Run notFolder = Run.of("brief", NILE, "--templates", file.toString(), "-o", folder.resolve("n.pdf").toString());
        assertThat(notFolder.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(notFolder.err()).contains(file + ": is a file; expected a folder of templates").doesNotContain("internal");
        assertThat(folder.resolve("n.pdf")).doesNotExist();
    }

    @Test
    void aBatchOutputFolderThatIsAFileIsOneMistakeNotAFailedBriefEach() throws IOException {
        Files.copy(Path.of(NILE), folder.resolve("nile.csv"));
        Path spec = Files.writeString(folder.resolve("briefs.yaml"), "briefs:\n  - data: nile.csv\n    horizon: 0\n");
        Path file = Files.writeString(folder.resolve("out"), "not a folder");
        Run run = Run.of("batch", spec.toString(), "--out", file.toString());
        assertThat(run.exitCode()).as(run.out()).isEqualTo(ExitCodes.BAD_INPUT);   // not 3, some briefs failed
        assertThat(run.err()).isEqualTo("annalist: --out " + file + ": is a file; expected a folder to write the briefs "
                + "into" + System.lineSeparator());
    }

    @Test
    void theTopLevelHelpNamesEveryExitCode() {
        Run help = Run.of("--help");
        assertThat(help.exitCode()).isZero();
        String text = help.out().replaceAll("\\s+", " ");
        assertThat(text).contains("Exit codes: 0 done, 1 internal error, 2 bad input or usage, 3 batch: some briefs "
                + "failed (the others were made).");
        assertThat(text).contains("analyze, analyse");
    }

    /** Run in a JVM of its own by the test below: every command's help, on the process's own streams. */
    public static final class EveryHelp {
        public static void main(String[] args) {
            List<String> commands = new ArrayList<>(List.of(""));
            commands.addAll(Main.commandLine().getSubcommands().keySet());
            for (String command : commands) {
                String[] line = command.isEmpty() ? new String[] {"--help"} : new String[] {command, "--help"};
                Run run = Run.of(line);
                System.out.println(command + " " + run.exitCode() + " " + run.out().length() + " " + run.err().length());
            }
            if (args.length > 0) {
                // the check's own check: a description with a lone % (what brief --help once had)
                CommandSpec planted = CommandSpec.create().name("planted")
                        .addOption(OptionSpec.builder("--share").description("changes in % of the total").build());
                new CommandLine(planted).getUsageMessage();
            }
        }
    }

    /** Every command's help in a JVM of its own; what the child wrote on its standard error. */
    private String helpsInAJvmOfTheirOwn(String... extra) throws IOException, InterruptedException {
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        List<String> command = new ArrayList<>(List.of(java.toString(), "-Djava.awt.headless=true", "-cp",
                System.getProperty("java.class.path"), EveryHelp.class.getName()));
        command.addAll(List.of(extra));
        Process child = new ProcessBuilder(command).redirectOutput(folder.resolve("out.txt").toFile())
                .redirectError(folder.resolve("err.txt").toFile()).start();
        assertThat(child.waitFor(120, TimeUnit.SECONDS)).isTrue();
        String out = Files.readString(folder.resolve("out.txt"), StandardCharsets.UTF_8);
        assertThat(child.exitValue()).as(out).isZero();
        // each command's help: exit 0, some text, nothing on the error stream it was given
        assertThat(out.lines()).hasSize(1 + Main.commandLine().getSubcommands().size())
                .allSatisfy(l -> assertThat(l).matches("\\S* 0 [1-9]\\d* 0"));
        return Files.readString(folder.resolve("err.txt"), StandardCharsets.UTF_8);
    }

    @Test
    void everyHelpPrintsWithoutWarnings() throws IOException, InterruptedException {
        // picocli writes its warnings (a lone % in a description) to the System.err it found when it
        // was loaded, not to the command's error stream: a JVM of its own shows them
        assertThat(helpsInAJvmOfTheirOwn()).isEmpty();
        assertThat(helpsInAJvmOfTheirOwn("planted")).as("the check sees a warning when there is one")
                .contains("[picocli WARN] Could not format 'changes in % of the total'");
    }
}
