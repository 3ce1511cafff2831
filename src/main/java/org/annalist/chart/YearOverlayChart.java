package org.annalist.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.geom.Ellipse2D;
import java.util.Map;
import java.util.TreeMap;
import org.annalist.series.Series;
import org.annalist.findings.FigurePlan;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.SymbolAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Year over year: the season positions (months or quarters) across, one line per year; the latest
 * year heavy and marked, the year before dashed, earlier years thin and light, so the comparison
 * reads without colour.
 */
public final class YearOverlayChart {

    private static final Color EARLIER = new Color(0xB8, 0xC0, 0xC8);

    private YearOverlayChart() {
    }

    public static Figure of(Series series, Captions captions) {
        ChartStyle.install();
        int period = series.frequency().seasonalPeriod();
        Map<Integer, XYSeries> byYear = new TreeMap<>();
        String[] labels = new String[period];
        for (int i = 0; i < series.size(); i++) {
            int year = series.period(i).year();
            int position = series.period(i).seasonalPosition();
            labels[position - 1] = series.period(i).seasonLabel();
            byYear.computeIfAbsent(year, y -> new XYSeries(String.valueOf(y), false, true))
                    .add(position - 1, series.isMissing(i) ? null : series.value(i));
        }
        XYSeriesCollection data = new XYSeriesCollection();
        Integer[] years = byYear.keySet().toArray(new Integer[0]);
        // earlier years first, so the latest two are drawn on top
        for (Integer year : years) {
            data.addSeries(byYear.get(year));
        }
        JFreeChart chart = ChartFactory.createXYLineChart(null, null,
                ChartStyle.axisTitle(captions.valueAxis()), data);
        XYPlot plot = chart.getXYPlot();
        SymbolAxis positions = new SymbolAxis(null, labels);
        positions.setGridBandsVisible(false);
        plot.setDomainAxis(positions);
        ChartFactory.getChartTheme().apply(chart);
        plot.setOutlineVisible(false);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlineStroke(ChartStyle.GRID_STROKE);
        ((org.jfree.chart.axis.NumberAxis) plot.getRangeAxis()).setAutoRangeIncludesZero(false);
        ((org.jfree.chart.axis.NumberAxis) plot.getRangeAxis()).setNumberFormatOverride(NumberFormats.axis());
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setDrawSeriesLineAsPath(true);
        int latest = years.length - 1;
        for (int s = 0; s < years.length; s++) {
            boolean isLatest = s == latest;
            boolean isPrevious = s == latest - 1;
            renderer.setSeriesPaint(s, isLatest ? ChartStyle.INK : isPrevious ? ChartStyle.ACCENT : EARLIER);
            renderer.setSeriesStroke(s, isLatest ? new BasicStroke(2.2f) : isPrevious ? ChartStyle.TREND_STROKE
                    : new BasicStroke(0.6f));
            renderer.setSeriesVisibleInLegend(s, isLatest || isPrevious || s == 0);
            if (isLatest) {
                renderer.setSeriesShapesVisible(s, true);
                renderer.setSeriesShape(s, new Ellipse2D.Double(-3, -3, 6, 6));
            }
        }
        if (years.length > 2) {
            data.getSeries(0).setKey(captions.earlierYears());
        }
        plot.setRenderer(renderer);
        LegendTitle legend = chart.getLegend();
        legend.setPosition(RectangleEdge.TOP);
        legend.setFrame(BlockBorder.NONE);
        return new Figure(FigurePlan.Chart.YEARS, chart);
    }
}
