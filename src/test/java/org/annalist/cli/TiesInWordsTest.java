package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A tie is worded as a tie, in the brief, in {@code analyze}'s notes and in the JSON: an October equal
 * to the highest earlier October is "the equal highest October", naming the other, and "equal to the
 * highest value of the whole series", never "the highest". Invented series with a planted tie.
 */
class TiesInWordsTest {

    @TempDir
    Path folder;

    /** Octobers 500, 520, 540, 540 (2021–2024), the series' highest months (planted). */
    private Path octoberTie() throws IOException {
        StringBuilder csv = new StringBuilder("month,visitors\n");
        for (int t = 0; t < 46; t++) {
            int month = t % 12 + 1;
            int year = 2021 + t / 12;
            int value = month == 10 ? Math.min(540, 500 + 20 * (year - 2021)) : 300 + 10 * month + 3 * (year - 2021) + (t * 7 % 5);
            csv.append(String.format(Locale.ROOT, "%d-%02d,%d%n", year, month, value));
        }
        return Files.writeString(folder.resolve("tie.csv"), csv);
    }

    @Test
    void theBriefCallsATieTheEqualHighestAndNamesBothPeriods() throws IOException {
        Path pdf = folder.resolve("tie.pdf");
        Run run = Run.of("brief", octoberTie().toString(), "-o", pdf.toString(), "--horizon", "0",
                "--generated-at", "2026-11-20T08:00:00Z");
        assertThat(run.exitCode()).as(run.err()).isZero();
        String text = PdfFacts.of(pdf).text().replaceAll("\\s+", " ");
        assertThat(text).contains("October 2024 was the equal highest October of the 4 in the data, with October 2023, "
                + "and equal to the highest value of the whole series, that of October 2023.");
        assertThat(text).doesNotContain("was the highest October").doesNotContain("and the highest value of the whole series");
    }

    @Test
    void theNotesAndTheJsonCarryTheTie() throws IOException {
        Path data = octoberTie();
        Run notes = Run.of("analyze", data.toString(), "--horizon", "0");
        assertThat(notes.exitCode()).as(notes.err()).isZero();
        assertThat(notes.out()).contains("1 of 4 in the same period of each year (equal with 2023-10); equal record high with 2023-10");
        Run json = Run.of("analyze", data.toString(), "--horizon", "0", "--format", "json");
        assertThat(json.out().replaceAll("\\s+", "")).contains("\"rank\":{\"position\":1,\"of\":4,\"tied_with\":[\"2023-10\"]}")
                .contains("\"record\":null,\"equal_record\":{\"extreme\":\"high\",\"with\":[\"2023-10\"]}");
    }
}
