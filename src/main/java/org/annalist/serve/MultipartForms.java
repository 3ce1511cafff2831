package org.annalist.serve;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import org.eclipse.jetty.http.HttpHeader;
import org.eclipse.jetty.http.MultiPartConfig;
import org.eclipse.jetty.http.MultiPartFormData;

/**
 * A form sent with files, read within limits: the request's declared length, the number of parts,
 * each part's size and the whole form's are bounded before anything is kept, and the files are
 * written into a folder the caller owns and deletes.
 */
final class MultipartForms {

    private MultipartForms() {
    }

    /**
     * The form's parts, or empty once the request has been answered with its refusal: larger than
     * {@code maxSize}, not a multipart form, or not readable as one.
     *
     * @param incoming the folder the parts' files are written to (the caller deletes it)
     */
    static Optional<MultiPartFormData.Parts> read(Exchange ex, Session session, Routes routes, Path incoming,
                                                  int maxParts, long maxPartSize, long maxSize) {
        if (ex.request().getLength() > maxSize) {
            routes.refuse(ex, Routes.Refusal.TOO_LARGE, session);
            return Optional.empty();
        }
        String contentType = ex.header(HttpHeader.CONTENT_TYPE).orElse("");
        if (!contentType.toLowerCase(Locale.ROOT).startsWith("multipart/form-data")) {
            routes.refuse(ex, Routes.Refusal.BAD_REQUEST, session);
            return Optional.empty();
        }
        MultiPartConfig config = new MultiPartConfig.Builder().location(incoming).maxParts(maxParts)
                .maxPartSize(maxPartSize).maxSize(maxSize)
                .maxMemoryPartSize(64 * 1024).maxHeadersSize(8 * 1024).build();
        try {
            return Optional.of(MultiPartFormData.from(ex.request(), ex.request(), contentType, config).get());
        } catch (ExecutionException e) {
            routes.refuse(ex, tooLarge(e.getCause()) ? Routes.Refusal.TOO_LARGE : Routes.Refusal.BAD_REQUEST, session);
            return Optional.empty();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            routes.refuse(ex, Routes.Refusal.BUSY, session);
            return Optional.empty();
        }
    }

    /** Whether the parser gave up because a limit was reached (Jetty says so only in its message). */
    static boolean tooLarge(Throwable cause) {
        String message = String.valueOf(cause == null ? "" : cause.getMessage()).toLowerCase(Locale.ROOT);
        return message.contains("max") || message.contains("size") || message.contains("length");
    }
}
