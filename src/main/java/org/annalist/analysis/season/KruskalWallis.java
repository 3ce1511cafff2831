package org.annalist.analysis.season;

import java.util.ArrayList;
import java.util.List;
import org.annalist.analysis.Ranks;
import org.annalist.analysis.TestResult;
import org.apache.commons.math3.special.Gamma;

/**
 * The Kruskal–Wallis rank test that several groups come from one distribution: here, that the
 * detrended values of every season position are alike (no seasonal pattern).
 * {@code H = [12 / (N(N+1)) Σ_g R_g² / n_g − 3(N+1)] / [1 − Σ(t³ − t)/(N³ − N)]}, p from χ² with
 * G − 1 degrees of freedom, G the groups that hold a value ([1] eq. 1.1 and the ties correction
 * eq. 1.2). The χ² approximation is used at every sample size (no exact small-sample
 * distribution).
 *
 * <p>References:
 * <ol>
 * <li>W. H. Kruskal and W. A. Wallis (1952), "Use of Ranks in One-Criterion Variance Analysis",
 *     <i>Journal of the American Statistical Association</i> 47(260), 583–621.
 *     doi:10.1080/01621459.1952.10483441</li>
 * </ol>
 */
public final class KruskalWallis {

    private KruskalWallis() {
    }

    /**
     * @param values one value per observation; {@code NaN} are left out
     * @param groups the group (0 … groupCount − 1) of each value
     * @throws IllegalArgumentException with fewer than two non-empty groups
     */
    public static TestResult test(double[] values, int[] groups, int groupCount) {
        List<double[]> present = new ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            if (!Double.isNaN(values[i])) {
                present.add(new double[] {values[i], groups[i]});
            }
        }
        int n = present.size();
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = present.get(i)[0];
        }
        double[] ranks = Ranks.of(x);
        double[] rankSum = new double[groupCount];
        int[] size = new int[groupCount];
        for (int i = 0; i < n; i++) {
            int g = (int) present.get(i)[1];
            rankSum[g] += ranks[i];
            size[g]++;
        }
        int nonEmpty = 0;
        double sum = 0;
        for (int g = 0; g < groupCount; g++) {
            if (size[g] > 0) {
                nonEmpty++;
                sum += rankSum[g] * rankSum[g] / size[g];
            }
        }
        if (nonEmpty < 2) {
            throw new IllegalArgumentException("the Kruskal-Wallis test needs at least two groups with values");
        }
        // [1] eq. 1.1: H = 12/(N(N+1)) Σ R_g²/n_g − 3(N+1)
        double h = 12.0 / (n * (n + 1.0)) * sum - 3.0 * (n + 1);
        double ties = Ranks.tieSum(x);
        // [1] eq. 1.2: divided by 1 − Σ(t³ − t)/(N³ − N) for ties; all values tied gives H = 0 (our rule)
        double correction = 1 - ties / ((double) n * n * n - n);
        h = correction > 0 ? h / correction : 0;
        // [1] p from χ² with G − 1 degrees of freedom: Q(k/2, H/2) is its upper tail.
        // The upper tail directly, so that very small p-values do not round to zero.
        double p = h <= 0 ? 1 : Gamma.regularizedGammaQ((nonEmpty - 1) / 2.0, h / 2);
        return new TestResult(TestResult.Method.KRUSKAL_WALLIS, h, Math.max(0, Math.min(1, p)), n);
    }
}
