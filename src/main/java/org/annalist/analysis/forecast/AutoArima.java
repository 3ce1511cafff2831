package org.annalist.analysis.forecast;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

/**
 * The automatic seasonal ARIMA of Hyndman &amp; Khandakar [1, §3.2], as the forecast package 8.20's
 * {@code auto.arima} runs it with its defaults [2]: D and then d from {@link UnitRootTests}; the
 * stepwise search over p, q ≤ 5, P, Q ≤ 2 (p, q ≤ m − 1 when a seasonal AR or MA term is allowed,
 * all at most a third of the series), starting from (2,d,2)(1,D,1), the null model, (1,d,0)(1,D,0)
 * and (0,d,1)(0,D,1) (and the null model without constant), then moving to the first neighbour —
 * P ± 1, Q ± 1, both, then p ± 1, q ± 1, both, then the constant switched — that lowers the AICc,
 * until none does or 94 models were fitted. A constant (mean when d + D = 0, drift when d + D = 1)
 * is allowed only with at most one difference. A model is refused when a root of its AR or MA
 * polynomial lies within 1.01 of the unit circle or its estimates' variances are not all
 * non-negative, as R refuses them.
 *
 * <p>Estimation during the search: as R, with {@code approximation = n > 150 || m > 12}, the search
 * fits by conditional sum of squares and compares offset + n* log σ̂²_CSS + 2k (the offset makes it
 * comparable with the ML AIC of the differenced null model), then refits the models in order of
 * that criterion by exact ML (CSS start) until one is accepted; otherwise every model is fitted by
 * CSS-started exact ML. Not done, as in R's defaults not needed: Box–Cox, regressors, the
 * exhaustive search. A constant series, or one whose differenced values are constant, gets no
 * model here (R fits a model with fixed coefficients there).
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J. &amp; Khandakar, Y. (2008). Automatic time series forecasting: the forecast
 * package for R. <i>Journal of Statistical Software</i> 27(3), 1–22. DOI 10.18637/jss.v027.i03.</li>
 * <li>forecast 8.20 for R, {@code auto.arima} and {@code myarima} (read from the installed package).</li>
 * </ol>
 */
public final class AutoArima {

    /** [2] defaults: max.p, max.q, max.P, max.Q, start.p, start.q, start.P, start.Q, nmodels. */
    private static final int MAX_P = 5;
    private static final int MAX_Q = 5;
    private static final int MAX_SEASONAL_P = 2;
    private static final int MAX_SEASONAL_Q = 2;
    private static final int START_P = 2;
    private static final int START_Q = 2;
    private static final int START_SEASONAL_P = 1;
    private static final int START_SEASONAL_Q = 1;
    private static final int MAX_MODELS = 94;
    /** [2] myarima: a root closer to the unit circle than this refuses the model. */
    private static final double ROOT_MARGIN = 1.01;
    /** [2]: series longer than this are searched by CSS. */
    private static final int APPROXIMATION_LENGTH = 150;
    /** [2]: periods above this are searched by CSS. */
    private static final int APPROXIMATION_PERIOD = 12;

    /**
     * One model tried: its orders and criterion (infinite when refused or not fitted), and whether
     * its roots and variances were checked (see {@link #evaluate}).
     */
    private record Tried(ArimaOrder order, double ic, Arima.Fit fit, boolean checked) {

        /** R's criterion: infinite when the model fails the root or variance check. */
        Tried checkedNow() {
            if (checked || !(ic < Double.POSITIVE_INFINITY)) {
                return this;
            }
            return new Tried(order, refused(fit) ? Double.POSITIVE_INFINITY : ic, fit, true);
        }
    }

    /** [2] myarima: a root within {@value #ROOT_MARGIN} of the unit circle or a negative variance refuses the model. */
    private static boolean refused(Arima.Fit fit) {
        return fit.smallestRoot() < ROOT_MARGIN || !fit.variancesValid();
    }

    private final double[] y;
    private final int n;
    private final boolean approximation;
    private final boolean refit;
    private final double offset;
    private final List<Tried> results = new ArrayList<>();

    private AutoArima(double[] y, boolean approximation, boolean refit, double offset) {
        this.y = y;
        this.n = y.length;
        this.approximation = approximation;
        this.refit = refit;
        this.offset = offset;
    }

