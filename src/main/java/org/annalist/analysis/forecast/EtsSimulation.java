package org.annalist.analysis.forecast;

/**
 * Future sample paths of an ETS model from a final state: each step draws y = ŷ + σz (additive
 * error) or ŷ(1 + σz) (multiplicative) with z from given standard normal shocks, then updates the
 * state with y — the simulation of the forecast distribution [1, §6.1], used where no closed form
 * exists and for sums over several periods.
 *
 * <h2>References</h2>
 * <ol>
 * <li>Hyndman, R. J., Koehler, A. B., Ord, J. K. &amp; Snyder, R. D. (2008). <i>Forecasting with
 * Exponential Smoothing: The State Space Approach</i>. Springer. DOI 10.1007/978-3-540-71918-2.</li>
 * </ol>
 */
final class EtsSimulation {

    private EtsSimulation() {
    }

    /**
     * @param state  the final state {level, trend, s_1 … s_m}, only read
     * @param shocks standard normal draws, one row per path, one column per step
     */
    static double[][] paths(EtsModel model, double[] state, EtsModel.Parameters p, double sigma2, double[][] shocks) {
        int m = model.seasonSlots();
        double phi = model.damped() ? p.phi() : 1;
        double sigma = Math.sqrt(sigma2);
        boolean additive = model.error() == EtsModel.Error.ADDITIVE;
        double[][] out = new double[shocks.length][];
        double[] lb = new double[2];
        double[] s = new double[m];
        for (int path = 0; path < shocks.length; path++) {
            lb[0] = state[0];
            lb[1] = state[1];
            System.arraycopy(state, 2, s, 0, m);
            double[] y = new double[shocks[path].length];
            for (int i = 0; i < y.length; i++) {
                double f = EtsFilter.point(model, lb[0], lb[1], s, phi, 1);
                double z = shocks[path][i];
                y[i] = additive ? f + sigma * z : f * (1 + sigma * z); // [1] §6.1
                EtsFilter.advance(model, lb, s, phi, p, y[i]);
            }
            out[path] = y;
        }
        return out;
    }
}
