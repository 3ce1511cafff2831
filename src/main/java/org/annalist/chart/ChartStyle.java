package org.annalist.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Stroke;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.StandardChartTheme;
import org.jfree.chart.renderer.category.StandardBarPainter;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.text.TextUtils;

/**
 * The look of every chart: one embedded font family, print-safe strokes that stay distinct in
 * greyscale (solid, dashed, dotted; dark, mid and light grey tones under the colour), no shadows or
 * gradients.
 */
public final class ChartStyle {

    private static final String FONT_FAMILY = Figure.FONT_FAMILY;

    /** Observed values: a dark slate that prints near black. */
    public static final Color INK = new Color(0x26, 0x32, 0x3F);
    /** Trend-cycle line: a warm accent that prints mid grey, drawn dashed and heavier. */
    public static final Color ACCENT = new Color(0xB3, 0x5A, 0x1F);
    /** Observed values of a long, dense series: light enough for the trend-cycle to read through. */
    public static final Color INK_LIGHT = new Color(0x9A, 0xA4, 0xAE);
    public static final Color GRID = new Color(0xD4, 0xD8, 0xDD);
    /** Shaded intervals (break dates): light enough for the lines to read over it, in print too. */
    public static final Color SHADE = new Color(0xE4, 0xE7, 0xEB);
    /** Bars of the seasonal profile. */
    public static final Color BAR = new Color(0x5B, 0x6B, 0x7B);

