package org.annalist.findings;

import java.time.MonthDay;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.analysis.calendar.CalendarEffects;
import org.annalist.analysis.calendar.CalendarRegressors;
import org.annalist.analysis.calendar.Easter;
import org.annalist.analysis.decompose.Stl;
import org.annalist.series.Holiday;
import org.annalist.analysis.indicators.LatestIndicators;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * The calendar finding: Easter dates, the estimated calendar effects (kept when significant at
 * {@link DecisionRules#ALPHA}), and how the calendar of the latest period differs from a year
 * earlier and how much of the year-on-year change that explains. The effects are estimated first
 * ({@link #fit}), robustly, so that the outlier and break search run on the remainder with the
 * significant effects taken out.
 */
final class CalendarAnalysis {

    private CalendarAnalysis() {
    }

    /** The calendar effects estimated on the decomposition's remainder, and which of them count. */
    static final class Fit {
        private final Optional<CalendarEffects.Result> result;
        private final WeekdayKind weekdays;
        private final List<CalendarEffects.Effect> kept;
        private final List<Holiday> holidays;
        /** Whether the data could tell Easter's effect; null where no effect was estimated at all. */
        private final CalendarFinding.EasterEvidence easter;

        private Fit(Optional<CalendarEffects.Result> result, WeekdayKind weekdays, List<Holiday> holidays,
                    CalendarFinding.EasterEvidence easter) {
            this.easter = easter;
            this.result = result;
            this.weekdays = weekdays;
            this.holidays = List.copyOf(holidays);
            this.kept = result.map(r -> r.effects().stream().filter(CalendarAnalysis::counts).toList()).orElse(List.of());
        }

        /** Whether any effect counts. */
        boolean any() {
            return !kept.isEmpty();
        }

        /** What the significant effects put into position {@code t}, on the working scale (0 without any). */
        double part(int t) {
            double sum = 0;
            for (CalendarEffects.Effect e : kept) {
                sum += result.orElseThrow().part(e.name(), t);
            }
            return sum;
        }

        /** The significant effect that puts the most into position {@code t}. */
        Optional<CalendarEffects.Effect> largest(int t) {
            CalendarEffects.Effect best = null;
            for (CalendarEffects.Effect e : kept) {
                if (best == null || Math.abs(result.orElseThrow().part(e.name(), t))
                        > Math.abs(result.orElseThrow().part(best.name(), t))) {
                    best = e;
                }
            }
            return Optional.ofNullable(best);
        }
    }

    /**
     * The effects estimated robustly ({@link CalendarEffects#robust}, screen at
     * {@link DecisionRules#CALENDAR_SCREEN_SCORE}); none for data other than monthly or quarterly
     * or without a decomposition.
     *
     * @param workingRemainder the decomposition's remainder on the working scale (null without one)
     */
    /** No effects: a temperature's monthly mean counts no days, so Easter and weekdays put nothing into it. */
    static Fit none(Series series, List<Holiday> holidays) {
        return new Fit(Optional.empty(), WeekdayKind.of(series), holidays, null);
    }

    static Fit fit(Series series, double[] workingRemainder, List<Holiday> holidays) {
        WeekdayKind kind = WeekdayKind.of(series);
        if (!CalendarEffects.applies(series.frequency()) || workingRemainder == null || beforeGregorian(series)) {
            return new Fit(Optional.empty(), kind, holidays, null);
        }
        CalendarFinding.EasterEvidence easter = EasterSplits.of(series);
        return new Fit(CalendarEffects.robust(workingRemainder, series.start(), CalendarRegressors.DEFAULT_EASTER_WINDOW,
                easter.tested(), holidays, kind.weekdays(), DecisionRules.CALENDAR_SCREEN_SCORE), kind, holidays, easter);
    }

    /**
     * The effects estimated on the decomposition's remainder and, for monthly data with an effect
     * that counts, once more after one backfitting step ([Buja, Hastie &amp; Tibshirani 1989],
     * doi:10.1214/aos/1176347115): STL's seasonal soaks up part of a moving holiday, so the series is
     * decomposed again with the calendar taken out, and the effects are estimated again on what that
     * decomposition leaves. Monthly data only (our rule): on quarterly data, with four values a year,
     * the second robust fit followed injected one-offs and made more false flags
     * (OutlierInjectionTest, UKgas).
     *
     * @param y                the series on the working scale
     * @param workingRemainder y less the decomposition's trend and seasonal
     */
    static Fit fit(Series series, double[] y, Optional<Stl.Result> stl, double[] workingRemainder, List<Holiday> holidays) {
        Fit first = fit(series, stl.isPresent() ? workingRemainder : null, holidays);
        if (stl.isEmpty() || !first.any() || series.frequency() != Frequency.MONTHLY) {
            return first;
        }
        double[] withoutCalendar = new double[y.length];
        for (int t = 0; t < y.length; t++) {
            withoutCalendar[t] = y[t] - first.part(t);
        }
        Stl.Result again = Stl.withPeriod(series.frequency().seasonalPeriod()).with(Stl.Robustness.ON).fit(withoutCalendar);
        double[] trend = again.trend();
        double[] seasonal = again.seasonal();
        double[] left = new double[y.length];
        for (int t = 0; t < y.length; t++) {
            left[t] = y[t] - trend[t] - seasonal[t];
        }
        return fit(series, left, holidays);
    }

    /**
     * @param indicators the latest period's indicators (null when it has no value)
     */
    static CalendarFinding of(Series series, Fit fit, boolean log, LatestIndicators.Result indicators,
                              List<Holiday> holidays, Measure measure) {
        if (!CalendarEffects.applies(series.frequency()) || beforeGregorian(series)) {
            return null;
        }
        List<CalendarFinding.EasterDate> easter = new ArrayList<>();
        for (int year = Math.max(Easter.FIRST_YEAR, series.start().year()); year <= series.end().year(); year++) {
            easter.add(new CalendarFinding.EasterDate(year, Easter.sunday(year).toString()));
        }
        double level = Analyst.meanOf(series.values());
        List<CalendarFinding.Effect> effects = fit.result.map(r -> r.effects().stream().map(e -> new CalendarFinding.Effect(
                e.name(), e.coefficient(), effectPct(e.coefficient(), 1, log, level), e.pValue(), counts(e))).toList())
                .orElse(List.of());
        CalendarFinding.AdjustedChange latest = indicators == null || indicators.lastYear().isEmpty() ? null
                : adjusted(series, indicators, fit, log, measure.relativeChanges());
        List<CalendarNote> notes = indicators == null || indicators.lastYear().isEmpty() ? List.of()
                : notes(series, indicators, fit, log, holidays, latest);
        List<Period> screened = fit.result.map(r -> r.screened().stream().map(series::period).toList()).orElse(List.of());
        return new CalendarFinding(easter, effects, notes, fit.weekdays, screened, latest, fit.easter);
    }

    /**
     * Whether the series starts before {@link Easter#FIRST_YEAR}, the first full year of the Gregorian
     * calendar (introduced in October 1582): dates before it were kept in the Julian calendar, whose
     * Easter and weekdays differ, and nothing in a file says which calendar its dates are in, so the
     * calendar's effects are not estimated for such a series ({@link Caveat.CalendarBeforeGregorian}).
     */
    static boolean beforeGregorian(Series series) {
        return series.start().year() < Easter.FIRST_YEAR;
    }

    /** An effect counts when it is significant at {@link DecisionRules#ALPHA}. */
    private static boolean counts(CalendarEffects.Effect e) {
        return e.pValue() < DecisionRules.ALPHA;
    }

    private static Optional<CalendarEffects.Effect> kept(Fit fit, String name) {
        return fit.kept.stream().filter(e -> e.name().equals(name)).findFirst();
    }

    private static List<CalendarNote> notes(Series series, LatestIndicators.Result r, Fit fit, boolean log,
                                            List<Holiday> holidays, CalendarFinding.AdjustedChange latest) {
        List<CalendarNote> notes = new ArrayList<>();
        Period now = r.period();
        LatestIndicators.Comparison lastYear = r.lastYear().orElseThrow();
        Period before = lastYear.period();
        double yoy = lastYear.changePct();
        int window = CalendarRegressors.DEFAULT_EASTER_WINDOW;
        double shareNow = CalendarRegressors.easterShare(now, window);
        double shareBefore = CalendarRegressors.easterShare(before, window);
        if (Math.abs(shareNow - shareBefore) > 1e-9) {
            Optional<Double> explained = Double.isNaN(yoy) ? Optional.empty()
                    : differencePct(series, r, fit, CalendarEffects.EASTER, log);
            notes.add(new CalendarNote.EasterShift(now, Easter.sunday(now.year()), Easter.sunday(before.year()), window,
                    Math.round(shareNow * window), Math.round(shareBefore * window), explained, yoy));
            if (fit.easter != null && !fit.easter.tested()) {
                notes.add(new CalendarNote.EasterUntold(fit.easter));
            }
            easterSpanTogether(series, r).ifPresent(notes::add);
        }
        for (Holiday holiday : holidays) {
            double inNow = holiday.share(now);
            double inBefore = holiday.share(before);
            if (Math.abs(inNow - inBefore) > 1e-9) {
                notes.add(new CalendarNote.HolidayShift(holiday.name(), now, before, inNow, inBefore,
                        differencePct(series, r, fit, holiday.name(), log)));
            }
        }
        if (series.frequency() == Frequency.MONTHLY) {
            weekdayNote(series, r, fit, log).ifPresent(notes::add);
        }
        if (r.longerFebruary() != 0) {
            notes.add(new CalendarNote.LeapFebruary(now, before,
                    100 * (now.lengthInDays() / (double) before.lengthInDays() - 1)));
        }
        if (latest != null) {
            Optional<Boolean> later = latest.effects().stream().anyMatch(p -> p.name().equals(CalendarEffects.EASTER))
                    ? Optional.of(MonthDay.from(Easter.sunday(now.year())).isAfter(MonthDay.from(Easter.sunday(before.year()))))
                    : Optional.empty();
            notes.add(new CalendarNote.CalendarAdjusted(latest, later, fit.weekdays, series.unit(), log));
        }
        return notes;
    }

    /**
     * The weekday count of the latest month against a year earlier, fitted to the series
     * ({@link WeekdayKind}): Friday and Saturday nights for overnight stays, Saturdays and Sundays
     * for day visits, and for other series Saturdays and Sundays only when their effect counts.
     */
    private static Optional<CalendarNote> weekdayNote(Series series, LatestIndicators.Result r, Fit fit, boolean log) {
        Period now = r.period();
        Period before = r.lastYear().orElseThrow().period();
        if (fit.weekdays == WeekdayKind.NIGHTS) {
            int nightsNow = CalendarRegressors.weekendNights(now);
            int nightsBefore = CalendarRegressors.weekendNights(before);
            return nightsNow == nightsBefore ? Optional.empty()
                    : Optional.of(new CalendarNote.WeekendNights(now, before, nightsNow, nightsBefore,
                    differencePct(series, r, fit, CalendarEffects.WEEKEND, log), estimatedP(fit, CalendarEffects.WEEKEND)));
        }
        int daysNow = CalendarRegressors.weekendDays(now);
        int daysBefore = CalendarRegressors.weekendDays(before);
        Optional<Double> effect = differencePct(series, r, fit, CalendarEffects.WEEKEND_DAYS, log);
        if (daysNow == daysBefore || (fit.weekdays == WeekdayKind.OTHER && effect.isEmpty())) {
            return Optional.empty();
        }
        return Optional.of(new CalendarNote.WeekendDays(now, before, daysNow, daysBefore, fit.weekdays, effect,
                estimatedP(fit, CalendarEffects.WEEKEND_DAYS)));
    }

    /** The p-value of the named effect where it was estimated, significant or not. */
    private static Optional<Double> estimatedP(Fit fit, String name) {
        return fit.result.flatMap(r -> r.effects().stream().filter(e -> e.name().equals(name)).findFirst())
                .map(CalendarEffects.Effect::pValue);
    }

    /**
     * The latest period's change with the significant effects taken out of both values (each value
     * less what those effects put into it: divided by exp(part) on logs), when an effect that counts
     * differed between the two periods; otherwise null.
     */
    private static CalendarFinding.AdjustedChange adjusted(Series series, LatestIndicators.Result r, Fit fit, boolean log,
                                                          boolean relative) {
        LatestIndicators.Comparison lastYear = r.lastYear().orElseThrow();
        int now = series.indexOf(r.period());
        int before = series.indexOf(lastYear.period());
        if (fit.kept.isEmpty() || now < 0 || before < 0) {
            return null;
        }
        double partNow = fit.part(now);
        double partBefore = fit.part(before);
        double moved = partNow - partBefore;
        double valueNow = r.value();
        double valueBefore = lastYear.value();
        double adjustedNow = log ? valueNow * Math.exp(-partNow) : valueNow - partNow;
        double adjustedBefore = log ? valueBefore * Math.exp(-partBefore) : valueBefore - partBefore;
        // the value the latest period would have had with a year earlier's calendar
        double base = log ? valueNow * Math.exp(-moved) : valueNow - moved;
        CalendarEffects.Result result = fit.result.orElseThrow();
        List<CalendarFinding.Part> parts = new ArrayList<>();
        for (CalendarEffects.Effect e : fit.kept) {
            double d = result.part(e.name(), now) - result.part(e.name(), before);
            if (Math.abs(d) > 1e-12) {
                parts.add(new CalendarFinding.Part(e.name(), differencePct(valueNow, valueBefore,
                        result.part(e.name(), now), result.part(e.name(), before), log), e.pValue()));
            }
        }
        if (parts.isEmpty()) {
            return null;
        }
        // a rate changes in points and a temperature in degrees: their changes are differences, never %
        Double changePct = relative ? Numbers.orNull(lastYear.changePct()) : null;
        // on logs, both values adjusted and the latest put on a year earlier's calendar give the same %;
        // in units they do not, and the brief says "the difference added about 274 to October 2026;
        // allowing for it, October 2026 was about +7.5 %": the latest value less the difference's part,
        // printed to three significant digits, against a year earlier as counted, so that a reader's
        // (13,201 − 274) / 12,025 recomputes the printed change
        Double adjustedPct = changePct == null || adjustedBefore <= 0 || valueBefore <= 0 ? null : log
                ? 100 * (adjustedNow / adjustedBefore - 1)
                : 100 * ((valueNow - Numbers.threeSignificant(moved)) / valueBefore - 1);
        Double share = changePct == null || adjustedPct == null || Math.abs(changePct) < 0.05 ? null
                : (changePct - adjustedPct) / changePct;
        double calendarPct = changePct != null && adjustedPct != null
                ? 100 * ((1 + changePct / 100) / (1 + adjustedPct / 100) - 1)
                : shiftPct(moved, log, base);
        return new CalendarFinding.AdjustedChange(r.period(), lastYear.period(), lastYear.change(), changePct,
                adjustedNow - adjustedBefore, adjustedPct, calendarPct, share, parts);
    }

    /**
     * What the named effect's difference between the latest period and a year earlier did to the
     * change between them ({@link #differencePct(double, double, double, double, boolean)}), when the
     * effect counts.
     */
    private static Optional<Double> differencePct(Series series, LatestIndicators.Result r, Fit fit, String name,
                                                  boolean log) {
        LatestIndicators.Comparison lastYear = r.lastYear().orElseThrow();
        int now = series.indexOf(r.period());
        int before = series.indexOf(lastYear.period());
        if (now < 0 || before < 0) {
            return Optional.empty();
        }
        CalendarEffects.Result result = fit.result.orElse(null);
        return kept(fit, name).map(e -> differencePct(r.value(), lastYear.value(), result.part(name, now),
                result.part(name, before), log));
    }

    /**
     * What the calendar's difference between the two periods did to the change on a year earlier, in %:
     * the factor by which it multiplied the ratio of the two values, (1 + change as counted) /
     * (1 + change without it) − 1, where "without it" takes the effect's part out of each value (on
     * logs exp(partNow − partBefore) − 1, whatever the values), or, in units, takes the difference of
     * the parts, to the three significant digits the brief prints it with, out of the latest value
     * (the latest value on a year earlier's calendar, as {@code adjusted} has it). So defined, the
     * change as counted, the change without the calendar and this figure recompute from one another
     * as printed; NaN where a value without the effect is not positive.
     */
    private static double differencePct(double valueNow, double valueBefore, double partNow, double partBefore,
                                        boolean log) {
        if (log) {
            return 100 * (Math.exp(partNow - partBefore) - 1);
        }
        double withoutNow = valueNow - Numbers.threeSignificant(partNow - partBefore);
        return withoutNow <= 0 || valueBefore <= 0 ? Double.NaN : 100 * (valueNow / withoutNow - 1);
    }

    /** A shift on the working scale as a % of {@code base}: exp(d) − 1 on logs, d / base otherwise. */
    static double shiftPct(double d, boolean log, double base) {
        return log ? 100 * (Math.exp(d) - 1) : base == 0 ? Double.NaN : 100 * d / base;
    }

    /**
     * The significant calendar effect an outlier's expected value allows for, when the effects that
     * count moved that value by at least {@link DecisionRules#CALENDAR_NAMED_PCT}.
     *
     * @param expectedWithout trend and season at {@code t} on the working scale, without the calendar
     */
    static Optional<OutlierFinding.CalendarAllowance> allowance(Series series, Fit fit, int t, boolean log,
                                                              double expectedWithout) {
        Optional<CalendarEffects.Effect> largest = fit.largest(t);
        if (largest.isEmpty()) {
            return Optional.empty();
        }
        double base = log ? Math.exp(expectedWithout) : expectedWithout;
        double total = shiftPct(fit.part(t), log, base);
        if (Double.isNaN(total) || Math.abs(total) < DecisionRules.CALENDAR_NAMED_PCT) {
            return Optional.empty();
        }
        CalendarEffects.Result r = fit.result.orElseThrow();
        String name = largest.get().name();
        Period p = series.period(t);
        double centred = r.regressor(name, t);
        double raw = raw(name, p, fit.holidays);
        boolean easter = name.equals(CalendarEffects.EASTER);
        int window = CalendarRegressors.DEFAULT_EASTER_WINDOW;
        return Optional.of(new OutlierFinding.CalendarAllowance(name, shiftPct(r.part(name, t), log, base), total,
                easter ? raw * window : raw, easter ? (raw - centred) * window : raw - centred,
                easter ? Easter.sunday(p.year()).toString() : null, easter ? window : null));
    }

    /** The regressor before centring: Easter's share of days, the weekday count, a holiday's share. */
    private static double raw(String name, Period p, List<Holiday> holidays) {
        if (name.equals(CalendarEffects.EASTER)) {
            return CalendarRegressors.easterShare(p, CalendarRegressors.DEFAULT_EASTER_WINDOW);
        }
        if (name.equals(CalendarEffects.WEEKEND)) {
            return CalendarRegressors.weekendNights(p);
        }
        if (name.equals(CalendarEffects.WEEKEND_DAYS)) {
            return CalendarRegressors.weekendDays(p);
        }
        return holidays.stream().filter(h -> h.name().equals(name)).findFirst().map(h -> h.share(p)).orElse(Double.NaN);
    }

    /** March and April (or the first two quarters) together, when Easter moved between them. */
    private static Optional<CalendarNote> easterSpanTogether(Series series, LatestIndicators.Result r) {
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
        return Optional.of(new CalendarNote.EasterSpanTogether(april, 100 * (now / before - 1)));
    }

    /** An effect in % of the value: on logs exp(β·Δ) − 1; on the series' units β·Δ / value. */
    private static double effectPct(double coefficient, double units, boolean log, double value) {
        return log ? 100 * (Math.exp(coefficient * units) - 1) : value == 0 ? Double.NaN : 100 * coefficient * units / value;
    }
}
