package org.annalist.narrative;

import java.util.Optional;
import org.annalist.findings.Claim;
import org.annalist.findings.Claim.Quantity;
import org.annalist.findings.Claim.QualifyReason;
import org.annalist.findings.Claims;
import org.annalist.findings.Direction;
import org.annalist.findings.Measure;
import org.annalist.series.Frequency;
import org.annalist.series.Period;

/**
 * The words of the first page's claims ({@link Claims}): the headline's step, the trend sentence
 * with its qualifications, the key figures' sizes. The brief, the key figures and {@code analyze}'s
 * notes all word the same claims here, so they cannot disagree. Sizes go through {@link Formats}.
 */
final class ClaimWords {

    private final Claims claims;
    private final Formats f;
    private final String unit;
    private final Measure measure;

    /**
     * @param unit    the series' unit, empty when it has none
     * @param measure how the series' values combine, which decides what a difference is counted in
     */
    ClaimWords(Claims claims, Formats f, String unit, Measure measure) {
        this.claims = claims;
        this.f = f;
        this.unit = unit == null ? "" : unit;
        this.measure = measure;
    }

    /**
     * The size of a claim without its sign: {@code 1.8 %}, {@code 0.9 percentage points},
     * {@code 2,940 nights a year in each month's total} (a monthly flow's slope, {@link MeasureWords#slopeTime}).
     */
    String size(Claim c) {
        return size(c, units());
    }

    private String size(Claim c, String units) {
        double v = Math.abs(c.size());
        return switch (c.unit()) {
            case PERCENT -> f.percent(v);
            // a straight line's slope over the average level: not a compound growth rate, so said as what it is
            case PERCENT_PER_YEAR -> f.percent(v) + " of the average level a year";
            case UNITS -> f.value(v) + units;
            case UNITS_PER_YEAR -> f.significant(v) + units + " " + MeasureWords.slopeTime(measure, c.to().frequency());
        };
    }

    /** The size of a claim with its sign: {@code +1.0 %}, {@code −2,940 nights a year in each month's total}. */
    String signedSize(Claim c) {
        return signed(c, size(c));
    }

    /**
     * As {@link #signedSize}, short for the key figures' narrow tiles: percentage points abbreviated
     * ({@code +0.9 pp a year}), a flow's slope without its unit ({@code +2,940 a year}; the tile's
     * note says {@code in each month's total}).
     */
    String signedShort(Claim c) {
        String units = units();
        if (c.unit() == Claim.SizeUnit.PERCENT_PER_YEAR) {
            return signed(c, f.percent(Math.abs(c.size())) + " a\u00A0year");   // the tile's note says "of the average level"
        }
        if (c.unit() == Claim.SizeUnit.UNITS_PER_YEAR && !MeasureWords.periodTotal(measure, c.to().frequency()).isEmpty()) {
            return signed(c, f.significant(Math.abs(c.size())) + " a\u00A0year");   // the tile's note names the total
        }
        return signed(c, size(c, units.equals("\u00A0percentage points") ? "\u00a0pp" : units));
    }

    private static String signed(Claim c, String size) {
        String sign = c.size() > 0 ? "+" : c.size() < 0 ? "\u2212" : "";
        return c.directional() ? sign + size : size;
    }

    private String units() {
        return MeasureWords.differenceUnit(measure, unit);
    }

    /** The sentence on a recent step that leads the page, or empty when the headline is not a step. */
    String stepSentence() {
        return claims.headline().filter(c -> c.quantity() == Quantity.BREAK_STEP)
                .map(c -> "From " + f.period(c.from()) + " the level stepped " + (c.direction() == Direction.INCREASING
                        ? "up" : "down") + " by " + size(c) + " (a structural break, "
                        + c.pValue().map(p -> f.pValue(p, SectionViews.BREAK_P_FLOOR)).orElse("") + ").")
                .orElse("");
    }

    /** Whether the trend sentence leads the page (the headline is the trend). */
    boolean trendFirst() {
        return claims.headline().filter(c -> c.quantity() == Quantity.TREND_SINCE_BREAK
                || c.quantity() == Quantity.TREND_WHOLE).isPresent();
    }

