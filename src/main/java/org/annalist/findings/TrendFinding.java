package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import java.util.List;

/**
 * The findings JSON {@code trend} block: the direction and its evidence.
 *
 * @param direction        {@code increasing}, {@code decreasing} or {@code none} (no clear trend)
 * @param test             the test as run, with what it ran on
 * @param slopePerYear     Sen's slope in series units per year
 * @param slopeCi95        its 95 % interval [lower, upper]
 * @param changePctPerYear the slope as % of the mean level
 * @param basis            what the test ran on, in words (e.g. {@code seasonally adjusted values})
 * @param seasonalKendall  the seasonal Kendall test on the observed values, for seasonal series
 * @param latestRegime     the trend within the latest regime, when there are breaks and it is long enough
 */
public record TrendFinding(String direction, String test, Double statistic, Double pValue, Double slopePerYear,
                           List<Double> slopeCi95, Double changePctPerYear, @JsonIgnore String basis,
                           @JsonIgnore Evidence seasonalKendall, @JsonIgnore int n, @JsonIgnore String reason,
                           @JsonIgnore LatestRegime latestRegime) {

    /**
     * The trend since the latest structural break ("rising again since 2021-06").
     *
     * @param since the first period of the latest regime
     */
    public record LatestRegime(String since, String direction, double slopePerYear, double lower95, double upper95,
                               double pValue, int n) {
    }

    /** A test outcome quoted beside the main one. */
    public record Evidence(String test, double statistic, double pValue) {
    }

    static TrendFinding notAssessed(String reason) {
        return new TrendFinding("none", null, null, null, null, null, null, null, null, 0, reason, null);
    }
}
