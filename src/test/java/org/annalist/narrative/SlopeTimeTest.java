package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;

import org.annalist.findings.Measure;
import org.annalist.series.Frequency;
import org.junit.jupiter.api.Test;

/**
 * What a slope in units is said to be counted over ({@link MeasureWords#slopeTime}): a flow's slope
 * is fitted to its monthly (quarterly, daily...) values, so "a year" alone would read as the change
 * of the yearly total, a twelfth of what it is for monthly data (the rule follows from summing
 * over spans; no outside source).
 */
class SlopeTimeTest {

    @Test
    void aFlowMeasuredMoreOftenThanYearlyCountsItsSlopePerPeriodEachYear() {
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.MONTHLY)).isEqualTo("a month each year");
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.QUARTERLY)).isEqualTo("a quarter each year");
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.HALF_YEARLY)).isEqualTo("a half-year each year");
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.WEEKLY)).isEqualTo("a week each year");
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.DAILY)).isEqualTo("a day each year");
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.BUSINESS_DAILY)).isEqualTo("a day each year");
    }

    @Test
    void aYearlyFlowsSlopeIsAYearBecauseEachValueIsAYearsTotal() {
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.ANNUAL)).isEqualTo("a year");
    }

    @Test
    void aMeasureThatIsNotSummedKeepsAYearAtEveryFrequency() {
        for (Measure measure : Measure.values()) {
            if (!measure.summed()) {
                for (Frequency frequency : Frequency.values()) {
                    assertThat(MeasureWords.slopeTime(measure, frequency)).as(measure + " " + frequency).isEqualTo("a year");
                }
            }
        }
    }
}
