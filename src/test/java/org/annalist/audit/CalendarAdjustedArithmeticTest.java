package org.annalist.audit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.annalist.analysis.calendar.CalendarRegressors;
import org.annalist.analysis.calendar.PlantedEaster;
import org.annalist.findings.CalendarFinding;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The sentence that takes the calendar out of the latest change prints three figures, the change as
 * counted, the change without the calendar and what the calendar added, and a reader must be able
 * to get the third from the other two: (1 + counted) / (1 + without) − 1; an effect estimated in units
 * (an additive series) is said in units, the change as counted less the change without it, as the
 * appendix gives it per day (CalendarFiguresAgreeTest). Invented monthly series of
 * day visits (a planted Saturday-and-Sunday effect, additive and multiplicative) and of guest nights
 * (a planted Easter effect), several seeds and latest months.
 */
class CalendarAdjustedArithmeticTest {

    /** Seasonal factors, January to December (invented). */
    private static final double[] SEASON = {0.55, 0.60, 0.80, 1.00, 1.05, 1.25, 1.60, 1.55, 1.10, 1.00, 0.70, 0.80};
    /** Guest nights from 2011 with +20 % for a month holding all 8 days before Easter (invented). */
    private static final PlantedEaster NIGHTS = new PlantedEaster(20_000, SEASON, 0.01);
    private static final Pattern SENTENCE = Pattern.compile("(added about|took about) ([0-9.,]+)(\u00A0%| visitors) (?:to|off) \\w+ \\d{4}"
            + " \\([^)]*\\); allowing for it, \\w+ \\d{4} was about ([+\u2212][0-9.]+)\u00A0% on a year earlier rather than"
            + " ([+\u2212][0-9.]+)\u00A0%");

    /**
     * Day visits: a level rising 5 % a year, season, 1.5 % noise, and {@code perDay} visits for each
     * Saturday and Sunday beyond eight (added, so that the form stays additive over a short span, or
     * multiplied in as a share).
     */
    private static Series visits(Period start, Period end, long seed, double perDay, boolean multiply) {
        Random random = new Random(seed);
        int n = (int) start.until(end) + 1;
        double[] x = new double[n];
        for (int t = 0; t < n; t++) {
            Period p = start.plus(t);
            double base = 9_000 * Math.pow(1.05, t / 12.0) * SEASON[p.seasonalPosition() - 1]
                    * Math.exp(0.015 * random.nextGaussian());
            int extra = CalendarRegressors.weekendDays(p) - 8;
            x[t] = Math.round(multiply ? base * (1 + perDay * extra) : base + perDay * extra);
        }
        return Series.builder("museum_visitors", Frequency.MONTHLY).unit("visitors").append(start, x).snapshot();
    }

    private static List<Series> planted() {
        List<Series> all = new ArrayList<>();
        // latest months whose Saturdays and Sundays differ from a year earlier (counted from the calendar:
        // October 2026 9 against 8; March 2026 9 against 10; May 2025 9 against 8)
        for (Period end : List.of(Period.month(2026, 10), Period.month(2026, 3), Period.month(2025, 5))) {
            for (long seed = 1; seed <= 2; seed++) {
                all.add(visits(Period.month(2023, 1), end, seed, 450, false));
                all.add(visits(Period.month(2015, 1), end, seed, 0.04, true));
            }
        }
        // April 2025 holds the days before Easter, April 2024 none
        all.add(NIGHTS.nights(Period.month(2011, 1), Period.month(2025, 4), 1, 0.20));
        all.add(NIGHTS.nights(Period.month(2011, 1), Period.month(2025, 4), 2, 0.20));
        return all;
    }

    /** The planted series' briefs, made once for every test. */
    private static final List<AuditedBrief> BRIEFS = new ArrayList<>();

    @BeforeAll
    static void writeTheBriefs() {
        for (Series s : planted()) {
            BRIEFS.add(AuditedBrief.of(s.name() + " to " + s.end(), s));
        }
    }

    /** The latest change with the calendar taken out, or null where the brief has none. */
    private static CalendarFinding.AdjustedChange latestChange(AuditedBrief brief) {
        return brief.findings().calendar() == null ? null : brief.findings().calendar().latestChange();
    }

