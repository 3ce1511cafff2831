package org.annalist.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Random;
import org.annalist.findings.Analyst;
import org.annalist.findings.BreakFinding;
import org.annalist.findings.BreakKind;
import org.annalist.findings.Episode;
import org.annalist.findings.Form;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * A fall whose climb back was followed within a year by a step down is not left at "risen back all
 * the way": the step and the level it left, against the level before the fall, follow. And a climb
 * back that merely levels off has no step back to tell of.
 */
class EpisodeStepBackTest {

    /**
     * Invented: 16 monthly years from 2010 rising 1.5 % a year, a ±40 % summer season, 3.5 %
     * noise (seed 1); in January 2020 a collapse to 35 %, three months at the low, a straight climb
     * (in units) to 90 % over 18 months, then a genuine step down of 10 % from October 2021.
     */
    static Series climbThenStepDown() {
        Random random = new Random(1);
        double[] x = new double[192];
        for (int t = 0; t < x.length; t++) {
            int since = t - 120;
            double effect = since < 0 ? 1 : since < 3 ? 0.35 : since < 21 ? 0.35 + 0.55 * (since - 2) / 18.0 : 0.9 * 0.9;
            x[t] = 10_000 * Math.pow(1.015, t / 12.0) * (1 + 0.4 * Math.sin(2 * Math.PI * (t - 3) / 12))
                    * Math.exp(0.035 * random.nextGaussian()) * effect;
        }
        return Series.builder("planted", Frequency.MONTHLY).append(Period.month(2010, 1), x).snapshot();
    }

    @Test
    void aStepDownSoonAfterTheClimbBackIsSaidWithTheLevelItLeft() {
        Series series = climbThenStepDown();
        // worked in logs as the season is made: the form test is not what this pins
        AuditedBrief brief = AuditedBrief.of("planted", series,
                new Analyst(Optional.of(Form.MULTIPLICATIVE), Optional.empty(), List.of(), Optional.of(0)).analyse(series));
        Episode e = brief.findings().episodes().get(0);
        BreakFinding step = brief.findings().breaks().stream()
                .filter(b -> b.kind().step() && b.changePct() < 0 && e.asOf().until(b.period()) > 0)
                .findFirst().orElseThrow();
        assertThat(step.period()).isEqualTo(Period.month(2021, 10));
        // both sizes worked from the findings: the step's own and the level after it against the level before the fall
        String stepPct = String.format(Locale.ROOT, "%.1f", Math.abs(step.changePct()));
        String belowPct = String.format(Locale.ROOT, "%.1f", 100 * (1 - step.levelAfter() / e.before()));
        assertThat(brief.text()).contains("It did not stay there: in October 2021 the level stepped down by " + stepPct
                + "\u00A0%, to about " + belowPct + "\u00A0% below the level before the fall (fitted level ");
    }

    @Test
    void theDemoDomesticClimbBackLevelsOffWithoutAStepBack() {
        // demo-data/quennelmark-guest-nights.csv (invented): a straight climb to 90 % by September
        // 2022, then flat; the brief once read the lines' overshoot at the bend as a step down of 9.6 %
        Series domestic = new SeriesFileReader(ReadOptions.defaults())
                .read(Path.of("demo-data/quennelmark-guest-nights.csv")).require("Domestic");
        AuditedBrief brief = AuditedBrief.of("domestic", domestic);
        BreakFinding bend = brief.findings().breaks().stream()
                .filter(b -> b.period().equals(Period.month(2022, 10))).findFirst().orElseThrow();
        assertThat(bend.kind()).isEqualTo(BreakKind.SLOPE);
        assertThat(bend.levelAfter()).isEqualTo(bend.levelBefore());
        assertThat(bend.changePct()).isZero();
        assertThat(brief.text()).doesNotContain("It did not stay there").doesNotContain("step down of 9.6");
    }
}
