package org.annalist.serve;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A deliberately plain HTTP/1.1 client over a socket, for the safety tests: it sends exactly the
 * request line, Host and headers it is given (an ordinary client would correct a foreign Host or a
 * path with {@code ..}), and reads one answer (Connection: close).
 */
final class RawHttp {

    record Answer(int status, Map<String, String> headers, byte[] body) {
        String text() {
            return new String(body, StandardCharsets.UTF_8);
        }

        Optional<String> header(String name) {
            return Optional.ofNullable(headers.get(name.toLowerCase(Locale.ROOT)));
        }

        /** The session cookie this answer sets, if any. */
        Optional<String> session() {
            return header("set-cookie").map(c -> c.replaceFirst(";.*", "")).filter(c -> c.startsWith("annalist_session="));
        }

        /** The page's token (every page's footer form carries it). */
        String token() {
            Matcher m = Pattern.compile("name=\"token\" value=\"([0-9a-f]+)\"").matcher(text());
            return m.find() ? m.group(1) : "";
        }
    }

    private final int port;

    RawHttp(int port) {
        this.port = port;
    }

    String host() {
        return "127.0.0.1:" + port;
    }

    Answer get(String target, String cookie) throws IOException {
        return send("GET", target, host(), cookie, Map.of(), new byte[0]);
    }

    Answer postForm(String target, String cookie, String form) throws IOException {
        return send("POST", target, host(), cookie, Map.of("Content-Type", "application/x-www-form-urlencoded"),
                form.getBytes(StandardCharsets.UTF_8));
    }

    /** A multipart form with a token field (when not null) and a file field named {@code data}. */
    Answer upload(String cookie, String token, String fileName, byte[] content) throws IOException {
        String boundary = "----annalist-test-boundary";
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        if (token != null) {
            body.writeBytes(("--" + boundary + "\r\nContent-Disposition: form-data; name=\"token\"\r\n\r\n" + token
                    + "\r\n").getBytes(StandardCharsets.UTF_8));
        }
        body.writeBytes(("--" + boundary + "\r\nContent-Disposition: form-data; name=\"data\"; filename=\"" + fileName
                + "\"\r\nContent-Type: text/csv\r\n\r\n").getBytes(StandardCharsets.UTF_8));
        body.writeBytes(content);
        body.writeBytes(("\r\n--" + boundary + "--\r\n").getBytes(StandardCharsets.UTF_8));
        return send("POST", "/open", host(), cookie, Map.of("Content-Type", "multipart/form-data; boundary=" + boundary),
                body.toByteArray());
    }

    /** A multipart form to {@code target}: the text fields in order, then one file field. */
    Answer multipart(String target, String cookie, Map<String, String> fields, String fileField, String fileName,
                     byte[] content) throws IOException {
        String boundary = "----annalist-test-boundary";
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        fields.forEach((name, value) -> body.writeBytes(("--" + boundary + "\r\nContent-Disposition: form-data; name=\""
                + name + "\"\r\n\r\n" + value + "\r\n").getBytes(StandardCharsets.UTF_8)));
        body.writeBytes(("--" + boundary + "\r\nContent-Disposition: form-data; name=\"" + fileField + "\"; filename=\""
                + fileName + "\"\r\nContent-Type: application/octet-stream\r\n\r\n").getBytes(StandardCharsets.UTF_8));
        body.writeBytes(content);
        body.writeBytes(("\r\n--" + boundary + "--\r\n").getBytes(StandardCharsets.UTF_8));
        return send("POST", target, host(), cookie, Map.of("Content-Type", "multipart/form-data; boundary=" + boundary),
                body.toByteArray());
    }

    Answer send(String method, String target, String host, String cookie, Map<String, String> headers, byte[] body)
            throws IOException {
        try (Socket socket = new Socket("127.0.0.1", port)) {
            socket.setSoTimeout(60_000);
            StringBuilder head = new StringBuilder(method + " " + target + " HTTP/1.1\r\n");
            if (host != null) {
                head.append("Host: ").append(host).append("\r\n");
            }
            if (cookie != null) {
                head.append("Cookie: ").append(cookie).append("\r\n");
            }
            headers.forEach((k, v) -> head.append(k).append(": ").append(v).append("\r\n"));
            if (method.equals("POST")) {
                head.append("Content-Length: ").append(body.length).append("\r\n");
            }
            head.append("Connection: close\r\n\r\n");
            OutputStream out = socket.getOutputStream();
            out.write(head.toString().getBytes(StandardCharsets.UTF_8));
            try {
                out.write(body);
                out.flush();
            } catch (IOException e) {
                // the server may answer (413) and close before the whole body is sent
            }
            return read(socket.getInputStream());
        }
    }

    private static Answer read(InputStream in) throws IOException {
        byte[] all = in.readAllBytes();
        String text = new String(all, StandardCharsets.ISO_8859_1);
        int end = text.indexOf("\r\n\r\n");
        String[] lines = text.substring(0, end).split("\r\n");
        int status = Integer.parseInt(lines[0].split(" ")[1]);
        Map<String, String> headers = new LinkedHashMap<>();
        for (int i = 1; i < lines.length; i++) {
            int colon = lines[i].indexOf(':');
            headers.putIfAbsent(lines[i].substring(0, colon).toLowerCase(Locale.ROOT), lines[i].substring(colon + 1).strip());
        }
        byte[] body = java.util.Arrays.copyOfRange(all, end + 4, all.length);
        if ("chunked".equalsIgnoreCase(headers.get("transfer-encoding"))) {
            body = unchunk(body);
        }
        return new Answer(status, headers, body);
    }

    private static byte[] unchunk(byte[] chunked) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        int i = 0;
        while (i < chunked.length) {
            int lineEnd = i;
            while (lineEnd + 1 < chunked.length && !(chunked[lineEnd] == '\r' && chunked[lineEnd + 1] == '\n')) {
                lineEnd++;
            }
            String sizeText = new String(chunked, i, lineEnd - i, StandardCharsets.ISO_8859_1).replaceFirst(";.*", "").strip();
            int size = sizeText.isEmpty() ? 0 : Integer.parseInt(sizeText, 16);
            if (size == 0) {
                break;
            }
            out.write(chunked, lineEnd + 2, size);
            i = lineEnd + 2 + size + 2;
        }
        return out.toByteArray();
    }
}
