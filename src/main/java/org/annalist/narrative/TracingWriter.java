package org.annalist.narrative;

import freemarker.core.Environment;
import freemarker.core.TemplateElement;
import freemarker.core._CoreAPI;
import java.io.IOException;
import java.io.InterruptedIOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;

/**
 * The writer a template fills: bounded in size, and noting for each piece of output which template
 * line wrote it (FreeMarker's instruction stack at the moment of writing), so that a complaint
 * about the XHTML can name {@code brief.ftlx:LINE}.
 */
final class TracingWriter extends Writer {

    /** Thrown when the template writes past its limit; FreeMarker passes a writer's IOException through. */
    static final class OutputLimit extends IOException {
        private static final long serialVersionUID = 1L;

        OutputLimit() {
            super("output limit reached");
        }
    }

    /**
     * Where a piece of output starts, and which template wrote it from which line. A piece that
     * spans as many lines as its template element (static text) is traced line by line.
     */
    record Piece(int offset, String template, int beginLine, int endLine) {
    }

    private final StringBuilder text = new StringBuilder(64 * 1024);
    private final List<Piece> pieces = new ArrayList<>();
    private final int limit;

    TracingWriter(int limit) {
        this.limit = limit;
    }

    @Override
    public void write(char[] buffer, int offset, int length) throws IOException {
        write(new String(buffer, offset, length));
    }

    @Override
    public void write(String s, int offset, int length) throws IOException {
        write(s.substring(offset, offset + length));
    }

    @Override
    public void write(String s) throws IOException {
        if (Thread.currentThread().isInterrupted()) {
            throw new InterruptedIOException("the template's time is up");
        }
        if (text.length() + (long) s.length() > limit) {
            throw new OutputLimit();
        }
        note();
        text.append(s);
    }

    /** Remembers the element writing now, when it is another than the last one's. */
    private void note() {
        Environment env = Environment.getCurrentEnvironment();
        TemplateElement[] stack = env == null ? null : _CoreAPI.getInstructionStackSnapshot(env);
        if (stack == null || stack.length == 0 || stack[0].getTemplate() == null) {
            return;
        }
        TemplateElement element = stack[0];
        String template = element.getTemplate().getSourceName();
        Piece last = pieces.isEmpty() ? null : pieces.get(pieces.size() - 1);
        if (last != null && last.beginLine() == element.getBeginLine() && last.endLine() == element.getEndLine()
                && last.template().equals(template) && last.offset() == text.length()) {
            return;
        }
        pieces.add(new Piece(text.length(), template, element.getBeginLine(), element.getEndLine()));
    }

    /** {@code TEMPLATE:LINE} of what was written last (where a limit was reached), or the template's name. */
    String where(String templateName) {
        return pieces.isEmpty() ? templateName : trace().at(Math.max(0, text.length() - 1), templateName);
    }

    Trace trace() {
        return new Trace(text.toString(), List.copyOf(pieces));
    }

    @Override
    public String toString() {
        return text.toString();
    }

    @Override
    public void flush() {
    }

    @Override
    public void close() {
    }

    /** Output offsets back to template lines. */
    record Trace(String text, List<Piece> pieces) {

        /** {@code TEMPLATE:LINE} that wrote the character at {@code offset}. */
        String at(int offset, String templateName) {
            Piece found = null;
            int index = -1;
            for (int i = 0; i < pieces.size() && pieces.get(i).offset() <= offset; i++) {
                found = pieces.get(i);
                index = i;
            }
            if (found == null) {
                return templateName;
            }
            int end = index + 1 < pieces.size() ? pieces.get(index + 1).offset() : text.length();
            int line = found.beginLine();
            String piece = text.substring(found.offset(), end);
            long newlinesInPiece = piece.chars().filter(c -> c == '\n').count() - (piece.endsWith("\n") ? 1 : 0);
            if (newlinesInPiece == found.endLine() - found.beginLine()) {
                // static text written as it stands: its lines are the template's lines
                line += (int) text.substring(found.offset(), Math.min(offset, end)).chars().filter(c -> c == '\n').count();
            }
            return found.template() + ":" + line;
        }
    }
}
