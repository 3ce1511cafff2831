package org.annalist.chart;

import java.awt.Color;
import java.awt.geom.Ellipse2D;
import java.time.ZoneOffset;
import java.util.List;
import org.annalist.findings.BreakFinding;
import org.annalist.findings.Findings;
import org.annalist.findings.OutlierFinding;
import org.annalist.findings.Side;
import org.annalist.findings.Smoothing;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.findings.FigurePlan;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.DateAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.SeriesRenderingOrder;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The series over its whole span with its trend-cycle line; structural breaks as a dashed line at
 * the new regime's first period over their shaded 95 % interval; outliers pointed at and labelled.
 */
public final class OverviewChart {

    /** Beyond this many periods the observed line turns light and thin so that the trend-cycle reads through it. */
    private static final int DENSE_POINTS = 400;

    private OverviewChart() {
    }

    public static Figure of(Series series, Findings findings, Captions captions) {
        Smoothing smoothing = findings.smoothing();
        ChartStyle.install();
        XYSeriesCollection data = new XYSeriesCollection();
        XYSeries observed = new XYSeries(captions.observed(), false, true);
        for (int i = 0; i < series.size(); i++) {
            observed.add(midpointMillis(series.period(i)), series.isMissing(i) ? null : series.value(i));
        }
        data.addSeries(observed);
        if (smoothing != null) {
            XYSeries trend = new XYSeries(captions.trendCycle(), false, true);
            double[] values = smoothing.trendCycle();
            for (int i = 0; i < values.length; i++) {
                trend.add(midpointMillis(series.period(i)), Double.isNaN(values[i]) ? null : values[i]);
            }
            data.addSeries(trend);
        }
        JFreeChart chart = ChartFactory.createXYLineChart(null, null, ChartStyle.axisTitle(captions.valueAxis()),
                data);
        XYPlot plot = chart.getXYPlot();
        DateAxis time = ChartStyle.timeAxis(series);
        plot.setDomainAxis(time);
        NumberAxis values = (NumberAxis) plot.getRangeAxis();
        values.setAutoRangeIncludesZero(false);
        values.setNumberFormatOverride(NumberFormats.axis());
        // A flat series would otherwise get a range so narrow that every tick shows the same number.
        values.setAutoRangeMinimumSize(Math.max(1e-9, 0.1 * maxAbs(series)));
        // room above the highest value for an outlier's label, and for every row of the breaks' labels:
        // the least that holds them, as more room lowers the arrows that push labels into further rows
        int rows = 1;
        BreakLabels labels = breakLabelRows(series, findings, upperMargin(rows));
        while (labels.rows() > rows) {
            rows++;
            labels = breakLabelRows(series, findings, upperMargin(rows));
        }
        values.setUpperMargin(upperMargin(rows));
        plot.setOutlineVisible(false);
        plot.setDomainGridlinesVisible(false);

        ChartFactory.getChartTheme().apply(chart);   // the replaced axis takes the theme's fonts
        plot.setRangeGridlineStroke(ChartStyle.GRID_STROKE);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setDrawSeriesLineAsPath(true);   // one path per series instead of a stroke per segment
        boolean dense = series.size() > DENSE_POINTS;
        renderer.setSeriesPaint(0, dense ? ChartStyle.INK_LIGHT : ChartStyle.INK);
        renderer.setSeriesStroke(0, dense ? ChartStyle.OBSERVED_THIN_STROKE : ChartStyle.OBSERVED_STROKE);
        renderer.setSeriesPaint(1, ChartStyle.ACCENT);
        renderer.setSeriesStroke(1, ChartStyle.TREND_STROKE);
        if (series.size() <= 60) {
            renderer.setSeriesShapesVisible(0, true);
            renderer.setSeriesShape(0, new Ellipse2D.Double(-2, -2, 4, 4));
        }
        plot.setRenderer(renderer);
        plot.setSeriesRenderingOrder(SeriesRenderingOrder.FORWARD);   // the trend-cycle on top of the data
        markBreaks(plot, series, findings.breaks(), labels);
        markOutliers(plot, series, findings.outliers());
        LegendTitle legend = chart.getLegend();
        legend.setPosition(RectangleEdge.TOP);
        legend.setFrame(BlockBorder.NONE);
        legend.setBackgroundPaint(Color.WHITE);

        return new Figure(FigurePlan.Chart.OVERVIEW, chart);
    }

