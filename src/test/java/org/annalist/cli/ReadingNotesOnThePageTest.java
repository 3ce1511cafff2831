package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A reading warning printed in a brief names the data file, not the folder it lay in on the user's machine. */
class ReadingNotesOnThePageTest {

    @TempDir
    Path folder;

    @Test
    void aReadingWarningOnThePageNamesTheFileAndPlaceButNotTheFolder() throws IOException {
        // invented monthly visitors dated on the 15th, day first: '15/01/2023' is no date month first
        StringBuilder csv = new StringBuilder("date;visitors\n");
        for (int t = 0; t < 48; t++) {
            csv.append(String.format(Locale.ROOT, "15/%02d/%d;%d%n", t % 12 + 1, 2021 + t / 12,
                    1000 + 300 * Math.round(Math.sin(2 * Math.PI * t / 12) * 10) / 10 + 5 * t));
        }
        Path data = Files.createDirectories(folder.resolve("private").resolve("exports")).resolve("visitors.csv");
        Files.writeString(data, csv);
        Path pdf = folder.resolve("visitors.pdf");
        Run run = Run.of("brief", data.toString(), "-o", pdf.toString(), "--horizon", "0",
                "--generated-at", "2026-11-20T08:00:00Z");
        assertThat(run.exitCode()).as(run.err()).isZero();
        // the terminal names the file as the user did; the page only by its name, line and column
        assertThat(run.err()).contains(data + ":2:1: dates read day first");
        String text = PdfFacts.of(pdf).text().replace('\u00A0', ' ').replaceAll("\\s+", " ");
        // a sentence for a board reader, not the command line's FILE:LINE:COLUMN form
        assertThat(text).contains("Dates read day first (DD/MM/YYYY), because '15/01/2021' is no date the other way round"
                + " (visitors.csv, line 2, column 1).").doesNotContain("visitors.csv:2:1")
                .doesNotContain("exports", folder.toString());
    }

    /**
     * A file whose header gives no unit: the lead names the series rather than leaving a bare
     * "the series stood at 1,234", and the latest periods' table, with every value present, carries
     * no note about dashes.
     */
    @Test
    void aSeriesWithoutAUnitIsNamedInTheLeadAndTheDashNoteOnlyComesWithADash() throws IOException {
        StringBuilder csv = new StringBuilder("month,Visitors\n");
        for (int t = 0; t < 48; t++) {
            csv.append(String.format(Locale.ROOT, "%d-%02d,%d%n", 2021 + t / 12, t % 12 + 1,
                    1000 + 300 * Math.round(Math.sin(2 * Math.PI * t / 12) * 10) / 10 + 5 * t));
        }
        Path data = folder.resolve("visitors.csv");
        Files.writeString(data, csv);
        Path pdf = folder.resolve("visitors.pdf");
        Run run = Run.of("brief", data.toString(), "-o", pdf.toString(), "--horizon", "0",
                "--generated-at", "2026-11-20T08:00:00Z");
        assertThat(run.exitCode()).as(run.err()).isZero();
        String text = PdfFacts.of(pdf).text().replace('\u00A0', ' ').replaceAll("\\s+", " ");
        assertThat(text).contains("In December 2024 Visitors stood at ").doesNotContain("the series stood at")
                .doesNotContain("A dash marks a value");
        // a gap in the last year puts a dash in the table, and the note with it
        Files.writeString(data, csv.toString().replace("2024-06,", "2024-06,NA\n#").replaceAll("\n#[0-9]+", ""));
        Run gap = Run.of("brief", data.toString(), "-o", pdf.toString(), "--horizon", "0",
                "--generated-at", "2026-11-20T08:00:00Z");
        assertThat(gap.exitCode()).as(gap.err()).isZero();
        assertThat(PdfFacts.of(pdf).text().replace('\u00A0', ' ').replaceAll("\\s+", " "))
                .contains("A dash marks a value that is missing or a change that cannot be computed.");
    }
}
