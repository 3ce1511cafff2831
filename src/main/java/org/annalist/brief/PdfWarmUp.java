package org.annalist.brief;

import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.Supplier;
import org.annalist.narrative.TemplateEngine;
import org.annalist.render.Fonts;
import org.annalist.render.PdfRenderer;

/**
 * The first brief of a JVM starts cold: its set-up that depends on nothing the analysis finds (the
 * template engine made and the template parsed, the fonts registered with AWT, a set of the font's
 * faces parsed, the colour profile read) would otherwise run after the analysis, on the same
 * thread. On a machine of two or more cores this runs it once, on a second thread, while the main
 * thread reads and analyses the series; the brief then finds it done (or waits for the part still
 * under way, which it would have done itself).
 *
 * <p>It is the brief's own set-up, done earlier, not extra work: the engine, its parsed template,
 * the registered fonts and the parsed faces are what the brief uses, through the caches every
 * brief of a batch shares already, so the PDF is the same to the byte. It writes no file, reports
 * nothing (a failure here is dropped; the brief meets and reports the same cause), and never
 * delays the end of the process: its thread is a daemon, and a failing run exits without waiting
 * for it. It runs at most once per JVM, only for commands that write a brief.
 *
 * <p>An earlier version also laid out a page of sample text, a table and a chart to nowhere, so
 * that the layout's code would be loaded and compiled ahead; that cost about 0.2–0.4 s of CPU on
 * the second core, which on two cores competes with the compiler, and the wall time did not gain
 * from it (README, "Start-up and memory").
 */
final class PdfWarmUp {

    private static final AtomicBoolean STARTED = new AtomicBoolean();

    /** A system property for measuring: {@code false} turns the warm-up off. */
    static final String PROPERTY = "annalist.warmup";

    private PdfWarmUp() {
    }

    /**
     * Starts the warm-up on a background thread, once per JVM, where there are two or more cores.
     *
     * @param template the bundled template the brief will be filled from, or empty when the user's
     *                 folder supplies it (which is then read only by the real brief)
     * @param language the brief's language, by which the template is looked up
     * @param engine   the bundled templates' engine, made where first asked for
     */
    static void start(Optional<String> template, Locale language, Supplier<TemplateEngine> engine) {
        if (Runtime.getRuntime().availableProcessors() < 2 || System.getProperty(PROPERTY, "").equals("false")
                || !STARTED.compareAndSet(false, true)) {
            return;
        }
        Thread thread = new Thread(() -> prepare(template, language, engine), "pdf warm-up");
        thread.setDaemon(true);
        thread.start();
    }

    /**
     * The warm-up's work, on the calling thread, in the order the brief needs it: the fonts (its
     * first step after the analysis checks the title's characters against them), the template,
     * then the layout's font faces and colour profile.
     *
     * @return whether all of it was done (a failure is dropped: the brief reports its cause)
     */
    static boolean prepare(Optional<String> template, Locale language, Supplier<TemplateEngine> engine) {
        try {
            Fonts.registerWithAwt();
            template.ifPresent(name -> engine.get().prepare(name, language));
            PdfRenderer.prepare();
            return true;
        } catch (RuntimeException | LinkageError dropped) {
            // nothing to report: the brief takes the same path and reports what fails there
            return false;
        }
    }
}
