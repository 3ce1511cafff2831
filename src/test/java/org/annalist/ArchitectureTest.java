package org.annalist;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The pipeline runs one way (DEVELOPERS.md, "The map"): series → ingest / analysis → findings →
 * chart / narrative → render → brief → cli. A class may use only the stages its own stage may use,
 * the analysis methods use one another in one order, and each third-party library stays in the
 * stage it serves. The checker is tried on planted violations too, so that it cannot pass by
 * seeing nothing.
 */
class ArchitectureTest {

    private static final Path SOURCES = Path.of("src/main/java/org/annalist");
    private static final Pattern PACKAGE = Pattern.compile("^package org\\.annalist\\.([a-z.]+);", Pattern.MULTILINE);
    private static final Pattern OWN_USE = Pattern.compile("\\borg\\.annalist\\.([a-z]+(?:\\.[a-z]+)*)\\.([A-Z]\\w*)");
    private static final Pattern IMPORT = Pattern.compile("^import (?:static )?([a-z][\\w.]*)\\.[A-Z]", Pattern.MULTILINE);

    /** Stage → the stages it may use (itself always). */
    static final Map<String, Set<String>> STAGES = Map.of(
            "series", Set.of(),
            "ingest", Set.of("series"),
            "analysis", Set.of("series"),
            "findings", Set.of("analysis", "series"),
            "chart", Set.of("findings", "series"),
            "narrative", Set.of("findings", "series"),
            "render", Set.of("chart"),
            "brief", Set.of("series", "ingest", "findings", "chart", "narrative", "render"),
            // commands run every job through brief; they name the value types the job is made of and
            // the problems they turn into exit codes, but call no analysis, chart or renderer
            "cli", Set.of("brief", "series", "ingest", "findings", "narrative", "serve"),
            // the browser workbench runs jobs through brief like a command; it shows the brief's
            // pages through render (PageImages) and words its pages in narrative's templates
            "serve", Set.of("brief", "series", "ingest", "findings", "narrative", "render"));

    /** Where a stage may use only some classes of another: render draws the chart's figures, nothing else of it. */
    static final Map<String, Map<String, Set<String>>> ONLY = Map.of(
            "render", Map.of("chart", Set.of("Figure")));

    /**
     * The analysis methods, in the order in which they may use each other: each package may use the
     * ones before it (the shared root first), never one after it, so the methods form no cycle.
     */
    static final List<String> ANALYSIS_ORDER = List.of("analysis", "analysis.decompose", "analysis.season",
            "analysis.cycle", "analysis.trend", "analysis.anomaly", "analysis.calendar", "analysis.indicators",
            "analysis.breaks", "analysis.forecast");

    /** Third-party library (package prefix) → the stages it belongs to. */
    static final Map<String, Set<String>> LIBRARIES = new LinkedHashMap<>(Map.of(
            "org.apache.commons.math3", Set.of("analysis"),
            "org.apache.commons.csv", Set.of("ingest"),
            "com.fasterxml.jackson", Set.of("ingest", "findings", "brief"),
            "freemarker", Set.of("narrative"),
            "org.jfree", Set.of("chart", "render"),
            "org.apache.batik", Set.of("render"),
            "com.openhtmltopdf", Set.of("render"),
            "org.apache.pdfbox", Set.of("render"),
            "picocli", Set.of("cli"),
            "me.tongfei", Set.of("cli")));

    static {
        LIBRARIES.put("org.eclipse.jetty", Set.of("serve"));
    }

    @Test
    void everyUseGoesForwardInThePipeline() {
        assertThat(violations(mainSources())).isEmpty();
    }

