package org.annalist.analysis.forecast;

/**
 * The exact Gaussian likelihood of an ARIMA model by the Kalman filter on its state-space form, as
 * R's {@code arima} computes it [1, 2]: the state is the r = max(p, q + 1) ARMA states of Harvey's
 * form followed by the d + mD last values the differencing needs; the ARMA block starts from its
 * stationary covariance Q₀, computed by Gardner, Harvey &amp; Phillips' algorithm [1, §3]
 * ({@link GardnerCovariance}), the
 * differencing block from a diffuse prior of variance κ = 10⁶. Innovations whose variance exceeds
 * 10⁴ (those absorbed by the diffuse prior) are left out of the likelihood, as in R. Everything is
 * in units of the innovation variance σ², which the likelihood concentrates out:
 * −2 log L = n log(2π σ̂²) + n + Σ log Fₜ with σ̂² = Σ vₜ²/Fₜ / n [2, eq. 3.2]. The maximum-likelihood
 * search uses {@link ArmaLikelihood}, the limit of this likelihood as κ grows, at a fraction of
 * the cost; this filter gives the reported likelihood, the residuals and the forecasts' state.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Gardner, G., Harvey, A. C. &amp; Phillips, G. D. A. (1980). Algorithm AS 154: An algorithm for
 * exact maximum likelihood estimation of autoregressive-moving average models by means of Kalman
 * filtering. <i>Applied Statistics</i> 29(3), 311–322. DOI 10.2307/2346910.</li>
 * <li>Durbin, J. &amp; Koopman, S. J. (2012). <i>Time Series Analysis by State Space Methods</i>,
 * 2nd ed. Oxford University Press. DOI 10.1093/acprof:oso/9780199641178.001.0001.</li>
 * <li>R Core Team, {@code src/library/stats/src/arima.c} ({@code getQ0}, {@code ARIMA_Like},
 * {@code KalmanFore}) and {@code makeARIMA} (R 4.2).</li>
 * </ol>
 */
final class ArimaKalman {

    /** R's {@code kappa}: the prior variance of the differencing states. */
    static final double KAPPA = 1e6;
    /** R's bound above which a one-step variance counts as diffuse and leaves the likelihood out. */
    private static final double DIFFUSE_GAIN = 1e4;
    /** The relative change of the predicted covariance below which it counts as steady (our choice). */
    static final double STEADY_TOLERANCE = 1e-12;

    /** Sum of squared standardised innovations, sum of log variances, and how many entered. */
    record Likelihood(double ssq, double sumLog, int used) {
    }

    private final double[] phi;
    private final double[] theta;
    private final double[] delta;
    private final int p;
    private final int q;
    private final int r;
    private final int d;
    private final int rd;
    /** The filtered state and covariance (row-major rd × rd), updated by {@link #run}. */
    final double[] a;
    final double[] pm;
    private final double[] anew;
    /** P⁻, rewritten whole at each prediction. */
    private double[] pnew;
    private final double[] mm;
    /** The previous step's P⁻, for the test of convergence: the two swap rooms rather than copy. */
    private double[] previous;
    private final double[] gainVector;
    /** The lags k (0-based) with Δ_k ≠ 0: (1 − B)(1 − B¹²) has 3 of 13, so the sums skip the zeros. */
    private final int[] lags;

    /** @param delta the differencing polynomial's coefficients, as R's {@code Delta} */
    ArimaKalman(double[] phi, double[] theta, double[] delta) {
        this.phi = phi;
        this.theta = theta;
        this.delta = delta;
        p = phi.length;
        q = theta.length;
        r = Math.max(p, q + 1);
        d = delta.length;
        rd = r + d;
        a = new double[rd];
        pm = new double[rd * rd];
        anew = new double[rd];
        pnew = new double[rd * rd];
        mm = new double[rd * rd];
        previous = new double[rd * rd];
        gainVector = new double[rd];
        lags = java.util.stream.IntStream.range(0, d).filter(k -> delta[k] != 0).toArray();
    }

    /**
     * Runs the filter over {@code y} from R's initial state (zero mean, Q₀ and κ), leaving the final
     * filtered state in {@link #a} and {@link #pm}.
     *
     * @param residuals where to write the standardised innovations vₜ/√Fₜ, or null
     */
    Likelihood run(double[] y, double[] residuals) {
        return run(y, residuals, y.length, null);
    }

