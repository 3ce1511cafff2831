package org.annalist.render;

import com.openhtmltopdf.extend.FSStream;
import com.openhtmltopdf.outputdevice.helper.ExternalResourceControlPriority;
import com.openhtmltopdf.outputdevice.helper.ExternalResourceType;
import com.openhtmltopdf.pdfboxout.PdfRendererBuilder;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.net.URI;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * What the layout engine may read while it lays out a brief: files inside the template folder
 * (compared by real path, after every symbolic link is followed), the logo the user named, and
 * {@code data:} URLs up to {@link #MAX_DATA_URL_CHARS} characters. Everything else a template or its
 * CSS names (http, https, ftp, jar, other files, devices, folders) is refused before it is opened,
 * and the brief fails with a template problem naming what was refused. Each file is read up to
 * {@link Images#MAX_BYTES}, and an image is checked by its declared size before it is decoded.
 *
 * <p>The checks sit at three points of openhtmltopdf (1.1.31): its access control after a URL is
 * resolved (it sees the resource's kind), and a stream factory for every protocol that checks
 * again when the bytes are fetched; a protocol without a factory would fall back to
 * {@code URL.openStream}, which the access control never lets a URL reach. The engine's own
 * resources (its default stylesheet, the fonts) are read from the classpath directly, not through
 * URLs.
 */
public final class Sandbox {

    /** 2 million characters: room for a small embedded image, no way to smuggle a large file in. */
    public static final int MAX_DATA_URL_CHARS = 2_000_000;

    /** Protocols given a stream factory, so that none reaches {@code URL.openStream}. */
    private static final String[] PROTOCOLS = {"file", "data", "http", "https", "ftp", "jar", "jrt", "classpath",
        "mailto", "netdoc", "gopher", "ldap", "rmi"};

    private final Optional<Path> folder;
    private final List<Path> namedFiles;
    private final String baseUri;
    private final List<TemplateMistakeException> mistakes = new ArrayList<>();
    private String lastAsked = "";

    private Sandbox(Optional<Path> folder, List<Path> namedFiles, String baseUri) {
        this.folder = folder;
        this.namedFiles = namedFiles;
        this.baseUri = baseUri;
    }

    /**
     * @param templates the user's template folder, if any: relative links resolve there
     * @param named     files the user named (the logo), allowed wherever they are
     * @param fallback  where relative links resolve without a template folder (nothing there is allowed)
     */
    public static Sandbox of(Optional<Path> templates, List<Path> named, Path fallback) {
        Optional<Path> folder = templates.map(Sandbox::real);
        List<Path> files = named.stream().map(Sandbox::real).toList();
        Path base = templates.orElse(fallback).toAbsolutePath();
        return new Sandbox(folder, files, base.toUri().toString());
    }

    /** Nothing but {@code data:} URLs (the bundled templates use no file). */
    public static Sandbox closed(Path fallback) {
        return of(Optional.empty(), List.of(), fallback);
    }

    String baseUri() {
        return baseUri;
    }

    void applyTo(PdfRendererBuilder builder) {
        builder.useExternalResourceAccessControl((uri, type) -> {
            lastAsked = uri;
            return true;
        }, ExternalResourceControlPriority.RUN_BEFORE_RESOLVING_URI);
        builder.useExternalResourceAccessControl(this::allowed, ExternalResourceControlPriority.RUN_AFTER_RESOLVING_URI);
        builder.useProtocolsStreamImplementation(this::open, PROTOCOLS);
    }

    /** Records a mistake found while laying out; the render fails with the first after layout. */
    void record(TemplateMistakeException mistake) {
        mistakes.add(mistake);
    }



    /** Throws the first mistake recorded, if any. */
    void throwIfRefused() {
        if (!mistakes.isEmpty()) {
            throw mistakes.get(0);
        }
    }

    private boolean allowed(String resolved, ExternalResourceType type) {
        if (type == ExternalResourceType.FILE_EMBED) {
            // PDF/A-2 allows no attachments, and an attachment would carry a file out unseen
            record(new TemplateMistakeException(0, 0, lastAsked, "it attaches " + shown(resolved) + " to the PDF, and a brief carries no attached files", null));
            return false;
        }
        Optional<TemplateMistakeException> refusal = refusal(resolved);
        refusal.ifPresent(this::record);
        return refusal.isEmpty();
    }

    /** Why {@code uri} may not be read, or empty when it may. */
    private Optional<TemplateMistakeException> refusal(String uri) {
        String scheme = scheme(uri);
        if (scheme.equals("data")) {
            return uri.length() <= MAX_DATA_URL_CHARS ? Optional.empty() : Optional.of(new TemplateMistakeException(0, 0,
                    lastAsked, String.format(Locale.ROOT, "it embeds a data: URL of %d characters, over the limit of %d",
                            uri.length(), MAX_DATA_URL_CHARS), null));
        }
        if (!scheme.equals("file")) {
            return Optional.of(new TemplateMistakeException(0, 0, lastAsked, "it uses " + shown(uri)
                    + ", and a brief fetches nothing from the network or other places: it uses only files inside its template folder and the logo named", null));
        }
        Path path;
        try {
            path = Path.of(new URI(uri));
        } catch (URISyntaxException | IllegalArgumentException e) {
            return Optional.of(new TemplateMistakeException(0, 0, lastAsked, "it uses " + shown(uri) + ", which is no file address", e));
        }
        Path real;
        try {
            real = path.toRealPath();
        } catch (IOException e) {
            return Optional.of(new TemplateMistakeException(0, 0, lastAsked, "it uses " + path + ", which does not exist", e));
        }
        boolean inside = namedFiles.contains(real) || folder.map(real::startsWith).orElse(false);
        if (!inside) {
            return Optional.of(new TemplateMistakeException(0, 0, lastAsked, "it uses " + path + (real.equals(path) ? "" : " (which leads to " + real + ")")
                    + ", outside " + folder.map(f -> "its template folder " + f).orElse("any template folder")
                    + ", and a brief uses only files inside its template folder and the logo named", null));
        }
        try {
            if (!Files.isRegularFile(real) || Files.size(real) > Images.MAX_BYTES) {
                return Optional.of(new TemplateMistakeException(0, 0, lastAsked, !Files.isRegularFile(real) ? "it uses " + path + ", which is not a regular file"
                        : String.format(Locale.ROOT, "it uses %s, of %d bytes, over the limit of %d MB for a file a brief uses",
                                path, Files.size(real), Images.MAX_BYTES / (1024 * 1024)), null));
            }
        } catch (IOException e) {
            return Optional.of(new TemplateMistakeException(0, 0, lastAsked, "it uses " + path + ", which cannot be read: " + e.getMessage(), e));
        }
        return Optional.empty();
    }

    /** The bytes of an allowed resource, checked again as they are fetched; refused ones give no stream. */
    private FSStream open(String uri) {
        Optional<TemplateMistakeException> refusal = refusal(uri);
        if (refusal.isPresent()) {
            record(refusal.get());
            return new Bytes(null);
        }
        byte[] bytes;
        try {
            bytes = scheme(uri).equals("data") ? dataUrl(uri) : read(Path.of(new URI(uri)).toRealPath());
        } catch (IOException | URISyntaxException | IllegalArgumentException e) {
            record(new TemplateMistakeException(0, 0, lastAsked, "it uses " + shown(uri) + ", which cannot be read: " + e.getMessage(), e));
            return new Bytes(null);
        }
        if (bytes.length > Images.MAX_BYTES) {
            record(new TemplateMistakeException(0, 0, lastAsked, "it uses " + shown(uri) + ", larger than the limit of "
                    + Images.MAX_BYTES / (1024 * 1024) + " MB for a file a brief uses", null));
            return new Bytes(null);
        }
        try {
            Images.check(bytes);
        } catch (Images.TooLarge e) {
            record(new TemplateMistakeException(0, 0, lastAsked, "it uses the image " + shown(uri) + ": " + e.getMessage(), e));
            return new Bytes(null);
        }
        return new Bytes(bytes);
    }

    /** Reads at most one byte past the limit, whatever the file claims its size is. */
    private static byte[] read(Path real) throws IOException {
        try (InputStream in = Files.newInputStream(real, LinkOption.NOFOLLOW_LINKS)) {
            return in.readNBytes((int) Images.MAX_BYTES + 1);
        }
    }

    /** As openhtmltopdf's own data-URL reader: base64 when it says so, else the text as UTF-8. */
    private static byte[] dataUrl(String uri) throws IOException {
        int comma = uri.indexOf(',');
        if (comma < 0) {
            throw new IOException("no comma in the data: URL");
        }
        String data = uri.substring(comma + 1);
        if (uri.substring(0, comma).endsWith(";base64")) {
            try {
                return Base64.getMimeDecoder().decode(data.replaceAll("\\s+", ""));
            } catch (IllegalArgumentException e) {
                throw new IOException("not base64: " + e.getMessage(), e);
            }
        }
        return data.getBytes(StandardCharsets.UTF_8);
    }

    private static String scheme(String uri) {
        int colon = uri.indexOf(':');
        return colon > 0 ? uri.substring(0, colon).toLowerCase(Locale.ROOT).trim() : "";
    }

    /** A URL as the message shows it: data: URLs cut short. */
    private static String shown(String uri) {
        return uri.length() > 120 ? uri.substring(0, 100) + "…" : uri;
    }

    private static Path real(Path path) {
        try {
            return path.toRealPath();
        } catch (IOException e) {
            return path.toAbsolutePath().normalize();
        }
    }

    /** A fetched resource, or none (a null stream is how openhtmltopdf is told a resource is missing). */
    private record Bytes(byte[] bytes) implements FSStream {
        @Override
        public InputStream getStream() {
            return bytes == null ? null : new ByteArrayInputStream(bytes);
        }

        @Override
        public Reader getReader() {
            return bytes == null ? null : new InputStreamReader(new ByteArrayInputStream(bytes), StandardCharsets.UTF_8);
        }
    }
}