    /**
     * The model auto.arima chooses for {@code y} with {@code period} values per cycle (1: non-seasonal).
     *
     * @return empty when no model can be fitted: fewer than four values, non-finite values, a
     * constant series or constant differences, or every model refused
     */
    public static Optional<Arima.Fit> fit(double[] y, int period) {
        return fit(y, period, y.length > APPROXIMATION_LENGTH || period > APPROXIMATION_PERIOD);
    }

    /**
     * As {@link #fit(double[], int)} with R's {@code approximation} argument set: {@code true}
     * searches by CSS and refits by exact ML (about ten times faster on a seasonal series of 144
     * values), {@code false} searches by exact ML.
     */
    public static Optional<Arima.Fit> fit(double[] y, int period, boolean approximation) {
        return search(y, period, approximation, approximation);
    }

    /**
     * The stepwise search by conditional sum of squares with the winner kept as fitted, not refitted
     * by exact likelihood: R's {@code auto.arima(y, approximation = TRUE)} without its final ML step,
     * so that the coefficients are CSS estimates (as {@code Arima(method = "CSS")} gives them). The
     * outlook's choice: the exact refit of a large seasonal model costs seconds (a state of some 40
     * elements filtered hundreds of times), the conditional fit milliseconds, and the forecasts of
     * the two differ little beside their intervals' width.
     */
    public static Optional<Arima.Fit> fitConditional(double[] y, int period) {
        return search(y, period, true, false);
    }

    /**
     * The outlook's search: R's exact-likelihood search where R's default makes it (n ≤ 150 and
     * m ≤ 12), the conditional search of {@link #fitConditional} where R's default approximates.
     * With the exact likelihood computed on the differenced series ({@link ArmaLikelihood}) the
     * exact search costs some 100 ms on a seasonal monthly series of 144 values (it cost seconds);
     * R's default for longer series, the conditional search with exact refits, is left out: on
     * seasonal series the refits of models R then refuses (a seasonal MA root at the unit circle)
     * cost some 35 ms per 20-year monthly series, beyond the outlook's budget, and no M3 monthly or
     * quarterly series is long enough to show what they would gain. On M3 (M3 benchmark, December
     * 2026) the exact search on seasonal data took the outlook's mean MASE on the 1,428 monthly
     * series from 0.830 to 0.824 (sMAPE 13.76 → 13.56, 95 % coverage 0.966 → 0.969) at some 35 ms
     * more CPU per series, and on the 756 quarterly series from 1.060 to 1.061 (sMAPE 9.04 → 9.00)
     * at some 6 ms more: one rule for every period, R's. Earlier, on the 645 yearly series, R's
     * search chose R's order for every series, the conditional one for 81 %, and the outlook's
     * MASE went from 2.668 to 2.662.
     */
    public static Optional<Arima.Fit> fitForOutlook(double[] y, int period) {
        boolean approximation = y.length > APPROXIMATION_LENGTH || period > APPROXIMATION_PERIOD;
        return approximation ? fitConditional(y, period) : fit(y, period, false);
    }

    private static Optional<Arima.Fit> search(double[] y, int period, boolean approximation, boolean refit) {
        int n = y.length;
        if (n < 4 || period < 1) {
            return Optional.empty();
        }
        for (double v : y) {
            if (!Double.isFinite(v)) {
                return Optional.empty();
            }
        }
        if (UnitRootTests.isConstant(y)) {
            return Optional.empty();
        }
        int m = period;
        int maxP = Math.min(MAX_P, n / 3);
        int maxQ = Math.min(MAX_Q, n / 3);
        int maxSP = Math.min(MAX_SEASONAL_P, n / 3 / m);
        int maxSQ = Math.min(MAX_SEASONAL_Q, n / 3 / m);
        int seasonalD;
        if (m == 1) {
            seasonalD = 0;
            maxSP = 0;
            maxSQ = 0;
        } else if (n <= 2 * m) {
            seasonalD = 0;
        } else {
            seasonalD = UnitRootTests.nsdiffs(y, m);
        }
        double[] dx = seasonalD > 0 ? UnitRootTests.difference(y, m) : y;
        int d = UnitRootTests.ndiffs(dx);
        for (int i = 0; i < d; i++) {
            dx = UnitRootTests.difference(dx, 1);
        }
        if (dx.length == 0 || UnitRootTests.isConstant(dx)) {
            return Optional.empty();
        }
        if (m > 1) {
            if (maxSP > 0) {
                maxP = Math.min(maxP, m - 1);
            }
            if (maxSQ > 0) {
                maxQ = Math.min(maxQ, m - 1);
            }
        }
        double offset = 0;
        if (approximation) {
            ArimaOrder nullOrder = new ArimaOrder(0, d, 0, 0, seasonalD, 0, m, d + seasonalD == 0);
            Optional<Arima.Fit> f = Arima.fit(y, nullOrder, Arima.Method.CSS_ML);
            if (f.isPresent()) {
                offset = -2 * f.get().logLik() - n * Math.log(f.get().rawSigma2());
            }
        }
        AutoArima search = new AutoArima(y, approximation, refit, offset);
        return search.stepwise(d, seasonalD, m, maxP, maxQ, maxSP, maxSQ);
    }

