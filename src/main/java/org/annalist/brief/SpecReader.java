package org.annalist.brief;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.annalist.findings.Form;
import org.annalist.findings.Measure;
import org.annalist.findings.Analyst;
import org.annalist.ingest.Aggregation;
import org.annalist.ingest.DataProblemException;
import org.annalist.ingest.DecimalMark;
import org.annalist.ingest.InputFiles;
import org.annalist.ingest.ReadOptions;
import org.annalist.narrative.Masthead;
import org.annalist.narrative.MultiBriefViews;
import org.annalist.series.Frequency;

/**
 * Reads a brief spec ({@link BriefSpec} lists its keys) and validates every entry before any work:
 * the first mistake is refused as a {@link SpecProblem} at its line and column,
 * {@code SPEC:LINE:COLUMN: message}. Keys are checked in a fixed order, so that a spec with
 * several mistakes is always told about the same one first.
 */
public final class SpecReader {

    private static final Set<String> KEYS = Set.of("title", "organisation", "data", "series", "measure", "unit",
            "period", "paper", "language", "templates", "output", "generated_at", "horizon", "side_outputs", "combined",
            "total", "sort_by", "logo", "form", "per_day", "holidays", "date_order", "decimal_mark", "aggregate",
            "aggregate_by", "max_input_mb", "sheet");

    /** A Java array holds at most 2 GB, and so does the reader. */
    static final long MAX_LIMIT_MEGABYTES = 2047;
    /** The most briefs one spec may ask for: a monthly run of every series of a region, with room to spare. */
    public static final int MAX_BRIEFS = 1000;
    /** The largest spec file read: thousands of entries fit in a small fraction of it. */
    static final long MAX_SPEC_BYTES = 4L * 1024 * 1024;

    private final Path spec;
    private final Path folder;
    private final SpecValues values;

    private SpecReader(Path spec) {
        this.spec = spec;
        this.folder = spec.toAbsolutePath().normalize().getParent();
        this.values = new SpecValues(spec, folder);
    }

    /** @throws SpecProblem for the first mistake, at its line and column */
    public static BriefSpec read(Path spec) {
        if (!Files.exists(spec)) {
            throw new SpecProblem(spec, 1, 1, "no such file; expected a brief spec in YAML");
        }
        byte[] bytes;
        try {
            bytes = InputFiles.read(spec, MAX_SPEC_BYTES, "a brief spec in YAML");
        } catch (DataProblemException e) {
            throw new SpecProblem(spec, 1, 1, e.problems().get(0).message());
        }
        try {
            StandardCharsets.UTF_8.newDecoder().decode(java.nio.ByteBuffer.wrap(bytes));
        } catch (java.nio.charset.CharacterCodingException e) {
            throw new SpecProblem(spec, 1, 1, "is not UTF-8 text; expected a spec saved as UTF-8");
        }
        YamlTree.Node root;
        try (Reader reader = new InputStreamReader(new ByteArrayInputStream(bytes), StandardCharsets.UTF_8)) {
            root = YamlTree.read(spec, reader);
        } catch (IOException e) {
            throw new SpecProblem(spec, 1, 1, "cannot be read: " + e.getMessage());
        }
        SpecReader reader = new SpecReader(spec);
        YamlTree.Mapping top = reader.values.mapping(root, "the spec");
        for (Map.Entry<String, YamlTree.Position> key : top.keys().entrySet()) {
            if (!key.getKey().equals("briefs")) {
                throw new SpecProblem(spec, key.getValue().line(), key.getValue().column(), "unknown key '" + key.getKey()
                        + "'; expected 'briefs'");
            }
        }
        YamlTree.Node list = top.entries().get("briefs");
        if (!(list instanceof YamlTree.Sequence briefs) || briefs.items().isEmpty()) {
            YamlTree.Node at = list == null ? top : list;
            throw new SpecProblem(spec, at.line(), at.column(), "expected 'briefs' with a list of one or more briefs");
        }
        if (briefs.items().size() > MAX_BRIEFS) {
            YamlTree.Node over = briefs.items().get(MAX_BRIEFS);
            throw new SpecProblem(spec, over.line(), over.column(), "the spec lists " + briefs.items().size()
                    + " briefs; expected at most " + MAX_BRIEFS + " (split it into several specs)");
        }
        List<BriefSpec.Entry> entries = new ArrayList<>();
        for (YamlTree.Node item : briefs.items()) {
            YamlTree.Mapping m = reader.values.mapping(item, "a brief");
            entries.add(new BriefSpec.Entry(m.line(), reader.job(m)));
        }
        return new BriefSpec(spec, entries);
    }

