package org.annalist.brief;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import org.annalist.findings.Form;
import org.annalist.findings.Measure;
import org.annalist.ingest.Aggregation;
import org.annalist.ingest.DateOrder;
import org.annalist.ingest.DecimalMark;
import org.annalist.ingest.ReadOptions;
import org.annalist.series.Frequency;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A spec asks for what the command line can: the keys of its options, read into the same job. */
class SpecReaderTest {

    @TempDir
    Path folder;

    private Path spec(String yaml) throws IOException {
        Files.writeString(folder.resolve("nights.csv"), "period,Total\n2024-01,1\n");
        Files.writeString(folder.resolve("holidays.csv"), "date,name\n2024-05-09,Lake festival\n");
        Path spec = folder.resolve("briefs.yaml");
        Files.writeString(spec, yaml);
        return spec;
    }

    @Test
    void theSpecTakesTheCommandLinesMeasureWordsInAnyCase() throws IOException {
        Job job = SpecReader.read(spec("""
                briefs:
                  - data: nights.csv
                    measure: {Total: Flow, Occupancy: RATE, Temperature: interval, Price: Level, Other: auto}
                """)).briefs().get(0).job();
        assertThat(job.analysis().measureBySeries()).isEqualTo(Map.of("Total", Measure.FLOW, "Occupancy", Measure.RATE,
                "Temperature", Measure.INTERVAL, "Price", Measure.LEVEL));
    }

    @Test
    void theCommandLinesChoicesHaveKeys() throws IOException {
        Job job = SpecReader.read(spec("""
                briefs:
                  - data: nights.csv
                    form: Multiplicative
                    measure: {Total: level}
                    per_day: true
                    holidays: holidays.csv
                    horizon: 6
                    date_order: day-first
                    decimal_mark: comma
                    aggregate: quarter
                    aggregate_by: mean
                """)).briefs().get(0).job();
        assertThat(job.analysis().form()).contains(Form.MULTIPLICATIVE);
        assertThat(job.analysis().measureBySeries()).isEqualTo(Map.of("Total", Measure.LEVEL));
        assertThat(job.analysis().perDay()).isTrue();
        assertThat(job.analysis().holidays()).contains(folder.resolve("holidays.csv").toAbsolutePath());
        assertThat(job.analysis().horizon()).contains(6);
        assertThat(job.input().readOptions()).isEqualTo(ReadOptions.defaults().withDateOrder(DateOrder.DAY_FIRST)
                .withDecimalMark(DecimalMark.COMMA)
                .withAggregation(new Aggregation(Frequency.QUARTERLY, Aggregation.Method.MEAN)));
    }

    @Test
    void withoutTheKeysTheDataDecides() throws IOException {
        Job job = SpecReader.read(spec("briefs:\n  - data: nights.csv\n    form: auto\n    decimal_mark: AUTO\n"))
                .briefs().get(0).job();
        assertThat(job.analysis()).isEqualTo(AnalysisChoices.fromTheData());
        assertThat(job.input().readOptions()).isEqualTo(ReadOptions.defaults());
        assertThat(job.series().latestPeriod()).isEqualTo(Optional.empty());
    }

    @Test
    void aggregatingSumsUnlessToldToAverage() throws IOException {
        Job job = SpecReader.read(spec("briefs:\n  - data: nights.csv\n    aggregate: month\n")).briefs().get(0).job();
        assertThat(job.input().readOptions().aggregation())
                .contains(new Aggregation(Frequency.MONTHLY, Aggregation.Method.SUM));
    }

    @Test
    void eachNewKeysMistakeIsReportedAtItsLineAndColumn() throws IOException {
        String[][] cases = {
            {"    form: cubic\n", ":3:11: form 'cubic'; expected auto, additive or multiplicative"},
            {"    per_day: yes\n", ":3:14: per_day 'yes'; expected true or false"},
            {"    holidays: nowhere.csv\n", ":3:15: no such file: " + folder.toAbsolutePath().resolve("nowhere.csv")},
            {"    holidays: ../holidays.csv\n", ":3:15: holidays '../holidays.csv' leaves the spec's folder"},
            {"    date_order: sideways\n", ":3:17: date_order 'sideways'; expected auto, day-first or month-first"},
            {"    decimal_mark: dot\n", ":3:19: decimal_mark 'dot'; expected auto, point or comma"},
            {"    aggregate: fortnight\n", ":3:16: aggregate 'fortnight'; expected week, month, quarter or year"},
            {"    aggregate: month\n    aggregate_by: median\n", ":4:19: aggregate_by 'median'; expected sum or mean"},
            {"    aggregate_by: mean\n", ":3:19: aggregate_by without aggregate; expected aggregate: week, month, "
                    + "quarter or year beside it"},
            {"    form: [additive]\n", ":3:11: form: expected a single value"},
        };
        for (String[] c : cases) {
            Path spec = spec("briefs:\n  - data: nights.csv\n" + c[0]);
            assertThatThrownBy(() -> SpecReader.read(spec)).as(c[0]).isInstanceOf(SpecProblem.class)
                    .hasMessageStartingWith(spec + c[1]);
        }
    }

    @Test
    void theExistingKeysComeFirst() throws IOException {
        // a spec with two mistakes is told about the one the existing keys hold, as it always was
        Path spec = spec("briefs:\n  - data: nights.csv\n    form: cubic\n    paper: a3\n");
        assertThatThrownBy(() -> SpecReader.read(spec)).hasMessageStartingWith(spec + ":4:12: paper 'a3'");
    }
}
