import java.lang.management.*;
import java.nio.file.*;
import java.util.*;

/**
 * Runs one Annalist command line in this JVM with a sampler that reads every thread's CPU time
 * every 10 ms and charges it to the phase its stack shows, and prints, as the JVM exits, the CPU
 * time of the brief's critical path (the main thread, and the template's and PDF layout's threads
 * while main waits for them) by phase, and every live thread's CPU from /proc. Not a test and not
 * part of the build: dev/critical-path/run.sh compiles and runs it. The sampling itself costs CPU
 * (a safepoint every 10 ms): compare figures of this tool only with each other.
 */
public class CriticalPath {
    static final ThreadMXBean MX = ManagementFactory.getThreadMXBean();
    static final Map<String, Long> phaseCpu = new TreeMap<>();
    static final Map<String, Long> lastCpu = new HashMap<>();
    static long mainId;
    static long mainStartCpuNs; static long mainStartWallMs;
    static final StringBuilder timeline = new StringBuilder();

    static String phase(StackTraceElement[] st) {
        // innermost first: the first matching marker wins from the outermost annalist frames
        String best = "other";
        for (int i = st.length - 1; i >= 0; i--) {
            String c = st[i].getClassName(), m = st[i].getMethodName();
            if (c.startsWith("picocli")) best = "picocli";
            if (c.endsWith("SeriesFiles") && m.equals("read")) best = "read";
            if (c.endsWith("SeriesSelection")) best = "select";
            if (c.endsWith("BriefPipeline") && m.equals("analyse")) best = "analysis";
            if (c.contains("OutlookAnalysis")) best = "analysis:outlook";
            if (c.contains("Fonts") && m.equals("registerWithAwt")) best = "awt-fonts";
            if (c.contains("BriefViews") || c.contains("FigurePlan")) best = "view";
            if (c.contains("TemplateEngine") || c.startsWith("freemarker")) best = "template";
            if (c.endsWith("BriefWriter") && m.equals("figures")) best = "charts";
            if (c.endsWith("PdfRenderer") && m.equals("renderHere")) best = "pdf";
            if (c.contains("ParsedFaces")) best = "pdf:fonts-parse";
            if (c.endsWith("PDDocument") && m.equals("save")) best = "pdf:save";
            if (c.contains("chartDrawer") || c.startsWith("org.jfree")) { if (best.startsWith("pdf")) best = "pdf:charts"; }
            if (c.endsWith("OutputFiles")) best = "write";
            if (c.endsWith("SideOutputs")) best = "side";
            if (c.endsWith("PdfWarmUp")) best = "warmup";
        }
        if (best.equals("picocli")) {
            for (StackTraceElement e : st) { if (e.getClassName().startsWith("org.annalist")) { if (!e.getClassName().startsWith("org.annalist.cli.Main")) best = "misc:" + e.getClassName().replace("org.annalist.", "") + "." + e.getMethodName(); break; } }
        }
        if (best.equals("other")) {
            for (StackTraceElement e : st) { if (e.getClassName().startsWith("org.annalist")) { best = "other:" + e.getClassName().replace("org.annalist.", "") + "." + e.getMethodName(); break; } }
        }
        if (best.equals("other") && st.length > 0 && st[st.length-1].getClassName().startsWith("java.lang.Thread")) best = "thread:" ;
        return best;
    }

    static long procCpuMs() {
        try {
            String s = Files.readString(Path.of("/proc/self/stat"));
            String[] f = s.substring(s.lastIndexOf(')') + 2).split(" ");
            return (Long.parseLong(f[11]) + Long.parseLong(f[12])) * 10;
        } catch (Exception e) { return -1; }
    }

