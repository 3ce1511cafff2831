package org.annalist.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Random;
import org.annalist.analysis.breaks.BaiPerron;
import org.annalist.brief.AnalysisChoices;
import org.annalist.brief.Batch;
import org.annalist.brief.BriefOutput;
import org.annalist.brief.BriefPipeline;
import org.annalist.brief.Job;
import org.annalist.brief.SeriesChoice;
import org.annalist.brief.SpecReader;
import org.annalist.ingest.ReadOptions;
import org.annalist.narrative.Masthead;
import org.annalist.analysis.breaks.Pelt;
import org.annalist.analysis.decompose.Stl;
import org.annalist.analysis.forecast.EtsSelection;
import org.annalist.analysis.forecast.Outlook;
import org.annalist.findings.Analyst;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * Prints the speed figures of the analysis core on seeded synthetic data (STL, the whole Analyst
 * without its outlook, automatic ETS, the outlook, Bai–Perron and PELT), the demo brief, and the
 * batch figures (10,000 series analysed, 200 briefs in one batch). It lives with the tests, out of
 * the user's jar; from the top folder, after {@code mvn -q -B -DskipTests package} (which compiles
 * the tests too): {@code java -cp target/annalist.jar:target/test-classes org.annalist.cli.Benchmark}.
 * Warm figures: each measurement
 * runs after a warm-up of the same work, single-threaded. The bulk figures are also taken in fresh
 * JVMs with a bounded heap, as a user's run would see them, with the process's peak memory.
 */
public final class Benchmark {

    private Benchmark() {
    }

    public static void main(String[] args) throws Exception {
        if (args.length > 0 && args[0].equals("--warm-brief")) {
            warmBriefRounds();
            return;
        }
        if (args.length > 0) {
            child(args);
            return;
        }
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

        Series[] series = syntheticMonthly(random, 1000);
        Analyst analyst = new Analyst().withoutOutlook();
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

        double[][] monthly200 = new double[20][];
        for (int i = 0; i < monthly200.length; i++) {
            monthly200[i] = synthetic(random, 200);
        }
        for (int i = 0; i < 5; i++) {
            for (double[] y : monthly200) {
                EtsSelection.select(y, 12);
            }
        }
        start = System.nanoTime();
        for (double[] y : monthly200) {
            EtsSelection.select(y, 12);
        }
        double etsMs = (System.nanoTime() - start) / 1e6 / monthly200.length;
        start = System.nanoTime();
        for (double[] y : monthly200) {
            Outlook.of(y, 12, 14, Outlook.Bounds.NON_NEGATIVE);
        }
        double outlookMs = (System.nanoTime() - start) / 1e6 / monthly200.length;

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
        System.out.printf(Locale.ROOT, "Analyst without outlook, 1,000 monthly series of 20 years: %.3f ms per series (warm)%n",
                analystMs);
        System.out.printf(Locale.ROOT, "ETS automatic selection and fit, n = 200 monthly:  %.0f ms per series (warm, %d series)%n",
                etsMs, monthly200.length);
        System.out.printf(Locale.ROOT, "Outlook (4 methods, 24-origin back-test, 14 ahead), n = 200 monthly: %.0f ms per series (warm)%n",
                outlookMs);
        System.out.printf(Locale.ROOT, "Bai-Perron, n = 600, minimum regime 12, up to 6 breaks: level %.1f ms, level and slope %.1f ms (warm)%n",
                bpLevelMs, bpSlopeMs);
        System.out.printf(Locale.ROOT, "PELT, n = 3,650 daily, minimum regime 7:                 %.1f ms (warm)%n", peltMs);
        briefs();
        batches();
    }

    /** The heap the fresh JVMs of the bulk figures get: the bound the figures are claimed under. */
    private static final String CHILD_HEAP = "-Xmx512m";