    /** Each break: its 95 % interval shaded, its first period as a dashed line labelled in its row. */
    private static void markBreaks(XYPlot plot, Series series, List<BreakFinding> breaks, BreakLabels labels) {
        for (int j = 0; j < breaks.size(); j++) {
            BreakFinding b = breaks.get(j);
            int from = series.indexOf(b.ci95().get(0));
            int to = series.indexOf(b.ci95().get(1));
            IntervalMarker interval = new IntervalMarker(startMillis(series.period(from)), endMillis(series.period(to)));
            interval.setPaint(ChartStyle.SHADE);
            interval.setAlpha(1f);
            plot.addDomainMarker(interval, Layer.BACKGROUND);
            ValueMarker line = new ValueMarker(startMillis(series.period(b.index())));
            line.setPaint(ChartStyle.INK);
            line.setStroke(ChartStyle.MARKER_STROKE);
            line.setLabel(ChartStyle.shortLabel(series.period(b.index())));
            // each label in its row, so that the labels of breaks close together do not overlap
            line.setLabelOffset(new RectangleInsets(LABEL_TOP + ROW_HEIGHT * labels.row(j), LABEL_SIDE, 2, LABEL_SIDE));
            line.setLabelFont(ChartStyle.smallFont());
            line.setLabelPaint(ChartStyle.INK);
            line.setLabelBackgroundColor(new Color(255, 255, 255, 0));
            // right of the line, or left of it near the end of the axis, where the edge would cut it
            boolean nearEnd = nearEnd(series, b.index());
            line.setLabelAnchor(nearEnd ? RectangleAnchor.TOP_LEFT : RectangleAnchor.TOP_RIGHT);
            line.setLabelTextAnchor(nearEnd ? TextAnchor.TOP_RIGHT : TextAnchor.TOP_LEFT);
            plot.addDomainMarker(line, Layer.FOREGROUND);
        }
    }

    /** Space above a break's label, between two rows of them, and beside its line, in chart units (CSS px). */
    private static final double LABEL_TOP = 2;
    private static final double ROW_HEIGHT = 11;
    private static final double LABEL_SIDE = 3;

    /**
     * The narrowest plot and the lowest plot an overview is drawn in, in chart units: 166 mm wide
     * (627 units, brief.css) less the value axis and its title; 56 mm high (the multi-series brief's
     * small chart, 211 units) less the legend and the time axis. The rows are laid out for these,
     * so that in a larger plot the labels only stand further apart.
     */
    private static final double PLOT_WIDTH = 540;
    private static final double PLOT_HEIGHT = 160;

    /**
     * An arrow's label stands this far above the value it points at (its base radius, 15, and the
     * annotation's label offset, 3: {@link ChartStyle#pointer}) and is at most this tall, with a unit to spare.
     */
    private static final double POINTER_BASE = 18;
    private static final double POINTER_LABEL_HEIGHT = 13;

    /** The breaks' labels and the rows they take. */
    record BreakLabels(int[] rowOf, int rows) {
        int row(int j) {
            return rowOf[j];
        }
    }

