package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A template in the user's {@code --templates} folder is used only when it really is a file in that
 * folder: a {@code brief.ftlx} (or a {@code brief.css} it includes) that is a symbolic link leading out
 * of the folder, a link leading nowhere, or a folder, is a template problem naming the file (exit 2,
 * no brief), never passed over for the bundled template (it was an internal error for a link leading
 * out, and silently the bundled template for a link leading nowhere).
 */
class TemplateFolderLinksTest {

    private static final String DATA = "src/test/resources/reference/Nile.csv";

    @TempDir
    Path folder;

    private Path templates() throws IOException {
        return Files.createDirectories(folder.resolve("templates"));
    }

    private Run brief(Path templates) {
        return Run.of("brief", DATA, "-o", folder.resolve("out.pdf").toString(), "--templates", templates.toString(),
                "--horizon", "0", "--generated-at", "2026-11-20T08:00:00Z");
    }

    private Path elsewhere(String name) throws IOException {
        Path other = Files.createDirectories(folder.resolve("elsewhere"));
        return Files.copy(Path.of("report-templates", name), other.resolve(name));
    }

    @Test
    void aBriefTemplateLinkedFromOutsideTheFolderIsATemplateProblem() throws IOException {
        Path templates = templates();
        Path outside = elsewhere("brief.ftlx");
        Files.createSymbolicLink(templates.resolve("brief.ftlx"), outside);
        Run run = brief(templates);
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).startsWith("annalist: brief.ftlx: ").contains(templates.resolve("brief.ftlx").toString())
                .contains("leads to " + outside.toRealPath()).contains("outside the template folder").hasLineCount(1);
        assertThat(folder.resolve("out.pdf")).doesNotExist();
    }

    @Test
    void aLinkLeadingNowhereIsATemplateProblemNotTheBundledTemplate() throws IOException {
        Path templates = templates();
        Files.createSymbolicLink(templates.resolve("brief.ftlx"), folder.resolve("gone.ftlx"));
        Run run = brief(templates);
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).contains("brief.ftlx").contains("a symbolic link that leads nowhere");
        assertThat(folder.resolve("out.pdf")).doesNotExist();
    }

    @Test
    void aFolderNamedLikeTheTemplateIsATemplateProblem() throws IOException {
        Path templates = templates();
        Files.createDirectories(templates.resolve("brief.ftlx"));
        Run run = brief(templates);
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).contains("brief.ftlx").contains("is not a regular file");
    }

    @Test
    void aStyleSheetLinkedFromOutsideIsNamedInTheIncludesProblem() throws IOException {
        Path templates = templates();
        Files.createSymbolicLink(templates.resolve("brief.css"), elsewhere("brief.css"));
        Run run = brief(templates);
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).startsWith("annalist: brief.ftlx:").contains("brief.css: ").contains("outside the template folder")
                .hasLineCount(1);
    }

    @Test
    void aLinkToAFileInsideTheFolderIsUsed() throws IOException {
        Path templates = templates();
        Path inside = Files.copy(Path.of("report-templates", "brief.ftlx"), Files.createDirectories(templates.resolve("v2"))
                .resolve("brief.ftlx"));
        Files.createSymbolicLink(templates.resolve("brief.ftlx"), inside);
        Run run = brief(templates);
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(folder.resolve("out.pdf")).exists();
    }
}
