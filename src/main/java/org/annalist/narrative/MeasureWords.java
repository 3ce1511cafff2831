package org.annalist.narrative;

import java.util.Locale;
import org.annalist.findings.Findings;
import org.annalist.findings.Measure;
import org.annalist.series.Frequency;
import org.annalist.series.Series;

/**
 * How the brief states a change of the series, by its {@link Measure}: in % where a ratio of two
 * values means something (flows, levels and ratios above zero), in percentage points for a value in
 * % (whatever kind the user declared: "% of a %" reads as a change of the rate itself), in points
 * for a rate without a unit, and in the series' units for an interval-scale quantity such as a
 * temperature (its zero is arbitrary) and for any series that reaches zero or below (common practice
 * in official statistics, no source).
 */
final class MeasureWords {

    /** What a change is expressed in. */
    enum Scale { PERCENT, POINTS, UNITS }

    private final Measure measure;
    private final String unit;
    private final Scale scale;
    private final Formats f;

    private MeasureWords(Measure measure, String unit, Scale scale, Formats f) {
        this.measure = measure;
        this.unit = unit;
        this.scale = scale;
        this.f = f;
    }

    static MeasureWords of(Series series, Findings findings, Formats f) {
        Measure measure = measureOf(findings);
        String unit = series.unit();
        Scale scale = percentUnit(unit) || measure == Measure.RATE && unit.isEmpty() ? Scale.POINTS
                : !measure.relativeChanges() || !BriefViews.positive(series) ? Scale.UNITS : Scale.PERCENT;
        return new MeasureWords(measure, unit, scale, f);
    }

    /** The measure the analysis used; a flow when the findings do not say (they always do since measures were typed). */
    static Measure measureOf(Findings findings) {
        if (findings.series().measure() != null) {
            return findings.series().measure();
        }
        return findings.indicators() != null ? findings.indicators().measure() : Measure.FLOW;
    }

    static boolean percentUnit(String unit) {
        String u = unit.trim().toLowerCase(Locale.ROOT);
        return u.equals("%") || u.equals("percent") || u.equals("per cent") || u.equals("pct");
    }

    Measure measure() {
        return measure;
    }

    /** Whether changes are given in %. */
    boolean percent() {
        return scale == Scale.PERCENT;
    }

    /**
     * What a difference is counted in, after a no-break space: {@code  percentage points},
     * {@code  points}, {@code  °F}; the unit (or nothing) where changes are in %.
     */
    String differenceUnit() {
        return switch (scale) {
            case POINTS -> percentUnit(unit) ? "\u00A0percentage points" : "\u00A0points";
            case UNITS, PERCENT -> unit.isEmpty() ? "" : "\u00A0" + unit;
        };
    }

    /** As {@link #differenceUnit()}, for a measure and unit alone (a difference is never in %). */
    static String differenceUnit(Measure measure, String unit) {
        return percentUnit(unit) ? "\u00A0percentage points" : measure == Measure.RATE && unit.isEmpty() ? "\u00A0points"
                : unit.isEmpty() ? "" : "\u00A0" + unit;
    }

    /** As {@link #differenceUnit()}, abbreviated for the key figures: {@code  pp} for percentage points (defined in {@link #statement()}). */
    String shortUnit() {
        return scale == Scale.POINTS && percentUnit(unit) ? "\u00A0pp" : differenceUnit();
    }

    /** A signed difference for a key figure: {@code +2.30 pp}, {@code −0.88 °F}. */
    String signedShort(double change) {
        return f.signedValue(change) + shortUnit();
    }

    /** A signed change: {@code +4.2 %}, {@code +1.20 percentage points}, {@code −0.8 °F}. */
    String signedChange(double change, Double changePct) {
        return percent() ? f.signedPercent(changePct) : f.signedValue(change) + differenceUnit();
    }

    /** A change without its sign, for "… more than": {@code 4.2 %}, {@code 1.20 percentage points}. */
    String size(double change, Double changePct) {
        return percent() ? (changePct == null ? "" : f.percent(Math.abs(changePct)))
                : f.value(Math.abs(change)) + differenceUnit();
    }

