package org.annalist.findings;

import org.annalist.analysis.indicators.LatestIndicators;
import org.annalist.series.ValueFlag;

/** Turns {@link LatestIndicators.Result} into the {@code indicators} block. */
final class IndicatorsFindings {

    private IndicatorsFindings() {
    }

    /** @param measure the kind the figures were computed for */
    static IndicatorsFinding of(LatestIndicators.Result r, Measure measure) {
        if (r == null) {
            return null;
        }
        return new IndicatorsFinding(r.period(), r.value(),
                r.flags().stream().map(ValueFlag::description).sorted().toList(), measure,
                r.lastYear().map(IndicatorsFindings::comparison).orElse(null),
                r.twoYearsAgo().map(IndicatorsFindings::comparison).orElse(null),
                r.yearToDate().map(IndicatorsFindings::span).orElse(null),
                r.rollingYear().map(IndicatorsFindings::span).orElse(null), Numbers.orNull(r.adjustedChangePct()),
                new IndicatorsFinding.Rank(r.rank().position(), r.rank().of()),
                r.extreme().map(e -> e == LatestIndicators.Extreme.HIGHEST ? IndicatorsFinding.Extreme.HIGH
                        : IndicatorsFinding.Extreme.LOW).orElse(null));
    }

    private static IndicatorsFinding.Comparison comparison(LatestIndicators.Comparison c) {
        return new IndicatorsFinding.Comparison(c.period(), c.value(), c.change(), Numbers.orNull(c.changePct()));
    }

    private static IndicatorsFinding.Span span(LatestIndicators.Span s) {
        return new IndicatorsFinding.Span(s.from(), s.to(), s.total(), s.previousTotal(), s.change(),
                Numbers.orNull(s.changePct()));
    }
}
