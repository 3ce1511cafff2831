package org.annalist.chart;

import java.awt.Color;
import org.annalist.findings.SeasonalityFinding;
import org.annalist.findings.FigurePlan;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.labels.ItemLabelAnchor;
import org.jfree.chart.labels.ItemLabelPosition;
import org.jfree.chart.labels.StandardCategoryItemLabelGenerator;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.renderer.category.BarRenderer;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.category.DefaultCategoryDataset;

/**
 * The seasonal profile: one bar per season position, its index (% above or below the yearly
 * average, or units), each bar labelled with its value so the peak and trough can be read off.
 */
public final class SeasonalProfileChart {

    private SeasonalProfileChart() {
    }

    public static Figure of(SeasonalityFinding season, Captions captions) {
        ChartStyle.install();
        boolean multiplicative = season.multiplicative();
        DefaultCategoryDataset data = new DefaultCategoryDataset();
        double step = multiplicative ? 1 : labelStep(season.profile());
        int decimals = (int) Math.max(0, Math.round(-Math.log10(step)));
        for (SeasonalityFinding.ProfilePoint p : season.profile()) {
            // rounded as labelled, so that a tiny index reads 0, not −0
            data.addValue(Math.rint(p.index() / step) * step + 0.0, "index", p.label());
        }
        String axis = ChartStyle.drawable(captions.profileAxis());
        JFreeChart chart = ChartFactory.createBarChart(null, null, axis, data, PlotOrientation.VERTICAL, false, false,
                false);
        CategoryPlot plot = chart.getCategoryPlot();
        plot.setOutlineVisible(false);
        plot.setRangeGridlineStroke(ChartStyle.GRID_STROKE);
        plot.setRangeZeroBaselineVisible(true);
        plot.setRangeZeroBaselinePaint(ChartStyle.INK);
        plot.getRangeAxis().setUpperMargin(0.15);
        plot.getRangeAxis().setLowerMargin(0.15);
        ((org.jfree.chart.axis.NumberAxis) plot.getRangeAxis()).setNumberFormatOverride(NumberFormats.axis());
        CategoryAxis positions = plot.getDomainAxis();
        positions.setCategoryMargin(0.25);
        BarRenderer bars = (BarRenderer) plot.getRenderer();
        bars.setSeriesPaint(0, ChartStyle.BAR);
        bars.setSeriesOutlinePaint(0, Color.WHITE);
        bars.setDrawBarOutline(false);
        bars.setDefaultItemLabelGenerator(new StandardCategoryItemLabelGenerator("{2}",
                NumberFormats.signed(decimals)));
        bars.setDefaultItemLabelsVisible(true);
        bars.setDefaultItemLabelFont(ChartStyle.smallFont());
        bars.setDefaultItemLabelPaint(ChartStyle.INK);
        bars.setDefaultPositiveItemLabelPosition(new ItemLabelPosition(ItemLabelAnchor.OUTSIDE12, TextAnchor.BOTTOM_CENTER));
        bars.setDefaultNegativeItemLabelPosition(new ItemLabelPosition(ItemLabelAnchor.OUTSIDE6, TextAnchor.TOP_CENTER));
        return new Figure(FigurePlan.Chart.PROFILE, chart);
    }

    /**
     * The rounding step shared by every bar's label of a profile in units: three significant digits
     * of the largest bar (as the text gives the peak and trough, Formats.significant), so that labels
     * beside each other never mix "+12" and "+3.5", nor "+5,138" beside a text's "+5,140".
     */
    static double labelStep(java.util.List<SeasonalityFinding.ProfilePoint> profile) {
        double largest = profile.stream().mapToDouble(p -> Math.abs(p.index())).max().orElse(0);
        if (!(largest > 0) || Double.isInfinite(largest)) {
            return 1;
        }
        return Math.pow(10, Math.floor(Math.log10(largest)) - 2);
    }
}
