package org.annalist.brief;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.UnaryOperator;
import org.annalist.chart.Captions;
import org.annalist.chart.Figure;
import org.annalist.chart.IrregularChart;
import org.annalist.chart.OutlookChart;
import org.annalist.chart.OverviewChart;
import org.annalist.chart.SeasonalProfileChart;
import org.annalist.chart.SmallMultiplesChart;
import org.annalist.chart.YearOverlayChart;
import org.annalist.findings.Analyst;
import org.annalist.findings.DerivedSeries;
import org.annalist.findings.Findings;
import org.annalist.findings.PartsCheck;
import org.annalist.findings.SourceFacts;
import org.annalist.ingest.DataProblem;
import org.annalist.ingest.DataProblemException;
import org.annalist.ingest.ReadResult;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.narrative.BriefView;
import org.annalist.narrative.BriefViews;
import org.annalist.narrative.ChartWords;
import org.annalist.narrative.Masthead;
import org.annalist.narrative.MultiBriefView;
import org.annalist.narrative.MultiBriefViews;
import org.annalist.narrative.TemplateEngine;
import org.annalist.render.AtomicFiles;
import org.annalist.render.Fonts;
import org.annalist.render.PdfRenderer;
import org.annalist.series.Series;

/** Makes a brief: read → analyse → chart and narrative → PDF, written atomically. */
public final class BriefPipeline {

    private final Analyst analyst;
    private final UnaryOperator<Series> prepare;
    private final PdfRenderer renderer = new PdfRenderer();

    public BriefPipeline() {
        this(new Analyst(), UnaryOperator.identity());
    }

    /**
     * @param analyst the analysis with the user's choices (form, measure)
     * @param prepare what to do to the series before the analysis (per-day figures, say)
     */
    public BriefPipeline(Analyst analyst, UnaryOperator<Series> prepare) {
        this.analyst = analyst;
        this.prepare = prepare;
    }

    /**
     * @throws DataProblemException when the file cannot be used, does not hold the series asked
     *                              for, or holds several and none was named
     */
    public Brief make(BriefRequest request) {
        ReadResult read = new SeriesFileReader(request.readOptions()).read(request.input());
        if (request.series().isPresent() && read.find(request.series().get()).isEmpty()) {
            Optional<DerivedSeries.Derived> derived = DerivedSeries.of(read.series()).stream()
                    .filter(d -> d.series().name().equalsIgnoreCase(request.series().get())).findFirst();
            if (derived.isPresent()) {
                Series cut = cutAtLatest(derived.get().series(), request, read);
                return make(request, read, cut, analyst.analyse(new DerivedSeries.Derived(cut, derived.get().parts())));
            }
        }
        return make(request, read, cutAtLatest(prepare.apply(choose(read, request)), request, read));
    }

    /** Makes the brief of {@code series}, one of the series already read from {@code read}. */
    public Brief make(BriefRequest request, ReadResult read, Series series) {
        return make(request, read, series, analyst.analyse(series));
    }

    private Brief make(BriefRequest request, ReadResult read, Series series, Findings findings) {
        Fonts.registerWithAwt();
        Masthead masthead = masthead(request);
        SourceFacts source = sourceFacts(read);
        List<String> warnings = new ArrayList<>();
        String missing = Fonts.missingGlyphs(String.join(" ", request.title(), request.organisation(), series.name(),
                series.unit(), source.file(), String.join(" ", source.notes())));
        if (!missing.isEmpty()) {
            String warning = "the brief's font has no glyph for " + missing.codePoints().mapToObj(Character::toString)
                    .map(c -> "'" + c + "' (U+" + String.format(Locale.ROOT, "%04X", c.codePointAt(0)) + ")")
                    .reduce((a, b) -> a + ", " + b).orElse("") + "; they print as # in the text and ? in charts";
            warnings.add(warning);
            source = new SourceFacts(source.file(), source.sha256(), source.rowsRead(), source.reading(),
                    concat(source.notes(), "Note: " + warning + "."));
        }
        BriefView view = BriefViews.of(series, findings, source, masthead);
        String xhtml = new TemplateEngine(request.templates())
                .render(TemplateEngine.BRIEF_TEMPLATE, view, masthead.language());
        List<Figure> figures = figures(series, findings, view);
        byte[] pdf = renderer.render(xhtml, request.input().toAbsolutePath().getParent().toUri().toString(),
                figures, request.generatedAt(), documentId(read.sha256(), series.name()));
        write(request.output(), pdf);
        return new Brief(request.output(), series.name(), findings, List.copyOf(warnings), figures);
    }

    /**
     * Makes the multi-series brief of {@code series} (all read from {@code read}), each analysed by
     * {@code analyse}; with {@code total} named, the other series are checked against it.
     */
    public MultiBrief makeMulti(BriefRequest request, ReadResult read, List<Series> series,
                                java.util.function.Function<Series, Findings> analyse, Optional<String> total,
                                MultiBriefViews.SortBy sortBy) {
        Fonts.registerWithAwt();
        Masthead masthead = masthead(request);
        List<Findings> findings = series.stream().map(analyse).toList();
        Optional<PartsCheck> check = total.flatMap(name -> series.stream().filter(s -> s.name().equals(name)).findFirst())
                .map(t -> PartsCheck.of(t, series.stream().filter(s -> s != t).toList()));
        MultiBriefView view = MultiBriefViews.of(series, findings, sourceFacts(read), masthead, check, sortBy);
        String xhtml = new TemplateEngine(request.templates())
                .render(TemplateEngine.MULTI_TEMPLATE, view, masthead.language());
        Figure multiples = SmallMultiplesChart.of(series, findings);
        List<Figure> overviews = new ArrayList<>();
        for (int i = 0; i < series.size(); i++) {
            overviews.add(new Figure("overview-" + i, OverviewChart.of(series.get(i), findings.get(i),
                    captions(series.get(i), findings.get(i))).chart()));
        }
        List<Figure> figures = new ArrayList<>(overviews);
        figures.add(0, multiples);
        byte[] pdf = renderer.render(xhtml, request.input().toAbsolutePath().getParent().toUri().toString(),
                figures, request.generatedAt(), documentId(read.sha256(), String.join("|",
                        series.stream().map(Series::name).toList())));
        write(request.output(), pdf);
        return new MultiBrief(request.output(), findings, check, multiples, List.copyOf(overviews));
    }

