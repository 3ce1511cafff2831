package org.annalist.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Locale;
import java.util.Random;
import org.annalist.analysis.calendar.CalendarRegressors;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * The first sentence does not lead with a single month that Easter's move distorts: where Easter
 * moved between the months compared and its effect counts, the lead gives the change of March and
 * April together, which the move does not affect (invented monthly series with a planted Easter effect).
 */
class EasterLeadTest {

    private static final Period START = Period.month(2011, 1);
    /** Seasonal factors, January to December (invented). */
    private static final double[] SEASON = {0.80, 0.90, 0.85, 0.95, 1.00, 1.10, 1.45, 1.50, 1.05, 0.90, 0.70, 0.90};

    /**
     * 1 % growth a year, season, 1 % noise, +25 % for a month holding all 8 days before Easter
     * Sunday, and 3 % less in every month from March 2025 on (all invented).
     */
    private static Series planted(Period end) {
        Random random = new Random(7);
        int n = (int) START.until(end) + 1;
        double[] x = new double[n];
        for (int t = 0; t < n; t++) {
            Period p = START.plus(t);
            double easter = CalendarRegressors.easterShare(p, CalendarRegressors.DEFAULT_EASTER_WINDOW);
            x[t] = Math.round(10_000 * Math.pow(1.01, t / 12.0) * SEASON[t % 12] * Math.exp(0.01 * random.nextGaussian())
                    * (1 + 0.25 * easter) * (p.compareTo(Period.month(2025, 3)) >= 0 ? 0.97 : 1));
        }
        return Series.builder("guest_nights", Frequency.MONTHLY).unit("nights").append(START, x).snapshot();
    }

    @Test
    void whenEasterMovesBetweenTheAprilsComparedTheLeadGivesMarchAndAprilTogether() {
        // Easter Sunday 20 April 2025, 31 March 2024 (Meeus' computus): April 2025 holds the 8 days, April 2024 none
        Series s = planted(Period.month(2025, 4));
        AuditedBrief brief = AuditedBrief.of("easter-april", s);
        String lead = brief.section("lead");
        int i = s.size() - 1;
        double together = 100 * ((s.value(i) + s.value(i - 1)) / (s.value(i - 12) + s.value(i - 13)) - 1);
        double counted = 100 * (s.value(i) / s.value(i - 12) - 1);
        assertThat(counted).as("the planted Easter lifts April as counted").isPositive();
        assertThat(lead).contains("March and April 2025 together, which Easter's move does not affect, were "
                + String.format(Locale.ROOT, "%.1f", Math.abs(together)) + "\u00A0% " + (together > 0 ? "higher" : "lower"))
                .contains("April 2025 alone is distorted by Easter's date (20 April 2025, a year earlier 31 March 2024)")
                .doesNotContain("once the calendar's effect is taken out");
        // the first key figure quotes the same span, not the single month
        assertThat(brief.section("key-note")).startsWith(String.format(Locale.ROOT, "%s%.1f",
                together >= 0 ? "+" : "\u2212", Math.abs(together)));
    }

    @Test
    void whenEasterStaysInTheSameMonthsTheLeadKeepsTheSingleMonthsChange() {
        // October: no Easter days either year, so the single month is compared as usual
        AuditedBrief brief = AuditedBrief.of("no-easter", planted(Period.month(2024, 10)));
        assertThat(brief.section("lead")).contains("than in October 2023").doesNotContain("Easter");
    }
}
