package org.annalist.audit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.time.LocalDate;
import java.util.Random;
import org.annalist.analysis.calendar.Easter;
import org.annalist.findings.IndicatorsFinding;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * The first page's change of the level on the period before is a change of level: the calendar
 * effects the analysis found are taken out with the season, and the sentence says so. Seasonal
 * adjustment alone leaves in a month the part of its Easter that differs from its usual share, so
 * an April that holds all of Easter after a March that held none would show a rise that is only
 * the holiday.
 */
class LevelChangeWithoutCalendarTest {

    @Test
    void anAprilHoldingAllOfEasterAfterAMarchWithNoneShowsNoRiseOnceTheCalendarIsOut() {
        // invented: a flat level with a season and 0.5 % noise, January 2011 to April 2025; the
        // nights of Easter (12 % of a month's level) spread over the 8 days before Easter Sunday,
        // the usual Easter regressor (Bell & Hillmer 1983; the window is from memory). Easter 2025
        // was on 20 April, so March 2025 holds none of those days and April all of them.
        double[] x = seasonal(new Random(11));
        for (int y = 0; y * 12 < x.length; y++) {
            LocalDate easter = Easter.sunday(2011 + y);
            for (int d = 1; d <= 8; d++) {
                int t = y * 12 + easter.minusDays(d).getMonthValue() - 1;
                if (t < x.length) {
                    x[t] *= 1 + 0.12 / 8;
                }
            }
        }
        AuditedBrief brief = AuditedBrief.of("easter", series(x));
        IndicatorsFinding latest = brief.findings().indicators();

        assertThat(latest.adjustedForCalendar()).isTrue();
        // derived in the test: nothing but noise moves the level, so the change is within about two
        // standard deviations of the difference of two 0.5 % errors; the Easter days alone, at about
        // 64 % of them in April in 2011–2024, would leave some +8 % in it (0.12 × (0.36 + 0.36) in logs)
        assertThat(latest.seasonallyAdjustedChangePct()).isCloseTo(0.0, within(1.6));
        assertThat(brief.text()).contains("Adjusted for season and calendar, the level moved");
    }

    @Test
    void aSeriesWithoutCalendarEffectsSaysSeasonallyAdjusted() {
        AuditedBrief brief = AuditedBrief.of("plain", series(seasonal(new Random(12))));

        assertThat(brief.findings().indicators().adjustedForCalendar()).isFalse();
        assertThat(brief.text()).contains("Seasonally adjusted, the level moved")
                .doesNotContain("Adjusted for season and calendar");
    }

    /** 172 months from January 2011 (to April 2025): 50,000 a month, a ±30 % season, 0.5 % noise. */
    private static double[] seasonal(Random random) {
        double[] x = new double[172];
        for (int t = 0; t < x.length; t++) {
            x[t] = 50_000 * (1 + 0.3 * Math.sin(2 * Math.PI * t / 12)) * (1 + 0.005 * random.nextGaussian());
        }
        return x;
    }

    private static Series series(double[] x) {
        double[] rounded = new double[x.length];
        for (int t = 0; t < x.length; t++) {
            rounded[t] = Math.round(x[t]);
        }
        return Series.builder("Guest nights", Frequency.MONTHLY).unit("nights").append(Period.month(2011, 1), rounded)
                .snapshot();
    }
}