    private static void write(Path output, byte[] pdf) {
        try {
            AtomicFiles.write(output, pdf);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + output, e);
        }
    }

    private static Masthead masthead(BriefRequest request) {
        return new Masthead(request.title(), request.organisation(), request.language(), request.paper(),
                request.generatedAt(), "Annalist " + Version.current(),
                request.logo().map(p -> p.toAbsolutePath().toUri().toString()));
    }

    /**
     * The multi-series brief made: where it is, each series' findings, the parts-and-total check,
     * its charts (the small multiples, and each series' overview in the order of {@code findings}).
     */
    public record MultiBrief(Path file, List<Findings> findings, Optional<PartsCheck> check, Figure multiples,
                             List<Figure> overviews) {
    }

    /** The charts the template places; those the view does not draw are left out. */
    private static List<Figure> figures(Series series, Findings findings, BriefView view) {
        Captions captions = captions(series, findings);
        List<Figure> figures = new ArrayList<>();
        figures.add(OverviewChart.of(series, findings, captions));
        if (view.charts().profile().drawn()) {
            figures.add(SeasonalProfileChart.of(findings.seasonality(), captions));
        }
        if (view.charts().years().drawn()) {
            figures.add(YearOverlayChart.of(series, captions));
        }
        if (view.charts().irregular().drawn()) {
            figures.add(IrregularChart.of(series, findings, captions));
        }
        if (findings.outlook() != null) {
            figures.add(OutlookChart.of(series, findings.outlook(), captions));
        }
        return figures;
    }

    /** The charts' words, from the narrative. */
    private static Captions captions(Series series, Findings findings) {
        return new Captions(ChartWords.observed(), ChartWords.trendCycle(findings), ChartWords.forecast(),
                ChartWords.forecastMean(), ChartWords.interval(80), ChartWords.interval(95),
                ChartWords.profileAxis(series, findings), ChartWords.irregularAxis(series, findings),
                ChartWords.earlierYears(series));
    }

    private static List<String> concat(List<String> list, String item) {
        List<String> all = new ArrayList<>(list);
        all.add(item);
        return all;
    }

    /**
     * The brief made: where it is, what it found, warnings for the user (characters the font
     * lacks) and the charts it placed.
     */
    public record Brief(Path file, String series, Findings findings, List<String> warnings, List<Figure> figures) {
    }

    static SourceFacts sourceFacts(ReadResult read) {
        StringBuilder reading = new StringBuilder();
        reading.append(read.charset()).append(", ").append(read.delimiterName()).append("-separated, ").append(read.layout()).append(" layout, periods written ").append(read.periodFormat());
        read.dateOrder().ifPresent(o -> reading.append(", dates read ").append(o.name().toLowerCase(Locale.ROOT).replace('_', '-')));
        read.decimalMark().ifPresent(m -> reading.append(", decimal ").append(m.name().toLowerCase(Locale.ROOT)));
        read.aggregation().ifPresent(a -> reading.append("; aggregated to ").append(a.target()).append(" by ")
                .append(a.method().label()));
        return new SourceFacts(java.nio.file.Path.of(read.file()).getFileName().toString(), read.sha256(), read.rowsRead(), reading.toString(),
                read.warnings().stream().map(DataProblem::toString).toList());
    }

    /** The series up to the period the brief reports, when one is named. */
    static Series cutAtLatest(Series series, BriefRequest request, ReadResult read) {
        if (request.latestPeriod().isEmpty()) {
            return series;
        }
        String label = request.latestPeriod().get();
        return series.upTo(series.periodLabelled(label).orElseThrow(() -> new DataProblemException(new DataProblem(
                read.file(), 0, 0, "series '" + series.name() + "' has no period " + label + "; expected a period from "
                + series.start() + " to " + series.end() + ", written as " + series.start()))));
    }

    private static Series choose(ReadResult read, BriefRequest request) {
        if (request.series().isPresent()) {
            return read.require(request.series().get());
        }
        if (read.series().size() > 1) {
            List<DerivedSeries.Derived> derived = DerivedSeries.of(read.series());
            String derivedNames = derived.isEmpty() ? "" : ", or a derived " + String.join(", ", derived.stream()
                    .map(d -> "'" + d.series().name() + "'").toList());
            throw new DataProblemException(new DataProblem(read.file(), 0, 0, "holds " + read.series().size()
                    + " series; expected --series with one of " + read.names() + derivedNames));
        }
        return read.series().get(0);
    }

    /** The same input always gets the same PDF trailer ID, so that equal briefs are equal files. */
    private static long documentId(String sha256, String seriesName) {
        byte[] digest = HexFormat.of().parseHex(sha256);
        return ByteBuffer.wrap(digest).getLong() ^ seriesName.hashCode();
    }
}
