package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import com.fasterxml.jackson.annotation.JsonValue;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.annalist.series.Period;

/**
 * One statement the brief may make, before it has words: which quantity, over which span, in which
 * direction, how large, on what evidence, and what the consistency pass ({@link Claims}) decided
 * about it. The narrative words a claim; it never decides one.
 *
 * @param quantity      what is measured
 * @param from          the first period of the span the statement covers
 * @param to            its last period
 * @param direction     {@link Direction#NONE} for "about the same" or "no clear trend"
 * @param size          the signed size in {@code unit}
 * @param unit          the kind of number {@code size} is
 * @param relativePct   the size as % of the level it is measured against, where that means something
 *                      (what materiality is judged on); empty for changes from zero or below
 * @param pValue        the test's p-value for tested statements; empty for observed changes
 * @param strength      how well the statement is supported
 * @param status        stated as it is, stated with a qualification, or withheld
 * @param qualifications the statements that qualify it, and why; empty when stated as it is or withheld
 * @param withheld       why it is withheld
 */
@JsonPropertyOrder({"quantity", "from", "to", "direction", "size", "unit", "relative_pct", "p_value", "strength",
    "status", "qualifications", "withheld"})
public record Claim(Quantity quantity, Period from, Period to, Direction direction, double size, SizeUnit unit,
                    @JsonIgnore Optional<Double> relativePct, @JsonIgnore Optional<Double> pValue, Strength strength,
                    Status status, List<Qualification> qualifications,
                    @JsonIgnore Optional<Withholding> withheld) {

    public Claim {
        qualifications = List.copyOf(qualifications);
    }

    /** What a claim is about. */
    public enum Quantity {
        /** The latest period against the same period a year earlier. */
        LATEST_VS_YEAR_EARLIER,
        /** The same, with the calendar's effect (Easter, weekend nights) taken out. */
        LATEST_CALENDAR_ADJUSTED,
        /** The year so far against the same periods a year earlier. */
        YEAR_TO_DATE,
        /** The last twelve months (four quarters, 52 weeks) against the twelve before. */
        ROLLING_YEAR,
        /** The trend over the whole series, across any breaks. */
        TREND_WHOLE,
        /** The trend since the latest structural break. */
        TREND_SINCE_BREAK,
        /** The step in level at a structural break. */
        BREAK_STEP;

        @JsonValue
        public String code() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /** The kind of number a size is. */
    public enum SizeUnit {
        /** % of the earlier value. */
        PERCENT,
        /** The series' own units (percentage points for a rate in %). */
        UNITS,
        /** % of the mean level per year. */
        PERCENT_PER_YEAR,
        /** The series' units per year. */
        UNITS_PER_YEAR;

        @JsonValue
        public String code() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /** How well a claim is supported. */
    public enum Strength {
        /** A test rejects chance at {@link DecisionRules#ALPHA}. */
        SIGNIFICANT,
        /** An observed change of at least {@link DecisionRules#MATERIAL_CHANGE_PCT}. */
        MATERIAL,
        /** An observed change below that. */
        SMALL,
        /** A test that does not reject chance. */
        NOT_SIGNIFICANT;

        @JsonValue
        public String code() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /** What the consistency pass decided. */
    public enum Status {
        STATED, QUALIFIED, WITHHELD;

        @JsonValue
        public String code() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /** Why a claim is qualified. */
    public enum QualifyReason {
        /** A recent change over an overlapping span went the other way by a material amount. */
        RECENT_CHANGE_OPPOSES,
        /** The whole period's trend differs from the latest regime's. */
        LONGER_RUN_DIFFERS,
        /** The trend runs across structural breaks and the latest regime is too short for its own. */
        SPANS_BREAKS,
        /** A calendar effect moved the raw change; the calendar-adjusted change is the one to quote. */
        CALENDAR_EFFECT,
        /** The latest period's change on a year earlier went the other way by a material amount. */
        LATEST_PERIOD_OPPOSES,
        /**
         * The break that opens the trend's span is dated no closer than
         * {@link DecisionRules#VAGUE_START_YEARS}: the span's start is said as "about", with the interval.
         */
        START_UNCERTAIN;

        @JsonValue
        public String code() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /** Why a claim is withheld from the first page and the summary. */
    public enum WithholdReason {
        /** There are breaks and the latest regime has its own trend: that one is stated instead. */
        LATEST_REGIME_PREFERRED,
        /** The year to date and the rolling year both went the other way by a large amount. */
        RECENT_CHANGES_CONTRADICT;

        @JsonValue
        public String code() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /**
     * @param by     the quantity of the claim that qualifies this one (for
     *               {@link QualifyReason#START_UNCERTAIN}, the claim itself, whose start is uncertain)
     * @param within for {@link QualifyReason#START_UNCERTAIN}: the earliest and the latest period the
     *               span may start at (the break's 95 % interval); empty for the other reasons
     */
    public record Qualification(QualifyReason reason, Quantity by,
                                @JsonInclude(JsonInclude.Include.NON_EMPTY) List<Period> within) {

        public Qualification {
            within = List.copyOf(within);
        }

        public Qualification(QualifyReason reason, Quantity by) {
            this(reason, by, List.of());
        }
    }

    /** @param by the quantity of the claim that outweighs this one */
    public record Withholding(WithholdReason reason, Quantity by) {
    }

    /** Whether the claim may be said (stated or qualified). */
    @JsonIgnore
    public boolean said() {
        return status != Status.WITHHELD;
    }

    /** Whether it says the quantity went up or down (not "about the same", not "no clear trend"). */
    @JsonIgnore
    public boolean directional() {
        return direction != Direction.NONE;
    }

    /** The qualification for this reason, if the pass gave one. */
    public Optional<Qualification> qualification(QualifyReason reason) {
        return qualifications.stream().filter(q -> q.reason() == reason).findFirst();
    }

    Claim qualified(Qualification q) {
        List<Qualification> more = new ArrayList<>(qualifications);
        more.add(q);
        return new Claim(quantity, from, to, direction, size, unit, relativePct, pValue, strength, Status.QUALIFIED,
                more, Optional.empty());
    }

    Claim withheld(Withholding w) {
        return new Claim(quantity, from, to, direction, size, unit, relativePct, pValue, strength, Status.WITHHELD,
                List.of(), Optional.of(w));
    }

    @JsonProperty("relative_pct")
    Double relativePctOrNull() {
        return relativePct.orElse(null);
    }

    @JsonProperty("p_value")
    Double pValueOrNull() {
        return pValue.orElse(null);
    }

    @JsonProperty("withheld")
    Withholding withheldOrNull() {
        return withheld.orElse(null);
    }
}
