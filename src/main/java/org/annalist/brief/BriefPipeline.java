package org.annalist.brief;

import java.nio.file.Path;
import java.time.Instant;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.annalist.series.Holiday;
import org.annalist.chart.Figure;
import org.annalist.findings.FigurePlan;
import org.annalist.findings.Findings;
import org.annalist.render.SvgCharts;
import org.annalist.ingest.DataProblemException;
import org.annalist.ingest.SeriesKeys;
import org.annalist.series.Series;

/**
 * The one way through the pipeline, for every command and every spec entry: a {@link Job} is read
 * ({@link SeriesFiles}: each file once), its series selected and prepared ({@link SeriesSelection}:
 * by name or a derived ratio, per-day figures, units, cut at the latest period), analysed
 * ({@link org.annalist.findings.Analyst} with the job's {@link AnalysisChoices}), and turned into
 * outputs: the findings ({@code analyze}), or a PDF with its side outputs ({@code brief},
 * {@code batch}, {@code demo}), or the combined brief of several series.
 *
 * <p>The steps run in this order for every job: the holiday file, the data file, the selection,
 * the analysis, the outputs. {@link Batch} runs the same steps, planning first so that each
 * brief's problems stay its own.
 */
public final class BriefPipeline {

    /**
     * The brief(s) a job made.
     *
     * @param file     the PDF
     * @param series   the series it is about, as analysed
     * @param findings what the analysis found, one per series
     * @param warnings for the user: what was read ({@link ReadingWarnings}), characters the brief's font lacks
     */
    public record Made(Path file, List<Series> series, List<Findings> findings, List<String> warnings) {
        public Made {
            series = List.copyOf(series);
            findings = List.copyOf(findings);
            warnings = List.copyOf(warnings);
        }
    }

    private final SeriesFiles files;
    private final BriefWriter writer = new BriefWriter();

    /** A pipeline that reads its files afresh. */
    public BriefPipeline() {
        this(new SeriesFiles());
    }

    /** A pipeline that shares the files already read (a batch, the demo). */
    public BriefPipeline(SeriesFiles files) {
        this.files = files;
    }

    SeriesFiles files() {
        return files;
    }

    /**
     * The findings of every series the job selects, in order ({@code analyze}).
     *
     * @throws DataProblemException when the data or holiday file cannot be used
     * @throws SelectionProblem     when the series cannot be selected as asked
     */
    public List<Findings> findings(Job job) {
        return analysed(job).findings();
    }

    /**
     * The findings of every series the job selects, with the warnings about what was read
     * ({@link ReadingWarnings}).
     *
     * @param findings one per series, in order
     * @param warnings the reader's warnings and those about the series, for the user
     */
    public record Analysed(List<Findings> findings, List<String> warnings) {
        public Analysed {
            findings = List.copyOf(findings);
            warnings = List.copyOf(warnings);
        }
    }

    /** As {@link #findings}, with the warnings ({@code analyze}). */
    public Analysed analysed(Job job) {
        Rendered<Findings> rendered = rendered(job, findings -> findings);
        return new Analysed(rendered.outputs(), rendered.warnings());
    }

    /**
     * What {@link #analysed} gives, with each series' findings turned into {@code render}'s output as
     * soon as they are made and then let go: a file of thousands of series ({@code analyze} as text)
     * holds their notes, not their findings.
     *
     * @param outputs  one per series, in order
     * @param warnings as {@link Analysed#warnings}
     */
    public record Rendered<T>(List<T> outputs, List<String> warnings) {
        public Rendered {
            outputs = List.copyOf(outputs);
            warnings = List.copyOf(warnings);
        }
    }

