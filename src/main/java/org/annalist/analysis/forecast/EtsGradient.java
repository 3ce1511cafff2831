package org.annalist.analysis.forecast;

/**
 * The exact gradient of the ETS estimation criterion n log(Σ e_t²) + 2 Σ log|ŷ_t| ([1] §5.2, the
 * second sum for multiplicative errors only, as {@link EtsFilter#criterion} computes it) with respect
 * to α, β* = β/α, γ, φ and every initial state, by reverse-mode differentiation of the state
 * equations [1, Table 2.3] (derived here from the chain rule, from memory; no published source): a
 * forward pass keeps each step's states, a backward pass carries the criterion's derivative with
 * respect to each state back to the start. It costs about three criterion evaluations whatever the
 * number of variables, where forward differences cost one evaluation per variable (some 17 for a
 * monthly seasonal model). Where the criterion was just evaluated at the same point,
 * {@link EtsFilter#criterion} keeps its forward pass here ({@link #keep}) and the gradient needs the
 * backward pass alone ({@link #fromKeptPass}): a quasi-Newton search asks for the gradient exactly
 * where its line search accepted a value.
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
    /** The model's form, read once: both passes branch on it at every step. */
    private final boolean trended;
    private final boolean seasonal;
    private final boolean additiveSeason;
    private final boolean multiplicativeError;
    /** What the forward pass keeps of each step for the backward one: the states read, the forecast, the error. */
    private final double[] levels;
    private final double[] trends;
    private final double[] oldests;
    private final double[] fs;
    private final double[] es;
    private final double[] seasonAdjoint;
    /** Σ e_t² of the kept pass, and whether a whole pass is kept ({@link #finishKept}). */
    private double keptSumE2;
    private boolean kept;

    /** @param stateCount the length of the initial states {level, trend (if any), s_1 … s_m (if seasonal)} */
    EtsGradient(EtsModel model, double[] y, int stateCount) {
        this.model = model;
        this.y = y;
        k = STATES + stateCount;
        trended = model.trend() != EtsModel.Trend.NONE;
        seasonal = model.season() != EtsModel.Season.NONE;
        additiveSeason = model.season() == EtsModel.Season.ADDITIVE;
        multiplicativeError = model.error() == EtsModel.Error.MULTIPLICATIVE;
        int n = y.length;
        levels = new double[n];
        trends = new double[n];
        oldests = new double[n];
        fs = new double[n];
        es = new double[n];
        seasonAdjoint = new double[model.seasonSlots()];
    }

    /**
     * Writes the criterion's gradient into {@code g} (length {@link #STATES} + number of states):
     * ∂/∂α, ∂/∂β*, ∂/∂γ, ∂/∂φ (zero where the model lacks the parameter), then ∂/∂ each initial state.
     * One forward pass of the recursions of {@link EtsFilter#criterion}, then one backward pass of
     * their adjoints (reverse-mode differentiation), about three criterion evaluations in all.
     *
     * @return false where the criterion is infinite (a forecast not finite) or the gradient is not finite
     */
    boolean at(double alpha, double betaStar, double gamma, double phiValue, double[] initial, double[] g) {
        int m = model.seasonSlots();
        int n = y.length;
        double phi = model.damped() ? phiValue : 1;
        kept = false; // overwritten below
        double l = initial[0];
        double b = trended ? initial[1] : 0;
        double[] s = new double[m]; // s_j at s[(head + j − 1) mod m], as EtsFilter.criterion keeps them
        int first = model.firstSeasonIndex();
        if (seasonal) {
            System.arraycopy(initial, first, s, 0, m);
        }
        int head = 0;
        double sumE2 = 0;
        for (int t = 0; t < n; t++) {
            double v = y[t];
            int slot = head == 0 ? m - 1 : head - 1;
            double phib = trended ? phi * b : 0;
            double q = l + phib;
            double oldest = seasonal ? s[slot] : 0;
            double f = !seasonal ? q : additiveSeason ? q + oldest : q * oldest;
            if (!Double.isFinite(f)) {
                return false;
            }
            double e = multiplicativeError ? (v - f) / f : v - f;
            sumE2 += e * e;
            keep(t, l, b, oldest, f, e);
            double pp = !seasonal ? v : additiveSeason ? v - oldest : v / oldest;
            double newL = q + alpha * (pp - q);
            if (trended) {
                b = phib + betaStar * ((newL - l) - phib);
            }
            if (seasonal) {
                double tt = additiveSeason ? v - q : v / q;
                head = slot;
                s[head] = oldest + gamma * (tt - oldest);
            }
            l = newL;
        }
        return backward(alpha, betaStar, gamma, phiValue, sumE2, g);
    }

    /** Forgets the kept pass: the criterion is about to be evaluated elsewhere. */
    void forgetKept() {
        kept = false;
    }

    /** Keeps step t of the criterion's forward pass: the level, trend and oldest season it read, its forecast and error. */
    void keep(int t, double level, double trend, double oldest, double f, double e) {
        levels[t] = level;
        trends[t] = trend;
        oldests[t] = oldest;
        fs[t] = f;
        es[t] = e;
    }

    /** Marks the pass kept by {@link #keep} as whole, with its Σ e_t². */
    void finishKept(double sumE2) {
        keptSumE2 = sumE2;
        kept = true;
    }

    /**
     * {@link #at} from the forward pass {@link EtsFilter#criterion} kept, which must have been run
     * at the same parameters and initial states: the same values, from the backward pass alone.
     *
     * @throws IllegalStateException when no whole pass is kept
     */
    boolean fromKeptPass(double alpha, double betaStar, double gamma, double phiValue, double[] g) {
        if (!kept) {
            throw new IllegalStateException("no forward pass kept");
        }
        return backward(alpha, betaStar, gamma, phiValue, keptSumE2, g);
    }

    /** Whether a whole forward pass is kept. */
    boolean hasKeptPass() {
        return kept;
    }

    /** The backward pass over the kept forward pass: the adjoints of the states, step by step back to the start. */
    private boolean backward(double alpha, double betaStar, double gamma, double phiValue, double sumE2, double[] g) {
        int m = model.seasonSlots();
        int n = y.length;
        double phi = model.damped() ? phiValue : 1;
        int first = model.firstSeasonIndex();
        java.util.Arrays.fill(g, 0);
        java.util.Arrays.fill(seasonAdjoint, 0);
        double levelBar = 0; // the adjoints of the level and trend after step t
        double trendBar = 0;
        double errorWeight = 2 * n / sumE2; // ∂/∂e_t of n log Σe² is errorWeight · e_t
        for (int t = n - 1; t >= 0; t--) {
            double v = y[t];
            int slot = m - 1 - t % m; // the slot step t read and wrote (head runs backwards from 0)
            double l = levels[t];
            double b = trends[t];
            double oldest = oldests[t];
            double f = fs[t];
            double phib = trended ? phi * b : 0;
            double q = l + phib;
            double pp = !seasonal ? v : additiveSeason ? v - oldest : v / oldest;
            double newL = q + alpha * (pp - q);
            double oldBar = 0;
            double qBar = 0;
            double phibBar = 0;
            double lBar = 0;
            if (seasonal) { // s' = oldest + γ (tt − oldest), tt = v − q or v / q
                double sBar = seasonAdjoint[slot];
                double tt = additiveSeason ? v - q : v / q;
                oldBar += (1 - gamma) * sBar;
                g[GAMMA] += (tt - oldest) * sBar;
                qBar += (additiveSeason ? -1 : -v / (q * q)) * gamma * sBar;
            }
            double newLBar = levelBar;
            if (trended) { // b' = φb + β* ((newL − l) − φb)
                newLBar += betaStar * trendBar;
                lBar -= betaStar * trendBar;
                phibBar += (1 - betaStar) * trendBar;
                g[BETA_STAR] += ((newL - l) - phib) * trendBar;
            }
            // newL = q + α (pp − q)
            qBar += (1 - alpha) * newLBar;
            g[ALPHA] += (pp - q) * newLBar;
            double ppBar = alpha * newLBar;
            if (seasonal) {
                oldBar += (additiveSeason ? -1 : -v / (oldest * oldest)) * ppBar;
            }
            // the criterion's own terms: e_t through f, and 2 log|f| for multiplicative errors
            double fBar = errorWeight * es[t] * (multiplicativeError ? -v / (f * f) : -1)
                    + (multiplicativeError ? 2 / f : 0);
            if (!seasonal) {
                qBar += fBar;
            } else if (additiveSeason) {
                qBar += fBar;
                oldBar += fBar;
            } else {
                qBar += fBar * oldest;
                oldBar += fBar * q;
            }
            lBar += qBar;
            phibBar += qBar;
            double bBar = 0;
            if (trended) {
                bBar = phi * phibBar;
                if (model.damped()) {
                    g[PHI] += b * phibBar;
                }
            }
            levelBar = lBar;
            trendBar = bBar;
            if (seasonal) {
                seasonAdjoint[slot] = oldBar;
            }
        }
        g[STATES] = levelBar;
        if (trended) {
            g[STATES + 1] = trendBar;
        }
        if (seasonal) {
            System.arraycopy(seasonAdjoint, 0, g, STATES + first, m);
        }
        for (int i = 0; i < k; i++) {
            if (!Double.isFinite(g[i])) {
                return false;
            }
        }
        return true;
    }
}
