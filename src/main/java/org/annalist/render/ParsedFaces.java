package org.annalist.render;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.Deque;
import java.util.concurrent.ConcurrentLinkedDeque;
import org.apache.fontbox.ttf.TTFParser;
import org.apache.fontbox.ttf.TrueTypeFont;
import org.apache.pdfbox.io.RandomAccessReadBuffer;

/**
 * The brief's font faces parsed (FontBox's {@link TrueTypeFont}: the table directory, the character
 * map, the metrics and the glyph-substitution table read), kept from one PDF to the next.
 *
 * <p>Given the font's bytes, the layout engine copies and parses every face anew for every
 * document (a fifth of a warm brief's font work, and 4–5 MB of copies a brief); a parsed face
 * makes the same embedded subset in any number of documents, since embedding only reads it. A
 * parsed face is not safe for two documents laid out at once (FontBox reads its tables on demand
 * from one shared position), so each layout borrows a set of its own and gives it back when its
 * PDF is written; a layout that fails or is stopped keeps its set, which is then dropped. At most
 * {@value #KEPT} sets wait between layouts (a batch lays out one brief per core at a time), so what
 * is kept does not grow with the number of briefs: each set holds its own copy of the three files
 * (2 MB) and the tables read from them.
 */
final class ParsedFaces {

    /** The most sets kept between layouts. */
    static final int KEPT = 4;

    private static final Deque<ParsedFaces> IDLE = new ConcurrentLinkedDeque<>();

    private final TrueTypeFont[] faces;

    private ParsedFaces(TrueTypeFont[] faces) {
        this.faces = faces;
    }

    /** A set no other layout is using: one given back before, or else one parsed now. */
    static ParsedFaces borrow() {
        ParsedFaces idle = IDLE.pollFirst();
        return idle != null ? idle : parse();
    }

    /** Hands the set to the next layout (call only once the PDF that used it is written). */
    void giveBack() {
        if (IDLE.size() < KEPT) {
            IDLE.offerFirst(this);
        }
    }

    /** Face {@code index} of {@link Fonts}' faces. */
    TrueTypeFont face(int index) {
        return faces[index];
    }

    private static ParsedFaces parse() {
        TrueTypeFont[] faces = new TrueTypeFont[Fonts.faceCount()];
        for (int i = 0; i < faces.length; i++) {
            try {
                faces[i] = new TTFParser().parse(new RandomAccessReadBuffer(Fonts.file(i)));
            } catch (IOException e) {
                throw new UncheckedIOException("bundled font " + i + " cannot be parsed", e);
            }
        }
        return new ParsedFaces(faces);
    }
}
