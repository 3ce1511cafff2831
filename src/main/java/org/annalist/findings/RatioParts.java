package org.annalist.findings;

import org.annalist.analysis.indicators.LatestIndicators;
import org.annalist.series.Series;

/**
 * The parts of a ratio series (nights / arrivals, nights / bed-nights available × 100): over a
 * span the ratio is the ratio of the parts' sums, not the mean of the ratios (Eurostat's
 * definitions of average length of stay and occupancy; from memory).
 *
 * @param scale the factor applied to numerator / denominator (100 for a rate in %)
 */
public record RatioParts(Series numerator, Series denominator, double scale) {

    LatestIndicators.Parts forIndicators() {
        return new LatestIndicators.Parts(numerator, denominator, scale);
    }
}
