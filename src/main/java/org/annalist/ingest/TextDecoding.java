package org.annalist.ingest;

import java.io.ByteArrayInputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.Charset;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.CoderResult;
import java.nio.charset.StandardCharsets;

/**
 * Turns the bytes of a file into text: honours a byte-order mark (UTF-8, UTF-16), reads UTF-8
 * without one, and falls back to Windows-1252 (what spreadsheet programs on Windows write) when
 * the bytes are not valid UTF-8, saying so.
 *
 * <p>The encoding is settled by one pass over the bytes that keeps no text; the text itself is then
 * decoded as it is read ({@link Decoded#reader()}), so that a big file is never held as a string.
 */
final class TextDecoding {

    /** The bytes of a file with the encoding they are read in (from {@code offset}, past a byte-order mark). */
    record Decoded(byte[] bytes, int offset, Charset charset, String charsetName) {

        /** A fresh reader of the text from its start. */
        Reader reader() {
            return new InputStreamReader(new ByteArrayInputStream(bytes, offset, bytes.length - offset), charset);
        }
    }

    private TextDecoding() {
    }

    static Decoded decode(byte[] bytes, ProblemLog log) {
        if (startsWith(bytes, 0xEF, 0xBB, 0xBF)) {
            return strict(bytes, 3, StandardCharsets.UTF_8, log);
        }
        if (startsWith(bytes, 0xFF, 0xFE)) {
            return strict(bytes, 2, StandardCharsets.UTF_16LE, log);
        }
        if (startsWith(bytes, 0xFE, 0xFF)) {
            return strict(bytes, 2, StandardCharsets.UTF_16BE, log);
        }
        int probe = Math.min(bytes.length, 4096);
        for (int i = 0; i < probe; i++) {
            if (bytes[i] == 0) {
                throw log.fatal(0, 0, "the file holds binary data (a zero byte at offset " + i
                        + "); expected a text file of comma, semicolon or tab separated values");
            }
        }
        if (valid(bytes, 0, StandardCharsets.UTF_8)) {
            return new Decoded(bytes, 0, StandardCharsets.UTF_8, "UTF-8");
        }
        log.warn(0, 0, "the file is not valid UTF-8; read it as Windows-1252. "
                + "Save it as UTF-8 if accented names look wrong");
        return new Decoded(bytes, 0, Charset.forName("windows-1252"), "windows-1252");
    }

    /** The charset of a small text file (holidays): as {@link #decode}, with its text. */
    static String text(byte[] bytes, ProblemLog log) {
        Decoded decoded = decode(bytes, log);
        return new String(decoded.bytes(), decoded.offset(), decoded.bytes().length - decoded.offset(), decoded.charset());
    }

    private static Decoded strict(byte[] bytes, int skip, Charset charset, ProblemLog log) {
        if (!valid(bytes, skip, charset)) {
            throw log.fatal(0, 0, "the file starts with a " + charset.name()
                    + " byte-order mark but is not valid " + charset.name() + "; expected text in that encoding");
        }
        return new Decoded(bytes, skip, charset, charset.name() + " with byte-order mark");
    }

    /** True when the bytes from {@code offset} decode without error; decodes in small pieces and keeps nothing. */
    private static boolean valid(byte[] bytes, int offset, Charset charset) {
        CharsetDecoder decoder = charset.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes, offset, bytes.length - offset);
        CharBuffer out = CharBuffer.allocate(8192);
        while (true) {
            CoderResult result = decoder.decode(in, out, true);
            if (result.isError()) {
                return false;
            }
            out.clear();
            if (result.isUnderflow()) {
                break;
            }
        }
        while (true) {
            CoderResult result = decoder.flush(out);
            if (result.isError()) {
                return false;
            }
            out.clear();
            if (result.isUnderflow()) {
                return true;
            }
        }
    }

    private static boolean startsWith(byte[] bytes, int... prefix) {
        if (bytes.length < prefix.length) {
            return false;
        }
        for (int i = 0; i < prefix.length; i++) {
            if ((bytes[i] & 0xFF) != prefix[i]) {
                return false;
            }
        }
        return true;
    }
}
