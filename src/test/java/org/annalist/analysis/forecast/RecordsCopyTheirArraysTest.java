package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * Every record of the package that holds arrays copies them in (a caller's later change does not
 * reach it) and out (a change to what it hands out does not reach it), paths of a forecast deeply.
 */
class RecordsCopyTheirArraysTest {

    @Test
    void parametersAndFitsKeepTheirArrays() {
        double[] initial = {100};
        EtsModel.Parameters p = new EtsModel.Parameters(0.3, 0, 0, 1, initial);
        initial[0] = -1;
        p.initial()[0] = -2;
        assertThat(p.initial()).containsExactly(100);

        double[] state = {5, 0, 1};
        EtsModel model = new EtsModel(EtsModel.Error.ADDITIVE, EtsModel.Trend.NONE, false, EtsModel.Season.NONE, 1,
                EtsModel.Estimator.QUASI_NEWTON);
        EtsModel.Fit fit = new EtsModel.Fit(model, p, 0, 0, 0, 0, 0, 1, 1, state, 10);
        state[0] = -1;
        fit.state()[0] = -2;
        assertThat(fit.state()).containsExactly(5, 0, 1);
        assertThat(fit.forecast(2)).containsExactly(5, 5);

        double[] index = {0.5, 1.5};
        Theta.Fit theta = new Theta.Fit(index, fit, 0, 10, false);
        index[0] = 7;
        theta.seasonalIndex()[1] = 7;
        assertThat(theta.seasonalIndex()).containsExactly(0.5, 1.5);
        assertThat(theta.deseasonalised()).isTrue();
    }

    @Test
    void predictionsMinimaAndLinearFormsKeepTheirArrays() {
        double[] mean = {1, 2};
        double[] variance = {3, 4};
        Prediction prediction = new Prediction(mean, variance);
        mean[0] = 9;
        variance[0] = 9;
        prediction.mean()[1] = 9;
        prediction.variance()[1] = 9;
        assertThat(prediction.mean()).containsExactly(1, 2);
        assertThat(prediction.variance()).containsExactly(3, 4);

        double[] point = {0.5, 0.25};
        BoundedQuasiNewton.Minimum minimum = new BoundedQuasiNewton.Minimum(point, 1, 3);
        point[0] = 9;
        minimum.point()[1] = 9;
        assertThat(minimum.point()).containsExactly(0.5, 0.25);

        double[][] f = {{1, 0}, {0, 1}};
        double[] g = {0.3, 0.1};
        double[] w = {1, 1};
        EtsLinearForm form = new EtsLinearForm(f, g, w);
        f[0][0] = 9;
        g[0] = 9;
        w[0] = 9;
        form.f()[1][1] = 9;
        form.g()[1] = 9;
        form.w()[1] = 9;
        assertThat(form.f()).isDeepEqualTo(new double[][] {{1, 0}, {0, 1}});
        assertThat(form.g()).containsExactly(0.3, 0.1);
        assertThat(form.w()).containsExactly(1, 1);
    }

    @Test
    void holtWintersFitsKeepTheirArrays() {
        double[] seasonal = {1, -1};
        double[] fitted = {Double.NaN, 2};
        HoltWinters.Fit fit = new HoltWinters.Fit(0.5, 0.1, 0.1, 3, 10, 1, seasonal, fitted,
                HoltWinters.Seasonality.ADDITIVE);
        seasonal[0] = 9;
        fitted[1] = 9;
        fit.seasonal()[1] = 9;
        fit.fitted()[0] = 9;
        assertThat(fit.seasonal()).containsExactly(1, -1);
        assertThat(fit.fitted()).containsExactly(Double.NaN, 2);
        assertThat(fit.forecast(2)).containsExactly(12, 11);
    }

    @Test
    void forecastsKeepTheirArraysAndPathsDeeply() {
        double[] mean = {1, 2};
        double[][] paths = {{1, 2}, {3, 4}};
        Outlook.Forecast forecast = new Outlook.Forecast(Outlook.Model.single(Outlook.Method.SEASONAL_NAIVE,
                Optional.empty(), false, false), mean, new double[] {0, 1}, new double[] {2, 3}, new double[] {-1, 0},
                new double[] {3, 4}, paths);
        mean[0] = 9;
        paths[0][0] = 9;
        paths[1] = new double[] {9, 9};
        forecast.mean()[1] = 9;
        forecast.lo80()[0] = 9;
        forecast.hi80()[0] = 9;
        forecast.lo95()[0] = 9;
        forecast.hi95()[0] = 9;
        forecast.paths()[0][1] = 9;
        assertThat(forecast.mean()).containsExactly(1, 2);
        assertThat(forecast.lo80()).containsExactly(0, 1);
        assertThat(forecast.hi80()).containsExactly(2, 3);
        assertThat(forecast.lo95()).containsExactly(-1, 0);
        assertThat(forecast.hi95()).containsExactly(3, 4);
        assertThat(forecast.paths()).isDeepEqualTo(new double[][] {{1, 2}, {3, 4}});
        assertThat(forecast.sumOver(0, 2)[0]).isEqualTo(3);
    }
}
