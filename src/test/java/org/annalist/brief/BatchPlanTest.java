package org.annalist.brief;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A batch reads each file once, a derived ratio included, and makes its briefs from what it read. */
class BatchPlanTest {

    @TempDir
    Path folder;

    /** Four years of a market's nights and arrivals: its average length of stay can be derived. */
    private Path stays() throws IOException {
        StringBuilder csv = new StringBuilder("period,Domestic nights,Domestic arrivals\n");
        for (int t = 0; t < 48; t++) {
            long arrivals = Math.round(1000 * (1 + 0.3 * Math.sin(2 * Math.PI * t / 12)));
            csv.append(String.format(Locale.ROOT, "%d-%02d,%d,%d%n", 2021 + t / 12, t % 12 + 1,
                    Math.round(arrivals * (2.5 + 0.01 * t)), arrivals));
        }
        return Files.writeString(folder.resolve("stays.csv"), csv);
    }

    @Test
    void aFileIsReadOnceAndARatioIsNotReadAgainToBeBriefed() throws IOException {
        Path data = stays();
        Path spec = Files.writeString(folder.resolve("briefs.yaml"), """
                briefs:
                  - data: stays.csv
                    series: Domestic average length of stay
                    output: "{series}.pdf"
                    horizon: 0
                    generated_at: 2026-11-20T08:00:00Z
                  - data: stays.csv
                    series: [Domestic nights, Domestic arrivals]
                    output: "{series}.pdf"
                    horizon: 0
                    generated_at: 2026-11-20T08:00:00Z
                """);
        BatchPlan plan = BatchPlan.of(SpecReader.read(spec), new BriefPipeline());
        assertThat(plan.briefs()).hasSize(3).allSatisfy(b -> {
            assertThat(b.failure()).isEmpty();
            assertThat(b.file()).as("the same file as read").isSameAs(plan.briefs().get(0).file());
        });
        assertThat(plan.briefs().get(0).series()).singleElement().satisfies(s -> assertThat(s.derived()).isTrue());

        // the briefs are made from what the plan read: the file is no longer needed
        Files.delete(data);
        List<Batch.Outcome> outcomes = Batch.run(plan, 1, o -> { });
        assertThat(outcomes).allSatisfy(o -> assertThat(o.failure()).isEmpty());
        assertThat(folder.resolve("domestic-average-length-of-stay.pdf")).exists();
        assertThat(folder.resolve("domestic-nights.pdf")).exists();
    }

    @Test
    void perDayFiguresAreForMonthsAndQuartersAndFailOnlyTheirBrief() throws IOException {
        Files.writeString(folder.resolve("years.csv"), "year,Visitors\n2019,10\n2020,12\n2021,13\n2022,15\n");
        stays();
        Path spec = Files.writeString(folder.resolve("briefs.yaml"), """
                briefs:
                  - data: years.csv
                    per_day: true
                    output: years.pdf
                  - data: stays.csv
                    series: Domestic nights
                    per_day: true
                    horizon: 0
                    output: "{series}.pdf"
                    generated_at: 2026-11-20T08:00:00Z
                    side_outputs: [findings]
                """);
        List<Batch.Outcome> outcomes = Batch.run(SpecReader.read(spec), 2, o -> { });
        assertThat(outcomes.get(0).failure()).contains("per_day: per-day figures are for monthly or quarterly data, "
                + "whose periods differ in length; annual periods do not");
        assertThat(outcomes.get(1).done()).isTrue();
        assertThat(Files.readString(folder.resolve("domestic-nights.findings.json")))
                .contains("\"unit\" : \"per average month\"");
    }
}