    /**
     * Point forecasts (before any regression term) from every origin o = {@code firstOrigin} … n − 1,
     * 1 … min({@code reach}, n − o) steps ahead, each from the state filtered through the values
     * before o: what a run over those values followed by {@link #forecast} would give, from one run.
     */
    double[][] meansFromOrigins(double[] y, int firstOrigin, int reach) {
        double[][] means = new double[y.length - firstOrigin][];
        double[] state = new double[rd];
        double[] next = new double[rd];
        run(y, null, firstOrigin, origin -> means[origin - firstOrigin] =
                meansAhead(Math.min(reach, y.length - origin), state, next));
        return means;
    }

    /**
     * The forecast means of {@link #forecast} alone, 1 … h steps after the filtered state, without
     * the covariances (the same arithmetic, so the same values).
     */
    double[] forecastMeans(int h) {
        return meansAhead(h, new double[rd], new double[rd]);
    }

    /** Means 1 … h steps after the filtered state {@link #a}, with {@code state} and {@code next} as room to work. */
    private double[] meansAhead(int h, double[] state, double[] next) {
        double[] m = new double[h];
        System.arraycopy(a, 0, state, 0, rd);
        for (int k = 0; k < h; k++) {
            transition(state, next);
            System.arraycopy(next, 0, state, 0, rd);
            m[k] = observe(state);
        }
        return m;
    }

    /**
     * @param firstStop from this step on, {@code beforeStep} is told each step's index before the
     *                  step's value enters, while {@link #a} holds the state filtered through the earlier values
     */
    private Likelihood run(double[] y, double[] residuals, int firstStop, java.util.function.IntConsumer beforeStep) {
        java.util.Arrays.fill(a, 0);
        java.util.Arrays.fill(pnew, 0);
        double[] q0 = GardnerCovariance.of(phi, theta);
        for (int i = 0; i < r; i++) {
            System.arraycopy(q0, i * r, pnew, i * rd, r);
        }
        for (int i = r; i < rd; i++) {
            pnew[i * rd + i] = KAPPA;
        }
        double ssq = 0;
        double sumLog = 0;
        int used = 0;
        boolean steady = false;
        for (int l = 0; l < y.length; l++) {
            if (l >= firstStop) {
                beforeStep.accept(l);
            }
            predictState();
            if (l > 0 && !steady) {
                double[] last = pnew; // kept for the test of convergence; its room takes the step after
                pnew = previous;
                previous = last;
                predictCovariance();
                steady = l > rd && converged();
            }
            double resid = y[l] - anew[0];
            for (int i : lags) {
                resid -= delta[i] * anew[r + i];
            }
            // M = P Zᵀ and F = Z P Zᵀ with Z = (1, 0 … 0, Δ)
            for (int i = 0; i < rd; i++) {
                double tmp = pnew[i * rd];
                for (int k : lags) {
                    tmp += pnew[i * rd + r + k] * delta[k];
                }
                gainVector[i] = tmp;
            }
            double gain = gainVector[0];
            for (int k : lags) {
                gain += delta[k] * gainVector[r + k];
            }
            if (gain < DIFFUSE_GAIN) {
                used++;
                ssq += resid * resid / gain;
                sumLog += Math.log(gain);
            }
            if (residuals != null) {
                residuals[l] = resid / Math.sqrt(gain);
            }
            for (int i = 0; i < rd; i++) {
                a[i] = anew[i] + gainVector[i] * resid / gain;
            }
            if (!steady) {
                for (int i = 0; i < rd; i++) {
                    for (int j = 0; j < rd; j++) {
                        pm[i * rd + j] = pnew[i * rd + j] - gainVector[i] * gainVector[j] / gain;
                    }
                }
            }
        }
        return new Likelihood(ssq, sumLog, used);
    }

    /**
     * Whether the predicted covariance has stopped changing: then P⁻, the gain and F stay as they
     * are for every later step, and the filter updates the state alone ([2, §4.3.4]: for a
     * time-invariant model the covariance converges to the steady-state solution of the Riccati
     * equation; R's {@code ARIMA_Like} keeps recomputing it). The test compares P⁻ with the previous
     * step's, kept in {@code previous}, to a relative {@value #STEADY_TOLERANCE}, far below what
     * changes the likelihood's printed digits; it is only asked after the first rd + 1 steps.
     */
    private boolean converged() {
        double change = 0;
        double size = 0;
        for (int i = 0; i < pnew.length; i++) {
            change = Math.max(change, Math.abs(pnew[i] - previous[i]));
            size = Math.max(size, Math.abs(pnew[i]));
        }
        return change <= STEADY_TOLERANCE * size;
    }

