package org.annalist.narrative;

import java.util.Optional;
import org.annalist.findings.CalendarNote;
import org.annalist.findings.Claim;
import org.annalist.findings.Claim.Quantity;
import org.annalist.findings.Claims;
import org.annalist.findings.DecisionRules;
import org.annalist.findings.Findings;

/**
 * When the latest single period's change on a year earlier must not lead the page: the calendar
 * moved it so much that its sign is not supported. Two cases, for any series and any period (our rule):
 * <ul>
 *   <li>Easter moved between the periods compared, its estimated effect counts, and the span
 *   Easter's move does not affect (March and April, or the first two quarters, together) was
 *   computed: the lead gives that span's change and calls the single period distorted;</li>
 *   <li>otherwise, the change as counted and the calendar-adjusted change point in opposite
 *   directions: the lead gives both and says that the direction cannot be told.</li>
 * </ul>
 * A one-period change adjusted by a fitted calendar effect carries the effect's estimation error,
 * and the page gives it no interval; a raw change of the other sign is the figure a reader would
 * otherwise quote. Neither may stand alone as the news.
 *
 * @param easter         Easter's move between the periods compared, when its effect counts
 * @param span           the change of the span Easter's move does not affect
 * @param signsDisagree  whether the counted and the calendar-adjusted change have opposite signs
 */
record CalendarLead(Optional<CalendarNote.EasterShift> easter, Optional<CalendarNote.EasterSpanTogether> span,
                    boolean signsDisagree) {

    static CalendarLead of(Findings findings) {
        Claims claims = findings.claims();
        Optional<Claim> raw = claims.find(Quantity.LATEST_VS_YEAR_EARLIER);
        Optional<Claim> adjusted = claims.find(Quantity.LATEST_CALENDAR_ADJUSTED);
        boolean disagree = raw.isPresent() && adjusted.isPresent() && raw.get().directional()
                && adjusted.get().directional() && raw.get().direction() != adjusted.get().direction();
        if (findings.calendar() == null) {
            return new CalendarLead(Optional.empty(), Optional.empty(), disagree);
        }
        // only an Easter whose estimated effect counts is said to distort the single period
        Optional<CalendarNote.EasterShift> easter = findings.calendar().notes().stream()
                .filter(n -> n instanceof CalendarNote.EasterShift).map(n -> (CalendarNote.EasterShift) n)
                .filter(e -> e.explainedPct().isPresent()).findFirst();
        Optional<CalendarNote.EasterSpanTogether> span = findings.calendar().notes().stream()
                .filter(n -> n instanceof CalendarNote.EasterSpanTogether).map(n -> (CalendarNote.EasterSpanTogether) n)
                .filter(s -> !Double.isNaN(s.changePct())).findFirst();
        return new CalendarLead(easter, easter.isPresent() ? span : Optional.empty(), disagree);
    }

    /** Whether the single period's change must not lead alone. */
    boolean withholdsSinglePeriod() {
        return span.isPresent() || signsDisagree;
    }

    /**
     * The lead's words after "In April 2025 the series stood at 106,788 nights.": "March and April
     * 2025 together, which Easter's move does not affect, were 1.5 % higher than a year earlier; April 2025
     * alone is distorted by Easter's date (20 April 2025, a year earlier 31 March 2024): +7.6 % on
     * April 2024 as counted, −2.1 % with the estimated calendar effect taken out."
     */
    String sentence(ClaimWords words, Claims claims, String period, String yearEarlier) {
        String counted = claims.find(Quantity.LATEST_VS_YEAR_EARLIER).map(words::signedSize).orElse("");
        String adjusted = claims.find(Quantity.LATEST_CALENDAR_ADJUSTED).map(words::signedSize).orElse("");
        String both = (counted.isEmpty() ? "" : counted + " on " + yearEarlier + " as counted")
                + (adjusted.isEmpty() ? "" : (counted.isEmpty() ? "" : ", ") + adjusted
                + " with the estimated calendar effect taken out");
        if (span.isPresent()) {
            CalendarNote.EasterShift e = easter.orElseThrow();
            return spanWords() + ", which Easter's move does not affect, " + spanChange() + "; " + period
                    + " alone is distorted by Easter's date (" + CalendarSentences.DAY.format(e.easterNow())
                    + ", a year earlier " + CalendarSentences.DAY.format(e.easterBefore()) + ")"
                    + (both.isEmpty() ? "." : ": " + both + ".");
        }
        return "Against " + yearEarlier + " it was " + both
                + ": the calendar's effect is as large as the change, so its direction cannot be told.";
    }

    /** The first key figure's note: {@code +1.5 % March and April together on a year earlier (Easter moved)}. */
    String tileNote(ClaimWords words, Claims claims) {
        if (span.isPresent()) {
            double pct = span.get().changePct();
            String change = Math.abs(pct) < DecisionRules.FLAT_CHANGE_PCT
                    ? "about the same" : CalendarSentences.PCT.signedPercent(pct);
            return change + " " + (span.get().months() ? "March and April" : "first two quarters")
                    + " together on a year earlier (Easter moved)";
        }
        String counted = claims.find(Quantity.LATEST_VS_YEAR_EARLIER).map(words::signedShort).orElse("");
        String adjusted = claims.find(Quantity.LATEST_CALENDAR_ADJUSTED).map(words::signedShort).orElse("");
        return counted + " as counted, " + adjusted + " with the calendar's effect taken out: direction unclear";
    }

    private String spanWords() {
        int year = easter.orElseThrow().now().year();
        return span.orElseThrow().months() ? "March and April " + year + " together"
                : "The first two quarters of " + year + " together";
    }

    private String spanChange() {
        double pct = span.orElseThrow().changePct();
        if (Math.abs(pct) < DecisionRules.FLAT_CHANGE_PCT) {
            return "were about the same as a year earlier";
        }
        return "were " + CalendarSentences.PCT.percent(Math.abs(pct)) + (pct > 0 ? " higher" : " lower")
                + " than a year earlier";
    }
}
