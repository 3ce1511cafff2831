package org.annalist.analysis.forecast;

import java.util.Arrays;

/**
 * Prints the time of {@link AutoArima#fit} (a main, not a test: timing is never asserted) on
 * AirPassengers (144 monthly values, exact-ML search), nottem (240 monthly values, CSS search and ML
 * refit) and the last 40 quarters of UKgas. Run:
 * {@code java -cp target/classes:target/test-classes:<dependencies> org.annalist.analysis.forecast.ArimaTiming}.
 */
public final class ArimaTiming {

    /** CPU time of this thread: the machine may be shared, so wall-clock time would overstate the cost. */
    private static final java.lang.management.ThreadMXBean THREADS = java.lang.management.ManagementFactory.getThreadMXBean();

    private ArimaTiming() {
    }

    public static void main(String[] args) {
        double[] ukgas = ArimaTest.series("UKgas");
        Object[][] cases = {
            {"AirPassengers", ArimaTest.series("AirPassengers"), 12},
            {"nottem (240 monthly)", ArimaTest.series("nottem"), 12},
            {"UKgas, last 40 quarters", Arrays.copyOfRange(ukgas, ukgas.length - 40, ukgas.length), 4},
            {"AirPassengers, CSS search", ArimaTest.series("AirPassengers"), -12}};
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 5;
        for (Object[] c : cases) {
            double[] y = (double[]) c[1];
            int m = Math.abs((Integer) c[2]);
            boolean forceCss = (Integer) c[2] < 0;
            double[] ms = new double[runs];
            String label = "";
            for (int r = 0; r < runs; r++) {
                long start = THREADS.getCurrentThreadCpuTime();
                label = (forceCss ? AutoArima.fit(y, m, true) : AutoArima.fit(y, m)).map(Arima.Fit::label).orElse("none");
                ms[r] = (THREADS.getCurrentThreadCpuTime() - start) / 1e6;
            }
            Arrays.sort(ms);
            System.out.printf("%-26s %-26s CPU time: slowest %.0f ms, median of %d runs %.0f ms, fastest %.0f ms%n", c[0], label,
                    ms[runs - 1], runs, ms[runs / 2], ms[0]);
        }
    }
}