    @Test
    void theCalendarsEffectIsTheRatioOfTheChangeAsCountedToTheChangeWithoutIt() {
        int checked = 0;
        for (AuditedBrief brief : BRIEFS) {
            CalendarFinding.AdjustedChange c = latestChange(brief);
            if (c == null || c.changePct() == null || c.adjustedChangePct() == null) {
                continue;
            }
            checked++;
            // the findings' own figures, unrounded (derived in the test)
            assertThat(c.calendarPct()).as(brief.label()).isCloseTo(
                    100 * ((1 + c.changePct() / 100) / (1 + c.adjustedChangePct() / 100) - 1), within(1e-9));
            if (c.effects().size() == 1) {
                assertThat(c.effects().get(0).effectPct()).as(brief.label()).isCloseTo(c.calendarPct(), within(1e-9));
            }
            Matcher m = SENTENCE.matcher(brief.text());
            assertThat(m.find()).as(brief.label() + ": " + brief.text()).isTrue();
            boolean logs = brief.findings().transform() == org.annalist.findings.Transform.LOG;
            if (!logs && c.effects().size() == 1) {
                // estimated in units, the effect is said in units, as the appendix gives it per day: the
                // change as counted less the change without the calendar, to three significant digits
                assertThat(m.group(3)).as(brief.label()).isEqualTo(" visitors");
                double units = Double.parseDouble(m.group(2).replace(",", ""));
                double expected = Math.abs(c.change() - c.adjustedChange());
                assertThat(units).as(brief.label() + ": " + m.group()).isCloseTo(expected, within(0.005 * expected + 0.5));
                continue;
            }
            // the three figures as printed recompute within their rounding to 0.1 (each off by at most 0.05)
            assertThat(m.group(3)).as(brief.label()).isEqualTo("\u00A0%");
            double effect = Double.parseDouble(m.group(2)) * (m.group(1).startsWith("added") ? 1 : -1);
            double without = signed(m.group(4));
            double counted = signed(m.group(5));
            double recomputed = 100 * ((1 + counted / 100) / (1 + without / 100) - 1);
            double slack = 0.05 + 0.05 * (1 + counted / 100) / Math.pow(1 + without / 100, 2) + 0.05 / (1 + without / 100);
            assertThat(effect).as(brief.label() + ": " + m.group()).isCloseTo(recomputed, within(slack));
        }
        assertThat(checked).as("planted series whose brief takes the calendar out").isGreaterThanOrEqualTo(8);
    }

    /**
     * An effect estimated in units is printed in units ("added about 274 to October 2026"), and the
     * change without it must recompute from the figures a reader has: the latest value less those
     * units, against a year earlier as counted ((13,201 − 274) / 12,025 − 1 = +7.50 %, the demo's
     * museum; the brief once printed +7.4 %, the two values each adjusted to the average calendar).
     * The values are the planted series' own (derived in the test), printed whole in the brief's table.
     */
    @Test
    void aChangeWithoutAnEffectInUnitsRecomputesFromThePrintedValueLessThePrintedUnits() {
        int checked = 0;
        for (AuditedBrief brief : BRIEFS) {
            CalendarFinding.AdjustedChange c = latestChange(brief);
            Series s = brief.series();
            boolean logs = brief.findings().transform() == org.annalist.findings.Transform.LOG;
            if (c == null || logs || c.effects().size() != 1 || c.adjustedChangePct() == null) {
                continue;
            }
            Matcher m = SENTENCE.matcher(brief.text());
            assertThat(m.find()).as(brief.label() + ": " + brief.text()).isTrue();
            checked++;
            double units = Double.parseDouble(m.group(2).replace(",", "")) * (m.group(1).startsWith("added") ? 1 : -1);
            double now = s.value(s.size() - 1);
            double yearEarlier = s.value(s.size() - 13);
            double recomputed = 100 * ((now - units) / yearEarlier - 1);
            // the printed change is the recomputed one rounded to 0.1 (a hair of slack for binary fractions)
            assertThat(signed(m.group(4))).as(brief.label() + ": " + m.group()).isCloseTo(recomputed, within(0.05 + 1e-9));
        }
        assertThat(checked).as("planted additive series whose brief takes a weekday effect out").isGreaterThanOrEqualTo(4);
    }

    private static double signed(String printed) {
        return Double.parseDouble(printed.replace('\u2212', '-'));
    }
}
