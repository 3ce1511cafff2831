package org.annalist.brief;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.annalist.chart.Figure;
import org.annalist.findings.Analyst;
import org.annalist.findings.FigurePlan;
import org.annalist.findings.Findings;
import org.annalist.ingest.Aggregation;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.jfree.chart.plot.XYPlot;
import org.junit.jupiter.api.Test;

/**
 * Every chart drawn in the series' own values names its value axis: the unit where the data give
 * one, else what the series' name says it counts. The demo's museum (invented data,
 * demo-data/README.md) has no unit, and its overview, year-over-year and outlook charts once showed
 * bare numbers beside axes titled "visitors against …" on the other charts.
 */
class ValueAxisTitleTest {

    private static final List<FigurePlan.Chart> IN_OWN_VALUES = List.of(FigurePlan.Chart.OVERVIEW, FigurePlan.Chart.YEARS,
            FigurePlan.Chart.OUTLOOK);

    @Test
    void aSeriesWithoutAUnitTitlesItsValueAxesWithWhatItsNameCounts() throws IOException {
        Series visitors = new SeriesFileReader(ReadOptions.defaults().withAggregation(
                new Aggregation(Frequency.MONTHLY, Aggregation.Method.SUM)))
                .read(Path.of("demo-data/glassworks-daily-visitors.csv")).series().get(0);
        assertThat(visitors.unit()).isEmpty();
        assertThat(visitors.name()).isEqualTo("Visitors");
        Map<FigurePlan.Chart, String> titles = valueAxes(visitors);
        assertThat(titles.keySet()).containsAll(IN_OWN_VALUES);
        for (FigurePlan.Chart chart : IN_OWN_VALUES) {
            assertThat(titles.get(chart)).as(chart.toString()).isEqualTo("visitors");
        }
    }

    @Test
    void aSeriesWithAUnitTitlesItsValueAxesWithTheUnit() {
        Series nights = planted("Guest nights", "nights");
        Map<FigurePlan.Chart, String> titles = valueAxes(nights);
        assertThat(titles.get(FigurePlan.Chart.OVERVIEW)).isEqualTo("nights");
        assertThat(titles.get(FigurePlan.Chart.YEARS)).isEqualTo("nights");
    }

    @Test
    void aNameThatStartsWithAnAcronymKeepsItsCapitalsAndATooLongNameIsLeftOff() {
        assertThat(valueAxes(planted("GDP", "")).get(FigurePlan.Chart.OVERVIEW)).isEqualTo("GDP");
        assertThat(valueAxes(planted("Overnight stays of visitors from far-away markets", ""))
                .get(FigurePlan.Chart.OVERVIEW)).isNull();
    }

    /** Each drawn chart's value-axis title (absent where it has none). */
    private static Map<FigurePlan.Chart, String> valueAxes(Series series) {
        Findings findings = new Analyst().analyse(series);
        List<Figure> figures = BriefWriter.figures(series, findings, FigurePlan.of(series, findings));
        return figures.stream().filter(f -> f.chart().getPlot() instanceof XYPlot
                        && ((XYPlot) f.chart().getPlot()).getRangeAxis().getLabel() != null)
                .collect(Collectors.toMap(Figure::kind, f -> ((XYPlot) f.chart().getPlot()).getRangeAxis().getLabel(),
                        (a, b) -> a));
    }

    /** Six invented years of a monthly flow: a level of 1,000 rising 3 % a year, a summer peak, no noise. */
    private static Series planted(String name, String unit) {
        double[] x = new double[72];
        for (int t = 0; t < x.length; t++) {
            x[t] = Math.round(1_000 * Math.pow(1.03, t / 12.0) * (1 + 0.4 * Math.sin(2 * Math.PI * (t % 12 - 3) / 12))
                    + 7 * ((t * 37) % 11 - 5));
        }
        return Series.builder(name, Frequency.MONTHLY).unit(unit).append(Period.month(2019, 1), x).snapshot();
    }
}
