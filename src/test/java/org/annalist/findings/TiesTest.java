package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

import org.junit.jupiter.api.Test;

/**
 * A latest value equal to an earlier one is a tie, carried as evidence: the same period of another
 * year with the same value shares the rank ({@code tiedWith}), and a value equal to the series'
 * highest or lowest so far is an {@code equalRecord}, never the record itself. Invented series with
 * planted ties.
 */
class TiesTest {

    /** Four years to October 2024, Octobers the highest months: 500, 520, 540 and again 540 (planted). */
    static Series octoberTie(double lastOctober) {
        int n = 46;   // 2021-01 .. 2024-10
        double[] x = new double[n];
        for (int t = 0; t < n; t++) {
            int month = t % 12 + 1;
            int year = 2021 + t / 12;
            x[t] = month == 10 ? 500 + 20 * (year - 2021) : 300 + 10 * month + 3 * (year - 2021) + (t * 7 % 5);
        }
        x[n - 1] = lastOctober;
        return Series.builder("visitors", Frequency.MONTHLY).unit("visitors").append(Period.month(2021, 1), x).snapshot();
    }

    @Test
    void aLatestValueEqualToTheHighestSamePeriodSharesItsRankAndNamesTheOther() {
        Findings f = new Analyst().withoutOutlook().analyse(octoberTie(540));
        IndicatorsFinding i = f.indicators();
        assertThat(i.rank()).isEqualTo(new IndicatorsFinding.Rank(1, 4, List.of(Period.month(2023, 10))));
        // equal to the highest value of the series, which is therefore no record
        assertThat(i.record()).isNull();
        assertThat(i.equalRecord()).isEqualTo(new IndicatorsFinding.EqualRecord(IndicatorsFinding.Extreme.HIGH,
                List.of(Period.month(2023, 10))));
    }

    @Test
    void aValueAboveEveryOtherIsTheRecordWithoutATie() {
        IndicatorsFinding i = new Analyst().withoutOutlook().analyse(octoberTie(541)).indicators();
        assertThat(i.rank()).isEqualTo(new IndicatorsFinding.Rank(1, 4));
        assertThat(i.record()).isEqualTo(IndicatorsFinding.Extreme.HIGH);
        assertThat(i.equalRecord()).isNull();
    }

    @Test
    void aTieForTheLowestSamePeriodIsTheEqualLowest() {
        IndicatorsFinding i = new Analyst().withoutOutlook().analyse(octoberTie(500)).indicators();
        assertThat(i.rank()).isEqualTo(new IndicatorsFinding.Rank(3, 4, List.of(Period.month(2021, 10))));
        assertThat(i.rank().lowest()).isTrue();
        assertThat(i.equalRecord()).isNull();   // 500 is neither the series' highest nor its lowest
    }
}
