package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.annalist.findings.Claim.Quantity;
import org.annalist.findings.Claim.SizeUnit;
import org.annalist.findings.Claim.Status;
import org.annalist.findings.Claim.Strength;
import org.annalist.series.Period;

/**
 * The statements the first page and the summary make, checked against each other, and the one
 * that leads. Built from the {@link Findings} alone, so the brief, the text notes and the findings
 * JSON carry the same claims. The consistency pass: the trend of the latest regime is preferred to
 * the whole period's when there are breaks (the whole period's is qualified when it runs across
 * breaks without a regime of its own); a trend is qualified when the year to date or the rolling
 * year, over spans it covers, moved the other way by at least {@link DecisionRules#MATERIAL_CHANGE_PCT},
 * and withheld when both did by at least {@link DecisionRules#CONTRADICTING_CHANGE_PCT}, and
 * qualified too when the latest period's change did by the first; the trend since a break dated no
 * closer than {@link DecisionRules#VAGUE_START_YEARS} is qualified by that uncertainty; a raw
 * change is qualified by its calendar-adjusted one. The headline is the first of: a recent large
 * step, the latest change when material, the page's trend when it has a direction, the latest change.
 *
 * @param statements every claim, in the order of {@link Quantity} (breaks oldest first)
 * @param headline   the claim the first sentence leads with; empty when nothing can be said
 */
@JsonPropertyOrder({"headline", "statements"})
public record Claims(List<Claim> statements, @JsonIgnore Optional<Claim> headline) {

    public Claims {
        statements = List.copyOf(statements);
    }

    /**
     * The latest period's change on a year earlier with the calendar's effect taken out.
     *
     * @param change    in the series' units
     * @param changePct in %, empty when the earlier value is zero or below
     */
    public record AdjustedChange(double change, Optional<Double> changePct) {
    }

    /** The claims of findings that carry no calendar-adjusted change. */
    public static Claims of(Findings findings) {
        return of(findings, Optional.empty());
    }

    /** @param calendarAdjusted the latest change with the calendar's effect taken out, when a significant effect moved it */
    public static Claims of(Findings findings, Optional<AdjustedChange> calendarAdjusted) {
        if (findings.recent().isEmpty()) {
            return new Claims(List.of(), Optional.empty());
        }
        Period end = findings.recent().get(findings.recent().size() - 1).period();
        Period start = end.plus(1L - findings.series().observations());
        List<Claim> claims = new ArrayList<>();
        IndicatorsFinding i = findings.indicators();
        if (i != null && i.samePeriodLastYear() != null) {
            IndicatorsFinding.Comparison c = i.samePeriodLastYear();
            Claim raw = change(Quantity.LATEST_VS_YEAR_EARLIER, c.period(), i.period(), c.change(),
                    Optional.ofNullable(c.changePct()).filter(p -> c.value() > 0), i.measure());
            if (calendarAdjusted.isPresent()) {
                AdjustedChange a = calendarAdjusted.get();
                claims.add(raw.qualified(new Claim.Qualification(Claim.QualifyReason.CALENDAR_EFFECT,
                        Quantity.LATEST_CALENDAR_ADJUSTED)));
                claims.add(change(Quantity.LATEST_CALENDAR_ADJUSTED, c.period(), i.period(), a.change(), a.changePct(),
                        i.measure()));
            } else {
                claims.add(raw);
            }
        }
        if (i != null && i.yearToDate() != null) {
            claims.add(span(Quantity.YEAR_TO_DATE, i.yearToDate(), i.measure()));
        }
        if (i != null && i.rollingYear() != null) {
            claims.add(span(Quantity.ROLLING_YEAR, i.rollingYear(), i.measure()));
        }
        TrendFinding t = findings.trend();
        Optional<Claim> whole = Optional.empty();
        if (t.assessed()) {
            boolean pct = t.changePctPerYear() != null;
            whole = Optional.of(new Claim(Quantity.TREND_WHOLE, start, end, t.direction(),
                    pct ? t.changePctPerYear() : t.slopePerYear(), pct ? SizeUnit.PERCENT_PER_YEAR : SizeUnit.UNITS_PER_YEAR,
                    Optional.ofNullable(t.changePctPerYear()), Optional.ofNullable(t.pValue()), tested(t.direction()),
                    Status.STATED, List.of(), Optional.empty()));
        }
        Optional<Claim> since = t.latestRegime().map(r -> new Claim(Quantity.TREND_SINCE_BREAK, r.since(), end,
                r.direction(), r.slopePerYear(), SizeUnit.UNITS_PER_YEAR, Optional.empty(), Optional.of(r.pValue()),
                tested(r.direction()), Status.STATED, List.of(), Optional.empty()));
        ConsistencyPass.Trends trends = ConsistencyPass.trends(whole, since, !findings.breaks().isEmpty(), claims);
        trends.whole().ifPresent(claims::add);
        trends.since().map(s -> s.said() ? withUncertainStart(s, findings.breaks()) : s).ifPresent(claims::add);
        // a step of a rate or a temperature is a difference, as every other change of theirs
        boolean relative = findings.series().measure() == null || findings.series().measure().relativeChanges();
        for (BreakFinding b : findings.breaks()) {
            if (!b.kind().step()) {
                continue;   // a bend in the line is no step in level; the trend since the break states it
            }
            boolean pct = relative && b.levelBefore() > 0;
            claims.add(new Claim(Quantity.BREAK_STEP, b.period(), b.period(), signOf(b.changePct(), Optional.of(b.changePct())),
                    pct ? b.changePct() : b.levelAfter() - b.levelBefore(), pct ? SizeUnit.PERCENT : SizeUnit.UNITS,
                    Optional.of(b.changePct()), Optional.of(b.pValue()),
                    b.pValue() < DecisionRules.ALPHA ? Strength.SIGNIFICANT : Strength.NOT_SIGNIFICANT, Status.STATED,
                    List.of(), Optional.empty()));
        }
        return new Claims(claims, headline(claims, end));
    }

