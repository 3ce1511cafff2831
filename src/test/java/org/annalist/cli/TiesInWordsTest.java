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

    /**
     * Six years growing 1 % a month, whose July and August stand equally high (+52 % against the
     * year's average), up to a swap by 0.2 % between the first three years (August higher) and the last
     * three (July higher); January and December equally low; a little noise on the other months
     * (planted).
     */
    private Path julyAugustTie() throws IOException {
        double[] shape = {625, 700, 800, 900, 1000, 1100, 1400, 1400, 1000, 800, 700, 625};
        StringBuilder csv = new StringBuilder("month,nights\n");
        for (int t = 0; t < 72; t++) {
            int month = t % 12 + 1;
            int year = 2019 + t / 12;
            double hair = month == 7 ? (year < 2022 ? -0.002 : 0.002) : month == 8 ? (year < 2022 ? 0.002 : -0.002) : 0;
            double noise = month == 7 || month == 8 || month == 1 || month == 12 ? 0 : 0.002 * ((t * 37 % 11) - 5);
            double value = shape[month - 1] * (1 + hair + noise) * Math.exp(0.01 * t);
            csv.append(String.format(Locale.ROOT, "%d-%02d,%.1f%n", year, month, value));
        }
        return Files.writeString(folder.resolve("summer.csv"), csv);
    }

    @Test
    void twoSeasonsThatPrintAlikeAreBothNamedAsThePeakAndTheirSwapIsNoChangeOfPattern() throws IOException {
        Path pdf = folder.resolve("summer.pdf");
        Run run = Run.of("brief", julyAugustTie().toString(), "-o", pdf.toString(), "--horizon", "0",
                "--generated-at", "2026-11-20T08:00:00Z");
        assertThat(run.exitCode()).as(run.err()).isZero();
        String text = PdfFacts.of(pdf).text().replaceAll("\\s+", " ");
        assertThat(text).contains("It peaks in July and August (+52\u00A0% against the yearly average)").contains("and is lowest in January and December (−32\u00A0%)");
        assertThat(text).doesNotContain("The pattern has changed over the years");
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
