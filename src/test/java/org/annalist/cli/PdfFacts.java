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

    /**
     * A word as printed: its page (from 1), its box in points from the page's top left (from the base
     * line up by the font's size), and the size it prints at (the font size with every scaling of
     * the text and the drawing applied, which a chart's own units pass through).
     */
    record Word(int page, String text, double left, double top, double right, double bottom, double sizePt) {

        /** Whether the two boxes share more than a sliver (0.5 pt) each way. */
        boolean overlaps(Word other) {
            return page == other.page && Math.min(right, other.right) - Math.max(left, other.left) > 0.5
                    && Math.min(bottom, other.bottom) - Math.max(top, other.top) > 0.5;
        }
    }

    /** Every upright word of every page, as {@code pdftotext -bbox} would list them. */
    static List<Word> words(Path pdf) throws IOException {
        List<Word> words = new ArrayList<>();
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            int[] page = {0};
            // the letters in the order drawn; a word runs on while each letter follows the last on its line
            List<org.apache.pdfbox.text.TextPosition> letters = new ArrayList<>();
            PDFTextStripper stripper = new PDFTextStripper() {
                @Override
                protected void processTextPosition(org.apache.pdfbox.text.TextPosition p) {
                    letters.add(p);
                }

                @Override
                protected void endPage(org.apache.pdfbox.pdmodel.PDPage pdPage) {
                    List<org.apache.pdfbox.text.TextPosition> word = new ArrayList<>();
                    for (org.apache.pdfbox.text.TextPosition p : letters) {
                        org.apache.pdfbox.text.TextPosition last = word.isEmpty() ? null : word.get(word.size() - 1);
                        boolean follows = last != null && Math.abs(p.getYDirAdj() - last.getYDirAdj()) < 0.5
                                && Math.abs(p.getXDirAdj() - (last.getXDirAdj() + last.getWidthDirAdj())) < 0.2 * p.getXScale();
                        if (!follows) {
                            add(word);
                        }
                        if (p.getUnicode().isBlank() || p.getDir() != 0) {
                            add(word);
                        } else {
                            word.add(p);
                        }
                    }
                    add(word);
                    letters.clear();
                }

                private void add(List<org.apache.pdfbox.text.TextPosition> word) {
                    if (word.isEmpty()) {
                        return;
                    }
                    StringBuilder text = new StringBuilder();
                    double left = Double.POSITIVE_INFINITY;
                    double right = Double.NEGATIVE_INFINITY;
                    double base = 0;
                    double size = Double.POSITIVE_INFINITY;
                    for (org.apache.pdfbox.text.TextPosition p : word) {
                        text.append(p.getUnicode());
                        left = Math.min(left, p.getXDirAdj());
                        right = Math.max(right, p.getXDirAdj() + p.getWidthDirAdj());
                        base = Math.max(base, p.getYDirAdj());
                        size = Math.min(size, p.getXScale());
                    }
                    // the box of the letters above the base line: three quarters of the size holds capitals and digits
                    words.add(new Word(page[0], text.toString(), left, base - 0.75 * size, right, base, size));
                    word.clear();
                }
            };
            for (int k = 1; k <= document.getNumberOfPages(); k++) {
                page[0] = k;
                stripper.setStartPage(k);
                stripper.setEndPage(k);
                stripper.getText(document);
            }
        }
        return words;
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
