package org.annalist.ingest;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.series.ValueFlag;

/**
 * Collects the observations of a data set whose series are identified by dimensions (SDMX-CSV, the
 * bulk tab layout, JSON-stat): one series per combination of the dimensions' codes, in the order of
 * first appearance. Observations are kept in primitive arrays (about 30 bytes each), not as text.
 *
 * <p>Once read, a dimension with one code in the whole file describes the data set and a dimension
 * with several tells the series apart: a series is named by the labels (or codes) of the varying
 * dimensions; a file of one series takes the file's name, as a lone value column of a CSV does.
 */
final class KeyedSeries {

    /** A dimension: its identifier and its label (empty when the file gives none). */
    record Dimension(String id, String label) {
        String shown() {
            return label.isEmpty() ? id : label;
        }
    }

    /** What was read: the series, and their keys. */
    record Assembled(List<Series> series, SeriesKeys keys, String periodFormat) {
    }

    /** The most observations of one series' span: far beyond any series this tool analyses. */
    private static final int MAX_SPAN = 20_000_000;

    private final String baseName;
    private final List<Dimension> dimensions;
    private final ProblemLog log;
    private final List<Map<String, String>> codeLabels = new ArrayList<>();
    private final List<Map<String, String>> codeUnits = new ArrayList<>();
    private final Map<String, Observations> byKey = new LinkedHashMap<>();
    private final String prefix;
    private final int keyStart;
    private final int frequencyDimension;
    /**
     * The codes of the SDMX code list CL_FREQ for the calendars this tool has: A annual, S "half-yearly,
     * semester", Q quarterly, M monthly (checked in CL_FREQ 2.1 as the SDMX registry publishes it, SDMX:CL_FREQ(2.1));
     * W weekly, D daily, B business days from memory (B "business day" also in the IMF's CL_FREQ).
     */
    private static final Map<String, Frequency> STATED_FREQUENCIES = Map.of("A", Frequency.ANNUAL, "S", Frequency.HALF_YEARLY, "Q", Frequency.QUARTERLY,
            "M", Frequency.MONTHLY, "W", Frequency.WEEKLY, "D", Frequency.DAILY, "B", Frequency.BUSINESS_DAILY);

    /**
     * @param baseName   the file's name without extension, for a file of one series
     * @param prefix     what the description starts with (the data set's identifier or label), or empty
     * @param keyStart   the first dimension of a series key (those before it, such as the structure's
     *                   identifier in SDMX-CSV, tell series apart but are no part of their SDMX key)
     */
    KeyedSeries(String baseName, String prefix, List<Dimension> dimensions, int keyStart, ProblemLog log) {
        int freq = -1;
        for (int d = 0; d < dimensions.size(); d++) {
            freq = freq < 0 && dimensions.get(d).id().equalsIgnoreCase("FREQ") ? d : freq;
        }
        this.frequencyDimension = freq;
        this.baseName = baseName;
        this.keyStart = keyStart;
        this.prefix = prefix;
        this.dimensions = List.copyOf(dimensions);
        this.log = log;
        for (int d = 0; d < dimensions.size(); d++) {
            codeLabels.add(new HashMap<>());
            codeUnits.add(new HashMap<>());
        }
    }

    /** Notes the unit of measure of a dimension's code (JSON-stat's {@code category.unit}): the unit of its series. */
    void unit(int dimension, String code, String unit) {
        if (!unit.isEmpty()) {
            codeUnits.get(dimension).putIfAbsent(code, unit);
        }
    }

    /** The unit of a series: that of the first of its codes that has one, or empty. */
    private String unitOf(String[] codes) {
        for (int d = 0; d < codes.length; d++) {
            String unit = codeUnits.get(d).get(codes[d]);
            if (unit != null) {
                return unit;
            }
        }
        return "";
    }

    /** Notes the label of a dimension's code (the first label given for it counts). */
    void label(int dimension, String code, String label) {
        if (!label.isEmpty()) {
            codeLabels.get(dimension).putIfAbsent(code, label);
        }
    }