    /** The trend sentence of the first page: the latest regime's trend, else the whole period's, with its qualifications. */
    String trendSentence() {
        Optional<Claim> since = claims.find(Quantity.TREND_SINCE_BREAK);
        Optional<Claim> whole = claims.find(Quantity.TREND_WHOLE);
        Claim trend = since.orElse(whole.orElse(null));
        if (trend == null) {
            return "No statement on the trend: " + Terms.trendNotAssessed() + ".";
        }
        boolean latest = trend.quantity() == Quantity.TREND_SINCE_BREAK;
        String opening = latest ? "Since " + start(trend) + " the level has "
                : trend.qualification(QualifyReason.SPANS_BREAKS).isPresent()
                ? "Across the whole period, which has " + breaks() + ", the underlying trend has " : "The underlying trend has ";
        if (!trend.said()) {
            return opening + "no direction that the latest year bears out: the trend test points "
                    + (trend.direction() == Direction.INCREASING ? "up" : "down") + ", but " + recent(Quantity.YEAR_TO_DATE)
                    + " and " + recent(Quantity.ROLLING_YEAR) + ".";
        }
        StringBuilder s = new StringBuilder(opening);
        s.append(trend.direction() == Direction.INCREASING ? "been rising" : trend.direction() == Direction.DECREASING
                ? "been falling" : "shown no clear direction");
        if (trend.directional()) {
            s.append(", by about ").append(size(trend)).append(" (").append(yearTotal(trend))
                    .append(trend.pValue().map(f::pValue).orElse("")).append(')');
        }
        trend.qualification(QualifyReason.LONGER_RUN_DIFFERS).flatMap(q -> whole).ifPresent(w -> s.append(
                w.direction() == Direction.INCREASING ? ", whereas over the whole period it rose"
                        : ", whereas over the whole period it fell"));
        Optional<String> recent = trend.qualification(QualifyReason.RECENT_CHANGE_OPPOSES)
                .flatMap(q -> claims.find(q.by())).map(c -> recent(c.quantity()));
        Optional<String> latestPeriod = trend.qualification(QualifyReason.LATEST_PERIOD_OPPOSES)
                .flatMap(q -> claims.find(q.by())).map(this::latestAgainst);
        if (recent.isPresent() || latestPeriod.isPresent()) {
            s.append(", although ").append(recent.orElse(""))
                    .append(recent.isPresent() && latestPeriod.isPresent() ? " and " : "").append(latestPeriod.orElse(""));
        }
        return s.append('.').toString();
    }

    /**
     * The start of the trend's span: its month, or "about" it with the interval of the break's date
     * when that is uncertain ({@link QualifyReason#START_UNCERTAIN}).
     */
    private String start(Claim trend) {
        return trend.qualification(QualifyReason.START_UNCERTAIN).filter(q -> q.within().size() == 2)
                .map(q -> "about " + f.period(trend.from()) + " (the change may have begun between "
                        + f.period(q.within().get(0)) + " and " + f.period(q.within().get(1)) + ")")
                .orElse(f.period(trend.from()));
    }

    /** The start of the trend's span, short, for a tile or a table cell: {@code about Mar 2023}. */
    private String shortStart(Claim trend, String period) {
        return (trend.qualification(QualifyReason.START_UNCERTAIN).isPresent() ? "about " : "") + period;
    }

    /**
     * "October 2026 itself was below October 2025", from the claim of the latest period's change:
     * without its size, which the sentence on the latest period beside it gives.
     */
    private String latestAgainst(Claim c) {
        return f.period(c.to()) + " itself was" + (c.direction() == Direction.INCREASING ? " above " : " below ")
                + f.period(c.from()) + (c.quantity() == Quantity.LATEST_CALENDAR_ADJUSTED
                ? " with the calendar's effect taken out" : "");
    }

    /** A flow's slope as the year's total's change with a closing "; " ({@link MeasureWords#yearTotal}), else empty. */
    private String yearTotal(Claim c) {
        String total = c.unit() != Claim.SizeUnit.UNITS_PER_YEAR ? ""
                : MeasureWords.yearTotal(c.size(), measure, c.to().frequency(), units(), f);
        return total.isEmpty() ? "" : total + "; ";
    }

    private String breaks() {
        long n = claims.statements().stream().filter(c -> c.quantity() == Quantity.BREAK_STEP).count();
        return n == 1 ? "one structural break" : n + " structural breaks";
    }

    /** "the last twelve months were 1.8 % below the twelve before", from the claim of that quantity. */
    private String recent(Quantity quantity) {
        return claims.find(quantity).map(c -> {
            String side = c.direction() == Direction.INCREASING ? " above " : " below ";
            Frequency frequency = c.to().frequency();
            if (quantity == Quantity.ROLLING_YEAR) {
                String[] span = rollingSpan(frequency);
                return "the last " + span[0] + " were " + size(c) + side + "the " + span[1] + " before";
            }
            return "the year to date (" + f.period(c.from()) + " to " + f.period(c.to()) + ") was " + size(c) + side
                    + "the same span a year earlier";
        }).orElse("");
    }

