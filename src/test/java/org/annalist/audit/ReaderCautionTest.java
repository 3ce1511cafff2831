package org.annalist.audit;

import static org.assertj.core.api.Assertions.assertThat;

import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * The caution that the brief decides nothing stands on the outlook page as well as on the last, and
 * the last page's box keeps "forecasts are estimates" where the brief forecasts (invented series).
 */
class ReaderCautionTest {

    /** 6 years of a monthly series with a season and a slight rise (invented). */
    private static Series planted() {
        double[] x = new double[72];
        for (int t = 0; t < x.length; t++) {
            x[t] = 1000 + 2 * t + 150 * Math.sin(2 * Math.PI * t / 12) + ((t * 7) % 5 - 2) * 8;
        }
        return Series.builder("visitors", Frequency.MONTHLY).unit("visitors").append(Period.month(2020, 1), x).snapshot();
    }

    @Test
    void theOutlookPagesCautionSaysDecisionsRestWithTheReader() {
        AuditedBrief brief = AuditedBrief.of("caution", planted());
        assertThat(brief.findings().outlook()).isNotNull();
        assertThat(brief.section("caution forecast-caution"))
                .contains("decisions rest with the reader, who should weigh them against local knowledge");
    }

    @Test
    void theClosingCautionKeepsThatForecastsAreEstimates() {
        String text = AuditedBrief.of("closing", planted()).text();
        assertThat(text.substring(text.lastIndexOf("The figures in this brief are statistical estimates")))
                .contains("values may be revised, and forecasts are estimates. They do not decide anything");
    }
}
