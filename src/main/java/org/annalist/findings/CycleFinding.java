package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import java.util.List;
import org.annalist.series.Period;

/**
 * The findings JSON {@code cycle} block: rises and falls longer than a year.
 *
 * @param peaks          the years of the cycle's peaks, as annual periods
 * @param gaps           years between successive peaks
 * @param reason         why no cycle is claimed ({@link Reason#CLAIMED} when one is)
 * @param years          yearly values searched (0 when there were too few complete years)
 * @param spectralPeriod the periodogram's strongest period in years, when measured
 */
public record CycleFinding(boolean present, Double length, String lengthUnit, List<Period> peaks, List<Integer> gaps,
                           boolean regular, @JsonIgnore Reason reason, @JsonIgnore int years,
                           @JsonIgnore Double spectralPeriod, @JsonIgnore Double pValue) {

    /** The findings JSON states the cycle's length in years. */
    static final String YEARS = "years";

    public enum Reason {
        CLAIMED,
        /** The data do not hold enough complete calendar years to form yearly values. */
        TOO_FEW_COMPLETE_YEARS,
        /** Fewer yearly values than {@link DecisionRules#MIN_YEARS_FOR_CYCLE}. */
        TOO_FEW_YEARS,
        /** No period between {@link DecisionRules#MIN_CYCLE_YEARS} years and half the span. */
        NO_CANDIDATE_PERIOD,
        /** The strongest period is no stronger than red noise would give. */
        NOT_BEYOND_RED_NOISE,
        /** Fewer than {@value DecisionRules#MIN_CYCLE_PEAKS} peaks confirm the period. */
        TOO_FEW_PEAKS
    }

    public CycleFinding {
        peaks = List.copyOf(peaks);
        gaps = List.copyOf(gaps);
    }
}
