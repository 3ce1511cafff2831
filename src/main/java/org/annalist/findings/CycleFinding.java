package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import java.util.List;

/**
 * The findings JSON {@code cycle} block: rises and falls longer than a year.
 *
 * @param peaks the years of the cycle's peaks, as period labels
 * @param gaps  years between successive peaks
 */
public record CycleFinding(boolean present, Double length, String lengthUnit, List<String> peaks, List<Integer> gaps,
                           boolean regular, @JsonIgnore String reason, @JsonIgnore Double spectralPeriod,
                           @JsonIgnore Double pValue) {

    public CycleFinding {
        peaks = List.copyOf(peaks);
        gaps = List.copyOf(gaps);
    }
}
