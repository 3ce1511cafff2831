package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import org.annalist.series.Period;

/**
 * One entry of the findings JSON {@code outliers} list: a single period far from what trend and
 * season predict.
 *
 * @param expected     trend-cycle and seasonal effect at that period, in the series' units
 * @param score        robust z of the remainder
 * @param direction    above or below what was expected
 * @param deviationPct observed against expected, in %
 */
public record OutlierFinding(Period period, double observed, double expected, double score, Side direction,
                             @JsonIgnore double deviationPct, @JsonIgnore int index) {
}
