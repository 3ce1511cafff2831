package org.annalist.serve;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Stream;
import org.annalist.brief.BriefPipeline;
import org.annalist.brief.Job;
import org.annalist.brief.SelectionProblem;
import org.annalist.brief.SideOutputs;
import org.annalist.brief.Words;
import org.annalist.ingest.Aggregation;
import org.annalist.ingest.DateOrder;
import org.annalist.ingest.DecimalMark;
import org.annalist.series.Frequency;
import org.annalist.ingest.DataProblemException;
import org.annalist.ingest.ReadOptions;
import org.annalist.render.PageImages;
import org.annalist.series.Series;
import org.eclipse.jetty.http.MultiPart;
import org.eclipse.jetty.http.MultiPartFormData;
import org.eclipse.jetty.util.Fields;

/**
 * The pages of one's own files: the start page (open a file), the data check of a file, a series'
 * findings with its settings, and a brief made from them (its pages as pictures, its files to save).
 */
final class FilePages {

    /** A session keeps at most this many files open; closing one makes room. */
    static final int MAX_OPEN_FILES = 20;
    /** What a multipart request may carry beside the file: the token, the boundaries, the part headers. */
    static final long FORM_SLACK = 64 * 1024;
    /** The preview's pages: 96 dpi, a screen's own size. */
    private static final int PREVIEW_DPI = 96;

    private final Routes routes;
    private final Settings settings;

    FilePages(Routes routes, Settings settings) {
        this.routes = routes;
        this.settings = settings;
    }

    void home(Exchange ex, Session session, List<FileView.Problem> problems, String refusedName) {
        routes.page(ex, problems.isEmpty() && refusedName.isEmpty() ? 200 : 422, "home.ftlh", session, Map.of(
                "problems", problems, "refusedName", refusedName, "full", session.files().size() >= MAX_OPEN_FILES));
    }

    /** A file sent from the browser: kept in the session's folder under its own name, read once, checked. */
    void upload(Exchange ex, Session session) throws IOException {
        Path incoming = session.newFolder(session.nextId('u'));
        try {
            Optional<MultiPartFormData.Parts> form = MultipartForms.read(ex, session, routes, incoming, 10,
                    settings.maxUploadBytes(), settings.maxUploadBytes() + FORM_SLACK);
            if (form.isEmpty()) {
                return;
            }
            try (MultiPartFormData.Parts parts = form.get()) {
                MultiPart.Part token = parts.getFirst("token");
                if (token == null || !session.tokenMatches(token.getContentAsString(StandardCharsets.UTF_8))) {
                    routes.refuse(ex, Routes.Refusal.NO_TOKEN, session);
                    return;
                }
                MultiPart.Part data = parts.getFirst("data");
                if (data == null || data.getFileName() == null || data.getFileName().isBlank()) {
                    home(ex, session, List.of(), " ");
                    return;
                }
                if (session.files().size() >= MAX_OPEN_FILES) {
                    home(ex, session, List.of(), SafePaths.uploadName(data.getFileName()));
                    return;
                }
                String name = SafePaths.uploadName(data.getFileName());
                String id = session.nextId('f');
                Path folder = session.newFolder(id);
                Path stored = folder.resolve(name);
                data.writeTo(stored);
                Optional<ReadOptions> options = readOptions(parts);
                if (options.isEmpty()) {
                    Session.delete(folder);
                    routes.refuse(ex, Routes.Refusal.BAD_REQUEST, session);
                    return;
                }
                Job.Input input = new Job.Input(stored, options.get());
                try {
                    OpenFile file = new OpenFile(id, name, stored, input, session.read().read(input));
                    session.add(file);
                    ex.redirect("/file/" + id);
                } catch (DataProblemException problem) {
                    Session.delete(folder);
                    home(ex, session, problem.problems().stream().map(FileView.Problem::of).toList(), name);
                }
            }
        } finally {
            Session.delete(incoming);
        }
    }

