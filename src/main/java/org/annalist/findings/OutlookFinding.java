package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.util.List;
import java.util.Optional;
import org.annalist.series.Period;

/**
 * The findings JSON {@code outlook} block: forecasts with 80 and 95 % intervals from the combination
 * of methods, or from the single method the back-test showed clearly better.
 *
 * @param model           the method's model, e.g. ETS(M,A,M)
 * @param fittedFrom      the first period the method was fitted on (the latest regime's start after a break)
 * @param nextYearTotal   the next calendar year's sum for a flow (null for a level, or when the
 *                        horizon does not reach the year's end)
 * @param nextYearAverage the next calendar year's mean for a level (null for a flow)
 * @param chosenBecause   how the method was chosen
 * @param typicalErrorPct the median absolute percentage error of the chosen method in the back-test
 *                        (null without a back-test)
 * @param nextYear        the calendar year the totals cover
 * @param caveats         what limits the outlook, for the brief
 * @param currentYear     the last observed calendar year as observed plus forecast (null when its
 *                        observed part has a gap or begins before the series)
 * @param nextYearChange  the next year against {@code currentYear} (null when either is missing)
 * @param intervalsWidened whether the model's intervals were widened to the back-test's errors
 * @param intervalsNarrowed whether the model's 80 % intervals were narrowed to the back-test's errors
 *                        (only with at least a hundred of them; the 95 % intervals by the same
 *                        factor unless the largest errors asked for more)
 * @param backtestFrom    the first period the back-test forecast (null without a back-test) …
 * @param backtestTo      … and the last
 * @param typicalYearErrorPct the median absolute percentage error of the chosen method's sums of
 *                        one seasonal cycle ahead (a year's total) in the back-test (null without
 *                        enough of them, or without a season)
 * @param months          for daily data, the whole calendar months forecast, each as its total (a
 *                        flow) or mean with intervals from the paths, for the printed table (empty otherwise)
 * @param easterMoves     how Easter's date moved the forecasts of March and April, one entry per
 *                        forecast year that reaches them (empty without a kept Easter effect)
 */
@JsonPropertyOrder({"method", "model", "horizon", "fitted_from", "forecasts", "next_year_total", "next_year_average",
    "backtest", "chosen_because", "typical_error_pct", "current_year", "next_year_change", "intervals_widened",
    "intervals_narrowed", "backtest_from", "backtest_to", "typical_year_error_pct", "months"})
