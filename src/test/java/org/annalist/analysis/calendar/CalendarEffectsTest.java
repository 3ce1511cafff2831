package org.annalist.analysis.calendar;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.util.Random;
import java.util.Set;
import org.annalist.series.Holiday;
import org.annalist.series.Period;
import org.junit.jupiter.api.Test;

class CalendarEffectsTest {

    /** 16 years of a monthly log-irregular with a known Easter effect and AR(1) noise. */
    private static double[] simulated(double easterEffect, double weekendEffect, long seed) {
        Random random = new Random(seed);
        Period start = Period.month(2010, 1);
        CentredRegressors regressors = CentredRegressors.of(start, 192, CalendarRegressors.DEFAULT_EASTER_WINDOW, true,
                java.util.List.of(), CalendarEffects.Weekdays.FRIDAY_SATURDAY_NIGHTS);
        java.util.List<String> names = regressors.names();
        double[][] x = regressors.all();
        double[] y = new double[192];
        double noise = 0;
        for (int t = 0; t < y.length; t++) {
            noise = 0.3 * noise + 0.01 * random.nextGaussian();
            y[t] = easterEffect * x[t][names.indexOf(CalendarEffects.EASTER)]
                    + weekendEffect * x[t][names.indexOf(CalendarEffects.WEEKEND)] + noise;
        }
        return y;
    }

    @Test
    void aKnownEasterEffectIsRecoveredWithinItsStandardError() {
        CalendarEffects.Result r = CalendarEffects.estimate(simulated(0.05, 0, 1), Period.month(2010, 1), 8).orElseThrow();
        CalendarEffects.Effect easter = r.effect(CalendarEffects.EASTER).orElseThrow();
        assertThat(Math.abs(easter.coefficient() - 0.05)).isLessThanOrEqualTo(2 * easter.standardError());
        assertThat(easter.pValue()).isLessThan(0.001);
        assertThat(r.effect(CalendarEffects.WEEKEND).orElseThrow().pValue()).isGreaterThan(0.05);
    }

    @Test
    void aWeekendEffectIsRecoveredToo() {
        CalendarEffects.Result r = CalendarEffects.estimate(simulated(0, 0.01, 2), Period.month(2010, 1), 8).orElseThrow();
        CalendarEffects.Effect weekend = r.effect(CalendarEffects.WEEKEND).orElseThrow();
        assertThat(weekend.pValue()).isLessThan(0.05);
        assertThat(Math.abs(weekend.coefficient() - 0.01)).isLessThanOrEqualTo(2 * weekend.standardError());
    }

    @Test
    void noiseAloneKeepsNoEffectMostOfTheTime() {
        int kept = 0;
        for (long seed = 10; seed < 40; seed++) {
            CalendarEffects.Result r = CalendarEffects.estimate(simulated(0, 0, seed), Period.month(2010, 1), 8).orElseThrow();
            kept += r.effects().stream().filter(e -> e.pValue() < 0.05).count();
        }
        // two effects tested at 5 % in 30 series: about three false effects expected (over 400 seeds the
        // rate measured 6.75 %, Newey-West's usual slight excess in samples of this size)
        assertThat(kept).isLessThanOrEqualTo(8);
    }

    @Test
    void aUsersMovingHolidayIsEstimatedLikeEaster() {
        // A three-day festival that starts on 30 June in even years and early July in odd years (invented),
        // with an effect of +6 % on its month.
        java.util.Set<java.time.LocalDate> days = new java.util.HashSet<>();
        for (int year = 2010; year < 2026; year++) {
            java.time.LocalDate first = year % 2 == 0 ? java.time.LocalDate.of(year, 6, 30) : java.time.LocalDate.of(year, 7, 2);
            for (int d = 0; d < 3; d++) {
                days.add(first.plusDays(d));
            }
        }
        Holiday festival = new Holiday("festival", days);
        Random random = new Random(4);
        double[] y = new double[192];
        Period start = Period.month(2010, 1);
        CentredRegressors regressors = CentredRegressors.of(start, 192, 8, true, java.util.List.of(festival),
                CalendarEffects.Weekdays.FRIDAY_SATURDAY_NIGHTS);
        java.util.List<String> names = regressors.names();
        double[][] x = regressors.all();
        for (int t = 0; t < y.length; t++) {
            y[t] = 0.06 * x[t][names.indexOf("festival")] + 0.01 * random.nextGaussian();
        }
        CalendarEffects.Result r = CalendarEffects.estimate(y, start, 8, java.util.List.of(festival)).orElseThrow();
        CalendarEffects.Effect e = r.effect("festival").orElseThrow();
        assertThat(e.pValue()).isLessThan(0.05);
        assertThat(Math.abs(e.coefficient() - 0.06)).isLessThanOrEqualTo(2 * e.standardError());
        assertThat(festival.share(Period.month(2011, 7))).isEqualTo(1.0);
        assertThat(festival.share(Period.month(2012, 7))).isEqualTo(2.0 / 3);   // 30 June, 1 and 2 July 2012
    }

    @Test
    void twoHolidaysOnTheSameDaysCannotBeToldApartAndGiveNoEstimate() {
        Set<LocalDate> days = new java.util.HashSet<>();
        for (int year = 2010; year <= 2019; year++) {
            days.add(LocalDate.of(year, 7, 1 + year % 7));
        }
        double[] noise = simulated(0, 0, 5);
        assertThat(CalendarEffects.estimate(noise, Period.month(2010, 1), 8,
                java.util.List.of(new Holiday("fair", days), new Holiday("market", days)))).isEmpty();
    }

    @Test
    void aOneOffInAnEasterMonthDoesNotPullTheRobustEstimate() {
        // invented: +5 % Easter effect, and a −40 % one-off in March 2011 (Easter on 24 April, so
        // March holds none of its days and its centred Easter regressor is far from zero)
        double[] y = simulated(0.05, 0, 21);
        int march2011 = 14;
        y[march2011] += Math.log(0.6);
        CalendarEffects.Result plain = CalendarEffects.estimate(y, Period.month(2010, 1), 8).orElseThrow();
        CalendarEffects.Result robust = CalendarEffects.robust(y, Period.month(2010, 1), 8, java.util.List.of(),
                CalendarEffects.Weekdays.FRIDAY_SATURDAY_NIGHTS, 3.5).orElseThrow();
        CalendarEffects.Effect easter = robust.effect(CalendarEffects.EASTER).orElseThrow();
        assertThat(robust.screened()).contains(march2011);
        // within three standard errors (a 99.7 % band: one seed, so a wide band; common practice)
        assertThat(Math.abs(easter.coefficient() - 0.05)).isLessThanOrEqualTo(3 * easter.standardError());
        assertThat(Math.abs(easter.coefficient() - 0.05))
                .isLessThan(Math.abs(plain.effect(CalendarEffects.EASTER).orElseThrow().coefficient() - 0.05));
    }
}
