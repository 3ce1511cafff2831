package org.annalist.analysis.indicators;

import java.time.Month;
import java.util.EnumSet;
import java.util.Optional;
import java.util.Set;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.series.ValueFlag;

/**
 * The figures a monthly release leads with, for one period: the value; the same period one and
 * two years earlier; year-to-date and the rolling year against the same spans a year before; the
 * seasonally adjusted change on the previous period; the rank among the same period of every
 * year; records. Flows (nights, arrivals) are summed over spans; levels and rates (occupancy,
 * prices) are averaged, never summed (common practice in official tourism statistics; no source);
 * ratios (average length of stay, occupancy) take the ratio of the parts' sums (common practice,
 * no source). Spans with a missing value are not compared (our rule).
 */
public final class LatestIndicators {

    /** How values combine over time. */
    public enum Measure { FLOW, LEVEL, RATIO }

    /**
     * The parts of a ratio series (nights / arrivals, nights / bed-nights available × 100): over a
     * span the ratio is the ratio of the sums, not the mean of the ratios (common practice, no
     * source: the mean of monthly ratios would weigh a quiet month like a busy one).
     */
    public record Parts(Series numerator, Series denominator, double scale) {
    }

    /** A value against an earlier one; {@code changePct} NaN when the earlier value is zero. */
    public record Comparison(Period period, double value, double change, double changePct) {
    }

    /** A span against the same span a year earlier: sums for flows, means for levels. */
    public record Span(Period from, Period to, double total, double previousTotal, double change, double changePct) {
    }

    /** Position among the same period of every year up to this one (1 = highest), of how many. */
    public record Rank(int position, int of) {
    }

    /** The value is the highest or the lowest of the whole series so far. */
    public enum Extreme { HIGHEST, LOWEST }

    /**
     * @param flags             flags on any value the figures use (provisional, estimated …)
     * @param lastYear          empty when the value a year earlier is missing or before the data
     * @param yearToDate        empty for annual data or when a value of either span is missing
     * @param adjustedChangePct change of the seasonally adjusted value on the previous period, NaN if unknown
     * @param extreme           whether the value is the highest or lowest so far
     * @param longerFebruary    a February compared with one of another length: +1 when this one is longer, −1 shorter, 0 otherwise
     */
    public record Result(Period period, double value, Set<ValueFlag> flags, Measure measure,
                         Optional<Comparison> lastYear, Optional<Comparison> twoYearsAgo, Optional<Span> yearToDate,
                         Optional<Span> rollingYear, double adjustedChangePct, Rank rank, Optional<Extreme> extreme,
                         int longerFebruary) {
    }

    private LatestIndicators() {
    }

    /**
     * @param adjusted seasonally adjusted values in the series' units (null when there are none)
     * @throws IllegalArgumentException when the value at {@code i} is missing
     */
    public static Result at(Series s, int i, Measure measure, double[] adjusted) {
        return at(s, i, measure, adjusted, null);
    }

