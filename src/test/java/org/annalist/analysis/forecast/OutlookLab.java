package org.annalist.analysis.forecast;

import java.util.List;
import java.util.Optional;

/** Development variants of the outlook, for {@code M3Benchmark --variant}: not part of the tool. */
public final class OutlookLab {

    private OutlookLab() {
    }

    /** {mean, lo80, hi80, lo95, hi95} of a variant, or empty. */
    public static Optional<double[][]> forecast(String variant, double[] y, int period, int h) {
        Outlook.Bounds bounds = Outlook.Bounds.NON_NEGATIVE;
        Optional<Outlook.Forecast> f = switch (variant) {
            case "ets" -> CandidateForecasts.forecast(Outlook.Method.ETS, y, period, h, bounds, List.of());
            case "arima" -> CandidateForecasts.forecast(Outlook.Method.ARIMA, y, period, h, bounds, List.of());
            // R's default search (exact likelihood up to 150 values), and the CSS search with R's exact refit
            case "arima-exact" -> arimaAlone(y, period, h, bounds, AutoArima.fit(y, period));
            case "arima-refit" -> arimaAlone(y, period, h, bounds, AutoArima.fit(y, period, true));
            case "theta" -> CandidateForecasts.forecast(Outlook.Method.THETA, y, period, h, bounds, List.of());
            case "comb" -> CandidateForecasts.forecast(Outlook.Method.COMBINATION, y, period, h, bounds,
                    Backtest.COMBINABLE);
            case "outlook" -> Outlook.of(y, period, h, bounds).map(Outlook.Result::chosen);
            default -> {
                if (!variant.startsWith("margin")) {
                    throw new IllegalArgumentException(variant);
                }
                double margin = Double.parseDouble(variant.substring(6)) / 100;
                int cycle = Math.max(1, period);
                int origins = Backtest.origins(y.length, period);
                CandidateForecasts.Searched searched = CandidateForecasts.Searched.on(y, period);
                Optional<Backtest.Run> run = Backtest.isLongEnough(origins, period)
                        ? Backtest.run(y, searched, y.length - origins, cycle, Math.max(cycle, Math.min(h, origins)))
                        : Optional.empty();
                Outlook.Method method = Outlook.Method.COMBINATION;
                if (run.isPresent()) {
                    Outlook.Score comb = run.get().score(Outlook.Method.COMBINATION);
                    Outlook.Score best = run.get().scores().get(1);
                    if (best.mae() <= (1 - margin) * comb.mae() && best.maseEarlier() < comb.maseEarlier()
                            && best.maseLater() < comb.maseLater()) {
                        method = best.method();
                    }
                }
                yield CandidateForecasts.forecast(method, searched, h, bounds, Backtest.COMBINABLE);
            }
        };
        return f.map(x -> new double[][] {x.mean(), x.lo80(), x.hi80(), x.lo95(), x.hi95()});
    }

    private static Optional<Outlook.Forecast> arimaAlone(double[] y, int period, int h, Outlook.Bounds bounds,
                                                         Optional<Arima.Fit> fit) {
        return CandidateForecasts.forecast(Outlook.Method.ARIMA,
                new CandidateForecasts.Searched(y, period, Optional.empty(), fit, Optional.empty()), h, bounds, List.of());
    }
}
