package org.annalist.findings;

import java.time.LocalDate;
import java.time.format.DateTimeFormatter;
import java.time.format.TextStyle;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.annalist.analysis.calendar.CalendarEffects;
import org.annalist.analysis.calendar.CalendarRegressors;
import org.annalist.analysis.calendar.Easter;
import org.annalist.analysis.calendar.Holiday;
import org.annalist.analysis.indicators.LatestIndicators;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * The calendar finding: Easter dates, the estimated calendar effects, and plain sentences on how
 * the calendar of the latest period differs from a year earlier and how much of the year-on-year
 * change that explains.
 */
final class CalendarAnalysis {

    private static final DateTimeFormatter DAY = DateTimeFormatter.ofPattern("d MMMM yyyy", Locale.ENGLISH);
    private static final String[] COUNT = {"no", "one", "two", "three", "four", "five"};

    private CalendarAnalysis() {
    }

    /**
     * @param workingIrregular the decomposition remainder on the working scale (null without a decomposition)
     * @param indicators       the latest period's indicators (null when it has no value)
     */
    static CalendarFinding of(Series series, double[] workingIrregular, boolean log, LatestIndicators.Result indicators,
                              List<Holiday> holidays) {
        if (!CalendarEffects.applies(series.frequency())) {
            return null;
        }
        List<CalendarFinding.EasterDate> easter = new ArrayList<>();
        for (int year = Math.max(1583, series.start().year()); year <= series.end().year(); year++) {
            easter.add(new CalendarFinding.EasterDate(year, Easter.sunday(year).toString()));
        }
        Optional<CalendarEffects.Result> fit = Optional.empty();
        if (workingIrregular != null) {
            try {
                fit = Optional.of(CalendarEffects.estimate(workingIrregular, series.start(),
                        CalendarRegressors.DEFAULT_EASTER_WINDOW, holidays));
            } catch (IllegalArgumentException tooShort) {
                fit = Optional.empty();
            }
        }
        double level = Analyst.meanOf(series.values());
        List<CalendarFinding.Effect> effects = fit.map(r -> r.effects().stream().map(e -> new CalendarFinding.Effect(
                e.name(), e.coefficient(), effectPct(e.coefficient(), 1, log, level), e.pValue(), e.kept())).toList())
                .orElse(List.of());
        List<String> notes = indicators == null || indicators.lastYear() == null ? List.of()
                : notes(series, indicators, fit, log, holidays);
        return new CalendarFinding(easter, effects, notes);
    }