    /**
     * The monthly routine at scale: the analysis without outlook or PDF of 10,000 monthly series of
     * 20 years on all cores, warm in this JVM and in a fresh JVM (JIT compilation included), and
     * 200 single-series briefs in one batch in a fresh JVM; the fresh JVMs run with
     * {@value #CHILD_HEAP} and report their peak resident memory (the whole process, not the heap).
     */
    private static void batches() throws Exception {
        int cores = Runtime.getRuntime().availableProcessors();
        double warmSeconds = analyseMany(syntheticMonthly(new Random(4242), 10_000));
        System.out.printf(Locale.ROOT, "Analysis without outlook or PDF, 10,000 monthly series of 20 years, %d cores, "
                + "warm in this JVM: %.1f s%n", cores, warmSeconds);
        String[] bulk = inFreshJvm("--bulk-analysis");
        System.out.printf(Locale.ROOT, "  the same in a fresh JVM (%s), JIT warm-up included:      %s s, peak RSS %s MB%n",
                CHILD_HEAP, bulk[0], bulk[1]);

        Path data = Path.of("demo-data/quennelmark-guest-nights.csv").toAbsolutePath();
        if (!Files.exists(data)) {
            System.out.println("(batch timing skipped: run from the repository's top folder, where demo-data/ is)");
            return;
        }
        Path folder = Files.createTempDirectory("annalist-batch");
        Files.copy(data, folder.resolve("nights.csv"));
        StringBuilder yaml = new StringBuilder("briefs:\n");
        for (int i = 0; i < 50; i++) {
            yaml.append("  - data: nights.csv\n    series: [Total, Domestic, Brevania, Long-haul]\n")
                    .append("    output: out/").append(i).append("-{series}.pdf\n")
                    .append("    generated_at: 2026-11-20T08:00:00Z\n");
        }
        Path spec = folder.resolve("briefs.yaml");
        Files.writeString(spec, yaml);
        String[] batch = inFreshJvm("--batch", spec.toString());
        System.out.printf(Locale.ROOT, "Batch of 200 single-series briefs in a fresh JVM (%s), %d threads: %s made, "
                + "%s s wall, peak RSS %s MB%n", CHILD_HEAP, cores, batch[2], batch[0], batch[1]);
    }

    /** Runs this class in a fresh JVM for one figure; its last line holds seconds, peak RSS and a count. */
    private static String[] inFreshJvm(String... arguments) throws Exception {
        List<String> command = new ArrayList<>(List.of(java(), CHILD_HEAP, "-cp", System.getProperty("java.class.path")));
        command.add(Benchmark.class.getName());
        command.addAll(List.of(arguments));
        Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
        String output = new String(p.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        if (p.waitFor() != 0) {
            throw new IllegalStateException("the benchmark's child JVM failed: " + command + "\n" + output);
        }
        String[] lines = output.strip().split("\n");
        return lines[lines.length - 1].strip().split(" ");
    }

    /** What a fresh JVM started by {@link #inFreshJvm} measures: prints seconds, peak RSS in MB and a count. */
    private static void child(String[] args) throws Exception {
        long start = System.nanoTime();
        long count;
        if (args[0].equals("--bulk-analysis")) {
            Series[] many = syntheticMonthly(new Random(4242), 10_000);
            start = System.nanoTime();
            analyseMany(many);
            count = many.length;
        } else {
            int cores = Runtime.getRuntime().availableProcessors();
            count = Batch.run(SpecReader.read(Path.of(args[1])), cores, o -> { }).stream().filter(Batch.Outcome::done)
                    .count();
        }
        double seconds = (System.nanoTime() - start) / 1e9;
        System.out.printf(Locale.ROOT, "%.1f %s %d%n", seconds, peakResidentMegabytes(), count);
    }

    /** The process's peak resident set (Linux {@code VmHWM}); "n/a" where /proc does not tell. */
    private static String peakResidentMegabytes() {
        try {
            for (String line : Files.readAllLines(Path.of("/proc/self/status"))) {
                if (line.startsWith("VmHWM:")) {
                    long kilobytes = Long.parseLong(line.replaceAll("[^0-9]", ""));
                    return Long.toString(kilobytes >> 10);
                }
            }
        } catch (java.io.IOException | NumberFormatException notLinux) {
            return "n/a";
        }
        return "n/a";
    }

    private static Series[] syntheticMonthly(Random random, int count) {
        Series[] many = new Series[count];
        for (int i = 0; i < many.length; i++) {
            many[i] = Series.builder("s" + i, Frequency.MONTHLY).append(Period.month(2005, 1), synthetic(random, 240))
                    .snapshot();
        }
        return many;
    }

    /** Seconds to analyse every series without outlook, on all cores. */
    private static double analyseMany(Series[] many) {
        Analyst bulk = new Analyst().withoutOutlook();
        long start = System.nanoTime();
        java.util.Arrays.stream(many).parallel().forEach(bulk::analyse);
        return (System.nanoTime() - start) / 1e9;
    }

    /**
     * The demo's total brief: warm in this JVM (its heap as started, e.g. -Xmx512m), and cold, JVM
     * start to finished PDF, as a user's one command runs it (with default JVM flags and with C1 only).
     */
    private static void briefs() throws Exception {
        Path data = Path.of("demo-data/quennelmark-guest-nights.csv");
        if (!Files.exists(data)) {
            System.out.println("(brief timings skipped: run from the repository's top folder, where demo-data/ is)");
            return;
        }
        Path out = Files.createTempDirectory("annalist-bench");
        Path pdf = out.resolve("total.pdf");
        Job job = warmedTotalBrief(data, pdf);
        int runs = 20;
        long start = System.nanoTime();
        for (int i = 0; i < runs; i++) {
            new BriefPipeline().briefs(job);
        }
        double warmMs = (System.nanoTime() - start) / 1e6 / runs;
        int pages;
        try (var document = org.apache.pdfbox.Loader.loadPDF(pdf.toFile())) {
            pages = document.getNumberOfPages();
        }
        System.out.printf(Locale.ROOT, "Brief (demo total), warm, max heap %d MB:              %.0f ms per brief; %d pages, %d KB%n",
                Runtime.getRuntime().maxMemory() >> 20, warmMs, pages, Files.size(pdf) >> 10);
        for (String[] flags : new String[][] {{}, {"-XX:TieredStopAtLevel=1"}}) {
            double best = Double.POSITIVE_INFINITY;
            for (int i = 0; i < 3; i++) {
                List<String> command = javaOnTheJar(flags);
                command.addAll(List.of("brief", data.toString(), "--series", "Total", "-o", pdf.toString()));
                long t0 = System.nanoTime();
                Process p = new ProcessBuilder(command).redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD)
                        .start();
                if (p.waitFor() != 0) {
                    throw new IllegalStateException("the brief command failed: " + command);
                }
                best = Math.min(best, (System.nanoTime() - t0) / 1e9);
            }
            System.out.printf(Locale.ROOT, "Brief (demo total), cold, java %s-jar:%s %.2f s wall (best of 3)%n",
                    flags.length == 0 ? "" : String.join(" ", flags) + " ", flags.length == 0 ? "                          " : "", best);
        }
    }

