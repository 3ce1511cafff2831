package org.annalist.chart;

import java.util.List;
import org.annalist.findings.Findings;
import org.annalist.series.Series;
import org.annalist.findings.FigurePlan;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Several series as small charts stacked on one shared time axis, each on its own scale (a market
 * of a tenth of the total would otherwise lie flat): the values thin, solid and light grey, the
 * trend-cycle over them thick and dashed in the accent colour, as on the overview charts, so that
 * the shapes compare at a glance and the two lines differ by width, dash and lightness when
 * printed in greyscale (the caption names them so).
 */
public final class SmallMultiplesChart {

    private SmallMultiplesChart() {
    }

    public static Figure of(List<Series> series, List<Findings> findings) {
        ChartStyle.install();
        CombinedDomainXYPlot combined = new CombinedDomainXYPlot(ChartStyle.timeAxis(series.get(0)));
        combined.setGap(6);
        for (int k = 0; k < series.size(); k++) {
            Series s = series.get(k);
            XYSeriesCollection data = new XYSeriesCollection();
            XYSeries observed = new XYSeries(s.name(), false, true);
            for (int i = 0; i < s.size(); i++) {
                observed.add(OverviewChart.midpointMillis(s.period(i)), s.isMissing(i) ? null : s.value(i));
            }
            data.addSeries(observed);
            if (findings.get(k).smoothing() != null) {
                // a data key only: the small multiples have no legend
                XYSeries trend = new XYSeries(k + "/trend", false, true);
                double[] values = findings.get(k).smoothing().trendCycle();
                for (int i = 0; i < values.length; i++) {
                    trend.add(OverviewChart.midpointMillis(s.period(i)), Double.isNaN(values[i]) ? null : values[i]);
                }
                data.addSeries(trend);
            }
            NumberAxis values = new NumberAxis(ChartStyle.drawable(s.name()));
            values.setAutoRangeIncludesZero(false);
            values.setNumberFormatOverride(NumberFormats.axis());
            values.setLabelFont(ChartStyle.smallFont().deriveFont(java.awt.Font.BOLD));
            values.setTickLabelFont(ChartStyle.smallFont());
            XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
            renderer.setDrawSeriesLineAsPath(true);
            renderer.setSeriesPaint(0, ChartStyle.INK_LIGHT);
            renderer.setSeriesStroke(0, ChartStyle.OBSERVED_THIN_STROKE);
            renderer.setSeriesPaint(1, ChartStyle.ACCENT);
            renderer.setSeriesStroke(1, ChartStyle.TREND_STROKE);
            XYPlot plot = new XYPlot(data, null, values, renderer);
            plot.setOutlineVisible(false);
            plot.setDomainGridlinesVisible(false);
            plot.setRangeGridlineStroke(ChartStyle.GRID_STROKE);
            plot.setRangeGridlinePaint(ChartStyle.GRID);
            plot.setBackgroundPaint(java.awt.Color.WHITE);
            combined.add(plot, 1);
        }
        combined.getDomainAxis().setTickLabelFont(ChartStyle.smallFont());
        JFreeChart chart = new JFreeChart(null, JFreeChart.DEFAULT_TITLE_FONT, combined, false);
        chart.setBackgroundPaint(java.awt.Color.WHITE);
        return new Figure(FigurePlan.Chart.MULTIPLES, chart);
    }
}