    /**
     * The trend since a break, qualified when that break's date is uncertain by
     * {@link DecisionRules#VAGUE_START_YEARS} or more (its 95 % interval's ends that far apart): the
     * page then says "since about" the date, with the interval, not a month it cannot vouch for.
     */
    private static Claim withUncertainStart(Claim since, List<BreakFinding> breaks) {
        return breaks.stream().filter(b -> b.period().equals(since.from())).findFirst()
                .filter(b -> b.ci95().get(0).until(b.ci95().get(1))
                        >= DecisionRules.VAGUE_START_YEARS * since.from().frequency().periodsPerYear())
                .map(b -> since.qualified(new Claim.Qualification(Claim.QualifyReason.START_UNCERTAIN,
                        Quantity.TREND_SINCE_BREAK, b.ci95())))
                .orElse(since);
    }

    /** The first claim about a quantity (for {@link Quantity#BREAK_STEP}, the oldest break). */
    public Optional<Claim> find(Quantity quantity) {
        return statements.stream().filter(c -> c.quantity() == quantity).findFirst();
    }

    /**
     * The trend the first page states: the latest regime's when there is one, else the whole
     * period's; empty when it is withheld or was not assessed.
     */
    public Optional<Claim> pageTrend() {
        Optional<Claim> since = find(Quantity.TREND_SINCE_BREAK);
        return (since.isPresent() ? since : find(Quantity.TREND_WHOLE)).filter(Claim::said);
    }

    /** The latest change the first page quotes: calendar-adjusted when there is one, else the raw change. */
    public Optional<Claim> pageLatest() {
        Optional<Claim> adjusted = find(Quantity.LATEST_CALENDAR_ADJUSTED);
        return adjusted.isPresent() ? adjusted : find(Quantity.LATEST_VS_YEAR_EARLIER);
    }

    @JsonProperty("headline")
    Claim headlineOrNull() {
        return headline.orElse(null);
    }

    /** The news, by the order in the class comment (our rule). */
    private static Optional<Claim> headline(List<Claim> claims, Period end) {
        Claims all = new Claims(claims, Optional.empty());
        double recent = DecisionRules.RECENT_BREAK_YEARS * end.frequency().periodsPerYear();
        Optional<Claim> step = claims.stream()
                .filter(c -> c.quantity() == Quantity.BREAK_STEP && c.strength() == Strength.SIGNIFICANT)
                .filter(c -> c.from().until(end) < recent)
                .filter(c -> Math.abs(c.size()) >= DecisionRules.HEADLINE_STEP_PCT)
                .max(Comparator.comparingDouble(c -> Math.abs(c.size())));
        if (step.isPresent()) {
            return step;
        }
        Optional<Claim> latest = all.pageLatest();
        if (latest.filter(c -> c.strength() == Strength.MATERIAL).isPresent()) {
            return latest;
        }
        Optional<Claim> trend = all.pageTrend();
        if (trend.filter(Claim::directional).isPresent()) {
            return trend;
        }
        return latest.isPresent() ? latest : trend;
    }

    private static Claim span(Quantity quantity, IndicatorsFinding.Span s, Measure measure) {
        return change(quantity, s.from(), s.to(), s.change(),
                Optional.ofNullable(s.changePct()).filter(p -> s.previousTotal() > 0), measure);
    }

    /**
     * An observed change: in % for a flow, else in the series' units. A percentage of a base at or
     * below zero misleads, so {@code pct} is empty then and the change is stated in units.
     */
    private static Claim change(Quantity quantity, Period from, Period to, double change, Optional<Double> pct,
                                Measure measure) {
        boolean percent = measure.relativeChanges() && pct.isPresent();
        boolean material = pct.map(p -> Math.abs(p) >= DecisionRules.MATERIAL_CHANGE_PCT).orElse(change != 0);
        return new Claim(quantity, from, to, signOf(change, pct), percent ? pct.get() : change,
                percent ? SizeUnit.PERCENT : SizeUnit.UNITS, pct, Optional.empty(),
                material ? Strength.MATERIAL : Strength.SMALL, Status.STATED, List.of(), Optional.empty());
    }

    /** The sign of a change, "about the same" when it is below {@link DecisionRules#FLAT_CHANGE_PCT} of the base. */
    private static Direction signOf(double change, Optional<Double> pct) {
        if (change == 0 || pct.filter(p -> Math.abs(p) < DecisionRules.FLAT_CHANGE_PCT).isPresent()) {
            return Direction.NONE;
        }
        return change > 0 ? Direction.INCREASING : Direction.DECREASING;
    }

    private static Strength tested(Direction direction) {
        return direction == Direction.NONE ? Strength.NOT_SIGNIFICANT : Strength.SIGNIFICANT;
    }
}
