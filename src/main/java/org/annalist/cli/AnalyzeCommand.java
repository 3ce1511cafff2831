package org.annalist.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.annalist.findings.Analyst;
import org.annalist.findings.DerivedSeries;
import org.annalist.findings.Findings;
import org.annalist.findings.FindingsJson;
import org.annalist.narrative.AnalystNotes;
import org.annalist.narrative.JsonTerms;
import org.annalist.ingest.ReadResult;
import org.annalist.series.Series;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code annalist analyze FILE}: the findings, as notes or as JSON. */
@Command(name = "analyze", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Analyse the series in FILE and print the findings with their evidence.")
final class AnalyzeCommand implements Callable<Integer> {

    enum Format { text, json }

    @Spec
    CommandSpec spec;

    @Option(names = "--series", paramLabel = "NAME", description = "Only this series. Default: every series in FILE.")
    String series;

    @Option(names = "--format", paramLabel = "FORMAT", description = "text or json. Default: text.")
    Format format = Format.text;

    @Mixin
    AnalysisOptions analysis;

    @Option(names = "--period", paramLabel = "PERIOD",
            description = "Analyse up to this period (2025-04, 2025-Q2, 2025). Default: the last in the data.")
    String period;

    @Mixin
    InputMixin input;

    @Mixin
    DebugOption debug;

    /** The series up to {@code --period}, when given. */
    private Series cut(Series s, ReadResult read) {
        if (period == null) {
            return s;
        }
        return s.upTo(s.periodLabelled(period).orElseThrow(() -> new UserInputException(read.file() + ": series '"
                + s.name() + "' has no period " + period + "; expected a period from " + s.start() + " to " + s.end())));
    }

    @Override
    public Integer call() {
        ReadResult read = input.read();
        Analyst analyst = analysis.analyst();
        List<DerivedSeries.Derived> derived = DerivedSeries.of(read.series());
        List<Findings> findings = new ArrayList<>();
        Optional<DerivedSeries.Derived> namedDerived = series == null || read.find(series).isPresent() ? Optional.empty()
                : derived.stream().filter(d -> d.series().name().equalsIgnoreCase(series)).findFirst();
        if (namedDerived.isPresent()) {
            DerivedSeries.Derived d = namedDerived.get();
            findings.add(analyst.analyse(new DerivedSeries.Derived(cut(d.series(), read), d.parts())));
        } else {
            List<Series> chosen = series == null ? read.series() : List.of(read.require(series));
            for (Series s : chosen) {
                findings.add(analyst.analyse(cut(analysis.prepare(s), read)));
            }
            if (series == null) {
                for (DerivedSeries.Derived d : derived) {
                    findings.add(analyst.analyse(new DerivedSeries.Derived(cut(d.series(), read), d.parts())));
                }
            }
        }
        PrintWriter out = spec.commandLine().getOut();
        if (format == Format.json) {
            out.print(FindingsJson.write(findings.size() == 1 ? findings.get(0) : findings, JsonTerms.ENGLISH));
        } else {
            out.print(AnalystNotes.all(findings));
        }
        out.flush();
        return Main.EXIT_OK;
    }
}
