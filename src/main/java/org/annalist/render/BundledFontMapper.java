package org.annalist.render;

import java.io.IOException;
import java.io.UncheckedIOException;
import org.apache.fontbox.FontBoxFont;
import org.apache.fontbox.ttf.TTFParser;
import org.apache.fontbox.ttf.TrueTypeFont;
import org.apache.pdfbox.io.RandomAccessReadBuffer;
import org.apache.pdfbox.pdmodel.font.CIDFontMapping;
import org.apache.pdfbox.pdmodel.font.FontMapper;
import org.apache.pdfbox.pdmodel.font.FontMapping;
import org.apache.pdfbox.pdmodel.font.PDCIDSystemInfo;
import org.apache.pdfbox.pdmodel.font.PDFontDescriptor;

/**
 * PDFBox's font substitution, answered with the brief's own regular face instead of the machine's
 * fonts. The layout engine creates the standard Helvetica and ZapfDingbats for form fields at the
 * end of every document, whether it has forms or not (a brief has none), and PDFBox's default
 * mapper then reads or builds its index of every system font — about a second of a cold brief
 * here, and many seconds on a first run or where the home folder cannot hold the index. A PDF of a
 * standard font names it without embedding it, so the substitute changes no byte of a brief; and a
 * PDF/A brief draws all its text in the embedded DejaVu faces ({@link Fonts}), never in a
 * substitute.
 */
final class BundledFontMapper implements FontMapper {

    private TrueTypeFont regular;

    @Override
    public FontMapping<TrueTypeFont> getTrueTypeFont(String baseFont, PDFontDescriptor fontDescriptor) {
        return new FontMapping<>(regular(), true);
    }

    @Override
    public FontMapping<FontBoxFont> getFontBoxFont(String baseFont, PDFontDescriptor fontDescriptor) {
        return new FontMapping<>(regular(), true);
    }

    @Override
    public CIDFontMapping getCIDFont(String baseFont, PDFontDescriptor fontDescriptor, PDCIDSystemInfo cidSystemInfo) {
        return new CIDFontMapping(null, regular(), true);
    }

    /** Parsed once, when first asked for (its tables are read as they are needed). */
    private synchronized TrueTypeFont regular() {
        if (regular == null) {
            try {
                regular = new TTFParser().parse(new RandomAccessReadBuffer(Fonts.regularFile()));
            } catch (IOException e) {
                throw new UncheckedIOException("the bundled regular font cannot be parsed", e);
            }
        }
        return regular;
    }
}
