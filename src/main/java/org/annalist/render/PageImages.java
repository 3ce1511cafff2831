package org.annalist.render;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.ImageType;
import org.apache.pdfbox.rendering.PDFRenderer;

/**
 * The pages of a brief as pictures, for a preview on screen (the browser workbench): PDFBox draws
 * a page of the PDF the renderer wrote, as the printed page will look; the PDF stays the document.
 */
public final class PageImages {

    /** The largest resolution a preview may ask for: an A4 page at 150 dpi is 1240 × 1754 pixels. */
    public static final int MAX_DPI = 150;

    private PageImages() {
    }

    /** How many pages the PDF has. */
    public static int pages(Path pdf) {
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            return document.getNumberOfPages();
        } catch (IOException e) {
            throw new UncheckedIOException("the PDF " + pdf + " cannot be read", e);
        }
    }

    /**
     * Page {@code page} (0 the first) of the PDF as a PNG.
     *
     * @param dpi from 20 to {@link #MAX_DPI}
     * @throws IllegalArgumentException when the page is not in the PDF or the resolution is out of range
     */
    public static byte[] png(Path pdf, int page, int dpi) {
        if (dpi < 20 || dpi > MAX_DPI) {
            throw new IllegalArgumentException("a preview's resolution is from 20 to " + MAX_DPI + " dpi, got " + dpi);
        }
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            if (page < 0 || page >= document.getNumberOfPages()) {
                throw new IllegalArgumentException("the PDF has " + document.getNumberOfPages() + " pages, no page "
                        + (page + 1));
            }
            BufferedImage image = new PDFRenderer(document).renderImageWithDPI(page, dpi, ImageType.RGB);
            ByteArrayOutputStream png = new ByteArrayOutputStream();
            ImageIO.write(image, "png", png);
            return png.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("the PDF " + pdf + " cannot be read", e);
        }
    }
}
