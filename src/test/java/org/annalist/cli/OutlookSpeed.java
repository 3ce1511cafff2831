package org.annalist.cli;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Locale;
import java.util.Random;
import org.annalist.analysis.forecast.Outlook;
import org.annalist.findings.Analyst;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * The outlook's CPU cost, the figure issue 15 sets a target for (the whole analysis with the
 * outlook, at most 50 ms per 20-year monthly series on one core). CPU time of this thread, not
 * wall time, so a loaded machine does not inflate it; each figure after a warm-up of the same work.
 * From the top folder, after {@code mvn -q -B -DskipTests package}:
 * {@code java -cp target/annalist.jar:target/test-classes org.annalist.cli.OutlookSpeed [series]}
 * (add {@code -XX:TieredStopAtLevel=1} for the launcher's C1-only JIT). The series are seeded
 * synthetic ones of the same recipe as {@link Benchmark}'s.
 */
public final class OutlookSpeed {

    private OutlookSpeed() {
    }

    public static void main(String[] args) {
        int count = args.length > 0 ? Integer.parseInt(args[0]) : 40;
        ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        Random random = new Random(42);
        double[][] monthly200 = new double[count][];
        for (int i = 0; i < count; i++) {
            monthly200[i] = Benchmark.synthetic(random, 200);
        }
        Series[] twentyYears = new Series[count];
        for (int i = 0; i < count; i++) {
            twentyYears[i] = Series.builder("s" + i, Frequency.MONTHLY)
                    .append(Period.month(2005, 1), Benchmark.synthetic(random, 240)).snapshot();
        }
        Analyst analyst = new Analyst();
        for (int round = 0; round < 2; round++) { // warm-up: the same work twice
            for (double[] y : monthly200) {
                Outlook.of(y, 12, 14, Outlook.Bounds.NON_NEGATIVE);
            }
            for (Series s : twentyYears) {
                analyst.analyse(s);
            }
        }
        long start = threads.getCurrentThreadCpuTime();
        for (double[] y : monthly200) {
            Outlook.of(y, 12, 14, Outlook.Bounds.NON_NEGATIVE);
        }
        double outlookMs = (threads.getCurrentThreadCpuTime() - start) / 1e6 / count;
        start = threads.getCurrentThreadCpuTime();
        for (Series s : twentyYears) {
            analyst.analyse(s);
        }
        double wholeMs = (threads.getCurrentThreadCpuTime() - start) / 1e6 / count;
        System.out.printf(Locale.ROOT, "Outlook (4 methods, 24-origin back-test, 14 ahead), n = 200 monthly, one core: "
                + "%.1f ms CPU per series (warm, %d series)%n", outlookMs, count);
        System.out.printf(Locale.ROOT, "Whole analysis with outlook, 20-year monthly series, one core: "
                + "%.1f ms CPU per series (warm, %d series)%n", wholeMs, count);
    }
}
