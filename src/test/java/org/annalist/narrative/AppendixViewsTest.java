package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.annalist.findings.Analyst;
import org.annalist.findings.CalendarFinding;
import org.annalist.findings.Findings;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.series.Series;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;

/**
 * The methods appendix of the demo's total guest nights (invented data, demo-data/README.md): the
 * calendar effects that "expected from trend, season and calendar" rests on, and the irregular
 * share, each as the findings have them.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class AppendixViewsTest {

    private Findings findings;
    private Formats f;

    @BeforeAll
    void analyseTheTotal() throws IOException {
        Series total = new SeriesFileReader(ReadOptions.defaults()).read(Path.of("demo-data/quennelmark-guest-nights.csv"))
                .series().stream().filter(s -> s.name().startsWith("Total")).findFirst().orElseThrow();
        findings = new Analyst().analyse(total);
        f = Formats.forValues(total.values(), Locale.UK);
    }

    private BriefView.MethodRow row(String name) {
        List<BriefView.MethodRow> rows = AppendixViews.methods(findings, f);
        return rows.stream().filter(r -> r.name().equals(name)).findFirst().orElseThrow(() -> new AssertionError(
                "no row " + name + " in " + rows.stream().map(BriefView.MethodRow::name).toList()));
    }

    @Test
    void theCalendarRowGivesEveryEffectEstimatedWithItsSizePValueAndWhetherItCounts() {
        String settings = row("Calendar effects").settings();
        for (CalendarFinding.Effect e : findings.calendar().effects()) {
            String name = e.name().equals(CalendarFinding.EASTER) ? "Easter" : "Friday and Saturday nights";
            assertThat(settings).contains(name + " " + f.signedPercent(e.effectPct()), f.pValue(e.pValue())
                    + (e.kept() ? ", allowed for" : ", not significant, not allowed for"));
        }
        // the demo plants Easter and no weekend effect (demo-data/README.md)
        assertThat(findings.calendar().effects()).anyMatch(e -> e.name().equals(CalendarFinding.EASTER) && e.kept())
                .anyMatch(e -> e.name().equals(CalendarFinding.WEEKEND_NIGHTS) && !e.kept());
        assertThat(settings).contains(findings.calendar().screenedOut().size() + " periods left out of the fit as unusual (robust weighting; not the one-offs reported above)");
    }

    @Test
    void theIrregularRowSaysHowTheShareWasMeasuredAndWhatItCameTo() {
        String settings = row("Irregular fluctuation").settings();
        assertThat(settings).isNotEmpty().contains("on the logarithms", "least-squares line: "
                + Math.round(100 * findings.irregular().share()) + "\u00A0%", "small below 20\u00A0%, large above 50\u00A0%");
    }

    @Test
    void theIrregularRowSaysWhichPeriodsAroundTheBreaksTheShareLeftOut() {
        // the demo's series has structural changes (demo-data/README.md), so the share leaves periods out
        assertThat(findings.breaks()).isNotEmpty();
        assertThat(findings.irregular().leftOutNearBreaks()).isPositive();
        int leftOut = findings.irregular().leftOutNearBreaks();
        int reach = findings.irregular().reach();
        // every window whole and apart: 2 · reach months a break; else some month was near two breaks or an end
        String around = leftOut == findings.breaks().size() * 2 * reach ? reach + " on each side"
                : "up to " + reach + " on each side, each month counted once";
        assertThat(row("Irregular fluctuation").settings()).contains("leaving out the " + leftOut
                + " months around its structural change" + (findings.breaks().size() > 1 ? "s" : "") + " (" + around + ")");
    }
}
