package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Locale;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A user's template is bounded: in time, in output and in depth; a template that is no template is
 * a problem with its line; and the XHTML it wrote can be traced back to the template's lines.
 */
class TemplateLimitsTest {

    public record View(String title) {
    }

    private static final View VIEW = new View("Nights");

    @TempDir
    Path folder;

    private TemplateEngine engine(String template, TemplateEngine.Limits limits) throws IOException {
        Files.writeString(folder.resolve("brief.ftlx"), template);
        return new TemplateEngine(Optional.of(folder), limits);
    }

    @Test
    void anEndlessLoopThatWritesNothingEndsAtTheTimeLimit() throws IOException {
        TemplateEngine engine = engine("<p>\n<#list 1.. as i><#assign x = i></#list>\n</p>",
                new TemplateEngine.Limits(Duration.ofMillis(300), 1 << 20));
        long start = System.nanoTime();
        assertThatThrownBy(() -> engine.render("brief.ftlx", VIEW, Locale.ENGLISH))
                .isInstanceOf(TemplateEngine.TemplateProblem.class)
                .hasMessageStartingWith("brief.ftlx").hasMessageContaining("did not finish within 300 ms");
        assertThat(Duration.ofNanos(System.nanoTime() - start)).isLessThan(Duration.ofSeconds(5));
    }

    @Test
    void anIncludedTemplateIsInterruptedToo() throws IOException {
        Files.writeString(folder.resolve("loop.ftl"), "<#list 1.. as i><#assign x = i></#list>");
        TemplateEngine engine = engine("<p><#include \"loop.ftl\"></p>", new TemplateEngine.Limits(Duration.ofMillis(300), 1 << 20));
        assertThatThrownBy(() -> engine.render("brief.ftlx", VIEW, Locale.ENGLISH))
                .isInstanceOf(TemplateEngine.TemplateProblem.class).hasMessageContaining("did not finish");
    }

    @Test
    void outputBeyondTheLimitIsAProblemAtTheLineThatWroteIt() throws IOException {
        TemplateEngine engine = engine("<p>\n\n<#list 1.. as i>${brief.title}</#list>\n</p>",
                new TemplateEngine.Limits(Duration.ofSeconds(10), 10_000));
        assertThatThrownBy(() -> engine.render("brief.ftlx", VIEW, Locale.ENGLISH))
                .isInstanceOf(TemplateEngine.TemplateProblem.class)
                .hasMessage("brief.ftlx:3: the template wrote more than 10000 characters of XHTML (an endless <#list>?)");
    }

    @Test
    void endlessRecursionIsAProblemNotAStackOverflowError() throws IOException {
        TemplateEngine engine = engine("<#function f n><#return f(n + 1)></#function>${f(1)}", TemplateEngine.Limits.DEFAULT);
        assertThatThrownBy(() -> engine.render("brief.ftlx", VIEW, Locale.ENGLISH))
                .isInstanceOf(TemplateEngine.TemplateProblem.class).hasMessageContaining("nested too deeply")
                .hasNoCause();
    }

    @Test
    void aTemplateFileOverItsLimitIsRefusedBeforeItIsRead() throws IOException {
        TemplateEngine engine = engine("<p>" + "x".repeat((int) TemplateEngine.MAX_TEMPLATE_BYTES) + "</p>",
                TemplateEngine.Limits.DEFAULT);
        assertThatThrownBy(() -> engine.render("brief.ftlx", VIEW, Locale.ENGLISH))
                .isInstanceOf(TemplateEngine.TemplateProblem.class)
                .hasMessageStartingWith("brief.ftlx: the template file has 4194311 bytes, over the limit of 4 MB");
    }

    @Test
    void aSyntaxErrorIsAProblemWithItsLine() throws IOException {
        TemplateEngine engine = engine("<p>\n<#if brief.title>\n</p>", TemplateEngine.Limits.DEFAULT);
        assertThatThrownBy(() -> engine.render("brief.ftlx", VIEW, Locale.ENGLISH))
                .isInstanceOf(TemplateEngine.TemplateProblem.class).hasMessageStartingWith("brief.ftlx:");
    }

    @Test
    void theXhtmlIsTracedBackToTheTemplatesLines() throws IOException {
        TemplateEngine engine = engine("<html>\n<p>${brief.title}</p>\n<#if true>\n<img src=\"x.png\"/>\n</#if>\n</html>\n",
                TemplateEngine.Limits.DEFAULT);
        RenderedTemplate rendered = engine.renderTraced("brief.ftlx", VIEW, Locale.ENGLISH);
        assertThat(rendered.problem(0, 0, "x.png", "refused").getMessage()).isEqualTo("brief.ftlx:4: refused");
        assertThat(rendered.problem(2, 5, "", "bad").getMessage()).isEqualTo("brief.ftlx:2: bad");
        assertThat(rendered.problem(0, 0, "absent", "gone").getMessage()).isEqualTo("brief.ftlx: gone");
    }
}
