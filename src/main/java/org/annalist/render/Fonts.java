package org.annalist.render;

import com.openhtmltopdf.outputdevice.helper.BaseRendererBuilder.FontStyle;
import com.openhtmltopdf.pdfboxout.PdfRendererBuilder;
import java.awt.Font;
import java.awt.FontFormatException;
import java.awt.GraphicsEnvironment;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import org.annalist.chart.Figure;

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

    private Fonts() {
    }

    /** Makes the family known to AWT (once per JVM); call before any chart is drawn. */
    public static synchronized void registerWithAwt() {
        if (registeredWithAwt) {
            return;
        }
        GraphicsEnvironment environment = GraphicsEnvironment.getLocalGraphicsEnvironment();
        for (Face face : FACES) {
            try (InputStream in = open(face.resource())) {
                environment.registerFont(Font.createFont(Font.TRUETYPE_FONT, in));
            } catch (IOException | FontFormatException e) {
                throw new IllegalStateException("bundled font " + face.resource() + " cannot be loaded", e);
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

    static void registerWith(PdfRendererBuilder builder) {
        for (Face face : FACES) {
            builder.useFont(() -> open(face.resource()), Figure.FONT_FAMILY, face.weight(), face.style(), true);
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
