package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * Every failure leaves a command as one line and an exit code: an Error (StackOverflowError,
 * OutOfMemoryError) is an internal error, exit 1, its stack trace only with {@code --debug}; in a
 * batch, a brief that fails for any reason is that brief's failure and the others are made.
 */
class ErrorBoundaryTest {

    /** A command that fails as it is told to. */
    @Command(name = "boom")
    static final class Boom implements Callable<Integer> {
        @Option(names = "--with")
        String with = "overflow";

        @Mixin
        DebugOption debug;

        @Override
        public Integer call() {
            switch (with) {
                case "overflow" -> throw new StackOverflowError();
                case "memory" -> throw new OutOfMemoryError("Java heap space");
                case "assertion" -> throw new AssertionError("line one\nline two");
                default -> throw new IllegalStateException("plain");
            }
        }
    }

    private static String[] run(String... args) {
        CommandLine cli = Main.commandLine();
        cli.addSubcommand("boom", new Boom());
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cli.setOut(new PrintWriter(out, true));
        cli.setErr(new PrintWriter(err, true));
        return new String[] {String.valueOf(cli.execute(args)), err.toString()};
    }

    @Test
    void anErrorIsOneLineAndExitOneWithoutAStackTrace() {
        for (String with : new String[] {"overflow", "memory", "assertion", "plain"}) {
            String[] result = run("boom", "--with", with);
            assertThat(result[0]).as(with).isEqualTo("1");
            assertThat(result[1]).as(with).startsWith("annalist: internal error: ").endsWith("(run with --debug for details)\n")
                    .hasLineCount(1).doesNotContain("\tat ");
        }
        assertThat(run("boom", "--with", "memory")[1]).contains("out of memory").contains("-Xmx");
        assertThat(run("boom", "--with", "overflow")[1]).contains("nested too deeply");
    }

    @Test
    void debugShowsTheStackTrace() {
        String[] result = run("boom", "--with", "overflow", "--debug");
        assertThat(result[0]).isEqualTo("1");
        assertThat(result[1]).contains("java.lang.StackOverflowError").contains("\tat ");
    }

    @Test
    void aBatchRecordsABriefsTemplateFailureAndMakesTheOthers(@TempDir Path folder) throws IOException {
        Files.copy(Path.of("src/test/resources/reference/Nile.csv"), folder.resolve("nile.csv"));
        Path templates = Files.createDirectories(folder.resolve("deep"));
        Files.writeString(templates.resolve("brief.ftlx"), "<#macro m><@m/></#macro><@m/>");
        Path spec = folder.resolve("briefs.yaml");
        Files.writeString(spec, """
                briefs:
                  - data: nile.csv
                    templates: deep
                    output: deep.pdf
                  - data: nile.csv
                    output: good.pdf
                """);
        Run run = Run.of("batch", spec.toString(), "--jobs", "2");
        assertThat(run.exitCode()).as(run.out() + run.err()).isEqualTo(3);
        assertThat(run.out()).contains("1 of 2 briefs made").contains("the template nested too deeply");
        assertThat(folder.resolve("good.pdf")).exists();
        assertThat(folder.resolve("deep.pdf")).doesNotExist();
    }
}
