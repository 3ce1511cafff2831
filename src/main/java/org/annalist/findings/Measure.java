package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;
import org.annalist.analysis.indicators.LatestIndicators;

/**
 * How a series' values combine over time and how two of them compare. The kind decides every sum,
 * mean and change the findings and the brief state (common practice in official statistics, no
 * source):
 * <ul>
 * <li>{@link #FLOW}: an amount per period (nights, arrivals, revenue): summed over spans, changes in %.</li>
 * <li>{@link #LEVEL}: a stock or level measured at a point or as an average (capacity, prices, an
 *     index): averaged over spans; changes in % (its zero means "none", so a ratio of two values
 *     means something: a price 5 % higher is true).</li>
 * <li>{@link #RATE}: a rate or share (occupancy in %): averaged over spans; changes as differences
 *     (percentage points for a rate in %), never as % of a %, which reads as a change of the rate
 *     itself.</li>
 * <li>{@link #INTERVAL}: an interval-scale quantity whose zero is arbitrary (temperature in °C or
 *     °F): averaged over spans, changes as differences in its units, never a % change (0 °F is no
 *     "nothing") and never a total.</li>
 * <li>{@link #RATIO}: a ratio derived from two flows (average length of stay): over a span the
 *     ratio of the parts' sums; never declared, only derived.</li>
 * </ul>
 */
public enum Measure {
    FLOW, LEVEL, RATIO, RATE, INTERVAL;

    /** The findings JSON's code: {@code flow}, {@code level}, {@code ratio}, {@code rate}, {@code interval}. */
    @JsonValue
    public String code() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** Whether spans are summed (a flow); every other kind is averaged or taken as a ratio of sums. */
    public boolean summed() {
        return this == FLOW;
    }

    /**
     * Whether a change can be read as a % of the earlier value: not for a rate (points, not % of a
     * %) and not for an interval scale (its zero is arbitrary).
     */
    public boolean relativeChanges() {
        return this != RATE && this != INTERVAL;
    }

    LatestIndicators.Measure forIndicators() {
        return switch (this) {
            case FLOW -> LatestIndicators.Measure.FLOW;
            case LEVEL, RATE, INTERVAL -> LatestIndicators.Measure.LEVEL;
            case RATIO -> LatestIndicators.Measure.RATIO;
        };
    }
}
