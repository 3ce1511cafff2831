package org.annalist.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Command;

/** The top-level command; the work is in its subcommands, which {@link Main#commandLine} adds. */
@Command(name = "annalist", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Reads a time series and writes a printable brief of what it is doing.",
        footer = {"", "Exit codes: 0 done, 1 internal error, 2 bad input or usage, 3 batch: some briefs failed "
            + "(the others were made)."})
final class AnnalistCommand implements Callable<Integer> {

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    /** No command given: a usage mistake, so the usage goes to the error stream and the exit code is 2. */
    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getErr());
        return ExitCodes.BAD_INPUT;
    }
}