public record OutlookFinding(OutlookMethod method, Model model, int horizon, Period fittedFrom, List<Point> forecasts,
                             Span nextYearTotal, Span nextYearAverage, List<Score> backtest, Choice chosenBecause,
                             Double typicalErrorPct, @JsonIgnore int nextYear, @JsonIgnore int backtestPeriods,
                             @JsonIgnore List<OutlookCaveat> caveats, CurrentYear currentYear,
                             YearChange nextYearChange, boolean intervalsWidened, boolean intervalsNarrowed,
                             Period backtestFrom,
                             Period backtestTo, Double typicalYearErrorPct, List<Month> months,
                             @JsonIgnore List<EasterAhead> easterMoves) {

    public OutlookFinding {
        forecasts = List.copyOf(forecasts);
        backtest = List.copyOf(backtest);
        caveats = List.copyOf(caveats);
        months = List.copyOf(months);
        easterMoves = List.copyOf(easterMoves);
    }

    /**
     * A method's model.
     *
     * @param label              the fitted model in its usual notation, {@code ETS(M,A,M)} or
     *                           {@code ARIMA(0,1,1)(0,1,1)[12]}, for ETS and ARIMA (empty otherwise)
     * @param seasonallyAdjusted Theta worked on seasonally adjusted values
     * @param members            the combination's members (empty for a single method)
     * @param trended            the model has a term that carries growth forward (an ETS trend, an ARIMA drift
     *                           or two differences, Theta's drift; a combination's when any member's has);
     *                           without one its forecasts hold the latest level with its season
     */
    public record Model(OutlookMethod method, Optional<String> label, boolean seasonallyAdjusted, List<Model> members,
                        boolean trended) {

        public Model {
            members = List.copyOf(members);
        }
    }

    /**
     * How the method was chosen.
     *
     * @param origins         back-test origins (0 without a back-test)
     * @param combinationMase the combination's back-test MASE (NaN without a back-test)
     * @param bestSingle      the single method with the lowest back-test MASE (empty without a back-test)
     * @param bestSingleMase  its MASE (NaN without a back-test)
     */
    public record Choice(Basis basis, int origins, double combinationMase, Optional<OutlookMethod> bestSingle,
                         double bestSingleMase) {

        /** What decided. */
        public enum Basis {
            /** No single method was clearly and steadily better than the combination in the back-test. */
            COMBINATION_NOT_BEATEN,
            /** A single method was clearly and steadily better in the back-test. */
            SINGLE_CLEARLY_BETTER,
            /** The back-test made too few forecasts to prefer a single method: the combination. */
            COMBINATION_TOO_FEW_TESTED,
            /** No back-test was possible: the combination by default. */
            COMBINATION_WITHOUT_BACKTEST,
            /** Too few values for the usual methods. */
            SHORT_SERIES
        }

        /** Whether the choice rests on a back-test. */
        public boolean backtested() {
            return basis == Basis.COMBINATION_NOT_BEATEN || basis == Basis.SINGLE_CLEARLY_BETTER
                    || basis == Basis.COMBINATION_TOO_FEW_TESTED;
        }
    }

    /** @param index 0-based position after the series' last observation */
    public record Point(Period period, double mean, double lo80, double hi80, double lo95, double hi95,
                        @JsonIgnore int index) {
    }

    /** A sum or mean over several periods with its 80 % interval. */
    public record Span(double mean, double lo80, double hi80) {
    }

    /**
     * A calendar year whose first periods are observed and the rest forecast.
     *
     * @param total           summed (a flow) rather than averaged (a level or rate)
     * @param observed        the observed periods' sum (a flow) or mean (otherwise)
     * @param estimate        the year's total or mean: observed plus forecast, with an 80 % interval
     *                        from the forecast part alone (equal to the point when the year is observed in full)
     * @param forecastPeriods periods of the year still forecast (0: the year is observed in full)
     */
    public record CurrentYear(int year, boolean total, Period observedFrom, Period observedTo, int observedPeriods,
                              double observed, int forecastPeriods, Span estimate) {
    }

    /**
     * The next calendar year against the current one's estimate, with 80 % intervals from the same
     * sample paths (both years' forecast parts move together).
     *
     * @param pct          the change in % (null when the measure has no meaningful ratio or a
     *                     year is not positive)
     * @param difference   the change in the measure's unit
     * @param aboutTheSame the 80 % interval of the change contains zero and is narrow
     *                     ({@link DecisionRules#OUTLOOK_SAME_PCT})
     */
    public record YearChange(int year, int againstYear, Double pct, Double pctLo80, Double pctHi80,
                             double difference, double differenceLo80, double differenceHi80, boolean aboutTheSame) {

        /** Whether the change's 80 % interval holds no change (a change not to be called a rise or a fall). */
        public boolean holdsNoChange() {
            return pctLo80 != null && pctHi80 != null && pctLo80 <= 0 && 0 <= pctHi80;
        }
    }

    /** A whole calendar month of daily forecasts: its total (a flow) or mean, with 80 and 95 % intervals. */
    public record Month(Period month, boolean total, double mean, double lo80, double hi80, double lo95, double hi95) {
    }

    /** A candidate's back-test errors: MASE (below 1 beats the seasonal naive forecast) and sMAPE in %. */
    public record Score(OutlookMethod method, double mase, double smape) {
    }
}