    private Optional<Arima.Fit> stepwise(int d, int seasonalD, int m, int maxP, int maxQ, int maxSP, int maxSQ) {
        boolean allowDrift = d + seasonalD == 1;
        boolean allowMean = d + seasonalD == 0;
        boolean constant = allowDrift || allowMean;
        int startP = START_P;
        int startQ = START_Q;
        int startSP = START_SEASONAL_P;
        int startSQ = START_SEASONAL_Q;
        if (n < 10) {
            startP = Math.min(startP, 1);
            startQ = Math.min(startQ, 1);
            startSP = 0;
            startSQ = 0;
        }
        int p = Math.min(startP, maxP);
        int q = Math.min(startQ, maxQ);
        int sp = Math.min(startSP, maxSP);
        int sq = Math.min(startSQ, maxSQ);
        ArimaOrder base = new ArimaOrder(0, d, 0, 0, seasonalD, 0, m, constant);
        Tried best = tryModel(base.withArma(p, q, sp, sq, constant), Double.POSITIVE_INFINITY);
        Tried t = tryModel(base.withArma(0, 0, 0, 0, constant), best.ic());
        if (t.ic() < best.ic()) {
            best = t;
            p = q = sp = sq = 0;
        }
        if (maxP > 0 || maxSP > 0) {
            int np = maxP > 0 ? 1 : 0;
            int nsp = m > 1 && maxSP > 0 ? 1 : 0;
            t = tryModel(base.withArma(np, 0, nsp, 0, constant), best.ic());
            if (t.ic() < best.ic()) {
                best = t;
                p = np;
                sp = nsp;
                q = sq = 0;
            }
        }
        if (maxQ > 0 || maxSQ > 0) {
            int nq = maxQ > 0 ? 1 : 0;
            int nsq = m > 1 && maxSQ > 0 ? 1 : 0;
            t = tryModel(base.withArma(0, nq, 0, nsq, constant), best.ic());
            if (t.ic() < best.ic()) {
                best = t;
                p = sp = 0;
                sq = nsq;
                q = nq;
            }
        }
        if (constant) {
            t = tryModel(base.withArma(0, 0, 0, 0, false), best.ic());
            if (t.ic() < best.ic()) {
                best = t;
                p = q = sp = sq = 0;
            }
        }
        // [2]: the neighbours in R's order; the first that improves becomes the current model
        int[][] moves = {
            {0, 0, -1, 0}, {0, 0, 0, -1}, {0, 0, 1, 0}, {0, 0, 0, 1},
            {0, 0, -1, -1}, {0, 0, -1, 1}, {0, 0, 1, -1}, {0, 0, 1, 1},
            {-1, 0, 0, 0}, {0, -1, 0, 0}, {1, 0, 0, 0}, {0, 1, 0, 0},
            {-1, -1, 0, 0}, {-1, 1, 0, 0}, {1, -1, 0, 0}, {1, 1, 0, 0}};
        int startK = 0;
        while (startK < results.size() && results.size() < MAX_MODELS) {
            startK = results.size();
            boolean moved = false;
            for (int[] mv : moves) {
                int np = p + mv[0];
                int nq = q + mv[1];
                int nsp = sp + mv[2];
                int nsq = sq + mv[3];
                if (np < 0 || nq < 0 || nsp < 0 || nsq < 0 || np > maxP || nq > maxQ || nsp > maxSP || nsq > maxSQ) {
                    continue;
                }
                ArimaOrder candidate = base.withArma(np, nq, nsp, nsq, constant);
                if (seen(candidate)) {
                    continue;
                }
                if (results.size() + 1 > MAX_MODELS) {
                    results.add(new Tried(candidate, Double.NaN, null, true)); // R counts it, then stops
                    moved = true;
                    break;
                }
                t = tryModel(candidate, best.ic());
                if (t.ic() < best.ic()) {
                    best = t;
                    p = np;
                    q = nq;
                    sp = nsp;
                    sq = nsq;
                    moved = true;
                    break;
                }
            }
            if (moved) {
                continue;
            }
            if (allowDrift || allowMean) {
                ArimaOrder switched = base.withArma(p, q, sp, sq, !constant);
                if (!seen(switched)) {
                    if (results.size() + 1 > MAX_MODELS) {
                        results.add(new Tried(switched, Double.NaN, null, true));
                        continue;
                    }
                    t = tryModel(switched, best.ic());
                    if (t.ic() < best.ic()) {
                        best = t;
                        constant = !constant;
                    }
                }
            }
        }
        if (approximation && refit && best.fit() != null) {
            best = refitted(best.order());
        }
        return best.ic() < Double.POSITIVE_INFINITY ? Optional.ofNullable(best.fit()) : Optional.empty();
    }

