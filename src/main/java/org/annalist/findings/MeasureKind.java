package org.annalist.findings;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.annalist.series.Series;

/**
 * Reads the {@link Measure} of a series from its unit and name when the user has not declared it.
 * The name and unit are split into lower-case words first ({@code occupancy_rate},
 * {@code BedOccupancy}, {@code petrol-price}, {@code temp2m} → occupancy rate, bed occupancy,
 * petrol price, temp 2 m), then the first rule that applies decides (common practice in official
 * statistics, no source):
 * <ol>
 * <li>a temperature unit or word → {@link Measure#INTERVAL} (°C and °F have an arbitrary zero;
 *     kelvin does not and is left to the later rules);</li>
 * <li>a unit in % → {@link Measure#RATE};</li>
 * <li>a word for a price (price, fare, tariff, room rate, exchange rate) → {@link Measure#LEVEL};</li>
 * <li>a name that says rate, share, occupancy or percent with
 *     no unit → {@link Measure#RATE} when every value lies within 0 to
 *     {@value DecisionRules#RATE_MAX_VALUE} (a share cannot exceed the whole; above that the name's
 *     "rate" is a rate per 1,000 or per 100,000, averaged as a level);</li>
 * <li>a word for a price, an average, an index, a stock, a capacity, a ratio, "per", or a rate
 *     with another unit (an exchange rate in EUR) → {@link Measure#LEVEL};</li>
 * <li>everything else → {@link Measure#FLOW}, the safer default for counts.</li>
 * </ol>
 */
public final class MeasureKind {

    /** Words of a temperature: its zero is a convention, so differences, not ratios, mean something. */
    private static final Set<String> INTERVAL_WORDS = Set.of("temperature", "temperatures", "temp", "temps",
            "celsius", "fahrenheit", "degc", "degf", "°c", "°f", "℃", "℉", "centigrade");

    /** Units of a temperature: degrees (of Celsius or Fahrenheit) and their symbols. */
    private static final Set<String> INTERVAL_UNITS = Set.of("°c", "°f", "°", "℃", "℉", "degc", "degf", "deg c",
            "deg f", "degrees", "degree", "degrees c", "degrees f", "degrees celsius", "degrees fahrenheit",
            "celsius", "fahrenheit");

    /** Words of a rate or share: a part of a whole, compared in points. */
    private static final Set<String> RATE_WORDS = Set.of("rate", "rates", "share", "shares", "occupancy",
            "percent", "percentage", "pct", "proportion", "utilisation", "utilization");

    /** Words of a price: a "rate" that is a price (room rate, exchange rate) is averaged and compared in %. */
    private static final Set<String> PRICE_WORDS = Set.of("price", "prices", "cost", "costs", "fare", "fares",
            "tariff", "adr", "revpar", "exchange");

    /** Words of a stock or level: averaged over a span, never summed. */
    private static final Set<String> LEVEL_WORDS = Set.of("price", "prices", "average", "avg", "mean", "median",
            "index", "indices", "per", "capacity", "stock", "stocks", "ratio", "level", "levels", "alos", "cpi",
            "population", "inventory", "balance");

    private MeasureKind() {
    }

    public static Measure infer(Series series) {
        return infer(series.name(), series.unit(), maxValue(series));
    }

    /** @param max the largest value of the series (NaN when it has none) */
    static Measure infer(String name, String unit, double max) {
        List<String> nameWords = words(name);
        String u = unit.trim().toLowerCase(Locale.ROOT);
        List<String> unitWords = words(unit);
        if (INTERVAL_UNITS.contains(u) || u.startsWith("°") || anyOf(nameWords, INTERVAL_WORDS)
                || anyOf(unitWords, INTERVAL_WORDS)) {
            return Measure.INTERVAL;
        }
        boolean percentUnit = u.contains("%") || unitWords.contains("percent") || unitWords.contains("pct")
                || String.join(" ", unitWords).contains("per cent");
        if (percentUnit) {
            return Measure.RATE;
        }
        boolean rateName = anyOf(nameWords, RATE_WORDS) || String.join(" ", nameWords).contains("per cent");
        if (anyOf(nameWords, PRICE_WORDS) || Collections.indexOfSubList(nameWords, List.of("room", "rate")) >= 0
                || Collections.indexOfSubList(nameWords, List.of("daily", "rate")) >= 0) {
            return Measure.LEVEL;
        }
        if (rateName && u.isEmpty() && !(max > DecisionRules.RATE_MAX_VALUE)) {
            return Measure.RATE;
        }
        if (rateName || anyOf(nameWords, LEVEL_WORDS) || anyOf(unitWords, LEVEL_WORDS)
                || Collections.indexOfSubList(nameWords, List.of("length", "of", "stay")) >= 0) {
            return Measure.LEVEL;
        }
        return Measure.FLOW;
    }

    /**
     * The words of a name: split at anything but letters, digits and degree signs, at a lower-case
     * letter followed by a capital ({@code BedOccupancy}), before the last capital of a run followed
     * by a lower-case letter ({@code CPIIndex} → CPI Index) and between letters and digits.
     */
    static List<String> words(String text) {
        List<String> words = new ArrayList<>();
        StringBuilder word = new StringBuilder();
        int n = text.length();
        for (int i = 0; i < n; i++) {
            char c = text.charAt(i);
            boolean part = Character.isLetterOrDigit(c) || c == '°' || c == '℃' || c == '℉';
            if (!part) {
                flush(word, words);
                continue;
            }
            if (word.length() > 0) {
                char prev = word.charAt(word.length() - 1);
                boolean camel = Character.isLowerCase(prev) && Character.isUpperCase(c);
                boolean acronymEnd = Character.isUpperCase(prev) && Character.isUpperCase(c) && i + 1 < n
                        && Character.isLowerCase(text.charAt(i + 1));
                boolean digitEdge = Character.isDigit(prev) != Character.isDigit(c) && prev != '°' && c != '°';
                if (camel || acronymEnd || digitEdge) {
                    flush(word, words);
                }
            }
            word.append(c);
        }
        flush(word, words);
        return words;
    }

    private static void flush(StringBuilder word, List<String> words) {
        if (word.length() > 0) {
            words.add(word.toString().toLowerCase(Locale.ROOT));
            word.setLength(0);
        }
    }

    private static boolean anyOf(List<String> words, Set<String> vocabulary) {
        return words.stream().anyMatch(vocabulary::contains);
    }

    private static double maxValue(Series series) {
        double max = Double.NaN;
        for (double v : series.values()) {
            if (!Double.isNaN(v) && !(v <= max)) {
                max = v;
            }
        }
        return max;
    }
}
