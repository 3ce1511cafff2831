package org.annalist.cli;

import java.util.Locale;
import java.util.Random;
import org.annalist.analysis.breaks.BaiPerron;
import org.annalist.analysis.breaks.Pelt;
import org.annalist.analysis.decompose.Stl;
import org.annalist.findings.Analyst;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * Prints the speed figures of the analysis core on seeded synthetic data (STL, the whole Analyst,
 * Bai–Perron and PELT):
 * {@code java -cp target/annalist.jar org.annalist.cli.Benchmark}. Warm figures: each measurement
 * runs after a warm-up of the same work, single-threaded.
 */
public final class Benchmark {

    private Benchmark() {
    }

    public static void main(String[] args) {
        Random random = new Random(42);
        double[] monthly144 = synthetic(random, 144);
        Stl stl = Stl.withPeriod(12).with(Stl.Robustness.ON);
        for (int i = 0; i < 3000; i++) {
            stl.fit(monthly144);
        }
        int stlRuns = 10_000;
        long start = System.nanoTime();
        for (int i = 0; i < stlRuns; i++) {
            stl.fit(monthly144);
        }
        double stlMs = (System.nanoTime() - start) / 1e6 / stlRuns;

        Series[] series = new Series[1000];
        for (int i = 0; i < series.length; i++) {
            series[i] = Series.builder("s" + i, Frequency.MONTHLY).append(Period.month(2005, 1), synthetic(random, 240))
                    .snapshot();
        }
        Analyst analyst = new Analyst();
        for (int i = 0; i < 300; i++) {
            analyst.analyse(series[i]);
        }
        start = System.nanoTime();
        for (Series s : series) {
            analyst.analyse(s);
        }
        double analystMs = (System.nanoTime() - start) / 1e6 / series.length;

        double[] monthly600 = synthetic(random, 600);
        for (int i = 0; i < 600; i++) {
            monthly600[i] *= i >= 400 ? 1.3 : 1;
        }
        BaiPerron slopeModel = BaiPerron.withMinimumRegime(12).with(BaiPerron.Model.LEVEL_AND_SLOPE);
        BaiPerron levelModel = BaiPerron.withMinimumRegime(12);
        for (int i = 0; i < 30; i++) {
            slopeModel.fit(monthly600);
            levelModel.fit(monthly600);
        }
        int bpRuns = 50;
        start = System.nanoTime();
        for (int i = 0; i < bpRuns; i++) {
            levelModel.fit(monthly600);
        }
        double bpLevelMs = (System.nanoTime() - start) / 1e6 / bpRuns;
        start = System.nanoTime();
        for (int i = 0; i < bpRuns; i++) {
            slopeModel.fit(monthly600);
        }
        double bpSlopeMs = (System.nanoTime() - start) / 1e6 / bpRuns;

        double[] daily = new double[3650];
        for (int t = 0; t < daily.length; t++) {
            daily[t] = (t >= 2000 ? 1.2 : 1) * (300 + 20 * random.nextGaussian());
        }
        for (int i = 0; i < 30; i++) {
            Pelt.fit(daily, 7);
        }
        start = System.nanoTime();
        for (int i = 0; i < bpRuns; i++) {
            Pelt.fit(daily, 7);
        }
        double peltMs = (System.nanoTime() - start) / 1e6 / bpRuns;

        System.out.printf(Locale.ROOT, "STL, n = 144 monthly, robust (1 inner, 15 outer): %.3f ms per series (warm, %d runs)%n",
                stlMs, stlRuns);
        System.out.printf(Locale.ROOT, "Analyst, 1,000 monthly series of 20 years:        %.3f ms per series (warm)%n",
                analystMs);
        System.out.printf(Locale.ROOT, "Bai-Perron, n = 600, minimum regime 12, up to 6 breaks: level %.1f ms, level and slope %.1f ms (warm)%n",
                bpLevelMs, bpSlopeMs);
        System.out.printf(Locale.ROOT, "PELT, n = 3,650 daily, minimum regime 7:                 %.1f ms (warm)%n", peltMs);
    }

    /** A positive monthly series: trend, multiplicative season, noise, an occasional shock. */
    private static double[] synthetic(Random random, int n) {
        double[] x = new double[n];
        double slope = random.nextGaussian() * 0.004;
        for (int t = 0; t < n; t++) {
            double season = 1 + 0.3 * Math.sin(2 * Math.PI * (t - 3) / 12);
            x[t] = 1000 * Math.exp(slope * t) * season * Math.exp(0.05 * random.nextGaussian())
                    * (random.nextDouble() < 0.01 ? 1.5 : 1);
        }
        return x;
    }
}
