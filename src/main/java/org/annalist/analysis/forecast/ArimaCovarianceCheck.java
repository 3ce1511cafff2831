package org.annalist.analysis.forecast;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;

/**
 * The forecast package's check that an ARIMA estimate's covariance is usable [2] ({@code checkarima}):
 * the covariance of the estimates is R's {@code arima} one [1], (n H)⁻¹ from the numerical Hessian of
 * the objective, carried through the Jacobian of the AR transformation when the search ran on
 * transformed coefficients ({@code ARIMA_Gradtrans}). Split from {@link ArimaEstimation}, which asks
 * for it on demand.
 *
 * <h2>References</h2>
 * <ol>
 * <li>R Core Team, {@code src/library/stats/R/arima.R} and {@code src/library/stats/src/arima.c} (R 4.2).</li>
 * <li>Hyndman, R. J. &amp; Khandakar, Y. (2008). Automatic time series forecasting: the forecast
 * package for R. <i>Journal of Statistical Software</i> 27(3), 1–22. DOI 10.18637/jss.v027.i03.</li>
 * </ol>
 */
final class ArimaCovarianceCheck {

    /** R's finite-difference step of {@code ARIMA_Gradtrans}. */
    private static final double GRADTRANS_STEP = 1e-3;
    /** R's {@code solve} refuses a matrix whose reciprocal condition number is below the machine epsilon. */
    private static final double SINGULAR = Math.ulp(1.0);

    private ArimaCovarianceCheck() {
    }

    /** [1] {@code ARIMA_Gradtrans}: the Jacobian of the AR transformation at {@code raw} by forward differences. */
    static double[][] gradTransform(ArimaOrder order, double[] raw) {
        int npar = raw.length;
        double[][] a = new double[npar][npar];
        for (int i = 0; i < npar; i++) {
            a[i][i] = 1;
        }
        jacobianBlock(raw, 0, order.p(), a);
        jacobianBlock(raw, order.p() + order.q(), order.seasonalP(), a);
        return a;
    }

    private static void jacobianBlock(double[] raw, int from, int length, double[][] a) {
        if (length == 0) {
            return;
        }
        double[] w1 = new double[length];
        double[] w2 = new double[length];
        double[] w3 = new double[length];
        System.arraycopy(raw, from, w1, 0, length);
        ArimaPolynomials.partrans(length, w1, 0, w2, 0);
        for (int i = 0; i < length; i++) {
            w1[i] += GRADTRANS_STEP;
            ArimaPolynomials.partrans(length, w1, 0, w3, 0);
            for (int j = 0; j < length; j++) {
                a[from + i][from + j] = (w3[j] - w2[j]) / GRADTRANS_STEP;
            }
            w1[i] -= GRADTRANS_STEP;
        }
    }

    /**
     * Whether diag(Aᵀ (n H)⁻¹ A) ≥ 0, the forecast package's {@code checkarima} (it rejects a model whose
     * standard errors are NaN); a singular Hessian fails as R's {@code solve} does.
     *
     * @param a the Jacobian of the transformation, or null without one
     */
    static boolean varianceValid(double[][] hessian, int nUsed, double[][] a) {
        int k = hessian.length;
        RealMatrix h = new Array2DRowRealMatrix(hessian).scalarMultiply(nUsed);
        double[] singular = new SingularValueDecomposition(h).getSingularValues();
        if (!(singular[k - 1] >= SINGULAR * singular[0])) {
            return false; // R's solve: "system is computationally singular"
        }
        LUDecomposition lu = new LUDecomposition(h, 0);
        RealMatrix inverse = lu.getSolver().getInverse();
        RealMatrix variance = a == null ? inverse
                : new Array2DRowRealMatrix(a).transpose().multiply(inverse).multiply(new Array2DRowRealMatrix(a));
        for (int i = 0; i < k; i++) {
            if (!(variance.getEntry(i, i) >= 0)) {
                return false;
            }
        }
        return true;
    }
}
