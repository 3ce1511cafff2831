package org.annalist.findings;

import org.annalist.analysis.decompose.ModelForm;

/**
 * Additive or multiplicative, and the evidence behind the choice.
 *
 * @param elasticity growth of the seasonal swing with the level (null when not measured)
 * @param levelRatio largest over smallest yearly level (null when not measured)
 * @param cycles     complete cycles the evidence used
 */
public record FormChoice(Form form, Reason reason, Double elasticity, Double levelRatio, int cycles) {

    /** Why the form was chosen. */
    public enum Reason {
        SWING_GROWS_WITH_LEVEL, SWING_INDEPENDENT_OF_LEVEL, LEVEL_TOO_STABLE, NOT_ALL_POSITIVE, TOO_SHORT, NOT_SEASONAL,
        FORCED, INTERVAL_SCALE, RATE_IN_POINTS
    }

    public boolean multiplicative() {
        return form == Form.MULTIPLICATIVE;
    }

    static FormChoice forced(Form form) {
        return new FormChoice(form, Reason.FORCED, null, null, 0);
    }

    /**
     * Additive whatever the evidence, for a measure whose changes are differences: an interval
     * scale ({@link Measure#INTERVAL}) or a rate ({@link Measure#RATE}).
     */
    static FormChoice additiveFor(Reason reason, ModelForm.Evidence e) {
        return additive(reason, e);
    }

    /**
     * Multiplicative when the swing grows at least {@value DecisionRules#MULTIPLICATIVE_ELASTICITY}
     * times as fast as the level and the level varies by a factor of at least
     * {@value DecisionRules#MIN_LEVEL_RATIO_FOR_FORM}; with a level that varies less, both forms fit
     * alike and the simpler additive one is kept.
     */
    static FormChoice of(ModelForm.Evidence e) {
        return switch (e.status()) {
            case NOT_ALL_POSITIVE -> additive(Reason.NOT_ALL_POSITIVE, e);
            case NOT_SEASONAL -> additive(Reason.NOT_SEASONAL, e);
            case TOO_SHORT -> additive(Reason.TOO_SHORT, e);
            case MEASURED -> e.levelRatio() < DecisionRules.MIN_LEVEL_RATIO_FOR_FORM ? additive(Reason.LEVEL_TOO_STABLE, e)
                    : e.elasticity() >= DecisionRules.MULTIPLICATIVE_ELASTICITY
                    ? new FormChoice(Form.MULTIPLICATIVE, Reason.SWING_GROWS_WITH_LEVEL, e.elasticity(), e.levelRatio(),
                    e.cycles())
                    : additive(Reason.SWING_INDEPENDENT_OF_LEVEL, e);
        };
    }

    private static FormChoice additive(Reason reason, ModelForm.Evidence e) {
        return new FormChoice(Form.ADDITIVE, reason, Numbers.orNull(e.elasticity()), Numbers.orNull(e.levelRatio()),
                e.cycles());
    }
}
