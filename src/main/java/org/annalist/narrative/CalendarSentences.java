package org.annalist.narrative;

import java.time.LocalDate;
import java.time.YearMonth;
import java.time.format.DateTimeFormatter;
import java.time.format.TextStyle;
import java.util.List;
import java.util.Locale;
import org.annalist.findings.CalendarFinding;
import org.annalist.findings.CalendarNote;
import org.annalist.findings.OutlierFinding;
import org.annalist.series.Frequency;
import org.annalist.series.Period;

/**
 * The sentences on the calendar: of the latest period (Easter, holidays, weekend nights or days,
 * leap days, the change with the calendar allowed for) and of a one-off whose expected value allows
 * for a calendar effect.
 */
final class CalendarSentences {

    static final DateTimeFormatter DAY = DateTimeFormatter.ofPattern("d MMMM yyyy", Locale.ENGLISH);
    /** A day of a year named beside it: {@code 28 March}. */
    static final DateTimeFormatter DAY_AND_MONTH = DateTimeFormatter.ofPattern("d MMMM", Locale.ENGLISH);
    private static final String[] COUNT = {"no", "one", "two", "three", "four", "five"};
    /** Percentages and p-values only: their format does not depend on the series' values. */
    static final Formats PCT = Formats.forValues(new double[0], Locale.ENGLISH);

    private CalendarSentences() {
    }

    static String of(CalendarNote note) {
        if (note instanceof CalendarNote.EasterShift e) {
            // the estimated effect and what it leaves of the change are said once, by CalendarAdjusted
            return String.format(Locale.ROOT,
                    "Easter Sunday was on %s, a year earlier on %s: %s of the %d days before it fell in %s, against %s a year earlier.",
                    DAY.format(e.easterNow()), DAY.format(e.easterBefore()), days(e.daysNow(), e.window()), e.window(),
                    name(e.now()), days(e.daysBefore(), e.window()));
        }
        if (note instanceof CalendarNote.EasterUntold u) {
            return "The data cannot yet tell whether Easter's date moves this series: " + easterYears(u.evidence())
                    + "; at least " + count(u.evidence().needed()) + " of each are needed.";
        }
        if (note instanceof CalendarNote.EasterSpanTogether t) {
            return String.format(Locale.ROOT, "%s together, which Easter's move does not affect: %s on a year earlier.",
                    t.months() ? "March and April" : "The first two quarters", PCT.signedPercent(t.changePct()));
        }
        if (note instanceof CalendarNote.HolidayShift h) {
            return String.format(Locale.ROOT, "%s: %.0f %% of its days fell in %s, against %.0f %% in %s.", h.holiday(),
                    100 * h.shareNow(), name(h.now()), 100 * h.shareBefore(), name(h.before()));
        }
        if (note instanceof CalendarNote.WeekendNights w) {
            int d = w.nightsNow() - w.nightsBefore();
            return String.format(Locale.ROOT, "%s had %d Friday and Saturday nights, %s %s than %s%s", name(w.now()),
                    w.nightsNow(), COUNT[Math.min(Math.abs(d), COUNT.length - 1)], d > 0 ? "more" : "fewer",
                    name(w.before()), weekdayFinding("Friday and Saturday nights", w.effectPct(), w.pValue()));
        }
        if (note instanceof CalendarNote.WeekendDays w) {
            int d = w.daysNow() - w.daysBefore();
            return String.format(Locale.ROOT, "%s had %d Saturdays and Sundays, %s %s than %s%s", name(w.now()),
                    w.daysNow(), COUNT[Math.min(Math.abs(d), COUNT.length - 1)], d > 0 ? "more" : "fewer",
                    name(w.before()), weekdayFinding("Saturdays and Sundays", w.effectPct(), w.pValue()));
        }
        if (note instanceof CalendarNote.CalendarAdjusted a) {
            return adjusted(a);
        }
        CalendarNote.LeapFebruary f = (CalendarNote.LeapFebruary) note;
        return String.format(Locale.ROOT, "February %d had %d days, February %d had %d: about %.1f %% %s days.",
                f.now().year(), f.now().lengthInDays(), f.before().year(), f.before().lengthInDays(),
                Math.abs(f.morePct()), f.morePct() > 0 ? "more" : "fewer");
    }

