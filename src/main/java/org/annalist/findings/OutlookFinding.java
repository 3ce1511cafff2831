package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.util.List;

/**
 * The findings JSON {@code outlook} block: forecasts with 80 and 95 % intervals from the method the
 * back-test chose.
 *
 * @param method          {@code ETS}, {@code Theta}, {@code seasonal naive} or {@code combination}
 * @param model           e.g. {@code ETS(M,A,M)}
 * @param fittedFrom      the first period the method was fitted on (the latest regime's start after a break)
 * @param nextYearTotal   the next calendar year's sum for a flow (null for a level, or when the
 *                        horizon does not reach the year's end)
 * @param nextYearAverage the next calendar year's mean for a level (null for a flow)
 * @param typicalErrorPct the median absolute percentage error of the chosen method in the back-test
 *                        (null without a back-test)
 * @param nextYear        the calendar year the totals cover
 * @param caveats         what limits the outlook, in plain words, for the brief
 */
@JsonPropertyOrder({"method", "model", "horizon", "fitted_from", "forecasts", "next_year_total", "next_year_average",
    "backtest", "chosen_because", "typical_error_pct"})
public record OutlookFinding(String method, String model, int horizon, String fittedFrom, List<Point> forecasts,
                             Span nextYearTotal, Span nextYearAverage, List<Score> backtest, String chosenBecause,
                             Double typicalErrorPct, @JsonIgnore int nextYear, @JsonIgnore int backtestPeriods,
                             @JsonIgnore List<String> caveats) {

    public OutlookFinding {
        forecasts = List.copyOf(forecasts);
        backtest = List.copyOf(backtest);
        caveats = List.copyOf(caveats);
    }

    /** @param index 0-based position after the series' last observation */
    public record Point(String period, double mean, double lo80, double hi80, double lo95, double hi95,
                        @JsonIgnore int index) {
    }

    /** A sum or mean over several periods with its 80 % interval. */
    public record Span(double mean, double lo80, double hi80) {
    }

    /** A candidate's back-test errors: MASE (below 1 beats the seasonal naive forecast) and sMAPE in %. */
    public record Score(String method, double mase, double smape) {
    }
}
