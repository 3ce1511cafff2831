package org.annalist.findings;

import java.util.ArrayList;
import java.util.List;
import org.annalist.analysis.indicators.LatestIndicators;
import org.annalist.analysis.indicators.YearOnYear;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.series.ValueFlag;

/** Turns {@link LatestIndicators.Result} into the {@code indicators} block. */
final class IndicatorsFindings {

    private IndicatorsFindings() {
    }

    /**
     * The block, with the ties of the latest value found in {@code series}: the same periods of
     * earlier years with exactly its value (its rank is shared), and the earlier periods with the
     * series' highest or lowest value when the latest equals it.
     *
     * @param measure the kind the figures were computed for; a rate's and an interval-scale
     *                quantity's changes have no % (their {@code changePct} are null)
     * @param series the series the indicators were computed on; null for none (no ties looked for)
     * @param adjustedForCalendar whether the result's adjusted change also took out calendar effects
     */
    static IndicatorsFinding of(LatestIndicators.Result r, Measure measure, Series series, boolean adjustedForCalendar) {
        if (r == null) {
            return null;
        }
        int i = series == null ? -1 : series.indexOf(r.period());
        List<Period> tiedWith = i < 0 ? List.of() : sameValueSamePeriod(series, i);
        IndicatorsFinding.EqualRecord equalRecord = i < 0 || r.extreme().isPresent() ? null : equalRecord(series, i);
        boolean relative = measure.relativeChanges();
        return new IndicatorsFinding(r.period(), r.value(),
                r.flags().stream().map(ValueFlag::description).sorted().toList(), measure,
                r.lastYear().map(c -> comparison(c, relative)).orElse(null),
                r.twoYearsAgo().map(c -> comparison(c, relative)).orElse(null),
                r.yearToDate().map(s -> span(s, relative)).orElse(null),
                r.rollingYear().map(s -> span(s, relative)).orElse(null),
                relative ? Numbers.orNull(r.adjustedChangePct()) : null,
                new IndicatorsFinding.Rank(r.rank().position(), r.rank().of(), tiedWith),
                r.extreme().map(e -> e == LatestIndicators.Extreme.HIGHEST ? IndicatorsFinding.Extreme.HIGH
                        : IndicatorsFinding.Extreme.LOW).orElse(null), equalRecord, adjustedForCalendar);
    }

    /** The same periods of earlier years whose value equals the one at {@code i}, in time order. */
    private static List<Period> sameValueSamePeriod(Series s, int i) {
        int lag = YearOnYear.lag(s.frequency());
        List<Period> tied = new ArrayList<>();
        for (int j = i - lag; j >= 0; j -= lag) {
            if (!s.isMissing(j) && s.value(j) == s.value(i)) {
                tied.add(0, s.period(j));
            }
        }
        return tied;
    }

    /**
     * The tie for the series' highest (or lowest) so far: the value at {@code i} equals the largest
     * (smallest) earlier value; null when it does not, and when every earlier value equals it (a
     * constant stretch has no highest).
     */
    private static IndicatorsFinding.EqualRecord equalRecord(Series s, int i) {
        double max = Double.NEGATIVE_INFINITY;
        double min = Double.POSITIVE_INFINITY;
        for (int j = 0; j < i; j++) {
            if (!s.isMissing(j)) {
                max = Math.max(max, s.value(j));
                min = Math.min(min, s.value(j));
            }
        }
        double v = s.value(i);
        if (max == min || (v != max && v != min)) {
            return null;
        }
        List<Period> with = new ArrayList<>();
        for (int j = 0; j < i; j++) {
            if (!s.isMissing(j) && s.value(j) == v) {
                with.add(s.period(j));
            }
        }
        return new IndicatorsFinding.EqualRecord(v == max ? IndicatorsFinding.Extreme.HIGH : IndicatorsFinding.Extreme.LOW, with);
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
