package org.annalist.analysis.forecast;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.StringJoiner;

/**
 * A development tool, not part of the analysis: the orders our automatic ARIMA chooses for every
 * series of an M3 training file, to set beside R's ({@code dev/m3/r-arima-orders.R}). For each
 * series it writes the seasonal strength and the D and d the unit-root tests take, then for both
 * searches — {@code exact} ({@link AutoArima#fit(double[], int)}, R's defaults) and {@code conditional}
 * ({@link AutoArima#fitConditional}, the outlook's) — the chosen order, its constant, AICc,
 * log-likelihood and point forecasts over {@code h} steps (separated by ';').
 *
 * <p>Usage: {@code java -cp target/annalist.jar:target/test-classes
 * org.annalist.analysis.forecast.ArimaOrdersDump FOLDER quarterly OUT.csv [every]}; reads
 * {@code FOLDER/m3-<freq>-train.csv} only and writes {@code OUT.csv}.
 */
public final class ArimaOrdersDump {

    private ArimaOrdersDump() {
    }

    public static void main(String[] args) throws IOException {
        Path folder = Path.of(args[0]);
        String frequency = args[1];
        Path out = Path.of(args[2]);
        int every = args.length > 3 ? Integer.parseInt(args[3]) : 1;
        int period = switch (frequency) {
            case "monthly" -> 12;
            case "quarterly" -> 4;
            default -> 1;
        };
        int horizon = switch (frequency) {
            case "monthly" -> 18;
            case "quarterly" -> 8;
            default -> 6;
        };
        Map<String, List<Double>> series = new LinkedHashMap<>();
        List<String> lines = Files.readAllLines(folder.resolve("m3-" + frequency + "-train.csv"), StandardCharsets.UTF_8);
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",");
            series.computeIfAbsent(f[0], k -> new ArrayList<>()).add(Double.parseDouble(f[f.length - 1]));
        }
        try (PrintStream w = new PrintStream(Files.newOutputStream(out), false, StandardCharsets.UTF_8)) {
            w.println("series,n,strength,nsdiffs,ndiffs,search,p,d,q,P,D,Q,constant,aicc,loglik,forecast");
            int i = 0;
            for (Map.Entry<String, List<Double>> e : series.entrySet()) {
                if (i++ % every != 0) {
                    continue;
                }
                double[] y = e.getValue().stream().mapToDouble(Double::doubleValue).toArray();
                double strength = period > 1 ? UnitRootTests.seasonalStrength(y, period) : Double.NaN;
                int bigD = period > 1 && y.length > 2 * period ? UnitRootTests.nsdiffs(y, period) : 0;
                int d = UnitRootTests.ndiffs(bigD > 0 ? UnitRootTests.difference(y, period) : y);
                String head = String.format(Locale.ROOT, "%s,%d,%.6f,%d,%d", e.getKey(), y.length, strength, bigD, d);
                w.println(head + ",exact," + describe(AutoArima.fit(y, period), horizon));
                w.println(head + ",conditional," + describe(AutoArima.fitConditional(y, period), horizon));
            }
        }
    }

    private static String describe(Optional<Arima.Fit> found, int horizon) {
        if (found.isEmpty()) {
            return "NA,NA,NA,NA,NA,NA,NA,NA,NA,NA";
        }
        Arima.Fit fit = found.get();
        ArimaOrder o = fit.order();
        StringJoiner fc = new StringJoiner(";");
        for (double v : fit.forecast(horizon)) {
            fc.add(String.format(Locale.ROOT, "%.6g", v));
        }
        return String.format(Locale.ROOT, "%d,%d,%d,%d,%d,%d,%d,%.6f,%.6f,%s", o.p(), o.d(), o.q(), o.seasonalP(),
                o.seasonalD(), o.seasonalQ(), o.constant() ? 1 : 0, fit.aicc(), fit.logLik(), fc);
    }
}
