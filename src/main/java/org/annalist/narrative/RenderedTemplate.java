package org.annalist.narrative;

import java.util.Optional;

/**
 * A template's XHTML, with where each part of it came from: a later complaint about the XHTML (a
 * layout engine that cannot parse it, a file it may not use) becomes a {@link TemplateEngine.TemplateProblem}
 * that names the template's line.
 */
public final class RenderedTemplate {

    private final String templateName;
    private final String xhtml;
    private final TracingWriter.Trace trace;

    RenderedTemplate(String templateName, String xhtml, TracingWriter.Trace trace) {
        this.templateName = templateName;
        this.xhtml = xhtml;
        this.trace = trace;
    }

    public String xhtml() {
        return xhtml;
    }

    /**
     * A complaint about the XHTML as the template's problem.
     *
     * @param line     line of the XHTML where it was found (1-based), or 0 when unknown
     * @param column   its column (1-based), or 0
     * @param evidence text of the XHTML it concerns (a URL as written), looked up when no line is known; may be empty
     * @param what     what is wrong, in a phrase
     */
    public TemplateEngine.TemplateProblem problem(int line, int column, String evidence, String what) {
        Optional<Integer> offset = line > 0 ? offsetOf(line, column) : find(evidence);
        String where = offset.map(o -> trace.at(o, templateName)).orElse(templateName);
        return new TemplateEngine.TemplateProblem(where + ": " + what);
    }

    private Optional<Integer> offsetOf(int line, int column) {
        int offset = 0;
        for (int l = 1; l < line; l++) {
            int next = xhtml.indexOf('\n', offset);
            if (next < 0) {
                return Optional.empty();
            }
            offset = next + 1;
        }
        return Optional.of(Math.min(xhtml.length() - 1, offset + Math.max(0, column - 1)));
    }

    private Optional<Integer> find(String evidence) {
        if (evidence.isEmpty()) {
            return Optional.empty();
        }
        for (String form : new String[] {evidence, evidence.replace("&", "&amp;")}) {
            int at = xhtml.indexOf(form);
            if (at >= 0) {
                return Optional.of(at);
            }
        }
        return Optional.empty();
    }
}
