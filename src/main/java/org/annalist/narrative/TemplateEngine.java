package org.annalist.narrative;

import freemarker.cache.ClassTemplateLoader;
import freemarker.cache.FileTemplateLoader;
import freemarker.cache.MultiTemplateLoader;
import freemarker.cache.TemplateLoader;
import freemarker.core.ParseException;
import freemarker.core.TemplateClassResolver;
import freemarker.core._CoreAPI;
import freemarker.template.Configuration;
import freemarker.template.DefaultObjectWrapperBuilder;
import freemarker.template.Template;
import freemarker.template.TemplateException;
import freemarker.template.TemplateExceptionHandler;
import java.io.File;
import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Collections;
import java.util.IdentityHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.atomic.AtomicReference;

/**
 * Fills the brief templates ({@code report-templates/}, bundled in the jar; a user's folder of the
 * same names overrides them) with a {@link BriefView}.
 *
 * <p>Sandboxed: templates cannot create Java objects ({@code ?new}) or reach the Java API
 * ({@code ?api}), so a template handed over by a client cannot run code. Output is XHTML with
 * automatic escaping ({@code .ftlx}), so names such as {@code B&B nights} stay well-formed.
 *
 * <p>Bounded: a template runs on its own thread with a time limit ({@link Limits#time()}, 10 s by
 * default; loops check for the end of their time), writes at most {@link Limits#outputChars()}
 * characters (8 MB), and a macro or function that calls itself without end is stopped by its
 * stack. Each of these is a {@link TemplateProblem} with the template's name and, where it is
 * known, its line, never a raw error.
 */
public final class TemplateEngine {

    public static final String BRIEF_TEMPLATE = "brief.ftlx";
    public static final String MULTI_TEMPLATE = "multi.ftlx";

    /**
     * @param time        how long a template may run (a brief takes milliseconds)
     * @param outputChars how much XHTML it may write (a brief writes about 100 kB; a combined brief of
     *                    50 series about 2 MB)
     */
    public record Limits(Duration time, int outputChars) {
        public static final Limits DEFAULT = new Limits(Duration.ofSeconds(10), 8 * 1024 * 1024);
    }

    /** The thread's stack: room for the bundled templates many times over, small enough that endless recursion ends fast. */
    private static final long STACK_BYTES = 4L << 20;

    private final Configuration configuration;
    private final Limits limits;

    /** @param userTemplates a folder whose templates replace the bundled ones of the same name */
    public TemplateEngine(Optional<Path> userTemplates) {
        this(userTemplates, Limits.DEFAULT);
    }

    public TemplateEngine(Optional<Path> userTemplates, Limits limits) {
        this.limits = limits;
        configuration = new InterruptibleConfiguration();
        configuration.setTemplateLoader(loader(userTemplates));
        // an engine is kept for many briefs (a batch): a user's template edited meanwhile is read
        // again (the bundled ones cannot change while the JVM runs)
        userTemplates.ifPresent(folder -> configuration.setTemplateUpdateDelayMilliseconds(0));
        lockDown(configuration);
    }

    /**
     * The settings every template of the project is filled under, the brief's and the workbench's
     * pages alike: UTF-8, English, errors thrown rather than printed into the output, and no way
     * for a template to create Java objects or reach the API of the values it is given.
     */
    static void lockDown(Configuration configuration) {
        configuration.setDefaultEncoding("UTF-8");
        configuration.setLocale(Locale.ENGLISH);
        configuration.setTemplateExceptionHandler(TemplateExceptionHandler.RETHROW_HANDLER);
        configuration.setLogTemplateExceptions(false);
        configuration.setWrapUncheckedExceptions(true);
        configuration.setFallbackOnNullLoopVariable(false);
        configuration.setNewBuiltinClassResolver(TemplateClassResolver.ALLOWS_NOTHING_RESOLVER);
        configuration.setAPIBuiltinEnabled(false);
        // From 2.3.33 on, record components read as values (brief.title); needs the jar's Multi-Release manifest.
        configuration.setObjectWrapper(new DefaultObjectWrapperBuilder(Configuration.VERSION_2_3_35).build());
    }

    /**
     * @param view     the {@link BriefView} or {@link MultiBriefView} the template reads as {@code brief}
     * @param language picks {@code NAME_LANG.ftlx} over {@code NAME.ftlx} where it exists (FreeMarker's
     *                 localized lookup): how a translated narrative is added
     */
    public String render(String templateName, Object view, Locale language) {
        return renderTraced(templateName, view, language).xhtml();
    }

    /**
     * Parses a template into the engine's cache ahead of its first use (a cold brief does this on a
     * spare core while the series is analysed); a template that cannot be parsed is left for
     * {@link #renderTraced} to report.
     */
    public void prepare(String templateName, Locale language) {
        try {
            configuration.getTemplate(templateName, language);
        } catch (IOException e) {
            // reported, with its line, when the template is filled
        }
    }

