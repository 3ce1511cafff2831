package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The board's brief as the demo makes it (demo-data/monthly-briefs.yaml, its first brief, over the
 * invented guest nights by market), with each series' findings written beside it: the one fixture
 * of the tests that read the board's brief.
 */
final class DemoBoardBrief {

    private DemoBoardBrief() {
    }

    /**
     * Makes the brief in {@code folder} through the command line's {@code batch}: the PDF
     * {@code board-2026-10.pdf} and {@code board-2026-10-SERIES.findings.json} for each series (the
     * series' name in lower case, e.g. {@code long-haul}).
     *
     * @return the PDF
     */
    static Path makeIn(Path folder) throws IOException {
        Files.copy(Path.of("demo-data/quennelmark-guest-nights.csv"), folder.resolve("quennelmark-guest-nights.csv"));
        Path spec = folder.resolve("monthly-briefs.yaml");
        // the demo's board brief, as demo-data/monthly-briefs.yaml gives it, and the findings beside it
        Files.writeString(spec, """
                briefs:
                  - title: Guest nights in Quennelmark by market
                    organisation: Quennelmark Visitor Board (invented demo)
                    data: quennelmark-guest-nights.csv
                    series: [Total, Domestic, Brevania, Long-haul]
                    combined: true
                    total: Total
                    sort_by: order
                    output: board-{period}.pdf
                    generated_at: 2026-11-20T08:00:00Z
                    side_outputs: [findings]
                """);
        Run run = Run.of("batch", spec.toString());
        assertThat(run.exitCode()).as(run.out() + run.err()).isZero();
        return folder.resolve("board-2026-10.pdf");
    }
}
