package org.annalist.findings;

import java.util.Locale;
import org.annalist.analysis.decompose.ModelForm;
import org.annalist.analysis.season.SeasonalPattern;

/** Turns a {@link SeasonalPattern.Result} into the {@code seasonality} block. */
final class SeasonalityFindings {

    private SeasonalityFindings() {
    }

    /** @param season null for annual data, which have no seasonal period */
    static SeasonalityFinding of(SeasonalPattern.Result season, ModelForm.Choice form) {
        String formName = form.multiplicative() ? "multiplicative" : "additive";
        if (season == null) {
            return new SeasonalityFinding(false, null, null, null, null, formName, null, null, "not applicable", null,
                    null, null, null, false, null, null, null);
        }
        if (season.verdict() == SeasonalPattern.Verdict.TOO_SHORT) {
            return new SeasonalityFinding(false, season.period(), null, null, null, formName, null, null, "too short",
                    null, null, null, null, false, null, null, null);
        }
        return new SeasonalityFinding(season.present(), season.period(), season.strength(), TestNames.of(season.test().method()),
                season.test().pValue(), formName,
                season.present() ? new SeasonalityFinding.Position(season.peak().position(), season.peak().label()) : null,
                season.present() ? new SeasonalityFinding.Position(season.trough().position(), season.trough().label())
                        : null,
                season.verdict().name().toLowerCase(Locale.ROOT), season.test().statistic(),
                season.profile().stream().map(i -> new SeasonalityFinding.ProfilePoint(i.position(), i.label(), i.value()))
                        .toList(),
                season.swing(), season.swingPctOfLevel(), season.changed(), season.largestShift(),
                season.periodCheck().confirmed(), season.periodCheck().autocorrelation());
    }
}
