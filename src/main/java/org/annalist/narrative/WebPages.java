package org.annalist.narrative;

import freemarker.cache.ClassTemplateLoader;
import freemarker.core.HTMLOutputFormat;
import freemarker.template.Configuration;
import freemarker.template.TemplateException;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
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
        TemplateEngine.lockDown(configuration);
        configuration.setOutputEncoding("UTF-8");
        configuration.setURLEscapingCharset("UTF-8");
        configuration.setOutputFormat(HTMLOutputFormat.INSTANCE);
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