    /**
     * The reading options of the form, in the words the command line's options take ({@link Words}):
     * empty when a field holds a word that is not one of them (the page offers only those).
     */
    private Optional<ReadOptions> readOptions(MultiPartFormData.Parts parts) {
        ReadOptions options = ReadOptions.defaults().withMaxInputBytes(settings.maxUploadBytes());
        String order = field(parts, "dateorder");
        String mark = field(parts, "decimal");
        String aggregate = field(parts, "aggregate");
        String by = field(parts, "aggregateby");
        String sheet = field(parts, "sheet");
        if (!order.isEmpty()) {
            Optional<DateOrder> o = Words.DATE_ORDER.valueOf(order);
            if (o.isEmpty()) {
                return Optional.empty();
            }
            options = options.withDateOrder(o.get());
        }
        if (!mark.isEmpty() && !Words.DECIMAL_MARK.isAuto(mark)) {
            Optional<DecimalMark> m = Words.DECIMAL_MARK.valueOf(mark);
            if (m.isEmpty()) {
                return Optional.empty();
            }
            options = options.withDecimalMark(m.get());
        }
        if (!aggregate.isEmpty()) {
            Optional<Frequency> to = Words.AGGREGATE.valueOf(aggregate);
            Optional<Aggregation.Method> method = by.isEmpty() ? Optional.of(Aggregation.Method.SUM)
                    : Words.AGGREGATE_BY.valueOf(by);
            if (to.isEmpty() || method.isEmpty()) {
                return Optional.empty();
            }
            options = options.withAggregation(new Aggregation(to.get(), method.get()));
        }
        if (!sheet.isEmpty()) {
            options = options.withSheet(sheet);
        }
        return Optional.of(options);
    }

    private static String field(MultiPartFormData.Parts parts, String name) {
        MultiPart.Part part = parts.getFirst(name);
        String value = part == null ? "" : part.getContentAsString(StandardCharsets.UTF_8).strip();
        return value.length() > 100 ? value.substring(0, 100) : value;
    }

    void check(Exchange ex, Session session, OpenFile file) {
        routes.page(ex, 200, "file.ftlh", session, Map.of("file", FileView.of(file)));
    }

    /** The series' position in the file, from the address. */
    static Optional<Integer> index(String segment, OpenFile file) {
        if (!segment.matches("[0-9]{1,6}")) {
            return Optional.empty();
        }
        int i = Integer.parseInt(segment);
        return i < file.read().read().series().size() ? Optional.of(i) : Optional.empty();
    }

    /** The findings as the brief states them, for the settings in the query; the file is not read again. */
    void series(Exchange ex, Session session, OpenFile file, int index) {
        series(ex, session, file, index, SeriesSettings.from(ex::query), List.of());
    }

    /**
     * The series' page with {@code chosen}; {@code refused} says what was wrong with a logo or holidays
     * file just sent (the page answers 422 then, and the files in use stay as they were).
     */
    void series(Exchange ex, Session session, OpenFile file, int index, SeriesSettings chosen,
                List<FileView.Problem> refused) {
        Series series = file.read().read().series().get(index);
        BriefExtras extras = session.extras(file.id());
        Job job = chosen.job(file, extras, series.name(), session.folder().resolve("preview.pdf"),
                settings.generatedAt(), Set.of());
        Map<String, Object> model = seriesModel(file, index, series, chosen);
        model.put("logoName", BriefExtras.name(extras.logo()));
        model.put("holidaysName", BriefExtras.name(extras.holidays()));
        model.put("refused", refused);
        long started = System.nanoTime();
        int status = refused.isEmpty() ? 200 : 422;
        try {
            BriefPipeline.Preview preview = session.pipeline().preview(job);
            model.put("draft", DraftFragment.of(preview, extras.logo()));
            model.put("warnings", preview.warnings());
        } catch (SelectionProblem problem) {
            model.put("problem", problem.reason().plainly());
            status = 422;
        } catch (DataProblemException problem) {
            model.put("problems", problem.problems().stream().map(FileView.Problem::of).toList());
            status = 422;
        }
        model.put("millis", (System.nanoTime() - started) / 1_000_000);
        routes.page(ex, status, "series.ftlh", session, model);
    }

