package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * Dates before 1583, the first full year of the Gregorian calendar, may be Julian ones, whose Easter
 * and weekdays differ: the calendar's effects are not estimated for such a series, with a typed
 * caveat saying why, and everything else is analysed as usual. Invented series, seeded.
 */
class CalendarBeforeGregorianTest {

    /** Seasonal factors, January to December (invented). */
    private static final double[] SEASON = {0.80, 0.90, 0.85, 0.95, 1.00, 1.10, 1.45, 1.50, 1.05, 0.90, 0.70, 0.90};

    private static Series monthly(Period start, int n) {
        Random random = new Random(1583);
        double[] x = new double[n];
        for (int t = 0; t < n; t++) {
            x[t] = 1000 * SEASON[t % 12] * Math.exp(0.02 * random.nextGaussian());
        }
        return Series.builder("guest_nights", Frequency.MONTHLY).unit("nights").append(start, x).snapshot();
    }

    @Test
    void aSeriesStartingBefore1583HasNoCalendarFindingAndSaysWhy() {
        Findings f = new Analyst().withoutOutlook().analyse(monthly(Period.month(1500, 1), 72));
        assertThat(f.calendar()).isNull();
        assertThat(f.notes()).contains(new Caveat.CalendarBeforeGregorian(1583));
        // the rest of the analysis is made as for any other series
        assertThat(f.seasonality()).isNotNull();
    }

    @Test
    void aSeriesSpanning1583FromBeforeIsTreatedAsBefore() {
        Findings f = new Analyst().withoutOutlook().analyse(monthly(Period.month(1580, 1), 72));
        assertThat(f.calendar()).isNull();
        assertThat(f.notes()).contains(new Caveat.CalendarBeforeGregorian(1583));
    }

    @Test
    void aSeriesStartingIn1583HasItsCalendarFinding() {
        Findings f = new Analyst().withoutOutlook().analyse(monthly(Period.month(1583, 1), 72));
        assertThat(f.calendar()).isNotNull();
        // Easter 1583 fell on 10 April (Gregorian), from the published Gregorian Easter tables (from memory)
        assertThat(f.calendar().easter().get(0)).isEqualTo(new CalendarFinding.EasterDate(1583, "1583-04-10"));
        assertThat(f.notes()).noneMatch(n -> n instanceof Caveat.CalendarBeforeGregorian);
    }

    @Test
    void aQuarterlySeriesBefore1583IsTreatedAlike() {
        double[] x = new double[40];
        for (int t = 0; t < x.length; t++) {
            x[t] = 100 + 10 * (t % 4) + t;
        }
        Series quarterly = Series.builder("arrivals", Frequency.QUARTERLY).append(Period.quarter(1400, 1), x).snapshot();
        Findings f = new Analyst().withoutOutlook().analyse(quarterly);
        assertThat(f.calendar()).isNull();
        assertThat(f.notes()).contains(new Caveat.CalendarBeforeGregorian(1583));
    }
}
