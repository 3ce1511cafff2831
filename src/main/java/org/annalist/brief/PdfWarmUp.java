package org.annalist.brief;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.atomic.AtomicBoolean;
import org.annalist.chart.Captions;
import org.annalist.chart.Figure;
import org.annalist.chart.YearOverlayChart;
import org.annalist.narrative.TemplateEngine;
import org.annalist.render.PdfRenderer;
import org.annalist.render.Sandbox;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * The first brief of a JVM starts cold: openhtmltopdf's, PDFBox's and the chart library's classes
 * are loaded, initialised, interpreted and compiled, the fonts registered with AWT, the colour
 * profile read, the template parsed, all after the analysis and on the same thread. On a machine of
 * two or more cores this runs that work once, on a spare core, while the main thread analyses the
 * series: the template the brief will use is parsed into the engine's cache, and a small page made
 * of the bundled style sheet, every face of the font, a table and a chart is laid out and written
 * to nowhere. The real brief then finds its path warm.
 *
 * <p>It changes nothing the brief contains: it shares no state with the real layout but the
 * classes, the fonts' bytes and the parsed template, which every brief of a batch already shares.
 * It writes no file, reports nothing (a failure here is dropped; the real brief meets and reports
 * the same cause), and never delays the end of the process: its thread is a daemon, and a failing
 * run exits without waiting for it. It runs at most once per JVM, only for commands that write a
 * brief, and not where no core is spare (a single core, or a load average at or above the number
 * of cores), where it would only compete with the analysis.
 */
final class PdfWarmUp {

    private static final AtomicBoolean STARTED = new AtomicBoolean();

    /**
     * A system property for measuring: {@code false} turns the warm-up off, {@code always} runs it
     * on a busy machine too; anything else, or none, runs it where a core is spare.
     */
    static final String PROPERTY = "annalist.warmup";

    private PdfWarmUp() {
    }

    /**
     * Starts the warm-up on a background thread, once per JVM.
     *
     * @param template the bundled template the brief will be filled from, or empty when the user's
     *                 folder supplies it (which is then read only by the real brief)
     * @param language the brief's language, by which the template is looked up
     * @param engine   the bundled templates' engine
     */
    static void start(java.util.Optional<String> template, Locale language, TemplateEngine engine) {
        int cores = Runtime.getRuntime().availableProcessors();
        String mode = System.getProperty(PROPERTY, "");
        if (cores < 2 || mode.equals("false") || !STARTED.compareAndSet(false, true)) {
            return;
        }
        // the load is read on the new thread: the JVM's management classes it loads stay off the brief's path
        Thread thread = new Thread(() -> {
            if (mode.equals("always") || !busy(cores)) {
                warmUpHere(template, language, engine);
            }
        }, "pdf warm-up");
        thread.setDaemon(true);
        thread.start();
    }

    /**
     * Whether the machine has no spare core: the run queue's average over the last minute, as the
     * JVM reports it, is at least the number of cores. Where the JVM cannot tell (a negative
     * average), a core is taken to be spare.
     */
    static boolean busy(int cores) {
        return ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage() >= cores;
    }

    /**
     * The warm-up's work, on the calling thread.
     *
     * @return whether the page was laid out (a failure is dropped: the real brief reports its cause)
     */
    static boolean warmUpHere(java.util.Optional<String> template, Locale language, TemplateEngine engine) {
        try {
            template.ifPresent(name -> engine.prepare(name, language));
            Series series = sample();
            Captions captions = new Captions("a", "b", "c", "d", "e", "f", "g", "h", "i");
            Figure chart = YearOverlayChart.of(series, captions);
            byte[] pdf = new PdfRenderer().render(page(chart.id()), Sandbox.closed(Path.of("").toAbsolutePath()),
                    List.of(chart), Instant.EPOCH, 0L);
            return pdf.length > 0;
        } catch (Throwable dropped) {
            // nothing to report: the real brief takes the same path and reports what fails there
            return false;
        }
    }

    /** Three years of a monthly series with a season (made up; it is drawn to nowhere). */
    private static Series sample() {
        double[] values = new double[36];
        for (int i = 0; i < values.length; i++) {
            values[i] = 1000 + 10 * i + 300 * Math.sin(2 * Math.PI * i / 12);
        }
        return Series.of("x", "", Period.month(2020, 1), values, i -> Set.of());
    }

    /**
     * A page that takes the brief's ways through the layout: the bundled style sheet, headings,
     * bold and italic text, a paginated table, a numbered page footer and a chart object.
     */
    private static String page(String chartId) throws IOException {
        String css;
        try (InputStream in = PdfWarmUp.class.getResourceAsStream("/report-templates/brief.css")) {
            css = in == null ? "" : new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        String text = "Abc 123,456.7 % \u2013 <b>Def 8.9</b> <i>ghi 10</i> jkl\u00a0mn op";
        StringBuilder rows = new StringBuilder();
        for (int i = 0; i < 12; i++) {
            rows.append("<tr><td class=\"text\">").append(i).append("</td><td>").append(1000 + i * 37).append("</td>")
                    .append("<td class=\"note\">").append(text).append("</td></tr>");
        }
        return "<!DOCTYPE html><html lang=\"en\"><head><meta charset=\"UTF-8\"/><title>w</title><style>" + css
                + "</style><style>@page { size: A4; }</style></head><body>"
                + "<h1>Wxyz</h1><h2>Qrs</h2><p>" + text + " " + text + "</p><h3>Tuv</h3>"
                + "<div class=\"figure\"><object type=\"" + PdfRenderer.CHART_MIME_TYPE + "\" class=\"chart small\" data-chart=\""
                + chartId + "\" alt=\"w\"></object><p class=\"caption\">" + text + "</p></div>"
                + "<table class=\"data\"><thead><tr><th class=\"text\">a</th><th>b</th><th>c</th></tr></thead><tbody>"
                + rows + "</tbody></table><ul class=\"notes\"><li>" + text + "</li></ul></body></html>";
    }
}