    /**
     * The row of each break's label: the first where it clears the labels before it and the label of
     * every arrow that reaches that high (a one-off near the top of the range), given the value axis'
     * upper margin.
     */
    static BreakLabels breakLabelRows(Series series, Findings findings, double upperMargin) {
        LabelRows rows = new LabelRows();
        java.awt.font.FontRenderContext context = new java.awt.font.FontRenderContext(null, true, true);
        double[] range = range(series);
        double lower = range[0] - 0.05 * (range[1] - range[0]);   // NumberAxis' default lower margin
        double top = range[1] + upperMargin * (range[1] - range[0]);
        for (OutlierFinding o : findings.outliers()) {
            if (o.direction() != Side.ABOVE || !(top > lower)) {
                continue;
            }
            double y = (top - o.observed()) / (top - lower) * PLOT_HEIGHT;
            double labelTop = y - POINTER_BASE - POINTER_LABEL_HEIGHT;
            double width = width(ChartStyle.shortLabel(series.period(o.index())), context);
            double x = x(series, o.index());
            double across = across(series, o.index());
            double left = across > 1 - ChartStyle.LABEL_EDGE_SHARE ? x - width
                    : across < ChartStyle.LABEL_EDGE_SHARE ? x : x - width / 2;
            for (int row = 0; LABEL_TOP + ROW_HEIGHT * row < y - POINTER_BASE; row++) {
                if (LABEL_TOP + ROW_HEIGHT * (row + 1) > labelTop) {
                    rows.block(row, left, left + width);
                }
            }
        }
        List<BreakFinding> breaks = findings.breaks();
        int[] rowOf = new int[breaks.size()];
        int count = 0;
        for (int j = 0; j < breaks.size(); j++) {
            int index = breaks.get(j).index();
            double x = x(series, index) - 0.5 * PLOT_WIDTH * 0.98 / Math.max(1, series.size() - 1);   // the period's start
            double width = width(ChartStyle.shortLabel(series.period(index)), context);
            rowOf[j] = nearEnd(series, index) ? rows.place(x - LABEL_SIDE - width, x - LABEL_SIDE)
                    : rows.place(x + LABEL_SIDE, x + LABEL_SIDE + width);
            count = Math.max(count, rowOf[j] + 1);
        }
        return new BreakLabels(rowOf, count);
    }

    /**
     * The value axis' upper margin: room for an arrow's label above the highest value (a fifth of the
     * range), and for {@code rows} rows of the breaks' labels in the lowest plot.
     */
    static double upperMargin(int rows) {
        double share = Math.min(0.6, (LABEL_TOP + ROW_HEIGHT * rows + LABEL_TOP) / PLOT_HEIGHT);
        return Math.max(0.2, share * 1.05 / (1 - share));
    }

    private static boolean nearEnd(Series series, int index) {
        return across(series, index) > 1 - ChartStyle.LABEL_EDGE_SHARE;
    }

    /** Where a period's middle lies in the narrowest plot, in chart units from its left edge (the time axis' 1 % margins). */
    private static double x(Series series, int index) {
        return PLOT_WIDTH * (0.01 + 0.98 * across(series, index));
    }

    private static double width(String label, java.awt.font.FontRenderContext context) {
        return ChartStyle.smallFont().getStringBounds(label, context).getWidth();
    }

    private static double[] range(Series series) {
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < series.size(); i++) {
            if (!series.isMissing(i)) {
                low = Math.min(low, series.value(i));
                high = Math.max(high, series.value(i));
            }
        }
        return low <= high ? new double[] {low, high} : new double[] {0, 1};
    }

    /** Each outlier: an arrow to the value, labelled with its period, from above or below. */
    private static void markOutliers(XYPlot plot, Series series, List<OutlierFinding> outliers) {
        for (OutlierFinding o : outliers) {
            plot.addAnnotation(ChartStyle.pointer(ChartStyle.shortLabel(series.period(o.index())),
                    midpointMillis(series.period(o.index())), o.observed(), o.direction() == Side.ABOVE,
                    across(series, o.index())));
        }
    }

    /** Where period {@code index} lies along the time axis: 0 at the first period, 1 at the last. */
    static double across(Series series, int index) {
        return series.size() < 2 ? 0.5 : index / (series.size() - 1.0);
    }

    static double startMillis(Period period) {
        return period.startDate().atStartOfDay(ZoneOffset.UTC).toInstant().toEpochMilli();
    }

    static double endMillis(Period period) {
        return period.endDate().plusDays(1).atStartOfDay(ZoneOffset.UTC).toInstant().toEpochMilli();
    }

    private static double maxAbs(Series series) {
        double max = 0;
        for (int i = 0; i < series.size(); i++) {
            if (!series.isMissing(i)) {
                max = Math.max(max, Math.abs(series.value(i)));
            }
        }
        return max;
    }

    /** Plotting each period at its middle keeps months of different lengths evenly placed. */
    static double midpointMillis(Period period) {
        long start = period.startDate().atStartOfDay(ZoneOffset.UTC).toInstant().toEpochMilli();
        long end = period.endDate().plusDays(1).atStartOfDay(ZoneOffset.UTC).toInstant().toEpochMilli();
        return (start + end) / 2.0;
    }
}
