package org.annalist;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The pipeline runs one way: series → ingest/analysis → findings → chart/narrative → render →
 * brief → cli. A class may import only from the packages its stage is allowed to use.
 */
class ArchitectureTest {

    private static final Path SOURCES = Path.of("src/main/java/org/annalist");
    private static final Pattern PACKAGE = Pattern.compile("^package org\\.annalist\\.([a-z.]+);", Pattern.MULTILINE);
    private static final Pattern IMPORT = Pattern.compile("^import (?:static )?org\\.annalist\\.([a-z]+(?:\\.[a-z]+)*)\\.[A-Z]",
            Pattern.MULTILINE);
    private static final Pattern QUALIFIED_USE = Pattern.compile("\\borg\\.annalist\\.([a-z]+)(?:\\.[a-z]+)*\\.[A-Z]");

    /** Top-level stage → the stages it may use (itself always allowed). From the design brief's package table. */
    private static final Map<String, Set<String>> ALLOWED = Map.of(
            "series", Set.of(),
            "ingest", Set.of("series"),
            "analysis", Set.of("series"),
            "findings", Set.of("analysis", "series"),
            "chart", Set.of("findings", "series"),
            "narrative", Set.of("findings", "series"),
            "render", Set.of("chart"),
            "brief", Set.of("series", "ingest", "analysis", "findings", "chart", "narrative", "render"),
            "cli", Set.of("series", "ingest", "analysis", "findings", "chart", "narrative", "render", "brief"));

    @Test
    void noImportPointsBackwardsInThePipeline() throws IOException {
        List<String> violations = new ArrayList<>();
        try (Stream<Path> files = Files.walk(SOURCES)) {
            for (Path file : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                String source = Files.readString(file);
                Matcher pkg = PACKAGE.matcher(source);
                assertThat(pkg.find()).as("package line in %s", file).isTrue();
                String stage = pkg.group(1).split("\\.")[0];
                assertThat(ALLOWED).as("a known stage for %s", file).containsKey(stage);
                for (Matcher m : List.of(IMPORT.matcher(source), QUALIFIED_USE.matcher(source))) {
                    while (m.find()) {
                        String used = m.group(1).split("\\.")[0];
                        if (!used.equals(stage) && !ALLOWED.get(stage).contains(used)) {
                            violations.add(file + ": " + stage + " uses " + used);
                        }
                    }
                }
            }
        }
        assertThat(violations).isEmpty();
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
}