    /**
     * [2]: the models refitted by ML in order of the approximate criterion, those refused by the
     * check after all the others in the order tried, until one is accepted. The check of a model not
     * checked during the search is made when the order reaches it: R checks every model as it fits
     * it, to the same effect, but the check's numerical Hessian costs as much as the fit.
     */
    private Tried refitted(ArimaOrder fallback) {
        List<Tried> ordered = new ArrayList<>(results.stream().filter(r -> !Double.isNaN(r.ic())).toList());
        ordered.sort(Comparator.comparingDouble(Tried::ic)); // stable: the refused keep the order tried
        List<Tried> refitOrder = new ArrayList<>();
        List<Tried> refusedLast = new ArrayList<>();
        for (Tried r : ordered) {
            (r.checkedNow().ic() < Double.POSITIVE_INFINITY ? refitOrder : refusedLast).add(r);
        }
        refusedLast.sort(Comparator.comparingInt(results::indexOf));
        refitOrder.addAll(refusedLast);
        for (Tried r : refitOrder) {
            Tried refit = evaluate(r.order(), false, Double.POSITIVE_INFINITY);
            if (refit.ic() < Double.POSITIVE_INFINITY) {
                return refit;
            }
        }
        return new Tried(fallback, Double.POSITIVE_INFINITY, null, true);
    }

    private boolean seen(ArimaOrder order) {
        for (Tried r : results) {
            if (r.order().equals(order)) {
                return true;
            }
        }
        return false;
    }

    private Tried tryModel(ArimaOrder order, double bestIc) {
        Tried t = evaluate(order, approximation, bestIc);
        results.add(t);
        return t;
    }

    /** [2] {@code myarima}: the fit and its criterion, infinite when it fails or is refused. */
    private Tried evaluate(ArimaOrder order, boolean css, double bestIc) {
        Optional<Arima.Fit> found = Arima.fit(y, order, css ? Arima.Method.CSS : Arima.Method.CSS_ML);
        if (found.isEmpty()) {
            return new Tried(order, Double.POSITIVE_INFINITY, null, true);
        }
        Arima.Fit fit = found.get();
        int k = fit.parameterCount();
        int nStar = fit.effectiveLength();
        double aic = css ? offset + nStar * Math.log(fit.rawSigma2()) + 2 * k : fit.aic();
        double ic = n <= 3 ? aic : aic + 2.0 * k * (k + 1) / (nStar - k - 1);
        // the root and variance checks only matter where the model would be chosen (they cannot make a
        // worse one better) or where the criterion orders the ML refits: checked there, the latter when
        // the refits reach the model (refitted), as R checks every model
        if (Double.isNaN(ic)) {
            return new Tried(order, Double.POSITIVE_INFINITY, fit, true);
        }
        if (ic < bestIc) {
            return new Tried(order, refused(fit) ? Double.POSITIVE_INFINITY : ic, fit, true);
        }
        return new Tried(order, ic, fit, false);
    }
}
