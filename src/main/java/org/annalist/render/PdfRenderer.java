package org.annalist.render;

import com.openhtmltopdf.extend.FSObjectDrawer;
import com.openhtmltopdf.pdfboxout.PdfBoxRenderer;
import com.openhtmltopdf.pdfboxout.PdfRendererBuilder;
import com.openhtmltopdf.render.DefaultObjectDrawerFactory;
import com.openhtmltopdf.util.XRLog;
import com.openhtmltopdf.util.XRRuntimeException;
import javax.xml.transform.SourceLocator;
import javax.xml.transform.TransformerException;
import org.xml.sax.SAXParseException;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.time.Duration;
import java.time.Instant;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.List;
import java.util.Map;
import java.util.TimeZone;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Function;
import java.util.logging.Level;
import java.util.logging.Logger;
import java.util.stream.Collectors;
import java.awt.geom.Rectangle2D;
import org.annalist.chart.Figure;
import java.awt.color.ColorSpace;
import java.awt.color.ICC_Profile;
import java.nio.charset.StandardCharsets;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.common.PDMetadata;
import org.apache.pdfbox.pdmodel.font.FontMappers;
import org.apache.pdfbox.util.DateConverter;

/**
 * Lays out the brief's XHTML (paged-media CSS) as PDF/A-2u and PDF/UA-1 with openhtmltopdf on
 * PDFBox, drawing each {@code <object type="application/x-jfreechart" data-chart="ID" alt="…">} as
 * vector graphics in the brief's embedded font, so that chart text stays real, searchable text and
 * the {@code alt} becomes the figure's alternative text. Creation date and document ID are pinned
 * by the caller, so the same input gives the same bytes.
 */
public final class PdfRenderer {

    public static final String CHART_MIME_TYPE = "application/x-jfreechart";

    /**
     * How long one brief's layout may take: a one-series brief takes 0.3 s warm and 3 s cold; 500
     * pages of text take about a minute on this project's 2-core machine.
     */
    public static final Duration LAYOUT_LIMIT = Duration.ofSeconds(120);

    private final Duration layoutLimit;

    public PdfRenderer() {
        this(LAYOUT_LIMIT);
    }

    PdfRenderer(Duration layoutLimit) {
        this.layoutLimit = layoutLimit;
    }

    /**
     * PDFBox reports through java.util.logging that it substitutes fonts for the standard 14 that
     * openhtmltopdf preloads (none of which reaches the brief); JUL holds loggers weakly, so the
     * quieted logger is kept here.
     */
    private static final Logger PDFBOX_LOG = Logger.getLogger("org.apache.pdfbox");

    static {
        XRLog.setLoggingEnabled(false);   // openhtmltopdf logs every font load at INFO on stderr
        PDFBOX_LOG.setLevel(Level.SEVERE);
        // the standard fonts the layout engine creates are answered without an index of the system's fonts
        FontMappers.set(new BundledFontMapper());
    }

    /**
     * What a layout needs of its own that no brief changes, made ahead (a brief's warm-up does this
     * while the series is analysed): a set of the font's faces parsed for the next layout to borrow,
     * and the colour profile read.
     */
    public static void prepare() {
        ParsedFaces.borrow().giveBack();
        ICC_Profile.getInstance(ColorSpace.CS_sRGB).getData();
    }

