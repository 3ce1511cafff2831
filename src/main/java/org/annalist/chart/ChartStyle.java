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

    /** Must equal the family the PDF renderer registers, so chart text is embedded as real text. */
    public static final String FONT_FAMILY = "DejaVu Sans";

    /** Observed values: a dark slate that prints near black. */
    public static final Color INK = new Color(0x26, 0x32, 0x3F);
    /** Trend-cycle line: a warm accent that prints mid grey, drawn dashed and heavier. */
    public static final Color ACCENT = new Color(0xB3, 0x5A, 0x1F);
    /** Observed values of a long, dense series: light enough for the trend-cycle to read through. */
    public static final Color INK_LIGHT = new Color(0x9A, 0xA4, 0xAE);
    public static final Color GRID = new Color(0xD4, 0xD8, 0xDD);

    public static final Stroke OBSERVED_STROKE = new BasicStroke(1.0f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    public static final Stroke OBSERVED_THIN_STROKE = new BasicStroke(0.5f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    public static final Stroke GRID_STROKE = new BasicStroke(0.5f);
    public static final Stroke TREND_STROKE = new BasicStroke(2.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND,
            10f, new float[] {7f, 3.5f}, 0f);

    private static boolean installed;

    private ChartStyle() {
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
