package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;

import org.annalist.findings.Smoothing;
import org.junit.jupiter.api.Test;

class TermsTest {

    @Test
    void anEvenMovingAverageIsNamedByItsTwoPasses() {
        // the 2×m centred moving average of Hyndman & Athanasopoulos (2021), §3.3; an odd window is a plain m-term one
        assertThat(Terms.movingAverage(new Smoothing.CentredAverage(12))).isEqualTo("2\u00D712 centred moving average");
        assertThat(Terms.movingAverage(new Smoothing.CentredAverage(5))).isEqualTo("5-term centred moving average");
    }
}