    /**
     * One observation ({@code NaN} for a missing value) of the series with {@code codes}.
     *
     * @param line the line (or, in JSON, the line of the value) for messages
     */
    void add(String[] codes, Period given, double value, Set<ValueFlag> flags, int line, int column) {
        Period period = given;
        if (given.frequency() == Frequency.DAILY && frequencyDimension >= 0) {
            // timeFormat=normalized writes a period as a date (SDMX-CSV 2.0, "Optional parameters"): FREQ says which
            Frequency stated = STATED_FREQUENCIES.get(codes[frequencyDimension].toUpperCase(java.util.Locale.ROOT));
            if (stated != null && stated != Frequency.DAILY) {
                if (stated == Frequency.BUSINESS_DAILY && given.startDate().getDayOfWeek().getValue() > 5) {
                    log.error(line, column, "period " + given + " is a weekend day but FREQ is B (business days);"
                            + " expected Monday to Friday");
                    return;
                }
                period = Period.containing(stated, given.startDate());
            }
        }
        String key = String.join("\u0000", codes);
        Observations series = byKey.get(key);
        if (series == null) {
            series = new Observations(codes.clone(), period, line);
            byKey.put(key, series);
        }
        if (period.frequency() != series.frequency) {
            log.error(line, column, "period " + period + " is " + period.frequency() + " but series "
                    + keyOf(codes) + " has " + series.frequency + " periods (from " + series.first + (series.firstLine > 0
                    ? ", " + log.where(series.firstLine) : "") + "); expected one frequency per series");
            return;
        }
        series.add(period.index(), value, flags, line);
    }

    private final Set<String> shapes = new java.util.LinkedHashSet<>();

    /** Notes how a period was written ({@link SdmxPeriods#shape}); the first few shapes are kept. */
    void shape(String periodText) {
        if (shapes.size() < 4) {
            shapes.add(SdmxPeriods.shape(periodText));
        }
    }

    /** How the periods were written: {@code YYYY-nn}, or several shapes joined. */
    String periodFormat() {
        return String.join(", ", shapes);
    }

    /** Number of series so far. */
    int count() {
        return byKey.size();
    }

    /** The series, named, and their keys. */
    Assembled assemble() {
        List<Observations> all = new ArrayList<>(byKey.values());
        boolean[] varies = new boolean[dimensions.size()];
        for (int d = 0; d < dimensions.size(); d++) {
            Set<String> codes = new HashSet<>();
            for (Observations o : all) {
                codes.add(o.codes[d]);
            }
            varies[d] = codes.size() > 1;
        }
        List<String> names = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        boolean unique = true;
        for (Observations o : all) {
            String name = all.size() == 1 ? baseName : shownCodes(o.codes, varies, true);
            unique &= seen.add(name);
            names.add(name);
        }
        if (!unique) {
            names.clear();
            all.forEach(o -> names.add(shownCodes(o.codes, varies, false)));
        }
        List<Series> series = new ArrayList<>();
        List<SeriesKeys.Key> keys = new ArrayList<>();
        for (int s = 0; s < all.size(); s++) {
            Observations o = all.get(s);
            Optional<Series> made = o.assemble(names.get(s), unitOf(o.codes), log);
            if (made.isPresent()) {
                series.add(made.get());
                keys.add(new SeriesKeys.Key(names.get(s), keyOf(o.codes), all.size() == 1 ? "" : codesOf(o.codes, varies)));
            }
        }
        byKey.clear();
        return new Assembled(series, new SeriesKeys(description(all, varies), keys), periodFormat());
    }

    /** The shared dimensions: {@code Unit: Number; Country: Austria}, after the prefix. */
    private String description(List<Observations> all, boolean[] varies) {
        List<String> parts = new ArrayList<>();
        if (!prefix.isEmpty()) {
            parts.add(prefix);
        }
        if (!all.isEmpty()) {
            for (int d = 0; d < dimensions.size(); d++) {
                String code = all.get(0).codes[d];
                if (!varies[d] && !code.isEmpty()) {
                    parts.add(dimensions.get(d).shown() + ": " + shown(d, code));
                }
            }
        }
        return String.join("; ", parts);
    }

    private String shown(int dimension, String code) {
        return codeLabels.get(dimension).getOrDefault(code, code);
    }

    private String shownCodes(String[] codes, boolean[] varies, boolean labels) {
        List<String> parts = new ArrayList<>();
        for (int d = 0; d < codes.length; d++) {
            if (varies[d]) {
                parts.add(labels ? shown(d, codes[d]) : codes[d]);
            }
        }
        return String.join(labels ? ", " : ".", parts);
    }

    private String keyOf(String[] codes) {
        return String.join(".", Arrays.asList(codes).subList(keyStart, codes.length));
    }

