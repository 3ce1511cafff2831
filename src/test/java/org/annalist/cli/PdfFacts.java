package org.annalist.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.graphics.PDXObject;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.apache.pdfbox.pdmodel.graphics.image.PDImageXObject;
import org.apache.pdfbox.text.PDFTextStripper;

/** What a PDF holds, as pdffonts, pdfimages and pdftotext would show it. */
record PdfFacts(int pages, String text, List<String> fonts, List<String> unembeddedFonts, int images) {

    static PdfFacts of(Path pdf) throws IOException {
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            List<String> fonts = new ArrayList<>();
            List<String> unembedded = new ArrayList<>();
            int[] images = {0};
            for (PDPage page : document.getPages()) {
                walk(page.getResources(), fonts, unembedded, images, 0);
            }
            PDFTextStripper stripper = new PDFTextStripper();
            stripper.setSortByPosition(true);   // generated content (page counters) comes last in the stream
            return new PdfFacts(document.getNumberOfPages(), stripper.getText(document), fonts, unembedded, images[0]);
        }
    }

    /** The text of each page in turn, as {@code pdftotext -f K -l K} would show it. */
    static List<String> pageTexts(Path pdf) throws IOException {
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            List<String> pages = new ArrayList<>();
            PDFTextStripper stripper = new PDFTextStripper();
            for (int k = 1; k <= document.getNumberOfPages(); k++) {
                stripper.setStartPage(k);
                stripper.setEndPage(k);
                pages.add(stripper.getText(document));
            }
            return pages;
        }
    }

    private static void walk(PDResources resources, List<String> fonts, List<String> unembedded, int[] images, int depth)
            throws IOException {
        if (resources == null || depth > 8) {
            return;
        }
        for (COSName name : resources.getFontNames()) {
            PDFont font = resources.getFont(name);
            fonts.add(font.getName());
            if (!font.isEmbedded()) {
                unembedded.add(font.getName());
            }
        }
        for (COSName name : resources.getXObjectNames()) {
            PDXObject x = resources.getXObject(name);
            if (x instanceof PDImageXObject) {
                images[0]++;
            } else if (x instanceof PDFormXObject form) {
                walk(form.getResources(), fonts, unembedded, images, depth + 1);
            }
        }
    }
}
