package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;

/** The scale the analysis worked on: the values themselves, or their logarithms (a multiplicative series). */
public enum Transform {
    NONE, LOG;

    /** The findings JSON's code: {@code none}, {@code log}. */
    @JsonValue
    public String code() {
        return name().toLowerCase(Locale.ROOT);
    }
}