    private static String[] rollingSpan(Frequency frequency) {
        return switch (frequency) {
            case MONTHLY -> new String[] {"twelve months", "twelve"};
            case QUARTERLY -> new String[] {"four quarters", "four"};
            case HALF_YEARLY -> new String[] {"two half-years", "two"};
            case WEEKLY -> new String[] {"52 weeks", "52"};
            default -> new String[] {"365 days", "365"};
        };
    }

    /** The trend tile: its value, and the note that names its span and evidence. */
    String[] trendTile() {
        Optional<Claim> since = claims.find(Quantity.TREND_SINCE_BREAK);
        Optional<Claim> trend = since.isPresent() ? since : claims.find(Quantity.TREND_WHOLE);
        if (trend.isEmpty()) {
            return new String[] {"no clear trend", "too few values"};
        }
        Claim t = trend.get();
        // a flow's slope: the value "+3,050 a year", the note what it is a year of, "in each month's total"
        String total = t.unit() != Claim.SizeUnit.UNITS_PER_YEAR ? "" : MeasureWords.periodTotal(measure, t.to().frequency());
        String span = t.quantity() == Quantity.TREND_SINCE_BREAK ? "since " + shortStart(t, f.period(t.from()))
                : t.qualification(QualifyReason.SPANS_BREAKS).isPresent() ? "whole period, across " + breaks()
                : "whole period";
        String evidence = (t.unit() == Claim.SizeUnit.PERCENT_PER_YEAR ? "of the average level; " : "") + "Sen slope, "
                + t.pValue().map(f::pValue).orElse("");
        if (!t.said()) {
            return new String[] {"not stated", span + "; the latest year went the other way"};
        }
        if (!t.directional()) {
            return new String[] {"no clear trend", span + "; " + t.pValue().map(f::pValue).orElse("")};
        }
        String recent = t.qualification(QualifyReason.RECENT_CHANGE_OPPOSES).flatMap(q -> claims.find(q.by()))
                .map(c -> "; " + (c.quantity() == Quantity.ROLLING_YEAR ? "last " + rollingSpan(c.to().frequency())[0]
                        : "year to date") + " " + signedShort(c)).orElse("");
        return new String[] {signedShort(t), span + "; " + (total.isEmpty() ? "" : total + "; ") + evidence + recent};
    }

    /** The trend of the first page in a table cell: {@code increasing since Aug 2022}, {@code not stated}. */
    String trendCell() {
        Optional<Claim> since = claims.find(Quantity.TREND_SINCE_BREAK);
        Optional<Claim> trend = since.isPresent() ? since : claims.find(Quantity.TREND_WHOLE);
        if (trend.isEmpty()) {
            return "not assessed";
        }
        Claim t = trend.get();
        return (t.said() ? Terms.direction(t.direction()) : "not stated")
                + (since.isPresent() ? " since " + shortStart(t, f.shortPeriod(t.from())) : "");
    }

    /** The latest change as the first tile's note: {@code +1.0 % on a year earlier}, calendar-adjusted first when there is one. */
    String latestNote() {
        Optional<Claim> latest = claims.pageLatest();
        if (latest.isEmpty()) {
            return "no comparison with a year earlier";
        }
        Claim c = latest.get();
        String note = (c.directional() ? signedShort(c) : "about the same as") + " on a year earlier";
        if (c.quantity() == Quantity.LATEST_CALENDAR_ADJUSTED) {
            note += " with the calendar's effect taken out" + claims.find(Quantity.LATEST_VS_YEAR_EARLIER)
                    .map(raw -> " (" + signedShort(raw) + " as counted)").orElse("");
        }
        return note;
    }

    /** The headline in one plain sentence, for {@code analyze}'s notes. */
    String headline(Period latestPeriod) {
        Optional<Claim> h = claims.headline();
        if (h.isEmpty()) {
            return "nothing can be said about the latest period";
        }
        Claim c = h.get();
        return switch (c.quantity()) {
            case BREAK_STEP -> stepSentence();
            case TREND_SINCE_BREAK, TREND_WHOLE -> trendSentence();
            default -> f.period(latestPeriod) + ": " + latestNote() + ".";
        };
    }
}
