package org.annalist.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.Locale;
import org.annalist.findings.BreakFinding;
import org.annalist.findings.Episode;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * A fall whose climb back was followed within a year by a step down is not left at "risen back all
 * the way": the step and the level it left, against the level before the fall, follow (the demo's
 * invented Domestic nights, demo-data/quennelmark-guest-nights.csv).
 */
class EpisodeStepBackTest {

    @Test
    void aStepDownSoonAfterTheClimbBackIsSaidWithTheLevelItLeft() {
        Series domestic = new SeriesFileReader(ReadOptions.defaults())
                .read(Path.of("demo-data/quennelmark-guest-nights.csv")).require("Domestic");
        AuditedBrief brief = AuditedBrief.of("domestic", domestic);
        Episode e = brief.findings().episodes().get(0);
        BreakFinding step = brief.findings().breaks().stream()
                .filter(b -> b.kind().step() && b.changePct() < 0 && e.asOf().until(b.period()) > 0)
                .findFirst().orElseThrow();
        // both sizes worked from the findings: the step's own and the level after it against the level before the fall
        String stepPct = String.format(Locale.ROOT, "%.1f", Math.abs(step.changePct()));
        String belowPct = String.format(Locale.ROOT, "%.1f", 100 * (1 - step.levelAfter() / e.before()));
        assertThat(brief.text()).contains("of the step). It did not stay there: in October 2022 the level stepped down by " + stepPct
                + "\u00A0%, to about " + belowPct + "\u00A0% below the level before the fall (fitted level ");
    }
}