    public static void main(String[] args) throws Exception {
        long cpuAtMain = procCpuMs();
        long jvmStart = ManagementFactory.getRuntimeMXBean().getStartTime();
        long wallAtMain = System.currentTimeMillis();
        mainId = Thread.currentThread().getId();
        lastCpu.put(Thread.currentThread().getName() + "#" + mainId, MX.getCurrentThreadCpuTime());
        mainStartCpuNs = MX.getCurrentThreadCpuTime();
        Thread sampler = new Thread(() -> {
            while (true) {
                try { Thread.sleep(10); } catch (InterruptedException e) { return; }
                sample();
            }
        }, "critical-path sampler");
        sampler.setDaemon(true);
        sampler.start();
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            sample();
            long end = System.currentTimeMillis();
            StringBuilder out = new StringBuilder();
            out.append(String.format("wall: jvm->main %d ms, main->exit %d ms; process CPU at main %d ms, at exit %d ms%n",
                    wallAtMain - jvmStart, end - wallAtMain, cpuAtMain, procCpuMs()));
            long crit = 0;
            for (var e : phaseCpu.entrySet()) { if (!e.getKey().startsWith("off:")) crit += e.getValue(); }
            out.append(String.format("critical path (main + threads it waits on) CPU: %d ms (+ main thread before main %d ms; process before main %d ms)%n", crit / 1_000_000, mainStartCpuNs / 1_000_000, cpuAtMain));
            for (var e : phaseCpu.entrySet()) out.append(String.format("  %-28s %6d ms%n", e.getKey(), e.getValue() / 1_000_000));
            // all native threads from /proc
            try (var ds = Files.newDirectoryStream(Path.of("/proc/self/task"))) {
                Map<String, Long> byName = new TreeMap<>();
                for (Path t : ds) {
                    String s = Files.readString(t.resolve("stat"));
                    String name = s.substring(s.indexOf('(') + 1, s.lastIndexOf(')'));
                    String[] f = s.substring(s.lastIndexOf(')') + 2).split(" ");
                    long ms = (Long.parseLong(f[11]) + Long.parseLong(f[12])) * 10;
                    byName.merge(name.replaceAll("[0-9]+$", "#"), ms, Long::sum);
                }
                out.append("threads (live at exit, /proc):");
                byName.forEach((k, v) -> { if (v > 0) out.append(String.format(" [%s %d]", k, v)); });
                out.append('\n');
            } catch (Exception e) { out.append(e).append('\n'); }
            String file = System.getProperty("criticalpath.out");
            try { if (file != null) Files.writeString(Path.of(file), out.toString()); else System.err.print(out); } catch (Exception e) {}
        }));
        org.annalist.cli.Main.main(args);
    }

    /** Whether main waits in the given method of PdfRenderer/TemplateEngine (not inside the warm-up). */
    static boolean mainIn(ThreadInfo main, String unused, String method) {
        if (main == null) return false;
        for (StackTraceElement e : main.getStackTrace()) {
            if (e.getClassName().endsWith("PdfWarmUp")) return false;
            if (e.getMethodName().equals(method) && (e.getClassName().endsWith("PdfRenderer") || e.getClassName().endsWith("TemplateEngine"))) return true;
        }
        return false;
    }

    static synchronized void sample() {
        ThreadInfo[] infos = MX.dumpAllThreads(false, false);
        ThreadInfo main = null;
        Map<String, ThreadInfo> byName = new HashMap<>();
        for (ThreadInfo ti : infos) { byName.put(ti.getThreadName() + "#" + ti.getThreadId(), ti); if (ti.getThreadId() == mainId) main = ti; }
        for (ThreadInfo ti : infos) {
            long id = ti.getThreadId();
            long cpu = MX.getThreadCpuTime(id);
            if (cpu < 0) continue;
            String key = ti.getThreadName() + "#" + id;
            Long prev = lastCpu.put(key, cpu);
            long delta = cpu - (prev == null ? 0 : prev);
            if (delta <= 0 || ti.getThreadName().equals("critical-path sampler")) continue;
            String name = ti.getThreadName();
            String p = phase(ti.getStackTrace());
            boolean onPath = id == mainId || name.equals("pdf layout") && mainIn(main, "renderHere", "render") || name.startsWith("template") && mainIn(main, "renderTraced", "renderTraced");
            if (p.equals(System.getProperty("criticalpath.debug"))) { StringBuilder b = new StringBuilder(delta/1000000 + "ms:"); for (int k = 0; k < Math.min(12, ti.getStackTrace().length); k++) b.append(" <- ").append(ti.getStackTrace()[k]); System.err.println(b); }
            phaseCpu.merge((onPath ? "" : "off:" + name + ":") + p, delta, Long::sum);
        }
    }
}
