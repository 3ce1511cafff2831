package org.annalist.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.Arrays;
import org.annalist.findings.OutlookFinding;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.findings.FigurePlan;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;

/**
 * The outlook as a fan chart: the last two years observed, then the forecast mean as a dashed
 * line inside its 80 % band (mid grey) and 95 % band (light grey). The bands differ in lightness,
 * so they read in greyscale print as well.
 */
public final class OutlookChart {

    /**
     * Years of history before the forecasts: enough to see the season repeat, few enough that each
     * forecast month keeps about 4 mm of a printed page's width (three years left 2.9 mm, and the
     * bands of a month's dip and the next month's rise ran into one blot).
     */
    private static final int YEARS_SHOWN = 2;
    static final Color BAND_80 = new Color(0x95, 0x9F, 0xA9);
    /**
     * The 95 % band: darker than the grid lines it lies over (it was their own grey, so a grid line
     * ran on unseen through it and its edge vanished in print), lighter than the 80 % band.
     */
    static final Color BAND_95 = new Color(0xC2, 0xC8, 0xCE);
    /**
     * The forecast line: the accent's hue, darkened so that in greyscale print it keeps a contrast
     * of at least 3:1 against the 80 % band it runs inside (WCAG 2.1, success criterion 1.4.11, for
     * graphical objects); the accent itself prints nearly as light as the band (1.9:1).
     */
    static final Color FORECAST = new Color(0x7A, 0x35, 0x10);
    private static final BasicStroke FORECAST_STROKE = new BasicStroke(1.4f, BasicStroke.CAP_BUTT,
            BasicStroke.JOIN_ROUND, 1f, new float[] {5f, 3f}, 0f);

    private OutlookChart() {
    }

    public static Figure of(Series series, OutlookFinding outlook, Captions captions) {
        ChartStyle.install();
        int last = series.size() - 1;
        while (last > 0 && series.isMissing(last)) {
            last--;
        }
        int cycle = Math.max(series.frequency().seasonalPeriod(), 1);
        int shown = series.frequency().seasonalPeriod() > 1 ? YEARS_SHOWN * cycle : 20;
        int first = Math.max(0, last + 1 - shown);

        YIntervalSeries wide = new YIntervalSeries(captions.interval95());
        YIntervalSeries narrow = new YIntervalSeries(captions.interval80());
        XYSeries mean = new XYSeries(captions.forecastMean(), false, true);
        Period lastPeriod = series.period(last);
        double lastX = OverviewChart.midpointMillis(lastPeriod);
        double lastValue = series.value(last);
        // the fan opens at the last observation, so that the forecast line joins the data
        wide.add(lastX, lastValue, lastValue, lastValue);
        narrow.add(lastX, lastValue, lastValue, lastValue);
        mean.add(lastX, lastValue);
        for (OutlookFinding.Point p : outlook.forecasts()) {
            double x = OverviewChart.midpointMillis(lastPeriod.plus(p.index() + 1));
            wide.add(x, p.mean(), p.lo95(), p.hi95());
            narrow.add(x, p.mean(), p.lo80(), p.hi80());
            mean.add(x, p.mean());
        }
        XYSeries observed = new XYSeries(captions.observed(), false, true);
        for (int i = first; i <= last; i++) {
            observed.add(OverviewChart.midpointMillis(series.period(i)), series.isMissing(i) ? null : series.value(i));
        }

        YIntervalSeriesCollection bands = new YIntervalSeriesCollection();
        bands.addSeries(wide);
        bands.addSeries(narrow);
        XYSeriesCollection lines = new XYSeriesCollection();
        lines.addSeries(observed);
        lines.addSeries(mean);

        JFreeChart chart = ChartFactory.createXYLineChart(null, null,
                ChartStyle.axisTitle(captions.valueAxis()), lines);
        XYPlot plot = chart.getXYPlot();
        double[] span = new double[outlook.horizon() + last - first + 1];
        Arrays.fill(span, 0);
        plot.setDomainAxis(ChartStyle.timeAxis(Series.builder(series.name(), series.frequency())
                .append(series.period(first), span).snapshot()));
        ChartFactory.getChartTheme().apply(chart);
        NumberAxis values = (NumberAxis) plot.getRangeAxis();
        values.setAutoRangeIncludesZero(false);
        values.setNumberFormatOverride(NumberFormats.axis());
        plot.setOutlineVisible(false);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlineStroke(ChartStyle.GRID_STROKE);

        XYLineAndShapeRenderer lineRenderer = new XYLineAndShapeRenderer(true, false);
        lineRenderer.setDrawSeriesLineAsPath(true);
        lineRenderer.setSeriesPaint(0, ChartStyle.INK);
        lineRenderer.setSeriesStroke(0, ChartStyle.OBSERVED_STROKE);
        lineRenderer.setSeriesPaint(1, FORECAST);
        lineRenderer.setSeriesStroke(1, FORECAST_STROKE);
        plot.setRenderer(0, lineRenderer);

        DeviationRenderer bandRenderer = new DeviationRenderer(false, false);
        bandRenderer.setAlpha(1f);
        bandRenderer.setSeriesFillPaint(0, BAND_95);
        bandRenderer.setSeriesFillPaint(1, BAND_80);
        bandRenderer.setSeriesPaint(0, BAND_95);
        bandRenderer.setSeriesPaint(1, BAND_80);
        plot.setDataset(1, bands);
        plot.setRenderer(1, bandRenderer);
        plot.mapDatasetToRangeAxis(1, 0);
        plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.REVERSE); // bands under the lines
        plot.setSeriesRenderingOrder(org.jfree.chart.plot.SeriesRenderingOrder.FORWARD); // the 80 % band over the 95 %

        // the bands' renderer draws no lines, so its own legend items would show nothing: swatches instead
        LegendItemCollection items = new LegendItemCollection();
        items.add(lineItem(captions.observed(), ChartStyle.INK, ChartStyle.OBSERVED_STROKE));
        items.add(lineItem(captions.forecast(), FORECAST, FORECAST_STROKE));
        items.add(swatch(captions.interval80(), BAND_80));
        items.add(swatch(captions.interval95(), BAND_95));
        plot.setFixedLegendItems(items);
        LegendTitle legend = chart.getLegend();
        legend.setPosition(RectangleEdge.TOP);
        legend.setFrame(BlockBorder.NONE);
        legend.setBackgroundPaint(Color.WHITE);
        // room after each entry's words, so that an entry's label does not run on into the next one's mark
        legend.setItemLabelPadding(new RectangleInsets(2, 2, 2, 8));
        return new Figure(FigurePlan.Chart.OUTLOOK, chart);
    }

    private static LegendItem lineItem(String label, Color colour, java.awt.Stroke stroke) {
        LegendItem item = new LegendItem(label, null, null, null, new Line2D.Double(-9, 0, 9, 0), stroke, colour);
        item.setLabelFont(ChartStyle.smallFont());
        return item;
    }

    private static LegendItem swatch(String label, Color colour) {
        LegendItem item = new LegendItem(label, null, null, null, new Rectangle2D.Double(-6, -4, 12, 8), colour);
        item.setLabelFont(ChartStyle.smallFont());
        return item;
    }
}
