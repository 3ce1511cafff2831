package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import java.util.List;

/**
 * The findings JSON {@code seasonality} block.
 *
 * @param period   observations per seasonal cycle (null for annual data, which have none)
 * @param test     the test of the seasons' difference (null when not run)
 * @param verdict  what may be said
 * @param profile  index per position: % above/below the yearly average (multiplicative) or units (additive)
 * @param swing    peak minus trough of the profile, in the profile's unit
 * @param changed  whether the pattern of the last three years differs from the first three
 */
public record SeasonalityFinding(boolean present, Integer period, Double strength, TestName test, Double pValue,
                                 Form form, Position peak, Position trough, @JsonIgnore SeasonVerdict verdict,
                                 @JsonIgnore Double statistic, List<ProfilePoint> profile,
                                 @JsonIgnore Double swing, @JsonIgnore Double swingPctOfLevel,
                                 @JsonIgnore boolean changed, @JsonIgnore Double largestShift,
                                 @JsonIgnore Boolean periodConfirmed, @JsonIgnore Double autocorrelationAtPeriod) {

    public SeasonalityFinding {
        profile = profile == null ? null : List.copyOf(profile);
    }

    /** @param label English label of the position: {@code Jul}, {@code Q3}, {@code Mon} */
    public record Position(int position, String label) {
    }

    public record ProfilePoint(int position, String label, double index) {
    }

    /** How strong a seasonal pattern is, by {@link DecisionRules#STRONG_SEASONAL_STRENGTH} and {@link DecisionRules#MIN_SEASONAL_STRENGTH}. */
    public enum Strength {
        STRONG, MODERATE, WEAK;

        public static Strength of(double strength) {
            return strength >= DecisionRules.STRONG_SEASONAL_STRENGTH ? STRONG
                    : strength >= DecisionRules.MIN_SEASONAL_STRENGTH ? MODERATE : WEAK;
        }
    }

    public boolean multiplicative() {
        return form == Form.MULTIPLICATIVE;
    }
}