    private Job job(YamlTree.Mapping m) {
        for (Map.Entry<String, YamlTree.Position> key : m.keys().entrySet()) {
            if (!KEYS.contains(key.getKey())) {
                throw new SpecProblem(spec, key.getValue().line(), key.getValue().column(), "unknown key '" + key.getKey()
                        + "'; expected one of " + String.join(", ", KEYS.stream().sorted().toList()));
            }
        }
        YamlTree.Node dataNode = m.entries().get("data");
        if (dataNode == null) {
            throw new SpecProblem(spec, m.line(), m.column(), "this brief has no 'data'; expected the path of a CSV file");
        }
        Path data = values.existingFile(dataNode, "data");
        List<String> series = new ArrayList<>();
        YamlTree.Node seriesNode = m.entries().get("series");
        if (seriesNode instanceof YamlTree.Sequence s) {
            for (YamlTree.Node n : s.items()) {
                series.add(values.text(n, "series"));
            }
        } else if (seriesNode != null) {
            series.add(values.text(seriesNode, "series"));
        }
        Map<String, Measure> measures = measures(m);
        Map<String, String> units = values.names(m.entries().get("unit"), "unit");
        Masthead.Paper paper = values.optionalWord(m, "paper", Words.PAPER).orElse(Masthead.Paper.A4);
        String language = values.optionalText(m, "language").orElse("en");
        if (!BriefSpec.LANGUAGES.contains(language)) {
            throw values.problemAt(m.entries().get("language"), "language '" + language
                    + "'; the narrative exists in " + String.join(", ", BriefSpec.LANGUAGES));
        }
        Optional<Path> templates = Optional.ofNullable(m.entries().get("templates"))
                .map(n -> values.path(n, "templates"));
        if (templates.isPresent() && !Files.isDirectory(templates.get())) {
            throw values.problemAt(m.entries().get("templates"), "no such folder: " + templates.get());
        }
        YamlTree.Node outputNode = m.entries().get("output");
        String output = outputNode == null ? folder.resolve("{series}-{period}.pdf").toString()
                : values.path(outputNode, "output").toString();
        if (!output.toLowerCase(Locale.ROOT).endsWith(".pdf")) {
            // a brief is a PDF; its side outputs are named after it without the .pdf
            throw values.problemAt(outputNode, "output '" + output + "': a brief is a PDF; expected a name ending in .pdf");
        }
        Optional<Instant> generatedAt = values.optionalText(m, "generated_at").map(t -> {
            try {
                return Instant.parse(t);
            } catch (DateTimeParseException e) {
                throw values.problemAt(m.entries().get("generated_at"), "generated_at '" + t
                        + "'; expected an ISO 8601 UTC time such as 2026-11-20T08:00:00Z");
            }
        });
        Optional<Integer> horizon = horizon(m);
        Set<SideOutputs.Kind> sides = sideOutputs(m.entries().get("side_outputs"));
        boolean combined = values.optionalYesNo(m, "combined").orElse(false);
        if (combined && series.size() < 2) {
            throw values.problemAt(m.entries().get("combined"), "a combined brief needs two or more names under 'series'");
        }
        Optional<String> total = values.optionalText(m, "total");
        if (total.isPresent() && !series.contains(total.get())) {
            throw values.problemAt(m.entries().get("total"), "total '" + total.get() + "' is not one of the series "
                    + series);
        }
        MultiBriefViews.SortBy sortBy = sortBy(m);
        String title = values.optionalText(m, "title").orElse("");
        String organisation = values.optionalText(m, "organisation").orElse("");
        Optional<String> period = values.optionalText(m, "period");
        Optional<Path> logo = values.logo(m.entries().get("logo"));
        // the keys the command line's options have, added after the others: they are checked last
        Optional<Form> form = values.optionalWord(m, "form", Words.FORM);
        boolean perDay = values.optionalYesNo(m, "per_day").orElse(false);
        Optional<Path> holidays = Optional.ofNullable(m.entries().get("holidays"))
                .map(n -> values.existingFile(n, "holidays"));
        ReadOptions reading = readOptions(m);

        BriefOutput.MastheadChoices masthead = new BriefOutput.MastheadChoices(title, organisation, logo, paper,
                Locale.forLanguageTag(language), templates, generatedAt);
        return new Job(new Job.Input(data, reading),
                new SeriesChoice(series, SeriesChoice.WhenUnnamed.THE_ONLY_SERIES, period, units),
                new AnalysisChoices(form, Optional.empty(), measures, holidays, horizon, perDay),
                Optional.of(new BriefOutput(new OutputName.Pattern(output), masthead, sides,
                        combined ? Optional.of(new BriefOutput.Combined(total, sortBy)) : Optional.empty())));
    }

