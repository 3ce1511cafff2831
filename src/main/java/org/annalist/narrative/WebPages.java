package org.annalist.narrative;

import freemarker.cache.ClassTemplateLoader;
import freemarker.core.HTMLOutputFormat;
import freemarker.template.Configuration;
import freemarker.template.DefaultObjectWrapperBuilder;
import freemarker.core.TemplateClassResolver;
import freemarker.template.TemplateException;
import freemarker.template.TemplateExceptionHandler;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.Locale;
import java.util.Map;

/**
 * The pages of the browser workbench ({@code annalist serve}), worded in their templates: the
 * bundled {@code web/*.ftlh} on the class path, and nothing else — a browser can never hand the
 * server a template. HTML auto-escaping, no {@code ?new}, no {@code ?api}, as for the brief.
 */
public final class WebPages {

    private final Configuration configuration;

    public WebPages() {
        configuration = new Configuration(Configuration.VERSION_2_3_35);
        configuration.setTemplateLoader(new ClassTemplateLoader(WebPages.class, "/web"));
        configuration.setDefaultEncoding("UTF-8");
        configuration.setOutputEncoding("UTF-8");
        configuration.setURLEscapingCharset("UTF-8");
        configuration.setOutputFormat(HTMLOutputFormat.INSTANCE);
        configuration.setLocale(Locale.ENGLISH);
        configuration.setTemplateExceptionHandler(TemplateExceptionHandler.RETHROW_HANDLER);
        configuration.setLogTemplateExceptions(false);
        configuration.setWrapUncheckedExceptions(true);
        configuration.setFallbackOnNullLoopVariable(false);
        configuration.setNewBuiltinClassResolver(TemplateClassResolver.ALLOWS_NOTHING_RESOLVER);
        configuration.setAPIBuiltinEnabled(false);
        // record components read as values (page.title); needs the jar's Multi-Release manifest
        configuration.setObjectWrapper(new DefaultObjectWrapperBuilder(Configuration.VERSION_2_3_35).build());
    }

    /**
     * The page {@code name} ({@code home.ftlh}) filled from {@code model}.
     *
     * @throws IllegalStateException when a bundled template fails, a programming error
     */
    public String render(String name, Map<String, Object> model) {
        try {
            StringWriter out = new StringWriter();
            configuration.getTemplate(name).process(model, out);
            return out.toString();
        } catch (IOException e) {
            throw new UncheckedIOException("the bundled page template " + name + " cannot be read", e);
        } catch (TemplateException e) {
            throw new IllegalStateException("the bundled page template " + name + " failed: " + e.getMessage(), e);
        }
    }
}
