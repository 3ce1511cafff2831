package org.annalist.brief;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.annalist.findings.Analyst;
import org.annalist.narrative.Masthead;
import org.annalist.narrative.MultiBriefViews;

/**
 * A brief spec: the briefs an analyst makes every month, described once in YAML and validated
 * before any work. Our own keys (documented in the README):
 *
 * <pre>
 * briefs:
 *   - title: Guest nights in Quennelmark        # default: the series name
 *     organisation: Quennelmark Visitor Board   # default: none
 *     logo: logo.png                            # a PNG, JPEG or GIF printed in the masthead
 *     data: data/guest-nights.csv               # required
 *     series: [Total, Domestic]                 # default: the file's only series
 *     measure: {Total: flow}                    # flow or level per series; default: from unit and name
 *     unit: {Total: nights}                     # overrides the unit read from the file
 *     period: 2026-10                           # the latest period to report; default: the last in the data
 *     paper: a4                                 # a4 or letter
 *     language: en                              # the narrative's language; English for now
 *     templates: templates/                     # a folder of brief.ftlx / brief.css overrides
 *     output: out/{series}-{period}.pdf         # {series} and {period} are filled in
 *     generated_at: 2026-11-20T08:00:00Z        # pins the stated time, for identical output
 *     horizon: 14                               # periods of outlook; 0 for none
 *     side_outputs: [findings, components, charts]   # JSON, components CSV, SVG charts beside the PDF
 *     combined: true                            # one multi-series brief of all the series
 *     total: Total                              # the series the others add up to (checked)
 *     sort_by: change                           # order, name, latest, change or year_to_date
 * </pre>
 *
 * Paths resolve against the spec's folder and may not leave its folder tree unless written as
 * absolute paths. A brief naming several series makes one brief per series until the multi-series
 * brief exists.
 *
 * @param file the spec file, for messages
 */
public record BriefSpec(Path file, List<Entry> briefs) {

    /** The languages the narrative is written in. */
    static final Set<String> LANGUAGES = Set.of("en");

    private static final Set<String> KEYS = Set.of("title", "organisation", "data", "series", "measure", "unit",
            "period", "paper", "language", "templates", "output", "generated_at", "horizon", "side_outputs", "combined",
            "total", "sort_by", "logo");

    /**
     * One entry of {@code briefs}.
     *
     * @param line     where it starts in the spec, for messages
     * @param series   empty for the file's only series
     * @param measures {@code flow} or {@code level} by series name
     * @param units    unit by series name
     * @param output   the pattern, resolved against the spec's folder
     * @param everySeries with no {@code series} given, brief every series of the file (the folder
     *                 default) rather than require a file of one series
     */
    public record Entry(int line, String title, String organisation, Path data, List<String> series,
                        Map<String, String> measures, Map<String, String> units, Optional<String> period,
                        Masthead.Paper paper, String language, Optional<Path> templates, String output,
                        Optional<Instant> generatedAt, Optional<Integer> horizon, Set<SideOutputs.Kind> sideOutputs,
                        boolean everySeries, boolean combined, Optional<String> total,
                        MultiBriefViews.SortBy sortBy, Optional<Path> logo) {

        public Entry {
            sideOutputs = Set.copyOf(sideOutputs);
            series = List.copyOf(series);
            measures = Map.copyOf(measures);
            units = Map.copyOf(units);
        }

        /** The output file of one series' brief: the pattern with {series} and {period} filled in. */
        public Path outputFor(String seriesName, String latestPeriod) {
            String name = output.replace("{series}", fileSafe(seriesName)).replace("{period}", latestPeriod);
            return Path.of(name);
        }

    }

