package org.annalist.analysis.forecast;

import java.util.Locale;

/**
 * The orders of a seasonal ARIMA(p,d,q)(P,D,Q)[m] model and whether it carries a constant: a mean
 * when d + D = 0, a drift (a linear term in time, as R's {@code Arima(include.drift = TRUE)}) when
 * d + D = 1; with two or more differences no constant is fitted, as in R [1].
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J. &amp; Khandakar, Y. (2008). Automatic time series forecasting: the forecast
 * package for R. <i>Journal of Statistical Software</i> 27(3), 1–22. DOI 10.18637/jss.v027.i03.</li>
 * </ol>
 *
 * @param period m, 1 for a non-seasonal model (then P = D = Q = 0)
 */
public record ArimaOrder(int p, int d, int q, int seasonalP, int seasonalD, int seasonalQ, int period,
                         boolean constant) {

    public ArimaOrder {
        if (p < 0 || d < 0 || q < 0 || seasonalP < 0 || seasonalD < 0 || seasonalQ < 0 || period < 1) {
            throw new IllegalArgumentException("orders must be non-negative and the period positive");
        }
        if (period == 1 && seasonalP + seasonalD + seasonalQ > 0) {
            throw new IllegalArgumentException("a seasonal order needs a period of at least 2");
        }
    }

    /** A non-seasonal ARIMA(p,d,q). */
    public static ArimaOrder of(int p, int d, int q, boolean constant) {
        return new ArimaOrder(p, d, q, 0, 0, 0, 1, constant);
    }

    /** A seasonal ARIMA(p,d,q)(P,D,Q)[m]. */
    public static ArimaOrder of(int p, int d, int q, int seasonalP, int seasonalD, int seasonalQ, int period,
                                boolean constant) {
        return new ArimaOrder(p, d, q, seasonalP, seasonalD, seasonalQ, period, constant);
    }

    /** d + D: the number of differences. */
    public int differences() {
        return d + seasonalD;
    }

    /** Whether the constant is a mean (no differencing). */
    public boolean hasMean() {
        return constant && differences() == 0;
    }

    /** Whether the constant is a drift (one difference). */
    public boolean hasDrift() {
        return constant && differences() == 1;
    }

    /** p + q + P + Q: the ARMA coefficients. */
    int armaCount() {
        return p + q + seasonalP + seasonalQ;
    }

    /**
     * ARIMA(p,d,q), followed by (P,D,Q)[m] when the model has a seasonal part, and by its constant,
     * {@code with drift} or {@code with mean}, as forecast's {@code arima.string} names them (it says
     * "non-zero mean"; from memory).
     */
    public String label() {
        String base = String.format(Locale.ROOT, "ARIMA(%d,%d,%d)", p, d, q);
        if (period > 1 && seasonalP + seasonalD + seasonalQ > 0) {
            base += String.format(Locale.ROOT, "(%d,%d,%d)[%d]", seasonalP, seasonalD, seasonalQ, period);
        }
        if (hasDrift()) {
            return base + " with drift";
        }
        return hasMean() ? base + " with mean" : base;
    }

    ArimaOrder withArma(int newP, int newQ, int newSeasonalP, int newSeasonalQ, boolean newConstant) {
        return new ArimaOrder(newP, d, newQ, newSeasonalP, seasonalD, newSeasonalQ, period, newConstant);
    }

    // equals and hashCode written out as the record would make them (the same comparison, the same
    // hash): a record's own are linked through method handles on their first call, some 10-25 ms of
    // a cold brief's start-up each (README, "Start-up and memory")
    @Override
    public boolean equals(Object other) {
        return other instanceof ArimaOrder that && p == that.p && d == that.d && q == that.q
                && seasonalP == that.seasonalP && seasonalD == that.seasonalD && seasonalQ == that.seasonalQ
                && period == that.period && constant == that.constant;
    }

    @Override
    public int hashCode() {
        int hash = 0;
        for (int component : new int[] {p, d, q, seasonalP, seasonalD, seasonalQ, period}) {
            hash = 31 * hash + component;
        }
        return 31 * hash + Boolean.hashCode(constant);
    }
}