    /** As {@link #at(Series, int, Measure, double[])}; for {@link Measure#RATIO}, {@code parts} give the spans' ratios of sums. */
    public static Result at(Series s, int i, Measure measure, double[] adjusted, Parts parts) {
        if (s.isMissing(i)) {
            throw new IllegalArgumentException("no value for " + s.period(i));
        }
        int lag = YearOnYear.lag(s.frequency());
        EnumSet<ValueFlag> flags = EnumSet.noneOf(ValueFlag.class);
        flags.addAll(s.flags(i));
        Optional<Comparison> lastYear = compare(s, i, i - lag, flags);
        Optional<Comparison> twoYears = compare(s, i, i - 2 * lag, flags);
        Optional<Span> ytd = Optional.empty();
        if (s.frequency() != Frequency.ANNUAL) {
            int first = i;
            while (first > 0 && s.period(first - 1).year() == s.period(i).year()) {
                first--;
            }
            ytd = span(s, first, i, lag, measure, flags, parts);
        }
        Optional<Span> rolling = s.frequency() == Frequency.ANNUAL || i - lag + 1 < 0 ? Optional.empty()
                : span(s, i - lag + 1, i, lag, measure, flags, parts);
        double adjustedChange = Double.NaN;
        if (adjusted != null && i > 0 && !Double.isNaN(adjusted[i]) && !Double.isNaN(adjusted[i - 1]) && adjusted[i - 1] != 0) {
            adjustedChange = 100 * (adjusted[i] / adjusted[i - 1] - 1);
        }
        int above = 0;
        int of = 0;
        for (int j = i; j >= 0; j -= lag) {
            if (!s.isMissing(j)) {
                of++;
                above += s.value(j) > s.value(i) ? 1 : 0;
            }
        }
        boolean high = true;
        boolean low = true;
        int earlier = 0;
        for (int j = 0; j < i; j++) {
            if (!s.isMissing(j)) {
                earlier++;
                high &= s.value(j) < s.value(i);
                low &= s.value(j) > s.value(i);
            }
        }
        Optional<Extreme> extreme = earlier == 0 ? Optional.empty() : high ? Optional.of(Extreme.HIGHEST)
                : low ? Optional.of(Extreme.LOWEST) : Optional.empty();
        int february = 0;
        Period p = s.period(i);
        if (s.frequency() == Frequency.MONTHLY && p.startDate().getMonth() == Month.FEBRUARY && lastYear.isPresent()) {
            february = Integer.compare(p.lengthInDays(), lastYear.get().period().lengthInDays());
        }
        return new Result(p, s.value(i), Set.copyOf(flags), measure, lastYear, twoYears, ytd, rolling, adjustedChange,
                new Rank(above + 1, of), extreme, february);
    }

    /** Σ numerator / Σ denominator × scale over {@code from..to}, shifted back {@code lag} periods. */
    private static double ratioOfSums(Parts parts, Period from, Period to, int lag) {
        double num = 0;
        double den = 0;
        for (Period p = from.plus(-lag); p.compareTo(to.plus(-lag)) <= 0; p = p.plus(1)) {
            int a = parts.numerator().indexOf(p);
            int b = parts.denominator().indexOf(p);
            if (a < 0 || b < 0 || parts.numerator().isMissing(a) || parts.denominator().isMissing(b)) {
                return Double.NaN;
            }
            num += parts.numerator().value(a);
            den += parts.denominator().value(b);
        }
        return den == 0 ? Double.NaN : parts.scale() * num / den;
    }

    private static Optional<Comparison> compare(Series s, int i, int earlier, Set<ValueFlag> flags) {
        if (earlier < 0 || s.isMissing(earlier)) {
            return Optional.empty();
        }
        flags.addAll(s.flags(earlier));
        double then = s.value(earlier);
        double change = s.value(i) - then;
        return Optional.of(new Comparison(s.period(earlier), then, change,
                then == 0 ? Double.NaN : 100 * change / Math.abs(then)));
    }

    /** {@code from..to} against the same positions {@code lag} periods earlier; empty if any value is missing. */
    private static Optional<Span> span(Series s, int from, int to, int lag, Measure measure, Set<ValueFlag> flags,
                                       Parts parts) {
        if (from - lag < 0) {
            return Optional.empty();
        }
        double now = 0;
        double before = 0;
        for (int j = from; j <= to; j++) {
            if (s.isMissing(j) || s.isMissing(j - lag)) {
                return Optional.empty();
            }
            now += s.value(j);
            before += s.value(j - lag);
        }
        for (int j = from; j <= to; j++) {
            flags.addAll(s.flags(j));
            flags.addAll(s.flags(j - lag));
        }
        int n = to - from + 1;
        if (measure == Measure.RATIO && parts != null) {
            now = ratioOfSums(parts, s.period(from), s.period(to), 0);
            before = ratioOfSums(parts, s.period(from), s.period(to), lag);
        } else if (measure != Measure.FLOW) {
            now /= n;
            before /= n;
        }
        return Optional.of(new Span(s.period(from), s.period(to), now, before, now - before,
                before == 0 ? Double.NaN : 100 * (now - before) / Math.abs(before)));
    }
}
