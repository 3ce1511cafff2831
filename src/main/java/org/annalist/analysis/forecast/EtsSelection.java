package org.annalist.analysis.forecast;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

/**
 * Automatic ETS model choice by AICc (Hyndman, Koehler, Snyder &amp; Grose 2002, §4; Hyndman et al.
 * 2008, §7.1): every candidate is fitted by maximum likelihood and the lowest AICc wins. Candidates
 * are the numerically stable set of common practice: error A or M, trend N, A or A damped, season N,
 * A or M, without additive errors on multiplicative seasons (they can divide by a factor near zero);
 * multiplicative components only for strictly positive data; seasonal models only with a period
 * above 1 and at least two full seasons of data.
 */
public final class EtsSelection {

    /** @param candidates every fitted candidate, best AICc first */
    public record Choice(EtsModel.Fit best, List<EtsModel.Fit> candidates) {
    }

    private EtsSelection() {
    }

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
                            season == EtsModel.Season.NONE ? 1 : period);
                    if (y.length <= model.parameterCount() + 2) {
                        continue; // AICc is undefined with fewer observations than parameters + 2
                    }
                    EtsModel.Fit fit = model.fit(y);
                    if (fit != null && Double.isFinite(fit.aicc())) {
                        fits.add(fit);
                    }
                }
            }
        }
        fits.sort(Comparator.comparingDouble(EtsModel.Fit::aicc));
        return fits.isEmpty() ? Optional.empty() : Optional.of(new Choice(fits.get(0), List.copyOf(fits)));
    }
}
