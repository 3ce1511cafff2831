package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Optional;
import java.util.Random;
import org.annalist.analysis.decompose.Stl;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/** The seasonal verdicts of the decision rules, on invented series whose truth is known. */
class SeasonalityFindingsTest {

    private static final FormChoice ADDITIVE = FormChoice.forced(Form.ADDITIVE);

    private static SeasonalityFinding judge(double[] y, int seasonalWindow) {
        Series series = Series.builder("synthetic", Frequency.MONTHLY).append(Period.month(2015, 1), y).snapshot();
        Stl.Result stl = Stl.withPeriod(12).withSeasonalWindow(seasonalWindow).fit(y);
        return SeasonalityFindings.of(series, y, Optional.of(stl), ADDITIVE, 500);
    }

    @Test
    void aClearPatternIsPresentWithItsPeak() {
        Random random = new Random(1);
        double[] y = new double[96];
        for (int t = 0; t < y.length; t++) {
            y[t] = 500 + 0.5 * t + 60 * -Math.cos(2 * Math.PI * t / 12) + 5 * random.nextGaussian();
        }
        SeasonalityFinding s = judge(y, 13);
        assertThat(s.verdict()).isEqualTo(SeasonVerdict.PRESENT);
        assertThat(s.present()).isTrue();
        assertThat(s.peak().label()).isEqualTo("Jul");
        assertThat(s.changed()).isFalse();
    }

    @Test
    void noiseAloneIsNoPattern() {
        Random random = new Random(2);
        double[] y = new double[96];
        for (int t = 0; t < y.length; t++) {
            y[t] = 500 + 0.5 * t + 5 * random.nextGaussian();
        }
        assertThat(judge(y, 13).verdict()).isIn(SeasonVerdict.ABSENT, SeasonVerdict.NEGLIGIBLE);
    }

    @Test
    void aDetectableButTinyPatternIsNegligible() {
        // Amplitude 2 on a level of 500: a swing under 1 % of the level, yet very regular (noise 0.2).
        Random random = new Random(3);
        double[] y = new double[96];
        for (int t = 0; t < y.length; t++) {
            y[t] = 500 + 2 * Math.sin(2 * Math.PI * t / 12) + 0.2 * random.nextGaussian();
        }
        SeasonalityFinding s = judge(y, 13);
        assertThat(s.verdict()).isEqualTo(SeasonVerdict.NEGLIGIBLE);
        assertThat(s.present()).isFalse();
        assertThat(s.peak()).isNull();
    }

    @Test
    void aPatternWhosePeakMovesIsChanged() {
        double[] y = new double[12 * 10];
        for (int t = 0; t < y.length; t++) {
            double peakMonth = t < 60 ? 6 : 1;   // from a July peak to a February peak
            y[t] = 500 + 50 * Math.cos(2 * Math.PI * (t % 12 - peakMonth) / 12);
        }
        SeasonalityFinding s = judge(y, 7);
        assertThat(s.changed()).isTrue();
        assertThat(s.profile().stream().max((a, b) -> Double.compare(a.index(), b.index())).orElseThrow().label())
                .isEqualTo("Feb");
    }

    @Test
    void annualDataHaveNoSeasons() {
        Series annual = Series.builder("annual", Frequency.ANNUAL).append(Period.year(2000), new double[20]).snapshot();
        assertThat(SeasonalityFindings.of(annual, annual.values(), Optional.empty(), ADDITIVE, 1).verdict())
                .isEqualTo(SeasonVerdict.NOT_APPLICABLE);
    }
}
