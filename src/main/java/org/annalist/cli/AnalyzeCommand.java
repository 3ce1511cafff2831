package org.annalist.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.annalist.analysis.decompose.ModelForm;
import org.annalist.findings.Analyst;
import org.annalist.findings.Findings;
import org.annalist.findings.FindingsJson;
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

    enum FormChoice { auto, additive, multiplicative }

    @Spec
    CommandSpec spec;

    @Option(names = "--series", paramLabel = "NAME", description = "Only this series. Default: every series in FILE.")
    String series;

    @Option(names = "--format", paramLabel = "FORMAT", description = "text or json. Default: text.")
    Format format = Format.text;

    @Option(names = "--form", paramLabel = "FORM",
            description = "auto (decide from the data), additive or multiplicative. Default: auto.")
    FormChoice form = FormChoice.auto;

    @Mixin
    InputMixin input;

    @Mixin
    DebugOption debug;

    @Override
    public Integer call() {
        ReadResult read = input.read();
        List<Series> chosen = series == null ? read.series() : List.of(read.require(series));
        Analyst analyst = new Analyst(switch (form) {
            case auto -> Optional.empty();
            case additive -> Optional.of(ModelForm.Form.ADDITIVE);
            case multiplicative -> Optional.of(ModelForm.Form.MULTIPLICATIVE);
        });
        List<Findings> findings = chosen.stream().map(analyst::analyse).toList();
        PrintWriter out = spec.commandLine().getOut();
        if (format == Format.json) {
            out.print(FindingsJson.write(findings.size() == 1 && series != null || read.series().size() == 1
                    ? findings.get(0) : findings));
        } else {
            out.print(AnalystNotes.all(findings));
        }
        out.flush();
        return Main.EXIT_OK;
    }
}