    /**
     * What the calendar analysis found of a weekday count that differed, ending the sentence: nothing
     * more where the effect counts (the change with the calendar allowed for follows, with its size);
     * {@code ; the calendar analysis found no significant effect of Friday and Saturday nights on this
     * series (p = 0.960), so the difference is not allowed for.} where it was estimated and does not
     * count; that it was not estimated otherwise.
     */
    private static String weekdayFinding(String days, java.util.Optional<Double> effectPct, java.util.Optional<Double> p) {
        if (effectPct.isPresent()) {
            return ".";
        }
        return p.map(value -> "; the calendar analysis found no significant effect of " + days + " on this series ("
                + PCT.pValue(value) + "), so the difference is not allowed for.")
                .orElse("; the calendar analysis did not estimate their effect on this series.");
    }

    /**
     * "By the estimated Easter effect, the later Easter added about 8.6 % to April 2025 (p = 0.008);
     * allowing for it, April 2025 was about −0.9 % on a year earlier rather than +7.6 %."
     */
    private static String adjusted(CalendarNote.CalendarAdjusted a) {
        CalendarFinding.AdjustedChange c = a.change();
        List<CalendarFinding.Part> parts = c.effects();
        String by;
        String cause;
        String evidence;
        if (parts.size() == 1) {
            CalendarFinding.Part p = parts.get(0);
            by = p.name().equals(CalendarFinding.EASTER) ? "By the estimated Easter effect"
                    : p.name().equals(CalendarFinding.WEEKEND_NIGHTS) ? "By the estimated weekend-night effect"
                    : p.name().equals(CalendarFinding.WEEKEND_DAYS) ? "By the estimated weekday effect" : "By its estimated effect";
            cause = cause(p.name(), a);
            evidence = " (" + PCT.pValue(p.pValue()) + ")";
        } else {
            by = "By the estimated calendar effects (" + String.join("; ", parts.stream().map(p -> effectName(p.name())
                    + " " + PCT.signedPercent(p.effectPct()) + ", " + PCT.pValue(p.pValue())).toList()) + ")";
            cause = "the calendar";
            evidence = "";
        }
        boolean percent = c.changePct() != null && c.adjustedChangePct() != null;
        Formats units = Formats.forValues(new double[] {c.change(), c.adjustedChange()}, Locale.ENGLISH);
        String unit = a.unit() == null || a.unit().isEmpty() ? "" : a.unit().equals("%") ? " percentage points" : " " + a.unit();
        String adjustedChange = percent ? PCT.signedPercent(c.adjustedChangePct()) : units.signedValue(c.adjustedChange()) + unit;
        String change = percent ? PCT.signedPercent(c.changePct()) : units.signedValue(c.change()) + unit;
        // an effect in units (not worked in logs) is the same number of units in every year: said in
        // units, as the appendix gives it, not as a % on a base of its own
        boolean inUnits = !percent || !a.inLogs() && parts.size() == 1;
        double calendarUnits = Math.abs(c.change() - c.adjustedChange());
        // three significant digits, as the appendix gives the effect per day ("+274 per extra …")
        String size = !percent ? units.value(calendarUnits) + unit : inUnits ? PCT.significant(calendarUnits) + unit
                : PCT.percent(Math.abs(c.calendarPct()));
        String moved = c.calendarPct() >= 0 ? "added about " + size + " to" : "took about " + size + " off";
        // a change that rounds to zero is said in words, never as "−0.0 %"
        boolean level = percent ? Math.abs(c.adjustedChangePct()) < 0.05
                : units.signedValue(c.adjustedChange()).equals(units.signedValue(0.0));
        return String.format(Locale.ROOT, "%s, %s %s %s%s; allowing for it, %s was about %s rather than %s.",
                by, cause, moved, name(c.period()), evidence, name(c.period()),
                level ? "level with a year earlier" : adjustedChange + " on a year earlier", change);
    }

    /** The subject of the sentence for one effect that moved the latest period. */
    private static String cause(String effect, CalendarNote.CalendarAdjusted a) {
        if (effect.equals(CalendarFinding.EASTER)) {
            return a.easterLater().orElse(false) ? "the later Easter" : "the earlier Easter";
        }
        if (effect.equals(CalendarFinding.WEEKEND_NIGHTS)) {
            return "the difference in Friday and Saturday nights";
        }
        if (effect.equals(CalendarFinding.WEEKEND_DAYS)) {
            return "the difference in Saturdays and Sundays";
        }
        return "the timing of " + effect;
    }

