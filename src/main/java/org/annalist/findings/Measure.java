package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;
import org.annalist.analysis.indicators.LatestIndicators;

/**
 * How a series' values combine over time: a flow is summed (nights, arrivals, sales), a level is
 * averaged (occupancy, prices, rates), a ratio of two flows takes the ratio of their sums (average
 * length of stay).
 */
public enum Measure {
    FLOW, LEVEL, RATIO;

    /** The findings JSON's code: {@code flow}, {@code level}, {@code ratio}. */
    @JsonValue
    public String code() {
        return name().toLowerCase(Locale.ROOT);
    }

    LatestIndicators.Measure forIndicators() {
        return switch (this) {
            case FLOW -> LatestIndicators.Measure.FLOW;
            case LEVEL -> LatestIndicators.Measure.LEVEL;
            case RATIO -> LatestIndicators.Measure.RATIO;
        };
    }
}