    /** As {@link #analysed}, each series' findings rendered by {@code render} (which must be safe on several threads). */
    public <T> Rendered<T> rendered(Job job, Function<Findings, T> render) {
        List<Holiday> holidays = holidays(job);
        SeriesFiles.ReadFile file = files.read(job.input());
        List<String> warnings = new ArrayList<>(ReadingWarnings.ofFile(file.read()));
        List<SeriesSelection.Selected> selected = new ArrayList<>();
        for (SeriesSelection.Wanted wanted : SeriesSelection.wanted(job.series(), file)) {
            selected.add(SeriesSelection.select(job, file, wanted, true));
        }
        Optional<Path> holidayFile = shownHolidays(job);
        List<Analysis<T>> all = analyseAll(selected, s -> {
            Findings findings = analyse(job, s, file.read().keys(), holidays);
            return new Analysis<>(render.apply(findings),
                    ReadingWarnings.ofSeries(s.series(), findings, holidayFile, holidays));
        });
        List<T> outputs = new ArrayList<>(all.size());
        for (Analysis<T> analysis : all) {
            outputs.add(analysis.output());
            warnings.addAll(analysis.warnings());
        }
        return new Rendered<>(outputs, warnings);
    }

    /** One series' rendered findings and the warnings about it. */
    private record Analysis<T>(T output, List<String> warnings) {
    }

    /**
     * Analyses the selected series, on every core when there are several (a file of thousands of
     * series), and returns what {@code analysis} made of each in the selection's order: each series'
     * findings depend only on the series, so the order of the work changes nothing but the time.
     */
    private static <T> List<T> analyseAll(List<SeriesSelection.Selected> selected,
                                          Function<SeriesSelection.Selected, T> analysis) {
        if (selected.size() < 2) {
            return selected.stream().map(analysis).toList();
        }
        return selected.parallelStream().map(analysis).toList();
    }

    /**
     * The briefs a job asks for, written: one per series it selects, or one combined brief of them
     * all ({@code brief}, {@code demo}).
     *
     * @throws DataProblemException when the data or holiday file cannot be used
     * @throws SelectionProblem     when the series cannot be selected as asked
     */
    public List<Made> briefs(Job job) {
        BriefOutput output = job.requireBrief();
        // before the file is read: the warm-up needs nothing from it
        BriefWriter.warmUp(output.masthead(), output.combined().isPresent());
        List<Holiday> holidays = holidays(job);
        SeriesFiles.ReadFile file = files.read(job.input());
        Instant generatedAt = GenerationTime.orDefault(output.masthead().generatedAt());
        if (output.combined().isPresent()) {
            List<SeriesSelection.Selected> all = SeriesSelection.all(job, file, false);
            return List.of(make(job, file, all, holidays, combinedOutput(output, all), generatedAt));
        }
        List<Made> made = new ArrayList<>();
        for (SeriesSelection.Wanted wanted : SeriesSelection.wanted(job.series(), file)) {
            SeriesSelection.Selected selected = SeriesSelection.select(job, file, wanted, true);
            made.add(make(job, file, List.of(selected), holidays, singleOutput(output, selected), generatedAt));
        }
        return made;
    }

