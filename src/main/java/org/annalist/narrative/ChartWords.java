package org.annalist.narrative;

import org.annalist.findings.Findings;
import org.annalist.series.Series;

/** The words the charts print: legend entries and axis titles, worded as the sentences word them. */
public final class ChartWords {

    private ChartWords() {
    }

    public static String observed() {
        return "Observed";
    }

    /** The trend-cycle line of the overview, with the moving average that draws it; empty without one. */
    public static String trendCycle(Findings findings) {
        return findings.smoothing() == null ? "" : "Trend-cycle (" + Terms.movingAverage(findings.smoothing().method()) + ")";
    }

    public static String forecast() {
        return "Forecast";
    }

    public static String forecastMean() {
        return "Forecast (mean)";
    }

    public static String interval(int percent) {
        return percent + "\u00A0% interval";
    }

    /** The seasonal profile's axis: % for a multiplicative series, else the series' unit. */
    public static String profileAxis(Series series, Findings findings) {
        return against(series, findings, "the yearly average");
    }

    /** The irregular chart's axis: % for a multiplicative series, else the series' unit. */
    public static String irregularAxis(Series series, Findings findings) {
        return against(series, findings, "trend and season");
    }

    /** The legend entry for the thin lines of the year-over-year chart: every year but the last two. */
    public static String earlierYears(Series series) {
        int first = series.start().year();
        int last = series.end().year();
        return last - first + 1 > 2 ? first + " to " + (last - 2) + " (thin)" : "";
    }

    private static String against(Series series, Findings findings, String what) {
        return findings.form().multiplicative() ? "% against " + what
                : series.unit().isEmpty() ? "against " + what : series.unit() + " against " + what;
    }
}
