package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A monthly file whose dates start before 1583 (the first full year of the Gregorian calendar) is
 * analysed and briefed like any other, without calendar effects and with a note saying why; it was
 * an internal error (the Gregorian Easter asked for the year 1500). Invented data.
 */
class DatesBeforeGregorianTest {

    @TempDir
    Path folder;

    private Path monthlyFrom1500() throws IOException {
        StringBuilder csv = new StringBuilder("month,visitors\n");
        for (int t = 0; t < 96; t++) {
            double value = 1000 * (1 + 0.3 * Math.sin(t * Math.PI / 6)) + 3 * t + (t * 7919 % 13);
            csv.append(String.format(Locale.ROOT, "%d-%02d,%.0f%n", 1500 + t / 12, t % 12 + 1, value));
        }
        return Files.writeString(folder.resolve("early.csv"), csv);
    }

    @Test
    void aMonthlyFileFrom1500GivesABriefThatSaysWhyItHasNoCalendarEffects() throws IOException {
        Path data = monthlyFrom1500();
        Path pdf = folder.resolve("early.pdf");
        Run run = Run.of("brief", data.toString(), "-o", pdf.toString(), "--generated-at", "2026-11-20T08:00:00Z");
        assertThat(run.exitCode()).as(run.err()).isZero();
        String text = PdfFacts.of(pdf).text().replaceAll("\\s+", " ");
        assertThat(text).contains("No calendar effects are estimated").contains("before 1583");
    }

    @Test
    void analyzeAndCheckOfTheFileEndWell() throws IOException {
        Path data = monthlyFrom1500();
        Run json = Run.of("analyze", data.toString(), "--format", "json");
        assertThat(json.exitCode()).as(json.err()).isZero();
        assertThat(json.out()).contains("\"calendar\" : null");
        Run notes = Run.of("analyze", data.toString());
        assertThat(notes.exitCode()).as(notes.err()).isZero();
        assertThat(notes.out()).contains("the first full year of the Gregorian calendar");
        assertThat(Run.of("check", data.toString()).exitCode()).isZero();
    }
}
