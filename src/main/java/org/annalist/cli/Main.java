package org.annalist.cli;

import java.io.PrintWriter;
import java.util.Locale;
import picocli.CommandLine;

/** Entry point: runs one command line; {@link ExitCodes} decides what a failure prints and returns. */
public final class Main {

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
        cli.setExecutionExceptionHandler(ExitCodes::failure);
        cli.setParameterExceptionHandler(ExitCodes::usage);
        return cli;
    }
}
