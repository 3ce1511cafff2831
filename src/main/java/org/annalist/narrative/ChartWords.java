package org.annalist.narrative;

import java.util.List;
import org.annalist.findings.Findings;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/** The words the charts print: legend entries and axis titles, worded as the sentences word them. */
public final class ChartWords {

    /** The longest series name used as an axis title: about the height of the shortest value axis at 9 pt. */
    private static final int LONGEST_AXIS_NAME = 32;

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

    /**
     * The value axis of the charts drawn in the series' own values: its unit ({@code nights}), else,
     * for a series without one, what it counts as its name says ({@code visitors} for "Visitors"),
     * so that no such chart is left with bare numbers; empty when the name is too long for the axis.
     */
    public static String valueAxis(Series series) {
        if (!series.unit().isEmpty()) {
            return series.unit();
        }
        String name = series.name().strip();
        if (name.isEmpty() || name.length() > LONGEST_AXIS_NAME) {
            return "";
        }
        // "Visitors" reads as a unit in lower case; a name that starts with an acronym ("GDP") keeps its capitals
        boolean word = name.length() > 1 && Character.isUpperCase(name.charAt(0)) && Character.isLowerCase(name.charAt(1));
        return word ? Character.toLowerCase(name.charAt(0)) + name.substring(1) : name;
    }

    /** The legend entry for the thin lines of the year-over-year chart: every year but the last two. */
    public static String earlierYears(Series series) {
        int first = series.start().year();
        int last = series.end().year();
        return last - first + 1 > 2 ? first + " to " + (last - 2) + " (thin)" : "";
    }

    /**
     * What each mark of the overview chart ({@code chart.OverviewChart}) means, the caption's words
     * after the series' name and span, shared by the one-series and the multi-series brief so that a
     * chart reads alone wherever it is printed: the thick dashed trend-cycle line and its moving
     * average, the thin dashed upright line at each structural change's first period over the grey
     * band of its 95 % interval, the arrows to one-offs; with the trend-cycle's lead before a sudden
     * change and the gaps at missing values. Only the marks the chart draws are named.
     */
    public static String overviewMarks(Series series, Findings findings, Formats f) {
        List<String> marks = new java.util.ArrayList<>();
        if (findings.smoothing() != null) {
            marks.add("The thick dashed line is the trend-cycle, a " + Terms.movingAverage(findings.smoothing().method())
                    + ": each point averages the " + findings.smoothing().window() + " periods around it, evening out "
                    + (series.frequency() == Frequency.ANNUAL ? "year-to-year fluctuation." : "the seasonal pattern."));
            String lead = leadBeforeSuddenChange(series, findings);
            if (!lead.isEmpty()) {
                marks.add(lead);
            }
        }
        String gaps = gapsInLines(series, findings, f);
        if (!gaps.isEmpty()) {
            marks.add(gaps);
        }
        if (!findings.breaks().isEmpty()) {
            marks.add("Thin dashed upright lines, labelled with their date: the first period of each structural change;"
                    + " the grey band around each: the 95\u00A0% interval of that date.");
        }
        if (!findings.outliers().isEmpty()) {
            marks.add("Arrows, labelled with their date: single periods far from what trend and season predict.");
        }
        return String.join(" ", marks);
    }

    /**
     * That the trend-cycle starts to move before a sudden change, when the chart holds one (a break
     * that steps the level, or a fall or rise that moved back); empty otherwise. A centred average of
     * w periods puts the values of up to ⌊w/2⌋ periods ahead into each point (a 2×12 average: six
     * months), so its line leaves the old level that long before a jump.
     */
    public static String leadBeforeSuddenChange(Series series, Findings findings) {
        boolean sudden = findings.breaks().stream().anyMatch(b -> b.kind().step()) || !findings.episodes().isEmpty();
        if (findings.smoothing() == null || !sudden) {
            return "";
        }
        int ahead = findings.smoothing().window() / 2;
        if (ahead < 1) {
            return "";
        }
        return "A centred average starts to move up to " + span(ahead, series.frequency()) + " before a sudden change.";
    }

    /**
     * Why the overview's lines break, when the series has missing values: the observed line stops at
     * each one, and the trend-cycle, a centred average that needs every value of its window, stops for
     * as long as a missing value sits inside the window (a 2×12 average: 13 months around a single gap);
     * empty without missing values or without a trend-cycle line.
     */
    public static String gapsInLines(Series series, Findings findings, Formats f) {
        List<Period> missing = series.missingPeriods();
        if (missing.isEmpty()) {
            return "";
        }
        String where = "The lines break where a value is missing (" + BriefViews.listPeriods(missing, f) + ")";
        int longest = findings.smoothing() == null ? 0 : longestInnerGap(findings.smoothing().trendCycle());
        return longest <= 1 ? where + "."
                : where + "; the trend-cycle breaks for " + span(longest, series.frequency())
                + " there, as long as a missing value lies within its average.";
    }

    /** The longest run of missing values between the first and the last value present. */
    private static int longestInnerGap(double[] values) {
        int longest = 0;
        int run = 0;
        boolean started = false;
        for (double v : values) {
            if (Double.isNaN(v)) {
                run += started ? 1 : 0;
            } else {
                started = true;
                longest = Math.max(longest, run);
                run = 0;
            }
        }
        return longest;
    }

    /** {@code periods} periods in words: "half a year" where that is what they make, else a count. */
    private static String span(int periods, Frequency frequency) {
        double years = periods / frequency.periodsPerYear();
        if (Math.abs(years - 0.5) < 0.02) {
            return "half a year";
        }
        if (Math.abs(years - Math.rint(years)) < 0.02 && years >= 0.98) {
            long whole = Math.round(years);
            return whole == 1 ? "a year" : whole + " years";
        }
        String noun = switch (frequency) {
            case MONTHLY -> "month";
            case QUARTERLY -> "quarter";
            case HALF_YEARLY -> "half-year";
            case WEEKLY -> "week";
            case ANNUAL -> "year";
            case DAILY, BUSINESS_DAILY -> "day";
        };
        return periods + " " + noun + (periods == 1 ? "" : "s");
    }

    private static String against(Series series, Findings findings, String what) {
        return findings.form().multiplicative() ? "% against " + what
                : valueAxis(series).isEmpty() ? "against " + what : valueAxis(series) + " against " + what;
    }
}
