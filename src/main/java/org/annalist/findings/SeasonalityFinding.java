package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import java.util.List;

/**
 * The findings JSON {@code seasonality} block.
 *
 * @param period   observations per seasonal cycle (null for annual data, which have none)
 * @param form     {@code additive} or {@code multiplicative}
 * @param verdict  {@code present}, {@code negligible} (detectable but too small to claim),
 *                 {@code absent} or {@code too short}
 * @param profile  index per position: % above/below the yearly average (multiplicative) or units (additive)
 * @param swing    peak minus trough of the profile, in the profile's unit
 * @param changed  whether the pattern of the last three years differs from the first three
 */
public record SeasonalityFinding(boolean present, Integer period, Double strength, String test, Double pValue,
                                 String form, Position peak, Position trough, @JsonIgnore String verdict,
                                 @JsonIgnore Double statistic, @JsonIgnore List<ProfilePoint> profile,
                                 @JsonIgnore Double swing, @JsonIgnore Double swingPctOfLevel,
                                 @JsonIgnore boolean changed, @JsonIgnore Double largestShift,
                                 @JsonIgnore Boolean periodConfirmed, @JsonIgnore Double autocorrelationAtPeriod) {

    public record Position(int position, String label) {
    }

    public record ProfilePoint(int position, String label, double index) {
    }
}
