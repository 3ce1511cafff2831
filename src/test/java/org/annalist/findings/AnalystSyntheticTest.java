package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/** Known truth, invented: every decision of the analysis flips when its cause is taken away. */
class AnalystSyntheticTest {

    private static Series monthly(double slope, double seasonAmplitude, boolean multiplicative, long seed) {
        Random random = new Random(seed);
        double[] x = new double[120];
        for (int t = 0; t < x.length; t++) {
            double level = 1000 + slope * t;
            double season = seasonAmplitude * Math.sin(2 * Math.PI * (t - 3) / 12);   // peak in July
            x[t] = (multiplicative ? level * (1 + season) : level + 1000 * season) + 10 * random.nextGaussian();
        }
        return Series.builder("synthetic", Frequency.MONTHLY).append(Period.month(2015, 1), x).snapshot();
    }

    @Test
    void trendOrNoTrend() {
        assertThat(new Analyst().analyse(monthly(5, 0.3, false, 1)).trend().direction()).isEqualTo(Direction.INCREASING);
        assertThat(new Analyst().analyse(monthly(-5, 0.3, false, 1)).trend().direction()).isEqualTo(Direction.DECREASING);
        // Without a trend the 5 % test may still fire by chance: over 20 seeds, expect about one.
        int falseTrends = 0;
        for (long seed = 1; seed <= 20; seed++) {
            falseTrends += new Analyst().analyse(monthly(0, 0.3, false, seed)).trend().direction() == Direction.NONE ? 0 : 1;
        }
        assertThat(falseTrends).isLessThanOrEqualTo(3);
    }

    @Test
    void seasonOrNoSeason() {
        Findings seasonal = new Analyst().analyse(monthly(2, 0.3, false, 2));
        assertThat(seasonal.seasonality().present()).isTrue();
        assertThat(seasonal.seasonality().peak().label()).isEqualTo("Jul");
        assertThat(new Analyst().analyse(monthly(2, 0, false, 2)).seasonality().present()).isFalse();
    }

    @Test
    void additiveOrMultiplicative() {
        assertThat(new Analyst().analyse(monthly(20, 0.3, true, 3)).seasonality().form()).isEqualTo(Form.MULTIPLICATIVE);
        assertThat(new Analyst().analyse(monthly(20, 0.3, false, 3)).seasonality().form()).isEqualTo(Form.ADDITIVE);
    }

    @Test
    void shortSeriesMakeNoSeasonalClaimAndSayWhy() {
        double[] x = new double[30];
        for (int t = 0; t < x.length; t++) {
            x[t] = 100 + 30 * Math.sin(2 * Math.PI * t / 12);
        }
        Findings f = new Analyst().analyse(Series.builder("short", Frequency.MONTHLY).append(Period.month(2024, 1), x)
                .snapshot());
        assertThat(f.seasonality().present()).isFalse();
        assertThat(f.seasonality().verdict()).isEqualTo(SeasonVerdict.TOO_SHORT);
        assertThat(f.notes()).contains(new Caveat.TooShortForSeason());
    }

    @Test
    void aGapInTheDataStillGivesFindings() {
        Series s = monthly(5, 0.3, false, 4);
        double[] x = s.values();
        x[30] = Double.NaN;
        x[31] = Double.NaN;
        Findings f = new Analyst().analyse(Series.builder("gappy", Frequency.MONTHLY).append(Period.month(2015, 1), x)
                .snapshot());
        assertThat(f.series().missing()).isEqualTo(2);
        assertThat(f.seasonality().present()).isTrue();
        assertThat(f.trend().direction()).isEqualTo(Direction.INCREASING);
    }
}
