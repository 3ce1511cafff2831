package org.annalist.brief;

import java.nio.ByteBuffer;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import org.annalist.chart.Captions;
import org.annalist.chart.Figure;
import org.annalist.chart.IrregularChart;
import org.annalist.chart.OutlookChart;
import org.annalist.chart.OverviewChart;
import org.annalist.chart.SeasonalProfileChart;
import org.annalist.chart.SmallMultiplesChart;
import org.annalist.chart.YearOverlayChart;
import org.annalist.findings.FigurePlan;
import org.annalist.findings.Findings;
import org.annalist.findings.PartsCheck;
import org.annalist.narrative.DataNotes;
import org.annalist.narrative.SourceFacts;
import org.annalist.ingest.DataProblem;
import org.annalist.ingest.ReadResult;
import org.annalist.narrative.BriefView;
import org.annalist.narrative.BriefViews;
import org.annalist.narrative.ChartWords;
import org.annalist.narrative.Masthead;
import org.annalist.narrative.MultiBriefView;
import org.annalist.narrative.MultiBriefViews;
import org.annalist.narrative.RenderedTemplate;
import org.annalist.narrative.TemplateEngine;
import org.annalist.render.Fonts;
import org.annalist.render.PdfRenderer;
import org.annalist.render.Sandbox;
import org.annalist.render.TemplateMistakeException;
import org.annalist.series.Series;

/**
 * The output step of a brief: findings → charts and narrative → PDF, written atomically, so that a
 * failure never leaves a half-written file where a good one was. The same inputs give the same
 * bytes (the time stated and the PDF's document ID are pinned by the caller and the input).
 */
final class BriefWriter {

    /**
     * A single-series brief written: where, of which series, what it found, warnings for the user
     * (characters the font lacks) and the charts it placed.
     */
    record Brief(Path file, String series, Findings findings, List<String> warnings, List<Figure> figures) {
    }

    /**
     * A multi-series brief written: where, each series' findings, the parts-and-total check, its
     * charts (the small multiples, and each series' overview in the order of {@code findings}).
     */
    record CombinedBrief(Path file, List<Findings> findings, Optional<PartsCheck> check, Figure multiples,
                         List<Figure> overviews) {
    }

    /**
     * What a brief's page says about itself, the same for both kinds of brief.
     *
     * @param title       the title as this brief prints it
     * @param generatedAt resolved: the time the brief states as made
     * @param notes       warnings about the series beside the reader's own (negative counts, holiday dates outside the data)
     * @param cut         where the series was cut short of the file's end at the job's latest period, if it was
     */
    record Page(Job.Input input, ReadResult read, BriefOutput.MastheadChoices choices, String title,
                Instant generatedAt, Path output, List<String> notes, Optional<SourceFacts.Cut> cut) {
        Page {
            notes = List.copyOf(notes);
        }
    }

    private final PdfRenderer renderer = new PdfRenderer();

    /**
     * The bundled templates' engine, kept for the JVM's life, so that a batch, the demo or a
     * long-running process parses each template once rather than once a brief (FreeMarker keeps
     * what it parsed; its templates may be filled on several threads at once).
     */
    private static final class Bundled {
        /**
         * Made where first asked for (a holder class), so that a brief's warm-up can make it on
         * the spare core: FreeMarker's set-up is a few tens of milliseconds in a cold JVM.
         */
        static final TemplateEngine ENGINE = new TemplateEngine(Optional.empty());
    }

    /**
     * Starts the brief's set-up ahead on a second thread ({@link PdfWarmUp}) for a brief of these
     * choices: with the bundled templates, the one the brief is filled from is parsed too.
     */
    static void warmUp(BriefOutput.MastheadChoices choices, boolean combined) {
        PdfWarmUp.start(choices.templates().isPresent() ? Optional.empty()
                : Optional.of(combined ? TemplateEngine.MULTI_TEMPLATE : TemplateEngine.BRIEF_TEMPLATE),
                choices.language(), () -> Bundled.ENGINE);
    }

    /** A user's template folders' engines, kept for this writer's life (a batch): each folder parsed once. */
    private final Map<Path, TemplateEngine> engines = new ConcurrentHashMap<>();

