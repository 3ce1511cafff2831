package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.util.List;
import java.util.Optional;

/**
 * What the analysis found about one series: the findings JSON ({@code annalist.findings/1}) and,
 * not written to it, what the brief needs besides.
 *
 * @param transform     whether the analysis worked on logarithms
 * @param outliers      single periods far from trend and season
 * @param breaks        structural changes, oldest first
 * @param indicators    the latest period against earlier ones (null when the latest period has no value)
 * @param calendar      Easter dates, calendar effects and notes (monthly and quarterly data; else null)
 * @param outlook       forecasts with intervals and their back-test (null when not made)
 * @param recent        the latest periods with their year-on-year change, oldest first
 * @param notes         what limits the findings (short series, sparse data, provisional breaks, …)
 * @param form          how additive or multiplicative was decided
 * @param decomposition the components in the series' units; empty when the series could not be decomposed
 * @param episodes      collapses followed by recoveries (pairs of breaks)
 * @param breakMethod   how breaks were searched, for the methods appendix
 */
@JsonPropertyOrder({"schema", "series", "transform", "trend", "seasonality", "cycle", "outliers", "breaks",
    "irregular", "smoothing", "indicators", "calendar", "outlook", "claims"})
public record Findings(SeriesFacts series, Transform transform, TrendFinding trend, SeasonalityFinding seasonality,
                       CycleFinding cycle, List<OutlierFinding> outliers, List<BreakFinding> breaks,
                       IrregularFinding irregular,
                       Smoothing smoothing, IndicatorsFinding indicators, CalendarFinding calendar, OutlookFinding outlook, @JsonIgnore List<RecentPeriod> recent,
                       @JsonIgnore List<Caveat> notes, @JsonIgnore FormChoice form,
                       @JsonIgnore Optional<Decomposition> decomposition, @JsonIgnore List<Episode> episodes,
                       @JsonIgnore BreakMethod breakMethod) {

    public static final String SCHEMA = "annalist.findings/1";

    public Findings {
        outliers = List.copyOf(outliers);
        breaks = List.copyOf(breaks);
        recent = List.copyOf(recent);
        notes = List.copyOf(notes);
        episodes = List.copyOf(episodes);
    }

    @JsonProperty("schema")
    public String schema() {
        return SCHEMA;
    }

    /** The first page's statements after the consistency pass, and the headline (the findings JSON's {@code claims}). */
    @JsonProperty("claims")
    public Claims claims() {
        // the calendar-adjusted change leads where a significant Easter or weekday effect moved the latest period
        Optional<Claims.AdjustedChange> adjusted = Optional.ofNullable(calendar())
                .map(CalendarFinding::latestChange)
                .map(a -> new Claims.AdjustedChange(a.adjustedChange(), Optional.ofNullable(a.adjustedChangePct())));
        return Claims.of(this, adjusted);
    }
}
