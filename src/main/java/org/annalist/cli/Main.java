package org.annalist.cli;

import java.io.PrintWriter;
import java.util.Locale;
import org.annalist.brief.SpecProblem;
import org.annalist.ingest.DataProblem;
import org.annalist.ingest.DataProblemException;
import org.annalist.narrative.TemplateEngine;
import picocli.CommandLine;

/**
 * Entry point. Exit codes: 0 done; 2 bad input or usage (a message naming file, line and column,
 * no stack trace); 1 internal error (a short message; the trace with {@code --debug}).
 */
public final class Main {

    public static final int EXIT_OK = 0;
    public static final int EXIT_INTERNAL = 1;
    public static final int EXIT_BAD_INPUT = 2;

    private Main() {
    }

    public static void main(String[] args) {
        System.exit(run(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
    }

    /** Runs one command line with the given streams; returns the exit code. */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        // Charts and PDF go through AWT; a stray DISPLAY must not make it look for a window server.
        System.setProperty("java.awt.headless", "true");
        // Numbers in charts and text must not change with the machine's locale.
        Locale.setDefault(Locale.ROOT);
        CommandLine cli = commandLine();
        cli.setOut(out);
        cli.setErr(err);
        return cli.execute(args);
    }

    static CommandLine commandLine() {
        CommandLine cli = new CommandLine(new AnnalistCommand());
        cli.setCaseInsensitiveEnumValuesAllowed(true);
        cli.setExecutionExceptionHandler(Main::handle);
        cli.setParameterExceptionHandler((e, args) -> {
            e.getCommandLine().getErr().println("annalist: " + e.getMessage());
            e.getCommandLine().getErr().println("Try '" + e.getCommandLine().getCommandSpec().qualifiedName() + " --help'.");
            return EXIT_BAD_INPUT;
        });
        return cli;
    }

    private static int handle(Exception e, CommandLine cli, CommandLine.ParseResult parsed) {
        PrintWriter err = cli.getErr();
        if (e instanceof DataProblemException problems) {
            for (DataProblem problem : problems.problems()) {
                err.println(problem);
            }
            return EXIT_BAD_INPUT;
        }
        if (e instanceof SpecProblem) {
            err.println(e.getMessage()); // already SPEC:LINE:COLUMN: message, as data problems are written
            return EXIT_BAD_INPUT;
        }
        if (e instanceof UserInputException || e instanceof TemplateEngine.TemplateProblem) {
            err.println("annalist: " + e.getMessage());
            return EXIT_BAD_INPUT;
        }
        err.println("annalist: internal error: " + e + (debug(parsed) ? "" : " (run with --debug for details)"));
        if (debug(parsed)) {
            e.printStackTrace(err);
        }
        return EXIT_INTERNAL;
    }

    private static boolean debug(CommandLine.ParseResult parsed) {
        for (CommandLine.ParseResult p = parsed; p != null; p = p.subcommand()) {
            if (p.hasMatchedOption("--debug")) {
                return true;
            }
        }
        return false;
    }
}
