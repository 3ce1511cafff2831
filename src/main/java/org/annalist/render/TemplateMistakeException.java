package org.annalist.render;

/**
 * What a template asked of the renderer that it does not do (XHTML it cannot parse, a file or URL
 * outside what a brief may use, a chart the brief has not drawn): the user's template mistake, which
 * the caller names by the template's line.
 */
public final class TemplateMistakeException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final int line;
    private final int column;
    private final String evidence;

    /**
     * @param line     line of the XHTML (1-based), 0 when unknown
     * @param column   its column, 0 when unknown
     * @param evidence text of the XHTML the mistake concerns (a URL as written), to find it by; may be empty
     */
    TemplateMistakeException(int line, int column, String evidence, String message, Throwable cause) {
        super(message, cause);
        this.line = line;
        this.column = column;
        this.evidence = evidence;
    }

    public int line() {
        return line;
    }

    public int column() {
        return column;
    }

    public String evidence() {
        return evidence;
    }
}