    private static String codesOf(String[] codes, boolean[] varies) {
        List<String> parts = new ArrayList<>();
        for (int d = 0; d < codes.length; d++) {
            if (varies[d]) {
                parts.add(codes[d]);
            }
        }
        return String.join(".", parts);
    }

    /** The observations of one series as read, in primitive arrays. */
    private static final class Observations {
        private final String[] codes;
        private Frequency frequency;
        private final int firstLine;
        private final Period first;
        private long[] periods = new long[16];
        private double[] values = new double[16];
        private int[] lines = new int[16];
        private Object[] flags;   // made when the first flag arrives
        private int size;

        Observations(String[] codes, Period first, int firstLine) {
            this.codes = codes;
            this.frequency = first.frequency();
            this.first = first;
            this.firstLine = firstLine;
        }

        void add(long period, double value, Set<ValueFlag> flagSet, int line) {
            if (size == periods.length) {
                int grown = size + size / 2 + 16;
                periods = Arrays.copyOf(periods, grown);
                values = Arrays.copyOf(values, grown);
                lines = Arrays.copyOf(lines, grown);
                flags = flags == null ? null : Arrays.copyOf(flags, grown);
            }
            if (!flagSet.isEmpty() && flags == null) {
                flags = new Object[periods.length];
            }
            if (flags != null) {
                flags[size] = flagSet;
            }
            periods[size] = period;
            values[size] = value;
            lines[size++] = line;
        }

        /** The series (empty, with a warning, when it has no value; errors are logged). */
        Optional<Series> assemble(String name, String unit, ProblemLog log) {
            if (frequency == Frequency.DAILY && size > 0 && noWeekend()) {
                // daily dates that never fall on a weekend are business days, as in a CSV (README, "Input it reads")
                for (int i = 0; i < size; i++) {
                    periods[i] = Period.containing(Frequency.BUSINESS_DAILY, java.time.LocalDate.ofEpochDay(periods[i])).index();
                }
                frequency = Frequency.BUSINESS_DAILY;
            }
            long low = Long.MAX_VALUE;
            long high = Long.MIN_VALUE;
            for (int i = 0; i < size; i++) {
                low = Math.min(low, periods[i]);
                high = Math.max(high, periods[i]);
            }
            if (high - low + 1 > MAX_SPAN) {
                log.error(firstLine, 0, "series '" + name + "' spans " + (high - low + 1) + " periods, more than "
                        + MAX_SPAN + "; expected a shorter span (a mistyped year?)");
                return Optional.empty();
            }
            int span = (int) (high - low + 1);
            double[] slots = new double[span];
            Arrays.fill(slots, Double.NaN);
            int[] claimedBy = new int[span];
            Object[] slotFlags = flags == null ? null : new Object[span];
            boolean anyValue = false;
            for (int i = 0; i < size; i++) {
                int slot = (int) (periods[i] - low);
                if (claimedBy[slot] != 0) {
                    log.error(lines[i], 0, "period " + new Period(frequency, periods[i]) + " appears again for series '"
                            + name + "' (first on line " + claimedBy[slot] + "); expected one value per period and series");
                    continue;
                }
                claimedBy[slot] = Math.max(1, lines[i]);
                slots[slot] = values[i];
                anyValue |= !Double.isNaN(values[i]);
                if (slotFlags != null) {
                    slotFlags[slot] = flags[i];
                }
            }
            periods = null;
            values = null;
            flags = null;
            if (!anyValue) {
                log.warn(firstLine, 0, "series '" + name + "' has no values and was left out");
                return Optional.empty();
            }
            boolean[] stored = new boolean[span];
            for (int slot = 0; slot < span; slot++) {
                stored[slot] = !Double.isNaN(slots[slot]);
            }
            StrayPeriods.refuse(name, frequency, low, 0, span - 1, stored, claimedBy, null, log);
            return Optional.of(Series.of(name, unit, new Period(frequency, low), slots, i -> flagsAt(slotFlags, i)).trimmed());
        }

        private boolean noWeekend() {
            for (int i = 0; i < size; i++) {
                if (java.time.LocalDate.ofEpochDay(periods[i]).getDayOfWeek().getValue() > 5) {
                    return false;
                }
            }
            return true;
        }

        @SuppressWarnings("unchecked")
        private static Set<ValueFlag> flagsAt(Object[] slotFlags, int i) {
            return slotFlags == null || slotFlags[i] == null ? Set.of() : (Set<ValueFlag>) slotFlags[i];
        }
    }
}
