package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;

/** What a structural break changed, decided from its two fitted lines ({@link DecisionRules#BREAK_KIND_BIC_MARGIN}). */
public enum BreakKind {
    /** A step in level: the lines are (about) parallel and jump at the break. */
    LEVEL,
    /** A change in slope: the line bends at the break without a jump worth reporting. */
    SLOPE,
    /** Both: the level jumps and the slope changes. */
    BOTH;

    /** The findings JSON's code: {@code level}, {@code slope}, {@code both}. */
    @JsonValue
    public String code() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** Whether the break moved the level at the break date (a step is reported). */
    public boolean step() {
        return this != SLOPE;
    }

    /** Whether the break changed the slope (a slope change is reported). */
    public boolean slope() {
        return this != LEVEL;
    }
}