    /**
     * The brief of one series before it is laid out in pages: its template's XHTML and the charts it
     * places (the browser workbench shows these; {@link #single} prints them).
     */
    record Draft(RenderedTemplate xhtml, List<Figure> figures, List<String> warnings) {
        Draft {
            figures = List.copyOf(figures);
            warnings = List.copyOf(warnings);
        }
    }

    /** Writes the brief of one series, as analysed into {@code findings}. */
    Brief single(Page page, Series series, Findings findings) {
        Draft draft = draft(page, series, findings);
        byte[] pdf = render(draft.xhtml(), page, draft.figures(), documentId(page.read().sha256(), series.name()));
        write(page, pdf);
        return new Brief(page.output(), series.name(), findings, draft.warnings(), draft.figures());
    }

    /** The brief of one series as its template words it, with its charts, not yet printed. */
    Draft draft(Page page, Series series, Findings findings) {
        Fonts.registerWithAwt();
        Masthead masthead = masthead(page);
        SourceFacts source = sourceFacts(page.read(), page.notes()).withCut(page.cut());
        List<String> warnings = new ArrayList<>();
        String missing = Fonts.missingGlyphs(String.join(" ", page.title(), page.choices().organisation(), series.name(),
                series.unit(), source.file(), String.join(" ", source.notes())));
        if (!missing.isEmpty()) {
            warnings.add(DataNotes.missingGlyphs(missing));
            source = source.withMissingGlyphs(missing);
        }
        FigurePlan plan = FigurePlan.of(series, findings);
        BriefView view = BriefViews.of(series, findings, plan, source, masthead);
        RenderedTemplate xhtml = engine(page).renderTraced(TemplateEngine.BRIEF_TEMPLATE, view, masthead.language());
        return new Draft(xhtml, figures(series, findings, plan), warnings);
    }

    /**
     * Writes the multi-series brief of {@code series}, each analysed into the findings at the same
     * place; with a total named, the other series are checked against it.
     */
    CombinedBrief combined(Page page, List<Series> series, List<Findings> findings, BriefOutput.Combined choices) {
        Fonts.registerWithAwt();
        Masthead masthead = masthead(page);
        Optional<PartsCheck> check = choices.total()
                .flatMap(name -> series.stream().filter(s -> s.name().equals(name)).findFirst())
                .map(t -> PartsCheck.of(t, series.stream().filter(s -> s != t).toList()));
        MultiBriefView view = MultiBriefViews.of(series, findings, sourceFacts(page.read(), page.notes()).withCut(page.cut()),
                masthead, check,
                choices.sortBy());
        RenderedTemplate xhtml = engine(page).renderTraced(TemplateEngine.MULTI_TEMPLATE, view, masthead.language());
        Figure multiples = SmallMultiplesChart.of(series, findings);
        List<Figure> overviews = new ArrayList<>();
        for (int i = 0; i < series.size(); i++) {
            overviews.add(OverviewChart.of(series.get(i), findings.get(i), captions(series.get(i), findings.get(i)))
                    .ofSeries(i));
        }
        List<Figure> figures = new ArrayList<>(overviews);
        figures.add(0, multiples);
        byte[] pdf = render(xhtml, page, figures,
                documentId(page.read().sha256(), String.join("|", series.stream().map(Series::name).toList())));
        write(page, pdf);
        return new CombinedBrief(page.output(), findings, check, multiples, List.copyOf(overviews));
    }

    private TemplateEngine engine(Page page) {
        return page.choices().templates()
                .map(folder -> engines.computeIfAbsent(folder, f -> new TemplateEngine(Optional.of(f))))
                .orElseGet(() -> Bundled.ENGINE);
    }

    /**
     * The PDF of a template's XHTML. The layout engine may read only the template folder's files and
     * the logo (relative links resolve in the template folder, or beside the data file, where
     * nothing may be read); what it refuses, and XHTML it cannot parse, is the template's problem,
     * named by the template's line.
     */
    private byte[] render(RenderedTemplate xhtml, Page page, List<Figure> figures, long documentId) {
        Sandbox sandbox = Sandbox.of(page.choices().templates(), page.choices().logo().stream().toList(),
                page.input().file().toAbsolutePath().getParent());
        try {
            return renderer.render(xhtml.xhtml(), sandbox, figures, page.generatedAt(), documentId);
        } catch (TemplateMistakeException mistake) {
            throw xhtml.problem(mistake.line(), mistake.column(), mistake.evidence(), mistake.getMessage());
        }
    }

