package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.LocalDate;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.series.ValueFlag;
import org.junit.jupiter.api.Test;

class AggregatorTest {

    /** Daily values equal to the day of the month, 2024-01-15 to 2024-04-10. */
    private static String dailyText(LocalDate skip) {
        StringBuilder text = new StringBuilder("date,visitors\n");
        for (LocalDate d = LocalDate.of(2024, 1, 15); !d.isAfter(LocalDate.of(2024, 4, 10)); d = d.plusDays(1)) {
            text.append(d).append(',').append(d.equals(skip) ? "" : String.valueOf(d.getDayOfMonth()))
                    .append(d.equals(LocalDate.of(2024, 3, 31)) ? "p" : "").append('\n');
        }
        return text.toString();
    }

    @Test
    void daysSumToMonthsAndPartialEdgeMonthsAreLeftOut() {
        ReadResult read = Files.read("d.csv", dailyText(null),
                ReadOptions.defaults().withAggregation(new Aggregation(Frequency.MONTHLY, Aggregation.Method.SUM)));
        Series s = read.series().get(0);
        assertThat(s.start()).isEqualTo(Period.month(2024, 2));
        assertThat(s.end()).isEqualTo(Period.month(2024, 3));
        assertThat(s.value(0)).isEqualTo(29 * 30 / 2);   // 1 + 2 + ... + 29 (February 2024 has 29 days)
        assertThat(s.value(1)).isEqualTo(31 * 32 / 2);
        assertThat(s.flags(1)).containsExactly(ValueFlag.PROVISIONAL);
        assertThat(read.warnings()).anySatisfy(w -> assertThat(w.message()).contains("left out 2024-01, 2024-04"));
    }

    @Test
    void meanOfDaysAndAMissingDayMakesTheMonthMissing() {
        ReadResult read = Files.read("d.csv", dailyText(LocalDate.of(2024, 3, 3)),
                ReadOptions.defaults().withAggregation(new Aggregation(Frequency.MONTHLY, Aggregation.Method.MEAN)));
        Series s = read.series().get(0);
        assertThat(s.value(0)).isEqualTo(15.0);   // mean of 1..29
        assertThat(s.isMissing(1)).isTrue();
        assertThat(read.warnings()).anySatisfy(w -> assertThat(w.message()).contains("2024-03 set to missing"));
    }

    @Test
    void monthsSumToQuarters() {
        Series s = Files.read("m.csv", "month,v\n2024-01,1\n2024-02,2\n2024-03,3\n2024-04,4\n2024-05,5\n2024-06,6\n",
                ReadOptions.defaults().withAggregation(new Aggregation(Frequency.QUARTERLY, Aggregation.Method.SUM)))
                .series().get(0);
        assertThat(s.values()).containsExactly(6, 15);
    }

    @Test
    void weeksCannotBeAggregatedToMonths() {
        assertThatThrownBy(() -> Files.read("w.csv", "week,v\n2024-W01,1\n2024-W02,2\n",
                ReadOptions.defaults().withAggregation(new Aggregation(Frequency.MONTHLY, Aggregation.Method.SUM))))
                .isInstanceOf(DataProblemException.class).hasMessageContaining("week can straddle two months");
    }
}
