package org.annalist.cli;

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
import java.util.TreeMap;
import java.util.concurrent.atomic.AtomicLong;
import java.util.stream.IntStream;
import org.annalist.findings.Analyst;
import org.annalist.findings.OutlookFinding;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.series.SeriesBuilder;

/**
 * The outlook's accuracy on the M3 competition (Makridakis &amp; Hibon 2000, International Journal
 * of Forecasting 16(4), 451–476, doi:10.1016/S0169-2070(00)00057-1): every series goes through the
 * whole analysis as a brief would make it ({@link Analyst}, breaks and all), its outlook is compared
 * with the held-out values, and the table prints, by frequency, the mean MASE (scaled by the
 * in-sample seasonal naive error, Hyndman &amp; Koehler 2006), the mean sMAPE (200·|a − f| / (|a| + |f|),
 * the competition's measure) and the share of held-out values inside the 80 and 95 % intervals,
 * beside the same figures for the competition's published forecasts and, where given, for R's
 * automatic methods ({@code dev/m3/r-automatic-forecasts.R}) and their mean, and the CPU time per
 * series of the whole analysis (JIT compilation included: the first series pay for it).
 *
 * <p>Usage, from the top folder after {@code mvn -q -B -DskipTests package}:
 * {@code java -cp target/annalist.jar:target/test-classes org.annalist.cli.M3Benchmark
 * ../shared/reference-data/forecasting [--r dev/m3] [--only monthly] [--every K] [--threads N]}.
 * {@code --variant none} prints only the published and R's figures. {@code --by-step} adds each of our methods' coverage step by step ahead. {@code --every K} takes every K-th series (a quick look while developing); the figures of record
 * are over all series.
 */
public final class M3Benchmark {

    private static final String[] FREQUENCIES = {"monthly", "quarterly", "yearly"};
    /** The time of a series is the CPU time of the thread that forecast it: other work on the machine does not count. */
    private static final java.lang.management.ThreadMXBean CPU = java.lang.management.ManagementFactory.getThreadMXBean();

    /** One method's forecasts of one series: the mean and the four interval limits per step (NaN when absent). */
    record Forecast(double[] mean, double[] lo80, double[] hi80, double[] lo95, double[] hi95, Optional<YearTotal> year) {

        Forecast(double[] mean, double[] lo80, double[] hi80, double[] lo95, double[] hi95) {
            this(mean, lo80, hi80, lo95, hi95, Optional.empty());
        }
    }

    /** The next calendar year's total with its 80 % interval, and the steps ahead (0-based, end exclusive) it covers. */
    record YearTotal(int from, int to, double lo80, double hi80) {
    }

    /** A series: its training values with their first period, and the held-out values. */
    record M3Series(String id, Period start, double[] train, double[] test) {
    }

    /** Running sums of the measures of one method on one frequency. */
    static final class Tally {
        double mase;
        double smape;
        int series;
        long covered80;
        long covered95;
        long withIntervals;
        int missing;
        long nanos;
        /** Next calendar years' totals with an interval, and those inside it. */
        long yearCount;
        long year80;
        /** Per step ahead (index 0 = one step): values with intervals, and those inside the 80 and 95 % intervals. */
        final long[] stepCount = new long[48];
        final long[] step80 = new long[48];
        final long[] step95 = new long[48];

        synchronized void add(M3Series s, int period, Forecast f) {
            double scale = naiveScale(s.train(), period);
            double absolute = 0;
            double symmetric = 0;
            int h = s.test().length;
            for (int k = 0; k < h; k++) {
                double a = s.test()[k];
                double p = f.mean()[k];
                absolute += Math.abs(a - p);
                symmetric += 200 * Math.abs(a - p) / (Math.abs(a) + Math.abs(p));
                if (!Double.isNaN(f.lo95()[k])) {
                    withIntervals++;
                    covered80 += a >= f.lo80()[k] && a <= f.hi80()[k] ? 1 : 0;
                    covered95 += a >= f.lo95()[k] && a <= f.hi95()[k] ? 1 : 0;
                    if (k < stepCount.length) {
                        stepCount[k]++;
                        step80[k] += a >= f.lo80()[k] && a <= f.hi80()[k] ? 1 : 0;
                        step95[k] += a >= f.lo95()[k] && a <= f.hi95()[k] ? 1 : 0;
                    }
                }
            }
            f.year().ifPresent(y -> {
                double total = 0;
                for (int k = y.from(); k < y.to(); k++) {
                    total += s.test()[k];
                }
                yearCount++;
                year80 += total >= y.lo80() && total <= y.hi80() ? 1 : 0;
            });
            mase += absolute / h / scale;
            smape += symmetric / h;
            series++;
        }

