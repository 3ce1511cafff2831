package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A share of the variation that rounds to nothing is worded "under 1 %", never "about 0 %". */
class IrregularShareWordsTest {

    @TempDir
    Path folder;

    @Test
    void aNearlyNoiselessSeriesHasAnIrregularPartUnderOnePercentNotAboutZero() throws IOException {
        // five years of a rising line with a fixed seasonal swing and a noise of ±1 on values near 1,000 (planted)
        StringBuilder csv = new StringBuilder("month,nights\n");
        for (int t = 0; t < 60; t++) {
            double value = 1000 + 5 * t + 200 * Math.sin(2 * Math.PI * t / 12) + ((t * 7) % 3 - 1);
            csv.append(String.format(Locale.ROOT, "%d-%02d,%.0f%n", 2020 + t / 12, t % 12 + 1, value));
        }
        Path data = Files.writeString(folder.resolve("smooth.csv"), csv);
        Path pdf = folder.resolve("smooth.pdf");
        Run run = Run.of("brief", data.toString(), "-o", pdf.toString(), "--horizon", "0",
                "--generated-at", "2026-11-20T08:00:00Z");
        assertThat(run.exitCode()).as(run.err()).isZero();
        String text = PdfFacts.of(pdf).text().replaceAll("\\s+", " ");
        assertThat(text).contains("it carries under 1").doesNotContain("about 0");
    }
}