    /**
     * As {@link #render}, keeping where each part of the output came from, so that a later
     * complaint about the XHTML (not well-formed, a file it may not use) names the template's line.
     */
    public RenderedTemplate renderTraced(String templateName, Object view, Locale language) {
        Template template;
        try {
            template = configuration.getTemplate(templateName, language);
        } catch (ParseException e) {
            throw new TemplateProblem(Optional.ofNullable(e.getTemplateName()).orElse(templateName) + ":"
                    + e.getLineNumber() + ":" + e.getColumnNumber() + ": "
                    + e.getEditorMessage().lines().findFirst().orElse("not a template"));
        } catch (RefusedTemplateFile e) {
            throw new TemplateProblem(e.getMessage());
        } catch (IOException e) {
            throw new UncheckedIOException("template " + templateName + " cannot be read", e);
        }
        TracingWriter out = new TracingWriter(limits.outputChars());
        AtomicReference<Throwable> failure = new AtomicReference<>();
        Thread worker = new Thread(null, () -> {
            try {
                template.process(Map.of("brief", view), out);
            } catch (Throwable e) {   // every way out is reported by the caller's thread below
                failure.set(e);
            }
        }, "template " + templateName, STACK_BYTES);
        worker.setDaemon(true);
        worker.start();
        if (!finished(worker, limits.time().toMillis())) {
            stop(worker);
            long millis = limits.time().toMillis();
            throw new TemplateProblem(out.where(templateName) + ": the template did not finish within "
                    + (millis % 1000 == 0 ? millis / 1000 + " s" : millis + " ms") + " (an endless <#list> or a loop that never ends?)");
        }
        Throwable e = failure.get();
        if (e == null) {
            return new RenderedTemplate(templateName, out.toString(), out.trace());
        }
        if (e instanceof TemplateException t) {
            throw new TemplateProblem(templateName, t);
        }
        if (e instanceof TracingWriter.OutputLimit) {
            int chars = limits.outputChars();
            throw new TemplateProblem(out.where(templateName) + ": the template wrote more than "
                    + (chars % (1024 * 1024) == 0 ? chars / (1024 * 1024) + " MB" : chars + " characters")
                    + " of XHTML (an endless <#list>?)");
        }
        if (e instanceof StackOverflowError) {
            throw new TemplateProblem(out.where(templateName) + ": the template nested too deeply "
                    + "(a macro or function that calls itself without end?)");
        }
        if (e instanceof OutOfMemoryError) {
            throw new TemplateProblem(out.where(templateName) + ": the template needed more memory than there is "
                    + "(a very large sequence or string?)");
        }
        if (e instanceof IOException io) {
            throw new UncheckedIOException("template " + templateName + " cannot be read", io);
        }
        if (e instanceof RuntimeException r) {
            throw r;
        }
        if (e instanceof Error error) {
            throw error;
        }
        throw new IllegalStateException(e);
    }

