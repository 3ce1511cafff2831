package org.annalist.ingest;

import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;

/**
 * Turns the bytes of a file into text: honours a byte-order mark (UTF-8, UTF-16), reads UTF-8
 * without one, and falls back to Windows-1252 (what spreadsheet programs on Windows write) when
 * the bytes are not valid UTF-8, saying so.
 */
final class TextDecoding {

    record Decoded(String text, String charset) {
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
        try {
            return new Decoded(decoder(StandardCharsets.UTF_8).decode(ByteBuffer.wrap(bytes)).toString(), "UTF-8");
        } catch (CharacterCodingException notUtf8) {
            log.warn(0, 0, "the file is not valid UTF-8; read it as Windows-1252. "
                    + "Save it as UTF-8 if accented names look wrong");
            return new Decoded(new String(bytes, Charset.forName("windows-1252")), "windows-1252");
        }
    }

    private static Decoded strict(byte[] bytes, int skip, Charset charset, ProblemLog log) {
        try {
            String text = decoder(charset).decode(ByteBuffer.wrap(bytes, skip, bytes.length - skip)).toString();
            return new Decoded(text, charset.name() + " with byte-order mark");
        } catch (CharacterCodingException e) {
            throw log.fatal(0, 0, "the file starts with a " + charset.name()
                    + " byte-order mark but is not valid " + charset.name() + "; expected text in that encoding");
        }
    }

    private static java.nio.charset.CharsetDecoder decoder(Charset charset) {
        return charset.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
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
