package org.annalist.render;

import com.openhtmltopdf.outputdevice.helper.BaseRendererBuilder.FontStyle;
import com.openhtmltopdf.pdfboxout.PDFontSupplier;
import com.openhtmltopdf.pdfboxout.PdfRendererBuilder;
import java.awt.Font;
import java.awt.FontFormatException;
import java.awt.GraphicsEnvironment;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import org.annalist.chart.Figure;
import org.apache.fontbox.ttf.TrueTypeFont;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.font.PDType0Font;

/**
 * The brief's one font family, DejaVu Sans (Bitstream Vera licence, see {@code fonts/LICENSE-DejaVu.txt}),
 * loaded from the classpath and never from the system, so that every machine draws the same brief.
 *
 * <p>It is registered twice under one family name: with the PDF renderer for the text, and with
 * AWT so that chart text is measured with the font the PDF then embeds.
 */
public final class Fonts {

    private record Face(String resource, int weight, FontStyle style) {
    }

    private static final Face[] FACES = {
        new Face("fonts/DejaVuSans.ttf", 400, FontStyle.NORMAL),
        new Face("fonts/DejaVuSans-Bold.ttf", 700, FontStyle.NORMAL),
        new Face("fonts/DejaVuSans-Oblique.ttf", 400, FontStyle.ITALIC),
    };

    private static boolean registeredWithAwt;

    /**
     * Each face's file, read from the jar once per JVM (2 MB for the three) rather than inflated
     * again for every brief of a batch; {@link ParsedFaces} parses it, each document subsets it.
     */
    private static final byte[][] FILES = new byte[FACES.length][];

    private Fonts() {
    }

    /** Makes the family known to AWT (once per JVM); call before any chart is drawn. */
    public static synchronized void registerWithAwt() {
        if (registeredWithAwt) {
            return;
        }
        GraphicsEnvironment environment = GraphicsEnvironment.getLocalGraphicsEnvironment();
        for (int i = 0; i < FACES.length; i++) {
            try (InputStream in = new ByteArrayInputStream(file(i))) {
                environment.registerFont(Font.createFont(Font.TRUETYPE_FONT, in));
            } catch (IOException | FontFormatException e) {
                throw new IllegalStateException("bundled font " + FACES[i].resource() + " cannot be loaded", e);
            }
        }
        registeredWithAwt = true;
    }

    /** The characters of {@code text} that the brief's font has no glyph for, each once, in order. */
    public static String missingGlyphs(String text) {
        registerWithAwt();
        Font font = new Font(Figure.FONT_FAMILY, Font.PLAIN, 10);
        StringBuilder missing = new StringBuilder();
        text.codePoints().filter(cp -> !Character.isWhitespace(cp) && !font.canDisplay(cp)).distinct()
                .forEach(missing::appendCodePoint);
        return missing.toString();
    }

    /**
     * Registers the family with the layout engine for one document, from faces already parsed:
     * each face is embedded into {@code document} (as a subset) when the layout first needs it.
     */
    static void registerWith(PdfRendererBuilder builder, PDDocument document, ParsedFaces parsed) {
        for (int i = 0; i < FACES.length; i++) {
            Face face = FACES[i];
            TrueTypeFont font = parsed.face(i);
            builder.useFont(new PDFontSupplier(null) {
                @Override
                public PDFont supply() {
                    try {
                        return PDType0Font.load(document, font, true);
                    } catch (IOException e) {
                        throw new UncheckedIOException("bundled font " + face.resource() + " cannot be embedded", e);
                    }
                }
            }, Figure.FONT_FAMILY, face.weight(), face.style(), true);
        }
    }

    /** How many faces the family has. */
    static int faceCount() {
        return FACES.length;
    }

    /** The regular face's file (for {@link BundledFontMapper}). */
    static byte[] regularFile() {
        return file(0);
    }

    /** Face {@code face}'s file, as the jar holds it. */
    static byte[] file(int face) {
        synchronized (FILES) {
            if (FILES[face] == null) {
                try (InputStream in = open(FACES[face].resource())) {
                    FILES[face] = in.readAllBytes();
                } catch (IOException e) {
                    throw new UncheckedIOException("bundled font " + FACES[face].resource() + " cannot be read", e);
                }
            }
            return FILES[face];
        }
    }

    private static InputStream open(String resource) {
        InputStream in = Fonts.class.getResourceAsStream(resource);
        if (in == null) {
            throw new UncheckedIOException(new IOException("bundled font " + resource + " is missing from the jar"));
        }
        return in;
    }
}
