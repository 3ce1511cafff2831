package org.annalist.cli;

import java.io.PrintWriter;
import java.util.Arrays;
import java.util.List;
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
        try {
            return cli.execute(args);
        } catch (Throwable e) {
            // the last boundary: whatever escaped the handlers (an Error thrown while reporting an
            // Error, say) is still one line and exit 1, never a stack trace
            return ExitCodes.escaped(e, err, Arrays.asList(args).contains("--debug"));
        }
    }

    static CommandLine commandLine() {
        CommandLine cli = new CommandLine(new AnnalistCommand());
        cli.setCaseInsensitiveEnumValuesAllowed(true);
        cli.setExecutionExceptionHandler(ExitCodes::failure);
        // picocli hands only Exceptions to the handler; an Error (StackOverflowError,
        // OutOfMemoryError) from a command is wrapped so that it takes the same way out
        CommandLine.IExecutionStrategy runLast = new CommandLine.RunLast();
        cli.setExecutionStrategy(parsed -> {
            try {
                return runLast.execute(parsed);
            } catch (Error e) {
                List<CommandLine> commands = parsed.asCommandLineList();
                throw new CommandLine.ExecutionException(commands.get(commands.size() - 1), "error", e);
            }
        });
        cli.setParameterExceptionHandler(ExitCodes::usage);
        return cli;
    }
}