    private static List<String> notes(Series series, LatestIndicators.Result r, Optional<CalendarEffects.Result> fit,
                                      boolean log, List<Holiday> holidays) {
        List<String> notes = new ArrayList<>();
        Period now = r.period();
        Period before = r.lastYear().period();
        double yoy = r.lastYear().changePct();
        int window = CalendarRegressors.DEFAULT_EASTER_WINDOW;
        double shareNow = CalendarRegressors.easterShare(now, window);
        double shareBefore = CalendarRegressors.easterShare(before, window);
        if (Math.abs(shareNow - shareBefore) > 1e-9) {
            LocalDate easterNow = Easter.sunday(now.year());
            LocalDate easterBefore = Easter.sunday(before.year());
            StringBuilder s = new StringBuilder(String.format(Locale.ROOT,
                    "Easter Sunday was on %s, a year earlier on %s: %s of the %d days before it fell in %s, against %s a year earlier.",
                    DAY.format(easterNow), DAY.format(easterBefore), days(shareNow, window), window, name(now),
                    days(shareBefore, window)));
            Optional<CalendarEffects.Effect> effect = fit.flatMap(f -> f.kept(CalendarEffects.EASTER));
            if (effect.isPresent() && !Double.isNaN(yoy)) {
                double explained = effectPct(effect.get().coefficient(), shareNow - shareBefore, log, r.lastYear().value());
                s.append(String.format(Locale.ROOT, " By the estimated Easter effect that accounts for about %+.1f %% of the %+.1f %% change.",
                        explained, yoy));
            }
            notes.add(s.toString());
            combinedSpring(series, r).ifPresent(notes::add);
        }
        for (Holiday holiday : holidays) {
            double inNow = holiday.share(now);
            double inBefore = holiday.share(before);
            if (Math.abs(inNow - inBefore) > 1e-9) {
                StringBuilder s = new StringBuilder(String.format(Locale.ROOT,
                        "%s: %.0f %% of its days fell in %s, against %.0f %% in %s.", holiday.name(), 100 * inNow, name(now),
                        100 * inBefore, name(before)));
                fit.flatMap(f -> f.kept(holiday.name())).ifPresent(e -> s.append(String.format(Locale.ROOT,
                        " By its estimated effect that accounts for about %+.1f %% of the change.",
                        effectPct(e.coefficient(), inNow - inBefore, log, r.lastYear().value()))));
                notes.add(s.toString());
            }
        }
        int nightsNow = CalendarRegressors.weekendNights(now);
        int nightsBefore = CalendarRegressors.weekendNights(before);
        if (series.frequency() == Frequency.MONTHLY && nightsNow != nightsBefore) {
            int d = nightsNow - nightsBefore;
            StringBuilder s = new StringBuilder(String.format(Locale.ROOT, "%s had %d Friday and Saturday nights, %s %s than %s.",
                    name(now), nightsNow, COUNT[Math.min(Math.abs(d), COUNT.length - 1)], d > 0 ? "more" : "fewer",
                    name(before)));
            fit.flatMap(f -> f.kept(CalendarEffects.WEEKEND)).ifPresent(e -> s.append(String.format(Locale.ROOT,
                    " By the estimated weekend effect that is worth about %+.1f %%.",
                    effectPct(e.coefficient(), d, log, r.lastYear().value()))));
            notes.add(s.toString());
        }
        if (r.longerFebruary() != 0) {
            notes.add(String.format(Locale.ROOT, "February %d had %d days, February %d had %d: about %.1f %% %s days.",
                    now.year(), now.lengthInDays(), before.year(), before.lengthInDays(),
                    100 * Math.abs(now.lengthInDays() / (double) before.lengthInDays() - 1),
                    r.longerFebruary() > 0 ? "more" : "fewer"));
        }
        return notes;
    }

    /** March and April (or the first two quarters) together, when Easter moved between them. */
    private static Optional<String> combinedSpring(Series series, LatestIndicators.Result r) {
        int i = series.indexOf(r.period());
        int lag = series.frequency().seasonalPeriod();
        int position = r.period().seasonalPosition();
        boolean april = series.frequency() == Frequency.MONTHLY && position == 4;
        boolean secondQuarter = series.frequency() == Frequency.QUARTERLY && position == 2;
        if (!(april || secondQuarter) || i < lag + 1) {
            return Optional.empty();
        }
        double now = series.value(i) + series.value(i - 1);
        double before = series.value(i - lag) + series.value(i - lag - 1);
        if (Double.isNaN(now) || Double.isNaN(before) || before == 0) {
            return Optional.empty();
        }
        return Optional.of(String.format(Locale.ROOT, "%s together, which Easter's move does not affect: %+.1f %% on a year earlier.",
                april ? "March and April" : "The first two quarters", 100 * (now / before - 1)));
    }

    /** An effect in % of the value: on logs exp(β·Δ) − 1; on the series' units β·Δ / value. */
    private static double effectPct(double coefficient, double units, boolean log, double value) {
        return log ? 100 * (Math.exp(coefficient * units) - 1) : value == 0 ? Double.NaN : 100 * coefficient * units / value;
    }

    private static String days(double share, int window) {
        long days = Math.round(share * window);
        return days == 0 ? "none" : days == window ? "all" : days < COUNT.length ? COUNT[(int) days] : String.valueOf(days);
    }

    private static String name(Period p) {
        return p.frequency() == Frequency.MONTHLY
                ? p.startDate().getMonth().getDisplayName(TextStyle.FULL, Locale.ENGLISH) + " " + p.year()
                : p.seasonLabel() + " " + p.year();
    }
}
