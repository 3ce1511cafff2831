package org.annalist.render;

import com.openhtmltopdf.extend.FSObjectDrawer;
import com.openhtmltopdf.pdfboxout.PdfBoxRenderer;
import com.openhtmltopdf.pdfboxout.PdfRendererBuilder;
import com.openhtmltopdf.render.DefaultObjectDrawerFactory;
import com.openhtmltopdf.util.XRLog;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.time.Instant;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.List;
import java.util.Map;
import java.util.TimeZone;
import java.util.function.Function;
import java.util.logging.Level;
import java.util.logging.Logger;
import java.util.stream.Collectors;
import java.awt.geom.Rectangle2D;
import org.annalist.chart.Figure;
import org.apache.pdfbox.pdmodel.PDDocument;

/**
 * Lays out the brief's XHTML (paged-media CSS) as PDF with openhtmltopdf on PDFBox, drawing each
 * {@code <object type="application/x-jfreechart" data-chart="ID">} as vector graphics in the
 * brief's embedded font, so that chart text stays real, searchable text.
 */
public final class PdfRenderer {

    public static final String CHART_MIME_TYPE = "application/x-jfreechart";

    /**
     * PDFBox reports through java.util.logging that it substitutes fonts for the standard 14 that
     * openhtmltopdf preloads (none of which reaches the brief); JUL holds loggers weakly, so the
     * quieted logger is kept here.
     */
    private static final Logger PDFBOX_LOG = Logger.getLogger("org.apache.pdfbox");

    static {
        XRLog.setLoggingEnabled(false);   // openhtmltopdf logs every font load at INFO on stderr
        PDFBOX_LOG.setLevel(Level.SEVERE);
    }

    /**
     * @param baseUri    where relative links in the XHTML (CSS, logo) resolve
     * @param createdAt  the document's creation date (pinned so that the same input gives the same file)
     * @param documentId PDF trailer ID seed (pinned for the same reason)
     */
    public byte[] render(String xhtml, String baseUri, List<Figure> figures, Instant createdAt, long documentId) {
        Fonts.registerWithAwt();
        Map<String, Figure> byId = figures.stream().collect(Collectors.toMap(Figure::id, Function.identity()));
        DefaultObjectDrawerFactory drawers = new DefaultObjectDrawerFactory();
        drawers.registerDrawer(CHART_MIME_TYPE, chartDrawer(byId));

        PdfRendererBuilder builder = new PdfRendererBuilder();
        builder.useFastMode();
        builder.withHtmlContent(xhtml, baseUri);
        builder.useObjectDrawerFactory(drawers);
        Fonts.registerWith(builder);
        ByteArrayOutputStream pdf = new ByteArrayOutputStream(256 * 1024);
        builder.toStream(OutputStream.nullOutputStream());
        try (PdfBoxRenderer renderer = builder.buildPdfRenderer()) {
            renderer.createPDFWithoutClosing();
            try (PDDocument document = renderer.getPdfDocument()) {
                Calendar created = new GregorianCalendar(TimeZone.getTimeZone("UTC"));
                created.setTimeInMillis(createdAt.toEpochMilli());
                document.getDocumentInformation().setCreationDate(created);
                document.getDocumentInformation().setProducer("Annalist");
                document.setDocumentId(documentId);
                document.save(pdf);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("the PDF could not be laid out", e);
        }
        return pdf.toByteArray();
    }

    private static FSObjectDrawer chartDrawer(Map<String, Figure> figures) {
        return (element, x, y, width, height, outputDevice, context, dotsPerPixel) -> {
            Figure figure = figures.get(element.getAttribute("data-chart"));
            if (figure == null) {
                throw new IllegalStateException("the template places chart '" + element.getAttribute("data-chart")
                        + "', which this brief has not drawn");
            }
            // openhtmltopdf hands over the box in dots; the chart is drawn in CSS pixels.
            float widthPx = (float) (width / dotsPerPixel);
            float heightPx = (float) (height / dotsPerPixel);
            outputDevice.drawWithGraphics((float) x, (float) y, widthPx, heightPx,
                    g2 -> figure.chart().draw(g2, new Rectangle2D.Double(0, 0, widthPx, heightPx)));
            return null;
        };
    }
}
