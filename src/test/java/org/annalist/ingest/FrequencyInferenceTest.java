package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.DayOfWeek;
import java.time.LocalDate;
import org.annalist.series.Frequency;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

class FrequencyInferenceTest {

    private static Series datedSeries(LocalDate from, LocalDate to, int stepDays, boolean skipWeekends) {
        StringBuilder text = new StringBuilder("date,value\n");
        int n = 0;
        for (LocalDate d = from; !d.isAfter(to); d = d.plusDays(stepDays)) {
            boolean weekend = d.getDayOfWeek() == DayOfWeek.SATURDAY || d.getDayOfWeek() == DayOfWeek.SUNDAY;
            if (!(skipWeekends && weekend)) {
                text.append(d).append(',').append(++n).append('\n');
            }
        }
        return Files.read("d.csv", text.toString()).series().get(0);
    }

    @Test
    void datesEveryDayAreDaily() {
        Series s = datedSeries(LocalDate.of(2024, 1, 1), LocalDate.of(2024, 3, 31), 1, false);
        assertThat(s.frequency()).isEqualTo(Frequency.DAILY);
        assertThat(s.size()).isEqualTo(91);
        assertThat(s.missingCount()).isZero();
    }

    @Test
    void weekdaysOnlyAreBusinessDailyAndWeekendsAreNotMissing() {
        Series s = datedSeries(LocalDate.of(2024, 1, 1), LocalDate.of(2024, 3, 31), 1, true);
        assertThat(s.frequency()).isEqualTo(Frequency.BUSINESS_DAILY);
        assertThat(s.size()).isEqualTo(65);   // weekdays from Mon 1 Jan to Fri 29 Mar 2024 (calendar count)
        assertThat(s.missingCount()).isZero();
    }

    @Test
    void aMissingWeekdayIsAGapInABusinessCalendar() {
        StringBuilder text = new StringBuilder("date,price\n");
        for (LocalDate d = LocalDate.of(2024, 1, 1); d.isBefore(LocalDate.of(2024, 2, 1)); d = d.plusDays(1)) {
            if (d.getDayOfWeek().getValue() <= 5 && !d.equals(LocalDate.of(2024, 1, 17))) {
                text.append(d).append(",1\n");
            }
        }
        Series s = Files.read("p.csv", text.toString()).series().get(0);
        assertThat(s.frequency()).isEqualTo(Frequency.BUSINESS_DAILY);
        assertThat(s.missingPeriods()).extracting(p -> p.label()).containsExactly("2024-01-17");
    }

    @Test
    void weeklyDatesAreIsoWeeks() {
        Series s = datedSeries(LocalDate.of(2024, 1, 1), LocalDate.of(2024, 6, 30), 7, false);
        assertThat(s.frequency()).isEqualTo(Frequency.WEEKLY);
        assertThat(s.start().label()).isEqualTo("2024-W01");
    }

    @Test
    void monthEndQuarterEndAndYearStartDates() {
        assertThat(Files.read("m.csv", "date,v\n2024-01-31,1\n2024-02-29,2\n2024-03-31,3\n").series().get(0).frequency())
                .isEqualTo(Frequency.MONTHLY);
        assertThat(Files.read("q.csv", "date,v\n2024-03-31,1\n2024-06-30,2\n2024-09-30,3\n").series().get(0).frequency())
                .isEqualTo(Frequency.QUARTERLY);
        assertThat(Files.read("y.csv", "date,v\n2022-01-01,1\n2023-01-01,2\n2024-01-01,3\n").series().get(0).frequency())
                .isEqualTo(Frequency.ANNUAL);
    }

    @Test
    void gapsInMonthlyDataBecomeMissingPeriods() {
        Series s = Files.read("g.csv", "month,v\n2024-01,1\n2024-02,2\n2024-05,5\n").series().get(0);
        assertThat(s.size()).isEqualTo(5);
        assertThat(s.missingPeriods()).extracting(p -> p.label()).containsExactly("2024-03", "2024-04");
    }
}