    /**
     * The brief of the job's one series as a screen shows it (the browser workbench): the
     * template's XHTML, each chart as SVG by the id the page places it with, what was found, and
     * the warnings. Nothing is written; the file is read once for the pipeline's {@link SeriesFiles}.
     *
     * @param charts SVG documents by figure id ({@code overview}, {@code profile}, …), in the page's order
     */
    public record Preview(String xhtml, Map<String, String> charts, Series series, Findings findings,
                          List<String> warnings) {
        public Preview {
            charts = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(charts));
            warnings = List.copyOf(warnings);
        }
    }

    /**
     * The preview of the brief the job describes, of its first selected series.
     *
     * @throws DataProblemException when the data or holiday file cannot be used
     * @throws SelectionProblem     when the series cannot be selected as asked
     */
    public Preview preview(Job job) {
        BriefOutput output = job.requireBrief();
        List<Holiday> holidays = holidays(job);
        SeriesFiles.ReadFile file = files.read(job.input());
        SeriesSelection.Selected selected = SeriesSelection.select(job, file,
                SeriesSelection.wanted(job.series(), file).get(0), true);
        Series series = selected.series();
        Findings findings = analyse(job, selected, file.read().keys(), holidays);
        List<String> warnings = new ArrayList<>(ReadingWarnings.ofFile(file.read()));
        List<String> seriesWarnings = ReadingWarnings.ofSeries(series, findings, shownHolidays(job), holidays);
        warnings.addAll(seriesWarnings);
        BriefWriter.Page page = new BriefWriter.Page(job.input(), file.read(), output.masthead(),
                output.titleFor(job.series(), series), GenerationTime.orDefault(output.masthead().generatedAt()),
                singleOutput(output, selected), seriesWarnings, selected.cut());
        BriefWriter.Draft draft = writer.draft(page, series, findings);
        warnings.addAll(draft.warnings());
        Map<String, String> charts = new LinkedHashMap<>();
        for (Figure figure : draft.figures()) {
            charts.put(figure.id(), new String(SvgCharts.svg(figure, figure.kind() == FigurePlan.Chart.OVERVIEW
                    ? PREVIEW_CHART_HEIGHT : PREVIEW_SMALL_CHART_HEIGHT), StandardCharsets.UTF_8));
        }
        return new Preview(draft.xhtml().xhtml(), charts, series, findings, warnings);
    }

    /** The brief's chart heights (70 mm, 56 mm) at 96 px per inch. */
    private static final int PREVIEW_CHART_HEIGHT = 265;
    private static final int PREVIEW_SMALL_CHART_HEIGHT = 212;

    /** The holidays the job's analysis estimates, read from its holiday file (none without one). */
    List<Holiday> holidays(Job job) {
        return job.analysis().holidays().map(files::holidays).orElse(List.of());
    }

    /** The job's holiday file as messages and briefs name it ({@link SeriesFiles#shownAs}). */
    private Optional<Path> shownHolidays(Job job) {
        return job.analysis().holidays().map(file -> Path.of(files.shownAs(file)));
    }

        /** Where the brief of one selected series goes. */
    static Path singleOutput(BriefOutput output, SeriesSelection.Selected selected) {
        return output.file().resolve(selected.series().name(), selected.latestPeriod());
    }

    /** Where a combined brief goes: named after its title ("combined" without one) and its first series' latest period. */
    static Path combinedOutput(BriefOutput output, List<SeriesSelection.Selected> series) {
        String title = output.masthead().title();
        return output.file().resolve(title.isEmpty() ? "combined" : title, series.get(0).latestPeriod());
    }

    /**
     * Analyses the selected series and writes the job's brief of them (a combined one when the job
     * asks for it) and its side outputs.
     */
    Made make(Job job, SeriesFiles.ReadFile file, List<SeriesSelection.Selected> selected, List<Holiday> holidays,
              Path output, Instant generatedAt) {
        BriefOutput out = job.requireBrief();
        List<Series> series = selected.stream().map(SeriesSelection.Selected::series).toList();
        List<Findings> findings = new ArrayList<>();
        for (SeriesSelection.Selected s : selected) {
            findings.add(analyse(job, s, file.read().keys(), holidays));
        }
        List<String> seriesWarnings = new ArrayList<>();
        for (int i = 0; i < series.size(); i++) {
            seriesWarnings.addAll(ReadingWarnings.ofSeries(series.get(i), findings.get(i), shownHolidays(job),
                    holidays));
        }
        List<String> warnings = new ArrayList<>(ReadingWarnings.ofFile(file.read()));
        warnings.addAll(seriesWarnings);
        BriefWriter.Page page = new BriefWriter.Page(job.input(), file.read(), out.masthead(),
                out.titleFor(job.series(), series.get(0)), generatedAt, output, seriesWarnings, selected.get(0).cut());
        if (out.combined().isPresent()) {
            BriefWriter.CombinedBrief combined = writer.combined(page, series, findings, out.combined().get());
            SideOutputs.write(combined, series, out.sideOutputs());
            return new Made(combined.file(), series, findings, warnings);
        }
        BriefWriter.Brief brief = writer.single(page, series.get(0), findings.get(0));
        SideOutputs.write(brief, series.get(0), out.sideOutputs());
        warnings.addAll(brief.warnings());
        return new Made(brief.file(), series, findings, warnings);
    }

    /** The analysis step: a derived ratio is analysed with its parts, whose sums its spans compare. */
    private static Findings analyse(Job job, SeriesSelection.Selected selected, SeriesKeys keys, List<Holiday> holidays) {
        var analyst = job.analysis().analystFor(selected.series().name(), keys, holidays);
        return selected.parts().isPresent()
                ? analyst.analyse(selected.series(), selected.parts().get())
                : analyst.analyse(selected.series());
    }
}
