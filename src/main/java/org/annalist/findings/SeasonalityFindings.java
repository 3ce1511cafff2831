package org.annalist.findings;

import java.util.Optional;
import org.annalist.analysis.decompose.Stl;
import org.annalist.analysis.season.SeasonalPattern;
import org.annalist.series.Series;

/** The {@code seasonality} block: the seasonal evidence ({@link SeasonalPattern}) judged by the decision rules. */
final class SeasonalityFindings {

    private SeasonalityFindings() {
    }

    /**
     * @param y     the working values (logs when multiplicative)
     * @param stl   the decomposition of {@code y}; empty when the series could not be decomposed
     * @param level the series' mean level, to judge the size of an additive swing
     */
    static SeasonalityFinding of(Series series, double[] y, Optional<Stl.Result> stl, FormChoice form, double level) {
        int period = series.frequency().seasonalPeriod();
        if (period <= 1) {
            return new SeasonalityFinding(false, null, null, null, null, form.form(), null, null,
                    SeasonVerdict.NOT_APPLICABLE, null, null, null, null, false, null, null, null);
        }
        Optional<SeasonalPattern.Result> evidence = stl.isEmpty() || y.length < DecisionRules.MIN_YEARS_FOR_SEASON * period
                ? Optional.empty()
                : SeasonalPattern.assess(y, series.start(), stl.get(), form.multiplicative(), level);
        if (evidence.isEmpty()) {
            return new SeasonalityFinding(false, period, null, null, null, form.form(), null, null,
                    SeasonVerdict.TOO_SHORT, null, null, null, null, false, null, null, null);
        }
        SeasonalPattern.Result s = evidence.get();
        SeasonVerdict verdict = verdict(s);
        boolean present = verdict == SeasonVerdict.PRESENT;
        return new SeasonalityFinding(present, s.period(), s.strength(), TestName.of(s.test().method()),
                s.test().pValue(), form.form(),
                present ? new SeasonalityFinding.Position(s.peak().position(), s.peak().label()) : null,
                present ? new SeasonalityFinding.Position(s.trough().position(), s.trough().label()) : null,
                verdict, s.test().statistic(),
                s.profile().stream().map(i -> new SeasonalityFinding.ProfilePoint(i.position(), i.label(), i.value()))
                        .toList(),
                s.swing(), s.swingPctOfLevel(), changed(s), s.largestShift(),
                s.periodCheck().confirmed(), s.periodCheck().autocorrelation());
    }

    /**
     * Claimed when the seasons differ at {@link DecisionRules#ALPHA}, the strength is at least
     * {@link DecisionRules#MIN_SEASONAL_STRENGTH} and the swing at least
     * {@link DecisionRules#MIN_SEASONAL_SWING_PCT} % of the level; a detectable but smaller
     * pattern is negligible.
     */
    private static SeasonVerdict verdict(SeasonalPattern.Result s) {
        if (!s.test().reject(DecisionRules.ALPHA)) {
            return SeasonVerdict.ABSENT;
        }
        return s.strength() < DecisionRules.MIN_SEASONAL_STRENGTH || s.swingPctOfLevel() < DecisionRules.MIN_SEASONAL_SWING_PCT
                ? SeasonVerdict.NEGLIGIBLE : SeasonVerdict.PRESENT;
    }

    /**
     * Changed when the early and late profiles do not overlap and a position's index moved by more
     * than {@link DecisionRules#PATTERN_CHANGE_SHARE_OF_SWING} of the swing, or the peak moved: the
     * early peak's season now lies more than {@link DecisionRules#PEAK_MOVE_SHARE_OF_SWING} of the
     * swing below the new peak (two seasons closer than that are a tie, not a move).
     */
    private static boolean changed(SeasonalPattern.Result s) {
        double oldPeakNow = s.profile().stream().filter(i -> i.position() == s.earlyPeak().position())
                .mapToDouble(SeasonalPattern.Index::value).findFirst().orElse(s.peak().value());
        return s.fullYears() >= 2 * SeasonalPattern.PROFILE_YEARS
                && (s.largestShift() > DecisionRules.PATTERN_CHANGE_SHARE_OF_SWING * s.swing()
                || s.peak().value() - oldPeakNow > DecisionRules.PEAK_MOVE_SHARE_OF_SWING * s.swing());
    }
}
