package org.annalist.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.annalist.brief.SeriesCheck;
import org.annalist.brief.Reports;
import org.annalist.ingest.DataProblem;
import org.annalist.ingest.ReadResult;
import org.annalist.ingest.SeriesFileReader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code annalist check FILE}: reads the file as the tool would and reports what it found. */
@Command(name = "check", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Read FILE as the tool would and report its series, frequency, span, gaps, flags and problems.")
final class CheckCommand implements Callable<Integer> {

    enum Format { text, json }

    @Spec
    CommandSpec spec;

    @Option(names = "--format", paramLabel = "FORMAT", description = "text or json. Default: text.")
    Format format = Format.text;

    @Mixin
    InputMixin input;

    @Mixin
    DebugOption debug;

    @Override
    public Integer call() {
        ReadResult read = new SeriesFileReader(input.readOptions()).withoutDigest().read(input.file);
        PrintWriter out = spec.commandLine().getOut();
        if (format == Format.json) {
            out.print(Reports.json(SeriesCheck.of(read)));
        } else {
            printText(read, out);
        }
        out.flush();
        return ExitCodes.DONE;
    }

    private static void printText(ReadResult read, PrintWriter out) {
        out.printf(Locale.ROOT, "%s: %d data rows, %s layout, %s, periods %s %s%s%s%n",
                read.file(), read.rowsRead(), read.layout(), read.sheet().map(s -> "sheet " + s.number() + " '" + s.name()
                        + "' of an " + s.format() + " workbook").orElse(read.charset()
                        + (read.delimiter() == '\0' ? "" : ", " + read.delimiterName() + "-separated")),
                read.sheet().isPresent() ? "read as" : "written",
                read.periodFormat(),
                read.dateOrder().map(o -> ", dates " + o.name().toLowerCase(Locale.ROOT).replace('_', '-')).orElse(""),
                read.decimalMark().map(m -> ", decimal " + m.name().toLowerCase(Locale.ROOT)).orElse(""));
        read.aggregation().ifPresent(a -> out.printf(Locale.ROOT, "aggregated to %s by %s%n", a.target(), a.method().label()));
        if (!read.keys().description().isEmpty()) {
            out.printf(Locale.ROOT, "data set: %s%n", read.keys().description());
        }
        for (SeriesCheck check : SeriesCheck.of(read)) {
            var s = check.series();
            out.printf(Locale.ROOT, "%nseries '%s'%s%s%n", s.name(), s.unit() == null ? "" : " (" + s.unit() + ")",
                    check.key().isEmpty() ? "" : ", key " + check.key());
            out.printf(Locale.ROOT, "  %s, %s to %s, %d periods, %d missing%n", s.frequency(), s.start(), s.end(),
                    s.observations(), s.missing());
            if (!check.missingPeriods().isEmpty()) {
                out.printf(Locale.ROOT, "  missing: %s%n", abbreviate(check.missingPeriods()));
            }
            check.flagged().forEach((flag, periods) -> out.printf(Locale.ROOT, "  %s: %s%n", flag, abbreviate(periods)));
        }
        List<DataProblem> warnings = read.warnings();
        if (!warnings.isEmpty()) {
            out.printf(Locale.ROOT, "%nwarnings:%n");
            warnings.forEach(w -> out.printf(Locale.ROOT, "  %s%n", w));
        }
    }

    private static String abbreviate(List<String> periods) {
        return periods.size() <= 12 ? String.join(", ", periods)
                : String.join(", ", periods.subList(0, 10)) + " and " + (periods.size() - 10) + " more";
    }
}