    private static Map<String, Object> seriesModel(OpenFile file, int index, Series series, SeriesSettings chosen) {
        Map<String, Object> model = new LinkedHashMap<>();
        model.put("fileId", file.id());
        model.put("fileName", file.name());
        model.put("index", index);
        model.put("seriesName", series.name());
        model.put("settings", chosen);
        model.put("hidden", chosen.fields());
        model.put("draft", "");
        model.put("warnings", List.of());
        model.put("problem", "");
        model.put("problems", List.of());
        return model;
    }

    /** Makes the brief with the settings of the form, and its side outputs, in a folder of its own. */
    void makeBrief(Exchange ex, Session session, OpenFile file, int index, Fields form) throws IOException {
        SeriesSettings chosen = SeriesSettings.from(name -> Optional.ofNullable(form.getValue(name)));
        Series series = file.read().read().series().get(index);
        String id = session.nextId('b');
        Path folder = session.newFolder(id);
        String base = file.name().replaceFirst("\\.[^.]+$", "");
        String pdf = slug(base + "-" + series.name()) + ".pdf";
        Job job = chosen.job(file, session.extras(file.id()), series.name(), folder.resolve(pdf),
                settings.generatedAt(), EnumSet.allOf(SideOutputs.Kind.class));
        BriefPipeline.Made made;
        try {
            made = session.pipeline().briefs(job).get(0);
        } catch (SelectionProblem | DataProblemException problem) {
            Session.delete(folder);
            ex.redirect("/file/" + file.id() + "/series/" + index + "?" + chosen.query());
            return;
        }
        List<String> written = new ArrayList<>();
        written.add(pdf);
        try (Stream<Path> list = Files.list(folder)) {
            list.map(p -> p.getFileName().toString()).filter(n -> !n.equals(pdf)).sorted().forEach(written::add);
        }
        String title = chosen.title().isEmpty() ? series.name() : chosen.title();
        session.add(new MadeBrief(id, file.id(), index, title, folder, pdf, written, PageImages.pages(made.file()),
                made.warnings()));
        ex.redirect("/brief/" + id);
    }

    void brief(Exchange ex, Session session, MadeBrief brief) {
        routes.page(ex, 200, "brief.ftlh", session, Map.of("brief", brief));
    }

    void pageImage(Exchange ex, MadeBrief brief, String segment) {
        if (!segment.matches("[0-9]{1,3}\\.png")) {
            routes.refuse(ex, Routes.Refusal.NOT_FOUND, null);
            return;
        }
        int page = Integer.parseInt(segment.substring(0, segment.length() - 4));
        if (page < 1 || page > brief.pages()) {
            routes.refuse(ex, Routes.Refusal.NOT_FOUND, null);
            return;
        }
        ex.send(200, "image/png", PageImages.png(brief.folder().resolve(brief.pdf()), page - 1, PREVIEW_DPI));
    }

    /** One of the files the brief wrote, by the name the page offered; nothing else. */
    void download(Exchange ex, MadeBrief brief, String name) throws IOException {
        Optional<Path> file = brief.files().contains(name) ? SafePaths.file(brief.folder(), name) : Optional.empty();
        if (file.isEmpty()) {
            routes.refuse(ex, Routes.Refusal.NOT_FOUND, null);
            return;
        }
        ex.download(contentType(name), name, Files.readAllBytes(file.get()));
    }

    static String contentType(String name) {
        String lower = name.toLowerCase(Locale.ROOT);
        return lower.endsWith(".pdf") ? "application/pdf"
                : lower.endsWith(".json") ? "application/json"
                : lower.endsWith(".csv") ? "text/csv; charset=utf-8"
                : lower.endsWith(".svg") ? "image/svg+xml"
                : "application/octet-stream";
    }

    /** A file-name-safe form: lower case, letters and digits, single dashes. */
    static String slug(String text) {
        String slug = text.toLowerCase(Locale.ROOT).replaceAll("[^\\p{L}\\p{N}]+", "-").replaceAll("(^-|-$)", "");
        return slug.isEmpty() ? "brief" : slug;
    }
}