    private Map<String, Measure> measures(YamlTree.Mapping m) {
        Map<String, String> given = values.names(m.entries().get("measure"), "measure");
        Map<String, Measure> measures = new LinkedHashMap<>();
        for (Map.Entry<String, String> e : given.entrySet()) {
            // the command line's words, in any case; auto leaves the series to the inference
            if (!Words.MEASURE.knows(e.getValue())) {
                YamlTree.Node at = ((YamlTree.Mapping) m.entries().get("measure")).entries().get(e.getKey());
                throw values.problemAt(at, "measure of '" + e.getKey() + "' is '" + e.getValue()
                        + "'; expected " + Words.MEASURE.listed());
            }
            Words.MEASURE.valueOf(e.getValue()).ifPresent(kind -> measures.put(e.getKey(), kind));
        }
        return measures;
    }

    private Optional<Integer> horizon(YamlTree.Mapping m) {
        return values.optionalText(m, "horizon").map(t -> {
            try {
                int h = Integer.parseInt(t);
                if (h >= 0 && h <= Analyst.MAX_HORIZON) {
                    return h;
                }
            } catch (NumberFormatException e) {
                // reported below
            }
            throw values.problemAt(m.entries().get("horizon"), "horizon '" + t + "'; expected a whole number from 0 to "
                    + Analyst.MAX_HORIZON);
        });
    }

    private Set<SideOutputs.Kind> sideOutputs(YamlTree.Node node) {
        Set<SideOutputs.Kind> sides = EnumSet.noneOf(SideOutputs.Kind.class);
        if (node == null) {
            return sides;
        }
        List<YamlTree.Node> items = node instanceof YamlTree.Sequence seq ? seq.items() : List.of(node);
        for (YamlTree.Node n : items) {
            String kind = values.text(n, "side_outputs");
            try {
                sides.add(SideOutputs.Kind.valueOf(kind.toUpperCase(Locale.ROOT)));
            } catch (IllegalArgumentException e) {
                throw values.problemAt(n, "side output '" + kind + "'; expected findings, components or charts");
            }
        }
        return sides;
    }

    private MultiBriefViews.SortBy sortBy(YamlTree.Mapping m) {
        String sortText = values.optionalText(m, "sort_by").orElse("order");
        try {
            return MultiBriefViews.SortBy.valueOf(sortText.toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw values.problemAt(m.entries().get("sort_by"), "sort_by '" + sortText
                    + "'; expected order, name, latest, change or year_to_date");
        }
    }

    /** The reading keys, as the command line's {@code --date-order}, {@code --decimal-mark}, {@code --aggregate} and {@code --sheet}. */
    private ReadOptions readOptions(YamlTree.Mapping m) {
        ReadOptions options = ReadOptions.defaults();
        options = options.withDateOrder(values.optionalWord(m, "date_order", Words.DATE_ORDER)
                .orElse(options.dateOrder()));
        Optional<DecimalMark> mark = values.optionalWord(m, "decimal_mark", Words.DECIMAL_MARK);
        if (mark.isPresent()) {
            options = options.withDecimalMark(mark.get());
        }
        Optional<String> sheet = values.optionalText(m, "sheet");
        if (sheet.isPresent()) {
            options = options.withSheet(sheet.get());
        }
        Optional<Frequency> aggregate = values.optionalWord(m, "aggregate", Words.AGGREGATE);
        Optional<Aggregation.Method> by = values.optionalWord(m, "aggregate_by", Words.AGGREGATE_BY);
        if (by.isPresent() && aggregate.isEmpty()) {
            throw values.problemAt(m.entries().get("aggregate_by"), "aggregate_by without aggregate; expected "
                    + "aggregate: " + Words.AGGREGATE.listed() + " beside it");
        }
        if (aggregate.isPresent()) {
            options = options.withAggregation(new Aggregation(aggregate.get(), by.orElse(Aggregation.Method.SUM)));
        }
        Optional<String> limit = values.optionalText(m, "max_input_mb");
        if (limit.isPresent()) {
            long megabytes;
            try {
                megabytes = Long.parseLong(limit.get());
            } catch (NumberFormatException e) {
                megabytes = -1;
            }
            if (megabytes < 1 || megabytes > MAX_LIMIT_MEGABYTES) {
                throw values.problemAt(m.entries().get("max_input_mb"), "max_input_mb '" + limit.get()
                        + "'; expected a whole number of megabytes from 1 to " + MAX_LIMIT_MEGABYTES);
            }
            options = options.withMaxInputBytes(InputFiles.megabytesToBytes(megabytes));
        }
        return options;
    }
}
