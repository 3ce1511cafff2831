package org.annalist.serve;

import java.net.URLDecoder;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.eclipse.jetty.http.HttpCookie;
import org.eclipse.jetty.http.HttpHeader;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.util.Callback;
import org.eclipse.jetty.util.Fields;

/**
 * One request and its answer, in the terms the workbench needs: the path's segments (decoded one
 * by one, so that an encoded slash stays inside its segment), query and form fields, the session
 * cookie, and answers with the security headers every page carries.
 */
final class Exchange {

    static final String SESSION_COOKIE = "annalist_session";

    /**
     * Pages may load only what this server serves: its script and style sheets, its images, inline
     * styles (the brief's own style element and the charts' SVG use them); no other site, no plugin,
     * no framing by another site, forms posted only here.
     */
    private static final String CONTENT_POLICY = "default-src 'none'; script-src 'self'; style-src 'self' "
            + "'unsafe-inline'; img-src 'self' data:; connect-src 'self'; frame-src 'self'; form-action 'self'; "
            + "frame-ancestors 'self'; base-uri 'none'";

    private final Request request;
    private final Response response;
    private final Callback callback;
    private final List<String> segments;
    private Fields query;

    Exchange(Request request, Response response, Callback callback) {
        this.request = request;
        this.response = response;
        this.callback = callback;
        this.segments = segments(request.getHttpURI().getPath());
    }

    /** The path's segments, each decoded; a segment that decodes badly is left as sent (it then matches nothing). */
    static List<String> segments(String rawPath) {
        List<String> parts = new ArrayList<>();
        if (rawPath == null) {
            return parts;
        }
        for (String raw : rawPath.split("/")) {
            if (raw.isEmpty()) {
                continue;
            }
            try {
                parts.add(URLDecoder.decode(raw.replace("+", "%2B"), StandardCharsets.UTF_8));
            } catch (IllegalArgumentException e) {
                parts.add(raw);
            }
        }
        return parts;
    }

    Request request() {
        return request;
    }

    String method() {
        return request.getMethod();
    }

    boolean isPost() {
        return "POST".equals(request.getMethod());
    }

    List<String> path() {
        return segments;
    }

    Optional<String> header(HttpHeader header) {
        return Optional.ofNullable(request.getHeaders().get(header));
    }

    /** A query parameter (the first, when sent twice). */
    Optional<String> query(String name) {
        if (query == null) {
            query = Request.extractQueryParameters(request, StandardCharsets.UTF_8);
        }
        return Optional.ofNullable(query.getValue(name));
    }

    /** The session cookie's value. */
    Optional<String> sessionCookie() {
        for (HttpCookie cookie : Request.getCookies(request)) {
            if (SESSION_COOKIE.equals(cookie.getName())) {
                return Optional.of(cookie.getValue());
            }
        }
        return Optional.empty();
    }

    void setSessionCookie(String id) {
        Response.addCookie(response, HttpCookie.build(SESSION_COOKIE, id).path("/").httpOnly(true)
                .sameSite(HttpCookie.SameSite.STRICT).build());
    }

    void expireSessionCookie() {
        Response.addCookie(response, HttpCookie.build(SESSION_COOKIE, "").path("/").httpOnly(true)
                .sameSite(HttpCookie.SameSite.STRICT).maxAge(0).build());
    }

    void html(int status, String page) {
        send(status, "text/html; charset=utf-8", page.getBytes(StandardCharsets.UTF_8));
    }

    void send(int status, String contentType, byte[] body) {
        response.setStatus(status);
        var headers = response.getHeaders();
        headers.put(HttpHeader.CONTENT_TYPE, contentType);
        headers.put("X-Content-Type-Options", "nosniff");
        // same-origin, not no-referrer: under no-referrer a browser sends "Origin: null" with a form, which the Guard refuses
        headers.put("Referrer-Policy", "same-origin");
        headers.put(HttpHeader.CACHE_CONTROL, "no-store");
        headers.put("Content-Security-Policy", CONTENT_POLICY);
        headers.put("X-Frame-Options", "SAMEORIGIN");
        response.write(true, ByteBuffer.wrap(body), callback);
    }

    /** A file to save, under the name given (a plain file name the server chose). */
    void download(String contentType, String fileName, byte[] body) {
        response.getHeaders().put(HttpHeader.CONTENT_DISPOSITION, "attachment; filename=\""
                + fileName.replaceAll("[^\\p{Alnum}._()+-]", "_") + "\"");
        send(200, contentType, body);
    }

    /** After a form: see {@code location} on this server. */
    void redirect(String location) {
        response.getHeaders().put(HttpHeader.LOCATION, location);
        send(303, "text/plain; charset=utf-8", new byte[0]);
    }
}