    static String effectName(String effect) {
        return effect.equals(CalendarFinding.EASTER) ? "Easter"
                : effect.equals(CalendarFinding.WEEKEND_NIGHTS) ? "Friday and Saturday nights"
                : effect.equals(CalendarFinding.WEEKEND_DAYS) ? "Saturdays and Sundays" : effect;
    }

    /**
     * What an outlier's expected value allows for: "Easter fell in March that year (Easter Sunday
     * 1 April 2018); the expected value allows for the estimated Easter effect (−11.2 %)".
     */
    static String outlier(Period period, OutlierFinding.CalendarAllowance c) {
        String allowed = "; the expected value allows for the estimated effect (" + PCT.signedPercent(c.effectPct()) + ")";
        if (c.effect().equals(CalendarFinding.EASTER) && c.easterSunday() != null && c.easterWindow() != null) {
            LocalDate sunday = LocalDate.parse(c.easterSunday());
            YearMonth first = YearMonth.from(sunday.minusDays(c.easterWindow()));
            YearMonth last = YearMonth.from(sunday.minusDays(1));
            String fell = first.equals(last) ? "the days before Easter fell in " + month(last) + " that year"
                    : "the days before Easter were split between " + month(first) + " and " + month(last) + " that year";
            return fell + " (Easter Sunday " + DAY.format(sunday) + ")" + allowed + ".";
        }
        if (c.effect().equals(CalendarFinding.WEEKEND_NIGHTS) || c.effect().equals(CalendarFinding.WEEKEND_DAYS)) {
            String what = c.effect().equals(CalendarFinding.WEEKEND_NIGHTS) ? "Friday and Saturday nights" : "Saturdays and Sundays";
            return String.format(Locale.ROOT, "%s had %d %s, against %.1f in an average %s", name(period),
                    Math.round(c.regressor()), what, c.typical(), season(period)) + allowed + ".";
        }
        return String.format(Locale.ROOT, "%.0f %% of %s's days fell in %s, against %.0f %% on average", 100 * c.regressor(),
                c.effect(), name(period), 100 * c.typical()) + allowed + ".";
    }

    /**
     * "the days before Easter fell mostly in March in one of its years (2024) and mostly in April in
     * two (2023 and 2025)".
     */
    static String easterYears(CalendarFinding.EasterEvidence e) {
        boolean months = e.months();
        return "the days before Easter fell mostly in " + (months ? "March" : "the first quarter") + " in "
                + years(e.mostlyEarlier()) + " and mostly in " + (months ? "April" : "the second") + " in "
                + years(e.mostlyLater());
    }

    /** "none of its years", "one of its years (2024)", "two (2023 and 2025)". */
    private static String years(List<Integer> years) {
        if (years.isEmpty()) {
            return "none of its years";
        }
        return count(years.size()) + (years.size() == 1 ? " of its years" : "") + " ("
                + Terms.listed(years.stream().map(String::valueOf).toList()) + ")";
    }

    /** A small count in words ("two"), a larger one in figures. */
    static String count(int n) {
        return n >= 0 && n < COUNT.length ? COUNT[n] : String.valueOf(n);
    }

    private static String month(YearMonth m) {
        return m.getMonth().getDisplayName(TextStyle.FULL, Locale.ENGLISH);
    }

    private static String season(Period p) {
        return p.frequency() == Frequency.MONTHLY ? p.startDate().getMonth().getDisplayName(TextStyle.FULL, Locale.ENGLISH)
                : p.seasonLabel();
    }

    private static String days(long days, int window) {
        return days == 0 ? "none" : days == window ? "all" : days < COUNT.length ? COUNT[(int) days] : String.valueOf(days);
    }

    private static String name(Period p) {
        return p.frequency() == Frequency.MONTHLY
                ? p.startDate().getMonth().getDisplayName(TextStyle.FULL, Locale.ENGLISH) + " " + p.year()
                : p.seasonLabel() + " " + p.year();
    }
}
