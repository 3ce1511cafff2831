package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.annalist.findings.FigurePlan;
import org.junit.jupiter.api.Test;

/** What the bundled templates may rely on, and what they must not do. */
class TemplateContractTest {

    private static final List<Path> TEMPLATES = List.of(Path.of("report-templates/brief.ftlx"),
            Path.of("report-templates/multi.ftlx"));

    /** The views say what kind a finding is by booleans; a template that compares words would break silently. */
    @Test
    void noTemplateComparesAStringToChooseASentence() throws IOException {
        Pattern comparison = Pattern.compile("[!=]=\\s*\"");
        for (Path template : TEMPLATES) {
            assertThat(Files.readAllLines(template)).as("%s", template).noneMatch(l -> comparison.matcher(l).find());
        }
    }

    /** Every chart a template places is one the figure plan can draw, and every planned chart has a place. */
    @Test
    void theTemplatesPlaceExactlyTheChartsOfTheFigurePlan() throws IOException {
        Pattern placed = Pattern.compile("data-chart=\"([a-z]+)(-\\$\\{[^}]+})?\"");
        Set<String> ids = new HashSet<>();
        for (Path template : TEMPLATES) {
            Matcher m = placed.matcher(Files.readString(template));
            while (m.find()) {
                ids.add(m.group(1));
            }
        }
        assertThat(ids).containsExactlyInAnyOrderElementsOf(Arrays.stream(FigurePlan.Chart.values())
                .map(FigurePlan.Chart::id).toList());
    }
}
