package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonValue;

/** A forecasting method of the outlook, by its usual name. */
public enum OutlookMethod {
    ETS("ETS"),
    ARIMA("ARIMA"),
    THETA("Theta"),
    COMBINATION("combination"),
    SEASONAL_NAIVE("seasonal naive"),
    /** The seasonal naive forecast of data without a season: every period as the latest value. */
    NAIVE("naive"),
    /**
     * The naive forecast plus the average change per period, for series too short for the other
     * methods (its code is a short name, as R's {@code rwf(drift = TRUE)} is; the narrative words it).
     */
    NAIVE_WITH_DRIFT("naive+drift");

    private final String code;

    OutlookMethod(String code) {
        this.code = code;
    }

    /** The findings JSON's code: the method's usual name. */
    @JsonValue
    public String code() {
        return code;
    }
}
