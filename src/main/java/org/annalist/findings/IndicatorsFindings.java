package org.annalist.findings;

import java.util.Locale;
import org.annalist.analysis.indicators.LatestIndicators;
import org.annalist.series.ValueFlag;

/** Turns {@link LatestIndicators.Result} into the {@code indicators} block. */
final class IndicatorsFindings {

    private IndicatorsFindings() {
    }

    static IndicatorsFinding of(LatestIndicators.Result r) {
        if (r == null) {
            return null;
        }
        return new IndicatorsFinding(r.period().label(), r.value(),
                r.flags().stream().map(ValueFlag::description).sorted().toList(),
                r.measure().name().toLowerCase(Locale.ROOT), comparison(r.lastYear()), comparison(r.twoYearsAgo()),
                span(r.yearToDate()), span(r.rollingYear()), Numbers.orNull(r.adjustedChangePct()),
                new IndicatorsFinding.Rank(r.rank().position(), r.rank().of()), r.record());
    }

    private static IndicatorsFinding.Comparison comparison(LatestIndicators.Comparison c) {
        return c == null ? null : new IndicatorsFinding.Comparison(c.period().label(), c.value(), c.change(),
                Numbers.orNull(c.changePct()));
    }

    private static IndicatorsFinding.Span span(LatestIndicators.Span s) {
        return s == null ? null : new IndicatorsFinding.Span(s.from().label(), s.to().label(), s.total(),
                s.previousTotal(), s.change(), Numbers.orNull(s.changePct()));
    }
}
