package org.annalist.render;

import static org.assertj.core.api.Assertions.assertThat;

import org.apache.pdfbox.pdmodel.font.FontMappers;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;
import org.junit.jupiter.api.Test;

class BundledFontMapperTest {

    @Test
    void theLayoutEnginesStandardFontsAreAnsweredWithTheBundledFaceNotTheSystemsFonts() throws Exception {
        new PdfRenderer();   // installs the mapper as the renderer class is first used
        assertThat(FontMappers.instance()).isInstanceOf(BundledFontMapper.class);
        // what openhtmltopdf creates for form fields at the end of every document
        PDType1Font helvetica = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
        assertThat(helvetica.getName()).isEqualTo("Helvetica");
        assertThat(helvetica.isEmbedded()).as("a standard font is named, never embedded").isFalse();
        assertThat(helvetica.getFontBoxFont().getName()).isEqualTo("DejaVuSans");
        // its metrics still come from the standard font's own metrics file, not the substitute
        assertThat(helvetica.getStringWidth("A")).isEqualTo(667f);
    }
}
