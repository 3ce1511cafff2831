package org.annalist.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.net.InetAddress;
import java.net.UnknownHostException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.annalist.ingest.InputFiles;
import org.annalist.serve.Settings;
import org.annalist.serve.Workbench;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code annalist serve}: the browser workbench on this machine, until Ctrl-C. */
@Command(name = "serve", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Start the browser workbench: check a file, look at a series, make its brief, run a brief spec.")
final class ServeCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Option(names = "--port", paramLabel = "N", description = "The port to listen on. Default: 8765.")
    int port = 8765;

    @Option(names = "--folder", paramLabel = "DIR",
            description = "The folder whose brief specs the browser may pick. Default: the current folder.")
    Path folder = Path.of(".");

    @Option(names = "--bind", paramLabel = "ADDR",
            description = "The interface to listen on. Default: 127.0.0.1, this machine only. Another address lets "
                    + "other machines reach your files: use it only on a network you trust.")
    String bind = "127.0.0.1";

    @Option(names = "--max-upload-mb", paramLabel = "MB",
            description = "The largest data file the browser may send, in megabytes. Default: "
                    + Settings.DEFAULT_UPLOAD_MEGABYTES + ".")
    long maxUploadMegabytes = Settings.DEFAULT_UPLOAD_MEGABYTES;

    @Option(names = "--generated-at", paramLabel = "TIME",
            description = "The time every brief states as made, ISO 8601. Default: SOURCE_DATE_EPOCH if set, else now.")
    String generatedAt;

    @Mixin
    DebugOption debug;

    @Override
    public Integer call() {
        if (port < 0 || port > 65535) {
            throw new UserInputException("--port " + port + ": expected a port from 0 to 65535");
        }
        if (!Files.isDirectory(folder)) {
            throw new UserInputException("--folder " + folder + ": no such folder");
        }
        if (maxUploadMegabytes < 1 || maxUploadMegabytes > InputMixin.MAX_LIMIT_MEGABYTES) {
            throw new UserInputException("--max-upload-mb " + maxUploadMegabytes + ": expected a whole number of "
                    + "megabytes from 1 to " + InputMixin.MAX_LIMIT_MEGABYTES);
        }
        InetAddress address;
        try {
            address = InetAddress.getByName(bind);
        } catch (UnknownHostException e) {
            throw new UserInputException("--bind " + bind + ": not an address of this machine");
        }
        BriefOptions times = new BriefOptions();
        times.generatedAt = generatedAt;
        Optional<java.time.Instant> pinned = generatedAt == null ? Optional.empty() : Optional.of(times.generatedAt());
        Settings settings = new Settings(address, port, folder.toAbsolutePath().normalize(),
                InputFiles.megabytesToBytes(maxUploadMegabytes), pinned, Settings.DEFAULT_IDLE);
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (!settings.loopback()) {
            err.println("warning: listening on " + address.getHostAddress() + ": other machines on the network can "
                    + "open the workbench and the briefs of " + settings.folder());
            err.flush();
        }
        Workbench workbench;
        try {
            workbench = Workbench.start(settings);
        } catch (IOException e) {
            throw new UserInputException("--port " + port + ": cannot listen there (" + e.getMessage()
                    + "); try another port, e.g. --port " + (port == 65535 ? 8766 : port + 1));
        }
        Runtime.getRuntime().addShutdownHook(new Thread(workbench::close, "annalist-serve-stop"));
        out.println("Annalist workbench: open " + workbench.address() + " in your browser.");
        out.println("Brief specs from " + settings.folder() + ". Stop with Ctrl-C.");
        out.flush();
        workbench.join();
        return ExitCodes.DONE;
    }
}
