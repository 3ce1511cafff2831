package org.annalist.cli;

import picocli.CommandLine.Command;

/** The top-level command; the work is in its subcommands. */
@Command(name = "annalist", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        subcommands = {CheckCommand.class, AnalyzeCommand.class, BriefCommand.class, BatchCommand.class,
            DemoCommand.class},
        description = "Reads a time series and writes a printable brief of what it is doing.",
        footer = {"", "Exit codes: 0 done, 1 internal error, 2 bad input or usage."})
final class AnnalistCommand implements Runnable {

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
