package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;

/** Additive (the seasonal swing keeps its size) or multiplicative (it grows with the level; worked in logs). */
public enum Form {
    ADDITIVE, MULTIPLICATIVE;

    /** The findings JSON's code: {@code additive}, {@code multiplicative}. */
    @JsonValue
    public String code() {
        return name().toLowerCase(Locale.ROOT);
    }
}
