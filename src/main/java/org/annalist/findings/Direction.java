package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;

/** The direction of a trend; {@link #NONE} when the test does not support one. */
public enum Direction {
    INCREASING, DECREASING, NONE;

    /** The findings JSON's code: {@code increasing}, {@code decreasing}, {@code none}. */
    @JsonValue
    public String code() {
        return name().toLowerCase(Locale.ROOT);
    }
}
