package org.annalist.findings;

import java.util.List;
import java.util.Optional;
import org.annalist.analysis.cycle.CycleDetector;
import org.annalist.analysis.cycle.YearlyValues;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * The cycle finding, on one value per year ({@link YearlyValues}: the annual values, or the yearly
 * means of the seasonally adjusted values on the working scale), judged by the decision rules.
 */
final class CycleAnalysis {

    private static final CycleDetector DETECTOR = CycleDetector.withDefaults()
            .withMinimumYears(DecisionRules.MIN_YEARS_FOR_CYCLE)
            .withShortestCycleYears(DecisionRules.MIN_CYCLE_YEARS)
            .withCyclesInData(DecisionRules.MIN_CYCLES_IN_DATA);

    private CycleAnalysis() {
    }

    static CycleFinding of(Series series, double[] workingAdjusted) {
        Optional<YearlyValues> yearly = YearlyValues.of(workingAdjusted, series.start());
        if (yearly.isEmpty()) {
            return absent(CycleFinding.Reason.TOO_FEW_COMPLETE_YEARS, 0, null, null);
        }
        List<Integer> years = yearly.get().years();
        CycleDetector.Result r = DETECTOR.detect(yearly.get().values());
        if (r.status() == CycleDetector.Status.TOO_FEW_YEARS) {
            return absent(CycleFinding.Reason.TOO_FEW_YEARS, r.years(), null, null);
        }
        if (r.status() == CycleDetector.Status.NO_CANDIDATE_PERIOD) {
            return absent(CycleFinding.Reason.NO_CANDIDATE_PERIOD, r.years(), null, null);
        }
        if (r.pValue() >= DecisionRules.ALPHA) {
            return absent(CycleFinding.Reason.NOT_BEYOND_RED_NOISE, r.years(), r.spectralPeriod(), r.pValue());
        }
        if (r.peaks().size() < DecisionRules.MIN_CYCLE_PEAKS) {
            return absent(CycleFinding.Reason.TOO_FEW_PEAKS, r.years(), r.spectralPeriod(), r.pValue());
        }
        // regular when the gaps between the peaks vary little
        boolean regular = r.gapVariation() <= DecisionRules.MAX_REGULAR_GAP_CV;
        return new CycleFinding(true, Numbers.orNull(r.length()), CycleFinding.YEARS,
                r.peaks().stream().map(i -> Period.year(years.get(i))).toList(), r.gaps(), regular,
                CycleFinding.Reason.CLAIMED, r.years(), r.spectralPeriod(), r.pValue());
    }

    private static CycleFinding absent(CycleFinding.Reason reason, int years, Double spectralPeriod, Double pValue) {
        return new CycleFinding(false, null, CycleFinding.YEARS, List.of(), List.of(), false, reason, years,
                spectralPeriod, pValue);
    }
}
