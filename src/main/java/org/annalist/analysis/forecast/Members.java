package org.annalist.analysis.forecast;

import java.util.Arrays;
import java.util.Optional;

/**
 * The outlook's single methods as its back-test runs them: each is prepared once on the values
 * before the first origin — the ETS model chosen by AICc ({@link EtsSelection}), the ARIMA model by
 * the stepwise search ({@link AutoArima}), the Theta fit — and then, from every later origin,
 * forecasts with its parameters kept and its states updated by the values since (updating, not
 * re-estimating [1, §2.2]), so that one model search serves the whole back-test.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Tashman, L. J. (2000). Out-of-sample tests of forecasting accuracy: an analysis and review.
 * <i>International Journal of Forecasting</i> 16(4), 437–450. DOI 10.1016/S0169-2070(00)00065-0.</li>
 * </ol>
 */
final class Members {

    /** A method prepared on the values before the back-test, forecasting from a later origin. */
    interface Updating {
        /** @return forecasts 1 … h ahead from the values {@code before}; empty when they cannot be made */
        Optional<double[]> from(double[] before, int h);
    }

    private Members() {
    }

    /** @return empty when the method cannot be fitted to {@code training} */
    static Optional<Updating> prepare(Outlook.Method method, double[] training, int period) {
        int cycle = Math.max(1, period);
        return switch (method) {
            case ETS -> EtsSelection.select(training, period).map(choice -> {
                EtsModel.Fit best = choice.best();
                return (before, h) -> best.model().filter(before, best.parameters()).map(fit -> fit.forecast(h));
            });
            case ARIMA -> AutoArima.fitConditional(training, period).map(fit -> (before, h) -> Arima.withCoefficients(
                    before, fit.order(), fit.method(), fit.coefficients()).map(f -> f.forecast(h)));
            case THETA -> Theta.fit(training, period).map(theta -> (before, h) -> theta.updated(before).map(f -> f.forecast(h)));
            case SEASONAL_NAIVE -> training.length < cycle ? Optional.empty()
                    : Optional.of((before, h) -> Optional.of(SeasonalNaive.forecast(before, cycle, h)));
            case COMBINATION, NAIVE_WITH_DRIFT -> throw new IllegalArgumentException("not a back-tested single method: " + method);
        };
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
