package org.annalist.brief;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;
import org.annalist.cli.Main;
import org.annalist.narrative.TemplateEngine;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The brief's warm-up ({@link PdfWarmUp}) does the brief's own set-up, leaves no trace, and cannot
 * change a brief: a brief laid out while warm-ups run beside it is the same to the byte.
 */
class PdfWarmUpTest {

    private static final String NIGHTS = "demo-data/quennelmark-guest-nights.csv";

    @TempDir
    Path temp;

    @Test
    void theWarmUpDoesItsSetUpAndWritesNoFile() throws IOException {
        List<String> before = listing(Path.of(""));
        List<String> tempBefore = listing(Path.of(System.getProperty("java.io.tmpdir")));
        TemplateEngine engine = new TemplateEngine(Optional.empty());
        assertThat(PdfWarmUp.prepare(Optional.of(TemplateEngine.BRIEF_TEMPLATE), Locale.ENGLISH, () -> engine)).isTrue();
        assertThat(listing(Path.of(""))).isEqualTo(before);
        // other test classes may run in a second JVM at the same time: only new files named like ours would count
        assertThat(listing(Path.of(System.getProperty("java.io.tmpdir")))).filteredOn(name -> !tempBefore.contains(name))
                .noneMatch(name -> name.contains("warm") || name.endsWith(".pdf"));
    }

    /** A user's template folder is read by the brief alone: the bundled templates' engine is then not even made. */
    @Test
    void withTheUsersTemplatesTheBundledEngineIsNotMade() {
        assertThat(PdfWarmUp.prepare(Optional.empty(), Locale.ENGLISH, () -> {
            throw new AssertionError("the bundled engine was asked for");
        })).isTrue();
    }

    @Test
    void aTemplateThatCannotBeParsedIsLeftForTheBriefToReport() throws IOException {
        Path folder = Files.createDirectories(temp.resolve("templates"));
        Files.writeString(folder.resolve("brief.ftlx"), "<#if>");
        TemplateEngine engine = new TemplateEngine(Optional.of(folder));
        engine.prepare(TemplateEngine.BRIEF_TEMPLATE, Locale.ENGLISH);   // no exception
        assertThat(PdfWarmUp.prepare(Optional.of(TemplateEngine.BRIEF_TEMPLATE), Locale.ENGLISH, () -> engine)).isTrue();
    }

    @Test
    void aBriefLaidOutWhileWarmUpsRunBesideItIsTheSameToTheByte() throws Exception {
        Path alone = temp.resolve("alone.pdf");
        Path beside = temp.resolve("beside.pdf");
        assertThat(brief(alone)).isZero();
        AtomicBoolean done = new AtomicBoolean();
        AtomicInteger warmUps = new AtomicInteger();
        Thread warming = new Thread(() -> {
            TemplateEngine engine = new TemplateEngine(Optional.empty());
            while (!done.get()) {
                if (PdfWarmUp.prepare(Optional.of(TemplateEngine.BRIEF_TEMPLATE), Locale.ENGLISH, () -> engine)) {
                    warmUps.incrementAndGet();
                }
            }
        });
        warming.start();
        try {
            assertThat(brief(beside)).isZero();
        } finally {
            done.set(true);
            warming.join();
        }
        assertThat(warmUps.get()).isPositive();
        assertThat(Files.mismatch(alone, beside)).isEqualTo(-1L);
    }

    private static int brief(Path pdf) {
        return Main.run(new String[] {"brief", NIGHTS, "--series", "Total", "-o", pdf.toString(),
            "--generated-at", "2026-11-20T08:00:00Z"}, new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter()));
    }

    private static List<String> listing(Path folder) throws IOException {
        try (Stream<Path> files = Files.list(folder)) {
            return files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