    /** The span one value covers, as said after a unit: {@code a month}, {@code a quarter}, {@code a year}. */
    static String perPeriod(Frequency frequency) {
        return switch (frequency) {
            case ANNUAL -> "a year";
            case HALF_YEARLY -> "a half-year";
            case QUARTERLY -> "a quarter";
            case MONTHLY -> "a month";
            case WEEKLY -> "a week";
            case DAILY, BUSINESS_DAILY -> "a day";
        };
    }

    /**
     * What a slope in units is counted over, said after its unit: {@code a year} where one value is a
     * year's or the measure is not summed (a level's, a rate's or a temperature's change a year is
     * what it reads as), else {@code a year in each month's total}. A flow's slope is fitted to its
     * monthly (quarterly, daily...) values, so it is the change of one period's total a year: a
     * twelfth of the yearly total's change for monthly data, which "nights a year" alone would be
     * read as, "nights a month each year" was read as a monthly change, and "a year in the monthly
     * total" was still read as the yearly total's change.
     */
    static String slopeTime(Measure measure, Frequency frequency) {
        String total = periodTotal(measure, frequency);
        return total.isEmpty() ? "a year" : "a year " + total;
    }

    /**
     * Which total a flow's slope changes, said after "a year": {@code in each month's total}; empty
     * where one value is a year's or the measure is not summed ({@link #slopeTime}).
     */
    static String periodTotal(Measure measure, Frequency frequency) {
        return measure.summed() && frequency != Frequency.ANNUAL ? "in each " + periodsOwn(frequency) + " total" : "";
    }

    /** One period's name as an owner: {@code month's}, {@code quarter's}, {@code day's}. */
    static String periodsOwn(Frequency frequency) {
        return switch (frequency) {
            case ANNUAL -> "year's";
            case HALF_YEARLY -> "half-year's";
            case QUARTERLY -> "quarter's";
            case MONTHLY -> "month's";
            case WEEKLY -> "week's";
            case DAILY, BUSINESS_DAILY -> "day's";
        };
    }

    /**
     * A flow's slope as the change of the year's total it adds up to, {@code about 35,200 nights a
     * year in the year's total}, beside the slope of each month's ({@link #slopeTime}) so that
     * neither is taken for the other; empty where {@link #periodTotal} is, and for weekly and daily
     * data, whose periods do not make a whole year. The printed slope (three significant digits)
     * times the periods in a year, so that a reader's 2,930 × 12 gives it; a straight line's
     * change summed over a year's periods, the seasonal factors of a multiplicative series
     * averaging one over the year.
     *
     * @param units the slope's unit with its leading space ({@link #differenceUnit()}), or empty
     */
    static String yearTotal(double slopePerYear, Measure measure, Frequency frequency, String units, Formats f) {
        double periods = frequency.periodsPerYear();
        if (periodTotal(measure, frequency).isEmpty() || periods != Math.rint(periods) || periods > 12
                || !Double.isFinite(slopePerYear) || slopePerYear == 0) {
            return "";
        }
        double printed = Formats.significantValue(Math.abs(slopePerYear));
        return "about " + f.significant(printed * periods) + units + " a year in the year's total";
    }

    /** The sentence that says once, in a board reader's words, how the series is treated (its measure). */
    String statement() {
        String changes = switch (scale) {
            case PERCENT -> "changes are given in %";
            case POINTS -> "changes are given in" + differenceUnit() + (percentUnit(unit) ? " (pp)" : "") + ", not in %";
            case UNITS -> unit.isEmpty() ? "changes are given as differences, not in %"
                    : "changes are given in " + unit + ", not in %";
        };
        return switch (measure) {
            case FLOW -> "Each value is a count for its period, so figures for longer periods are sums; " + changes + ".";
            case LEVEL -> "Each value is a level or stock, so figures for longer periods are averages, never sums; "
                    + changes + ".";
            case RATE -> "Each value is a rate, so figures for longer periods are averages, never sums; " + changes + ".";
            case INTERVAL -> "Each value is on a scale whose zero is arbitrary, like a temperature, so figures for "
                    + "longer periods are averages, never sums; " + changes + ".";
            case RATIO -> "Each value is a ratio of two series, so figures for longer periods are the ratio of their "
                    + "sums; " + changes + ".";
        };
    }
}
