package org.annalist.brief;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.annalist.findings.Form;
import org.annalist.findings.Measure;
import org.annalist.ingest.Aggregation;
import org.annalist.ingest.DateOrder;
import org.annalist.ingest.DecimalMark;
import org.annalist.narrative.Masthead;
import org.annalist.series.Frequency;

/**
 * The words a user writes for one of the domain's choices, shared by the command line and the spec
 * so that both accept the same words for the same thing. Each word names a value; a choice the
 * data can decide also takes {@value #AUTO}. Words match ignoring case.
 *
 * @param values by word, in the order messages list them
 * @param auto   whether {@value #AUTO} is one of the words
 * @param <T>    the domain's type for the choice
 */
public record Words<T>(Map<String, T> values, boolean auto) {

    /** The word for "decide from the data". */
    public static final String AUTO = "auto";

    /** Additive or multiplicative decomposition. */
    public static final Words<Form> FORM = withAuto(ordered(
            "additive", Form.ADDITIVE, "multiplicative", Form.MULTIPLICATIVE));

    /**
     * Flows are summed over spans; levels, rates and interval-scale quantities averaged; rates
     * change in points, interval-scale quantities in their units; ratios are never declared, only derived.
     */
    public static final Words<Measure> MEASURE = withAuto(ordered(
            "flow", Measure.FLOW, "level", Measure.LEVEL, "rate", Measure.RATE, "interval", Measure.INTERVAL));

    /** How dates such as 03/04/2024 are read; "auto" is a value here, the reader's own inference. */
    public static final Words<DateOrder> DATE_ORDER = new Words<>(ordered(
            AUTO, DateOrder.AUTO, "day-first", DateOrder.DAY_FIRST, "month-first", DateOrder.MONTH_FIRST), false);

    /** The decimal mark of the numbers; "auto" infers it from them. */
    public static final Words<DecimalMark> DECIMAL_MARK = withAuto(ordered(
            "point", DecimalMark.POINT, "comma", DecimalMark.COMMA));

    /** The calendars a series can be aggregated to. */
    public static final Words<Frequency> AGGREGATE = new Words<>(ordered("week", Frequency.WEEKLY,
            "month", Frequency.MONTHLY, "quarter", Frequency.QUARTERLY, "year", Frequency.ANNUAL), false);

    /** How aggregation combines the values of a span: summed (flows) or averaged (levels, rates). */
    public static final Words<Aggregation.Method> AGGREGATE_BY = new Words<>(ordered(
            "sum", Aggregation.Method.SUM, "mean", Aggregation.Method.MEAN), false);

    /** The brief's paper size. */
    public static final Words<Masthead.Paper> PAPER = new Words<>(ordered(
            "a4", Masthead.Paper.A4, "letter", Masthead.Paper.LETTER), false);

    public Words {
        values = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }

    private static <T> Words<T> withAuto(Map<String, T> values) {
        return new Words<>(values, true);
    }

    @SuppressWarnings("unchecked")
    private static <T> Map<String, T> ordered(Object... wordsAndValues) {
        Map<String, T> map = new LinkedHashMap<>();
        for (int i = 0; i < wordsAndValues.length; i += 2) {
            map.put((String) wordsAndValues[i], (T) wordsAndValues[i + 1]);
        }
        return map;
    }

    /** Whether {@code word} is {@value #AUTO}, for a choice that has it. */
    public boolean isAuto(String word) {
        return auto && AUTO.equalsIgnoreCase(word);
    }

    /** The value {@code word} names, ignoring case; empty for {@value #AUTO} and for a word not known. */
    public Optional<T> valueOf(String word) {
        return values.entrySet().stream().filter(e -> e.getKey().equalsIgnoreCase(word)).map(Map.Entry::getValue)
                .findFirst();
    }

    /** Whether {@code word} is one of the words, {@value #AUTO} included. */
    public boolean knows(String word) {
        return isAuto(word) || valueOf(word).isPresent();
    }

    /** Every word, {@value #AUTO} first. */
    public List<String> words() {
        List<String> all = new ArrayList<>();
        if (auto) {
            all.add(AUTO);
        }
        all.addAll(values.keySet());
        return all;
    }

    /** The words as a sentence lists them: {@code auto, additive or multiplicative}. */
    public String listed() {
        List<String> all = words();
        return all.size() == 1 ? all.get(0)
                : String.join(", ", all.subList(0, all.size() - 1)) + " or " + all.get(all.size() - 1);
    }
}
