package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Locale;
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
    void aFlowMeasuredMoreOftenThanYearlyCountsItsSlopeAYearInEachPeriodsTotal() {
        // "in the monthly total" was read as the yearly total's change, twelve times too small
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.MONTHLY)).isEqualTo("a year in each month's total");
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.QUARTERLY)).isEqualTo("a year in each quarter's total");
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.HALF_YEARLY)).isEqualTo("a year in each half-year's total");
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.WEEKLY)).isEqualTo("a year in each week's total");
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.DAILY)).isEqualTo("a year in each day's total");
        assertThat(MeasureWords.slopeTime(Measure.FLOW, Frequency.BUSINESS_DAILY)).isEqualTo("a year in each day's total");
    }

    @Test
    void aFlowsSlopeIsAlsoSaidForTheYearsTotalAsThePrintedSlopeTimesThePeriodsInAYear() {
        Formats f = Formats.forValues(new double[] {100_000}, Locale.UK);
        // derived in the test: 2,927 prints as 2,930; 2,930 × 12 = 35,160, printed 35,200 (not 2,927 × 12 = 35,124 → 35,100)
        assertThat(MeasureWords.yearTotal(2_927, Measure.FLOW, Frequency.MONTHLY, "\u00A0nights", f))
                .isEqualTo("about 35,200\u00A0nights a year in the year's total");
        // 1,234 prints as 1,230; × 4 = 4,920
        assertThat(MeasureWords.yearTotal(-1_234, Measure.FLOW, Frequency.QUARTERLY, "", f))
                .isEqualTo("about 4,920 a year in the year's total");
    }

    @Test
    void noYearsTotalWhereTheSlopeIsNotOnePeriodsTotalOrThePeriodsDoNotMakeAWholeYear() {
        Formats f = Formats.forValues(new double[] {100_000}, Locale.UK);
        assertThat(MeasureWords.yearTotal(2_927, Measure.FLOW, Frequency.ANNUAL, "", f)).isEmpty();
        assertThat(MeasureWords.yearTotal(2_927, Measure.FLOW, Frequency.WEEKLY, "", f)).isEmpty();
        assertThat(MeasureWords.yearTotal(2_927, Measure.FLOW, Frequency.DAILY, "", f)).isEmpty();
        for (Measure measure : Measure.values()) {
            if (!measure.summed()) {
                assertThat(MeasureWords.yearTotal(2_927, measure, Frequency.MONTHLY, "", f)).as(measure.toString()).isEmpty();
            }
        }
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
