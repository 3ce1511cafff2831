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
 * A forecast year's Easter against the years the outlook was fitted on. The forecasts are made on
 * the values as observed, Easter's effect in them, and no calendar effect is put back afterwards:
 * March and April (the first two quarters) keep the average share of the days before Easter they
 * had in the years fitted. The Easter effect is estimated on that share centred per calendar month
 * ({@code CalendarEffects}), so a forecast that carries the average share is off by the effect times
 * the year's share less that average, Δ: exp(β·Δ) − 1 on logs, β·Δ over the period's forecast
 * otherwise (the regressor of Bell &amp; Hillmer 1983, see {@link CalendarRegressors}).
 *
 * @param sunday       Easter Sunday of {@code year}
 * @param window       the days before Easter Sunday counted as Easter's
 * @param daysEarlier  of those days, how many fall in March (the first quarter)
 * @param averageShare the average share of them that fell in March over the years fitted
 * @param fromYear     the first year of that average …
 * @param toYear       … and the last
 * @param months       the periods are months (else quarters)
 * @param moves        how far the outcome of each forecast period of March and April may lie from its
 *                     forecast by the estimated effect, in % (positive: above); only periods forecast
 */
public record EasterAhead(int year, LocalDate sunday, int window, long daysEarlier, double averageShare, int fromYear,
                          int toYear, boolean months, List<Move> moves) {

    /** The days before Easter Sunday counted as Easter's, as the calendar analysis counts them. */
    public static final int WINDOW = CalendarRegressors.DEFAULT_EASTER_WINDOW;

    public EasterAhead {
        moves = List.copyOf(moves);
    }

    /** @param pct the outcome against the forecast by the estimated effect, in % */
    public record Move(Period period, double pct) {
    }

    /**
     * One entry per forecast year that reaches March or April, when the calendar analysis kept an
     * Easter effect (monthly and quarterly data); empty otherwise, or when no year fitted has March
     * and April both observed.
     */
    public static List<EasterAhead> of(Series series, Findings findings) {
        CalendarFinding calendar = findings.calendar();
        OutlookFinding o = findings.outlook();
        if (calendar == null || o == null) {
            return List.of();
        }
        Optional<CalendarFinding.Effect> effect = calendar.effects().stream()
                .filter(e -> e.name().equals(CalendarFinding.EASTER) && e.kept()).findFirst();
        if (effect.isEmpty() || !(series.frequency() == Frequency.MONTHLY || series.frequency() == Frequency.QUARTERLY)) {
            return List.of();
        }
        int window = WINDOW;
        boolean monthly = series.frequency() == Frequency.MONTHLY;
        int position = monthly ? 3 : 1;
        double sum = 0;
        int count = 0;
        int fromYear = 0;
        int toYear = 0;
        for (int t = 0; t + 1 < series.size(); t++) {
            Period p = series.period(t);
            if (p.compareTo(o.fittedFrom()) >= 0 && p.seasonalPosition() == position
                    && !series.isMissing(t) && !series.isMissing(t + 1)) {
                sum += CalendarRegressors.easterShare(p, window);
                fromYear = count == 0 ? p.year() : fromYear;
                toYear = p.year();
                count++;
            }
        }
        if (count == 0) {
            return List.of();
        }
        double average = sum / count;
        boolean log = findings.transform() == Transform.LOG;
        List<Integer> years = o.forecasts().stream().map(OutlookFinding.Point::period)
                .filter(p -> p.startDate().getMonthValue() <= 4 && p.endDate().getMonthValue() >= 3
                        && p.startDate().getYear() == p.endDate().getYear())
                .map(Period::year).distinct().toList();
        List<EasterAhead> ahead = new ArrayList<>();
        for (int year : years) {
            Period earlier = monthly ? Period.month(year, 3) : Period.quarter(year, 1);
            double share = CalendarRegressors.easterShare(earlier, window);
            List<Move> moves = new ArrayList<>();
            for (Period p : List.of(earlier, earlier.plus(1))) {
                // the share moves from one period to the other: what March gains, April loses
                double delta = p.equals(earlier) ? share - average : average - share;
                o.forecasts().stream().filter(q -> q.period().equals(p)).findFirst().ifPresent(point -> {
                    double beta = effect.get().coefficient();
                    double pct = log ? 100 * Math.expm1(beta * delta)
                            : point.mean() == 0 ? Double.NaN : 100 * beta * delta / point.mean();
                    if (!Double.isNaN(pct)) {
                        moves.add(new Move(p, pct));
                    }
                });
            }
            ahead.add(new EasterAhead(year, Easter.sunday(year), window, Math.round(share * window), average, fromYear,
                    toYear, monthly, moves));
        }
        return ahead;
    }
}
