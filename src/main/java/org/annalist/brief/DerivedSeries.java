package org.annalist.brief;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Pattern;
import org.annalist.findings.RatioParts;
import org.annalist.narrative.SeriesNames;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.series.SeriesBuilder;
import org.annalist.series.ValueFlag;

/**
 * Ratios the tool derives when a file holds their parts: average length of stay = nights /
 * arrivals, and occupancy = nights / bed-places (or bed-nights available) × 100 (Eurostat's
 * definitions, from memory). Parts pair up when their names are the same once the words
 * "nights", "arrivals" or "bed-places" are taken out (or their units say what they are):
 * "Domestic nights" and "Domestic arrivals", or "Total" in nights and "Total" in arrivals.
 */
public final class DerivedSeries {

    /** A derived series with the parts its spans are computed from. */
    public record Derived(Series series, RatioParts parts) {
    }

    private static final Pattern NIGHTS = Pattern.compile("(?i)\\b(guest[- ]?)?nights?\\b");
    private static final Pattern ARRIVALS = Pattern.compile("(?i)\\b(guest[- ]?)?arrivals?\\b");
    private static final Pattern CAPACITY = Pattern.compile("(?i)\\b(bed[- ]?places?|bed[- ]?nights available|capacity)\\b");

    private DerivedSeries() {
    }

    public static List<Derived> of(List<Series> all) {
        List<Derived> derived = new ArrayList<>();
        for (Series nights : all) {
            if (!is(nights, NIGHTS) || is(nights, CAPACITY)) {
                continue;
            }
            String base = base(nights);
            partner(all, nights, ARRIVALS, base).ifPresent(arrivals -> derived.add(ratio(nights, arrivals, 1,
                    SeriesNames.averageLengthOfStay(base), SeriesNames.NIGHTS_PER_ARRIVAL)));
            partner(all, nights, CAPACITY, base).ifPresent(capacity -> derived.add(ratio(nights, capacity, 100,
                    SeriesNames.occupancy(base), SeriesNames.PERCENT)));
        }
        return List.copyOf(derived);
    }

    private static Optional<Series> partner(List<Series> all, Series nights, Pattern kind, String base) {
        return all.stream().filter(s -> s != nights && s.frequency() == nights.frequency() && is(s, kind)
                && base(s).equals(base)).findFirst();
    }

    private static Derived ratio(Series numerator, Series denominator, double scale, String name, String unit) {
        SeriesBuilder b = Series.builder(name, numerator.frequency()).unit(unit);
        Period first = numerator.start().compareTo(denominator.start()) > 0 ? numerator.start() : denominator.start();
        Period last = numerator.end().compareTo(denominator.end()) < 0 ? numerator.end() : denominator.end();
        for (Period p = first; p.compareTo(last) <= 0; p = p.plus(1)) {
            int a = numerator.indexOf(p);
            int d = denominator.indexOf(p);
            double value = numerator.isMissing(a) || denominator.isMissing(d) || denominator.value(d) == 0 ? Double.NaN
                    : scale * numerator.value(a) / denominator.value(d);
            if (!(Math.abs(value) <= 1e100)) {
                value = Double.NaN;   // a ratio by a near-zero denominator, missing as one by zero is (the readers' limit, README)
            }
            java.util.EnumSet<ValueFlag> flags = java.util.EnumSet.noneOf(ValueFlag.class);
            flags.addAll(numerator.flags(a));
            flags.addAll(denominator.flags(d));
            b.put(p, value, java.util.Set.copyOf(flags));
        }
        return new Derived(b.snapshot(), new RatioParts(numerator, denominator, scale));
    }

    private static boolean is(Series s, Pattern kind) {
        return kind.matcher(s.name()).find() || kind.matcher(s.unit()).find();
    }

    /** The name without the words that say which part it is. */
    private static String base(Series s) {
        String name = s.name();
        for (Pattern p : List.of(NIGHTS, ARRIVALS, CAPACITY)) {
            name = p.matcher(name).replaceAll(" ");
        }
        return name.replaceAll("[()\\[\\],;:-]", " ").trim().replaceAll("\\s+", " ").toLowerCase(Locale.ROOT);
    }
}
