package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;

/** Which side of what was expected a value lies. */
public enum Side {
    ABOVE, BELOW;

    /** The findings JSON's code: {@code above}, {@code below}. */
    @JsonValue
    public String code() {
        return name().toLowerCase(Locale.ROOT);
    }
}
