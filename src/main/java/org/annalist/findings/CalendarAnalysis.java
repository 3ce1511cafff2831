package org.annalist.findings;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.analysis.calendar.CalendarEffects;
import org.annalist.analysis.calendar.CalendarRegressors;
import org.annalist.analysis.calendar.Easter;
import org.annalist.series.Holiday;
import org.annalist.analysis.indicators.LatestIndicators;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * The calendar finding: Easter dates, the estimated calendar effects (kept when significant at
 * {@link DecisionRules#ALPHA}), and how the calendar of the latest period differs from a year
 * earlier and how much of the year-on-year change that explains.
 */
final class CalendarAnalysis {

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
        for (int year = Math.max(Easter.FIRST_YEAR, series.start().year()); year <= series.end().year(); year++) {
            easter.add(new CalendarFinding.EasterDate(year, Easter.sunday(year).toString()));
        }
        Optional<CalendarEffects.Result> fit = workingIrregular == null ? Optional.empty()
                : CalendarEffects.estimate(workingIrregular, series.start(), CalendarRegressors.DEFAULT_EASTER_WINDOW,
                holidays);
        double level = Analyst.meanOf(series.values());
        List<CalendarFinding.Effect> effects = fit.map(r -> r.effects().stream().map(e -> new CalendarFinding.Effect(
                e.name(), e.coefficient(), effectPct(e.coefficient(), 1, log, level), e.pValue(), counts(e))).toList())
                .orElse(List.of());
        List<CalendarNote> notes = indicators == null || indicators.lastYear().isEmpty() ? List.of()
                : notes(series, indicators, fit, log, holidays);
        return new CalendarFinding(easter, effects, notes);
    }

    /** An effect counts when it is significant at {@link DecisionRules#ALPHA}. */
    private static boolean counts(CalendarEffects.Effect e) {
        return e.pValue() < DecisionRules.ALPHA;
    }

    private static Optional<CalendarEffects.Effect> kept(Optional<CalendarEffects.Result> fit, String name) {
        return fit.flatMap(f -> f.effect(name)).filter(CalendarAnalysis::counts);
    }

    private static List<CalendarNote> notes(Series series, LatestIndicators.Result r,
                                            Optional<CalendarEffects.Result> fit, boolean log, List<Holiday> holidays) {
        List<CalendarNote> notes = new ArrayList<>();
        Period now = r.period();
        LatestIndicators.Comparison lastYear = r.lastYear().orElseThrow();
        Period before = lastYear.period();
        double yoy = lastYear.changePct();
        int window = CalendarRegressors.DEFAULT_EASTER_WINDOW;
        double shareNow = CalendarRegressors.easterShare(now, window);
        double shareBefore = CalendarRegressors.easterShare(before, window);
        if (Math.abs(shareNow - shareBefore) > 1e-9) {
            Optional<Double> explained = kept(fit, CalendarEffects.EASTER).filter(e -> !Double.isNaN(yoy))
                    .map(e -> effectPct(e.coefficient(), shareNow - shareBefore, log, lastYear.value()));
            notes.add(new CalendarNote.EasterShift(now, Easter.sunday(now.year()), Easter.sunday(before.year()), window,
                    Math.round(shareNow * window), Math.round(shareBefore * window), explained, yoy));
            easterSpanTogether(series, r).ifPresent(notes::add);
        }
        for (Holiday holiday : holidays) {
            double inNow = holiday.share(now);
            double inBefore = holiday.share(before);
            if (Math.abs(inNow - inBefore) > 1e-9) {
                notes.add(new CalendarNote.HolidayShift(holiday.name(), now, before, inNow, inBefore,
                        kept(fit, holiday.name()).map(e -> effectPct(e.coefficient(), inNow - inBefore, log,
                                lastYear.value()))));
            }
        }
        int nightsNow = CalendarRegressors.weekendNights(now);
        int nightsBefore = CalendarRegressors.weekendNights(before);
        if (series.frequency() == Frequency.MONTHLY && nightsNow != nightsBefore) {
            notes.add(new CalendarNote.WeekendNights(now, before, nightsNow, nightsBefore,
                    kept(fit, CalendarEffects.WEEKEND).map(e -> effectPct(e.coefficient(), nightsNow - nightsBefore, log,
                            lastYear.value()))));
        }
        if (r.longerFebruary() != 0) {
            notes.add(new CalendarNote.LeapFebruary(now, before,
                    100 * (now.lengthInDays() / (double) before.lengthInDays() - 1)));
        }
        return notes;
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
