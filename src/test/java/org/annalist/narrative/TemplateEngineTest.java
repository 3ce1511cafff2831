package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** How a translated narrative is added: a template named for its language wins over the default one. */
class TemplateEngineTest {

    public record View(String title) {
    }

    @Test
    void aTemplateForTheBriefsLanguageIsPreferredOverTheDefault(@TempDir Path folder) throws IOException {
        Files.writeString(folder.resolve("brief.ftlx"), "default: ${brief.title}");
        Files.writeString(folder.resolve("brief_de.ftlx"), "deutsch: ${brief.title}");
        TemplateEngine engine = new TemplateEngine(Optional.of(folder));
        assertThat(engine.render("brief.ftlx", new View("Nächte"), Locale.GERMAN)).isEqualTo("deutsch: Nächte");
        assertThat(engine.render("brief.ftlx", new View("Nights"), Locale.ENGLISH)).isEqualTo("default: Nights");
    }
}
