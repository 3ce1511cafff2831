package org.annalist.analysis.forecast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Map;
import org.annalist.analysis.Reference;
import org.junit.jupiter.api.Test;

/**
 * The automatic ARIMA and its unit-root steps against R 4.2.2 + forecast 8.20 with default settings
 * ({@code arima_auto.csv}: {@code auto.arima(y)}; {@code arima_unitroot.csv}:
 * {@code urca::ur.kpss(y, type = "mu", use.lag = trunc(3 * sqrt(n) / 13))}, {@code nsdiffs(y)},
 * {@code forecast:::seas.heuristic(y)}, {@code ndiffs(y or diff(y, lag = m))}; both made by
 * {@code make-arima-fixtures.R}).
 */
class AutoArimaTest {

    private static final String[] SERIES = {"AirPassengers", "UKgas", "co2", "nottem", "Nile", "sunspot.year",
        "USAccDeaths", "ldeaths", "lynx", "WWWusage", "austres", "JohnsonJohnson", "UKgas40"};
    /** {@code auto.arima(y, approximation = TRUE)}: the CSS search where R's default would search by ML. */
    private static final String[] APPROXIMATED = {"AirPassengers", "USAccDeaths", "ldeaths", "UKgas", "lynx"};

    private static double[] series(String name) {
        if (name.equals("UKgas40")) { // the script's window(UKgas, start = 1977): the last 40 quarters
            double[] all = ArimaTest.series("UKgas");
            return java.util.Arrays.copyOfRange(all, all.length - 40, all.length);
        }
        return ArimaTest.series(name);
    }

    /** KPSS statistic to 1e-9 relative, the seasonal strength to 1e-6, and R's ndiffs / nsdiffs exactly. */
    @Test
    void unitRootStepsAreRs() {
        Reference ref = Reference.csv("arima_unitroot.csv");
        for (String name : SERIES) {
            Map<String, String> row = ref.row(name);
            double[] y = series(name);
            int m = Integer.parseInt(row.get("period"));
            double kpss = Double.parseDouble(row.get("kpss"));
            assertThat(UnitRootTests.kpss(y)).as(name + " KPSS").isCloseTo(kpss, within(1e-9 * kpss));
            if (!row.get("seas_strength").isEmpty()) {
                double s = Double.parseDouble(row.get("seas_strength"));
                assertThat(UnitRootTests.seasonalStrength(y, m)).as(name + " strength").isCloseTo(s, within(1e-6));
            }
            int seasonalD = m > 1 ? UnitRootTests.nsdiffs(y, m) : 0;
            assertThat(seasonalD).as(name + " nsdiffs").isEqualTo(Integer.parseInt(row.get("nsdiffs")));
            double[] dx = seasonalD > 0 ? UnitRootTests.difference(y, m) : y;
            assertThat(UnitRootTests.ndiffs(dx)).as(name + " ndiffs").isEqualTo(Integer.parseInt(row.get("ndiffs")));
        }
    }

    /**
     * The same model as R on every reference series, by R's default rule and with the CSS search
     * forced on five of them, with R's AICc to 1e-4 relative where the orders agree (R's BFGS and
     * ours are the same algorithm; the tolerance covers rounding).
     */
    @Test
    void chosenModelsAreRs() {
        Reference ref = Reference.csv("arima_auto.csv");
        int same = 0;
        StringBuilder table = new StringBuilder();
        java.util.List<String> names = new java.util.ArrayList<>(java.util.List.of(SERIES));
        for (String a : APPROXIMATED) {
            names.add(a + "~approximation");
        }
        for (String name : names) {
            Map<String, String> row = ref.row(name);
            int m = Integer.parseInt(row.get("period"));
            boolean approximated = name.endsWith("~approximation");
            double[] y = series(name.replace("~approximation", ""));
            long start = System.nanoTime();
            Arima.Fit fit = (approximated ? AutoArima.fit(y, m, true) : AutoArima.fit(y, m)).orElseThrow();
            double ms = (System.nanoTime() - start) / 1e6;
            ArimaOrder r = new ArimaOrder(i(row, "p"), i(row, "d"), i(row, "q"), i(row, "P"), i(row, "D"), i(row, "Q"),
                    m, i(row, "constant") == 1);
            boolean agree = normalise(fit.order()).equals(normalise(r));
            same += agree ? 1 : 0;
            double aicc = Double.parseDouble(row.get("aicc"));
            table.append(String.format("| %s | %s%s | %s%s | %.4f | %.4f | %.0f ms |%n", name, r.label(), r.constant() ? " c" : "",
                    fit.label(), fit.order().constant() ? " c" : "", aicc, fit.aicc(), ms));
            if (agree) {
                assertThat(fit.aicc()).as(name + " AICc").isCloseTo(aicc, within(1e-4 * Math.abs(aicc)));
            }
        }
        System.out.print(table);
        assertThat(same).as("series on which our order is R's").isEqualTo(names.size());
    }

    /**
     * The outlook's search on non-seasonal data is R's default one: on four M3 yearly series
     * (Makridakis &amp; Hibon 2000, the competition's training values) where the conditional search
     * chose another order, R's order and its AICc to 1e-4 relative ({@code arima_m3_yearly.csv}: R
     * 4.2.2, forecast 8.20, {@code auto.arima(y)}, copied from {@code dev/m3/r-arima-yearly.csv},
     * made by {@code dev/m3/r-arima-orders.R}).
     */
    @Test
    void outlookSearchOnYearlySeriesChoosesRsOrder() {
        Reference ref = Reference.csv("arima_m3_yearly.csv");
        for (String name : new String[] {"N0022", "N0028", "N0033", "N0034"}) {
            Map<String, String> row = ref.row(name);
            double[] y = java.util.Arrays.stream(row.get("values").split(";")).mapToDouble(Double::parseDouble).toArray();
            ArimaOrder r = ArimaOrder.of(i(row, "p"), i(row, "d"), i(row, "q"), i(row, "constant") == 1);
            Arima.Fit fit = AutoArima.fitForOutlook(y, 1).orElseThrow();
            assertThat(normalise(fit.order())).as(name + " order").isEqualTo(normalise(r));
            double aicc = Double.parseDouble(row.get("aicc"));
            assertThat(fit.aicc()).as(name + " AICc").isCloseTo(aicc, within(1e-4 * Math.abs(aicc)));
            assertThat(AutoArima.fitConditional(y, 1).orElseThrow().order()).as(name + " conditional order")
                    .isNotEqualTo(fit.order());
        }
    }

    /** The constant flag only matters with at most one difference. */
    private static ArimaOrder normalise(ArimaOrder o) {
        return o.differences() > 1 ? o.withArma(o.p(), o.q(), o.seasonalP(), o.seasonalQ(), false) : o;
    }

    private static int i(Map<String, String> row, String key) {
        return Integer.parseInt(row.get(key));
    }
}
