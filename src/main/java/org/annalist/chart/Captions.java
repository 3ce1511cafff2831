package org.annalist.chart;

/**
 * The words a chart prints (legend entries, axis titles), worded by the narrative so that the
 * charts and the sentences beside them name things alike.
 *
 * @param trendCycle   the overview's trend-cycle line, e.g. {@code Trend-cycle (2×12 centred moving average)}
 * @param forecastMean the outlook's line of most likely values (its data key)
 * @param profileAxis  the seasonal profile's value axis
 * @param irregularAxis the irregular chart's value axis
 * @param earlierYears the year-over-year chart's legend entry for the thin lines, e.g. {@code 2011 to 2023 (thin)}
 * @param valueAxis    the value axis of the charts drawn in the series' own values (overview, years, outlook),
 *                     e.g. {@code nights}; empty for none
 */
public record Captions(String observed, String trendCycle, String forecast, String forecastMean, String interval80,
                       String interval95, String profileAxis, String irregularAxis, String earlierYears,
                       String valueAxis) {
}