        synchronized void missed() {
            missing++;
        }
    }

    private M3Benchmark() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args[0]);
        Optional<Path> rFolder = Optional.empty();
        List<String> frequencies = List.of(FREQUENCIES);
        int every = 1;
        int threads = Runtime.getRuntime().availableProcessors();
        List<String> variants = new ArrayList<>();
        boolean byStep = false;
        for (int i = 1; i < args.length; i += 2) {
            switch (args[i]) {
                case "--r" -> rFolder = Optional.of(Path.of(args[i + 1]));
                case "--only" -> frequencies = List.of(args[i + 1]);
                case "--every" -> every = Integer.parseInt(args[i + 1]);
                case "--threads" -> threads = Integer.parseInt(args[i + 1]);
                case "--variant" -> variants.add(args[i + 1]);
                case "--by-step" -> {
                    byStep = true;
                    i--;
                }
                default -> throw new IllegalArgumentException("unknown option " + args[i]);
            }
        }
        PrintStream out = System.out;
        out.printf(Locale.ROOT, "%-10s %-22s %7s %8s %8s %8s %8s %13s %10s%n", "frequency", "method", "series", "MASE",
                "sMAPE", "cov80", "cov95", "CPU ms/series", "year cov80");
        for (String frequency : frequencies) {
            run(folder, rFolder, frequency, every, threads, variants, byStep, out);
        }
    }

    private static void run(Path folder, Optional<Path> rFolder, String frequency, int every, int threads,
                            List<String> variants, boolean byStep, PrintStream out) throws IOException {
        Frequency f = switch (frequency) {
            case "monthly" -> Frequency.MONTHLY;
            case "quarterly" -> Frequency.QUARTERLY;
            default -> Frequency.ANNUAL;
        };
        int period = f.seasonalPeriod();
        List<M3Series> all = read(folder, frequency, f);
        List<M3Series> chosen = new ArrayList<>();
        for (int i = 0; i < all.size(); i += every) {
            chosen.add(all.get(i));
        }
        Map<String, M3Series> byId = new LinkedHashMap<>();
        chosen.forEach(s -> byId.put(s.id(), s));
        Map<String, Tally> tallies = new LinkedHashMap<>();
        List<String> names = variants.isEmpty() ? List.of("ANNALIST") : variants;
        for (String name : names) {
            if (!name.equals("none")) {
                tallies.put(name, forecastAll(chosen, f, name, threads));
            }
        }
        Map<String, Map<String, Forecast>> published = readForecasts(folder.resolve("m3-" + frequency
                + "-published-forecasts.csv"), byId);
        published.forEach((method, forecasts) -> tallies.put(method, tally(forecasts, byId, period)));
        if (rFolder.isPresent()) {
            Path plain = rFolder.get().resolve("r-" + frequency + ".csv");
            // the monthly file is kept gzipped in the repository (4.5 MB as text)
            Path rFile = Files.exists(plain) ? plain : rFolder.get().resolve("r-" + frequency + ".csv.gz");
            if (Files.exists(rFile)) {
                Map<String, Map<String, Forecast>> r = readForecasts(rFile, byId);
                r.forEach((method, forecasts) -> tallies.put("R " + method, tally(forecasts, byId, period)));
                tallies.put("R mean(ETS,ARIMA,THETA)", tally(mean(r, byId), byId, period));
            }
        }
        for (Map.Entry<String, Tally> e : tallies.entrySet()) {
            Tally t = e.getValue();
            String ms = t.nanos == 0 ? "" : String.format(Locale.ROOT, "%9.1f", t.nanos / 1e6 / Math.max(1, t.series + t.missing));
            out.printf(Locale.ROOT, "%-10s %-22s %7d %8.3f %8.2f %8s %8s %13s %10s%s%n", frequency, e.getKey(), t.series,
                    t.mase / t.series, t.smape / t.series, share(t.covered80, t.withIntervals),
                    share(t.covered95, t.withIntervals), ms, share(t.year80, t.yearCount),
                    t.missing > 0 ? "  (no forecast for " + t.missing + ")" : "");
        }
        if (byStep) {
            for (String name : names) {
                Tally t = tallies.get(name);
                if (t == null) {
                    continue;
                }
                StringBuilder line = new StringBuilder(String.format(Locale.ROOT, "%-10s %-22s cov80/cov95 by step:", frequency, name));
                for (int k = 0; k < t.stepCount.length && t.stepCount[k] > 0; k++) {
                    line.append(String.format(Locale.ROOT, " %d:%s/%s", k + 1, share(t.step80[k], t.stepCount[k]).trim(),
                            share(t.step95[k], t.stepCount[k]).trim()));
                }
                out.println(line);
            }
        }
    }

    /** Every series forecast by {@code name}: ANNALIST for the whole analysis, else a lab variant ({@code OutlookLab}). */
    private static Tally forecastAll(List<M3Series> chosen, Frequency f, String name, int threads) {
        Tally tally = new Tally();
        int period = f.seasonalPeriod();
        AtomicLong nanos = new AtomicLong();
        java.util.concurrent.ForkJoinPool pool = new java.util.concurrent.ForkJoinPool(threads);
        try {
            pool.submit(() -> IntStream.range(0, chosen.size()).parallel().forEach(i -> {
                M3Series s = chosen.get(i);
                long start = CPU.getCurrentThreadCpuTime();
                Optional<Forecast> forecast = name.equals("ANNALIST") ? annalist(s, f)
                        : org.annalist.analysis.forecast.OutlookLab.forecast(name, s.train(), period, s.test().length)
                        .map(v -> new Forecast(v[0], v[1], v[2], v[3], v[4]));
                nanos.addAndGet(CPU.getCurrentThreadCpuTime() - start);
                forecast.ifPresentOrElse(fc -> tally.add(s, period, fc), tally::missed);
            })).get();
        } catch (Exception e) {
            throw new IllegalStateException(e);
        } finally {
            pool.shutdown();
        }
        tally.nanos = nanos.get();
        return tally;
    }

    /** The outlook of the whole analysis, at the held-out horizon. */
    static Optional<Forecast> annalist(M3Series s, Frequency frequency) {
        SeriesBuilder builder = Series.builder(s.id(), frequency);
        builder.append(s.start(), s.train());
        int h = s.test().length;
        OutlookFinding outlook = new Analyst(Optional.empty(), Optional.empty(), List.of(), Optional.of(h))
                .analyse(builder.snapshot()).outlook();
        if (outlook == null) {
            return Optional.empty();
        }
        double[][] v = new double[5][h];
        List<OutlookFinding.Point> points = outlook.forecasts();
        for (int k = 0; k < h; k++) {
            OutlookFinding.Point p = points.get(k);
            v[0][k] = p.mean();
            v[1][k] = p.lo80();
            v[2][k] = p.hi80();
            v[3][k] = p.lo95();
            v[4][k] = p.hi95();
        }
        Optional<YearTotal> year = Optional.empty();
        if (outlook.nextYearTotal() != null) {
            int from = -1;
            int to = -1;
            for (int k = 0; k < h; k++) {
                if (points.get(k).period().year() == outlook.nextYear()) {
                    from = from < 0 ? k : from;
                    to = k + 1;
                }
            }
            year = from < 0 ? Optional.empty()
                    : Optional.of(new YearTotal(from, to, outlook.nextYearTotal().lo80(), outlook.nextYearTotal().hi80()));
        }
        return Optional.of(new Forecast(v[0], v[1], v[2], v[3], v[4], year));
    }

    private static String share(long covered, long total) {
        return total == 0 ? "" : String.format(Locale.ROOT, "%.3f", covered / (double) total);
    }

    private static Tally tally(Map<String, Forecast> forecasts, Map<String, M3Series> byId, int period) {
        Tally t = new Tally();
        for (M3Series s : byId.values()) {
            Forecast f = forecasts.get(s.id());
            if (f == null || Double.isNaN(f.mean()[f.mean().length - 1])) {
                t.missed();
            } else {
                t.add(s, period, f);
            }
        }
        return t;
    }

    private static Map<String, Forecast> mean(Map<String, Map<String, Forecast>> methods, Map<String, M3Series> byId) {
        Map<String, Forecast> mean = new LinkedHashMap<>();
        for (M3Series s : byId.values()) {
            int h = s.test().length;
            double[] m = new double[h];
            boolean complete = true;
            for (Map<String, Forecast> method : methods.values()) {
                Forecast f = method.get(s.id());
                complete &= f != null;
                for (int k = 0; f != null && k < h; k++) {
                    m[k] += f.mean()[k] / methods.size();
                }
            }
            double[] none = new double[h];
            java.util.Arrays.fill(none, Double.NaN);
            if (complete) {
                mean.put(s.id(), new Forecast(m, none, none, none, none));
            }
        }
        return mean;
    }

    /** The in-sample mean absolute error of the seasonal naive forecast (naive for period 1). */
    static double naiveScale(double[] train, int period) {
        double sum = 0;
        for (int t = period; t < train.length; t++) {
            sum += Math.abs(train[t] - train[t - period]);
        }
        return sum / (train.length - period);
    }

    private static List<M3Series> read(Path folder, String frequency, Frequency f) throws IOException {
        Map<String, List<String[]>> train = rows(folder.resolve("m3-" + frequency + "-train.csv"));
        Map<String, List<String[]>> test = rows(folder.resolve("m3-" + frequency + "-test.csv"));
        List<M3Series> series = new ArrayList<>();
        for (Map.Entry<String, List<String[]>> e : train.entrySet()) {
            List<String[]> t = e.getValue();
            List<String[]> held = test.get(e.getKey());
            series.add(new M3Series(e.getKey(), period(f, t.get(0)[2]),
                    t.stream().mapToDouble(r -> Double.parseDouble(r[3])).toArray(),
                    held.stream().mapToDouble(r -> Double.parseDouble(r[3])).toArray()));
        }
        return series;
    }

    /**
     * The competition's own time stamps: {@code Y-MM}, {@code Y-Qn} or {@code Y}. Some series have
     * nominal start years such as 1; those are moved to 2001 and on (the calendar of Easter is
     * defined from 1583), which leaves their months and quarters as they were.
     */
    private static Period period(Frequency f, String label) {
        String[] parts = label.split("-");
        int nominal = Integer.parseInt(parts[0]);
        int year = nominal < 1583 ? nominal + 2000 : nominal;
        return switch (f) {
            case MONTHLY -> Period.month(year, Integer.parseInt(parts[1]));
            case QUARTERLY -> Period.quarter(year, parts[1].charAt(1) - '0');
            default -> Period.year(year);
        };
    }

    /** A CSV file's lines, gzipped ({@code .gz}) or not. */
    private static List<String> lines(Path file) throws IOException {
        try (java.io.InputStream in = file.toString().endsWith(".gz")
                ? new java.util.zip.GZIPInputStream(Files.newInputStream(file)) : Files.newInputStream(file)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8).lines().toList();
        }
    }

    /** Rows by their first field, in file order. */
    private static Map<String, List<String[]>> rows(Path file) throws IOException {
        Map<String, List<String[]>> rows = new LinkedHashMap<>();
        List<String> lines = lines(file);
        for (String line : lines.subList(1, lines.size())) {
            String[] fields = line.split(",");
            rows.computeIfAbsent(fields[0], k -> new ArrayList<>()).add(fields);
        }
        return rows;
    }

    /**
     * Forecasts by method and series from {@code method,series,h,forecast[,lo80,hi80,lo95,hi95]}, for
     * the series in {@code byId}.
     */
    private static Map<String, Map<String, Forecast>> readForecasts(Path file, Map<String, M3Series> byId)
            throws IOException {
        Map<String, Map<String, double[][]>> values = new TreeMap<>();
        List<String> lines = lines(file);
        for (String line : lines.subList(1, lines.size())) {
            String[] fields = line.split(",");
            M3Series s = byId.get(fields[1]);
            if (s == null) {
                continue;
            }
            int h = s.test().length;
            double[][] v = values.computeIfAbsent(fields[0], k -> new LinkedHashMap<>())
                    .computeIfAbsent(fields[1], k -> {
                        double[][] empty = new double[5][h];
                        for (double[] row : empty) {
                            java.util.Arrays.fill(row, Double.NaN);
                        }
                        return empty;
                    });
            int k = Integer.parseInt(fields[2]) - 1;
            if (k >= h) {
                continue;
            }
            for (int c = 0; c < 5 && 3 + c < fields.length; c++) {
                v[c][k] = fields[3 + c].equals("NA") ? Double.NaN : Double.parseDouble(fields[3 + c]);
            }
        }
        Map<String, Map<String, Forecast>> forecasts = new LinkedHashMap<>();
        values.forEach((method, bySeries) -> {
            Map<String, Forecast> m = new LinkedHashMap<>();
            bySeries.forEach((id, v) -> m.put(id, new Forecast(v[0], v[1], v[2], v[3], v[4])));
            forecasts.put(method, m);
        });
        return forecasts;
    }
}
