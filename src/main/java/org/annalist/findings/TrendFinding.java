package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import java.util.List;
import java.util.Optional;
import org.annalist.series.Period;

/**
 * The findings JSON {@code trend} block: the direction and its evidence.
 *
 * @param direction        {@link Direction#NONE} also when the trend was not assessed
 * @param test             the test as run and what it ran on (null when not assessed: fewer than
 *                         {@value DecisionRules#MIN_VALUES_FOR_TREND} values)
 * @param slopePerYear     Sen's slope in series units per year
 * @param slopeCi95        its 95 % interval [lower, upper]
 * @param changePctPerYear the slope as % of the mean level; null for a series at or below zero, a
 *                         rate or an interval-scale quantity
 * @param seasonalKendall  the seasonal Kendall test on the observed values, for seasonal series
 * @param latestRegime     the trend within the latest regime, when there are breaks and it is long enough
 */
public record TrendFinding(Direction direction, Test test, Double statistic, Double pValue, Double slopePerYear,
                           List<Double> slopeCi95, Double changePctPerYear,
                           @JsonIgnore Optional<Evidence> seasonalKendall,
                           @JsonIgnore int n, @JsonIgnore Optional<LatestRegime> latestRegime) {

    /**
     * The test as run.
     *
     * @param seasonallyAdjusted whether it ran on the seasonally adjusted values (else the observed)
     * @param block              periods averaged into one value first (1: none), for long series
     */
    public record Test(TestName name, boolean seasonallyAdjusted, int block) {
    }

    /**
     * The trend since the latest structural break ("rising again since 2021-06"): the one rate every
     * statement about that regime gives, the break's "slope after" included.
     *
     * @param since            the first period of the latest regime
     * @param changePctPerYear the regime's rate in % a year: for a series worked in logs the compound
     *                         rate of Sen's slope of the logs, else the slope as % of the latest
     *                         year's average observed level; null where changes are not read as %
     *                         or a value is at or below zero
     */
    public record LatestRegime(Period since, Direction direction, double slopePerYear, double lower95, double upper95,
                               double pValue, int n, Double changePctPerYear) {
    }

    /** A test outcome quoted beside the main one. */
    public record Evidence(TestName test, double statistic, double pValue) {
    }

    public boolean assessed() {
        return test != null;
    }

    static TrendFinding notAssessed() {
        return new TrendFinding(Direction.NONE, null, null, null, null, null, null, Optional.empty(), 0,
                Optional.empty());
    }
}
