package org.annalist.ingest;

import java.io.BufferedInputStream;
import java.io.Closeable;
import java.io.FilterReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.io.Reader;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.Charset;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.CoderResult;
import java.nio.charset.StandardCharsets;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * Turns the bytes of a file into text: honours a byte-order mark (UTF-8, UTF-16), reads UTF-8
 * without one, and falls back to Windows-1252 (what spreadsheet programs on Windows write) when
 * the bytes are not valid UTF-8, saying so.
 *
 * <p>A data file is decoded as it is read ({@link #open}): read as UTF-8 until a byte says otherwise,
 * and then read again from its start as Windows-1252, so that a big file is never held, as bytes or as
 * text. A small file (holidays) is decoded whole ({@link #text}).
 */
final class TextDecoding {

    /** The bytes of a file with the encoding they are read in (from {@code offset}, past a byte-order mark). */
    record Decoded(byte[] bytes, int offset, Charset charset, String charsetName) {
    }

    private TextDecoding() {
    }

    /**
     * Thrown while text without a byte-order mark is read, when its bytes stop being valid UTF-8: the
     * file is then read again from its start as Windows-1252.
     */
    static final class NotUtf8 extends RuntimeException {
        private static final long serialVersionUID = 1L;

        NotUtf8() {
            super("not UTF-8", null, false, false);
        }
    }

    /** The text of a stream, decoded as it is read, and the SHA-256 of its bytes when it was asked for. */
    static final class Text implements Closeable {
        private final InputStream bytes;
        private final MessageDigest digest;
        private final Reader reader;
        private final String charsetName;
        private final boolean utf8Assumed;
        private final boolean logsWhileRead;

        private Text(InputStream bytes, MessageDigest digest, Reader reader, String charsetName, boolean utf8Assumed,
                     boolean logsWhileRead) {
            this.bytes = bytes;
            this.digest = digest;
            this.reader = reader;
            this.charsetName = charsetName;
            this.utf8Assumed = utf8Assumed;
            this.logsWhileRead = logsWhileRead;
        }

        /**
         * Whether reading the text may write to the log (a byte-order mark's encoding that the bytes
         * break is logged as it is met), so that it must be read on the thread that owns the log.
         */
        boolean logsWhileRead() {
            return logsWhileRead;
        }

        Reader reader() {
            return reader;
        }

        String charsetName() {
            return charsetName;
        }

        /**
         * Hex SHA-256 of all the bytes (those not yet read are read for it), or
         * {@link ReadResult#NOT_DIGESTED} when the text was opened without a digest.
         */
        String sha256() throws IOException {
            if (digest == null) {
                return ReadResult.NOT_DIGESTED;
            }
            bytes.transferTo(OutputStream.nullOutputStream());
            return HexFormat.of().formatHex(digest.digest());
        }

        /**
         * After a problem stopped the reading: reads the rest of the text, so that bytes which are not
         * UTF-8 further on throw {@link NotUtf8} (the problem is then found again in Windows-1252).
         */
        void checkRest() throws IOException {
            if (utf8Assumed) {
                char[] buffer = new char[8192];
                while (reader.read(buffer) >= 0) {
                    // read to the end for the decoder to see every byte
                }
            }
        }

        @Override
        public void close() throws IOException {
            reader.close();
        }
    }

    /**
     * Opens the text of {@code stream}: a byte-order mark honoured, else UTF-8 (the reader throws
     * {@link NotUtf8} on the first byte that is not), or Windows-1252 when {@code windows1252} (after
     * such a failure), which is said in a warning. With {@code digest}, the SHA-256 of the bytes is
     * computed as they are read ({@link Text#sha256}); without, it is not (a third of a second of
     * C1-compiled work for 50 MB, which only a brief's provenance states).
     */
    static Text open(InputStream stream, boolean windows1252, ProblemLog log, boolean digest) throws IOException {
        MessageDigest sha256 = null;
        if (digest) {
            try {
                sha256 = MessageDigest.getInstance("SHA-256");
            } catch (NoSuchAlgorithmException e) {
                throw new IllegalStateException("every Java platform has SHA-256", e);
            }
        }
        BufferedInputStream in = new BufferedInputStream(sha256 == null ? stream : new DigestInputStream(stream, sha256),
                1 << 16);
        in.mark(4096);
        byte[] probe = in.readNBytes(4096);
        in.reset();
        Charset bomCharset = startsWith(probe, 0xEF, 0xBB, 0xBF) ? StandardCharsets.UTF_8
                : startsWith(probe, 0xFF, 0xFE) ? StandardCharsets.UTF_16LE
                : startsWith(probe, 0xFE, 0xFF) ? StandardCharsets.UTF_16BE : null;
        if (bomCharset != null) {
            in.skipNBytes(bomCharset == StandardCharsets.UTF_8 ? 3 : 2);
            Reader strict = checked(new InputStreamReader(in, reporting(bomCharset)), () -> {
                throw log.fatal(0, 0, "the file starts with a " + bomCharset.name()
                        + " byte-order mark but is not valid " + bomCharset.name() + "; expected text in that encoding");
            });
            return new Text(in, sha256, strict, bomCharset.name() + " with byte-order mark", false, true);
        }
        for (int i = 0; i < probe.length; i++) {
            if (probe[i] == 0) {
                throw log.fatal(0, 0, "the file holds binary data (a zero byte at offset " + i
                        + "); expected a text file of comma, semicolon or tab separated values");
            }
        }
        if (windows1252) {
            log.warn(0, 0, "the file is not valid UTF-8; read it as Windows-1252. "
                    + "Save it as UTF-8 if accented names look wrong");
            return new Text(in, sha256, new InputStreamReader(in, Charset.forName("windows-1252")), "windows-1252", false,
                    false);
        }
        Reader utf8 = checked(new InputStreamReader(in, reporting(StandardCharsets.UTF_8)), () -> {
            throw new NotUtf8();
        });
        return new Text(in, sha256, utf8, "UTF-8", true, false);
    }

    private static CharsetDecoder reporting(Charset charset) {
        return charset.newDecoder().onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
    }

    /** A reader that calls {@code onInvalid} (which throws) where its bytes are not valid in its encoding. */
    private static Reader checked(Reader reader, Runnable onInvalid) {
        return new FilterReader(reader) {
            @Override
            public int read(char[] buffer, int offset, int length) throws IOException {
                try {
                    return super.read(buffer, offset, length);
                } catch (CharacterCodingException invalid) {
                    onInvalid.run();
                    throw invalid;
                }
            }

            @Override
            public int read() throws IOException {
                try {
                    return super.read();
                } catch (CharacterCodingException invalid) {
                    onInvalid.run();
                    throw invalid;
                }
            }
        };
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
