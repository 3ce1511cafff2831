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
    void aFlowMeasuredMoreOftenThanYearlyCountsItsSlopeAYearInOnePeriodsTotal() {
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.MONTHLY)).isEqualTo("a year in the monthly total");
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.QUARTERLY)).isEqualTo("a year in the quarterly total");
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.HALF_YEARLY)).isEqualTo("a year in the half-yearly total");
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.WEEKLY)).isEqualTo("a year in the weekly total");
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.DAILY)).isEqualTo("a year in the daily total");
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.BUSINESS_DAILY)).isEqualTo("a year in the daily total");
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
