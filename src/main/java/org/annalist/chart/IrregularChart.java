package org.annalist.chart;

import org.annalist.findings.Decomposition;
import org.annalist.findings.Findings;
import org.annalist.findings.OutlierFinding;
import org.annalist.series.Series;
import org.annalist.findings.FigurePlan;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.DateAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The irregular component over time, as thin bars around zero (% of the expected value for a
 * multiplicative series, units otherwise), with the outliers pointed at and labelled.
 */
public final class IrregularChart {

    private IrregularChart() {
    }

    public static Figure of(Series series, Findings findings, Captions captions) {
        ChartStyle.install();
        Decomposition decomposition = findings.decomposition().orElseThrow();
        boolean multiplicative = decomposition.multiplicative();
        double[] irregular = decomposition.irregular();
        XYSeries bars = new XYSeries("irregular", false, true);
        for (int i = 0; i < irregular.length; i++) {
            double v = irregular[i];
            bars.add(OverviewChart.midpointMillis(series.period(i)),
                    Double.isNaN(v) ? null : multiplicative ? 100 * (v - 1) : v);
        }
        XYSeriesCollection data = new XYSeriesCollection(bars);
        String axis = ChartStyle.drawable(captions.irregularAxis());
        JFreeChart chart = ChartFactory.createXYBarChart(null, null, true, axis, data);
        XYPlot plot = chart.getXYPlot();
        DateAxis time = ChartStyle.timeAxis(series);
        plot.setDomainAxis(time);
        ChartFactory.getChartTheme().apply(chart);
        chart.removeLegend();
        plot.setOutlineVisible(false);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlineStroke(ChartStyle.GRID_STROKE);
        plot.setRangeZeroBaselineVisible(true);
        plot.setRangeZeroBaselinePaint(ChartStyle.INK);
        ((NumberAxis) plot.getRangeAxis()).setNumberFormatOverride(NumberFormats.axis());
        // room beyond the largest bars for an outlier's arrow and label (base radius 15 pt + 8 pt text)
        plot.getRangeAxis().setUpperMargin(0.35);
        plot.getRangeAxis().setLowerMargin(0.35);
        XYBarRenderer renderer = (XYBarRenderer) plot.getRenderer();
        renderer.setSeriesPaint(0, ChartStyle.BAR);
        renderer.setShadowVisible(false);
        renderer.setDrawBarOutline(false);
        renderer.setMargin(0.15);
        for (OutlierFinding o : findings.outliers()) {
            double v = irregular[o.index()];
            double y = multiplicative ? 100 * (v - 1) : v;
            plot.addAnnotation(ChartStyle.pointer(ChartStyle.shortLabel(series.period(o.index())),
                    OverviewChart.midpointMillis(series.period(o.index())), y, y >= 0,
                    OverviewChart.across(series, o.index())));
        }
        return new Figure(FigurePlan.Chart.IRREGULAR, chart);
    }
}
