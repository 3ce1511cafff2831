package org.annalist.narrative;

import freemarker.cache.ClassTemplateLoader;
import freemarker.cache.FileTemplateLoader;
import freemarker.cache.MultiTemplateLoader;
import freemarker.cache.TemplateLoader;
import freemarker.core.TemplateClassResolver;
import freemarker.template.Configuration;
import freemarker.template.DefaultObjectWrapperBuilder;
import freemarker.template.TemplateException;
import freemarker.template.TemplateExceptionHandler;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * Fills the brief templates ({@code report-templates/}, bundled in the jar; a user's folder of the
 * same names overrides them) with a {@link BriefView}.
 *
 * <p>Sandboxed: templates cannot create Java objects ({@code ?new}) or reach the Java API
 * ({@code ?api}), so a template handed over by a client cannot run code. Output is XHTML with
 * automatic escaping ({@code .ftlx}), so names such as {@code B&B nights} stay well-formed.
 */
public final class TemplateEngine {

    public static final String BRIEF_TEMPLATE = "brief.ftlx";
    public static final String MULTI_TEMPLATE = "multi.ftlx";

    private final Configuration configuration;

    /** @param userTemplates a folder whose templates replace the bundled ones of the same name */
    public TemplateEngine(Optional<Path> userTemplates) {
        configuration = new Configuration(Configuration.VERSION_2_3_35);
        configuration.setTemplateLoader(loader(userTemplates));
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
        try {
            StringWriter out = new StringWriter();
            configuration.getTemplate(templateName, language).process(Map.of("brief", view), out);
            return out.toString();
        } catch (IOException e) {
            throw new UncheckedIOException("template " + templateName + " cannot be read", e);
        } catch (TemplateException e) {
            throw new TemplateProblem(templateName, e);
        }
    }

    private static TemplateLoader loader(Optional<Path> userTemplates) {
        TemplateLoader bundled = new ClassTemplateLoader(TemplateEngine.class, "/report-templates");
        if (userTemplates.isEmpty()) {
            return bundled;
        }
        try {
            return new MultiTemplateLoader(new TemplateLoader[] {new FileTemplateLoader(userTemplates.get().toFile()), bundled});
        } catch (IOException e) {
            throw new UncheckedIOException("template folder " + userTemplates.get() + " cannot be read", e);
        }
    }

    /** A template that does not fit the view: a user's template mistake, reported with its line. */
    public static final class TemplateProblem extends RuntimeException {
        private static final long serialVersionUID = 1L;

        TemplateProblem(String template, TemplateException cause) {
            super(template + ":" + cause.getLineNumber() + ":" + cause.getColumnNumber() + ": "
                    + cause.getMessageWithoutStackTop().lines().findFirst().orElse("template error"), cause);
        }
    }
}