    /**
     * For {@code dev/bench-launcher.sh}: the demo's total brief made 10 times to warm this JVM
     * (started with whatever flags are being measured), then 5 rounds of 5 briefs; prints each
     * round's milliseconds per brief on one line.
     */
    private static void warmBriefRounds() throws Exception {
        Path pdf = Files.createTempDirectory("annalist-bench").resolve("total.pdf");
        Job job = warmedTotalBrief(Path.of("demo-data/quennelmark-guest-nights.csv"), pdf);
        List<String> rounds = new ArrayList<>();
        List<String> cpu = new ArrayList<>();
        var process = (com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory.getOperatingSystemMXBean();
        for (int round = 0; round < 5; round++) {
            long start = System.nanoTime();
            long startCpu = process.getProcessCpuTime();
            for (int i = 0; i < 5; i++) {
                new BriefPipeline().briefs(job);
            }
            rounds.add(String.format(Locale.ROOT, "%.0f", (System.nanoTime() - start) / 1e6 / 5));
            cpu.add(String.format(Locale.ROOT, "%.0f", (process.getProcessCpuTime() - startCpu) / 1e6 / 5));
        }
        // wall ms per brief, then the process's CPU ms per brief (all its threads: on a busy machine
        // the wall time mostly measures the others' work)
        System.out.println(String.join(" ", rounds));
        System.out.println(String.join(" ", cpu));
    }

    /** {@code java FLAGS… -jar JAR}: this JVM's launcher on the jar the tool runs from, as a user starts it. */
    private static List<String> javaOnTheJar(String... flags) throws Exception {
        List<String> command = new ArrayList<>(List.of(java()));
        command.addAll(List.of(flags));
        command.add("-jar");
        command.add(Path.of(Main.class.getProtectionDomain().getCodeSource().getLocation().toURI()).toString());
        return command;
    }

    /** This JVM's launcher. */
    private static String java() {
        return Path.of(System.getProperty("java.home"), "bin", "java").toString();
    }

    /** A positive monthly series: trend, multiplicative season, noise, an occasional shock. */
    static double[] synthetic(Random random, int n) {
        double[] x = new double[n];
        double slope = random.nextGaussian() * 0.004;
        for (int t = 0; t < n; t++) {
            double season = 1 + 0.3 * Math.sin(2 * Math.PI * (t - 3) / 12);
            x[t] = 1000 * Math.exp(slope * t) * season * Math.exp(0.05 * random.nextGaussian())
                    * (random.nextDouble() < 0.01 ? 1.5 : 1);
        }
        return x;
    }

    /**
     * The demo's total brief as one command makes it, written to {@code pdf}, after 10 briefs that
     * warm this JVM; a fresh pipeline each time, so the file is read anew.
     */
    private static Job warmedTotalBrief(Path data, Path pdf) throws Exception {
        Job job = new Job(new Job.Input(data, ReadOptions.defaults()),
                SeriesChoice.one(Optional.of("Total"), Optional.empty()), AnalysisChoices.fromTheData(),
                Optional.of(BriefOutput.pdf(pdf, new BriefOutput.MastheadChoices("Guest nights in Quennelmark", "",
                        Optional.empty(), Masthead.Paper.A4, Locale.ENGLISH, Optional.empty(),
                        Optional.of(Instant.parse("2026-11-20T08:00:00Z"))))));
        for (int i = 0; i < 10; i++) {
            new BriefPipeline().briefs(job);
        }
        return job;
    }
}
