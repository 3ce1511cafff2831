package org.annalist.cli;

import java.io.PrintWriter;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Supplier;
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
        CommandLine cli = commandLine(args.length > 0 ? args[0] : "");
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

    /** The whole command line, every subcommand in it. */
    static CommandLine commandLine() {
        return commandLine("");
    }

    /**
     * The command line for arguments that begin with {@code first}: only that subcommand where it
     * names one, else all of them (the top-level help, a mistyped command's suggestion). picocli
     * builds each subcommand's model from its annotations as it is added: in a cold brief the
     * command line took 90–120 ms of CPU with all six, about 62 ms with its own
     * (dev/start-up-measurements.md).
     */
    static CommandLine commandLine(String first) {
        CommandLine cli = new CommandLine(new AnnalistCommand());
        Map<String, Supplier<Object>> subcommands = subcommands();
        Supplier<Object> named = subcommands.get(first);
        if (named != null) {
            cli.addSubcommand(named.get());
        } else {
            subcommands.values().stream().distinct().forEach(command -> cli.addSubcommand(command.get()));
        }
        // the settings below reach the subcommands added before them
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

    /** Each subcommand by every name it answers to, in the order the help lists them. */
    private static Map<String, Supplier<Object>> subcommands() {
        Map<String, Supplier<Object>> byName = new LinkedHashMap<>();
        byName.put("check", CheckCommand::new);
        Supplier<Object> analyze = AnalyzeCommand::new;
        byName.put("analyze", analyze);
        byName.put("analyse", analyze);
        byName.put("brief", BriefCommand::new);
        byName.put("batch", BatchCommand::new);
        byName.put("demo", DemoCommand::new);
        byName.put("serve", ServeCommand::new);
        return byName;
    }
}