    private static boolean finished(Thread worker, long millis) {
        try {
            worker.join(millis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            worker.interrupt();
            throw new IllegalStateException("interrupted while the template ran", e);
        }
        return !worker.isAlive();
    }

    /**
     * Ends a template past its time: loops see the interruption at their next turn; a single
     * built-in that runs on (a huge {@code ?join}) is stopped, where the JVM still allows it, so
     * that it does not go on using a core in a batch. The thread is a daemon either way.
     */
    @SuppressWarnings({"deprecation", "removal"})
    private static void stop(Thread worker) {
        worker.interrupt();
        try {
            worker.join(1000);
            if (worker.isAlive()) {
                worker.stop();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (UnsupportedOperationException e) {
            // Java 20 and later: the daemon thread is left to end with the process
        }
    }

    private static TemplateLoader loader(Optional<Path> userTemplates) {
        TemplateLoader bundled = new ClassTemplateLoader(TemplateEngine.class, "/report-templates");
        if (userTemplates.isEmpty()) {
            return bundled;
        }
        try {
            return new MultiTemplateLoader(new TemplateLoader[] {
                new BoundedLoader(userTemplates.get(), new FileTemplateLoader(userTemplates.get().toFile())), bundled});
        } catch (IOException e) {
            throw new UncheckedIOException("template folder " + userTemplates.get() + " cannot be read", e);
        }
    }

    /** A user's template file is read whole; beyond this it is refused before it is read (a brief's template has 30 kB). */
    static final long MAX_TEMPLATE_BYTES = 4L * 1024 * 1024;

    /** Thrown by {@link BoundedLoader} for a template file it refuses, with the message to show. */
    private static final class RefusedTemplateFile extends IOException {
        private static final long serialVersionUID = 1L;

        RefusedTemplateFile(String message) {
            super(message);
        }
    }

    /**
     * The user's folder, refusing a template file over {@link #MAX_TEMPLATE_BYTES}, and a name in it
     * that is there but is no template the folder holds: a symbolic link leading out of the folder
     * (by real path) or nowhere, a folder, a device or a pipe. Such a file is the user's mistake, to
     * be named, never passed over for the bundled template of the same name.
     */
    private record BoundedLoader(Path folder, TemplateLoader inner) implements TemplateLoader {
        @Override
        public Object findTemplateSource(String name) throws IOException {
            refuseIfNotInside(name);
            Object source = inner.findTemplateSource(name);
            if (source instanceof File file && file.length() > MAX_TEMPLATE_BYTES) {
                throw new RefusedTemplateFile(name + ": the template file has " + file.length() + " bytes, over the limit of "
                        + MAX_TEMPLATE_BYTES / (1024 * 1024) + " MB");
            }
            return source;
        }

        private void refuseIfNotInside(String name) throws RefusedTemplateFile {
            Path file = folder.resolve(name).normalize();
            if (!java.nio.file.Files.exists(file, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
                return;   // not there: the bundled template of that name is used
            }
            Path real;
            Path realFolder;
            try {
                realFolder = folder.toRealPath();
                real = file.toRealPath();
            } catch (IOException leadsNowhere) {
                throw new RefusedTemplateFile(name + ": " + file + " is a symbolic link that leads nowhere; expected a "
                        + "template file in the template folder " + folder);
            }
            if (!real.startsWith(realFolder)) {
                throw new RefusedTemplateFile(name + ": " + file + " leads to " + real + ", outside the template folder "
                        + realFolder + "; a template folder's templates must be inside it");
            }
            if (!java.nio.file.Files.isRegularFile(real)) {
                throw new RefusedTemplateFile(name + ": " + file + " is not a regular file; expected a template file");
            }
        }

        @Override
        public long getLastModified(Object source) {
            return inner.getLastModified(source);
        }

        @Override
        public Reader getReader(Object source, String encoding) throws IOException {
            return inner.getReader(source, encoding);
        }

        @Override
        public void closeTemplateSource(Object source) throws IOException {
            inner.closeTemplateSource(source);
        }
    }

    /**
     * Every template it hands out (included and imported ones too) checks at each turn of a loop
     * whether its thread was interrupted, which is how the time limit ends an endless
     * {@code <#list 1..>} that writes nothing.
     */
    private static final class InterruptibleConfiguration extends Configuration {
        private final Set<Template> checked = Collections.newSetFromMap(new IdentityHashMap<>());

        InterruptibleConfiguration() {
            super(Configuration.VERSION_2_3_35);
        }

        @Override
        public Template getTemplate(String name, Locale locale, Object customLookupCondition, String encoding,
                                    boolean parseAsFTL, boolean ignoreMissing) throws IOException {
            Template template = super.getTemplate(name, locale, customLookupCondition, encoding, parseAsFTL, ignoreMissing);
            if (template != null) {
                synchronized (checked) {
                    if (checked.add(template)) {
                        _CoreAPI.addThreadInterruptedChecks(template);
                    }
                }
            }
            return template;
        }
    }

    /** A template that does not fit the view: a user's template mistake, reported with its line. */
    public static final class TemplateProblem extends RuntimeException {
        private static final long serialVersionUID = 1L;

        TemplateProblem(String template, TemplateException cause) {
            super(template + ":" + cause.getLineNumber() + ":" + cause.getColumnNumber() + ": "
                    + refused(cause).filter(r -> !firstLine(cause).contains(r.getMessage()))
                    .map(r -> firstLine(cause) + " " + r.getMessage()).orElse(firstLine(cause)), cause);
        }

        /** The message's first line, and the second where the first only leads up to it ("… failed (…):"). */
        private static String firstLine(TemplateException cause) {
            java.util.List<String> lines = cause.getMessageWithoutStackTop().lines().filter(l -> !l.isBlank()).limit(2).toList();
            if (lines.isEmpty()) {
                return "template error";
            }
            return lines.get(0).endsWith(":") && lines.size() > 1 ? lines.get(0) + " " + lines.get(1).strip() : lines.get(0);
        }

        /** The refusal of a file the template includes, which FreeMarker reports only as its cause. */
        private static Optional<RefusedTemplateFile> refused(Throwable e) {
            for (Throwable c = e; c != null; c = c.getCause()) {
                if (c instanceof RefusedTemplateFile r) {
                    return Optional.of(r);
                }
            }
            return Optional.empty();
        }

        /** @param message already {@code TEMPLATE:LINE: what} (or {@code TEMPLATE: what} where no line is known) */
        TemplateProblem(String message) {
            super(message);
        }
    }
}