    @Test
    void theCheckerFindsAPlantedBackwardsImport() {
        Map<String, String> planted = Map.of(
                "findings/Planted.java", "package org.annalist.findings;\nimport org.annalist.narrative.Terms;\n",
                "cli/Planted.java", "package org.annalist.cli;\nimport org.annalist.analysis.decompose.Stl;\n",
                "render/Planted.java", "package org.annalist.render;\nimport org.annalist.chart.ChartStyle;\n",
                "analysis/decompose/Planted.java",
                "package org.annalist.analysis.decompose;\nimport org.annalist.analysis.forecast.Outlook;\n",
                "analysis/Planted.java", "package org.annalist.analysis;\nclass P { org.annalist.analysis.trend.SenSlope s; }\n",
                "narrative/Planted.java", "package org.annalist.narrative;\nimport org.jfree.chart.JFreeChart;\n",
                "chart/Planted.java", "package org.annalist.chart;\nimport com.fasterxml.jackson.databind.ObjectMapper;\n");
        List<String> found = violations(planted);
        assertThat(found).hasSize(planted.size());
        assertThat(found).anySatisfy(v -> assertThat(v).contains("findings uses narrative"))
                .anySatisfy(v -> assertThat(v).contains("cli uses analysis"))
                .anySatisfy(v -> assertThat(v).contains("render uses chart.ChartStyle"))
                .anySatisfy(v -> assertThat(v).contains("analysis.decompose uses analysis.forecast"))
                .anySatisfy(v -> assertThat(v).contains("analysis uses analysis.trend"))
                .anySatisfy(v -> assertThat(v).contains("narrative uses org.jfree"))
                .anySatisfy(v -> assertThat(v).contains("chart uses com.fasterxml.jackson"));
    }

    @Test
    void theAnalysisCoreDoesNoInputOrOutput() throws IOException {
        List<String> violations = new ArrayList<>();
        try (Stream<Path> files = Files.walk(SOURCES.resolve("analysis"))) {
            for (Path file : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                String source = Files.readString(file);
                if (source.contains("import java.io.") || source.contains("import java.nio.file.")
                        || source.contains("System.out") || source.contains("System.err")) {
                    violations.add(file.toString());
                }
            }
        }
        assertThat(violations).isEmpty();
    }

    /** @param sources file name → its text */
    static List<String> violations(Map<String, String> sources) {
        List<String> violations = new ArrayList<>();
        sources.forEach((file, source) -> {
            Matcher pkg = PACKAGE.matcher(source);
            if (!pkg.find()) {
                violations.add(file + ": no package line");
                return;
            }
            String pack = pkg.group(1);
            String stage = pack.split("\\.")[0];
            if (!STAGES.containsKey(stage)) {
                violations.add(file + ": unknown stage " + stage);
                return;
            }
            Matcher own = OWN_USE.matcher(source);
            while (own.find()) {
                String used = own.group(1);
                String usedStage = used.split("\\.")[0];
                if (usedStage.equals(stage)) {
                    if (stage.equals("analysis") && analysisOrderBroken(pack, used)) {
                        violations.add(file + ": " + pack + " uses " + used + " (" + String.join(" < ", ANALYSIS_ORDER)
                                + ")");
                    }
                } else if (!STAGES.get(stage).contains(usedStage)) {
                    violations.add(file + ": " + stage + " uses " + usedStage);
                } else if (ONLY.getOrDefault(stage, Map.of()).containsKey(usedStage)
                        && !ONLY.get(stage).get(usedStage).contains(own.group(2))) {
                    violations.add(file + ": " + stage + " uses " + usedStage + "." + own.group(2));
                }
            }
            Matcher imported = IMPORT.matcher(source);
            while (imported.find()) {
                String name = imported.group(1);
                LIBRARIES.forEach((library, stages) -> {
                    if ((name.equals(library) || name.startsWith(library + ".")) && !stages.contains(stage)) {
                        violations.add(file + ": " + stage + " uses " + library);
                    }
                });
            }
        });
        return violations.stream().distinct().toList();
    }

    private static boolean analysisOrderBroken(String user, String used) {
        int from = ANALYSIS_ORDER.indexOf(user);
        int to = ANALYSIS_ORDER.indexOf(used);
        return from < 0 || to < 0 || to > from;
    }

    private static Map<String, String> mainSources() {
        Map<String, String> sources = new LinkedHashMap<>();
        try (Stream<Path> files = Files.walk(SOURCES)) {
            for (Path file : files.filter(p -> p.toString().endsWith(".java")).sorted().toList()) {
                sources.put(SOURCES.relativize(file).toString(), Files.readString(file));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return sources;
    }
}
