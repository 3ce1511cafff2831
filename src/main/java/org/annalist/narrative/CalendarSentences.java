package org.annalist.narrative;

import java.time.format.DateTimeFormatter;
import java.time.format.TextStyle;
import java.util.Locale;
import org.annalist.findings.CalendarNote;
import org.annalist.series.Frequency;
import org.annalist.series.Period;

/** The sentences on the calendar of the latest period (Easter, holidays, weekend nights, leap days). */
final class CalendarSentences {

    private static final DateTimeFormatter DAY = DateTimeFormatter.ofPattern("d MMMM yyyy", Locale.ENGLISH);
    private static final String[] COUNT = {"no", "one", "two", "three", "four", "five"};

    private CalendarSentences() {
    }

    static String of(CalendarNote note) {
        if (note instanceof CalendarNote.EasterShift e) {
            return String.format(Locale.ROOT,
                    "Easter Sunday was on %s, a year earlier on %s: %s of the %d days before it fell in %s, against %s a year earlier.",
                    DAY.format(e.easterNow()), DAY.format(e.easterBefore()), days(e.daysNow(), e.window()), e.window(),
                    name(e.now()), days(e.daysBefore(), e.window()))
                    + e.explainedPct().map(x -> String.format(Locale.ROOT,
                    " By the estimated Easter effect that accounts for about %+.1f %% of the %+.1f %% change.", x,
                    e.changePct())).orElse("");
        }
        if (note instanceof CalendarNote.EasterSpanTogether t) {
            return String.format(Locale.ROOT, "%s together, which Easter's move does not affect: %+.1f %% on a year earlier.",
                    t.months() ? "March and April" : "The first two quarters", t.changePct());
        }
        if (note instanceof CalendarNote.HolidayShift h) {
            return String.format(Locale.ROOT, "%s: %.0f %% of its days fell in %s, against %.0f %% in %s.", h.holiday(),
                    100 * h.shareNow(), name(h.now()), 100 * h.shareBefore(), name(h.before()))
                    + h.explainedPct().map(x -> String.format(Locale.ROOT,
                    " By its estimated effect that accounts for about %+.1f %% of the change.", x)).orElse("");
        }
        if (note instanceof CalendarNote.WeekendNights w) {
            int d = w.nightsNow() - w.nightsBefore();
            return String.format(Locale.ROOT, "%s had %d Friday and Saturday nights, %s %s than %s.", name(w.now()),
                    w.nightsNow(), COUNT[Math.min(Math.abs(d), COUNT.length - 1)], d > 0 ? "more" : "fewer",
                    name(w.before()))
                    + w.effectPct().map(x -> String.format(Locale.ROOT,
                    " By the estimated weekend effect that is worth about %+.1f %%.", x)).orElse("");
        }
        CalendarNote.LeapFebruary f = (CalendarNote.LeapFebruary) note;
        return String.format(Locale.ROOT, "February %d had %d days, February %d had %d: about %.1f %% %s days.",
                f.now().year(), f.now().lengthInDays(), f.before().year(), f.before().lengthInDays(),
                Math.abs(f.morePct()), f.morePct() > 0 ? "more" : "fewer");
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
