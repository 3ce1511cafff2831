package org.annalist.analysis.forecast;

/**
 * The exact gradient of the ETS estimation criterion n log(Σ e_t²) + 2 Σ log|ŷ_t| ([1] §5.2, the
 * second sum for multiplicative errors only, as {@link EtsFilter#criterion} computes it) with respect
 * to α, β* = β/α, γ, φ and every initial state, by forward-mode differentiation of the state
 * equations [1, Table 2.3] (derived here, from memory of the chain rule; no published source): each
 * state carries its derivatives along the recursion. One pass costs a few criterion evaluations, where
 * forward differences cost one evaluation per variable (some 17 for a monthly seasonal model).
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J., Koehler, A. B., Ord, J. K. &amp; Snyder, R. D. (2008). <i>Forecasting with
 * Exponential Smoothing: The State Space Approach</i>. Springer. DOI 10.1007/978-3-540-71918-2.</li>
 * </ol>
 */
final class EtsGradient {

    /** Positions of the smoothing parameters in the gradient; the initial states follow from {@link #STATES}. */
    static final int ALPHA = 0;
    static final int BETA_STAR = 1;
    static final int GAMMA = 2;
    static final int PHI = 3;
    static final int STATES = 4;

    private final EtsModel model;
    private final double[] y;
    private final int k;
    private final double[] dl;
    private final double[] db;
    private final double[][] ds;
    private final double[] dq;
    private final double[] dphib;
    private final double[] gSum;
    private final double[] gLog;

    /** @param stateCount the length of the initial states {level, trend (if any), s_1 … s_m (if seasonal)} */
    EtsGradient(EtsModel model, double[] y, int stateCount) {
        this.model = model;
        this.y = y;
        k = STATES + stateCount;
        dl = new double[k];
        db = new double[k];
        ds = new double[model.seasonSlots()][k];
        dq = new double[k];
        dphib = new double[k];
        gSum = new double[k];
        gLog = new double[k];
    }

    /**
     * Writes the criterion's gradient into {@code g} (length {@link #STATES} + number of states):
     * ∂/∂α, ∂/∂β*, ∂/∂γ, ∂/∂φ (zero where the model lacks the parameter), then ∂/∂ each initial state.
     *
     * @return false where the criterion is infinite (a forecast not finite) or the gradient is not finite
     */
    boolean at(double alpha, double betaStar, double gamma, double phiValue, double[] initial, double[] g) {
        boolean trended = model.trend() != EtsModel.Trend.NONE;
        EtsModel.Season season = model.season();
        boolean seasonal = season != EtsModel.Season.NONE;
        boolean additiveSeason = season == EtsModel.Season.ADDITIVE;
        boolean multiplicativeError = model.error() == EtsModel.Error.MULTIPLICATIVE;
        boolean damped = model.damped();
        int m = model.seasonSlots();
        double l = initial[0];
        double b = trended ? initial[1] : 0;
        double[] s = new double[m]; // s_j at s[(head + j − 1) mod m], as EtsFilter.criterion keeps them
        java.util.Arrays.fill(dl, 0);
        java.util.Arrays.fill(db, 0);
        java.util.Arrays.fill(gSum, 0);
        java.util.Arrays.fill(gLog, 0);
        dl[STATES] = 1;
        if (trended) {
            db[STATES + 1] = 1;
        }
        for (int j = 0; j < m; j++) {
            java.util.Arrays.fill(ds[j], 0);
        }
        if (seasonal) {
            int first = model.firstSeasonIndex();
            System.arraycopy(initial, first, s, 0, m);
            for (int j = 0; j < m; j++) {
                ds[j][STATES + first + j] = 1;
            }
        }
        int head = 0;
        double phi = damped ? phiValue : 1;
        double sumE2 = 0;
        for (double v : y) {
            int slot = head == 0 ? m - 1 : head - 1;
            double phib = trended ? phi * b : 0;
            double q = l + phib;
            double oldest = seasonal ? s[slot] : 0;
            double[] dOld = ds[slot];
            for (int i = 0; i < k; i++) {
                dphib[i] = trended ? phi * db[i] : 0;
                dq[i] = dl[i] + dphib[i];
            }
            if (trended && damped) {
                dphib[PHI] += b;
                dq[PHI] += b;
            }
            double f = !seasonal ? q : additiveSeason ? q + oldest : q * oldest;
            if (!Double.isFinite(f)) {
                return false;
            }
            double e = multiplicativeError ? (v - f) / f : v - f;
            sumE2 += e * e;
            // ∂e/∂f: −1 for additive errors, −v/f² for multiplicative ones
            double eByF = multiplicativeError ? -v / (f * f) : -1;
            double pp = !seasonal ? v : additiveSeason ? v - oldest : v / oldest;
            double ppByOld = !seasonal ? 0 : additiveSeason ? -1 : -v / (oldest * oldest);
            double newL = q + alpha * (pp - q);
            double growth = (newL - l) - phib;
            double t = !seasonal ? 0 : additiveSeason ? v - q : v / q;
            double tByQ = additiveSeason ? -1 : -v / (q * q);
            double tMinusOld = t - oldest;
            for (int i = 0; i < k; i++) {
                double dOldI = seasonal ? dOld[i] : 0;
                double df = !seasonal ? dq[i] : additiveSeason ? dq[i] + dOldI : q * dOldI + oldest * dq[i];
                gSum[i] += e * eByF * df;
                gLog[i] += df / f;
                double dNewL = dq[i] + alpha * (ppByOld * dOldI - dq[i]);
                if (trended) {
                    db[i] = dphib[i] + betaStar * (dNewL - dl[i] - dphib[i]);
                }
                if (seasonal) {
                    dOld[i] = dOldI + gamma * (tByQ * dq[i] - dOldI); // the new s_1 takes the old s_m's slot
                }
                dl[i] = dNewL;
            }
            dl[ALPHA] += pp - q;
            if (trended) {
                db[ALPHA] += betaStar * (pp - q);
                db[BETA_STAR] += growth;
            }
            if (seasonal) {
                dOld[GAMMA] += tMinusOld;
            }
            if (trended) {
                b = phib + betaStar * growth;
            }
            if (seasonal) {
                head = slot;
                s[head] = oldest + gamma * tMinusOld;
            }
            l = newL;
        }
        double n = y.length;
        for (int i = 0; i < k; i++) {
            g[i] = n * 2 * gSum[i] / sumE2 + (multiplicativeError ? 2 * gLog[i] : 0);
            if (!Double.isFinite(g[i])) {
                return false;
            }
        }
        return true;
    }
}
