package org.annalist.findings;

import java.util.List;
import java.util.Optional;
import org.annalist.findings.Claim.Quantity;
import org.annalist.findings.Claim.QualifyReason;
import org.annalist.findings.Claim.Strength;
import org.annalist.findings.Claim.WithholdReason;

/**
 * Checks the trend claims against each other and against the recent changes, so that the first
 * page never says "rising" beside a year that fell without saying so (our rules, thresholds in
 * {@link DecisionRules}). The stronger, better-supported statement wins: the latest regime's trend
 * over the whole period's across breaks; an observed change of a whole year over a trend's
 * direction when they disagree by a large amount.
 */
final class ConsistencyPass {

    private ConsistencyPass() {
    }

    /** The two trend claims after the pass; either may be empty when it was not made. */
    record Trends(Optional<Claim> whole, Optional<Claim> since) {
    }

    /**
     * @param hasBreaks whether the series has structural breaks
     * @param changes   the observed changes already claimed (year to date and rolling year among them)
     */
    static Trends trends(Optional<Claim> whole, Optional<Claim> since, boolean hasBreaks, List<Claim> changes) {
        if (since.isPresent()) {
            Claim s = since.get();
            Direction latest = s.direction();
            if (whole.filter(w -> w.strength() == Strength.SIGNIFICANT && w.direction() != latest).isPresent()) {
                s = s.qualified(new Claim.Qualification(QualifyReason.LONGER_RUN_DIFFERS, Quantity.TREND_WHOLE));
            }
            return new Trends(whole.map(w -> w.withheld(new Claim.Withholding(WithholdReason.LATEST_REGIME_PREFERRED,
                    Quantity.TREND_SINCE_BREAK))), Optional.of(againstRecent(s, changes)));
        }
        Optional<Claim> w = whole;
        if (hasBreaks) {
            w = w.map(c -> c.directional()
                    ? c.qualified(new Claim.Qualification(QualifyReason.SPANS_BREAKS, Quantity.BREAK_STEP)) : c);
        }
        return new Trends(w.map(c -> againstRecent(c, changes)), Optional.empty());
    }

    /**
     * A trend with a direction against the year to date and the rolling year over spans it covers:
     * qualified when one went the other way by a material amount, withheld when both did by a
     * contradicting amount. The rolling year is named first: it holds a whole seasonal cycle. The
     * latest period's change on a year earlier (calendar-adjusted when the calendar moved it) going
     * the other way by a material amount qualifies it too: the page opens with that change.
     */
    static Claim againstRecent(Claim trend, List<Claim> changes) {
        if (!trend.directional()) {
            return trend;
        }
        Optional<Claim> rolling = opposing(trend, changes, Quantity.ROLLING_YEAR);
        Optional<Claim> ytd = opposing(trend, changes, Quantity.YEAR_TO_DATE);
        if (rolling.isPresent() && ytd.isPresent() && contradicts(rolling.get()) && contradicts(ytd.get())) {
            return trend.withheld(new Claim.Withholding(WithholdReason.RECENT_CHANGES_CONTRADICT, Quantity.ROLLING_YEAR));
        }
        Optional<Claim> by = rolling.isPresent() ? rolling : ytd;
        Claim checked = by.map(c -> trend.qualified(new Claim.Qualification(QualifyReason.RECENT_CHANGE_OPPOSES,
                c.quantity()))).orElse(trend);
        // the month the page opens with, quoted as counted unless the calendar moved it
        Optional<Claim> latest = opposing(trend, changes, Quantity.LATEST_CALENDAR_ADJUSTED)
                .or(() -> changes.stream().anyMatch(c -> c.quantity() == Quantity.LATEST_CALENDAR_ADJUSTED)
                        ? Optional.empty() : opposing(trend, changes, Quantity.LATEST_VS_YEAR_EARLIER));
        return latest.map(c -> checked.qualified(new Claim.Qualification(QualifyReason.LATEST_PERIOD_OPPOSES,
                c.quantity()))).orElse(checked);
    }

    /** The change of this quantity when the trend's span covers it and it went the other way materially. */
    private static Optional<Claim> opposing(Claim trend, List<Claim> changes, Quantity quantity) {
        return changes.stream().filter(c -> c.quantity() == quantity)
                .filter(c -> trend.from().compareTo(c.from()) <= 0 && c.to().compareTo(trend.to()) <= 0)
                .filter(c -> c.directional() && c.direction() != trend.direction())
                .filter(c -> c.strength() == Strength.MATERIAL)
                .findFirst();
    }

    private static boolean contradicts(Claim change) {
        return change.relativePct().filter(p -> Math.abs(p) >= DecisionRules.CONTRADICTING_CHANGE_PCT).isPresent();
    }
}
