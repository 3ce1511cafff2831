package org.annalist.findings;

import org.annalist.analysis.indicators.LatestIndicators;
import org.annalist.series.ValueFlag;

/** Turns {@link LatestIndicators.Result} into the {@code indicators} block. */
final class IndicatorsFindings {

    private IndicatorsFindings() {
    }

    /**
     * @param measure the kind the figures were computed for; a rate's and an interval-scale
     *                quantity's changes have no % (their {@code changePct} are null)
     */
    static IndicatorsFinding of(LatestIndicators.Result r, Measure measure) {
        if (r == null) {
            return null;
        }
        boolean relative = measure.relativeChanges();
        return new IndicatorsFinding(r.period(), r.value(),
                r.flags().stream().map(ValueFlag::description).sorted().toList(), measure,
                r.lastYear().map(c -> comparison(c, relative)).orElse(null),
                r.twoYearsAgo().map(c -> comparison(c, relative)).orElse(null),
                r.yearToDate().map(s -> span(s, relative)).orElse(null),
                r.rollingYear().map(s -> span(s, relative)).orElse(null),
                relative ? Numbers.orNull(r.adjustedChangePct()) : null,
                new IndicatorsFinding.Rank(r.rank().position(), r.rank().of()),
                r.extreme().map(e -> e == LatestIndicators.Extreme.HIGHEST ? IndicatorsFinding.Extreme.HIGH
                        : IndicatorsFinding.Extreme.LOW).orElse(null));
    }

    private static IndicatorsFinding.Comparison comparison(LatestIndicators.Comparison c, boolean relative) {
        return new IndicatorsFinding.Comparison(c.period(), c.value(), c.change(),
                relative ? Numbers.orNull(c.changePct()) : null);
    }

    private static IndicatorsFinding.Span span(LatestIndicators.Span s, boolean relative) {
        return new IndicatorsFinding.Span(s.from(), s.to(), s.total(), s.previousTotal(), s.change(),
                relative ? Numbers.orNull(s.changePct()) : null);
    }
}
