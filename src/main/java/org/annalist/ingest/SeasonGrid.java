package org.annalist.ingest;

import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;
import org.annalist.ingest.TableShape.Column;
import org.annalist.series.Frequency;
import org.annalist.series.Period;

/**
 * The layout of many published tables: a row per year, a column per month (Jan … Dec) or quarter
 * (Q1 … Q4). Read as one monthly (quarterly) series, not as twelve annual ones. A column of yearly
 * totals beside the months is set aside (with a warning), since it repeats the months' sum.
 */
final class SeasonGrid {

    /** @param positions month or quarter of each value column (0 for a totals column that is set aside) */
    record Grid(Frequency frequency, Map<Integer, Integer> positions) {

        Period period(int year, int column) {
            int position = positions.get(column);
            return frequency == Frequency.MONTHLY ? Period.month(year, position) : Period.quarter(year, position);
        }
    }

    private static final Map<String, Integer> MONTHS = months();
    private static final Pattern QUARTER = Pattern.compile("(?i)q([1-4])|([1-4])(st|nd|rd|th)? quarter|quarter ([1-4])");
    private static final Pattern TOTAL = Pattern.compile("(?i)(year(ly)?|annual)?\\s*(total|sum|year|annual|all)");

    private SeasonGrid() {
    }

    /** The grid, when the period column holds years and the value columns are months or quarters. */
    static Optional<Grid> of(Frequency periodColumn, List<Column> valueColumns, ProblemLog log, int headerLine) {
        if (periodColumn != Frequency.ANNUAL || valueColumns.size() < 4) {
            return Optional.empty();
        }
        Map<Integer, Integer> months = new HashMap<>();
        Map<Integer, Integer> quarters = new HashMap<>();
        int totals = 0;
        for (Column c : valueColumns) {
            String name = c.name().trim().toLowerCase(Locale.ROOT).replace(".", "");
            Integer month = MONTHS.get(name);
            var q = QUARTER.matcher(name);
            if (month != null) {
                months.put(c.index(), month);
            } else if (q.matches()) {
                String digit = q.group(1) != null ? q.group(1) : q.group(2) != null ? q.group(2) : q.group(4);
                quarters.put(c.index(), Integer.parseInt(digit));
            } else if (TOTAL.matcher(name).matches()) {
                totals++;
            } else {
                return Optional.empty();
            }
        }
        boolean monthly = months.size() >= 6 && quarters.isEmpty() && months.values().stream().distinct().count() == months.size();
        boolean quarterly = quarters.size() == 4 && months.isEmpty() && quarters.values().stream().distinct().count() == 4;
        if (!monthly && !quarterly) {
            return Optional.empty();
        }
        Map<Integer, Integer> positions = new HashMap<>(monthly ? months : quarters);
        for (Column c : valueColumns) {
            if (!positions.containsKey(c.index())) {
                positions.put(c.index(), 0);
                log.warn(headerLine, c.index() + 1, "column '" + c.name() + "' set aside: it holds yearly totals beside the "
                        + (monthly ? "months" : "quarters"));
            }
        }
        log.warn(headerLine, 0, "a row per year and a column per " + (monthly ? "month" : "quarter")
                + ": read as one " + (monthly ? "monthly" : "quarterly") + " series");
        return Optional.of(new Grid(monthly ? Frequency.MONTHLY : Frequency.QUARTERLY, Map.copyOf(positions)));
    }

    private static Map<String, Integer> months() {
        String[] full = {"january", "february", "march", "april", "may", "june", "july", "august", "september",
            "october", "november", "december"};
        Map<String, Integer> names = new HashMap<>();
        for (int m = 0; m < 12; m++) {
            names.put(full[m], m + 1);
            names.put(full[m].substring(0, 3), m + 1);
            names.put(String.format(Locale.ROOT, "m%02d", m + 1), m + 1);
        }
        names.put("sept", 9);
        return Map.copyOf(names);
    }
}
