package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;

/**
 * The findings JSON {@code irregular} block.
 *
 * @param share share of the variation around the long-run trend that is irregular (0–1); null when not measured
 * @param size  small, moderate or large; null when not measured
 * @param leftOutNearBreaks periods left out of the share because the trend there straddles a break
 * @param reach how many periods on each side of a break the trend straddles it
 */
public record IrregularFinding(Double share, @JsonProperty("label") Size size, @JsonIgnore int leftOutNearBreaks,
                               @JsonIgnore int reach) {

    /** How much of the movement is irregular, by {@link DecisionRules#SMALL_IRREGULAR_SHARE} and {@link DecisionRules#LARGE_IRREGULAR_SHARE}. */
    public enum Size {
        SMALL, MODERATE, LARGE;

        @JsonValue
        public String code() {
            return name().toLowerCase(Locale.ROOT);
        }

        static Size of(double share) {
            return share < DecisionRules.SMALL_IRREGULAR_SHARE ? SMALL
                    : share <= DecisionRules.LARGE_IRREGULAR_SHARE ? MODERATE : LARGE;
        }
    }

    static IrregularFinding notMeasured() {
        return new IrregularFinding(null, null, 0, 0);
    }

    static IrregularFinding of(double share, int leftOutNearBreaks, int reach) {
        return new IrregularFinding(share, Size.of(share), leftOutNearBreaks, reach);
    }
}
