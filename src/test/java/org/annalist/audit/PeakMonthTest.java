package org.annalist.audit;

import static org.assertj.core.api.Assertions.assertThat;

import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * One month is named as the peak only when it was above the runner-up in most years; two months
 * that trade places are named together (invented monthly series, 8 years).
 */
class PeakMonthTest {

    /** A summer season; August is {@code evenYears} above July in even years and {@code oddYears} in odd ones. */
    private static Series summer(double evenYears, double oddYears) {
        double[] season = {-300, -250, -150, -50, 50, 200, 0, 0, 150, 0, -200, -280};
        double[] x = new double[96];
        for (int t = 0; t < x.length; t++) {
            int month = t % 12;
            boolean even = (t / 12) % 2 == 0;
            double summer = month == 6 ? 500 : month == 7 ? 500 + (even ? evenYears : oddYears) : 0;
            x[t] = 1000 + season[month] + summer + 3 * t + ((t * 7) % 5 - 2) * 4;
        }
        return Series.builder("visitors", Frequency.MONTHLY).unit("visitors").append(Period.month(2016, 1), x).snapshot();
    }

    @Test
    void twoMonthsThatTradePlacesFromYearToYearAreNamedTogether() {
        // August +60 in even years, −40 in odd ones: the profile puts August first, but it won only half the years
        String text = AuditedBrief.of("trading", summer(60, -40)).text();
        assertThat(text).contains("It peaks in July\u2013August (");
    }

    @Test
    void aMonthAboveTheRunnerUpInEveryYearIsNamedAlone() {
        String text = AuditedBrief.of("august", summer(80, 60)).text();
        assertThat(text).contains("It peaks in August (");
    }
}
