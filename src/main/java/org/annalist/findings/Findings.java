package org.annalist.findings;

import java.util.List;

/**
 * What the analysis found about one series, as the brief and the JSON state it.
 *
 * @param recent the latest periods, oldest first, with their year-on-year change
 */
public record Findings(SeriesFacts series, Smoothing smoothing, List<RecentPeriod> recent) {

    public static final String SCHEMA = "annalist.findings/1";

    public Findings {
        recent = List.copyOf(recent);
    }

    public String schema() {
        return SCHEMA;
    }
}
