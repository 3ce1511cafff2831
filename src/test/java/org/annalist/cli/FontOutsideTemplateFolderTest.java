package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A font the style sheet names from outside the template folder is refused like any other file
 * there: a template problem naming it, exit 2. It was an internal error (found by
 * {@link HostileInputPropertyTest}'s kind of edit): the layout engine, refused the font, painted
 * text with none and failed before the refusal was reported.
 */
class FontOutsideTemplateFolderTest {

    @TempDir
    Path folder;

    @Test
    void aFontFaceFromOutsideTheFolderIsATemplateProblemNotAnInternalError() throws IOException {
        Path templates = Files.createDirectories(folder.resolve("templates"));
        Files.copy(Path.of("report-templates/brief.ftlx"), templates.resolve("brief.ftlx"));
        Path font = Files.copy(Path.of("src/main/resources/org/annalist/render/fonts/DejaVuSans.ttf"), folder.resolve("outside.ttf"));
        Files.writeString(templates.resolve("brief.css"), "@font-face { font-family: outside; src: url(\"../outside.ttf\") }\n"
                + "body, p, h1, h2, td, th { font-family: outside !important }\n" + Files.readString(Path.of("report-templates/brief.css")));
        Run run = Run.of("brief", "src/test/resources/reference/Nile.csv", "-o", folder.resolve("out.pdf").toString(),
                "--templates", templates.toString(), "--horizon", "0", "--generated-at", "2026-11-20T08:00:00Z");
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).startsWith("annalist: brief.ftlx").contains("it uses " + font.toRealPath())
                .contains("outside its template folder").doesNotContain("internal error").hasLineCount(1);
        assertThat(folder.resolve("out.pdf")).doesNotExist();
    }
}
