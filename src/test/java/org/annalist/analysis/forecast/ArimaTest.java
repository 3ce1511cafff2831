package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import org.annalist.analysis.Reference;
import org.junit.jupiter.api.Test;

/**
 * ARIMA with fixed orders against R 4.2.2 + forecast 8.20, {@code arima_fixed.json} (made by
 * {@code make-arima-fixtures.R}; each case's {@code call} field is the R call:
 * {@code Arima(y, order, seasonal, include.mean / include.drift, method)} and {@code forecast(fit, h)}).
 */
class ArimaTest {

    /** The brief's tolerance for values computed from the same coefficients. */
    private static final double EXACT = 1e-6;

    static double[] series(String name) {
        return switch (name) {
            case "AirPassengers", "UKgas", "co2", "nottem", "Nile", "sunspot.year" -> Reference.dataset(name + ".csv");
            default -> Reference.dataset("arima_series_" + name + ".csv");
        };
    }

    static List<JsonNode> cases() throws IOException {
        try (InputStream in = ArimaTest.class.getResourceAsStream("/reference/arima_fixed.json")) {
            List<JsonNode> list = new ArrayList<>();
            new ObjectMapper().readTree(in).get("cases").forEach(list::add);
            return list;
        }
    }

    static ArimaOrder order(JsonNode c) {
        JsonNode o = c.get("order");
        JsonNode s = c.get("seasonal");
        return new ArimaOrder(o.get(0).asInt(), o.get(1).asInt(), o.get(2).asInt(), s.get(0).asInt(), s.get(1).asInt(),
                s.get(2).asInt(), c.get("period").asInt(), c.get("constant").asBoolean());
    }

    static Arima.Method method(JsonNode c) {
        return c.get("method").asText().equals("CSS") ? Arima.Method.CSS : Arima.Method.ML;
    }

    static double[] array(JsonNode node) {
        double[] v = new double[node.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = node.get(i).asDouble();
        }
        return v;
    }

    private static void assertRelative(String what, double[] ours, double[] r, double tolerance) {
        assertThat(ours).as(what).hasSameSizeAs(r);
        for (int i = 0; i < r.length; i++) {
            assertThat(ours[i]).as(what + "[" + i + "]").isCloseTo(r[i], within(tolerance * Math.max(1, Math.abs(r[i]))));
        }
    }

    /** At R's coefficients, our likelihood, σ², AICc and forecasts with 80/95 % limits are R's to 1e-6 relative. */
    @Test
    void atRsCoefficientsLikelihoodSigmaAiccAndForecastsAreRs() throws IOException {
        for (JsonNode c : cases()) {
            String name = c.get("name").asText();
            double[] y = series(c.get("series").asText());
            Arima.Fit fit = Arima.withCoefficients(y, order(c), method(c), array(c.get("coef"))).orElseThrow();
            assertThat(fit.logLik()).as(name + " loglik").isCloseTo(c.get("loglik").asDouble(),
                    within(EXACT * Math.abs(c.get("loglik").asDouble())));
            assertThat(fit.sigma2()).as(name + " sigma2").isCloseTo(c.get("sigma2").asDouble(),
                    within(EXACT * c.get("sigma2").asDouble()));
            if (c.get("aicc").isNumber()) {
                assertThat(fit.aicc()).as(name + " aicc").isCloseTo(c.get("aicc").asDouble(),
                        within(EXACT * Math.abs(c.get("aicc").asDouble())));
            }
            int h = c.get("mean").size();
            Prediction p = fit.predict(h);
            double[][] eighty = p.interval(0.80);
            double[][] ninetyFive = p.interval(0.95);
            assertRelative(name + " mean", p.mean(), array(c.get("mean")), EXACT);
            assertRelative(name + " lower80", eighty[0], array(c.get("lower80")), EXACT);
            assertRelative(name + " upper80", eighty[1], array(c.get("upper80")), EXACT);
            assertRelative(name + " lower95", ninetyFive[0], array(c.get("lower95")), EXACT);
            assertRelative(name + " upper95", ninetyFive[1], array(c.get("upper95")), EXACT);
        }
    }

    /**
     * Our own estimation reaches R's optimum: log-likelihood to 1e-6 relative (coefficients 1e-3,
     * forecasts 1e-4, since R's BFGS stops at reltol 1.5e-8 of the objective, which leaves the
     * coefficients determined to about its square root).
     */
    @Test
    void fittingReachesRsOptimum() throws IOException {
        for (JsonNode c : cases()) {
            String name = c.get("name").asText();
            double[] y = series(c.get("series").asText());
            Arima.Fit fit = Arima.fit(y, order(c), method(c)).orElseThrow();
            System.out.printf("%-34s loglik R %.8f ours %.8f  aicc R %s ours %.6f%n", name, c.get("loglik").asDouble(),
                    fit.logLik(), c.has("aicc") ? c.get("aicc").asText() : "NA", fit.aicc());
            assertThat(fit.logLik()).as(name + " loglik").isCloseTo(c.get("loglik").asDouble(),
                    within(EXACT * Math.abs(c.get("loglik").asDouble())));
            assertRelative(name + " coef", fit.coefficients(), array(c.get("coef")), 1e-3);
            assertRelative(name + " mean", fit.forecast(c.get("mean").size()), array(c.get("mean")), 1e-4);
        }
    }
}
