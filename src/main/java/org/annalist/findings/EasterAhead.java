package org.annalist.findings;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.analysis.calendar.CalendarRegressors;
import org.annalist.analysis.calendar.Easter;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * A forecast year's Easter against the years the outlook was fitted on. The forecasting methods see
 * the values as observed, Easter's effect in them, so March and April (the first two quarters) come
 * out with the average share of the days before Easter they had in the years fitted. The Easter
 * effect is estimated on that share centred per calendar month ({@code CalendarEffects}), so a
 * forecast that carries the average share is off by the effect times the year's share less that
 * average, Δ: by exp(β·Δ) on logs, by β·Δ otherwise (the regressor of Bell &amp; Hillmer 1983, see
 * {@link CalendarRegressors}). The outlook moves its forecasts by that much, Easter's date being
 * known ahead ({@code OutlookAnalysis}).
 *
 * @param sunday       Easter Sunday of {@code year}
 * @param window       the days before Easter Sunday counted as Easter's
 * @param daysEarlier  of those days, how many fall in March (the first quarter)
 * @param averageShare the average share of them that fell in March over the years fitted
 * @param fromYear     the first year of that average …
 * @param toYear       … and the last
 * @param months       the periods are months (else quarters)
 * @param moves        how far Easter's date moves the forecast of each forecast period of March and
 *                     April from the average share's, by the estimated effect; only periods forecast
 */
public record EasterAhead(int year, LocalDate sunday, int window, long daysEarlier, double averageShare, int fromYear,
                          int toYear, boolean months, List<Move> moves) {

    /** The days before Easter Sunday counted as Easter's, as the calendar analysis counts them. */
    public static final int WINDOW = CalendarRegressors.DEFAULT_EASTER_WINDOW;

    public EasterAhead {
        moves = List.copyOf(moves);
    }

    /**
     * @param pct     the move in % of the forecast with the average share (positive: higher)
     * @param working the move on the working scale: β·Δ, a log difference on logs, else in units
     */
    public record Move(Period period, double pct, double working) {
    }

    /**
     * One entry per forecast year among {@code periods} that reaches March or April, when the
     * calendar analysis kept an Easter effect (monthly and quarterly data); empty otherwise, or when
     * no year fitted has March and April both observed.
     *
     * @param means the forecasts of {@code periods}, before any move (a move in units is taken in % of them)
     */
    static List<EasterAhead> of(Series series, CalendarFinding calendar, boolean log, Period fittedFrom,
                                List<Period> periods, double[] means) {
        if (calendar == null) {
            return List.of();
        }
        Optional<CalendarFinding.Effect> effect = calendar.keptEaster();
        if (effect.isEmpty() || !(series.frequency() == Frequency.MONTHLY || series.frequency() == Frequency.QUARTERLY)) {
            return List.of();
        }
        int window = WINDOW;
        boolean monthly = series.frequency() == Frequency.MONTHLY;
        List<Period> fitted = EasterSplits.earlierPeriods(series, fittedFrom);
        if (fitted.isEmpty()) {
            return List.of();
        }
        double sum = 0;
        for (Period p : fitted) {
            sum += CalendarRegressors.easterShare(p, window);
        }
        double average = sum / fitted.size();
        int fromYear = fitted.get(0).year();
        int toYear = fitted.get(fitted.size() - 1).year();
        List<Integer> years = periods.stream()
                .filter(p -> p.startDate().getMonthValue() <= 4 && p.endDate().getMonthValue() >= 3
                        && p.startDate().getYear() == p.endDate().getYear())
                .map(Period::year).distinct().toList();
        double beta = effect.get().coefficient();
        List<EasterAhead> ahead = new ArrayList<>();
        for (int year : years) {
            Period earlier = monthly ? Period.month(year, 3) : Period.quarter(year, 1);
            double share = CalendarRegressors.easterShare(earlier, window);
            List<Move> moves = new ArrayList<>();
            for (Period p : List.of(earlier, earlier.plus(1))) {
                // the share moves from one period to the other: what March gains, April loses
                double working = beta * (p.equals(earlier) ? share - average : average - share);
                int k = periods.indexOf(p);
                if (k < 0) {
                    continue;
                }
                double pct = CalendarAnalysis.shiftPct(working, log, means[k]);
                if (!Double.isNaN(pct)) {
                    moves.add(new Move(p, pct, working));
                }
            }
            ahead.add(new EasterAhead(year, Easter.sunday(year), window, Math.round(share * window), average, fromYear,
                    toYear, monthly, moves));
        }
        return ahead;
    }
}