    /** A name as it can stand in a file name: {@code Long-haul} → {@code long-haul}. */
    static String fileSafe(String s) {
        return s.toLowerCase(java.util.Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-|-$", "");
    }

    public BriefSpec {
        briefs = List.copyOf(briefs);
    }

    /** The same briefs written into {@code folder}, each under its output pattern's file name. */
    public BriefSpec withOutputFolder(Path folder) {
        Path root = folder.toAbsolutePath().normalize();
        return new BriefSpec(file, briefs.stream().map(e -> new Entry(e.line(), e.title(), e.organisation(), e.data(),
                e.series(), e.measures(), e.units(), e.period(), e.paper(), e.language(), e.templates(),
                root.resolve(Path.of(e.output()).getFileName()).toString(), e.generatedAt(), e.horizon(),
                e.sideOutputs(), e.everySeries(), e.combined(), e.total(), e.sortBy(), e.logo())).toList());
    }

    /**
     * The default spec of a folder: one brief per series of every CSV file in it (by name, not in
     * subfolders), written to {@code briefs/FILE-SERIES-PERIOD.pdf} inside it.
     */
    public static BriefSpec forFolder(Path folder) {
        Path root = folder.toAbsolutePath().normalize();
        List<Entry> entries = new ArrayList<>();
        try (var files = Files.list(root)) {
            List<Path> csvs = files.filter(p -> p.getFileName().toString().toLowerCase(java.util.Locale.ROOT)
                    .endsWith(".csv") && Files.isRegularFile(p)).sorted().toList();
            for (Path csv : csvs) {
                String stem = csv.getFileName().toString().replaceFirst("(?i)\\.csv$", "");
                entries.add(new Entry(0, "", "", csv, List.of(), Map.of(), Map.of(), Optional.empty(),
                        Masthead.Paper.A4, "en", Optional.empty(),
                        root.resolve("briefs").resolve(stem + "-{series}-{period}.pdf").toString(), Optional.empty(),
                        Optional.empty(), SideOutputs.none(), true, false, Optional.empty(),
                        MultiBriefViews.SortBy.ORDER, Optional.empty()));
            }
        } catch (IOException e) {
            throw new SpecProblem(root, 1, 1, "cannot list the folder: " + e.getMessage());
        }
        if (entries.isEmpty()) {
            throw new SpecProblem(root, 1, 1, "no CSV files in this folder; expected one or more *.csv");
        }
        return new BriefSpec(root.resolve("(folder)"), entries);
    }

    /** @throws SpecProblem for the first mistake, at its line and column */
    public static BriefSpec read(Path spec) {
        if (!Files.isRegularFile(spec)) {
            throw new SpecProblem(spec, 1, 1, "no such file; expected a brief spec in YAML");
        }
        YamlTree.Node root;
        try (Reader reader = Files.newBufferedReader(spec, StandardCharsets.UTF_8)) {
            root = YamlTree.read(spec, reader);
        } catch (IOException e) {
            throw new SpecProblem(spec, 1, 1, "cannot be read: " + e.getMessage());
        }
        Path folder = spec.toAbsolutePath().getParent();
        YamlTree.Mapping top = mapping(spec, root, "the spec");
        for (Map.Entry<String, int[]> key : top.keys().entrySet()) {
            if (!key.getKey().equals("briefs")) {
                throw new SpecProblem(spec, key.getValue()[0], key.getValue()[1], "unknown key '" + key.getKey()
                        + "'; expected 'briefs'");
            }
        }
        YamlTree.Node list = top.entries().get("briefs");
        if (!(list instanceof YamlTree.Sequence briefs) || briefs.items().isEmpty()) {
            YamlTree.Node at = list == null ? top : list;
            throw new SpecProblem(spec, at.line(), at.column(), "expected 'briefs' with a list of one or more briefs");
        }
        List<Entry> entries = new ArrayList<>();
        for (YamlTree.Node item : briefs.items()) {
            entries.add(entry(spec, folder, mapping(spec, item, "a brief")));
        }
        return new BriefSpec(spec, entries);
    }

    private static Entry entry(Path spec, Path folder, YamlTree.Mapping m) {
        for (Map.Entry<String, int[]> key : m.keys().entrySet()) {
            if (!KEYS.contains(key.getKey())) {
                throw new SpecProblem(spec, key.getValue()[0], key.getValue()[1], "unknown key '" + key.getKey()
                        + "'; expected one of " + String.join(", ", KEYS.stream().sorted().toList()));
            }
        }
        YamlTree.Node dataNode = m.entries().get("data");
        if (dataNode == null) {
            throw new SpecProblem(spec, m.line(), m.column(), "this brief has no 'data'; expected the path of a CSV file");
        }
        Path data = path(spec, folder, dataNode, "data");
        if (!Files.isRegularFile(data)) {
            throw new SpecProblem(spec, dataNode.line(), dataNode.column(), "no such file: " + data);
        }
        List<String> series = new ArrayList<>();
        YamlTree.Node seriesNode = m.entries().get("series");
        if (seriesNode instanceof YamlTree.Sequence s) {
            for (YamlTree.Node n : s.items()) {
                series.add(text(spec, n, "series"));
            }
        } else if (seriesNode != null) {
            series.add(text(spec, seriesNode, "series"));
        }
        Map<String, String> measures = names(spec, m.entries().get("measure"), "measure");
        for (Map.Entry<String, String> e : measures.entrySet()) {
            if (!e.getValue().equals("flow") && !e.getValue().equals("level")) {
                YamlTree.Node at = ((YamlTree.Mapping) m.entries().get("measure")).entries().get(e.getKey());
                throw new SpecProblem(spec, at.line(), at.column(), "measure of '" + e.getKey()
                        + "' is '" + e.getValue() + "'; expected flow or level");
            }
        }
        Map<String, String> units = names(spec, m.entries().get("unit"), "unit");
        String paperText = optionalText(spec, m, "paper").orElse("a4");
        Masthead.Paper paper = switch (paperText.toLowerCase(java.util.Locale.ROOT)) {
            case "a4" -> Masthead.Paper.A4;
            case "letter" -> Masthead.Paper.LETTER;
            default -> throw problemAt(spec, m.entries().get("paper"), "paper '" + paperText + "'; expected a4 or letter");
        };
        String language = optionalText(spec, m, "language").orElse("en");
        if (!LANGUAGES.contains(language)) {
            throw problemAt(spec, m.entries().get("language"), "language '" + language + "'; the narrative exists in "
                    + String.join(", ", LANGUAGES));
        }
        Optional<Path> templates = Optional.ofNullable(m.entries().get("templates")).map(n -> path(spec, folder, n,
                "templates"));
        if (templates.isPresent() && !Files.isDirectory(templates.get())) {
            throw problemAt(spec, m.entries().get("templates"), "no such folder: " + templates.get());
        }
        YamlTree.Node outputNode = m.entries().get("output");
        String output = outputNode == null ? folder.resolve("{series}-{period}.pdf").toString()
                : path(spec, folder, outputNode, "output").toString();
        Optional<Instant> generatedAt = optionalText(spec, m, "generated_at").map(t -> {
            try {
                return Instant.parse(t);
            } catch (DateTimeParseException e) {
                throw problemAt(spec, m.entries().get("generated_at"), "generated_at '" + t
                        + "'; expected an ISO 8601 UTC time such as 2026-11-20T08:00:00Z");
            }
        });
        Optional<Integer> horizon = optionalText(spec, m, "horizon").map(t -> {
            try {
                int h = Integer.parseInt(t);
                if (h >= 0 && h <= Analyst.MAX_HORIZON) {
                    return h;
                }
            } catch (NumberFormatException e) {
                // reported below
            }
            throw problemAt(spec, m.entries().get("horizon"), "horizon '" + t + "'; expected a whole number from 0 to "
                    + Analyst.MAX_HORIZON);
        });
        Set<SideOutputs.Kind> sides = SideOutputs.none();
        YamlTree.Node sideNode = m.entries().get("side_outputs");
        if (sideNode != null) {
            List<YamlTree.Node> items = sideNode instanceof YamlTree.Sequence seq ? seq.items() : List.of(sideNode);
            for (YamlTree.Node n : items) {
                String kind = text(spec, n, "side_outputs");
                try {
                    sides.add(SideOutputs.Kind.valueOf(kind.toUpperCase(java.util.Locale.ROOT)));
                } catch (IllegalArgumentException e) {
                    throw problemAt(spec, n, "side output '" + kind + "'; expected findings, components or charts");
                }
            }
        }
        String combinedText = optionalText(spec, m, "combined").orElse("false");
        if (!combinedText.equals("true") && !combinedText.equals("false")) {
            throw problemAt(spec, m.entries().get("combined"), "combined '" + combinedText + "'; expected true or false");
        }
        boolean combined = combinedText.equals("true");
        if (combined && series.size() < 2) {
            throw problemAt(spec, m.entries().get("combined"), "a combined brief needs two or more names under 'series'");
        }
        Optional<String> total = optionalText(spec, m, "total");
        if (total.isPresent() && !series.contains(total.get())) {
            throw problemAt(spec, m.entries().get("total"), "total '" + total.get() + "' is not one of the series "
                    + series);
        }
        String sortText = optionalText(spec, m, "sort_by").orElse("order");
        MultiBriefViews.SortBy sortBy;
        try {
            sortBy = MultiBriefViews.SortBy.valueOf(sortText.toUpperCase(java.util.Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw problemAt(spec, m.entries().get("sort_by"), "sort_by '" + sortText
                    + "'; expected order, name, latest, change or year_to_date");
        }
        return new Entry(m.line(), optionalText(spec, m, "title").orElse(""),
                optionalText(spec, m, "organisation").orElse(""), data, series, measures, units,
                optionalText(spec, m, "period"), paper, language, templates, output, generatedAt, horizon, sides, false,
                combined, total, sortBy, logo(spec, folder, m.entries().get("logo")));
    }

    /** The logo, checked to be an image the PDF can embed. */
    private static Optional<Path> logo(Path spec, Path folder, YamlTree.Node node) {
        if (node == null) {
            return Optional.empty();
        }
        Path logo = path(spec, folder, node, "logo");
        Logo.problem(logo).ifPresent(problem -> {
            throw problemAt(spec, node, problem);
        });
        return Optional.of(logo);
    }

    /**
     * A path from the spec, resolved against its folder; a relative path that climbs out of the
     * folder tree is refused (an absolute one is the user's explicit choice).
     */
    private static Path path(Path spec, Path folder, YamlTree.Node node, String key) {
        String text = text(spec, node, key);
        Path given = Path.of(text);
        if (given.isAbsolute()) {
            return given.normalize();
        }
        Path resolved = folder.resolve(given).normalize();
        if (!resolved.startsWith(folder)) {
            throw new SpecProblem(spec, node.line(), node.column(), key + " '" + text + "' leaves the spec's folder; "
                    + "write an absolute path to use a file elsewhere");
        }
        return resolved;
    }

    private static Map<String, String> names(Path spec, YamlTree.Node node, String key) {
        Map<String, String> out = new LinkedHashMap<>();
        if (node == null) {
            return out;
        }
        YamlTree.Mapping m = mapping(spec, node, "'" + key + "' (series name: value)");
        for (Map.Entry<String, YamlTree.Node> e : m.entries().entrySet()) {
            out.put(e.getKey(), text(spec, e.getValue(), key + " of " + e.getKey()));
        }
        return out;
    }

    private static Optional<String> optionalText(Path spec, YamlTree.Mapping m, String key) {
        YamlTree.Node node = m.entries().get(key);
        return node == null ? Optional.empty() : Optional.of(text(spec, node, key));
    }

    private static String text(Path spec, YamlTree.Node node, String what) {
        if (node instanceof YamlTree.Scalar s && s.text() != null && !s.text().isBlank()) {
            return s.text().trim();
        }
        throw new SpecProblem(spec, node.line(), node.column(), what + ": expected a single value");
    }

    private static YamlTree.Mapping mapping(Path spec, YamlTree.Node node, String what) {
        if (node instanceof YamlTree.Mapping m) {
            return m;
        }
        throw new SpecProblem(spec, node.line(), node.column(), what + ": expected a mapping of keys and values");
    }

    private static SpecProblem problemAt(Path spec, YamlTree.Node node, String message) {
        return new SpecProblem(spec, node.line(), node.column(), message);
    }
}