    /**
     * Forecast means (of the differenced-and-integrated series, before any regression term) and
     * variances in units of σ², 1 … h steps after the last filtered state, as R's {@code KalmanFore};
     * does not change the filtered state.
     */
    double[][] forecast(int h) {
        double[] keepA = a.clone();
        double[] keepP = pm.clone();
        double[] mean = new double[h];
        double[] variance = new double[h];
        for (int l = 0; l < h; l++) {
            predictState();
            predictCovariance();
            System.arraycopy(anew, 0, a, 0, rd);
            System.arraycopy(pnew, 0, pm, 0, rd * rd);
            double fc = observe(a);
            mean[l] = fc;
            double v = pm[0];
            for (int k = 0; k < d; k++) {
                v += 2 * delta[k] * pm[r + k];
            }
            for (int i = 0; i < d; i++) {
                for (int j = 0; j < d; j++) {
                    v += delta[i] * delta[j] * pm[(r + i) * rd + r + j];
                }
            }
            variance[l] = v;
        }
        System.arraycopy(keepA, 0, a, 0, rd);
        System.arraycopy(keepP, 0, pm, 0, rd * rd);
        return new double[][] {mean, variance};
    }

    /**
     * One step of the state on from the filtered state {@code a}, without noise, written into
     * {@code out}: the transition T of [3] {@code makeARIMA}.
     */
    void transition(double[] from, double[] out) {
        for (int i = 0; i < r; i++) {
            double tmp = i < r - 1 ? from[i + 1] : 0;
            if (i < p) {
                tmp += phi[i] * from[0];
            }
            out[i] = tmp;
        }
        if (d > 0) {
            for (int i = r + 1; i < rd; i++) {
                out[i] = from[i - 1];
            }
            out[r] = observe(from);
        }
    }

    /** The observation Z α: the ARMA state's first element plus Δ times the differencing states. */
    double observe(double[] state) {
        double v = state[0];
        for (int k : lags) {
            v += delta[k] * state[r + k];
        }
        return v;
    }

    /** The noise loading R = (1, θ₁ … θ_{r−1}, 0 … 0) at state element i. */
    double loading(int i) {
        if (i == 0) {
            return 1;
        }
        return i - 1 < q ? theta[i - 1] : 0;
    }

    int stateSize() {
        return rd;
    }

    private void predictState() {
        transition(a, anew);
    }

    /** P⁻ = T P Tᵀ + R Rᵀ, as [3] {@code ARIMA_Like} writes it (mm = T P first). */
    private void predictCovariance() {
        for (int i = 0; i < r; i++) {
            for (int j = 0; j < rd; j++) {
                double tmp = 0;
                if (i < p) {
                    tmp += phi[i] * pm[j];
                }
                if (i < r - 1) {
                    tmp += pm[(i + 1) * rd + j];
                }
                mm[i * rd + j] = tmp;
            }
        }
        if (d > 0) {
            for (int j = 0; j < rd; j++) {
                double tmp = pm[j];
                for (int k : lags) {
                    tmp += delta[k] * pm[(r + k) * rd + j];
                }
                mm[r * rd + j] = tmp;
            }
            for (int i = 1; i < d; i++) {
                System.arraycopy(pm, (r + i - 1) * rd, mm, (r + i) * rd, rd);
            }
        }
        // Pnew = mm Tᵀ: column i of Pnew is T applied to row … of mm
        for (int i = 0; i < r; i++) {
            for (int j = 0; j < rd; j++) {
                double tmp = 0;
                if (i < p) {
                    tmp += phi[i] * mm[j * rd];
                }
                if (i < r - 1) {
                    tmp += mm[j * rd + i + 1];
                }
                pnew[j * rd + i] = tmp;
            }
        }
        if (d > 0) {
            for (int j = 0; j < rd; j++) {
                double tmp = mm[j * rd];
                for (int k : lags) {
                    tmp += delta[k] * mm[j * rd + r + k];
                }
                pnew[j * rd + r] = tmp;
            }
            for (int i = 1; i < d; i++) {
                for (int j = 0; j < rd; j++) {
                    pnew[j * rd + r + i] = mm[j * rd + r + i - 1];
                }
            }
        }
        for (int i = 0; i <= q; i++) {
            double vi = i == 0 ? 1 : theta[i - 1];
            for (int j = 0; j <= q; j++) {
                pnew[i * rd + j] += vi * (j == 0 ? 1 : theta[j - 1]);
            }
        }
    }
}