    public static final Stroke OBSERVED_STROKE = new BasicStroke(1.0f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    public static final Stroke OBSERVED_THIN_STROKE = new BasicStroke(0.5f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    public static final Stroke GRID_STROKE = new BasicStroke(0.5f);
    public static final Stroke MARKER_STROKE = new BasicStroke(1.0f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER,
            10f, new float[] {3f, 2f}, 0f);
    public static final Stroke TREND_STROKE = new BasicStroke(2.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND,
            10f, new float[] {7f, 3.5f}, 0f);

    private static final String[] MONTHS = {"Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov",
        "Dec"};

    private static boolean installed;

    private ChartStyle() {
    }

    /**
     * The font of chart labels and annotations, the smallest a chart prints. A chart is drawn in CSS
     * pixels of 0.75 pt ({@code render.PdfRenderer} draws it at its box's size in px), so its 9 units
     * print at 6.75 pt, as the axes' tick labels do; 8 printed at 6 pt, too small to read on paper (our
     * floor, 6.5 pt, is {@link #MIN_PRINTED_LABEL_PT}).
     */
    public static Font smallFont() {
        return new Font(FONT_FAMILY, Font.PLAIN, SMALL_FONT_UNITS);
    }

    /** The size of {@link #smallFont()} in the chart's own units (CSS pixels). */
    static final int SMALL_FONT_UNITS = 9;

    /** The smallest size a chart's words may print at, in points: our rule for text read on paper at arm's length. */
    public static final double MIN_PRINTED_LABEL_PT = 6.5;

    /** A period as a chart label: {@code Jul 2019}, {@code Q3 2019}, {@code 2019}, {@code 3 Mar 2024}. */
    public static String shortLabel(org.annalist.series.Period p) {
        return switch (p.frequency()) {
            case ANNUAL -> String.valueOf(p.year());
            case HALF_YEARLY -> p.seasonLabel() + " " + p.year();
            case QUARTERLY -> p.seasonLabel() + " " + p.year();
            case MONTHLY -> MONTHS[p.seasonalPosition() - 1] + " " + p.year();
            case WEEKLY -> p.label();
            case DAILY, BUSINESS_DAILY -> p.startDate().getDayOfMonth() + " "
                    + MONTHS[p.startDate().getMonthValue() - 1] + " " + p.startDate().getYear();
        };
    }

    /**
     * A time axis whose ticks fall on whole years (every 1, 2 or 5 years by span), or on months for
     * spans under two years, labelled once each; in UTC, so labels do not move with the machine.
     */
    public static org.jfree.chart.axis.DateAxis timeAxis(org.annalist.series.Series series) {
        java.util.TimeZone utc = java.util.TimeZone.getTimeZone(java.time.ZoneOffset.UTC);
        org.jfree.chart.axis.DateAxis axis = new org.jfree.chart.axis.DateAxis(null, utc, java.util.Locale.ROOT);
        double years = (series.end().endDate().toEpochDay() - series.start().startDate().toEpochDay()) / 365.25;
        java.text.SimpleDateFormat format;
        org.jfree.chart.axis.DateTickUnit unit;
        if (years < 2) {
            format = new java.text.SimpleDateFormat("MMM yyyy", java.util.Locale.ENGLISH);
            unit = new org.jfree.chart.axis.DateTickUnit(org.jfree.chart.axis.DateTickUnitType.MONTH, years < 1 ? 1 : 3);
        } else {
            format = new java.text.SimpleDateFormat("yyyy", java.util.Locale.ENGLISH);
            unit = new org.jfree.chart.axis.DateTickUnit(org.jfree.chart.axis.DateTickUnitType.YEAR,
                    years <= 16 ? 1 : years <= 40 ? 5 : years <= 100 ? 10 : 20);
        }
        format.setTimeZone(utc);
        axis.setDateFormatOverride(format);
        axis.setTickUnit(unit);
        axis.setLowerMargin(0.01);
        axis.setUpperMargin(0.01);
        return axis;
    }

    /**
     * An arrow to (x, y) from above (for a high value) or below, carrying {@code label} in the
     * {@link #smallFont()}. The label is centred on the arrow, except near either end of the time axis, where it
     * would be cut by the plot's edge: there it extends inwards from the arrow.
     *
     * @param across where x lies along the axis, 0 at the first period and 1 at the last
     */
    public static org.jfree.chart.annotations.XYPointerAnnotation pointer(String label, double x, double y,
                                                                          boolean fromAbove, double across) {
        org.jfree.chart.annotations.XYPointerAnnotation pointer = new org.jfree.chart.annotations.XYPointerAnnotation(
                label, x, y, fromAbove ? -Math.PI / 2 : Math.PI / 2);
        pointer.setFont(smallFont());
        pointer.setPaint(INK);
        pointer.setArrowPaint(INK);
        pointer.setArrowLength(5);
        pointer.setArrowWidth(2.5);
        pointer.setBaseRadius(15);
        pointer.setTipRadius(3);
        org.jfree.chart.ui.TextAnchor anchor;
        if (across > 1 - LABEL_EDGE_SHARE) {
            anchor = fromAbove ? org.jfree.chart.ui.TextAnchor.BOTTOM_RIGHT : org.jfree.chart.ui.TextAnchor.TOP_RIGHT;
        } else if (across < LABEL_EDGE_SHARE) {
            anchor = fromAbove ? org.jfree.chart.ui.TextAnchor.BOTTOM_LEFT : org.jfree.chart.ui.TextAnchor.TOP_LEFT;
        } else {
            anchor = fromAbove ? org.jfree.chart.ui.TextAnchor.BOTTOM_CENTER : org.jfree.chart.ui.TextAnchor.TOP_CENTER;
        }
        pointer.setTextAnchor(anchor);
        return pointer;
    }

    /**
     * Half a period label ("Sep 2026", about 43 units wide in the {@link #smallFont()}) as a share of
     * the narrowest plot a pointer is drawn in (about 400 units, 300 pt), with room to spare: closer
     * to an end, a centred label is cut.
     */
    static final double LABEL_EDGE_SHARE = 0.07;

    /** An axis title as drawn ({@link #drawable}), or none (null) for an empty one. */
    static String axisTitle(String text) {
        return text == null || text.isEmpty() ? null : drawable(text);
    }

    /**
     * Replaces the characters the embedded font cannot draw by {@code ?}: chart text drawn by AWT
     * has no per-glyph fallback and would show empty boxes instead.
     */
    public static String drawable(String text) {
        Font font = new Font(FONT_FAMILY, Font.PLAIN, 9);
        StringBuilder out = new StringBuilder(text.length());
        text.codePoints().forEach(cp -> out.appendCodePoint(font.canDisplay(cp) ? cp : '?'));
        return out.toString();
    }

    /**
     * Installs the theme and JFreeChart's global text settings once per JVM (they are statics in
     * JFreeChart, so every chart shares them).
     */
    public static synchronized void install() {
        if (installed) {
            return;
        }
        // Rotated labels drawn through TextLayout arrive in the PDF as outlines, not text.
        TextUtils.setUseDrawRotatedStringWorkaround(false);
        StandardChartTheme theme = new StandardChartTheme("annalist-print");
        theme.setExtraLargeFont(new Font(FONT_FAMILY, Font.BOLD, 13));
        theme.setLargeFont(new Font(FONT_FAMILY, Font.BOLD, 10));
        theme.setRegularFont(new Font(FONT_FAMILY, Font.PLAIN, 9));
        theme.setSmallFont(new Font(FONT_FAMILY, Font.PLAIN, 8));
        theme.setBarPainter(new StandardBarPainter());
        theme.setXYBarPainter(new StandardXYBarPainter());
        theme.setShadowVisible(false);
        theme.setChartBackgroundPaint(Color.WHITE);
        theme.setPlotBackgroundPaint(Color.WHITE);
        theme.setDomainGridlinePaint(GRID);
        theme.setRangeGridlinePaint(GRID);
        theme.setAxisLabelPaint(INK);
        theme.setTickLabelPaint(INK);
        theme.setLegendItemPaint(INK);
        ChartFactory.setChartTheme(theme);
        installed = true;
    }
}
