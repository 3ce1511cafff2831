package org.annalist.analysis.forecast;

import java.util.Arrays;
import java.util.Optional;

/**
 * The outlook's single methods as its back-test runs them: each is prepared once on the values
 * before the first origin — the ETS form and the ARIMA orders that the searches on all values chose
 * ({@link CandidateForecasts.Searched}), their parameters estimated afresh on those earlier values,
 * and the Theta fit (adjusted for the season as on all values where the earlier values are too few
 * to test for one) — and then, from every later origin, forecasts with its parameters kept and its
 * states updated by the values since (updating, not re-estimating [1, §2.2]). One model search
 * serves both the forecasts and the back-test: the forms are chosen knowing the later values (the
 * parameters are not), which makes the back-test's errors a little smaller than a search at the
 * first origin would; a search there as well doubled the outlook's cost. A form that cannot be
 * fitted to the earlier values is searched for on them.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Tashman, L. J. (2000). Out-of-sample tests of forecasting accuracy: an analysis and review.
 * <i>International Journal of Forecasting</i> 16(4), 437–450. DOI 10.1016/S0169-2070(00)00065-0.</li>
 * </ol>
 */
final class Members {

    /** A method prepared on the values before the back-test, forecasting from every later origin. */
    interface Updating {
        /**
         * Forecasts from every origin o = {@code firstOrigin} … n − 1 of {@code y}, 1 … min({@code reach},
         * n − o) ahead, each from the values before o.
         *
         * @return empty when the forecasts from some origin cannot be made or are not all finite
         */
        Optional<double[][]> fromOrigins(double[] y, int firstOrigin, int reach);
    }

    /** A method's forecasts 1 … h ahead from the values {@code before} (empty when they cannot be made). */
    private interface FromOneOrigin {
        Optional<double[]> from(double[] before, int h);
    }

    /** Updating that forecasts from each origin in turn, for the methods without a one-pass form. */
    private static Updating eachOrigin(FromOneOrigin method) {
        return (y, firstOrigin, reach) -> {
            double[][] forecasts = new double[y.length - firstOrigin][];
            for (int o = firstOrigin; o < y.length; o++) {
                Optional<double[]> f = method.from(Arrays.copyOf(y, o), Math.min(reach, y.length - o));
                if (f.isEmpty()) {
                    return Optional.empty();
                }
                forecasts[o - firstOrigin] = f.get();
            }
            return Optional.of(forecasts);
        };
    }

    private Members() {
    }

    /** @return empty when the method cannot be fitted to {@code training} */
    static Optional<Updating> prepare(Outlook.Method method, double[] training, CandidateForecasts.Searched forms) {
        int period = forms.period();
        int cycle = Math.max(1, period);
        Optional<Updating> updating = switch (method) {
            case ETS -> forms.ets().flatMap(f -> f.model().fit(training))
                    .or(() -> EtsSelection.select(training, period).map(EtsSelection.Choice::best))
                    .map(best -> (y, firstOrigin, reach) -> EtsFilter.forecastsFromOrigins(best.model(), y,
                            best.parameters(), firstOrigin, reach));
            case ARIMA -> forms.arima().flatMap(f -> Arima.fit(training, f.order(), f.method()))
                    .or(() -> AutoArima.fitForOutlook(training, period))
                    .map(fit -> fit::forecastsFromOrigins);
            // two seasons are too few for Theta's own test for a season: the form chosen on all values
            case THETA -> (Theta.seasonTestable(training.length, period) ? Theta.fit(training, period)
                    : Theta.fit(training, period, forms.theta().map(Theta.Fit::deseasonalised).orElse(false)))
                    .map(theta -> eachOrigin((before, h) -> theta.updated(before).map(f -> f.forecast(h))));
            case SEASONAL_NAIVE -> training.length < cycle ? Optional.empty()
                    : Optional.of(eachOrigin((before, h) -> Optional.of(SeasonalNaive.forecast(before, cycle, h))));
            case COMBINATION, NAIVE_WITH_DRIFT -> throw new IllegalArgumentException("not a back-tested single method: " + method);
        };
        return updating.map(u -> (y, firstOrigin, reach) -> u.fromOrigins(y, firstOrigin, reach)
                .filter(rows -> Arrays.stream(rows).allMatch(Members::finite)));
    }

    /** The mean of the members' forecasts, step by step. */
    static double[] mean(double[][] members) {
        double[] mean = new double[members[0].length];
        for (double[] m : members) {
            for (int k = 0; k < mean.length; k++) {
                mean[k] += m[k] / members.length;
            }
        }
        return mean;
    }

    /** Whether every value is a finite number. */
    static boolean finite(double[] v) {
        return Arrays.stream(v).allMatch(Double::isFinite);
    }
}
