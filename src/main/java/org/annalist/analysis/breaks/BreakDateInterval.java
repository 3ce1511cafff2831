package org.annalist.analysis.breaks;

import java.util.Arrays;
import org.annalist.analysis.SeededNormals;

/**
 * A 95 % interval for a break date [1]: the error of the estimated date k̂ − k₀ behaves like the
 * minimiser of a two-sided Brownian motion with drift. Placing the break s periods after the true
 * date adds {@code |s|·Δ² + 2|Δ|·σ₂·B(s)} to the residual sum of squares (the misplaced periods
 * belong to the new regime, noise σ₂); s periods before, {@code |s|·Δ² + 2|Δ|·σ₁·B(s)}. With
 * σ₁ ≠ σ₂ the distribution is skewed, and so is the interval: k₀ lies in
 * {@code [k̂ − q₀.₉₇₅, k̂ − q₀.₀₂₅]}, rounded outwards to whole periods as strucchange's
 * {@code confint} does [2], and clipped to the room between the neighbouring breaks.
 *
 * <p>Bai gives the limit distribution in closed form; here the same process is simulated
 * ({@value #REPLICATIONS} seeded paths on a grid of {@value #STEPS_PER_PERIOD} steps per period),
 * which handles unequal variances without the closed form's special cases.
 *
 * <p>References:
 * <ol>
 * <li>J. Bai (1997), "Estimation of a Change Point in Multiple Regression Models", <i>Review of
 *     Economics and Statistics</i> 79(4), 551–563. doi:10.1162/003465397557132 (DOI from memory)</li>
 * <li>A. Zeileis, C. Kleiber, W. Krämer and K. Hornik (2003), "Testing and Dating of Structural
 *     Changes in Practice", <i>Computational Statistics &amp; Data Analysis</i> 44(1–2), 109–123.
 *     doi:10.1016/S0167-9473(03)00030-6</li>
 * </ol>
 */
public final class BreakDateInterval {

    public static final int REPLICATIONS = 2000;
    static final int STEPS_PER_PERIOD = 4;
    private static final long SEED = 19970801L;

    /** @param lower,upper offsets in whole periods from the estimated date (lower ≤ 0 ≤ upper) */
    public record Offsets(int lower, int upper) {
    }

    private BreakDateInterval() {
    }

    /**
     * @param change    Δ, the change in level at the break
     * @param sdBefore  σ₁, noise of the old regime
     * @param sdAfter   σ₂, noise of the new regime
     * @param roomLeft  how far back the date may lie (periods)
     * @param roomRight how far forward
     */
    public static Offsets of(double change, double sdBefore, double sdAfter, int roomLeft, int roomRight) {
        double d = Math.abs(change);
        if (d == 0) {
            return new Offsets(-roomLeft, roomRight);
        }
        // Beyond ~40 σ²/Δ² periods the drift has long won; the path need not go further.
        double scale = Math.max(sdBefore * sdBefore, sdAfter * sdAfter) / (d * d);
        int reach = (int) Math.ceil(40 * scale) + 2;
        int right = Math.min(roomLeft, reach);   // k̂ − k₀ > 0: the estimate lies after the truth
        int left = Math.min(roomRight, reach);
        double dt = 1.0 / STEPS_PER_PERIOD;
        double sqrtDt = Math.sqrt(dt);
        SeededNormals random = new SeededNormals(SEED);
        double[] error = new double[REPLICATIONS];
        for (int r = 0; r < REPLICATIONS; r++) {
            double best = 0;
            double at = 0;
            double brownian = 0;
            for (int step = 1; step <= right * STEPS_PER_PERIOD; step++) {
                brownian += sqrtDt * random.next();
                double c = step * dt * d * d + 2 * d * sdAfter * brownian;   // [1] |s|Δ² + 2|Δ|σ₂B(s)
                if (c < best) {
                    best = c;
                    at = step * dt;
                }
            }
            brownian = 0;
            for (int step = 1; step <= left * STEPS_PER_PERIOD; step++) {
                brownian += sqrtDt * random.next();
                double c = step * dt * d * d + 2 * d * sdBefore * brownian;   // [1] |s|Δ² + 2|Δ|σ₁B(s)
                if (c < best) {
                    best = c;
                    at = -step * dt;
                }
            }
            error[r] = at;
        }
        Arrays.sort(error);
        double q025 = error[(int) Math.floor(0.025 * (REPLICATIONS - 1))];
        double q975 = error[(int) Math.ceil(0.975 * (REPLICATIONS - 1))];
        // k₀ in [k̂ − q₀.₉₇₅, k̂ − q₀.₀₂₅], rounded outwards
        int lower = (int) Math.floor(-q975);
        int upper = (int) Math.ceil(-q025);
        return new Offsets(Math.max(-roomLeft, Math.min(0, lower)), Math.min(roomRight, Math.max(0, upper)));
    }
}
