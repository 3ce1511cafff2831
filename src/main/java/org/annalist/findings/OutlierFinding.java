package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;

/**
 * One entry of the findings JSON {@code outliers} list: a single period far from what trend and
 * season predict.
 *
 * @param expected     trend-cycle and seasonal effect at that period, in the series' units
 * @param score        robust z of the remainder
 * @param direction    {@code above} or {@code below}
 * @param deviationPct observed against expected, in %
 */
public record OutlierFinding(String period, double observed, double expected, double score, String direction,
                             @JsonIgnore double deviationPct, @JsonIgnore int index) {
}