    private static void write(Page page, byte[] pdf) {
        List<Path> inputs = new ArrayList<>(List.of(page.input().file()));
        page.choices().logo().ifPresent(inputs::add);
        OutputFiles.write(page.output(), pdf, inputs);
    }

    private static Masthead masthead(Page page) {
        BriefOutput.MastheadChoices c = page.choices();
        return new Masthead(page.title(), c.organisation(), c.language(), c.paper(), page.generatedAt(),
                "Annalist " + Version.current(), c.logo().map(p -> p.toAbsolutePath().toUri().toString()));
    }

    /** The charts the template places; those the view does not draw are left out (package-private for its tests). */
    static List<Figure> figures(Series series, Findings findings, FigurePlan plan) {
        Captions captions = captions(series, findings);
        List<Figure> figures = new ArrayList<>();
        figures.add(OverviewChart.of(series, findings, captions));
        if (plan.shows(FigurePlan.Chart.PROFILE)) {
            figures.add(SeasonalProfileChart.of(findings.seasonality(), captions));
        }
        if (plan.shows(FigurePlan.Chart.YEARS)) {
            figures.add(YearOverlayChart.of(series, captions));
        }
        if (plan.shows(FigurePlan.Chart.IRREGULAR)) {
            figures.add(IrregularChart.of(series, findings, captions));
        }
        if (plan.shows(FigurePlan.Chart.OUTLOOK)) {
            figures.add(OutlookChart.of(series, findings.outlook(), captions));
        }
        return figures;
    }

    /** The charts' words, from the narrative. */
    private static Captions captions(Series series, Findings findings) {
        return new Captions(ChartWords.observed(), ChartWords.trendCycle(findings), ChartWords.forecast(),
                ChartWords.forecastMean(), ChartWords.interval(80), ChartWords.interval(95),
                ChartWords.profileAxis(series, findings), ChartWords.irregularAxis(series, findings),
                ChartWords.earlierYears(series), ChartWords.valueAxis(series));
    }

    /** What the appendix says about the file and how it was read. */
    static SourceFacts sourceFacts(ReadResult read, List<String> notes) {
        SourceFacts.Reading reading = new SourceFacts.Reading(read.charset(), read.delimiterName(), read.layout(),
                read.periodFormat(), read.dateOrder().map(o -> o.name().toLowerCase(Locale.ROOT).replace('_', '-')),
                read.decimalMark().map(m -> m.name().toLowerCase(Locale.ROOT)),
                read.aggregation().map(a -> a.target().toString()), read.aggregation().map(a -> a.method().label()),
                read.sheet().map(s -> "sheet " + s.number() + " '" + s.name() + "' of an " + s.format() + " workbook"));
        return new SourceFacts(Path.of(read.file()).getFileName().toString(), read.sha256(), read.rowsRead(), reading,
                java.util.stream.Stream.concat(java.util.stream.Stream.concat(dataSet(read),
                        read.warnings().stream().map(DataProblem::withFileNameOnly)
                        .map(p -> DataNotes.readerWarning(p.file(), p.where(), p.message()))), notes.stream()).toList(), "",
                Optional.empty());
    }

    /** The dimensions a statistics portal's series share ({@code Unit: Number; Country: Austria}), as a note naming the file. */
    private static java.util.stream.Stream<String> dataSet(ReadResult read) {
        String description = read.keys().description();
        return description.isEmpty() ? java.util.stream.Stream.empty()
                : java.util.stream.Stream.of(Path.of(read.file()).getFileName() + ": " + description);
    }

    /** The same input always gets the same PDF trailer ID, so that equal briefs are equal files. */
    private static long documentId(String sha256, String seriesName) {
        byte[] digest = HexFormat.of().parseHex(sha256);
        return ByteBuffer.wrap(digest).getLong() ^ seriesName.hashCode();
    }
}
