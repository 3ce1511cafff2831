package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.annalist.findings.Findings;
import org.annalist.findings.OutlookFinding;
import org.annalist.findings.OutlookMethod;
import org.annalist.findings.PartsCheck;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * A combined brief's words on its outlooks taken together (hand-made findings holding only an
 * outlook; every number invented, the expected sums and gaps worked by hand).
 */
class MultiOutlookWordsTest {

    private static final Formats F = Formats.forValues(new double[] {1000}, Locale.ENGLISH);
    private static final PartsCheck CHECK = new PartsCheck("Total", List.of("North", "South"), List.of(), 0, 12,
            List.of(), List.of());

    private static Series series(String name) {
        return Series.builder(name, Frequency.MONTHLY).append(Period.month(2026, 1), 1, 2, 3).snapshot();
    }

    private static OutlookFinding.Model single(OutlookMethod method) {
        return new OutlookFinding.Model(method, Optional.empty(), false, List.of(), method == OutlookMethod.THETA);
    }

    private static final OutlookFinding.Model COMBINATION = new OutlookFinding.Model(OutlookMethod.COMBINATION,
            Optional.empty(), false, List.of(single(OutlookMethod.ETS), single(OutlookMethod.ARIMA),
            single(OutlookMethod.THETA)), true);

    /** Findings holding only an outlook for 2027 of {@code nextYear} in all, by {@code model}, chosen on {@code basis}. */
    private static Findings outlook(double nextYear, OutlookFinding.Model model, OutlookFinding.Choice.Basis basis) {
        OutlookFinding o = new OutlookFinding(model.method(), model, 12, Period.month(2020, 1), List.of(),
                new OutlookFinding.Span(nextYear, nextYear * 0.9, nextYear * 1.1), null, List.of(),
                new OutlookFinding.Choice(basis, 24, 0.5, Optional.empty(), 0.6), null, 2027, 24, List.of(), null,
                null, false, false, null, null, null, List.of(), List.of());
        return findings(o);
    }

    private static Findings findings(OutlookFinding o) {
        return new Findings(null, null, null, null, null, List.of(), List.of(), null, null, null, null, o, List.of(),
                List.of(), null, Optional.empty(), List.of(), null);
    }

    private static final List<Series> SERIES = List.of(series("Total"), series("North"), series("South"));

    @Test
    void partsWhoseNextYearEstimatesAddUpWithinTheToleranceAreSaidToAddUp() {
        // 600 + 402 = 1,002 against 1,000: +0.2 %, within the 0.5 % of the recorded values' check
        var basis = OutlookFinding.Choice.Basis.COMBINATION_NOT_BEATEN;
        List<Findings> findings = List.of(outlook(1000, COMBINATION, basis), outlook(600, COMBINATION, basis),
                outlook(402, COMBINATION, basis));
        assertThat(MultiOutlookWords.partsForecasts(CHECK, SERIES, findings, F))
                .isEqualTo("Their next-year estimates for 2027 add up to Total's within 0.5\u00A0%.");
    }

    @Test
    void partsWhoseNextYearEstimatesMissTheTotalsSayByHowMuchAndThatTheTotalsOwnIsTheOneToQuote() {
        // 600 + 370 = 970 against 1,000: 3.0 % below
        var basis = OutlookFinding.Choice.Basis.COMBINATION_NOT_BEATEN;
        List<Findings> findings = List.of(outlook(1000, COMBINATION, basis), outlook(600, COMBINATION, basis),
                outlook(370, COMBINATION, basis));
        assertThat(MultiOutlookWords.partsForecasts(CHECK, SERIES, findings, F)).isEqualTo("Their next-year estimates "
                + "for 2027 do not add up to Total's within 0.5\u00A0%: together about 970, which is 3.0\u00A0% below Total's 1,000."
                + " For the total, quote Total's own estimate (1,000): it is forecast from Total's own history, whereas"
                + " each part is forecast apart and their sum is no forecast of the total.");
    }

    @Test
    void aPartWithoutAnOutlookLeavesTheForecastsUnsaidAndIsNamedWithoutAMethod() {
        List<Findings> findings = List.of(outlook(1000, COMBINATION, OutlookFinding.Choice.Basis.COMBINATION_NOT_BEATEN),
                outlook(600, single(OutlookMethod.ETS), OutlookFinding.Choice.Basis.SINGLE_CLEARLY_BETTER),
                findings(null));
        assertThat(MultiOutlookWords.partsForecasts(CHECK, SERIES, findings, F)).isEmpty();
        assertThat(MultiOutlookWords.methods(SERIES, findings)).isEqualTo("for Total the average of three methods: "
                + "exponential smoothing, an ARIMA model and the Theta method, as no single method did clearly better than "
                + "the average in the back-test; for North exponential smoothing, as it did clearly better than the average"
                + " in the back-test; none for South (clearly: its errors over the whole test 50\u00A0% or more below the"
                + " average's, and below them in both the earlier and the later half of the test)");
    }

    /**
     * The board brief names each outlook's method and reason in the words of the single brief's
     * outlook page and appendix (OutlookMethodWords): the same reason clause in all three places.
     */
    @Test
    void theBoardBriefAndTheSingleBriefsWordTheMethodAndItsReasonAlike() {
        var basis = OutlookFinding.Choice.Basis.COMBINATION_NOT_BEATEN;
        Findings total = outlook(1000, COMBINATION, basis);
        String reason = OutlookMethodWords.reason(basis);
        String board = MultiOutlookWords.methods(List.of(SERIES.get(0)), List.of(total));
        assertThat(board).contains(OutlookMethodWords.method(total.outlook().model(), false), ", as " + reason);
        assertThat(OutlookViews.why(total.outlook(), F, "November 2024 to October 2026")).contains("; " + reason + " (");
        assertThat(Terms.choice(total.outlook().chosenBecause())).startsWith(reason);
    }
}
