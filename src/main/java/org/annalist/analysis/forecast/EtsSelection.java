package org.annalist.analysis.forecast;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

/**
 * Automatic ETS model choice by AICc ([1] §4; [2] §7.1): every candidate is fitted by maximum
 * likelihood and the lowest AICc wins. Candidates are the numerically stable set of common practice
 * [3]: error A or M, trend N, A or A damped, season N, A or M, without additive errors on
 * multiplicative seasons (they can divide by a factor near zero); multiplicative components only for
 * strictly positive data; seasonal models only with a period above 1 and at least two full seasons
 * of data.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J., Koehler, A. B., Snyder, R. D. &amp; Grose, S. (2002). A state space framework
 * for automatic forecasting using exponential smoothing methods. <i>International Journal of
 * Forecasting</i> 18(3), 439–454. DOI 10.1016/S0169-2070(01)00110-8.</li>
 * <li>Hyndman, R. J., Koehler, A. B., Ord, J. K. &amp; Snyder, R. D. (2008). <i>Forecasting with
 * Exponential Smoothing: The State Space Approach</i>. Springer. DOI 10.1007/978-3-540-71918-2.</li>
 * <li>Hyndman, R. J. &amp; Khandakar, Y. (2008). Automatic time series forecasting: the forecast
 * package for R. <i>Journal of Statistical Software</i> 27(3), 1–22. DOI 10.18637/jss.v027.i03.</li>
 * </ol>
 */
public final class EtsSelection {

    /** @param candidates every fitted candidate, best AICc first */
    public record Choice(EtsModel.Fit best, List<EtsModel.Fit> candidates) {
    }

    private EtsSelection() {
    }

    /** @return empty when no candidate can be fitted */
    public static Optional<Choice> select(double[] y, int period) {
        boolean positive = true;
        for (double v : y) {
            positive &= v > 0;
        }
        boolean seasonalPossible = period > 1 && y.length >= 2 * period;
        List<EtsModel.Fit> fits = new ArrayList<>();
        for (EtsModel.Error error : EtsModel.Error.values()) {
            for (EtsModel.Season season : EtsModel.Season.values()) {
                for (int trendChoice = 0; trendChoice < 3; trendChoice++) {
                    boolean multiplicative = error == EtsModel.Error.MULTIPLICATIVE
                            || season == EtsModel.Season.MULTIPLICATIVE;
                    if (multiplicative && !positive
                            || season != EtsModel.Season.NONE && !seasonalPossible
                            || error == EtsModel.Error.ADDITIVE && season == EtsModel.Season.MULTIPLICATIVE) {
                        continue;
                    }
                    EtsModel.Trend trend = trendChoice == 0 ? EtsModel.Trend.NONE : EtsModel.Trend.ADDITIVE;
                    EtsModel model = new EtsModel(error, trend, trendChoice == 2, season,
                            season == EtsModel.Season.NONE ? 1 : period, EtsModel.Estimator.forPeriod(period));
                    if (y.length <= model.parameterCount() + 2) {
                        continue; // AICc is undefined with fewer observations than parameters + 2
                    }
                    model.fit(y).filter(fit -> Double.isFinite(fit.aicc())).ifPresent(fits::add);
                }
            }
        }
        fits.sort(Comparator.comparingDouble(EtsModel.Fit::aicc)); // [2] §7.1: the lowest AICc
        return fits.isEmpty() ? Optional.empty() : Optional.of(new Choice(fits.get(0), List.copyOf(fits)));
    }
}