    /**
     * @param sandbox    what the XHTML may use besides itself (files of the template folder, the
     *                   logo) and where its relative links resolve
     * @param createdAt  the document's creation date (pinned so that the same input gives the same file)
     * @param documentId PDF trailer ID seed (pinned for the same reason)
     * @throws TemplateMistakeException when the XHTML is not well-formed, uses what the sandbox
     *                                  refuses, places a chart not drawn or takes longer to lay out
     *                                  than {@link #LAYOUT_LIMIT}
     */
    public byte[] render(String xhtml, Sandbox sandbox, List<Figure> figures, Instant createdAt, long documentId) {
        // AWT's start-up, once per JVM, runs here rather than on the worker: a worker stopped past its
        // time while AWT's classes initialise would leave them unusable for the rest of the JVM
        Fonts.registerWithAwt();
        AtomicReference<byte[]> pdf = new AtomicReference<>();
        AtomicReference<Throwable> failure = new AtomicReference<>();
        Thread worker = new Thread(() -> {
            try {
                pdf.set(renderHere(xhtml, sandbox, figures, createdAt, documentId));
            } catch (Throwable e) {   // every way out is reported on the caller's thread below
                failure.set(e);
            }
        }, "pdf layout");
        worker.setDaemon(true);
        worker.start();
        try {
            worker.join(layoutLimit.toMillis());
            if (worker.isAlive()) {
                stop(worker);
                long millis = layoutLimit.toMillis();
                throw new TemplateMistakeException(0, 0, "", "the PDF layout did not finish within " + (millis % 1000 == 0
                        ? millis / 1000 + " s" : millis + " ms") + " (" + xhtml.length() + " characters of XHTML, where a one-series brief has about 100,000)", null);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            stop(worker);
            throw new IllegalStateException("interrupted while the PDF was laid out", e);
        }
        Throwable e = failure.get();
        if (e instanceof RuntimeException r) {
            throw r;
        }
        if (e instanceof Error error) {
            throw error;
        }
        if (e != null) {
            throw new IllegalStateException(e);
        }
        return pdf.get();
    }

    /**
     * Ends a layout past its time: openhtmltopdf checks for no interruption, so the thread is
     * stopped where the JVM still allows it (its state is its own and is dropped); from Java 20 on
     * the daemon thread is left to end with the process.
     */
    @SuppressWarnings({"deprecation", "removal"})
    private static void stop(Thread worker) {
        worker.interrupt();
        try {
            worker.stop();
        } catch (UnsupportedOperationException e) {
            // Java 20 and later
        }
    }

    private byte[] renderHere(String xhtml, Sandbox sandbox, List<Figure> figures, Instant createdAt, long documentId) {
        Fonts.registerWithAwt();
        Map<String, Figure> byId = figures.stream().collect(Collectors.toMap(Figure::id, Function.identity()));
        DefaultObjectDrawerFactory drawers = new DefaultObjectDrawerFactory();
        drawers.registerDrawer(CHART_MIME_TYPE, chartDrawer(byId, sandbox));

        PdfRendererBuilder builder = new PdfRendererBuilder();
        builder.useFastMode();
        builder.withHtmlContent(xhtml, sandbox.baseUri());
        sandbox.applyTo(builder);
        // PDF/A-2u for archiving, PDF/UA-1 for screen readers (tagged, alternative texts); the sRGB
        // OutputIntent PDF/A requires is the JDK's own profile.
        builder.usePdfAConformance(PdfRendererBuilder.PdfAConformance.PDFA_2_U);
        builder.usePdfUaAccessibility(true);
        builder.useColorProfile(ICC_Profile.getInstance(ColorSpace.CS_sRGB).getData());
        builder.useObjectDrawerFactory(drawers);
        builder.useUnicodeLineBreaker(new NumberKeepingLineBreaker());
        // the document is made here, as the layout engine would make it, so that the faces parsed
        // for an earlier brief can be embedded into it
        PDDocument target = new PDDocument();
        builder.usePDDocument(target);
        ParsedFaces faces = ParsedFaces.borrow();
        Fonts.registerWith(builder, target, faces);
        ByteArrayOutputStream pdf = new ByteArrayOutputStream(256 * 1024);
        builder.toStream(OutputStream.nullOutputStream());
        try (target; PdfBoxRenderer renderer = parsed(builder)) {
            try {
                renderer.createPDFWithoutClosing();
            } catch (RuntimeException e) {
                // a resource refused can make the layout engine fail later on its own (a font the
                // CSS names from outside the folder: it paints text with no font); the refusal is
                // the cause to report
                sandbox.throwIfRefused();
                throw e;
            }
            sandbox.throwIfRefused();
            Calendar created = new GregorianCalendar(TimeZone.getTimeZone("UTC"));
            created.setTimeInMillis(createdAt.toEpochMilli());
            target.getDocumentInformation().setCreationDate(created);
            pinXmpCreateDate(target, created);
            target.setDocumentId(documentId);
            target.save(pdf);
        } catch (IOException e) {
            throw new UncheckedIOException("the PDF could not be laid out", e);
        }
        // only a layout that finished hands its faces on (one stopped part-way may have left them mid-read)
        faces.giveBack();
        return pdf.toByteArray();
    }

    /**
     * The renderer with the XHTML parsed; XHTML that is not well-formed is the template's mistake,
     * with the parser's line and column in the XHTML.
     */
    private static PdfBoxRenderer parsed(PdfRendererBuilder builder) {
        try {
            return builder.buildPdfRenderer();
        } catch (XRRuntimeException e) {
            for (Throwable cause = e; cause != null; cause = cause.getCause()) {
                SourceLocator at = cause instanceof SAXParseException sax ? new SaxLocator(sax)
                        : cause instanceof TransformerException t ? t.getLocator() : null;
                if (at != null && at.getLineNumber() > 0) {
                    String reason = cause.getMessage() == null ? "" : cause.getMessage().replaceFirst("^[^:]*Exception[^:]*: ", "");
                    throw new TemplateMistakeException(at.getLineNumber(), at.getColumnNumber(), "",
                            "the XHTML it writes is not well-formed: " + reason, e);
                }
            }
            throw e;
        }
    }

    private record SaxLocator(SAXParseException e) implements SourceLocator {
        @Override
        public String getPublicId() {
            return e.getPublicId();
        }

        @Override
        public String getSystemId() {
            return e.getSystemId();
        }

        @Override
        public int getLineNumber() {
            return e.getLineNumber();
        }

        @Override
        public int getColumnNumber() {
            return e.getColumnNumber();
        }
    }

    /**
     * openhtmltopdf copies the clock's time into the XMP metadata, which PDF/A requires to agree
     * with the document information; the XMP text is patched (xmpbox's strict parser rejects the
     * PDF/UA namespace openhtmltopdf writes).
     */
    private static void pinXmpCreateDate(PDDocument document, Calendar created) throws IOException {
        PDMetadata metadata = document.getDocumentCatalog().getMetadata();
        if (metadata == null) {
            return;
        }
        String xmp;
        try (var in = metadata.exportXMPMetadata()) {
            xmp = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        String date = DateConverter.toISO8601(created);
        String patched = xmp.replaceAll("<xmp:CreateDate>[^<]*</xmp:CreateDate>", "<xmp:CreateDate>" + date + "</xmp:CreateDate>")
                .replaceAll("xmp:CreateDate=\"[^\"]*\"", "xmp:CreateDate=\"" + date + "\"");
        metadata.importXMPMetadata(patched.getBytes(StandardCharsets.UTF_8));
    }

    private static FSObjectDrawer chartDrawer(Map<String, Figure> figures, Sandbox sandbox) {
        return (element, x, y, width, height, outputDevice, context, dotsPerPixel) -> {
            Figure figure = figures.get(element.getAttribute("data-chart"));
            if (figure == null) {
                sandbox.record(new TemplateMistakeException(0, 0, "data-chart=\"" + element.getAttribute("data-chart") + "\"",
                        "it places chart '" + element.getAttribute("data-chart") + "', which this brief has not drawn", null));
                return null;
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
